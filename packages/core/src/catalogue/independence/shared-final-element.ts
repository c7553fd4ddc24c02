// shared-final-element: a valve or motor starter that fails in the cause, or sticks, cannot also be what
// a layer relies on to act.
import { ruleEntry } from '../define.ts';
import { sharedElementWords } from '../words.ts';

export const sharedFinalElement = ruleEntry({
  id: 'shared-final-element',
  kind: 'independence',
  title: 'Shared final element',
  rationale:
    'A valve or motor starter that fails in the cause, or is stuck, cannot also be what a layer relies on to act.',
  source: 'IEC 61511-1:2016 11.2.10; ANSI/ISA-S84.01-1996 Annex B.1.3 (separation of final elements)',
  defaultSeverity: 'voids-credit',
  messages: { shared: sharedElementWords('final element') },
});
