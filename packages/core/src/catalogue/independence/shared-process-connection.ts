// shared-process-connection: a nozzle, tapping or root valve that plugs, freezes or is left isolated
// blinds every instrument on it at once.
import { ruleEntry } from '../define.ts';
import { sharedElementWords } from '../words.ts';

export const sharedProcessConnection = ruleEntry({
  id: 'shared-process-connection',
  kind: 'independence',
  title: 'Shared process connection',
  rationale: 'A nozzle, tapping or root valve that plugs, freezes or is left isolated defeats every instrument on it.',
  source:
    'CCPS, Layer of Protection Analysis (2001), ch. 6 (independence); IEC 61511-1:2016 9.4 (common cause between layers)',
  defaultSeverity: 'voids-credit',
  messages: { shared: sharedElementWords('process connection') },
});
