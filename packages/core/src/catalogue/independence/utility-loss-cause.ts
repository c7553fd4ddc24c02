// utility-loss-cause: when the loss of a utility starts the scenario, a layer that needs that utility to
// act is defeated by the same event.
import { ruleEntry } from '../define.ts';
import { supportWords } from '../words.ts';

export const utilityLossCause = ruleEntry({
  id: 'utility-loss-cause',
  kind: 'independence',
  title: 'Layer relies on the utility whose loss is the cause',
  rationale:
    'When the loss of a utility starts the scenario, a layer that needs that utility to act is defeated by the same event.',
  source:
    'CCPS, Layer of Protection Analysis (2001), ch. 6; CCPS, Guidelines for Initiating Events and Independent Protection Layers (2015)',
  defaultSeverity: 'voids-credit',
  messages: { support: supportWords },
});
