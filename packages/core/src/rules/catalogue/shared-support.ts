// Shared supports (power, air, hydraulics), judged by the direction of failure, and the special case
// of a layer relying on the very utility whose loss is the cause.
import type { Element, SeverityLevel } from '../../model/schema.ts';
import { defineSharedRule, describeSide, type PairContext } from '../define.ts';
import { failsSafeOnLoss } from '../fail-direction.ts';

function judgeSupport(element: Element, pair: PairContext, inForce: SeverityLevel): SeverityLevel {
  const safe = failsSafeOnLoss(pair.b, element, pair) || (pair.a.party.role === 'layer' && failsSafeOnLoss(pair.a, element, pair));
  return safe ? 'note' : inForce;
}

function supportMessage(element: Element, pair: PairContext, severity: SeverityLevel): string {
  const both = `${describeSide(pair.b)} and ${describeSide(pair.a)} both rely on ${element.kind} \`${element.tag}\``;
  if (severity === 'note') {
    const safeSide = failsSafeOnLoss(pair.b, element, pair) ? pair.b : pair.a;
    return `${both}: shared, fails safe for \`${safeSide.party.tag}\` (its loss drives it to the trip position)`;
  }
  return `${both}, and its loss does not drive the layer to a safe state: not independent`;
}

export const utilityLossCause = defineSharedRule({
  id: 'utility-loss-cause',
  title: 'Layer relies on the utility whose loss is the cause',
  rationale: 'When the loss of a utility starts the scenario, a layer that needs that utility to act is defeated by the same event.',
  source: 'CCPS, Layer of Protection Analysis (2001), ch. 6; CCPS, Guidelines for Initiating Events and Independent Protection Layers (2015)',
  defaultSeverity: 'voids-credit',
  groups: ['support'],
  claims: (element, pair) => pair.a.party.role === 'cause' && pair.a.party.tag === element.tag,
  judge: judgeSupport,
  message: supportMessage,
});

export const sharedSupport = defineSharedRule({
  id: 'shared-support',
  title: 'Shared power, air or hydraulic supply',
  rationale:
    'A shared supply is a dangerous common cause only if its loss both contributes to the scenario and stops the layer; a layer that fails safe on its loss is reported, not penalised. An unstated fail action counts as unsafe.',
  source: 'CCPS, Layer of Protection Analysis (2001), ch. 6; IEC 61511-1:2016 11.2.11 (de-energise to trip) [from memory for the clause]',
  defaultSeverity: 'voids-credit',
  groups: ['support'],
  judge: judgeSupport,
  message: supportMessage,
});
