// Reads a JSON model with the position of every value, so JSON users get the same file:line:column
// diagnostics as .bulk users. Strict JSON: no comments, no trailing commas.
import { parseTree, printParseErrorCode, type Node, type ParseError } from 'jsonc-parser';
import { error, type Diagnostic, type Span } from '../diagnostics/diagnostic.ts';
import { heldExactly, tooPrecise } from '../util/decimal.ts';

/** Deeper than any model needs (about 5 levels), shallow enough that no reader runs out of stack. */
export const MAX_JSON_DEPTH = 64;

/** Maps offsets to 1-based line and column. */
export class LineIndex {
  private readonly starts: number[] = [0];
  constructor(text: string) {
    for (let i = 0; i < text.length; i++) {
      const c = text.charCodeAt(i);
      if (c === 10 || (c === 13 && text.charCodeAt(i + 1) !== 10)) this.starts.push(i + 1);
    }
  }
  span(offset: number, length: number): Span {
    let lo = 0;
    let hi = this.starts.length - 1;
    while (lo < hi) {
      const mid = (lo + hi + 1) >> 1;
      if (this.starts[mid]! <= offset) lo = mid;
      else hi = mid - 1;
    }
    return { line: lo + 1, column: offset - this.starts[lo]! + 1, length: Math.max(1, length) };
  }
}

const MESSAGES: Record<string, string> = {
  InvalidSymbol: 'unexpected character',
  InvalidNumberFormat: 'malformed number',
  PropertyNameExpected: 'expected a property name in double quotes',
  ValueExpected: 'expected a value',
  ColonExpected: 'expected `:`',
  CommaExpected: 'expected `,`',
  CloseBraceExpected: 'expected `}`',
  CloseBracketExpected: 'expected `]`',
  EndOfFileExpected: 'unexpected text after the end of the JSON value',
  InvalidCommentToken: 'comments are not allowed in JSON models',
  UnexpectedEndOfComment: 'unterminated comment',
  UnexpectedEndOfString: 'unterminated string',
  UnexpectedEndOfNumber: 'malformed number',
  InvalidUnicode: 'invalid unicode escape',
  InvalidEscapeCharacter: 'invalid escape character',
  InvalidCharacter: 'invalid character in string',
};

/** The message and the place to point at: a trailing comma is shown at the comma, not at the `}` after it. */
function describe(e: ParseError, text: string): { message: string; offset: number; length: number; help?: string } {
  const name = printParseErrorCode(e.error);
  const before = text.slice(0, e.offset).trimEnd();
  if (
    (name === 'ValueExpected' || name === 'PropertyNameExpected') &&
    before.endsWith(',') &&
    /^\s*[}\]]/.test(text.slice(e.offset))
  ) {
    return {
      message: 'trailing comma',
      offset: before.length - 1,
      length: 1,
      help: 'JSON allows no comma after the last item; remove it',
    };
  }
  return { message: MESSAGES[name] ?? name, offset: e.offset, length: e.length };
}

/**
 * The offset of the first `[` or `{` that opens a level deeper than the limit, or -1. Strings and comments
 * are skipped as the parser reads them: a string ends at its closing quote or at a line break.
 */
function tooDeepAt(text: string, limit: number): number {
  let depth = 0;
  for (let i = 0; i < text.length; i++) {
    const c = text.charCodeAt(i);
    if (c === 0x22) {
      for (i++; i < text.length; i++) {
        const d = text.charCodeAt(i);
        if (d === 0x22 || d === 0x0a || d === 0x0d) break;
        if (d === 0x5c) i++;
      }
    } else if (c === 0x2f && text.charCodeAt(i + 1) === 0x2f) {
      while (i < text.length && text.charCodeAt(i) !== 0x0a && text.charCodeAt(i) !== 0x0d) i++;
    } else if (c === 0x2f && text.charCodeAt(i + 1) === 0x2a) {
      const end = text.indexOf('*/', i + 2);
      i = end === -1 ? text.length : end + 1;
    } else if (c === 0x5b || c === 0x7b) {
      if (++depth > limit) return i;
    } else if (c === 0x5d || c === 0x7d) {
      depth--;
    }
  }
  return -1;
}

function toValue(
  node: Node,
  path: string,
  spans: Map<string, Span>,
  index: LineIndex,
  diagnostics: Diagnostic[],
  text: string,
): unknown {
  spans.set(path, index.span(node.offset, node.type === 'object' || node.type === 'array' ? 1 : node.length));
  switch (node.type) {
    case 'object': {
      const out: Record<string, unknown> = {};
      for (const property of node.children ?? []) {
        const [keyNode, valueNode] = property.children ?? [];
        if (!keyNode || !valueNode) continue;
        const key = String(keyNode.value);
        const childPath = path === '' ? key : `${path}.${key}`;
        const keySpan = index.span(keyNode.offset, keyNode.length);
        // JSON.parse would keep the last of two equal keys without a word; the user must choose.
        const first = spans.get(`${childPath}#key`);
        if (first && Object.prototype.hasOwnProperty.call(out, key)) {
          diagnostics.push(
            error('BH117', `field \`${key}\` given twice`, keySpan, {
              related: [{ message: 'first given here', span: first }],
              help: 'keep one of them',
            }),
          );
          continue;
        }
        spans.set(`${childPath}#key`, keySpan);
        const value = toValue(valueNode, childPath, spans, index, diagnostics, text);
        // A plain assignment to `__proto__` would set the prototype; define it as an own key instead,
        // so the schema sees it and rejects it. `constructor` and the like are ordinary own keys.
        if (key === '__proto__')
          Object.defineProperty(out, key, { value, enumerable: true, writable: true, configurable: true });
        else out[key] = value;
      }
      return out;
    }
    case 'array':
      return (node.children ?? []).map((child, i) =>
        toValue(child, path === '' ? String(i) : `${path}.${i}`, spans, index, diagnostics, text),
      );
    case 'number': {
      const literal = text.slice(node.offset, node.offset + node.length);
      if (!heldExactly(literal)) diagnostics.push(tooPrecise(literal, index.span(node.offset, node.length)));
      return node.value;
    }
    default:
      return node.value;
  }
}

export function readJson(
  text: string,
  diagnostics: Diagnostic[],
): { raw: unknown; spans: Map<string, Span> } | undefined {
  const index = new LineIndex(text);
  // The parser and the reader below recurse per level: refuse deep nesting before either sees it.
  const deep = tooDeepAt(text, MAX_JSON_DEPTH);
  if (deep !== -1) {
    diagnostics.push(
      error('BH106', `the JSON is nested more than ${MAX_JSON_DEPTH} levels deep here`, index.span(deep, 1), {
        help: 'a model nests about five levels (model, scenarios, a scenario, its layers, a layer); is this a model file?',
      }),
    );
    return undefined;
  }
  const errors: ParseError[] = [];
  let tree: Node | undefined;
  try {
    tree = parseTree(text, errors, { allowTrailingComma: false, disallowComments: true, allowEmptyContent: false });
  } catch (e) {
    // Should the scan above and the parser ever disagree on what nests, the stack still must not show.
    if (!(e instanceof RangeError)) throw e;
    diagnostics.push(
      error('BH106', 'the JSON is nested too deeply to read', index.span(0, 1), {
        help: 'a model nests about five levels (model, scenarios, a scenario, its layers, a layer); is this a model file?',
      }),
    );
    return undefined;
  }
  if (errors.length) {
    // The parser may report one mistake twice at one offset (a trailing comma in an object is both
    // "property name expected" and "value expected"); keep the first.
    const seen = new Set<number>();
    for (const e of errors) {
      const { message, offset, length, help } = describe(e, text);
      if (seen.has(offset)) continue;
      seen.add(offset);
      diagnostics.push(error('BH119', message, index.span(offset, length), help ? { help } : {}));
    }
    return undefined;
  }
  if (!tree) return undefined;
  const spans = new Map<string, Span>();
  return { raw: toValue(tree, '', spans, index, diagnostics, text), spans };
}
