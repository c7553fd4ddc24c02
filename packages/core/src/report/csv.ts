// The CSV report (RFC 4180, written by csv-stringify): one row per scenario, claimed layer and traced
// element, with the verdict columns repeated on each row so an auditor can filter it in a spreadsheet;
// then one row per finding that no layer row shows (about the cause, a modifier, or the model itself).
import { stringify } from 'csv-stringify/browser/esm/sync';
import type { LayerReport, ReportDocument, ScenarioReport } from './document.ts';

export const CSV_COLUMNS = [
  'row_kind',
  'scenario',
  'scenario_title',
  'category',
  'tolerable_per_year',
  'cause',
  'cause_frequency_per_year',
  'layer',
  'layer_kind',
  'layer_title',
  'claimed_pfd',
  'claimed_pfd_origin',
  'allowed_pfd',
  'verdict',
  'credited_after_independence',
  'credited_if_accepted',
  'layer_missing',
  'layer_findings',
  'element',
  'element_kind',
  'element_group',
  'element_title',
  'element_in_cause',
  'element_path',
  'element_findings',
  'element_worst_severity',
  'element_findings_accepted',
  'mitigated_after_per_year',
  'meets_after',
  'required_sil',
] as const;

export type CsvColumn = (typeof CSV_COLUMNS)[number];

/** Lists inside one cell: tags never hold a space (see TAG_PATTERN), so a space separates them. */
export const LIST_SEPARATOR = ' ';
export const PATH_SEPARATOR = ' -> ';

/**
 * A spreadsheet runs a cell that begins with = + - @ (or a tab or carriage return) as a formula. Free text
 * from the model gets a leading apostrophe there, which spreadsheets show as text; the README says so.
 */
export function guardFormula(text: string): string {
  return /^[=+\-@\t\r]/.test(text) ? `'${text}` : text;
}

/** Significant figures a CSV figure keeps: enough for any engineering figure, none of the binary noise. */
export const CSV_SIGNIFICANT_FIGURES = 6;

/**
 * A figure for a CSV cell, rounded to CSV_SIGNIFICANT_FIGURES so 0.1 x 0.1 prints 0.01, not
 * 0.010000000000000002; trailing zeros dropped, and exponent form where JavaScript uses it (1e-7), which
 * spreadsheets read as a number. The JSON report keeps every figure in full.
 */
export function csvFigure(value: number): string {
  return Number.isFinite(value) ? String(Number(value.toPrecision(CSV_SIGNIFICANT_FIGURES))) : String(value);
}

const yesNo = (value: boolean) => (value ? 'yes' : 'no');
const SEVERITY_ORDER = ['voids-credit', 'needs-justification', 'note'] as const;

type Findings = Map<string, ReportDocument['findings'][number]>;

function rowsOf(byKey: Findings, s: ScenarioReport, layer: LayerReport): Record<CsvColumn, string>[] {
  const common = {
    row_kind: 'element',
    scenario: s.id,
    scenario_title: guardFormula(s.title ?? ''),
    category: s.category,
    tolerable_per_year: csvFigure(s.tolerable),
    cause: guardFormula(s.cause.label),
    cause_frequency_per_year: csvFigure(s.cause.frequency.value),
    layer: layer.function,
    layer_kind: layer.kind,
    layer_title: guardFormula(layer.title ?? ''),
    claimed_pfd: csvFigure(layer.claimedPfd.value),
    claimed_pfd_origin: layer.claimedPfd.origin,
    allowed_pfd: csvFigure(layer.allowedPfd),
    verdict: layer.verdict,
    credited_after_independence: yesNo(layer.credited),
    credited_if_accepted: yesNo(layer.creditedIfAccepted),
    layer_missing: layer.missing.join(LIST_SEPARATOR),
    layer_findings: layer.findings.join(LIST_SEPARATOR),
    mitigated_after_per_year: csvFigure(s.lopa[1]!.mitigated),
    meets_after: yesNo(s.lopa[1]!.meets),
    required_sil: s.sif ? String(s.sif.sil) : '',
  };
  const noElement = {
    element: '',
    element_kind: '',
    element_group: '',
    element_title: '',
    element_in_cause: '',
    element_path: '',
    element_findings: '',
    element_worst_severity: '',
    element_findings_accepted: '',
  };
  // A layer with nothing traced still gets its row: an empty element list is itself evidence.
  if (layer.elements.length === 0) return [{ ...common, ...noElement, row_kind: 'layer' }];
  return layer.elements.map((e) => {
    const findings = e.findings.map((k) => byKey.get(k)).filter((f) => f !== undefined);
    const worst = SEVERITY_ORDER.find((sev) => findings.some((f) => f.severity === sev)) ?? '';
    const accepted = findings.filter((f) => f.accepted).length;
    return {
      ...common,
      element: e.tag,
      element_kind: e.kind,
      element_group: e.group,
      element_title: guardFormula(e.title ?? ''),
      element_in_cause: yesNo(e.inCause),
      element_path: e.path.join(PATH_SEPARATOR),
      element_findings: e.findings.join(LIST_SEPARATOR),
      element_worst_severity: worst,
      element_findings_accepted:
        findings.length === 0 ? '' : accepted === findings.length ? 'all' : accepted === 0 ? 'none' : 'some',
    };
  });
}

/** A finding no layer row names: its key, severity and acceptance in the element finding columns. */
function findingRow(f: ReportDocument['findings'][number]): Record<CsvColumn, string> {
  const row = Object.fromEntries(CSV_COLUMNS.map((c) => [c, ''])) as Record<CsvColumn, string>;
  return {
    ...row,
    row_kind: 'finding',
    scenario: f.scenario ?? '',
    element: f.element ?? '',
    element_findings: f.key,
    element_worst_severity: f.severity,
    element_findings_accepted: f.accepted ? 'all' : 'none',
  };
}

export function renderCsv(doc: ReportDocument): string {
  const byKey: Findings = new Map(doc.findings.map((f) => [f.key, f]));
  const records = doc.scenarios.flatMap((s) => s.layers.flatMap((layer) => rowsOf(byKey, s, layer)));
  const shown = new Set(
    records.flatMap((r) => [...r.layer_findings.split(LIST_SEPARATOR), ...r.element_findings.split(LIST_SEPARATOR)]),
  );
  records.push(...doc.findings.filter((f) => !shown.has(f.key)).map(findingRow));
  // RFC 4180: CRLF line ends, a header row, fields quoted when they must be (and when a space at either
  // end would otherwise be trimmed by a spreadsheet).
  return stringify(records, {
    header: true,
    columns: [...CSV_COLUMNS],
    record_delimiter: '\r\n',
    quoted_match: /^\s|\s$/,
  });
}
