// shared-support: a shared power, air or hydraulic supply, judged by the direction of failure on both
// sides (see support-judgement.ts).
import { defineSharedRule } from '../define.ts';
import { judged, severityOf, supportMessage } from '../support-judgement.ts';

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
