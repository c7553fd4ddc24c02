// Assessment rule check-valve-no-credit: a limit the LOPA figures obey; the check lives in assess/.
import { ruleEntry } from '../define.ts';

export const checkValveNoCredit = ruleEntry({
  id: 'check-valve-no-credit',
  kind: 'assessment',
  title: 'Check valve credited without a stated basis',
  rationale: 'A single check valve earns little or no credit unless the model says why (credit-basis) and gives a PFD.',
  source: 'CCPS, Layer of Protection Analysis (2001), Tables 6.3 to 6.5 (from memory)',
  defaultSeverity: 'voids-credit',
  messages: {
    'no-basis': (d: { function: string; device: string }) =>
      `\`${d.function}\` relies on check valve \`${d.device}\`, which earns no credit unless credit-basis says why`,
  },
});
