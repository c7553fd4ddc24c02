// The LOPA worksheet: one row per scenario and claimed layer, in the order a LOPA team reads a scenario
// (where it comes from in the hazard study, criterion, cause, enablers and modifiers, each layer with its
// PFD, independence verdict and the element that decides it, then the mitigated frequency as claimed and
// after independence, the gap and what the SIF must reach). Markdown, HTML and CSV render the same rows.
import type { LayerReport, ReportDocument, ScenarioReport } from './document.ts';
import type { Block } from './blocks.ts';
import { issueBlock, signOff } from './control-layout.ts';
import { decidingReasons, decidingText } from './deciding.ts';
import { stringify } from 'csv-stringify/browser/esm/sync';
import { csvFigure, guardFormula } from './csv.ts';
import { formatFrequency, formatProbability, formatRatio, gapText } from './text.ts';

export const WORKSHEET_COLUMNS = [
  'scenario',
  'scenario_title',
  'study_reference',
  'category',
  'tolerable_per_year',
  'cause',
  'cause_frequency_per_year',
  'cause_basis',
  'enablers',
  'modifiers',
  'layer',
  'layer_kind',
  'pfd_claimed',
  'pfd_allowed',
  'independence',
  'decided_by',
  'credited_after_independence',
  'mitigated_claimed_per_year',
  'mitigated_after_per_year',
  'ratio_to_tolerable',
  'demand_mode',
  'required_rrf',
  'required_pfh_per_hour',
  'required_sil',
] as const;

export type WorksheetColumn = (typeof WORKSHEET_COLUMNS)[number];
/** Numbers stay numbers so each format rounds them its own one way (text to two, CSV to six significant figures). */
export type WorksheetRow = Record<WorksheetColumn, string | number | undefined>;

/** "study HS-100 rev 2, node 3, deviation high level, recommendations R-12 R-14". */
export function studyText(s: ScenarioReport): string {
  const st = s.study;
  if (!st) return '';
  return [
    st.document !== undefined ? `study ${st.document}` : '',
    st.node !== undefined ? `node ${st.node}` : '',
    st.deviation !== undefined ? `deviation ${st.deviation}` : '',
    st.recommendations
      ? `recommendation${st.recommendations.length === 1 ? '' : 's'} ${st.recommendations.join(' ')}`
      : '',
  ]
    .filter(Boolean)
    .join(', ');
}

function basisOf(value: ScenarioReport['cause']['frequency']): string {
  if (value.origin === 'model') return value.basis ?? 'given, no basis stated';
  return `${value.origin === 'default' ? 'default' : 'SIL band'}${value.basis ? `: ${value.basis}` : ''}`;
}

function factors(
  list: readonly { title?: string | undefined; kind?: string | undefined; probability: number; allowed: boolean }[],
): string {
  return list
    .map((f) => `${f.title ?? f.kind} ${formatProbability(f.probability)}${f.allowed ? '' : ' (not applied)'}`)
    .join('; ');
}

function decidedBy(layer: LayerReport): string {
  if (layer.verdict === 'independent') return '';
  if (layer.verdict === 'unverified' && layer.missing.length) return `missing: ${layer.missing.join(', ')}`;
  const { deciding, open } = decidingReasons(layer.reasons);
  const accepted = (layer.reasons ?? []).filter((r) => r.accepted).map((r) => r.element ?? r.rule);
  const text = decidingText(deciding) + (open ? `; ${open} open finding${open === 1 ? '' : 's'} too` : '');
  return text || (accepted.length ? `accepted: ${[...new Set(accepted)].join(', ')}` : '');
}

function rowOf(s: ScenarioReport, layer: LayerReport | undefined): WorksheetRow {
  return {
    scenario: s.id,
    scenario_title: s.title,
    study_reference: studyText(s),
    category: s.category,
    tolerable_per_year: s.tolerable,
    cause: s.cause.label,
    cause_frequency_per_year: s.cause.frequency.value,
    cause_basis: basisOf(s.cause.frequency),
    enablers: factors(s.enablers),
    modifiers: factors(s.modifiers),
    layer: layer?.function ?? 'none claimed',
    layer_kind: layer?.kind,
    pfd_claimed: layer?.claimedPfd.value,
    pfd_allowed: layer?.allowedPfd,
    independence: layer?.verdict,
    decided_by: layer ? decidedBy(layer) : '',
    credited_after_independence: layer ? (layer.credited ? 'yes' : 'no') : undefined,
    mitigated_claimed_per_year: s.lopa[0]!.mitigated,
    mitigated_after_per_year: s.lopa[1]!.mitigated,
    ratio_to_tolerable: s.gap,
    demand_mode: s.sif?.mode,
    required_rrf: s.sif && !s.sif.noReductionNeeded && s.sif.mode === 'low-demand' ? s.sif.requiredRrf : undefined,
    required_pfh_per_hour:
      s.sif && !s.sif.noReductionNeeded && s.sif.mode === 'high-demand' ? s.sif.requiredPfh : undefined,
    required_sil: s.sif ? (s.sif.noReductionNeeded ? 'none' : s.sif.sil) : undefined,
  };
}

/** One row per scenario and claimed layer; a scenario with no layer still has its row. */
export function worksheetRows(doc: ReportDocument): WorksheetRow[] {
  return doc.scenarios.flatMap((s) => (s.layers.length ? s.layers.map((l) => rowOf(s, l)) : [rowOf(s, undefined)]));
}

/** The row as the Markdown and HTML worksheet print it: rounded figures, units, words. */
export function worksheetCells(row: WorksheetRow, first: boolean): string[] {
  const frequency = (x: unknown) => (typeof x === 'number' ? formatFrequency(x) : '');
  const probability = (x: unknown) => (typeof x === 'number' ? formatProbability(x) : '');
  const sil =
    row.required_sil === undefined
      ? ''
      : row.required_sil === 'none'
        ? 'none needed'
        : Number(row.required_sil) >= 5
          ? 'beyond SIL 4'
          : Number(row.required_sil) === 0
            ? 'no SIL'
            : `SIL ${row.required_sil}`;
  // Scenario figures are printed on the scenario's first row only, so each reads once.
  const scenario = (text: string) => (first ? text : '');
  return [
    scenario([row.scenario, row.scenario_title, row.study_reference].filter(Boolean).join(': ')),
    scenario(`${row.category}; ${frequency(row.tolerable_per_year)}`),
    scenario(`${row.cause}; ${frequency(row.cause_frequency_per_year)} (${row.cause_basis})`),
    scenario(
      [row.enablers ? `enablers: ${row.enablers}` : '', row.modifiers ? `modifiers: ${row.modifiers}` : '']
        .filter(Boolean)
        .join('; '),
    ),
    `${row.layer}${row.layer_kind ? ` (${row.layer_kind})` : ''}`,
    row.pfd_claimed === undefined ? '' : `${probability(row.pfd_claimed)} / ${probability(row.pfd_allowed)}`,
    `${row.independence ?? ''}${row.decided_by ? `${row.independence === 'voided' ? ' by ' : ': '}${row.decided_by}` : ''}`,
    scenario(frequency(row.mitigated_claimed_per_year)),
    scenario(frequency(row.mitigated_after_per_year)),
    scenario(typeof row.ratio_to_tolerable === 'number' ? gapText(row.ratio_to_tolerable) : ''),
    scenario(
      [
        typeof row.required_rrf === 'number' ? `RRF ${formatRatio(row.required_rrf)}` : '',
        typeof row.required_pfh_per_hour === 'number'
          ? `PFH ${formatProbability(row.required_pfh_per_hour)} /h (high demand)`
          : '',
        sil,
      ]
        .filter(Boolean)
        .join(', '),
    ),
  ];
}

export const WORKSHEET_HEAD = [
  'Scenario and hazard-study reference',
  'Category; tolerable',
  'Initiating cause; frequency (basis)',
  'Enablers and modifiers',
  'Layer',
  'PFD claimed / allowed',
  'Independence, decided by',
  'Mitigated as claimed',
  'Mitigated after independence',
  'Against tolerable',
  'SIF must reach',
];

/** The worksheet as a document: the issue block, the caution, one table, and the lines to sign. */
export function layoutWorksheet(doc: ReportDocument): Block[] {
  const rows = worksheetRows(doc);
  return [
    { type: 'heading', level: 1, text: [`LOPA worksheet: ${doc.site.name}`] },
    issueBlock(doc),
    { type: 'caution', title: 'Caution', items: doc.cautions.map((c) => [c]) },
    {
      type: 'paragraph',
      text: [
        'One row per scenario and claimed layer; the scenario figures are printed on its first row. PFDs and frequencies to two significant figures (the CSV worksheet holds them in full). The evidence list gives the findings behind each verdict.',
      ],
    },
    {
      type: 'table',
      caption: 'LOPA worksheet, before and after independence',
      head: WORKSHEET_HEAD,
      rows: rows.map((row, i) =>
        worksheetCells(row, i === 0 || rows[i - 1]!.scenario !== row.scenario).map((cell) => [cell]),
      ),
      rowHeaders: false,
      compact: true,
    },
    ...signOff(doc),
  ];
}

/** RFC 4180, CRLF, one row per scenario and layer, figures to six significant figures (csvFigure). */
export function renderWorksheetCsv(doc: ReportDocument): string {
  const records = worksheetRows(doc).map((row) =>
    Object.fromEntries(
      WORKSHEET_COLUMNS.map((c) => [
        c,
        row[c] === undefined ? '' : typeof row[c] === 'number' ? csvFigure(row[c]) : guardFormula(String(row[c])),
      ]),
    ),
  );
  return stringify(records, {
    header: true,
    columns: [...WORKSHEET_COLUMNS],
    record_delimiter: '\r\n',
    quoted_match: /^\s|\s$/,
  });
}
