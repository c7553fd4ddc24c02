// Assessment rule sif-pfh-outside-sil: a limit the LOPA figures obey; the check lives in assess/.
import { ruleEntry } from '../define.ts';
import { formatPerHour } from '../../util/figures.ts';
import { bandMessages } from './sif-pfd-outside-sil.ts';

export const sifPfhOutsideSil = ruleEntry({
  id: 'sif-pfh-outside-sil',
  kind: 'assessment',
  title: 'SIF PFH outside its claimed SIL band (high demand)',
  rationale:
    'Demanded more than once a year, a SIF is judged by its dangerous failure rate per hour. A PFH better than the claimed SIL band is credited only down to the band; a PFH worse than the band is used as claimed and the SIL claim is wrong.',
  source: 'IEC 61511-1:2016 Table 5',
  defaultSeverity: 'needs-justification',
  messages: bandMessages('PFH', formatPerHour),
});
