// The .bulk parser: groups lexed lines into statements `keyword [name] key=value ...`, with indented
// lines continuing the statement above (more attributes, or a scenario's cause, layer, ... lines).
import { error, type Diagnostic, type Span } from '../diagnostics/diagnostic.ts';
import { splitLines } from '../diagnostics/render.ts';
import { lexLine, type LexedLine, type Token } from './lexer.ts';

/** The statement naming another .bulk file of the same model (read by loader/parts.ts). */
export const PART_KEYWORD = 'part';

export interface Attribute {
  key: Token;
  values: Token[];
}

export interface Statement {
  keyword: Token;
  name?: Token;
  attributes: Attribute[];
  /** Comment lines directly above, in order, without their `#`. */
  comments: string[];
  trailingComment?: string;
  children: Statement[];
  indented: boolean;
  /**
   * True when a syntax error cut the statement short: what it lacks was lost, not left out, so the
   * loader does not also report it as missing.
   */
  incomplete?: boolean;
}

export interface ParsedFile {
  statements: Statement[];
  endComments: string[];
}

export function tokenSpan(token: Token): Span {
  return token.file === undefined
    ? { line: token.line, column: token.column, length: token.length }
    : { line: token.line, column: token.column, length: token.length, file: token.file };
}

type LineParse = Omit<Statement, 'comments' | 'children' | 'indented'>;

function parseLineTokens(lexed: LexedLine, diagnostics: Diagnostic[]): LineParse | undefined {
  const tokens = lexed.tokens;
  const first = tokens[0];
  if (!first) return undefined;
  let i = 0;
  let keyword: Token;
  if (first.type === 'word' && tokens[1]?.type !== 'equals') {
    keyword = first;
    i = 1;
  } else if (first.type === 'word') {
    // An attribute line: the caller decides whether it continues a statement.
    keyword = { ...first, value: '', length: 0 };
  } else {
    diagnostics.push(
      error('BH116', 'a statement starts with a keyword', tokenSpan(first), {
        help: 'start the line with a keyword such as `transmitter`, `sif` or `scenario`',
      }),
    );
    return undefined;
  }
  let name: Token | undefined;
  const maybeName = tokens[i];
  if (keyword.value !== '' && maybeName && maybeName.type !== 'equals' && tokens[i + 1]?.type !== 'equals') {
    if (maybeName.type === 'word' || maybeName.type === 'string') {
      name = maybeName;
      i++;
    }
  }
  const attributes: Attribute[] = [];
  while (i < tokens.length) {
    const key = tokens[i]!;
    if (key.type !== 'word' || tokens[i + 1]?.type !== 'equals') {
      diagnostics.push(
        error('BH116', `expected \`key=value\`, found \`${key.value}\``, tokenSpan(key), {
          help: 'write attributes as key=value; quote text that contains spaces',
        }),
      );
      return { keyword, ...(name ? { name } : {}), attributes, incomplete: true };
    }
    const equals = tokens[i + 1]!;
    i += 2;
    const values: Token[] = [];
    for (;;) {
      const value = tokens[i];
      if (!value || (value.type !== 'word' && value.type !== 'string') || tokens[i + 1]?.type === 'equals') {
        diagnostics.push(
          error(
            'BH116',
            `missing value after \`${key.value}=\``,
            tokenSpan(value && value.type !== 'word' ? value : equals),
            {
              help: 'give a value right after `=`, such as level, 0.1 or "text in quotes"',
            },
          ),
        );
        return { keyword, ...(name ? { name } : {}), attributes, incomplete: true };
      }
      values.push(value);
      i++;
      if (tokens[i]?.type === 'comma') {
        i++;
        continue;
      }
      break;
    }
    attributes.push({ key, values });
  }
  return { keyword, ...(name ? { name } : {}), attributes };
}

/** Far longer than any statement needs (a long description is a few hundred characters). Comment lines are exempt: they are kept whole, at no cost per character. */
export const MAX_LINE_LENGTH = 10_000;

/**
 * Parses a .bulk text. Given `onStatement`, hands over each top-level statement as soon as it is complete
 * (the next one starts, or the file ends) and keeps none, so a large file's tokens need not all be held at
 * once; the result's `statements` is then empty.
 */
export function parseBulk(
  text: string,
  diagnostics: Diagnostic[],
  onStatement?: (statement: Statement) => void,
): ParsedFile {
  const lines = splitLines(text);
  const statements: Statement[] = [];
  let pending: string[] = [];
  let current: Statement | undefined;
  let last: Statement | undefined;
  let indentStyle: ' ' | '\t' | undefined;
  lines.forEach((rawLine, index) => {
    const lineNo = index + 1;
    if (rawLine.length > MAX_LINE_LENGTH && !/^[ \t]*#/.test(rawLine)) {
      // Not read at all: what a line this long holds is not a statement, and reading it would only
      // give thousands of diagnostics about one mistake.
      diagnostics.push(
        error(
          'BH105',
          `line is ${rawLine.length} characters long; the limit is ${MAX_LINE_LENGTH}`,
          { line: lineNo, column: MAX_LINE_LENGTH + 1, length: 1 },
          {
            help: 'split the statement over indented continuation lines, or put very long text in a separate document and refer to it',
          },
        ),
      );
      if (current && /^[ \t]/.test(rawLine)) current.incomplete = true;
      return;
    }
    const lexed = lexLine(rawLine, lineNo, diagnostics);
    if (lexed.tokens.length === 0) {
      if (lexed.comment !== undefined) pending.push(lexed.comment);
      return;
    }
    let indented = lexed.indent.length > 0;
    if (indented) {
      const mixed = lexed.indent.includes(' ') && lexed.indent.includes('\t');
      const style = lexed.indent[0] as ' ' | '\t';
      if (mixed || (indentStyle !== undefined && style !== indentStyle)) {
        diagnostics.push(
          error(
            'BH113',
            'indentation mixes tabs and spaces',
            { line: lineNo, column: 1, length: lexed.indent.length },
            {
              help: 'indent continuation lines with spaces only (or tabs only) throughout the file',
            },
          ),
        );
      }
      indentStyle ??= style;
    }
    const parsed = parseLineTokens(lexed, diagnostics);
    if (!parsed) return;
    if (lexed.truncated) parsed.incomplete = true;
    const isAttributeLine = parsed.keyword.value === '';
    if (indented && !current) {
      diagnostics.push(
        error('BH114', 'indented line with no statement above it to continue', tokenSpan(lexed.tokens[0]!), {
          help: 'remove the indentation, or put this line under the statement it belongs to',
        }),
      );
      if (isAttributeLine) return;
      // Read it as the statement it plainly is, so the one mistake is not followed by "missing" ones.
      indented = false;
    }
    if (!indented && isAttributeLine) {
      diagnostics.push(
        error('BH116', 'a statement starts with a keyword', tokenSpan(lexed.tokens[0]!), {
          help: 'indent this line to continue the statement above, or start it with a keyword',
        }),
      );
      return;
    }
    if (isAttributeLine) {
      last!.attributes.push(...parsed.attributes);
      if (parsed.incomplete) last!.incomplete = true;
      if (lexed.comment !== undefined) last!.trailingComment = joinComment(last!.trailingComment, lexed.comment);
      if (pending.length) last!.comments.push(...pending.splice(0));
      return;
    }
    const statement: Statement = {
      ...parsed,
      comments: pending,
      children: [],
      indented,
      ...(lexed.comment !== undefined ? { trailingComment: lexed.comment } : {}),
    };
    pending = [];
    if (indented) {
      current!.children.push(statement);
    } else {
      if (!onStatement) statements.push(statement);
      else if (current) onStatement(current);
      current = statement;
    }
    last = statement;
  });
  if (onStatement && current) onStatement(current);
  return { statements, endComments: pending };
}

function joinComment(existing: string | undefined, added: string): string {
  return existing === undefined ? added : `${existing} #${added}`;
}
