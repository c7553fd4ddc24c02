// utility-loss-cause: when the loss of a utility starts the scenario, a layer that needs that utility to
// act is defeated by the same event.
import { defineSharedRule } from '../define.ts';
import { judged, severityOf, supportMessage } from '../support-judgement.ts';

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
