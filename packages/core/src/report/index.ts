// Reports: the evidence list for reviewers and auditors in Markdown, HTML, CSV, JSON and SARIF.
// Pure TypeScript with no Node APIs, so the viewer can render the same reports in the browser.
import { buildReportDocument, type ReportInput } from './build.ts';
import { renderCsv } from './csv.ts';
import { renderHtml } from './html.ts';
import { layoutReport } from './layout.ts';
import { renderMarkdown } from './markdown.ts';
import { renderSarif } from './sarif.ts';

export const REPORT_FORMATS = ['md', 'html', 'csv', 'json', 'sarif'] as const;
export type ReportFormat = (typeof REPORT_FORMATS)[number];

export function isReportFormat(word: string): word is ReportFormat {
  return (REPORT_FORMATS as readonly string[]).includes(word);
}

/** Renders one report. The same input gives byte-identical output: nothing here reads a clock or a locale. */
export function renderReport(input: ReportInput, format: ReportFormat): string {
  const doc = buildReportDocument(input, { siteWide: format === 'json' });
  switch (format) {
    case 'json':
      return `${JSON.stringify(doc, null, 2)}\n`;
    case 'md':
      return renderMarkdown(layoutReport(doc));
    case 'html':
      return renderHtml(layoutReport(doc), `Independence evidence list: ${doc.site.name}`);
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
export { CSV_COLUMNS, LIST_SEPARATOR, PATH_SEPARATOR, guardFormula } from './csv.ts';
export { SARIF_LEVELS, FINGERPRINT } from './sarif.ts';
export { escapeHtml } from './html.ts';
export { escapeMarkdown } from './markdown.ts';
export { compareTags } from './order.ts';
export { renderCutSetsText, renderCommonCausesText, renderCommonCausesCsv, COMMON_CAUSE_CSV_COLUMNS, CUT_SET_METHOD } from './site-wide.ts';
