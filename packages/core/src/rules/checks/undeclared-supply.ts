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
import { say } from '../../catalogue/catalogue.ts';
import {
  defineScenarioRule,
  sideRef,
  SEVERITY_RANK,
  type FindingDraft,
  type ScenarioContext,
  type Side,
} from '../define.ts';
import { failsSafeWhenLost } from '../fail-direction.ts';
import { undeclaredSupply as entry } from '../../catalogue/independence/undeclared-supply.ts';

const UNDECLARED_SUPPLY_RULE = 'undeclared-supply';

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
      says: say(stops ? 'undeclared-supply/layer-unverified' : 'undeclared-supply/layer-fails-safe', {
        element: tag,
        kind: traced.kind,
        layer: sideRef(layer),
      }),
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
    const vulnerable = [...layer.elements.values()].find(
      (e) => ACTIVE_KINDS.has(e.kind) && stopsLayer(layer, e.tag, ctx),
    );
    if (!vulnerable) continue;
    for (const e of unsupplied) {
      out.push({
        parties: [ctx.cause.party, layer.party],
        element: e.tag,
        paths: [e.path, vulnerable.path],
        severity,
        says: say('undeclared-supply/cause-unverified', {
          element: e.tag,
          kind: e.kind,
          cause: sideRef(ctx.cause),
          layer: sideRef(layer),
          stoppable: vulnerable.tag,
        }),
      });
    }
  }
  return out;
}

export const undeclaredSupply = defineScenarioRule(entry, {
  check(ctx) {
    const inForce = ctx.severity(UNDECLARED_SUPPLY_RULE);
    return [
      ...ctx.layers.flatMap((layer) => (layer.fn ? layerDrafts(layer, ctx, inForce) : [])),
      ...causeDrafts(ctx, inForce),
    ];
  },
});
