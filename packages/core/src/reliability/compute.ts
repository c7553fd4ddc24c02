// One SIF's figures from its failure data: the three subsystems by the Annex B equations, their sum, and what
// keeps the inputs short of complete. It reads the model and the traces only, so the assessment can credit a
// SIF at its computed figure (issue 16, item 3) and `bulkhead verify` can judge it against its targets.
import type { FunctionKindOf, Subsystem } from '../model/schema.ts';
import type { Tracer } from '../trace/trace.ts';
import type { FailureDataIndex } from './figures.ts';
import { SubsystemCalculator, type SubsystemResult } from './subsystems.ts';

export type VerifyFindingCode =
  'no-basis' | 'no-test-basis' | 'common-cause-default' | 'common-cause-no-basis' | 'incomplete' | 'hft-short';

/** A problem with the verification's inputs or result. Stable code, subject, words. */
export interface VerifyFinding {
  code: VerifyFindingCode;
  subject: string;
  message: string;
}

export const SUBSYSTEM_WORDS: Record<Subsystem, string> = {
  sensors: 'sensors',
  solver: 'logic solver',
  finals: 'final elements',
};

export interface SifCalculation {
  subsystems: SubsystemResult[];
  /** Findings on the inputs (bases, defaults, gaps); hft-short is judged later, against a SIL. */
  findings: VerifyFinding[];
  /** Present only when every subsystem was computed. */
  pfd?: number;
  pfh?: number;
}

type Sif = FunctionKindOf<'sif'>;

function basisFindings(results: readonly SubsystemResult[]): VerifyFinding[] {
  const out: VerifyFinding[] = [];
  const seen = new Set<string>();
  for (const r of results) {
    for (const input of r.inputs) {
      if (seen.has(input.row)) continue;
      seen.add(input.row);
      if (input.basis === undefined)
        out.push({
          code: 'no-basis',
          subject: input.row,
          message: `failure data ${input.row} (used for ${input.tag}) gives rates with no basis`,
        });
      if (input.testBasis === undefined && (input.t1 !== undefined || input.missionHours !== undefined)) {
        out.push({
          code: 'no-test-basis',
          subject: input.row,
          message: `failure data ${input.row} gives a proof-test interval with no test-basis`,
        });
      }
    }
    if (r.beta?.fromDefault) {
      out.push({
        code: 'common-cause-default',
        subject: r.subsystem,
        message: `the ${SUBSYSTEM_WORDS[r.subsystem]} group has no common-cause factors: beta ${r.beta.beta} taken by default (top of the IEC 61508-6 Annex D range, from memory)`,
      });
    } else if (r.beta && r.beta.basis === undefined) {
      out.push({
        code: 'common-cause-no-basis',
        subject: r.subsystem,
        message: `the common-cause factors of the ${SUBSYSTEM_WORDS[r.subsystem]} group give no basis`,
      });
    }
    for (const m of r.missing)
      out.push({
        code: 'incomplete',
        subject: m.tag,
        message: `${m.tag} ${m.why}: the ${SUBSYSTEM_WORDS[r.subsystem]} subsystem is not computed`,
      });
    for (const tag of r.sharedWithoutData) {
      out.push({
        code: 'incomplete',
        subject: tag,
        message: `${tag} is shared by the ${SUBSYSTEM_WORDS[r.subsystem]} channels and has no failure data: its failure defeats the group, and the figure leaves it out`,
      });
    }
  }
  return out;
}

export function computeSif(tracer: Tracer, data: FailureDataIndex, sif: Sif): SifCalculation {
  const calc = new SubsystemCalculator(tracer, data);
  const subsystems = [calc.votedGroup(sif, 'sensors'), calc.solver(sif), calc.votedGroup(sif, 'finals')];
  const findings = basisFindings(subsystems);
  if (!subsystems.every((s) => s.pfd !== undefined)) return { subsystems, findings };
  return {
    subsystems,
    findings,
    pfd: subsystems.reduce((s, r) => s + r.pfd!, 0),
    pfh: subsystems.reduce((s, r) => s + r.pfh!, 0),
  };
}

/**
 * Whether the figure may stand in for a justification: every subsystem computed, every traced element of the
 * subsystems with failure data, every row and common-cause factor with its basis, and no figure taken by default
 * (not MTTR, not a full proof-test coverage, not beta). Anything less leaves the credit withheld, as before.
 */
export function verificationComplete(calc: SifCalculation): calc is SifCalculation & { pfd: number; pfh: number } {
  if (calc.pfd === undefined || calc.pfh === undefined || calc.findings.length > 0) return false;
  return calc.subsystems.every(
    (s) =>
      s.withoutData.length === 0 &&
      s.notes.every((n) => !n.includes('not computed')) &&
      s.inputs.every((i) => i.defaults.length === 0),
  );
}
