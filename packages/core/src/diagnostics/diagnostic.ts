// Diagnostics: what the loader says about a model file, with stable codes and source spans.
// Every code is listed once in CODES; codes are never reused for a different meaning.

export interface Span {
  /** 1-based line. */
  line: number;
  /** 1-based column, counted in UTF-16 code units of the line. */
  column: number;
  /** Length of the marked text on that line (at least 1 when rendered). */
  length: number;
}

export interface Related {
  message: string;
  span: Span;
}

export type DiagnosticSeverity = 'error' | 'warning';

export interface Diagnostic {
  code: DiagnosticCode;
  severity: DiagnosticSeverity;
  message: string;
  span?: Span;
  related?: Related[];
  help?: string;
}

/** The catalogue. Keys are the stable codes; the value is a one-line description for the docs. */
export const CODES = {
  BH100: 'the file is empty',
  BH101: 'the file starts with a byte-order mark',
  BH102: 'the file is not UTF-8 text',
  BH103: 'the file is larger than the limit',
  BH104: 'the file cannot be read',
  BH110: 'unterminated string',
  BH111: 'unexpected character',
  BH112: 'malformed number',
  BH113: 'tabs and spaces mixed in indentation',
  BH114: 'indented line with nothing to continue',
  BH115: 'unknown statement keyword',
  BH116: 'malformed attribute',
  BH117: 'attribute given twice',
  BH118: 'unknown attribute',
  BH119: 'JSON syntax error',
  BH120: 'statement given twice',
  BH200: 'required field missing',
  BH201: 'value of the wrong type',
  BH202: 'value not among the allowed words',
  BH203: 'unknown field',
  BH300: 'unknown reference',
  BH301: 'duplicate tag or id',
  BH302: 'link to an element of the wrong kind',
  BH303: 'dependency cycle',
  BH304: 'probability outside (0, 1]',
  BH305: 'frequency or time not positive and finite',
  BH306: 'malformed MooN voting',
  BH307: 'scenario layer is not a function',
  BH308: 'function claimed twice in one scenario',
  BH309: 'cause function also claimed as a layer',
  BH310: 'cause has no frequency',
  BH311: 'unknown consequence category',
  BH312: 'tag too long',
  BH313: 'tag with characters not allowed',
  BH314: 'cause must name exactly one of function, element or external',
  BH315: 'function role filled by an element of the wrong kind',
  BH316: 'SIL claimed outside 1 to 4',
  BH317: 'date not in YYYY-MM-DD form',
  BH318: 'narrowed cause names an element outside the failing function',
  BH319: 'unknown rule id',
  BH330: 'per-100 m piping cause without a pipe length',
  BH331: 'pipe length on a cause that is not a piping row',
  BH332: 'condition credit limit below 1',
} as const;

export type DiagnosticCode = keyof typeof CODES;

export function error(code: DiagnosticCode, message: string, span?: Span, extra: Partial<Diagnostic> = {}): Diagnostic {
  return { code, severity: 'error', message, ...(span ? { span } : {}), ...extra };
}

export function hasErrors(diagnostics: readonly Diagnostic[]): boolean {
  return diagnostics.some((d) => d.severity === 'error');
}

/** Stable order: by line, then column, then code, so output diffs cleanly. */
export function sortDiagnostics(diagnostics: Diagnostic[]): Diagnostic[] {
  return [...diagnostics].sort(
    (a, b) =>
      (a.span?.line ?? 0) - (b.span?.line ?? 0) ||
      (a.span?.column ?? 0) - (b.span?.column ?? 0) ||
      a.code.localeCompare(b.code) ||
      a.message.localeCompare(b.message),
  );
}
