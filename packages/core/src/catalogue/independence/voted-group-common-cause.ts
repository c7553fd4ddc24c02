// Common cause inside a voted group: 1oo2 channels on one tapping are no better than one channel,
// and the redundancy the PFD claim rests on is not there.
import { ruleEntry, tagList } from '../define.ts';

export const votedGroupCommonCause = ruleEntry({
  id: 'voted-group-common-cause',
  kind: 'independence',
  title: 'Common cause inside a voted group',
  rationale:
    'Channels of a MooN group that share an element are not covered by the beta factor: the shared element is a single point of failure in series with the group, so the group is no better than one channel.',
  source: 'IEC 61508-6:2010 Annex B and D (common cause in voted groups); ISA-TR84.00.02 (simplified PFD equations)',
  defaultSeverity: 'needs-justification',
  messages: {
    'shared-in-group': (d: { role: 'sensor' | 'final'; channels: string[]; function: string; element: string; kind: string }) =>
      `the ${d.role} channels ${tagList(d.channels)} of \`${d.function}\` all rely on ${d.kind} \`${d.element}\`: the voted group is no better than one channel`,
    'own-solver-card': (d: { role: 'sensor' | 'final'; channels: string[]; function: string; element: string; solver: string }) =>
      `the ${d.role} channels ${tagList(d.channels)} of \`${d.function}\` share \`${d.element}\`, a card of its own logic solver \`${d.solver}\`: part of the logic-solver subsystem, counted there by \`bulkhead verify\`, not a common cause of the voted group`,
  },
});
