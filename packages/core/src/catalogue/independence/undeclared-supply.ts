// Supports are part of the trace: an active element (transmitter, card, controller, solver, console,
// solenoid, positioner, actuator, motor starter, valve) declares its supply route, or says with
// `supply=` why it needs none. Where it says neither, a shared supply cannot be ruled out, so:
// - on a layer, the layer is unverified, unless losing that element's energy drives the layer to its
//   trip position (a de-energise-to-trip SIF whose moved valves all fail to the trip position): then a
//   hidden shared supply could not defeat it either, and the gap is a note;
// - on the cause side, each layer that some supply loss could stop is unverified until the cause's
//   route is declared or the finding is accepted (needs a justification: the cause need not act, but a
//   supply it shares with the layer would go unseen).
import { ruleEntry } from '../define.ts';
import { sideWords, type SideRef } from '../words.ts';

const ROUTE_WORDS = 'no supply route (powered-by, air-from, hydraulic-from, or supply= for one that needs none)';

export const undeclaredSupply = ruleEntry({
  id: 'undeclared-supply',
  kind: 'independence',
  title: 'Active element with no declared supply route: independence unverified',
  rationale:
    'A shared power, air or hydraulic supply can defeat a layer, so an active element whose supply the model does not give leaves independence unverified; a layer that its loss drives to the trip position (de-energise to trip) cannot be defeated by it, and is only noted.',
  source:
    'CCPS, Layer of Protection Analysis (2001), ch. 6 (a layer that depends on a utility whose loss is the cause is not independent; an IPL must be auditable); IEC 61511-1:2016 11.2.11 (energise-to-trip needs its supply monitored) [from memory for the clause]; conservative default of this tool',
  defaultSeverity: 'voids-credit',
  messages: {
    'layer-unverified': (d: { element: string; kind: string; layer: SideRef }) =>
      `${d.kind} \`${d.element}\` of ${sideWords(d.layer)} declares ${ROUTE_WORDS}; its loss does not drive the layer to a safe state, so a shared supply cannot be ruled out: independence unverified`,
    'layer-fails-safe': (d: { element: string; kind: string; layer: SideRef }) =>
      `${d.kind} \`${d.element}\` of ${sideWords(d.layer)} declares ${ROUTE_WORDS}; its loss drives the layer to its trip position, so an undeclared supply cannot defeat it: declare it to complete the trace`,
    'cause-unverified': (d: { element: string; kind: string; cause: SideRef; layer: SideRef; stoppable: string }) =>
      `${d.kind} \`${d.element}\` of ${sideWords(d.cause)} declares ${ROUTE_WORDS}: a supply it shares with ${sideWords(d.layer)} (whose \`${d.stoppable}\` a supply loss would stop) cannot be ruled out: independence unverified until declared or accepted`,
  },
});
