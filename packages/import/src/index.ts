// The public API of @bulkhead/import: plant data from tables (CSV, XLSX) into a generated .bulk part
// file, and a model back out as tables.
export { readCsvTable, readXlsxTables, type Table, type TableRow } from './tables.ts';
export { defaultHeaderMap, readMapping, headerWords, KNOWN_FIELDS, type HeaderMap } from './mapping.ts';
export { suggestKind, type KindSuggestion } from './letters.ts';
export { importTables, GENERATED_MARK, type ImportOptions, type ImportResult } from './importer.ts';
export { exportTables, csvField } from './export.ts';
export { revisionChanges, staleJustifications, type RevisionChanges } from './revision.ts';
export { renderReport } from './report.ts';
export {
  IMPORT_CODES,
  renderIssue,
  describePlace,
  columnLetters,
  type ImportIssue,
  type ImportCode,
  type Place,
} from './issues.ts';
export type { TableTally } from './records.ts';
export { readDexpi, type DexpiResult, type DexpiCounts } from './dexpi.ts';
export { readXml, descendants, type XmlElement } from './xml.ts';
