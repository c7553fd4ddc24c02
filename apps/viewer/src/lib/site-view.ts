// What the page needs from a model and its analysis, computed in the analysis worker: a short summary of
// the site and, per focus, the scene to lay out with its assessment and findings. The model and the
// analysis stay in the worker; only these small pieces cross to the page, so a large site never makes
// the page copy or walk all of it.
import {
  rankCommonCauses,
  RANKING_ORDER,
  SEVERITY_RANK,
  type Analysis,
  type Finding,
  type LayerVerdict,
  type Model,
  type RankedCommonCause,
  type ScenarioAssessment,
} from '@bulkhead/core';
import { scenarioScene, siteOverview, type Scene } from '@bulkhead/layout';

export interface ScenarioRow {
  id: string;
  title?: string;
  claimed?: boolean;
  after?: boolean;
  /** Unaccepted findings above note level. */
  open: number;
  /** The claimed layers' functions in order (layer 1 first), to name the sides of a finding. */
  layers: string[];
  /** Each claimed layer's verdict after independence, in the same order (for the all-scenarios matrix). */
  verdicts: LayerVerdict[];
  category?: string;
  /** Mitigated frequency after independence over the tolerable one. */
  gap?: number;
  /** SIL the scenario asks of a SIF (0: none; 5: beyond SIL 4). */
  sil?: number;
}

/** One tag that matches a search, with the scenarios whose cause or layers rely on it. */
export interface TagMatch {
  tag: string;
  what: 'element' | 'function';
  kind: string;
  title?: string;
  scenarios: string[];
}

/** A search answers at most this many tags. */
export const SEARCH_LIMIT = 25;

export interface SiteSummary {
  siteName: string;
  /** The model's document number and revision (`site document= revision=`), for the title block and the compare. */
  document?: string;
  revision?: string;
  elements: number;
  functions: number;
  scenarios: ScenarioRow[];
  findings: number;
}

export interface FocusView {
  /** The scenario in focus; undefined for the site overview. */
  focus?: string;
  scene: Scene;
  assessment?: ScenarioAssessment;
  /** The scenario's findings; for the overview, those of the whole site up to OVERVIEW_FINDINGS_SHOWN. */
  findings: Finding[];
  /** How many findings there are in all for this focus (more than `findings` holds in a large overview). */
  findingTotal: number;
}

/** The overview lists this many findings at most; past it, it points to the scenarios. */
export const OVERVIEW_FINDINGS_SHOWN = 100;

const isOpen = (f: Finding) => f.severity !== 'note' && !f.accepted;

export function summariseSite(model: Model, analysis: Analysis): SiteSummary {
  const assessments = new Map(analysis.assessments.map((a) => [a.scenario, a]));
  const open = new Map<string, number>();
  for (const f of analysis.findings)
    if (f.scenario !== undefined && isOpen(f)) open.set(f.scenario, (open.get(f.scenario) ?? 0) + 1);
  return {
    siteName: model.site.name,
    ...(model.site.document !== undefined ? { document: model.site.document } : {}),
    ...(model.site.revision !== undefined ? { revision: model.site.revision } : {}),
    elements: model.elements.length,
    functions: model.functions.length,
    findings: analysis.findings.length,
    scenarios: model.scenarios.map((s) => {
      const a = assessments.get(s.id);
      return {
        id: s.id,
        ...(s.title ? { title: s.title } : {}),
        ...(a ? { claimed: a.meetsClaimed, after: a.meetsAfter } : {}),
        open: open.get(s.id) ?? 0,
        layers: (s.layers ?? []).map((l) => l.function),
        verdicts: (s.layers ?? []).map(
          (l) => a?.layers.find((x) => x.function === l.function)?.verdict ?? 'unverified',
        ),
        category: s.category,
        ...(a ? { gap: a.gap, ...(a.sif ? { sil: a.sif.sil } : {}) } : {}),
      };
    }),
  };
}

export function focusView(model: Model, analysis: Analysis, focus: string | undefined): FocusView {
  if (focus !== undefined && model.scenarios.some((s) => s.id === focus)) {
    const findings = analysis.findings.filter((f) => f.scenario === focus);
    const assessment = analysis.assessments.find((a) => a.scenario === focus);
    return {
      focus,
      scene: scenarioScene(model, analysis, focus),
      ...(assessment ? { assessment } : {}),
      findings,
      findingTotal: findings.length,
    };
  }
  // The most severe first across the site; the sort is stable, so scenario order holds within a severity.
  const shown = [...analysis.findings]
    .sort((a, b) => SEVERITY_RANK[b.severity] - SEVERITY_RANK[a.severity])
    .slice(0, OVERVIEW_FINDINGS_SHOWN);
  return {
    scene: siteOverview(model, analysis),
    findings: shown,
    findingTotal: analysis.findings.length,
  };
}

/**
 * Tags across the whole site that contain `query` (case-insensitive), whole-tag matches first, then in
 * natural order; each with the scenarios whose cause or claimed layers rely on it (or are it).
 */
export function searchTags(model: Model, analysis: Analysis, query: string): TagMatch[] {
  const q = query.trim().toLowerCase();
  if (q === '') return [];
  const natural = new Intl.Collator('en', { numeric: true });
  const hits = [
    ...model.elements.map((e) => ({ tag: e.tag, what: 'element' as const, kind: e.kind, title: e.title })),
    ...model.functions.map((f) => ({ tag: f.tag, what: 'function' as const, kind: f.kind, title: f.title })),
  ]
    .filter((h) => h.tag.toLowerCase().includes(q))
    .sort(
      (a, b) => Number(b.tag.toLowerCase() === q) - Number(a.tag.toLowerCase() === q) || natural.compare(a.tag, b.tag),
    )
    .slice(0, SEARCH_LIMIT);
  const relying = new Map<string, Set<string>>();
  for (const h of hits) relying.set(h.tag, new Set([h.tag]));
  for (const t of analysis.traces) for (const e of t.elements) relying.get(e.tag)?.add(t.function);
  return hits.map((h) => {
    const fns = relying.get(h.tag)!;
    const scenarios = model.scenarios
      .filter((s) =>
        [s.cause.function ?? s.cause.element, ...(s.layers ?? []).map((l) => l.function)].some(
          (t) => t !== undefined && fns.has(t),
        ),
      )
      .map((s) => s.id);
    return { tag: h.tag, what: h.what, kind: h.kind, ...(h.title ? { title: h.title } : {}), scenarios };
  });
}

/** The matrix shows this many elements of the common-cause ranking at most. */
export const RANKING_SHOWN = 25;

/** The top of the site-wide common-cause ranking (core's rankCommonCauses), with its order in words. */
export interface RankingView {
  rows: RankedCommonCause[];
  /** How many elements the ranking holds in all (more than `rows` on a large site). */
  total: number;
  order: string;
}

export function rankingView(model: Model, analysis: Analysis): RankingView {
  const all = rankCommonCauses(model, analysis);
  return { rows: all.slice(0, RANKING_SHOWN), total: all.length, order: RANKING_ORDER };
}
