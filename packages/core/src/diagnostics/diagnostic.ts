// Diagnostics: what the loader says about a model file, with stable codes and source spans.
// Every code is listed once in CODES; codes are never reused for a different meaning.

export interface Span {
  /** 1-based line. */
  line: number;
  /** 1-based column, counted in UTF-16 code units of the line. */
  column: number;
  /** Length of the marked text on that line (at least 1 when rendered). */
  length: number;
  /** The part file the span lies in, when it is not the file that was loaded (see loader/parts.ts). */
  file?: string;
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
  /** How many more diagnostics with this code were left out after this one ("and N more like this"). */
  more?: number;
}

/** The catalogue. Keys are the stable codes; the value is a one-line description for the docs. */
export const CODES = {
  BH100: 'the file is empty',
  BH101: 'the file starts with a byte-order mark',
  BH102: 'the file is not UTF-8 text',
  BH103: 'the file is larger than the limit',
  BH104: 'the file cannot be read',
  BH105: 'line longer than the limit',
  BH106: 'JSON nested deeper than the limit',
  BH107: 'dependency chain deeper than the limit',
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
  BH121: 'number with more digits than can be held exactly',
  BH122: 'part files name one another in a cycle',
  BH123: 'part file cannot be read',
  BH124: 'part statement malformed',
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
  BH340: 'failure data must name one element, or one make and model',
  BH341: 'failure rates given in neither or both forms (lambda-du with lambda-dd, or lambda-d with dc)',
  BH342: 'failure rate, fraction or time out of range',
  BH343: 'failure figures given twice for one element, make and model, or voted group',
  BH344: 'proof-test coverage below 1 without a mission time',
  BH345: 'common-cause factors for something that is not a voted group of a SIF',
} as const;

export type DiagnosticCode = keyof typeof CODES;

export function error(code: DiagnosticCode, message: string, span?: Span, extra: Partial<Diagnostic> = {}): Diagnostic {
  return { code, severity: 'error', message, ...(span ? { span } : {}), ...extra };
}

export function hasErrors(diagnostics: readonly Diagnostic[]): boolean {
  return diagnostics.some((d) => d.severity === 'error');
}

const byCodeUnits = (a: string, b: string) => (a < b ? -1 : a > b ? 1 : 0);

/** Stable order: by line, then column, then code, so output diffs cleanly (code-unit order, not locale). */
export function sortDiagnostics(diagnostics: Diagnostic[]): Diagnostic[] {
  return [...diagnostics].sort(
    (a, b) =>
      // The loaded file first, then its part files by name; within a file, by position.
      byCodeUnits(a.span?.file ?? '', b.span?.file ?? '') ||
      (a.span?.line ?? 0) - (b.span?.line ?? 0) ||
      (a.span?.column ?? 0) - (b.span?.column ?? 0) ||
      byCodeUnits(a.code, b.code) ||
      byCodeUnits(a.message, b.message),
  );
}

/** How many diagnostics of one code are shown before the rest are counted ("and N more like this"). */
export const MAX_DIAGNOSTICS_PER_CODE = 20;

/**
 * Keeps the first few diagnostics of each code (in the given order) and counts the rest on the last one
 * kept, so a line of 100,000 stray characters gives a screenful, not 100,000 excerpts.
 */
export function capDiagnostics(diagnostics: readonly Diagnostic[], perCode = MAX_DIAGNOSTICS_PER_CODE): Diagnostic[] {
  const kept: Diagnostic[] = [];
  const lastKept = new Map<DiagnosticCode, Diagnostic>();
  const count = new Map<DiagnosticCode, number>();
  for (const d of diagnostics) {
    const n = (count.get(d.code) ?? 0) + 1;
    count.set(d.code, n);
    if (n <= perCode) {
      const copy = { ...d };
      kept.push(copy);
      lastKept.set(d.code, copy);
    } else {
      const last = lastKept.get(d.code)!;
      last.more = n - perCode;
    }
  }
  return kept;
}
