// shared-support: a shared power, air or hydraulic supply, judged by the direction of failure on both
// sides (see support-judgement.ts).
import { ruleEntry } from '../define.ts';
import { supportWords } from '../words.ts';

export const sharedSupport = ruleEntry({
  id: 'shared-support',
  kind: 'independence',
  title: 'Shared power, air or hydraulic supply',
  rationale:
    'A shared supply is a dangerous common cause only if its loss both contributes to the scenario and stops the layer: judged on both sides, it is reported, not penalised, when the layer fails safe on its loss or when its loss drives the cause away from the dangerous direction the cause states. An unstated fail action or direction counts as unsafe.',
  source:
    'CCPS, Layer of Protection Analysis (2001), ch. 6; IEC 61511-1:2016 11.2.11 (de-energise to trip) [from memory for the clause]',
  defaultSeverity: 'voids-credit',
  messages: { support: supportWords },
});
