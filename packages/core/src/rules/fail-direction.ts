// Judges the direction of failure on both sides of a shared support.
// Layer side: whether losing a support drives the layer to its safe state. A de-energise-to-trip SIF
// whose outputs lose power trips; a valve that fails closed on loss of air closes.
// Cause side: whether losing it can drive the failing loop or element the dangerous way the cause states
// (`drives-to=`). Where the model does not say how an element fails, or which way the cause is dangerous,
// assume the worst on that side.
import type { CauseDirection, Element } from '../model/schema.ts';
import { groupOf } from '../model/kinds.ts';
import type { ScenarioContext, Side } from './define.ts';
import type { CauseJudgementData } from '../catalogue/words.ts';

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

/** The fail position of every final element and actuator in a channel, or undefined if any is unstated. */
function channelPositions(channel: Iterable<string>, ctx: ScenarioContext): Set<string> | undefined {
  const positions = new Set<string>();
  for (const tag of channel) {
    const element = ctx.element(tag);
    const group = groupOf(element.kind);
    if (group !== 'final' && group !== 'actuation') continue;
    if (!('failsTo' in element) || element.failsTo === undefined) return undefined;
    positions.add(element.failsTo);
  }
  return positions;
}

/**
 * Whether the loss of energy at `lost` (a support, or an element whose own supply is not declared)
 * drives the layer to its trip position. `power` says the energy lost may be electrical: an unknown
 * supply counts as power, the stricter case for an energise-to-trip function.
 */
export function failsSafeWhenLost(layer: Side, lost: string, power: boolean, ctx: ScenarioContext): boolean {
  const fn = layer.fn;
  if (!fn || (fn.kind !== 'sif' && fn.kind !== 'trip') || fn.trip === undefined) return false;
  // Energise-to-trip needs power to act; only de-energise-to-trip moves to safety when power goes.
  if (power && fn.tripMode !== 'de-energise') return false;
  const target = POSITION_FOR_TRIP[fn.trip];
  // Losing the solver's power de-energises every output. Any other loss moves only the final elements
  // that rely on it; a sensor that loses its supply reads low or freezes, which trips nothing unless a
  // fault action the model does not state says so.
  const everyOutput = power && ctx.tracer.closure(fn.solver).has(lost);
  let moved = 0;
  for (const head of fn.finals) {
    const channel = ctx.tracer.closure(head);
    if (!everyOutput && !channel.has(lost)) continue;
    const positions = channelPositions(channel, ctx);
    if (!positions || [...positions].some((p) => p !== target)) return false;
    moved++;
  }
  // With MooN final elements, M of them must reach the trip position (2oo2 valves: both).
  return moved > 0 && moved >= finalsNeeded(fn.finalVoting);
}

export function failsSafeOnLoss(layer: Side, support: Element, ctx: ScenarioContext): boolean {
  return failsSafeWhenLost(layer, support.tag, isPowerSupport(support), ctx);
}

/** How the cause side was judged for one lost support: whether it can start the scenario, and why (as data). */
export type CauseJudgement = CauseJudgementData;

/**
 * Whether the loss of `lost` can drive the cause the dangerous way. Safe only when the cause states its
 * dangerous direction, the loss reaches the cause only through final elements (or, for power, the
 * controller that de-energises them all), and every final element and actuator so moved states a fail
 * position other than the dangerous one. A position in place, a sensor that loses its supply, an
 * unstated position or an unstated direction: dangerous.
 */
export function judgeCauseSide(cause: Side, lost: string, power: boolean, ctx: ScenarioContext): CauseJudgement {
  const direction: CauseDirection | undefined = ctx.scenario.cause.drivesTo;
  const who = cause.party.tag !== undefined ? { cause: cause.party.tag } : {};
  if (direction === undefined) return { dangerous: true, why: { reason: 'no-direction' } };
  if (direction === 'high' || direction === 'low')
    return { dangerous: true, why: { reason: 'output-direction', direction } };
  const start = cause.elements.values().next().value?.path[0];
  const fn = start !== undefined && start === cause.fn?.tag ? cause.fn : undefined;
  let channels: { head: string; members: ReadonlySet<string> }[];
  if (fn && (fn.kind === 'loop' || fn.kind === 'sif' || fn.kind === 'trip')) {
    const everyOutput = power && ctx.tracer.closure(fn.solver).has(lost);
    if (!everyOutput && fn.sensors.some((s) => ctx.tracer.closure(s).has(lost))) {
      return { dangerous: true, why: { reason: 'sensor-relies', ...who } };
    }
    channels = fn.finals
      .map((head) => ({ head, members: ctx.tracer.closure(head) }))
      .filter((c) => everyOutput || c.members.has(lost));
  } else if (start !== undefined && !fn) {
    const members = ctx.tracer.closure(start);
    channels = members.has(lost) ? [{ head: start, members }] : [];
    const group = groupOf(ctx.element(start).kind);
    if (group !== 'final' && group !== 'actuation') {
      return { dangerous: true, why: { reason: 'no-fail-position', ...who, direction } };
    }
  } else {
    return { dangerous: true, why: { reason: 'not-judged', ...who } };
  }
  if (channels.length === 0) return { dangerous: true, why: { reason: 'other-route', ...who } };
  const positions = new Set<string>();
  for (const c of channels) {
    const p = channelPositions(c.members, ctx);
    if (!p) return { dangerous: true, why: { reason: 'final-unstated', head: c.head } };
    for (const x of p) positions.add(x);
  }
  const moved = { heads: channels.map((c) => c.head), positions: [...positions].sort(), ...who, direction };
  if (positions.has(direction) || positions.has('in-place'))
    return { dangerous: true, why: { reason: 'moves-dangerous', ...moved } };
  return { dangerous: false, why: { reason: 'moves-away', ...moved } };
}
