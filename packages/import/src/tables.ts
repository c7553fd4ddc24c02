// Reads tables: CSV (RFC 4180, by csv-parse) and XLSX (every worksheet, by exceljs). A table is its
// header row and its data rows, each row numbered as a spreadsheet shows it, cells as text.
import { parse } from 'csv-parse/sync';
import { issue, type ImportIssue } from './issues.ts';

export interface TableRow {
  row: number;
  cells: string[];
}

export interface Table {
  file: string;
  sheet?: string;
  headerRow: number;
  headers: string[];
  rows: TableRow[];
}

const isBlank = (cells: readonly string[]) => cells.every((c) => c.trim() === '');

/** Splits rows into the header (the first row that is not blank) and the data rows under it. */
function toTable(file: string, sheet: string | undefined, rows: TableRow[], issues: ImportIssue[]): Table | undefined {
  const headerAt = rows.findIndex((r) => !isBlank(r.cells));
  if (headerAt === -1) {
    issues.push(
      issue(
        'BH502',
        'the table is empty: no header row',
        { file, ...(sheet !== undefined ? { sheet } : {}) },
        {
          help: 'the first row that is not blank names the columns: Tag, Kind, Service, ...',
        },
      ),
    );
    return undefined;
  }
  const header = rows[headerAt]!;
  return {
    file,
    ...(sheet !== undefined ? { sheet } : {}),
    headerRow: header.row,
    headers: header.cells.map((c) => c.trim()),
    rows: rows.slice(headerAt + 1),
  };
}

export function readCsvTable(file: string, text: string, issues: ImportIssue[]): Table | undefined {
  let records: string[][];
  try {
    records = parse(text, { bom: true, relax_column_count: true, skip_empty_lines: false });
  } catch (e) {
    const err = e as { message: string; lines?: number; code?: string };
    issues.push(
      issue(
        'BH501',
        `the CSV text is malformed: ${err.message.replace(/^Invalid [^:]*: /, '')}`,
        { file, line: err.lines ?? 1, lineColumn: 1 },
        {
          help: 'save the sheet as CSV (comma-separated, quotes around cells that hold commas, quotes or line breaks)',
        },
      ),
    );
    return undefined;
  }
  // A record's row is its number among records (a quoted line break does not start a new row).
  const rows = records.map((cells, i) => ({ row: i + 1, cells }));
  return toTable(file, undefined, rows, issues);
}

/** The text a cell shows: numbers as written, dates as YYYY-MM-DD, formulas by their result. */
function cellText(value: unknown): string {
  if (value === null || value === undefined) return '';
  if (value instanceof Date) return value.toISOString().slice(0, 10);
  if (typeof value === 'object') {
    const v = value as { result?: unknown; richText?: { text: string }[]; text?: unknown; error?: string };
    if (v.richText) return v.richText.map((t) => t.text).join('');
    if ('result' in v) return cellText(v.result);
    if (v.error) return v.error;
    if (v.text !== undefined) return cellText(v.text);
    return '';
  }
  return String(value);
}

export async function readXlsxTables(file: string, bytes: Uint8Array, issues: ImportIssue[]): Promise<Table[]> {
  const { default: ExcelJS } = await import('exceljs');
  const workbook = new ExcelJS.Workbook();
  try {
    await workbook.xlsx.load(Buffer.from(bytes) as unknown as ArrayBuffer);
  } catch (e) {
    issues.push(
      issue(
        'BH500',
        `the file is not a readable XLSX workbook: ${(e as Error).message}`,
        { file },
        {
          help: 'save the workbook as .xlsx (Office Open XML), or export each sheet as CSV',
        },
      ),
    );
    return [];
  }
  const tables: Table[] = [];
  workbook.eachSheet((sheet) => {
    const rows: TableRow[] = [];
    const width = sheet.columnCount;
    sheet.eachRow({ includeEmpty: true }, (row, rowNumber) => {
      const cells: string[] = [];
      for (let c = 1; c <= width; c++) cells.push(cellText(row.getCell(c).value));
      rows.push({ row: rowNumber, cells });
    });
    const table = toTable(file, sheet.name, rows, issues);
    if (table) tables.push(table);
  });
  return tables;
}
