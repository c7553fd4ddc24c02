// Assessment rule bpcs-layer-with-bpcs-cause: a limit the LOPA figures obey; the check lives in assess/.
import { ruleEntry } from '../define.ts';

export const bpcsLayerWithBpcsCause = ruleEntry({
  id: 'bpcs-layer-with-bpcs-cause',
  kind: 'assessment',
  title: 'BPCS layer credited although a BPCS failure is the cause',
  rationale:
    "The owner's policy (same-controller-layers=none) allows no BPCS layer when a BPCS failure starts the scenario.",
  source: "owner's policy, stricter than IEC 61511-1:2016 9.3 (common practice, no source)",
  defaultSeverity: 'voids-credit',
  messages: {
    'no-credit': (d: { function: string }) =>
      `a BPCS failure is the cause, and the policy (same-controller-layers=none) credits no BPCS layer: \`${d.function}\` earns no credit`,
  },
});
