// The HTML report: one self-contained page (inline CSS, no script, nothing fetched) written from the
// shared layout, readable on screen and printable to PDF with a page per scenario and no cut-off tables.
import type { Block, Inline, Rich } from './blocks.ts';

export function escapeHtml(text: string): string {
  return text.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c]!);
}

/**
 * Screen and print styles. Verdicts carry a text mark as well as a colour; the colours are from a
 * colour-blind-safe set and only reinforce the words. Long tags and paths wrap instead of overflowing.
 */
const STYLE = `
:root { color-scheme: light; --ink: #1b1b1b; --muted: #555; --rule: #c8c8c8; --band: #f3f3f3; --warn: #8a3b00; }
* { box-sizing: border-box; }
body { font: 15px/1.45 system-ui, -apple-system, "Segoe UI", Roboto, sans-serif; color: var(--ink); margin: 0 auto; max-width: 76rem; padding: 1.5rem; }
h1 { font-size: 1.6rem; margin: 0 0 1rem; }
h2 { font-size: 1.3rem; border-bottom: 2px solid var(--ink); padding-bottom: .2rem; margin-top: 2.2rem; }
h3 { font-size: 1.1rem; margin-top: 1.6rem; }
h4 { font-size: 1rem; margin: 1.4rem 0 .4rem; }
code { font-family: ui-monospace, "SFMono-Regular", Menlo, Consolas, monospace; font-size: .92em; overflow-wrap: anywhere; }
table { border-collapse: collapse; width: 100%; margin: .5rem 0 1rem; table-layout: auto; }
caption { text-align: left; font-weight: 600; padding: .2rem 0; color: var(--muted); }
th, td { border: 1px solid var(--rule); padding: .3rem .45rem; text-align: left; vertical-align: top; overflow-wrap: break-word; }
thead th { background: var(--band); }
tbody th { font-weight: 600; }
tbody th code { white-space: nowrap; }
aside.caution { border: 2px solid var(--warn); padding: .6rem 1rem; margin: 1rem 0; }
aside.caution h2 { border: 0; margin: 0 0 .3rem; font-size: 1.05rem; color: var(--warn); }
ul { padding-left: 1.3rem; }
.verdict-independent, .verdict-accepted { color: #005a8c; }
.verdict-voided { color: #8a3b00; font-weight: 600; }
.verdict-unverified, .verdict-open { color: #6b4a00; font-weight: 600; }
table.sign td { height: 2.6rem; min-width: 8rem; }
table.worksheet td, table.worksheet th { font-size: .85em; }
@media print {
  body { max-width: none; padding: 0; font-size: 10.5pt; }
  @page { margin: 14mm 12mm; }
  section.scenario, section.site-wide, section.appendix { break-before: page; }
  h2, h3, h4, caption { break-after: avoid; }
  thead { display: table-header-group; }
  tr { break-inside: avoid; }
  table { width: 100%; }
  a { color: inherit; text-decoration: none; }
}
`;

function inline(part: Inline): string {
  if (typeof part === 'string') return escapeHtml(part);
  if ('code' in part) return `<code>${escapeHtml(part.code)}</code>`;
  if ('strong' in part) return `<strong>${escapeHtml(part.strong)}</strong>`;
  return `<span class="verdict-${escapeHtml(part.status)}">${escapeHtml(part.text)}</span>`;
}

function rich(text: Rich): string {
  return text.map(inline).join('');
}

function cell(text: Rich, header: boolean): string {
  return header ? `<th scope="row">${rich(text)}</th>` : `<td>${rich(text)}</td>`;
}

function block(b: Block, out: string[]): void {
  switch (b.type) {
    case 'heading':
      out.push(`<h${b.level}${b.id ? ` id="${escapeHtml(b.id)}"` : ''}>${rich(b.text)}</h${b.level}>`);
      return;
    case 'paragraph':
      out.push(`<p>${rich(b.text)}</p>`);
      return;
    case 'list':
      out.push('<ul>', ...b.items.map((item) => `<li>${rich(item)}</li>`), '</ul>');
      return;
    case 'caution':
      out.push(
        `<aside class="caution" aria-labelledby="caution-title">`,
        `<h2 id="caution-title">${escapeHtml(b.title)}</h2>`,
        '<ul>',
      );
      out.push(...b.items.map((item) => `<li>${rich(item)}</li>`), '</ul>', '</aside>');
      return;
    case 'table':
      if (b.rows.length === 0) {
        out.push(`<p><em>${escapeHtml(b.caption)}: none.</em></p>`);
        return;
      }
      out.push(
        b.sign ? '<table class="sign">' : b.compact ? '<table class="worksheet">' : '<table>',
        `<caption>${escapeHtml(b.caption)}</caption>`,
      );
      out.push(
        `<thead><tr>${b.head.map((h) => `<th scope="col">${escapeHtml(h)}</th>`).join('')}</tr></thead>`,
        '<tbody>',
      );
      for (const row of b.rows) out.push(`<tr>${row.map((c, i) => cell(c, b.rowHeaders && i === 0)).join('')}</tr>`);
      out.push('</tbody>', '</table>');
      return;
    case 'section':
      out.push(`<section class="${b.kind}" id="${escapeHtml(b.id)}">`);
      for (const inner of b.blocks) block(inner, out);
      out.push('</section>');
      return;
  }
}

export interface PageOptions {
  /** Printed at the foot of every page, with the page number and count: the document, the model file, its hash. */
  footer?: string;
  landscape?: boolean;
}

/** Text for a CSS string: quotes and backslashes escaped, and `<` too, so nothing closes the style element. */
function cssString(text: string): string {
  return `"${text.replace(/[\\"<>\n\r]/g, (c) => `\\${c.charCodeAt(0).toString(16)} `)}"`;
}

/**
 * Page boxes for print: the footer and "page N of M" in the bottom margin of every page, which Chromium
 * (131 and later) and other engines with CSS Paged Media margin boxes print on each page.
 */
function pageStyle(options: PageOptions): string {
  const size = options.landscape ? ' size: A4 landscape;' : '';
  if (options.footer === undefined) return options.landscape ? `@media print { @page {${size} } }` : '';
  return `@media print {
  @page {${size} margin: 14mm 12mm 18mm;
    @bottom-left { content: ${cssString(options.footer)}; font: 7pt ui-monospace, Menlo, Consolas, monospace; color: #333; }
    @bottom-right { content: "Page " counter(page) " of " counter(pages); font: 8pt system-ui, sans-serif; color: #333; white-space: nowrap; }
  }
}`;
}

export function renderHtml(blocks: readonly Block[], title: string, options: PageOptions = {}): string {
  const out: string[] = [
    '<!DOCTYPE html>',
    '<html lang="en">',
    '<head>',
    '<meta charset="utf-8">',
    '<meta name="viewport" content="width=device-width, initial-scale=1">',
    // Nothing may be fetched: the page must open the same offline, years later, as evidence.
    `<meta http-equiv="Content-Security-Policy" content="default-src 'none'; style-src 'unsafe-inline'; img-src data:">`,
    '<link rel="icon" href="data:,">',
    `<title>${escapeHtml(title)}</title>`,
    `<style>${STYLE}${pageStyle(options)}</style>`,
    '</head>',
    '<body>',
    '<main>',
  ];
  for (const b of blocks) block(b, out);
  out.push('</main>', '</body>', '</html>');
  return `${out.join('\n')}\n`;
}
