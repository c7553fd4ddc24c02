// Revision diff: what one revision of a model did to independence compared with another. Everything is
// sorted by tag or key, so reordering statements in either file changes nothing in the answer.
import { analyze } from '../analysis/analyze.ts';
import type { Model } from '../model/schema.ts';
import { buildReportDocument, type ReportInput } from '../report/build.ts';
import { renderSarif } from '../report/sarif.ts';
import type { Analysis } from '../vocabulary/types.ts';
import {
  compareFindings,
  compareVerdicts,
  staleJustifications,
  type FindingChanges,
  type ScenarioVerdict,
  type StaleJustification,
} from './compare-analysis.ts';
import { compareModels, type ModelChanges } from './compare-model.ts';

export type { AttributeChange, ItemChanges, ItemKind, ModelChanges, Rename } from './compare-model.ts';
export type {
  FindingChanges,
  FindingRef,
  ScenarioFigures,
  ScenarioVerdict,
  StaleJustification,
  VerdictChange,
} from './compare-analysis.ts';
export { renderDiffText, renderDiffMarkdown } from './render.ts';

/** The version of the JSON diff; it changes only when a field changes meaning or goes away. */
export const DIFF_FORMAT_VERSION = 1;

export interface Revision {
  model: Model;
  /** How the user named it: a file, or FILE@REV for a git revision. */
  label: string;
  analysis?: Analysis;
}

export interface DiffSummary {
  worse: number;
  better: number;
  same: number;
  addedScenarios: number;
  removedScenarios: number;
  /** Added scenarios that fall short of their criterion: counted as worse by --fail-on worse. */
  addedFallingShort: number;
  findingsAppeared: number;
  findingsDisappeared: number;
  severityChanged: number;
  acceptanceChanged: number;
  staleJustifications: number;
  modelChanges: number;
}

export interface RevisionDiff extends ModelChanges, FindingChanges {
  formatVersion: typeof DIFF_FORMAT_VERSION;
  old: string;
  new: string;
  summary: DiffSummary;
  verdicts: ScenarioVerdict[];
  staleJustifications: StaleJustification[];
}

export function diffRevisions(before: Revision, after: Revision): RevisionDiff {
  const oldAnalysis = before.analysis ?? analyze(before.model);
  const newAnalysis = after.analysis ?? analyze(after.model);
  const model = compareModels(before.model, after.model);
  const { matched, ...findings } = compareFindings(oldAnalysis.findings, newAnalysis.findings, model.renames);
  const verdicts = compareVerdicts(oldAnalysis, newAnalysis, model.renames);
  const stale = staleJustifications(oldAnalysis, newAnalysis, matched);
  const count = (change: ScenarioVerdict['change']) => verdicts.filter((v) => v.change === change).length;
  const items = [model.elements, model.functions, model.scenarios];
  return {
    formatVersion: DIFF_FORMAT_VERSION,
    old: before.label,
    new: after.label,
    summary: {
      worse: count('worse'),
      better: count('better'),
      same: count('same'),
      addedScenarios: count('added'),
      removedScenarios: count('removed'),
      addedFallingShort: verdicts.filter((v) => v.change === 'added' && !v.after!.meets).length,
      findingsAppeared: findings.appeared.length,
      findingsDisappeared: findings.disappeared.length,
      severityChanged: findings.severityChanged.length,
      acceptanceChanged: findings.acceptanceChanged.length,
      staleJustifications: stale.length,
      modelChanges:
        model.renames.length +
        model.settings.length +
        items.reduce((n, i) => n + i.added.length + i.removed.length + i.changed.length, 0) +
        model.justifications.added.length +
        model.justifications.removed.length +
        model.justifications.changed.length,
    },
    ...model,
    ...findings,
    verdicts,
    staleJustifications: stale,
  };
}

/**
 * Whether the change made anything worse: a scenario, a new scenario falling short, or an open finding
 * above a note that is new, more severe, or no longer accepted.
 */
export function madeWorse(diff: RevisionDiff): boolean {
  const openAbove = (f: { accepted: boolean; severity: string }) => !f.accepted && f.severity !== 'note';
  const rank = { note: 0, 'needs-justification': 1, 'voids-credit': 2 } as const;
  return (
    diff.summary.worse > 0 ||
    diff.summary.addedFallingShort > 0 ||
    diff.appeared.some(openAbove) ||
    diff.severityChanged.some((c) => openAbove(c.new) && rank[c.new.severity] > rank[c.old.severity]) ||
    diff.acceptanceChanged.some((c) => openAbove(c.new))
  );
}

/** No change at all: what `diff A A` must give. */
export function isEmptyDiff(diff: RevisionDiff): boolean {
  return Object.values(diff.summary).every((n, i) => Object.keys(diff.summary)[i] === 'same' || n === 0);
}

/** SARIF 2.1.0 of the findings the new revision added (appeared, or raised in severity), for code review. */
export function renderDiffSarif(diff: RevisionDiff, input: ReportInput): string {
  const doc = buildReportDocument(input, { siteWide: false });
  const fresh = new Set([...diff.appeared.map((f) => f.key), ...diff.severityChanged.map((c) => c.new.key)]);
  return renderSarif({ ...doc, findings: doc.findings.filter((f) => fresh.has(f.key)) }, input);
}
