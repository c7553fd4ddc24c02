// Justifications: the user's accepted reasons for findings, applied between the rules and the assessment.
// Accepted findings stay visible everywhere; a justification that matches nothing is itself reported.
export {
  acceptancesOf,
  acceptFindings,
  applyJustifications,
  justifiedKeyOf,
  JUSTIFICATION_RULES,
  STALE_JUSTIFICATION,
  DUPLICATE_JUSTIFICATION,
  type Acceptances,
  type JustifiedFindings,
} from './apply.ts';
