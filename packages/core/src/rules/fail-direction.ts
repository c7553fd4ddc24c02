// Judges the direction of failure: whether losing a support drives a layer to its safe state.
// A de-energise-to-trip SIF whose outputs lose power trips; a valve that fails closed on loss of air
// closes. Where the model does not say how an element fails, assume the worst (it does not fail safe).
import type { Element } from '../model/schema.ts';
import { groupOf } from '../model/kinds.ts';
import type { ScenarioContext, Side } from './define.ts';

const POSITION_FOR_TRIP = { close: 'closed', open: 'open', stop: 'off', start: 'on' } as const;
const POWER_KINDS = new Set(['power-supply', 'ups', 'circuit']);

export function isPowerSupport(element: Element): boolean {
  return POWER_KINDS.has(element.kind);
}

/** M of a MooN final-element voting: how many final elements must move for the function to act. */
function finalsNeeded(voting: string | undefined): number {
  const match = voting === undefined ? null : /^(\d+)oo\d+$/.exec(voting);
  return match ? Number(match[1]) : 1;
}

export function failsSafeOnLoss(layer: Side, support: Element, ctx: ScenarioContext): boolean {
  const fn = layer.fn;
  if (!fn || (fn.kind !== 'sif' && fn.kind !== 'trip') || fn.trip === undefined) return false;
  const power = isPowerSupport(support);
  // Energise-to-trip needs power to act; only de-energise-to-trip moves to safety when power goes.
  if (power && fn.tripMode !== 'de-energise') return false;
  const target = POSITION_FOR_TRIP[fn.trip];
  // Losing the solver's power de-energises every output. Any other loss moves only the final elements
  // that rely on it; a sensor that loses its supply reads low or freezes, which trips nothing unless a
  // fault action the model does not state says so.
  const everyOutput = power && ctx.tracer.closure(fn.solver).has(support.tag);
  let moved = 0;
  for (const head of fn.finals) {
    const channel = ctx.tracer.closure(head);
    if (!everyOutput && !channel.has(support.tag)) continue;
    for (const tag of channel) {
      const element = ctx.element(tag);
      const group = groupOf(element.kind);
      if ((group === 'final' || group === 'actuation') && (!('failsTo' in element) || element.failsTo !== target)) return false;
    }
    moved++;
  }
  // With MooN final elements, M of them must reach the trip position (2oo2 valves: both).
  return moved > 0 && moved >= finalsNeeded(fn.finalVoting);
}
