// Assessment rule bpcs-same-controller: a limit the LOPA figures obey; the check lives in assess/.
import { ruleEntry } from '../define.ts';

export const bpcsSameController = ruleEntry({
  id: 'bpcs-same-controller',
  kind: 'assessment',
  title: 'Two BPCS layers in the same controller',
  rationale:
    'Two BPCS layers in one controller earn at most one credit (policy same-controller-layers=one-credit, the default); older CCPS practice (policy both) allowed both under conditions.',
  source: 'IEC 61511-1:2016 9.3; CCPS, Layer of Protection Analysis (2001) for the policy "both"',
  defaultSeverity: 'voids-credit',
  messages: {
    'one-controller': (d: { layers: [string, string]; controller: string }) =>
      `BPCS layers \`${d.layers[0]}\` and \`${d.layers[1]}\` both run in controller \`${d.controller}\`: at most one of them is credited`,
  },
});
