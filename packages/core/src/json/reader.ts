// Reads a JSON model with the position of every value, so JSON users get the same file:line:column
// diagnostics as .bulk users. Strict JSON: no comments, no trailing commas.
import { parseTree, printParseErrorCode, type Node, type ParseError } from 'jsonc-parser';
import { error, type Diagnostic, type Span } from '../diagnostics/diagnostic.ts';
import type { SpanMap } from '../bulk/to-model.ts';

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
  if ((name === 'ValueExpected' || name === 'PropertyNameExpected') && before.endsWith(',') && /^\s*[}\]]/.test(text.slice(e.offset))) {
    return { message: 'trailing comma', offset: before.length - 1, length: 1, help: 'JSON allows no comma after the last item; remove it' };
  }
  return { message: MESSAGES[name] ?? name, offset: e.offset, length: e.length };
}

function toValue(node: Node, path: string, spans: SpanMap, index: LineIndex, diagnostics: Diagnostic[]): unknown {
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
          diagnostics.push(error('BH117', `field \`${key}\` given twice`, keySpan, {
            related: [{ message: 'first given here', span: first }],
            help: 'keep one of them',
          }));
          continue;
        }
        spans.set(`${childPath}#key`, keySpan);
        const value = toValue(valueNode, childPath, spans, index, diagnostics);
        // A plain assignment to `__proto__` would set the prototype; define it as an own key instead,
        // so the schema sees it and rejects it. `constructor` and the like are ordinary own keys.
        if (key === '__proto__') Object.defineProperty(out, key, { value, enumerable: true, writable: true, configurable: true });
        else out[key] = value;
      }
      return out;
    }
    case 'array':
      return (node.children ?? []).map((child, i) => toValue(child, path === '' ? String(i) : `${path}.${i}`, spans, index, diagnostics));
    default:
      return node.value;
  }
}

export function readJson(text: string, diagnostics: Diagnostic[]): { raw: unknown; spans: SpanMap } | undefined {
  const errors: ParseError[] = [];
  const tree = parseTree(text, errors, { allowTrailingComma: false, disallowComments: true, allowEmptyContent: false });
  const index = new LineIndex(text);
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
  const spans: SpanMap = new Map();
  return { raw: toValue(tree, '', spans, index, diagnostics), spans };
}
