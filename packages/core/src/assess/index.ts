// The public API of the assessment stage: assessScenario, the SIL band tables and look-ups, the defaults
// tables, the limit rules in force, number formatting and the text lines `bulkhead check` prints.
export { assessScenario, INCOMPLETE_TRACE_RULE, type AssessInput, type AssessOutput } from './scenario.ts';
export {
  LOW_DEMAND_BANDS,
  HIGH_DEMAND_BANDS,
  LOW_DEMAND_LIMIT_PER_YEAR,
  HOURS_PER_YEAR,
  BEYOND_SIL_4,
  requiredSil,
  requiredSilForPfh,
  silOfPfd,
  lowDemandBand,
  highDemandBand,
  conservativePfd,
  type SilBand,
} from './bands.ts';
export {
  TYPICAL_CAUSE_FREQUENCIES,
  TYPICAL_LAYER_PFDS,
  OPERATOR_ERROR_PER_OPPORTUNITY,
  SIF_BAND_SOURCE,
  PER_100_M_ROWS,
  PER_ROW_METRES,
  sifDefaultPfd,
  type TypicalCause,
  type TypicalCauseRow,
  type LayerDefaultKey,
  type LayerDefaultRow,
} from './defaults.ts';
export {
  ASSESS_RULES,
  assessRulesInForce,
  rulesInForce,
  severityInForce,
  findingKey,
  inForce,
  type AssessRule,
  type AssessRuleId,
  type Figure,
} from './limits.ts';
export {
  POLICY_DEFAULTS,
  BPCS_LAYER_BEST_PFD,
  HUMAN_RESPONSE_BEST_PFD,
  BPCS_LAYERS_PER_SCENARIO,
  BPCS_CAUSE_LOWEST_FREQUENCY,
  resolvedPolicy,
  type ResolvedPolicy,
} from '../vocabulary/policy.ts';
export {
  bpcsFactsOf,
  isBpcsLayer,
  causeIsBpcsFailure,
  causeIsBpcsLoopFailure,
  type BpcsFacts,
  type FunctionFacts,
} from './facts.ts';
export { bestCreditableSet, type CreditCandidate, type CreditProblem, type CreditChoice } from './credit.ts';
export { sifRequirement, type RequirementInput, type ScenarioSifRequirement } from './requirement.ts';
export { RELATIVE_TOLERANCE, sameFigure, decadeLog10, meetsCriterion, type Edge } from './numbers.ts';
export {
  formatScientific,
  formatFigure,
  gapText,
  gapParts,
  formatFrequency,
  formatPerHour,
  formatProbability,
  formatRatio,
  edgeText,
  edgeRelation,
  SIGNIFICANT_FIGURES,
} from './format.ts';
export { renderAssessmentText, ASSESSMENT_CAUTION } from './render.ts';
