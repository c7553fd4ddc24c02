// Comparing two revisions in the viewer: the page opens an earlier file and the analysis worker runs
// core's revision diff (diffRevisions) from it to what the page shows. Only the changes cross to the
// page: each scenario's verdict change and each finding that is new, gone, or changed its severity or
// acceptance, each with a mark that reads without colour.
import { diffRevisions, type FindingRef, type Model, type Analysis, type VerdictChange } from '@bulkhead/core';

/** How a finding changed from the earlier revision to this one. */
export type FindingChange = 'new' | 'gone' | 'worse' | 'better';

/** A mark and its words for each change; the symbol carries the meaning without colour. */
export const CHANGE_MARKS: Record<VerdictChange | FindingChange, { mark: string; words: string }> = {
  worse: { mark: '▲', words: 'worse' },
  better: { mark: '▼', words: 'better' },
  added: { mark: '+', words: 'new scenario' },
  removed: { mark: '−', words: 'scenario gone' },
  same: { mark: '=', words: 'same verdict' },
  new: { mark: '+', words: 'new finding' },
  gone: { mark: '−', words: 'finding gone' },
};

export interface ChangedFinding {
  change: FindingChange;
  key: string;
  scenario?: string;
  element?: string;
  severity: FindingRef['severity'];
  /** The severity in the earlier revision, when it changed. */
  oldSeverity?: FindingRef['severity'];
  accepted: boolean;
  message: string;
}

/** A revision as the compare names it: its label, and the file it was read from. */
export interface RevisionName {
  /** "MF-100-LOPA-001 rev A" from the model's `document=` and `revision=`; the file name when it states no revision. */
  label: string;
  /** "rev A", for a narrow column head; the file name when the model states no revision. */
  short: string;
  fileName: string;
}

export function revisionName(
  site: { document?: string | undefined; revision?: string | undefined },
  fileName: string,
): RevisionName {
  if (site.revision === undefined) return { label: fileName, short: fileName, fileName };
  const short = `rev ${site.revision}`;
  return { label: site.document !== undefined ? `${site.document} ${short}` : short, short, fileName };
}

/** "MF-100-LOPA-001 rev A (marrow-fen.bulk)": the label with its file, or the file name alone. */
export function revisionWords(revision: RevisionName): string {
  return revision.label === revision.fileName ? revision.fileName : `${revision.label} (${revision.fileName})`;
}

export interface CompareView {
  /** The earlier revision, compared with. */
  old: RevisionName;
  /** The revision the page shows. */
  now: RevisionName;
  /** Each scenario of either revision (by its id in this one), with how its verdict changed and why. */
  scenarios: { scenario: string; change: VerdictChange; why?: string }[];
  findings: ChangedFinding[];
}

const SEVERITY_ORDER = { note: 0, 'needs-justification': 1, 'voids-credit': 2 } as const;

/** An accepted finding, or a note, costs no credit: a change towards either is for the better. */
const weight = (f: FindingRef) => (f.accepted ? 0 : SEVERITY_ORDER[f.severity]);

export function compareView(
  old: { model: Model; analysis: Analysis; fileName: string },
  now: { model: Model; analysis: Analysis; fileName: string },
): CompareView {
  const diff = diffRevisions(
    { model: old.model, analysis: old.analysis, label: old.fileName },
    { model: now.model, analysis: now.analysis, label: now.fileName },
  );
  const ref = (f: FindingRef, change: FindingChange, oldRef?: FindingRef): ChangedFinding => ({
    change,
    key: f.key,
    ...(f.scenario !== undefined ? { scenario: f.scenario } : {}),
    ...(f.element !== undefined ? { element: f.element } : {}),
    severity: f.severity,
    ...(oldRef && oldRef.severity !== f.severity ? { oldSeverity: oldRef.severity } : {}),
    accepted: f.accepted,
    message: f.message,
  });
  const direction = (o: FindingRef, n: FindingRef): FindingChange =>
    (weight(n) - weight(o) || SEVERITY_ORDER[n.severity] - SEVERITY_ORDER[o.severity]) > 0 ? 'worse' : 'better';
  const changed = [...diff.severityChanged, ...diff.acceptanceChanged].map((c) =>
    ref(c.new, direction(c.old, c.new), c.old),
  );
  return {
    old: revisionName(old.model.site, old.fileName),
    now: revisionName(now.model.site, now.fileName),
    scenarios: diff.verdicts.map((v) => ({
      scenario: v.scenario,
      change: v.change,
      ...(v.why !== undefined ? { why: v.why } : {}),
    })),
    findings: [...diff.appeared.map((f) => ref(f, 'new')), ...diff.disappeared.map((f) => ref(f, 'gone')), ...changed],
  };
}

/** Which change of a finding shows on its element's box when it has several: the worst news first. */
const SHOWN_FIRST: FindingChange[] = ['worse', 'new', 'better', 'gone'];

/** The elements of one scenario whose findings changed, each with the change to show on its box. */
export function changedElements(
  view: CompareView,
  scenario: string | undefined,
): Map<string, { change: FindingChange; mark: string; words: string }> {
  const shown = new Map<string, { change: FindingChange; mark: string; words: string }>();
  for (const change of SHOWN_FIRST) {
    for (const f of view.findings) {
      if (f.change !== change || f.element === undefined || f.scenario !== scenario || shown.has(f.element)) continue;
      shown.set(f.element, { change, ...CHANGE_MARKS[change] });
    }
  }
  return shown;
}
