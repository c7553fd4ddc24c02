// SIF verification from failure data (issue 16): the folder's public surface, re-exported by the package index.
export {
  ANNEX_B,
  ONE_OO_TWO_D_K,
  PROOF_TEST_EXTENSION,
  architectureName,
  effectiveInterval,
  equationFor,
  groupPfd,
  groupPfh,
  tCE,
  tGE,
  tG2E,
  type Architecture,
  type Equation,
  type GroupFigures,
} from '../reliability/annex-b.ts';
export { HFT_SOURCE, requiredHft } from '../reliability/architecture.ts';
export { DEFAULT_MTTR_HOURS, FailureDataIndex, inSeries, type ElementFigures } from '../reliability/figures.ts';
export { BETA_D_SHARE, DEFAULT_BETA, type SubsystemResult } from '../reliability/subsystems.ts';
export { OUTCOME_SUM_SOURCE, sifTarget, type SifTarget, type TargetCandidate } from './target.ts';
export {
  SUBSYSTEM_WORDS,
  computeSif,
  verificationComplete,
  type SifCalculation,
  type VerifyFinding,
  type VerifyFindingCode,
} from '../reliability/compute.ts';
export { VERIFY_CAUTION, verifyModel, verifySif, type SifVerification, type TargetCheck } from './verify.ts';
export { renderVerificationText, renderVerificationsText } from './render.ts';
