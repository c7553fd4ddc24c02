// Reports: the evidence list for reviewers and auditors in Markdown, HTML, CSV, JSON and SARIF.
// Pure TypeScript with no Node APIs, so the viewer can render the same reports in the browser.
import { buildReportDocument, type ReportInput } from './build.ts';
import { renderCsv } from './csv.ts';
import { renderHtml } from './html.ts';
import { layoutReport } from './layout.ts';
import { renderMarkdown } from './markdown.ts';
import { renderSarif } from './sarif.ts';
import { runningFooter } from './control-layout.ts';
import { layoutWorksheet, renderWorksheetCsv } from './worksheet.ts';
import { groupActions, renderActionsCsv, withWorth } from './actions.ts';

export const REPORT_FORMATS = ['md', 'html', 'csv', 'json', 'sarif'] as const;
export type ReportFormat = (typeof REPORT_FORMATS)[number];

/** What a report holds: the evidence list (every format), the LOPA worksheet, or the actions list. */
export const REPORT_CONTENTS = ['evidence', 'worksheet', 'actions'] as const;
export type ReportContents = (typeof REPORT_CONTENTS)[number];
export const FORMATS_OF: Record<ReportContents, readonly ReportFormat[]> = {
  evidence: REPORT_FORMATS,
  worksheet: ['md', 'html', 'csv'],
  actions: ['csv'],
};

/** The evidence-list formats that show the minimal cut sets and the common-cause ranking. */
const SITE_WIDE_FORMATS: readonly ReportFormat[] = ['json', 'md', 'html'];

export function isReportFormat(word: string): word is ReportFormat {
  return (REPORT_FORMATS as readonly string[]).includes(word);
}

export function isReportContents(word: string): word is ReportContents {
  return (REPORT_CONTENTS as readonly string[]).includes(word);
}

/** Renders one report. The same input gives byte-identical output: nothing here reads a clock or a locale. */
export function renderReport(input: ReportInput, format: ReportFormat, contents: ReportContents = 'evidence'): string {
  if (!FORMATS_OF[contents].includes(format)) throw new Error(`the ${contents} report has no ${format} format`);
  // Cut sets and the ranking cost more than the analysis; only the evidence list in JSON, Markdown and HTML shows them.
  const doc = buildReportDocument(input, { siteWide: contents === 'evidence' && SITE_WIDE_FORMATS.includes(format) });
  const footer = runningFooter(doc);
  if (contents === 'worksheet') {
    if (format === 'csv') return renderWorksheetCsv(doc);
    const blocks = layoutWorksheet(doc);
    return format === 'md'
      ? renderMarkdown(blocks)
      : renderHtml(blocks, `LOPA worksheet: ${doc.site.name}`, { footer, landscape: true });
  }
  if (contents === 'actions') return renderActionsCsv(withWorth(groupActions(doc), input.model, doc));
  switch (format) {
    case 'json':
      return `${JSON.stringify(doc, null, 2)}\n`;
    case 'md':
      return renderMarkdown(layoutReport(doc));
    case 'html':
      return renderHtml(layoutReport(doc), `Independence evidence list: ${doc.site.name}`, { footer });
    case 'csv':
      return renderCsv(doc);
    case 'sarif':
      return renderSarif(doc, input);
  }
}

export { buildReportDocument, CAUTIONS, CONVENTIONS, type ReportInput } from './build.ts';
export {
  ReportDocument,
  REPORT_FORMAT_VERSION,
  reportJsonSchema,
  type LayerReport,
  type ReportFinding,
  type ScenarioReport,
} from './document.ts';
export {
  CSV_COLUMNS,
  CSV_SIGNIFICANT_FIGURES,
  LIST_SEPARATOR,
  PATH_SEPARATOR,
  csvFigure,
  guardFormula,
} from './csv.ts';
export { SARIF_LEVELS, FINGERPRINT } from './sarif.ts';
export { escapeHtml } from './html.ts';
export { escapeMarkdown } from './markdown.ts';
export { compareTags } from './order.ts';
export { WORKSHEET_COLUMNS, worksheetRows, type WorksheetRow } from './worksheet.ts';
export { ACTION_COLUMNS, groupActions, withWorth, type Action } from './actions.ts';
export { decidingReasons, decidingText, type Deciding } from './deciding.ts';
export { sourceList, splitCitations, readCitation, type SourceEntry } from './sources.ts';
export {
  renderCutSetsText,
  renderCommonCausesText,
  renderCommonCausesCsv,
  COMMON_CAUSE_CSV_COLUMNS,
  CUT_SET_METHOD,
} from './site-wide.ts';
