// The actions list: every unaccepted finding that voids credit or withholds it becomes an action to
// change the design or record a justification, grouped by rule and element so one shared element is one
// action however many scenarios it touches, with what closing it is worth in frequency. Owner, due date
// and status are left for the team to fill in a spreadsheet.
import { stringify } from 'csv-stringify/browser/esm/sync';
import { analyze } from '../analysis/analyze.ts';
import type { Model } from '../model/schema.ts';
import type { ReportDocument, ReportFinding } from './document.ts';
import { csvFigure, guardFormula, LIST_SEPARATOR } from './csv.ts';
import { compareTags, SEVERITY_RANK } from './order.ts';

export interface Action {
  id: string;
  severity: 'voids-credit' | 'needs-justification';
  todo: string;
  element?: string;
  rule: string;
  findings: string[];
  scenarios: string[];
  layers: string[];
  /**
   * Per scenario: the mitigated frequency after independence now, with this action's findings closed, and
   * with every open finding on the same layers closed (an action alone may restore nothing while other
   * findings still void the layer).
   */
  worth?: { scenario: string; now: number; closed: number; layersCleared: number }[];
}

/** Above this many actions the what-if figures are left out: each one re-runs the whole analysis. */
export const MAX_WHAT_IF_ACTIONS = 200;

function todoOf(group: readonly ReportFinding[], layers: readonly string[]): string {
  const f = group[0]!;
  const who = layers.length ? layers.join(', ') : 'the scenario';
  if (f.rule === 'same-make-model')
    return `Use a diverse make or model in ${who}, or record a justification for identical devices: ${f.title}`;
  if (f.element === undefined)
    return `${f.severity === 'voids-credit' ? 'Correct the model or the design' : 'Correct the model, or record a justification'}: ${f.message.replace(/`/g, '')}`;
  return f.severity === 'voids-credit'
    ? `Change the design so that ${who} no longer relies on ${f.element} (${f.title}), or take no credit`
    : `Separate ${who} from ${f.element} (${f.title}), or record a justification that accepts it`;
}

/** Findings that stand open, grouped by rule and element (or by key when no element is named). */
export function groupActions(doc: ReportDocument): Action[] {
  const groups = new Map<string, ReportFinding[]>();
  for (const f of doc.findings) {
    if (f.accepted || f.severity === 'note') continue;
    const key = `${f.rule}\u0000${f.element ?? f.key}`;
    (groups.get(key) ?? groups.set(key, []).get(key)!).push(f);
  }
  const actions = [...groups.values()].map((group) => {
    const layers = [
      ...new Set(
        group.flatMap((f) => f.parties.filter((p) => p.role === 'layer' && p.tag !== undefined).map((p) => p.tag!)),
      ),
    ].sort(compareTags);
    const severity = group.some((f) => f.severity === 'voids-credit')
      ? ('voids-credit' as const)
      : ('needs-justification' as const);
    return {
      id: '',
      severity,
      todo: todoOf(group, layers),
      ...(group[0]!.element !== undefined ? { element: group[0]!.element } : {}),
      rule: group[0]!.rule,
      findings: group.map((f) => f.key),
      scenarios: [...new Set(group.map((f) => f.scenario).filter((s) => s !== undefined))].sort(compareTags),
      layers,
    };
  });
  actions.sort(
    (a, b) =>
      SEVERITY_RANK[a.severity] - SEVERITY_RANK[b.severity] ||
      compareTags(a.scenarios[0] ?? '', b.scenarios[0] ?? '') ||
      compareTags(a.findings[0]!, b.findings[0]!),
  );
  return actions.map((a, i) => ({ ...a, id: `A${i + 1}` }));
}

/**
 * What closing each action is worth: the analysis run again with its findings accepted, as a team would
 * record once the change is made or the justification written. A layer that other findings still void
 * keeps no credit, so an action can be worth nothing on its own; the list says so rather than guess.
 */
export function withWorth(actions: Action[], model: Model, doc: ReportDocument): Action[] {
  if (actions.length > MAX_WHAT_IF_ACTIONS) return actions;
  const now = new Map(doc.scenarios.map((s) => [s.id, s.lopa[1]!.mitigated]));
  const open = doc.findings.filter((f) => !f.accepted && f.severity !== 'note');
  const cache = new Map<string, Map<string, number>>();
  const afterClosing = (keys: readonly string[]): Map<string, number> => {
    const id = [...keys].sort().join(' ');
    let after = cache.get(id);
    if (!after) {
      const closing = keys.map((finding) => ({
        finding,
        by: 'what-if',
        date: '2000-01-01',
        reason: 'what-if: the action is closed',
      }));
      const closed = analyze({ ...model, justifications: [...(model.justifications ?? []), ...closing] });
      cache.set(id, (after = new Map(closed.assessments.map((s) => [s.scenario, s.mitigatedAfter]))));
    }
    return after;
  };
  return actions.map((a) => {
    const closed = afterClosing(a.findings);
    const onLayers = open.filter(
      (f) =>
        f.scenario !== undefined &&
        a.scenarios.includes(f.scenario) &&
        f.parties.some((p) => p.role === 'layer' && p.tag !== undefined && a.layers.includes(p.tag)),
    );
    const cleared = afterClosing([...new Set([...a.findings, ...onLayers.map((f) => f.key)])]);
    return {
      ...a,
      worth: a.scenarios.map((scenario) => ({
        scenario,
        now: now.get(scenario) ?? NaN,
        closed: closed.get(scenario) ?? NaN,
        layersCleared: cleared.get(scenario) ?? NaN,
      })),
    };
  });
}

export const ACTION_COLUMNS = [
  'action',
  'severity',
  'what_to_do',
  'element',
  'rule',
  'scenarios',
  'layers',
  'after_independence_now_per_year',
  'after_independence_if_closed_per_year',
  'after_independence_if_layers_cleared_per_year',
  'findings',
  'owner',
  'due_date',
  'status',
] as const;

/** RFC 4180 like the other CSV report: one row per action; owner, due date and status left blank to fill. */
export function renderActionsCsv(actions: readonly Action[]): string {
  const figures = (a: Action, pick: 'now' | 'closed' | 'layersCleared') =>
    (a.worth ?? []).map((w) => `${w.scenario}=${csvFigure(w[pick])}`).join(LIST_SEPARATOR);
  const records = actions.map((a) => ({
    action: a.id,
    severity: a.severity,
    what_to_do: guardFormula(a.todo),
    element: a.element ?? '',
    rule: a.rule,
    scenarios: a.scenarios.join(LIST_SEPARATOR),
    layers: a.layers.join(LIST_SEPARATOR),
    after_independence_now_per_year: figures(a, 'now'),
    after_independence_if_closed_per_year: figures(a, 'closed'),
    after_independence_if_layers_cleared_per_year: figures(a, 'layersCleared'),
    findings: a.findings.join(LIST_SEPARATOR),
    owner: '',
    due_date: '',
    status: '',
  }));
  return stringify(records, {
    header: true,
    columns: [...ACTION_COLUMNS],
    record_delimiter: '\r\n',
    quoted_match: /^\s|\s$/,
  });
}
