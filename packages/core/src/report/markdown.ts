// The Markdown report: the shared layout written as CommonMark with pipe tables (GitHub style), every
// piece of model text escaped so a title cannot turn into markup or break a table.
import type { Block, Inline, Rich } from './blocks.ts';

/**
 * Escapes what CommonMark or a pipe table would read as markup; line breaks become spaces. `<` and an
 * `&` that would start an entity become entities (so no HTML gets through); `>` matters only at the start
 * of a line, which the paragraph writer guards.
 */
export function escapeMarkdown(text: string): string {
  return text
    .replace(/\r\n?|\n/g, ' ')
    .replace(/[\\`*_[\]|#~!]/g, (c) => `\\${c}`)
    .replace(/&(?=#?[A-Za-z0-9]+;)/g, '&amp;')
    .replace(/<(?=[A-Za-z/!?])/g, '&lt;');
}

/** A code span that survives backticks inside it (CommonMark: a longer fence), and pipes inside tables. */
function codeSpan(text: string): string {
  const flat = text.replace(/\r\n?|\n/g, ' ').replace(/\|/g, '\\|');
  const longest = Math.max(0, ...(flat.match(/`+/g) ?? []).map((run) => run.length));
  const fence = '`'.repeat(longest + 1);
  const pad = longest > 0 || flat.startsWith(' ') ? ' ' : '';
  return `${fence}${pad}${flat}${pad}${fence}`;
}

function inline(part: Inline): string {
  if (typeof part === 'string') return escapeMarkdown(part);
  if ('code' in part) return codeSpan(part.code);
  if ('strong' in part) return `**${escapeMarkdown(part.strong)}**`;
  return escapeMarkdown(part.text);
}

function rich(text: Rich): string {
  return text.map(inline).join('');
}

function block(b: Block): string[] {
  switch (b.type) {
    case 'heading':
      return [`${'#'.repeat(b.level)} ${rich(b.text)}`];
    case 'paragraph':
      // A paragraph that starts like a list item or a setext underline would turn into one.
      return [
        rich(b.text)
          .replace(/^([-+=>])/, '\\$1')
          .replace(/^(\d+)([.)])/, '$1\\$2'),
      ];
    case 'list':
      return [b.items.map((item) => `- ${rich(item)}`).join('\n')];
    case 'caution':
      return [[`> **${escapeMarkdown(b.title)}.**`, '>', ...b.items.map((item) => `> - ${rich(item)}`)].join('\n')];
    case 'table': {
      if (b.rows.length === 0) return [`*${escapeMarkdown(b.caption)}: none.*`];
      const cell = (text: Rich) => rich(text) || ' ';
      return [
        [
          `*${escapeMarkdown(b.caption)}*`,
          '',
          `| ${b.head.map(escapeMarkdown).join(' | ')} |`,
          `|${b.head.map(() => ' --- ').join('|')}|`,
          ...b.rows.map((row) => `| ${row.map(cell).join(' | ')} |`),
        ].join('\n'),
      ];
    }
    case 'section':
      return b.blocks.flatMap(block);
  }
}

export function renderMarkdown(blocks: readonly Block[]): string {
  return `${blocks.flatMap(block).join('\n\n')}\n`;
}
