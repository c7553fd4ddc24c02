// Shared supports (power, air, hydraulics), judged by the direction of failure, and the special case
// of a layer relying on the very utility whose loss is the cause.
import type { Element, SeverityLevel } from '../../model/schema.ts';
import { defineSharedRule, describeSide, type PairContext } from '../define.ts';
import { failsSafeOnLoss, isPowerSupport, judgeCauseSide, type CauseJudgement } from '../fail-direction.ts';

interface SupportJudgement {
  /** The layer (of the two) that the loss drives to its trip position, if any. */
  safeLayer?: string;
  /** The cause side, when one side is the cause and its direction is judged (not for a utility-loss cause). */
  cause?: CauseJudgement;
}

function judged(element: Element, pair: PairContext, judgeCause: boolean): SupportJudgement {
  const safeLayer = failsSafeOnLoss(pair.b, element, pair)
    ? pair.b.party.tag
    : pair.a.party.role === 'layer' && failsSafeOnLoss(pair.a, element, pair)
      ? pair.a.party.tag
      : undefined;
  const cause = judgeCause && pair.a.party.role === 'cause' ? judgeCauseSide(pair.a, element.tag, isPowerSupport(element), pair) : undefined;
  return { ...(safeLayer !== undefined ? { safeLayer } : {}), ...(cause ? { cause } : {}) };
}

/** Dangerous only if its loss can drive the cause the dangerous way and stops the layer. */
function severityOf(j: SupportJudgement, inForce: SeverityLevel): SeverityLevel {
  return j.safeLayer !== undefined || j.cause?.dangerous === false ? 'note' : inForce;
}

function supportMessage(element: Element, pair: PairContext, j: SupportJudgement): string {
  const both = `${describeSide(pair.b)} and ${describeSide(pair.a)} both rely on ${element.kind} \`${element.tag}\``;
  const causeSide = j.cause ? `; cause side: ${j.cause.why}` : '';
  if (j.safeLayer !== undefined) return `${both}: shared, fails safe for \`${j.safeLayer}\` (layer side: its loss drives it to the trip position${causeSide})`;
  if (j.cause?.dangerous === false) {
    return `${both}: shared, not a dangerous common cause (cause side: ${j.cause.why}; layer side: its loss does not drive \`${pair.b.party.tag}\` to a safe state)`;
  }
  return `${both}: not independent (layer side: its loss does not drive the layer to a safe state${causeSide})`;
}

export const utilityLossCause = defineSharedRule({
  id: 'utility-loss-cause',
  title: 'Layer relies on the utility whose loss is the cause',
  rationale: 'When the loss of a utility starts the scenario, a layer that needs that utility to act is defeated by the same event.',
  source: 'CCPS, Layer of Protection Analysis (2001), ch. 6; CCPS, Guidelines for Initiating Events and Independent Protection Layers (2015)',
  defaultSeverity: 'voids-credit',
  groups: ['support'],
  claims: (element, pair) => pair.a.party.role === 'cause' && pair.a.party.tag === element.tag,
  // The cause is the loss of this very utility: its cause side is dangerous by definition.
  judge: (element, pair, inForce) => severityOf(judged(element, pair, false), inForce),
  message: (element, pair) => supportMessage(element, pair, judged(element, pair, false)),
});

export const sharedSupport = defineSharedRule({
  id: 'shared-support',
  title: 'Shared power, air or hydraulic supply',
  rationale:
    'A shared supply is a dangerous common cause only if its loss both contributes to the scenario and stops the layer: judged on both sides, it is reported, not penalised, when the layer fails safe on its loss or when its loss drives the cause away from the dangerous direction the cause states. An unstated fail action or direction counts as unsafe.',
  source: 'CCPS, Layer of Protection Analysis (2001), ch. 6; IEC 61511-1:2016 11.2.11 (de-energise to trip) [from memory for the clause]',
  defaultSeverity: 'voids-credit',
  groups: ['support'],
  judge: (element, pair, inForce) => severityOf(judged(element, pair, true), inForce),
  message: (element, pair) => supportMessage(element, pair, judged(element, pair, true)),
});
