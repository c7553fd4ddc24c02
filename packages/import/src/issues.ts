// What the importer says about its input: each problem with the file, sheet, row and column of the
// cell, a stable code (BH5xx, a range of its own beside the loader's BH1xx-BH3xx) and what to do.
export const IMPORT_CODES = {
  BH500: 'the table file cannot be read',
  BH501: 'the CSV text is malformed',
  BH502: 'the table has no header row',
  BH503: 'a row has no tag',
  BH504: 'a tag is given twice in one table',
  BH505: 'two tables give one field of one tag different values',
  BH506: 'a row has no kind and its tag letters suggest none',
  BH507: 'a value the model does not accept',
  BH508: 'the mapping file is malformed',
  BH509: 'a LOPA row is malformed',
  BH510: 'a column the mapping does not know',
  BH511: 'the XML is malformed',
  BH512: 'a DEXPI object could not be imported',
} as const;

export type ImportCode = keyof typeof IMPORT_CODES;

/** Where in the input: a table cell (or a whole row or table), or a line and column of a text file. */
export interface Place {
  file: string;
  sheet?: string;
  /** 1-based row as a spreadsheet shows it (the header is usually row 1). */
  row?: number;
  /** 1-based column of the cell. */
  column?: number;
  /** The header of the column, to name it as the user knows it. */
  header?: string;
  /** 1-based line and column in a text file (XML, a mapping file). */
  line?: number;
  lineColumn?: number;
}

export interface ImportIssue {
  code: ImportCode;
  severity: 'error' | 'warning';
  message: string;
  place: Place;
  related?: { message: string; place: Place }[];
  help?: string;
}

/** Spreadsheet column letters: 1 -> A, 27 -> AA. */
export function columnLetters(column: number): string {
  let n = column;
  let out = '';
  while (n > 0) {
    const r = (n - 1) % 26;
    out = String.fromCharCode(65 + r) + out;
    n = Math.floor((n - 1) / 26);
  }
  return out;
}

export function describePlace(p: Place): string {
  if (p.line !== undefined) return `${p.file}:${p.line}:${p.lineColumn ?? 1}`;
  const parts = [p.file];
  if (p.sheet !== undefined) parts.push(`sheet "${p.sheet}"`);
  if (p.row !== undefined) parts.push(`row ${p.row}`);
  if (p.column !== undefined) parts.push(`column ${columnLetters(p.column)}${p.header ? ` (${p.header})` : ''}`);
  return parts.join(', ');
}

const KINDS = { error: 'Import error', warning: 'Import warning' } as const;

export function renderIssue(issue: ImportIssue): string {
  const lines = [`${KINDS[issue.severity]}: ${issue.message}`, `  where    ${describePlace(issue.place)}`];
  for (const r of issue.related ?? []) lines.push(`  see also ${describePlace(r.place)}: ${r.message}`);
  if (issue.help) lines.push(`  to fix   ${issue.help}`);
  lines.push(`  code     ${issue.code} (${IMPORT_CODES[issue.code]})`);
  return lines.join('\n');
}

export function issue(
  code: ImportCode,
  message: string,
  place: Place,
  more: Partial<Pick<ImportIssue, 'related' | 'help' | 'severity'>> = {},
): ImportIssue {
  return {
    code,
    severity: more.severity ?? 'error',
    message,
    place,
    ...(more.related ? { related: more.related } : {}),
    ...(more.help ? { help: more.help } : {}),
  };
}
