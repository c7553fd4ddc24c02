// Assessment rule bpcs-layer-cap: a limit the LOPA figures obey; the check lives in assess/.
import { ruleEntry } from '../define.ts';
import { formatProbability } from '../../util/figures.ts';

export const bpcsLayerCap = ruleEntry({
  id: 'bpcs-layer-cap',
  kind: 'assessment',
  title: 'BPCS layer claims a PFD better than 0.1',
  rationale:
    'A protection layer in a BPCS not designed to IEC 61511 may claim at most a risk reduction of 10; more makes it a SIF, to be modelled as one.',
  source: 'IEC 61511-1:2016 9.3 (2003: 9.4)',
  defaultSeverity: 'voids-credit',
  messages: {
    capped: (d: { function: string; claimed: number; best: number }) =>
      `BPCS layer \`${d.function}\` claims PFD ${formatProbability(d.claimed)}; a BPCS layer is credited at ${formatProbability(d.best)} at best (model it as a SIF if it is designed to IEC 61511)`,
  },
});
