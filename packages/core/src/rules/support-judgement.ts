// How a shared support (power, air, hydraulics) is judged on both sides: the layer side (does its loss
// drive the layer to its trip position?) and the cause side (can its loss drive the cause the dangerous
// way?). Shared by the rules shared-support and utility-loss-cause, so both read and word it alike.
import type { Element, SeverityLevel } from '../model/schema.ts';
import type { SupportData } from '../catalogue/words.ts';
import { sideRef, type PairContext } from './define.ts';
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
  const cause =
    judgeCause && pair.a.party.role === 'cause'
      ? judgeCauseSide(pair.a, element.tag, isPowerSupport(element), pair)
      : undefined;
  return { ...(safeLayer !== undefined ? { safeLayer } : {}), ...(cause ? { cause } : {}) };
}

/** Dangerous only if its loss can drive the cause the dangerous way and stops the layer. */
export function severityOf(j: SupportJudgement, inForce: SeverityLevel): SeverityLevel {
  return j.safeLayer !== undefined || j.cause?.dangerous === false ? 'note' : inForce;
}

/** The data of a shared-support message (catalogue/words.ts supportWords). */
export function supportData(element: Element, pair: PairContext, j: SupportJudgement, beneath: string[]): SupportData {
  return { a: sideRef(pair.a), b: sideRef(pair.b), element: element.tag, kind: element.kind, beneath, ...j };
}
