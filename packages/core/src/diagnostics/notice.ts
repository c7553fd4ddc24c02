// One text look for everything Bulkhead tells a reader about a model: input problems from the loader and
// independence findings from the rules. Written for a process-safety reader: what is wrong, in the trade's
// words, comes first; then where it is (file, line, column and the text itself, marked underneath); then
// the supporting facts, why it matters and what to do; the stable code or key last, for the record.
import type { Span } from './diagnostic.ts';

export interface SourceText {
  file: string;
  lines: readonly string[];
  /** The lines of each part file the model names (see loader/parts.ts), by the path spans carry. */
  parts?: ReadonlyMap<string, readonly string[]>;
}

/** A labelled fact under the headline: a path, a definition, a reason, an action. */
export interface NoticeFact {
  label: string;
  text: string;
  /** Where the fact points in the same file; its text is shown marked, as the primary span is. */
  span?: Span;
}

export interface Notice {
  /** What kind of notice, in plain words: "Model error", "Credit voided", "Note". */
  kind: string;
  /** What is wrong, one sentence. */
  headline: string;
  span?: Span;
  /** What the primary span is, when that helps: "the layer claim". */
  spanRole?: string;
  facts: readonly NoticeFact[];
  /** The stable reference: a diagnostic code or a finding key, printed last. */
  reference: { label: string; text: string };
}

/** Makes control characters visible so an excerpt never moves the terminal cursor. */
function visible(line: string): string {
  // eslint-disable-next-line no-control-regex -- matching control characters is the point of this pattern
  return line.replace(/[\u0000-\u0008\u000b-\u001f\u007f]/g, '?');
}

const MAX_EXCERPT = 120;
const LABEL_WIDTH = 9;
const MARK = '‾';
const RAIL = '┆';

/** The line of source under a span, shortened around it on a long line, and a mark under the span. */
export function markedExcerpt(source: SourceText, span: Span): [string, string] | undefined {
  const lines = span.file === undefined ? source.lines : source.parts?.get(span.file);
  const raw = lines?.[span.line - 1];
  if (raw === undefined) return undefined;
  let text = raw;
  let column = span.column;
  // A 2,000-character line is cut around the span so the mark stays in view; cut before anything else,
  // so each excerpt costs the same however long the line is.
  if (raw.length > MAX_EXCERPT) {
    const start = Math.max(0, column - 1 - 20);
    text =
      (start > 0 ? '…' : '') + raw.slice(start, start + MAX_EXCERPT) + (start + MAX_EXCERPT < raw.length ? '…' : '');
    column = column - start + (start > 0 ? 1 : 0);
  }
  text = visible(text.replace(/\t/g, ' '));
  const width = Math.max(1, Math.min(span.length, text.length - column + 1, MAX_EXCERPT));
  return [text, ' '.repeat(Math.max(0, column - 1)) + MARK.repeat(width)];
}

export function position(file: string, span?: Span): string {
  return span ? `${span.file ?? file}:${span.line}:${span.column}` : file;
}

/** "line 12, column 4", or the whole file when there is no span. */
export function place(span: Span | undefined): string {
  if (!span) return 'the file as a whole';
  return `${span.file === undefined ? '' : `${span.file} `}line ${span.line}, column ${span.column}`;
}

function labelled(label: string, text: string): string {
  return `  ${label.padEnd(LABEL_WIDTH)}${text}`;
}

function excerptLines(source: SourceText, span: Span): string[] {
  const marked = markedExcerpt(source, span);
  if (!marked) return [];
  const indent = ' '.repeat(2 + LABEL_WIDTH);
  return [`${indent}${RAIL} ${marked[0]}`, `${indent}${RAIL} ${marked[1]}`];
}

export function renderNotice(notice: Notice, source: SourceText): string {
  const lines = [`${notice.kind}: ${notice.headline}`];
  const where = `${position(source.file, notice.span)}${notice.spanRole ? `, ${notice.spanRole}` : ''}`;
  lines.push(labelled('where', where));
  if (notice.span) lines.push(...excerptLines(source, notice.span));
  for (const fact of notice.facts) {
    lines.push(labelled(fact.label, fact.text));
    if (fact.span) lines.push(...excerptLines(source, fact.span));
  }
  lines.push(labelled(notice.reference.label, notice.reference.text));
  return lines.join('\n');
}
