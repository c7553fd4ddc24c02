// Assessment rule sif-high-demand-no-pfh: a limit the LOPA figures obey; the check lives in assess/.
import { ruleEntry } from '../define.ts';

export const sifHighDemandNoPfh = ruleEntry({
  id: 'sif-high-demand-no-pfh',
  kind: 'assessment',
  title: 'SIF in high demand with no PFH and no SIL',
  rationale:
    'Demanded more than once a year, a SIF is judged by PFH, not PFD. With neither pfh= nor a claimed SIL (whose Table 5 band edge would serve) there is nothing to judge it by, and it earns no credit.',
  source: 'IEC 61511-1:2016 definitions of the demand modes and Table 5',
  defaultSeverity: 'voids-credit',
  messages: {
    'no-figure': (d: { function: string }) =>
      `\`${d.function}\` is demanded more than once a year but gives neither pfh= nor a SIL; its PFD does not apply at this demand, so it earns no credit`,
  },
});
