// Shared housings (cabinet, junction box, cable route): a fire, flood or impact there can take out
// everything inside, but whether it must void credit is a judgement, so it asks for a justification.
import { ruleEntry } from '../define.ts';
import { sharedElementWords } from '../words.ts';

export const sharedHousing = ruleEntry({
  id: 'shared-housing',
  kind: 'independence',
  title: 'Shared cabinet, junction box or cable route',
  rationale:
    'Physical separation is one of the ways independence is achieved; a shared housing needs a reasoned acceptance.',
  source:
    'IEC 61511-1:2016 9.4 and 11.2 (physical separation) [from memory for the clauses]; ANSI/ISA-S84.01-1996 Annex B.1.2',
  defaultSeverity: 'needs-justification',
  messages: { shared: sharedElementWords('housing') },
});
