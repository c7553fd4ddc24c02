// What a SIF must reach across every scenario that credits it: the most demanding requirement governs.
// Scenarios that lead to the same consequence (the same `outcome=`) share one tolerable frequency, so their
// frequencies are summed and the SIF's required PFD comes from the sum.
import type { Edge } from '../assess/numbers.ts';
import type { Model } from '../model/schema.ts';
import type { ScenarioAssessment } from '../vocabulary/types.ts';

export const OUTCOME_SUM_SOURCE =
  'CCPS, Layer of Protection Analysis: Simplified Process Risk Assessment (2001): scenarios with the same consequence are summed against its tolerable frequency (from memory)';

export interface TargetCandidate {
  /** The scenario, or the outcome group and its scenarios. */
  scenarios: string[];
  outcome?: string;
  mode: 'low-demand' | 'high-demand';
  requiredPfd?: number;
  requiredPfh?: number;
  tolerable: number;
  edge: Edge;
  /** Other scenarios of the outcome that do not credit the SIF, using part of the tolerable frequency. */
  othersMitigated?: number;
  note?: string;
}

export interface SifTarget {
  candidates: TargetCandidate[];
  /** The most demanding low-demand and high-demand requirements, if any. */
  governingPfd?: TargetCandidate;
  governingPfh?: TargetCandidate;
}

function crediting(assessments: readonly ScenarioAssessment[], sif: string): ScenarioAssessment[] {
  return assessments.filter((a) => a.sif?.function === sif);
}

function single(a: ScenarioAssessment): TargetCandidate {
  const req = a.sif!;
  const high = req.mode === 'high-demand';
  return {
    scenarios: [a.scenario],
    mode: req.mode,
    ...(high ? { requiredPfh: req.requiredPfh! } : { requiredPfd: req.requiredPfd }),
    tolerable: a.tolerable,
    edge: a.edge,
  };
}

/** One outcome group: sum the pre-SIF frequencies of the scenarios that credit the SIF, less what the others use. */
function grouped(outcome: string, members: readonly ScenarioAssessment[], sif: string): TargetCandidate | undefined {
  const withSif = members.filter((a) => a.sif?.function === sif && a.sif.mode === 'low-demand');
  const others = members.filter((a) => a.sif?.function !== sif);
  if (members.length < 2 || withSif.length === 0) return undefined;
  const tolerable = Math.min(...members.map((a) => a.tolerable));
  const edge: Edge = members.some((a) => a.edge === 'below') ? 'below' : 'at-most';
  // requiredPfd = tolerable / (frequency before the SIF), so the frequency before it is tolerable / requiredPfd.
  const before = withSif.reduce((s, a) => s + a.tolerable / a.sif!.requiredPfd, 0);
  const othersMitigated = others.reduce((s, a) => s + a.mitigatedAfter, 0);
  const notes: string[] = [];
  if (new Set(members.map((a) => a.tolerable)).size > 1)
    notes.push('the scenarios name different tolerable frequencies: the lowest is used');
  if (withSif.length < members.filter((a) => a.sif?.function === sif).length)
    notes.push('high-demand scenarios of the group are judged alone by PFH');
  return {
    scenarios: members.map((a) => a.scenario),
    outcome,
    mode: 'low-demand',
    requiredPfd: (tolerable - othersMitigated) / before,
    tolerable,
    edge,
    ...(others.length ? { othersMitigated } : {}),
    ...(notes.length ? { note: notes.join('; ') } : {}),
  };
}

export function sifTarget(model: Model, assessments: readonly ScenarioAssessment[], sif: string): SifTarget {
  const candidates = crediting(assessments, sif).map(single);
  const outcomes = new Map<string, ScenarioAssessment[]>();
  const byId = new Map(assessments.map((a) => [a.scenario, a]));
  for (const s of model.scenarios) {
    const a = byId.get(s.id);
    if (s.outcome === undefined || a === undefined) continue;
    (outcomes.get(s.outcome) ?? outcomes.set(s.outcome, []).get(s.outcome)!).push(a);
  }
  for (const [outcome, members] of outcomes) {
    const group = grouped(outcome, members, sif);
    if (group) candidates.push(group);
  }
  const lowest = (key: 'requiredPfd' | 'requiredPfh') =>
    candidates
      .filter((c) => c[key] !== undefined)
      .reduce<TargetCandidate | undefined>(
        (best, c) => (best === undefined || c[key]! < best[key]! ? c : best),
        undefined,
      );
  const governingPfd = lowest('requiredPfd');
  const governingPfh = lowest('requiredPfh');
  return { candidates, ...(governingPfd ? { governingPfd } : {}), ...(governingPfh ? { governingPfh } : {}) };
}
