// What a revision did to independence: findings that appeared, disappeared or changed severity, the
// verdict of each scenario before and after, and the justifications the change made stale. Findings are
// matched by their stable key, and where a tag was renamed, by rule, scenario, parties and element with
// the renames applied, so a renamed transmitter does not read as one problem fixed and another found.
import { sameFigure } from '../assess/index.ts';
import { justifiedKeyOf, STALE_JUSTIFICATION } from '../justify/index.ts';
import type { Analysis, Finding, ScenarioAssessment } from '../vocabulary/types.ts';
import type { Rename } from './compare-model.ts';

export interface FindingRef {
  key: string;
  rule: string;
  severity: Finding['severity'];
  scenario?: string;
  element?: string;
  /** `cause LIC-101`, `layer SIF-101`. */
  parties: string[];
  message: string;
  accepted: boolean;
}

export interface FindingChanges {
  appeared: FindingRef[];
  disappeared: FindingRef[];
  severityChanged: { old: FindingRef; new: FindingRef }[];
  /** Findings accepted in one revision and not in the other. */
  acceptanceChanged: { old: FindingRef; new: FindingRef }[];
}

export interface ScenarioFigures {
  meets: boolean;
  /** Mitigated frequency after independence, per year. */
  mitigatedAfter: number;
  /** mitigatedAfter over the tolerable frequency. */
  gap: number;
  /** SIL the scenario's SIF needs (0: none); absent when no SIF figure applies. */
  requiredSil?: number;
}

export type VerdictChange = 'worse' | 'better' | 'same' | 'added' | 'removed';

export interface ScenarioVerdict {
  /** The scenario's id in the new revision (the old one for a removed scenario). */
  scenario: string;
  oldId?: string;
  change: VerdictChange;
  before?: ScenarioFigures;
  after?: ScenarioFigures;
  /** Why it is worse or better, in words. */
  why?: string;
}

export interface StaleJustification {
  /** The finding key the justification names. */
  finding: string;
  reason: string;
}

function reference(f: Finding): FindingRef {
  return {
    key: f.key,
    rule: f.rule,
    severity: f.severity,
    ...(f.scenario !== undefined ? { scenario: f.scenario } : {}),
    ...(f.element !== undefined ? { element: f.element } : {}),
    parties: f.parties.map((p) => (p.tag === undefined ? p.role : `${p.role} ${p.tag}`)),
    message: f.message,
    accepted: f.accepted !== undefined,
  };
}

const compareKeys = (a: { key: string }, b: { key: string }) => (a.key < b.key ? -1 : a.key > b.key ? 1 : 0);

/** What identifies a finding apart from its key text: rule, scenario, parties and element, renames applied. */
function identity(f: Finding, rename: (tag: string | undefined) => string | undefined): string {
  const parties = f.parties.map((p) => `${p.role}=${rename(p.tag) ?? ''}`).sort();
  return JSON.stringify([f.rule, rename(f.scenario) ?? '', parties, rename(f.element) ?? '']);
}

export function compareFindings(
  before: readonly Finding[],
  after: readonly Finding[],
  renames: readonly Rename[],
): FindingChanges & { matched: [Finding, Finding][] } {
  const map = new Map(renames.map((r) => [r.old, r.new]));
  const rename = (tag: string | undefined) => (tag === undefined ? undefined : (map.get(tag) ?? tag));
  const same = (tag: string | undefined) => tag;
  const newByKey = new Map(after.map((f) => [f.key, f]));
  const taken = new Set<Finding>();
  const matched: [Finding, Finding][] = [];
  const unmatched: Finding[] = [];
  for (const f of before) {
    const twin = newByKey.get(f.key);
    if (twin && !taken.has(twin)) {
      taken.add(twin);
      matched.push([f, twin]);
    } else unmatched.push(f);
  }
  const byIdentity = new Map<string, Finding[]>();
  for (const f of after)
    if (!taken.has(f))
      (byIdentity.get(identity(f, same)) ?? byIdentity.set(identity(f, same), []).get(identity(f, same))!).push(f);
  const disappeared: Finding[] = [];
  for (const f of unmatched) {
    const twin = byIdentity.get(identity(f, rename))?.find((x) => !taken.has(x));
    if (twin) {
      taken.add(twin);
      matched.push([f, twin]);
    } else disappeared.push(f);
  }
  return {
    appeared: after
      .filter((f) => !taken.has(f))
      .map(reference)
      .sort(compareKeys),
    disappeared: disappeared.map(reference).sort(compareKeys),
    severityChanged: matched
      .filter(([a, b]) => a.severity !== b.severity)
      .map(([a, b]) => ({ old: reference(a), new: reference(b) }))
      .sort((x, y) => compareKeys(x.new, y.new)),
    acceptanceChanged: matched
      .filter(([a, b]) => (a.accepted === undefined) !== (b.accepted === undefined))
      .map(([a, b]) => ({ old: reference(a), new: reference(b) }))
      .sort((x, y) => compareKeys(x.new, y.new)),
    matched,
  };
}

function figures(a: ScenarioAssessment): ScenarioFigures {
  return {
    meets: a.meetsAfter,
    mitigatedAfter: a.mitigatedAfter,
    gap: a.gap,
    ...(a.sif ? { requiredSil: a.sif.sil } : {}),
  };
}

/** Worse or better: the verdict first, then the mitigated frequency after independence, then the SIL asked of the SIF. */
function judge(before: ScenarioFigures, after: ScenarioFigures): { change: VerdictChange; why?: string } {
  if (before.meets !== after.meets)
    return after.meets
      ? { change: 'better', why: 'now meets its criterion' }
      : { change: 'worse', why: 'no longer meets its criterion' };
  if (!sameFigure(before.mitigatedAfter, after.mitigatedAfter)) {
    return after.mitigatedAfter > before.mitigatedAfter
      ? { change: 'worse', why: 'mitigated frequency after independence rose' }
      : { change: 'better', why: 'mitigated frequency after independence fell' };
  }
  const silBefore = before.requiredSil ?? 0;
  const silAfter = after.requiredSil ?? 0;
  if (silBefore !== silAfter)
    return silAfter > silBefore
      ? { change: 'worse', why: 'its SIF must now reach a higher SIL' }
      : { change: 'better', why: 'its SIF may now be of a lower SIL' };
  return { change: 'same' };
}

const compareIds = (a: { scenario: string }, b: { scenario: string }) =>
  a.scenario < b.scenario ? -1 : a.scenario > b.scenario ? 1 : 0;

export function compareVerdicts(before: Analysis, after: Analysis, renames: readonly Rename[]): ScenarioVerdict[] {
  const map = new Map(renames.filter((r) => r.kind === 'scenario').map((r) => [r.old, r.new]));
  const newById = new Map(after.assessments.map((a) => [a.scenario, a]));
  const seen = new Set<string>();
  const out: ScenarioVerdict[] = [];
  for (const a of before.assessments) {
    const id = map.get(a.scenario) ?? a.scenario;
    const twin = newById.get(id);
    if (!twin) {
      out.push({ scenario: a.scenario, change: 'removed', before: figures(a) });
      continue;
    }
    seen.add(id);
    const verdict = judge(figures(a), figures(twin));
    out.push({
      scenario: id,
      ...(id !== a.scenario ? { oldId: a.scenario } : {}),
      ...verdict,
      before: figures(a),
      after: figures(twin),
    });
  }
  for (const a of after.assessments)
    if (!seen.has(a.scenario)) out.push({ scenario: a.scenario, change: 'added', after: figures(a) });
  return out.sort(compareIds);
}

/**
 * Justifications the change made stale: stale now and not before, or accepting a finding whose paths
 * or message changed (the reason written for the old finding may no longer hold).
 */
export function staleJustifications(
  before: Analysis,
  after: Analysis,
  matched: readonly [Finding, Finding][],
): StaleJustification[] {
  const staleKeys = (a: Analysis) =>
    new Set(a.findings.filter((f) => f.rule === STALE_JUSTIFICATION).map((f) => justifiedKeyOf(f)!));
  const was = staleKeys(before);
  const out: StaleJustification[] = [...staleKeys(after)]
    .filter((k) => !was.has(k))
    .map((finding) => ({ finding, reason: 'it no longer matches any finding' }));
  for (const [a, b] of matched) {
    if (!b.accepted || !a.accepted) continue;
    if (JSON.stringify(a.paths) !== JSON.stringify(b.paths) || a.message !== b.message)
      out.push({
        finding: b.key,
        reason: 'the finding it accepts changed (paths or wording): check the reason still holds',
      });
  }
  return out.sort((x, y) => (x.finding < y.finding ? -1 : x.finding > y.finding ? 1 : 0));
}
