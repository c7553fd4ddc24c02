// Supports are part of the trace: an active element (transmitter, card, controller, solver, console,
// solenoid, positioner, actuator, motor starter, valve) declares its supply route, or says with
// `supply=` why it needs none. Where it says neither, a shared supply cannot be ruled out, so:
// - on a layer, the layer is unverified, unless losing that element's energy drives the layer to its
//   trip position (a de-energise-to-trip SIF whose moved valves all fail to the trip position): then a
//   hidden shared supply could not defeat it either, and the gap is a note;
// - on the cause side, each layer that some supply loss could stop is unverified until the cause's
//   route is declared or the finding is accepted (needs a justification: the cause need not act, but a
//   supply it shares with the layer would go unseen).
import { ACTIVE_KINDS } from '../../model/kinds.ts';
import type { SeverityLevel } from '../../model/schema.ts';
import { defineScenarioRule, describeSide, SEVERITY_RANK, type FindingDraft, type ScenarioContext, type Side } from '../define.ts';
import { failsSafeWhenLost } from '../fail-direction.ts';

export const UNDECLARED_SUPPLY_RULE = 'undeclared-supply';
const ROUTE_WORDS = 'no supply route (powered-by, air-from, hydraulic-from, or supply= for one that needs none)';

/** Whether losing an undeclared supply at `tag` could stop the layer (an unknown supply counts as power). */
function stopsLayer(layer: Side, tag: string, ctx: ScenarioContext): boolean {
  return !failsSafeWhenLost(layer, tag, true, ctx);
}

function layerDrafts(layer: Side, ctx: ScenarioContext, inForce: SeverityLevel): FindingDraft[] {
  const out: FindingDraft[] = [];
  for (const [tag, traced] of layer.elements) {
    if (!ctx.tracer.lacksSupplyRoute(tag)) continue;
    const stops = stopsLayer(layer, tag, ctx);
    out.push({
      parties: [layer.party],
      element: tag,
      paths: [traced.path],
      severity: stops ? inForce : 'note',
      message: stops
        ? `${traced.kind} \`${tag}\` of ${describeSide(layer)} declares ${ROUTE_WORDS}; its loss does not drive the layer to a safe state, so a shared supply cannot be ruled out: independence unverified`
        : `${traced.kind} \`${tag}\` of ${describeSide(layer)} declares ${ROUTE_WORDS}; its loss drives the layer to its trip position, so an undeclared supply cannot defeat it: declare it to complete the trace`,
    });
  }
  return out;
}

function causeDrafts(ctx: ScenarioContext, inForce: SeverityLevel): FindingDraft[] {
  const unsupplied = [...ctx.cause.elements.values()].filter((e) => ctx.tracer.lacksSupplyRoute(e.tag));
  if (unsupplied.length === 0) return [];
  const severity = SEVERITY_RANK[inForce] > SEVERITY_RANK['needs-justification'] ? 'needs-justification' : inForce;
  const out: FindingDraft[] = [];
  for (const layer of ctx.layers) {
    if (!layer.fn) continue;
    const vulnerable = [...layer.elements.values()].find((e) => ACTIVE_KINDS.has(e.kind) && stopsLayer(layer, e.tag, ctx));
    if (!vulnerable) continue;
    for (const e of unsupplied) {
      out.push({
        parties: [ctx.cause.party, layer.party],
        element: e.tag,
        paths: [e.path, vulnerable.path],
        severity,
        message: `${e.kind} \`${e.tag}\` of ${describeSide(ctx.cause)} declares ${ROUTE_WORDS}: a supply it shares with ${describeSide(layer)} (whose \`${vulnerable.tag}\` a supply loss would stop) cannot be ruled out: independence unverified until declared or accepted`,
      });
    }
  }
  return out;
}

export const undeclaredSupply = defineScenarioRule({
  id: UNDECLARED_SUPPLY_RULE,
  title: 'Active element with no declared supply route: independence unverified',
  rationale:
    'A shared power, air or hydraulic supply can defeat a layer, so an active element whose supply the model does not give leaves independence unverified; a layer that its loss drives to the trip position (de-energise to trip) cannot be defeated by it, and is only noted.',
  source:
    'CCPS, Layer of Protection Analysis (2001), ch. 6 (a layer that depends on a utility whose loss is the cause is not independent; an IPL must be auditable); IEC 61511-1:2016 11.2.11 (energise-to-trip needs its supply monitored) [from memory for the clause]; conservative default of this tool',
  defaultSeverity: 'voids-credit',
  check(ctx) {
    const inForce = ctx.severity(UNDECLARED_SUPPLY_RULE);
    return [...ctx.layers.flatMap((layer) => (layer.fn ? layerDrafts(layer, ctx, inForce) : [])), ...causeDrafts(ctx, inForce)];
  },
});
