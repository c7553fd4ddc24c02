// SIF verification from failure data: each subsystem's PFDavg and PFH by the Annex B equations, the total
// against the claim and against the most demanding requirement of the scenarios that credit the SIF, the
// shared elements of voted groups in series with them, and the architectural constraints.
import { analyze } from '../analysis/analyze.ts';
import { requiredSil, requiredSilForPfh } from '../assess/bands.ts';
import { meetsCriterion } from '../assess/numbers.ts';
import type { FunctionKindOf, Model, Subsystem } from '../model/schema.ts';
import { Tracer } from '../trace/trace.ts';
import { buildPlantGraph } from '../graph/plant-graph.ts';
import type { Analysis } from '../vocabulary/types.ts';
import { HFT_SOURCE, requiredHft } from '../reliability/architecture.ts';
import { FailureDataIndex } from '../reliability/figures.ts';
import { SUBSYSTEM_WORDS, computeSif, verificationComplete, type VerifyFinding } from '../reliability/compute.ts';
import type { SubsystemResult } from '../reliability/subsystems.ts';
import { sifTarget, type SifTarget } from './target.ts';

export const VERIFY_CAUTION =
  'The calculation supports, and does not replace, a SIL verification by a competent person. It uses the simplified ' +
  'equations of IEC 61508-6:2010 Annex B and the failure data in the model; defer to IEC 61511, the device safety ' +
  'manuals, local codes and licensed practice.';

export interface SifVerification {
  sif: string;
  title?: string;
  subsystems: SubsystemResult[];
  /** Present only when every subsystem was computed. */
  pfd?: number;
  pfh?: number;
  /** Each subsystem's share of the total PFD, 0 to 1, in subsystem order. */
  shares?: number[];
  claimed: { pfd?: number; pfh?: number; sil?: number };
  target: SifTarget;
  /**
   * The computed figure against the governing requirement of each demand mode the scenarios put the SIF in (PFD
   * in low demand, PFH in high demand); a ratio above 1 falls short by that factor.
   */
  againstTargets?: TargetCheck[];
  /** The deciding one of againstTargets: the furthest from being met. */
  againstTarget?: TargetCheck;
  againstClaim?: { pfdMeets?: boolean; pfhMeets?: boolean };
  /** The SIL the computed figure reaches (0: below SIL 1). */
  silReached?: number;
  architecture:
    | {
        sil: number;
        mode: 'low-demand' | 'high-demand';
        required: number;
        source: string;
        bySubsystem: { subsystem: Subsystem; hft: number; meets: boolean }[];
      }
    | undefined;
  /** Whether the inputs are complete enough for `check` to credit the SIF at its computed figure (issue 16, item 3). */
  complete: boolean;
  /** Shared elements of voted groups, as the independence rules see them, now in the figure. */
  sharedInSeries: { subsystem: Subsystem; tags: string[]; withoutData: string[] }[];
  findings: VerifyFinding[];
}

export interface TargetCheck {
  mode: 'low-demand' | 'high-demand';
  scenarios: string[];
  required: number;
  computed: number;
  meets: boolean;
  ratio: number;
}

type Sif = FunctionKindOf<'sif'>;

/** The SIL the most demanding requirement needs, when the SIF claims none: the higher of the two modes'. */
function targetSil(target: SifTarget): number | undefined {
  const low = target.governingPfd ? requiredSil(target.governingPfd.requiredPfd!, target.governingPfd.edge) : undefined;
  const high = target.governingPfh
    ? requiredSilForPfh(target.governingPfh.requiredPfh!, target.governingPfh.edge)
    : undefined;
  return low === undefined ? high : high === undefined ? low : Math.max(low, high);
}

export function verifySif(
  model: Model,
  sif: Sif,
  analysis: Analysis,
  tracer: Tracer,
  data: FailureDataIndex,
): SifVerification {
  const calculation = computeSif(tracer, data, sif);
  const { subsystems, findings, pfd, pfh } = calculation;
  const target = sifTarget(model, analysis.assessments, sif.tag);
  const incomplete = findings.some((f) => f.code === 'incomplete');
  const result: SifVerification = {
    sif: sif.tag,
    ...(sif.title !== undefined ? { title: sif.title } : {}),
    subsystems,
    claimed: {
      ...(sif.pfd !== undefined ? { pfd: sif.pfd } : {}),
      ...(sif.pfh !== undefined ? { pfh: sif.pfh } : {}),
      ...(sif.sil !== undefined ? { sil: sif.sil } : {}),
    },
    target,
    architecture: undefined,
    complete: verificationComplete(calculation),
    sharedInSeries: subsystems
      .filter((s) => s.shared.length || s.sharedWithoutData.length)
      .map((s) => ({ subsystem: s.subsystem, tags: s.shared.map((c) => c.tag), withoutData: s.sharedWithoutData })),
    findings,
  };
  if (pfd !== undefined && pfh !== undefined) {
    result.pfd = pfd;
    result.pfh = pfh;
    result.shares = subsystems.map((s) => (pfd === 0 ? 0 : s.pfd! / pfd));
    result.againstClaim = {
      ...(sif.pfd !== undefined ? { pfdMeets: pfd <= sif.pfd } : {}),
      ...(sif.pfh !== undefined ? { pfhMeets: pfh <= sif.pfh } : {}),
    };
    const checks = [target.governingPfd, target.governingPfh]
      .filter((g) => g !== undefined)
      .map((g): TargetCheck => {
        const high = g.mode === 'high-demand';
        const required = high ? g.requiredPfh! : g.requiredPfd!;
        const value = high ? pfh : pfd;
        // A required figure at or below zero: the other scenarios of the outcome use up the tolerable frequency.
        const ratio = required > 0 ? value / required : Number.POSITIVE_INFINITY;
        return {
          mode: g.mode,
          scenarios: g.scenarios,
          required,
          computed: value,
          meets: !incomplete && required > 0 && meetsCriterion(value, required, g.edge),
          ratio,
        };
      });
    if (checks.length) {
      result.againstTargets = checks;
      result.againstTarget = checks.reduce((worst, c) =>
        (!c.meets && worst.meets) || (c.meets === worst.meets && c.ratio > worst.ratio) ? c : worst,
      );
    }
    result.silReached = target.governingPfh ? requiredSilForPfh(pfh, 'below') : requiredSil(pfd, 'below');
  }
  const mode = target.governingPfh ? 'high-demand' : 'low-demand';
  const sil = sif.sil ?? targetSil(target);
  if (sil !== undefined && sil >= 1 && sil <= 4) {
    const required = requiredHft(sil, mode);
    const bySubsystem = subsystems.map((s) => ({ subsystem: s.subsystem, hft: s.hft, meets: s.hft >= required }));
    result.architecture = { sil, mode, required, source: HFT_SOURCE, bySubsystem };
    for (const s of bySubsystem.filter((b) => !b.meets)) {
      findings.push({
        code: 'hft-short',
        subject: s.subsystem,
        message: `HFT of the ${SUBSYSTEM_WORDS[s.subsystem]} is ${s.hft}; SIL ${sil} in ${mode} needs ${required} (${HFT_SOURCE})`,
      });
    }
  }
  return result;
}

/** Verifies one SIF, or every SIF of the model; undefined entries never appear. */
export function verifyModel(model: Model, only?: string, analysis: Analysis = analyze(model)): SifVerification[] {
  const tracer = new Tracer(buildPlantGraph(model));
  const data = new FailureDataIndex(model);
  return model.functions
    .filter((f): f is Sif => f.kind === 'sif' && (only === undefined || f.tag === only))
    .map((f) => verifySif(model, f, analysis, tracer, data));
}
