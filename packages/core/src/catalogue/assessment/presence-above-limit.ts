// Assessment rule presence-above-limit: a limit the LOPA figures obey; the check lives in assess/.
import { ruleEntry } from '../define.ts';
import { formatProbability } from '../../util/figures.ts';

export const presenceAboveLimit = ruleEntry({
  id: 'presence-above-limit',
  kind: 'assessment',
  title: 'Presence modifier above the policy limit',
  rationale:
    'Credit for the presence of people needs presence well below all of the time; above the policy limit (presence-limit, default 0.1) the modifier is not applied until justified.',
  source: "owner's policy (common practice, no source)",
  defaultSeverity: 'needs-justification',
  messages: {
    'above-limit': (d: { probability: number; limit: number }) =>
      `presence ${formatProbability(d.probability)} is above the policy limit ${formatProbability(d.limit)}; it is not applied until a justification accepts it`,
  },
});
