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

function describe(e: ParseError, text: string): { message: string; help?: string } {
  const name = printParseErrorCode(e.error);
  const before = text.slice(0, e.offset).trimEnd();
  if ((name === 'ValueExpected' || name === 'PropertyNameExpected') && before.endsWith(',')) {
    return { message: 'trailing comma', help: 'JSON allows no comma after the last item; remove it' };
  }
  return { message: MESSAGES[name] ?? name };
}

function toValue(node: Node, path: string, spans: SpanMap, index: LineIndex): unknown {
  spans.set(path, index.span(node.offset, node.type === 'object' || node.type === 'array' ? 1 : node.length));
  switch (node.type) {
    case 'object': {
      // A null-prototype object keeps `__proto__` and `constructor` as plain keys the schema rejects.
      const out: Record<string, unknown> = Object.create(null);
      for (const property of node.children ?? []) {
        const [keyNode, valueNode] = property.children ?? [];
        if (!keyNode || !valueNode) continue;
        const key = String(keyNode.value);
        const childPath = path === '' ? key : `${path}.${key}`;
        spans.set(`${childPath}#key`, index.span(keyNode.offset, keyNode.length));
        Object.defineProperty(out, key, { value: toValue(valueNode, childPath, spans, index), enumerable: true, writable: true, configurable: true });
      }
      return out;
    }
    case 'array':
      return (node.children ?? []).map((child, i) => toValue(child, path === '' ? String(i) : `${path}.${i}`, spans, index));
    default:
      return node.value;
  }
}

export function readJson(text: string, diagnostics: Diagnostic[]): { raw: unknown; spans: SpanMap } | undefined {
  const errors: ParseError[] = [];
  const tree = parseTree(text, errors, { allowTrailingComma: false, disallowComments: true, allowEmptyContent: false });
  const index = new LineIndex(text);
  if (errors.length) {
    for (const e of errors) {
      const { message, help } = describe(e, text);
      diagnostics.push(error('BH119', message, index.span(e.offset, e.length), help ? { help } : {}));
    }
    return undefined;
  }
  if (!tree) return undefined;
  const spans: SpanMap = new Map();
  return { raw: toValue(tree, '', spans, index), spans };
}
