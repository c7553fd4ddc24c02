// Loader diagnostics in the notice look (see notice.ts): the problem first, then where, then what to do,
// with the stable code last so a reader can look it up.
import { CODES, type Diagnostic } from './diagnostic.ts';
import { place, renderNotice, type Notice, type NoticeFact, type SourceText } from './notice.ts';

export { position, type SourceText } from './notice.ts';

export function splitLines(text: string): string[] {
  return text.split(/\r\n|\n|\r/);
}

const KINDS = { error: 'Model error', warning: 'Model warning' } as const;

export function diagnosticNotice(d: Diagnostic): Notice {
  const facts: NoticeFact[] = (d.related ?? []).map((r) => ({
    label: 'see also',
    text: `${place(r.span)}: ${r.message}`,
    span: r.span,
  }));
  if (d.help) facts.push({ label: 'to fix', text: d.help });
  if (d.more) facts.push({ label: 'and', text: `${d.more} more like this (${d.code}), not shown` });
  return {
    kind: KINDS[d.severity],
    headline: d.message,
    ...(d.span ? { span: d.span } : {}),
    facts,
    reference: { label: 'code', text: `${d.code} (${CODES[d.code]})` },
  };
}

export function renderDiagnostic(d: Diagnostic, source: SourceText): string {
  return renderNotice(diagnosticNotice(d), source);
}

export function renderDiagnostics(diagnostics: readonly Diagnostic[], source: SourceText): string {
  return diagnostics.map((d) => renderDiagnostic(d, source)).join('\n\n');
}
