// Common cause inside a voted group: 1oo2 channels on one tapping are no better than one channel,
// and the redundancy the PFD claim rests on is not there.
import { ruleEntry, tagList } from '../define.ts';
import { formatPerHour, formatProbability, formatRatio } from '../../util/figures.ts';

/** The shared element counted by `bulkhead verify`: the SIF's PFDavg with it in series, and the PFD the layer claims. */
export interface CountedData {
  role: 'sensor' | 'final';
  channels: string[];
  function: string;
  element: string;
  kind: string;
  computed: number;
  claimed: number;
  /** The SIF's computed PFH and the PFH it claims (its pfh= or its SIL's Table 5 edge), where it claims one. */
  computedPfh: number;
  claimedPfh?: number;
}

const missed = (d: CountedData) =>
  d.computed > d.claimed
    ? `above the claimed PFD ${formatProbability(d.claimed)} by a factor of ${formatRatio(d.computed / d.claimed)}`
    : `within the claimed PFD ${formatProbability(d.claimed)}, but PFH ${formatPerHour(d.computedPfh)} is above the claimed ${formatPerHour(d.claimedPfh ?? 0)} by a factor of ${formatRatio(d.computedPfh / (d.claimedPfh ?? 1))}`;

const counted = (d: CountedData) =>
  `the ${d.role} channels ${tagList(d.channels)} of \`${d.function}\` all rely on ${d.kind} \`${d.element}\`: counted in the calculation: PFDavg ${formatProbability(d.computed)} with the shared element in series (bulkhead verify)`;

export const votedGroupCommonCause = ruleEntry({
  id: 'voted-group-common-cause',
  kind: 'independence',
  title: 'Common cause inside a voted group',
  rationale:
    'Channels of a MooN group that share an element are not covered by the beta factor: the shared element is a single point of failure in series with the group, so the group is no better than one channel.',
  source: 'IEC 61508-6:2010 Annex B and D (common cause in voted groups); ISA-TR84.00.02 (simplified PFD equations)',
  defaultSeverity: 'needs-justification',
  messages: {
    'counted-within-claim': (d: CountedData) =>
      `${counted(d)}, within the claimed PFD ${formatProbability(d.claimed)}: credited at the claim`,
    'counted-claim-missed': (d: CountedData) =>
      `${counted(d)}, ${missed(d)}: credited at the computed figure until the claim is justified`,
    'shared-in-group': (d: {
      role: 'sensor' | 'final';
      channels: string[];
      function: string;
      element: string;
      kind: string;
    }) =>
      `the ${d.role} channels ${tagList(d.channels)} of \`${d.function}\` all rely on ${d.kind} \`${d.element}\`: the voted group is no better than one channel`,
    'own-solver-card': (d: {
      role: 'sensor' | 'final';
      channels: string[];
      function: string;
      element: string;
      solver: string;
    }) =>
      `the ${d.role} channels ${tagList(d.channels)} of \`${d.function}\` share \`${d.element}\`, a card of its own logic solver \`${d.solver}\`: part of the logic-solver subsystem, counted there by \`bulkhead verify\`, not a common cause of the voted group`,
  },
});
