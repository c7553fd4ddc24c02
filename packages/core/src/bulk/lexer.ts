// The .bulk lexer: splits each line into words, quoted strings, `=`, `,` and a trailing comment.
// The language is line-oriented, so the lexer works a line at a time and never looks across lines.
import { error, type Diagnostic } from '../diagnostics/diagnostic.ts';

export type TokenType = 'word' | 'string' | 'equals' | 'comma';

export interface Token {
  type: TokenType;
  /** For strings the unescaped value; otherwise the text itself. */
  value: string;
  line: number;
  column: number;
  length: number;
  /** The part file the token was read from, when it is not the file that was loaded. */
  file?: string;
}

export interface LexedLine {
  line: number;
  indent: string;
  tokens: Token[];
  /** Text after `#`, without the `#`; undefined when the line has no comment. */
  comment?: string;
  commentColumn?: number;
  /** True when an unterminated string swallowed the rest of the line, so later attributes are lost. */
  truncated?: boolean;
}

/** The characters of a word (A-Z a-z 0-9 _ . - / + :), by UTF-16 code unit: a table, as every character of a file passes here. */
const WORD_CHAR = new Uint8Array(128);
for (const c of 'ABCDEFGHIJKLMNOPQRSTUVWXYZabcdefghijklmnopqrstuvwxyz0123456789_.-/+:') WORD_CHAR[c.charCodeAt(0)] = 1;
const isWordChar = (code: number) => code < 128 && WORD_CHAR[code] === 1;
const ESCAPES: Record<string, string> = { '"': '"', '\\': '\\', n: '\n', r: '\r', t: '\t' };
/** `\u{1F600}`: any code point by its hex value, for characters a file cannot show plainly. */
const CODE_POINT_ESCAPE = /^u\{([0-9A-Fa-f]{1,6})\}/;

export function lexLine(text: string, line: number, diagnostics: Diagnostic[]): LexedLine {
  const indentMatch = /^[ \t]*/.exec(text);
  const indent = indentMatch ? indentMatch[0] : '';
  const tokens: Token[] = [];
  const result: LexedLine = { line, indent, tokens };
  let i = indent.length;
  while (i < text.length) {
    const ch = text[i]!;
    const column = i + 1;
    if (ch === ' ' || ch === '\t') {
      i++;
    } else if (ch === '#') {
      result.comment = text.slice(i + 1);
      result.commentColumn = column;
      break;
    } else if (ch === '=' || ch === ',') {
      tokens.push({ type: ch === '=' ? 'equals' : 'comma', value: ch, line, column, length: 1 });
      i++;
    } else if (ch === '"') {
      let value = '';
      let j = i + 1;
      let closed = false;
      while (j < text.length) {
        const c = text[j]!;
        if (c === '"') {
          closed = true;
          break;
        }
        if (c !== '\\') {
          // Plain text up to the next quote or backslash, in one slice.
          let end = j + 1;
          while (end < text.length && text[end] !== '"' && text[end] !== '\\') end++;
          value += text.slice(j, end);
          j = end;
          continue;
        }
        const next = text[j + 1];
        const codePoint = CODE_POINT_ESCAPE.exec(text.slice(j + 1, j + 11));
        if (codePoint && Number.parseInt(codePoint[1]!, 16) <= 0x10ffff) {
          value += String.fromCodePoint(Number.parseInt(codePoint[1]!, 16));
          j += 1 + codePoint[0].length;
          continue;
        }
        const escaped = next === undefined ? undefined : ESCAPES[next];
        if (escaped === undefined) {
          diagnostics.push(
            error(
              'BH110',
              `unknown escape \`\\${next ?? ''}\` in string`,
              { line, column: j + 1, length: 2 },
              {
                help: 'inside quotes write \\" for a quote, \\\\ for a backslash, \\n for a new line, \\t for a tab, \\u{e9} for any character by its code',
              },
            ),
          );
          j += 2;
          continue;
        }
        value += escaped;
        j += 2;
      }
      if (!closed) {
        diagnostics.push(
          error(
            'BH110',
            'unterminated string',
            { line, column, length: text.length - i },
            {
              help: 'close the string with `"` on the same line; write \\n for a line break inside it',
            },
          ),
        );
        tokens.push({ type: 'string', value, line, column, length: text.length - i });
        result.truncated = true;
        break;
      }
      tokens.push({ type: 'string', value, line, column, length: j + 1 - i });
      i = j + 1;
    } else if (isWordChar(text.charCodeAt(i))) {
      let j = i;
      while (j < text.length && isWordChar(text.charCodeAt(j))) j++;
      tokens.push({ type: 'word', value: text.slice(i, j), line, column, length: j - i });
      i = j;
    } else {
      const shown = ch.codePointAt(0)! < 0x20 ? `U+${ch.codePointAt(0)!.toString(16).padStart(4, '0')}` : ch;
      diagnostics.push(
        error(
          'BH111',
          `unexpected character \`${shown}\``,
          { line, column, length: 1 },
          {
            help: 'tags and words use letters, digits and _ . - / + : ; put other text in double quotes',
          },
        ),
      );
      i++;
    }
  }
  return result;
}
