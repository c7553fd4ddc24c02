// A small document model (headings, paragraphs, lists, tables, sections) that the Markdown and HTML
// reports share: the layout is written once, and each format only decides how to write a block.

/**
 * Inline text: plain text, a tag or key set in code, emphasised text, or a status word (a verdict) that
 * HTML may style; a status always carries its meaning in words, never in colour alone.
 */
export type Inline = string | { code: string } | { strong: string } | { status: string; text: string };
export type Rich = Inline[];

export interface Table {
  type: 'table';
  /** Says what the table holds; read out by screen readers before the table. */
  caption: string;
  head: string[];
  rows: Rich[][];
  /** The first cell of each row names the row (a row header). */
  rowHeaders: boolean;
  /** Lines to sign by hand: printed with room to write in the empty cells. */
  sign?: boolean;
  /** Many columns: printed in a smaller type. */
  compact?: boolean;
}

export type Block =
  | { type: 'heading'; level: 1 | 2 | 3 | 4; text: Rich; id?: string }
  | { type: 'paragraph'; text: Rich }
  | { type: 'list'; items: Rich[] }
  | { type: 'caution'; title: string; items: Rich[] }
  | Table
  /** A unit that starts a new page when printed: one scenario, the site-wide picture, or an appendix. */
  | { type: 'section'; kind: 'scenario' | 'site-wide' | 'appendix' | 'front'; id: string; blocks: Block[] };

export const code = (text: string): Inline => ({ code: text });
export const strong = (text: string): Inline => ({ strong: text });
export const status = (name: string, text: string): Inline => ({ status: name, text });

/** Splits rule-written text on backticks: `LT-101` becomes a code span, the rest stays text. */
export function richFromMessage(message: string): Rich {
  const parts = message.split('`');
  if (parts.length % 2 === 0) return [message];
  return parts.map((part, i) => (i % 2 === 1 ? code(part) : part)).filter((p) => p !== '');
}

/** Tags joined with a separator, each one a code span. */
export function codeList(tags: readonly string[], separator = ', '): Rich {
  const out: Rich = [];
  tags.forEach((tag, i) => {
    if (i > 0) out.push(separator);
    out.push(code(tag));
  });
  return out;
}

export function plain(text: Rich): string {
  return text
    .map((p) => (typeof p === 'string' ? p : 'code' in p ? p.code : 'strong' in p ? p.strong : p.text))
    .join('');
}
