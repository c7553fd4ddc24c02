// Assessment rule bpcs-layer-count: a limit the LOPA figures obey; the check lives in assess/.
import { ruleEntry, tagList } from '../define.ts';

export const bpcsLayerCount = ruleEntry({
  id: 'bpcs-layer-count',
  kind: 'assessment',
  title: 'More than two BPCS layers in one scenario',
  rationale: 'Total reliance on the BPCS in one scenario is at most two layers (two orders of magnitude).',
  source: 'IEC 61511-1:2016 9.3',
  defaultSeverity: 'voids-credit',
  messages: {
    'too-many': (d: { layers: string[]; most: number }) =>
      `${d.layers.length} BPCS layers are claimed (${tagList(d.layers)}); at most ${d.most} are credited`,
  },
});
