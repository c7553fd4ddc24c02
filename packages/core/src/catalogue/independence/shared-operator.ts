// shared-operator: two responses by one person, or a response by the person whose error is the cause.
import { ruleEntry } from '../define.ts';
import { sharedElementWords } from '../words.ts';

export const sharedOperator = ruleEntry({
  id: 'shared-operator',
  kind: 'independence',
  title: 'Same operator',
  rationale:
    'Two human responses by one person, or a response by the person whose error is the cause, are not independent.',
  source: 'CCPS, Layer of Protection Analysis (2001), ch. 6',
  defaultSeverity: 'voids-credit',
  messages: { shared: sharedElementWords('operator') },
});
