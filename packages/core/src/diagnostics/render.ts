// Renders diagnostics compiler-style: a headline with the code, the file position, and a caret
// excerpt of the source line, so a user can find and fix the problem without a stack trace.
import type { Diagnostic, Span } from './diagnostic.ts';

export interface SourceText {
  file: string;
  lines: readonly string[];
}

export function splitLines(text: string): string[] {
  return text.split(/\r\n|\n|\r/);
}

/** Makes control characters visible so an excerpt never moves the terminal cursor. */
function visible(line: string): string {
  // eslint-disable-next-line no-control-regex
  return line.replace(/[\u0000-\u0008\u000b-\u001f\u007f]/g, '?');
}

const MAX_EXCERPT = 120;

function excerpt(source: SourceText, span: Span, gutter: number, label = ''): string[] {
  const raw = source.lines[span.line - 1];
  if (raw === undefined) return [];
  let column = span.column;
  let text: string;
  // Long lines (a 2,000-character tag) are cut around the span so the caret stays in view; cut before
  // anything else, so each excerpt costs the same however long the line is.
  if (raw.length > MAX_EXCERPT) {
    const start = Math.max(0, column - 1 - 20);
    text = (start > 0 ? '…' : '') + raw.slice(start, start + MAX_EXCERPT) + (start + MAX_EXCERPT < raw.length ? '…' : '');
    column = column - start + (start > 0 ? 1 : 0);
  } else {
    text = raw;
  }
  text = visible(text.replace(/\t/g, ' '));
  const width = Math.max(1, Math.min(span.length, text.length - column + 1, MAX_EXCERPT));
  const pad = ' '.repeat(gutter);
  const num = String(span.line).padStart(gutter);
  return [
    `${pad} |`,
    `${num} | ${text}`,
    `${pad} | ${' '.repeat(Math.max(0, column - 1))}${'^'.repeat(width)}${label ? ' ' + label : ''}`,
  ];
}

export function position(file: string, span?: Span): string {
  return span ? `${file}:${span.line}:${span.column}` : file;
}

export function renderDiagnostic(d: Diagnostic, source: SourceText): string {
  const lines = [`${d.severity}[${d.code}]: ${d.message}`];
  const spans = [d.span, ...(d.related ?? []).map((r) => r.span)].filter((s): s is Span => !!s);
  const gutter = Math.max(1, ...spans.map((s) => String(s.line).length));
  lines.push(`${' '.repeat(gutter)}--> ${position(source.file, d.span)}`);
  if (d.span) lines.push(...excerpt(source, d.span, gutter));
  for (const r of d.related ?? []) {
    lines.push(`${' '.repeat(gutter)} = note: ${r.message} at ${position(source.file, r.span)}`);
    lines.push(...excerpt(source, r.span, gutter));
  }
  if (d.help) lines.push(`${' '.repeat(gutter)} = help: ${d.help}`);
  if (d.more) lines.push(`${' '.repeat(gutter)} = and ${d.more} more like this (${d.code}) not shown`);
  return lines.join('\n');
}

export function renderDiagnostics(diagnostics: readonly Diagnostic[], source: SourceText): string {
  return diagnostics.map((d) => renderDiagnostic(d, source)).join('\n\n');
}
