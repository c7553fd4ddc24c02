// Assessment rule condition-credit-limit: a limit the LOPA figures obey; the check lives in assess/.
import { ruleEntry } from '../define.ts';
import { formatProbability, formatRatio } from '../../util/figures.ts';

export const conditionCreditLimit = ruleEntry({
  id: 'condition-credit-limit',
  kind: 'assessment',
  title: 'Enablers and modifiers together take more credit than the policy allows',
  rationale:
    "The combined credit of enabling conditions and conditional modifiers is limited by the owner's policy (condition-credit-limit, default 100, two orders of magnitude); the excess is not taken until a justification accepts it.",
  source:
    "CCPS, Guidelines for Enabling Conditions and Conditional Modifiers in Layer of Protection Analysis (2013); the default limit is owner's policy, from memory",
  defaultSeverity: 'needs-justification',
  messages: {
    'above-limit': (d: { product: number; limit: number }) =>
      `enablers and modifiers together give a credit of ${formatRatio(1 / d.product)} (product ${formatProbability(d.product)}), above the policy limit of ${formatRatio(d.limit)}; ` +
      `${formatRatio(d.limit)} is used until a justification accepts it`,
  },
});
