// Assessment rule sif-pfd-outside-sil: a limit the LOPA figures obey; the check lives in assess/.
import { ruleEntry } from '../define.ts';
import { formatProbability } from '../../util/figures.ts';

/** A claimed figure and the band of its claimed SIL. */
export interface BandData {
  function: string;
  claimed: number;
  sil: number;
  low: number;
  high: number;
}

/** The words of a claimed PFD or PFH against its SIL band: better (credited at the band) or worse (used as claimed). */
export function bandMessages(quantity: 'PFD' | 'PFH', format: (x: number) => string) {
  return {
    better: (d: BandData) =>
      `\`${d.function}\` claims ${quantity} ${format(d.claimed)}, better than its SIL ${d.sil} band (${format(d.low)} to ${format(d.high)}); credited at ${format(d.low)}`,
    worse: (d: BandData) =>
      `\`${d.function}\` claims SIL ${d.sil} but ${quantity} ${format(d.claimed)}, worse than the band (${format(d.low)} to ${format(d.high)}); the ${quantity} is used`,
  };
}

export const sifPfdOutsideSil = ruleEntry({
  id: 'sif-pfd-outside-sil',
  kind: 'assessment',
  title: 'SIF PFD outside its claimed SIL band',
  rationale:
    'A PFD better than the claimed SIL band is credited only down to the band (the SIL, not the figure, sets the design and test regime); a PFD worse than the band is used as claimed and the SIL claim is wrong.',
  source: 'IEC 61511-1:2016 Table 4',
  defaultSeverity: 'needs-justification',
  messages: bandMessages('PFD', formatProbability),
});
