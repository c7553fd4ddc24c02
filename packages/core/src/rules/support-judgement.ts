// How a shared support (power, air, hydraulics) is judged on both sides: the layer side (does its loss
// drive the layer to its trip position?) and the cause side (can its loss drive the cause the dangerous
// way?). Shared by the rules shared-support and utility-loss-cause, so both read and word it alike.
import type { Element, SeverityLevel } from '../model/schema.ts';
import { describeSide, type PairContext } from './define.ts';
import { failsSafeOnLoss, isPowerSupport, judgeCauseSide, type CauseJudgement } from './fail-direction.ts';

export interface SupportJudgement {
  /** The layer (of the two) that the loss drives to its trip position, if any. */
  safeLayer?: string;
  /** The cause side, when one side is the cause and its direction is judged (not for a utility-loss cause). */
  cause?: CauseJudgement;
}

export function judged(element: Element, pair: PairContext, judgeCause: boolean): SupportJudgement {
  const safeLayer = failsSafeOnLoss(pair.b, element, pair)
    ? pair.b.party.tag
    : pair.a.party.role === 'layer' && failsSafeOnLoss(pair.a, element, pair)
      ? pair.a.party.tag
      : undefined;
  const cause = judgeCause && pair.a.party.role === 'cause' ? judgeCauseSide(pair.a, element.tag, isPowerSupport(element), pair) : undefined;
  return { ...(safeLayer !== undefined ? { safeLayer } : {}), ...(cause ? { cause } : {}) };
}

/** Dangerous only if its loss can drive the cause the dangerous way and stops the layer. */
export function severityOf(j: SupportJudgement, inForce: SeverityLevel): SeverityLevel {
  return j.safeLayer !== undefined || j.cause?.dangerous === false ? 'note' : inForce;
}

export function supportMessage(element: Element, pair: PairContext, j: SupportJudgement): string {
  const both = `${describeSide(pair.b)} and ${describeSide(pair.a)} both rely on ${element.kind} \`${element.tag}\``;
  const causeSide = j.cause ? `; cause side: ${j.cause.why}` : '';
  if (j.safeLayer !== undefined) return `${both}: shared, fails safe for \`${j.safeLayer}\` (layer side: its loss drives it to the trip position${causeSide})`;
  if (j.cause?.dangerous === false) {
    return `${both}: shared, not a dangerous common cause (cause side: ${j.cause.why}; layer side: its loss does not drive \`${pair.b.party.tag}\` to a safe state)`;
  }
  return `${both}: not independent (layer side: its loss does not drive the layer to a safe state${causeSide})`;
}
