// shared-io: one I/O card, cable or network segment carries the signals of every function wired through it.
import { ruleEntry } from '../define.ts';
import { sharedElementWords } from '../words.ts';

export const sharedIo = ruleEntry({
  id: 'shared-io',
  kind: 'independence',
  title: 'Shared I/O card, cable or network',
  rationale: 'One failed card, cable or network segment cuts the signal of every function wired through it.',
  source: 'ANSI/ISA-S84.01-1996 Annex B.1.3 (separation covers communication); IEC 61511-1:2016 9.4',
  defaultSeverity: 'voids-credit',
  messages: { shared: sharedElementWords('signal path') },
});
