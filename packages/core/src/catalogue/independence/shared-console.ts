// shared-console: a console shared by two functions can mislead or blind both.
import { ruleEntry } from '../define.ts';
import { sharedElementWords } from '../words.ts';

export const sharedConsole = ruleEntry({
  id: 'shared-console',
  kind: 'independence',
  title: 'Shared console',
  rationale:
    'A console shared by two functions can mislead or blind both; whether that voids credit depends on the alarm design.',
  source: 'Common practice, no source; CCPS, Guidelines for Initiating Events and Independent Protection Layers (2015)',
  defaultSeverity: 'needs-justification',
  messages: { shared: sharedElementWords('console') },
});
