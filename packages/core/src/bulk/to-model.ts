// Turns parsed .bulk statements into the model's JSON shape, typing each value by its schema field
// and recording the source span of every value, so later checks can point at the exact text.
import { error, type Diagnostic, type Span } from '../diagnostics/diagnostic.ts';
import {
  camel,
  COMMENT_FIELDS,
  ELEMENT_SPECS,
  fieldsOf,
  FUNCTION_SPECS,
  kebab,
  LIST_SPEC_BY_KEYWORD,
  SCENARIO_LINE_SPECS,
  SINGLE_SPEC_BY_KEYWORD,
  TOP_KEYWORDS,
  type FieldType,
  type StatementSpec,
} from '../model/fields.ts';
import { heldExactly, tooPrecise } from '../util/decimal.ts';
import { didYouMean } from '../util/suggest.ts';
import type { Token } from './lexer.ts';
import { tokenSpan, type ParsedFile, type Statement } from './parser.ts';

export type SpanMap = Map<string, Span>;
type Raw = Record<string, unknown>;

/** What reading the statements produced besides the raw model, so the loader does not report twice. */
export interface RawModel {
  raw: Raw;
  spans: SpanMap;
  /** Paths of values already reported as malformed (left out of `raw`, so the schema would call them missing). */
  reportedPaths: Set<string>;
  /** Names given to statements with an unknown keyword: references to them are not reported again. */
  unknownNames: Set<string>;
  /** Paths of items a syntax error cut short: fields they lack were lost, not left out. */
  incompletePaths: Set<string>;
}

const NUMBER = /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/;

function joinSpans(first: Token, last: Token): Span {
  if (first.line !== last.line) return tokenSpan(first);
  return { ...tokenSpan(first), length: last.column + last.length - first.column };
}

interface StatementLayout {
  fields: Map<string, FieldType>;
  /** The attributes a statement takes, by their kebab-case key. */
  allowedKeys: Map<string, { name: string; f: FieldType }>;
}

/** Worked out once per statement kind, not once per statement: a large site has 100k of them. */
const layouts = new WeakMap<StatementSpec, StatementLayout>();

function layoutOf(spec: StatementSpec): StatementLayout {
  let layout = layouts.get(spec);
  if (!layout) {
    const fields = fieldsOf(spec.schema);
    // `kind` is the statement's keyword, never an attribute: `vessel V-1 kind=pump` must not make a pump.
    const allowed = [...fields.entries()].filter(
      ([name, f]) =>
        name !== spec.positional && name !== 'kind' && !COMMENT_FIELDS.has(name) && f.type !== 'literal' && f.type !== 'nested' && name !== '$schema',
    );
    layout = { fields, allowedKeys: new Map(allowed.map(([name, f]) => [kebab(name), { name, f }])) };
    layouts.set(spec, layout);
  }
  return layout;
}

class StatementReader {
  constructor(
    private readonly diagnostics: Diagnostic[],
    private readonly spans: SpanMap,
    private readonly reportedPaths: Set<string>,
    private readonly incompletePaths: Set<string>,
  ) {}

  private convert(token: Token, field: FieldType, key: string, path: string): unknown {
    if (field.type !== 'number') return token.value;
    if (token.type === 'word' && NUMBER.test(token.value)) {
      if (heldExactly(token.value)) return Number(token.value);
      this.reportedPaths.add(path);
      this.diagnostics.push(tooPrecise(token.value, tokenSpan(token)));
      return undefined;
    }
    this.reportedPaths.add(path);
    if (token.type === 'word' && /^[+-]?[\d.]/.test(token.value)) {
      this.diagnostics.push(error('BH112', `malformed number \`${token.value}\``, tokenSpan(token), {
        help: 'write numbers like 0.1, 1e-4 or 2.5E-3 (an exponent needs digits after the e)',
      }));
      return undefined;
    }
    this.diagnostics.push(error('BH201', `\`${key}\` takes a number, found \`${token.value}\``, tokenSpan(token),
      token.type === 'string' ? { help: 'write the number without quotes' } : {}));
    return undefined;
  }

  /** Reads one statement into `target`, recording spans under `path`. */
  read(statement: Statement, spec: StatementSpec, path: string, target: Raw): void {
    const { fields, allowedKeys } = layoutOf(spec);
    this.spans.set(path, tokenSpan(statement.name ?? statement.keyword));
    if (statement.incomplete) this.incompletePaths.add(path);
    if (statement.comments.length) target.comments = statement.comments;
    if (statement.trailingComment !== undefined) target.trailingComment = statement.trailingComment;
    if (statement.name) {
      if (!spec.positional) {
        this.diagnostics.push(error('BH116', `\`${statement.keyword.value}\` takes no name, only key=value attributes`, tokenSpan(statement.name)));
      } else {
        const field = fields.get(spec.positional)!;
        const value = this.convert(statement.name, field, spec.positional, `${path}.${spec.positional}`);
        if (value !== undefined) target[spec.positional] = value;
        this.spans.set(`${path}.${spec.positional}`, tokenSpan(statement.name));
      }
    }
    const seen = new Map<string, Token>();
    for (const attribute of statement.attributes) {
      const key = attribute.key.value;
      const entry = allowedKeys.get(key);
      if (!entry) {
        const positionalHint =
          spec.positional && camel(key) === spec.positional
            ? `write the ${spec.positional} right after \`${statement.keyword.value}\`, without \`${key}=\``
            : undefined;
        this.diagnostics.push(
          error('BH118', `unknown attribute \`${key}\` for \`${statement.keyword.value}\``, tokenSpan(attribute.key), {
            help: positionalHint ?? didYouMean(key, allowedKeys.keys()) ?? `allowed here: ${[...allowedKeys.keys()].join(', ')}`,
          }),
        );
        continue;
      }
      const earlier = seen.get(key);
      if (earlier) {
        this.diagnostics.push(error('BH117', `attribute \`${key}\` given twice`, tokenSpan(attribute.key), {
          related: [{ message: 'first given here', span: tokenSpan(earlier) }],
        }));
        continue;
      }
      seen.set(key, attribute.key);
      const fieldPath = `${path}.${entry.name}`;
      this.spans.set(fieldPath, joinSpans(attribute.values[0]!, attribute.values[attribute.values.length - 1]!));
      if (entry.f.type === 'list') {
        target[entry.name] = attribute.values.map((token, i) => {
          this.spans.set(`${fieldPath}.${i}`, tokenSpan(token));
          return token.value;
        });
      } else if (attribute.values.length > 1) {
        this.reportedPaths.add(fieldPath);
        this.diagnostics.push(error('BH201', `\`${key}\` takes one value, found a list`, tokenSpan(attribute.values[1]!), {
          help: 'quote text that contains a comma: key="a, b"',
        }));
      } else {
        const value = this.convert(attribute.values[0]!, entry.f, key, fieldPath);
        if (value !== undefined) target[entry.name] = value;
      }
    }
  }
}

/** Builds the raw model object (not yet validated) and its span map from parsed statements. */
export function statementsToRaw(parsed: ParsedFile, diagnostics: Diagnostic[]): RawModel {
  const spans: SpanMap = new Map();
  const reportedPaths = new Set<string>();
  const unknownNames = new Set<string>();
  const incompletePaths = new Set<string>();
  const reader = new StatementReader(diagnostics, spans, reportedPaths, incompletePaths);
  // Problems with the model as a whole (no `site`) point at the first statement.
  const first = parsed.statements[0];
  spans.set('', first ? tokenSpan(first.keyword) : { line: 1, column: 1, length: 1 });
  const raw: Raw = { categories: [], elements: [], functions: [], scenarios: [] };
  const firstSeen = new Map<string, Token>();
  const push = (collection: string, item: Raw): number => {
    const list = (raw[collection] ??= []) as Raw[];
    list.push(item);
    return list.length - 1;
  };
  for (const statement of parsed.statements) {
    const keyword = statement.keyword.value;
    const item: Raw = {};
    const single = SINGLE_SPEC_BY_KEYWORD.get(keyword);
    const listed = LIST_SPEC_BY_KEYWORD.get(keyword);
    if (single) {
      const earlier = firstSeen.get(keyword);
      if (earlier) {
        diagnostics.push(error('BH120', `\`${keyword}\` given twice`, tokenSpan(statement.keyword), {
          related: [{ message: 'first given here', span: tokenSpan(earlier) }],
          help: `a model has one \`${keyword}\` statement; continue it on indented lines instead`,
        }));
        continue;
      }
      firstSeen.set(keyword, statement.keyword);
      reader.read(statement, single, keyword, item);
      raw[keyword] = item;
    } else if (listed) {
      const spec = listed;
      const index = push(spec.collection, item);
      reader.read(statement, spec, `${spec.collection}.${index}`, item);
      if (keyword === 'scenario') readScenarioLines(statement, `${spec.collection}.${index}`, item, reader, diagnostics, spans);
    } else if (ELEMENT_SPECS.has(keyword)) {
      item.kind = keyword;
      const index = push('elements', item);
      reader.read(statement, ELEMENT_SPECS.get(keyword)!, `elements.${index}`, item);
    } else if (FUNCTION_SPECS.has(keyword)) {
      item.kind = keyword;
      const index = push('functions', item);
      reader.read(statement, FUNCTION_SPECS.get(keyword)!, `functions.${index}`, item);
    } else {
      diagnostics.push(error('BH115', `unknown statement \`${keyword}\``, tokenSpan(statement.keyword), {
        help: didYouMean(keyword, TOP_KEYWORDS) ?? 'see `bulkhead --help` and the README for the statements of the language',
      }));
      if (statement.name) unknownNames.add(statement.name.value);
      continue;
    }
    if (keyword !== 'scenario') rejectChildren(statement, diagnostics);
  }
  if (parsed.endComments.length) raw.endComments = parsed.endComments;
  return { raw, spans, reportedPaths, unknownNames, incompletePaths };
}

function rejectChildren(statement: Statement, diagnostics: Diagnostic[]): void {
  for (const child of statement.children) {
    diagnostics.push(error('BH114', `\`${child.keyword.value}\` lines belong under a scenario, not \`${statement.keyword.value}\``, tokenSpan(child.keyword), {
      help: 'indented lines under an element or function may only continue it with key=value attributes',
    }));
  }
}

function readScenarioLines(statement: Statement, path: string, scenario: Raw, reader: StatementReader, diagnostics: Diagnostic[], spans: SpanMap): void {
  let causeToken: Token | undefined;
  for (const child of statement.children) {
    const keyword = child.keyword.value;
    const spec = SCENARIO_LINE_SPECS.get(keyword);
    if (!spec) {
      diagnostics.push(error('BH115', `unknown scenario line \`${keyword}\``, tokenSpan(child.keyword), {
        help: didYouMean(keyword, SCENARIO_LINE_SPECS.keys()) ?? `a scenario's lines are ${[...SCENARIO_LINE_SPECS.keys()].join(', ')}`,
      }));
      continue;
    }
    const item: Raw = {};
    if (spec.single) {
      if (causeToken) {
        diagnostics.push(error('BH120', 'a scenario has one `cause` line', tokenSpan(child.keyword), {
          related: [{ message: 'first cause here', span: tokenSpan(causeToken) }],
          help: 'split scenarios with different causes into separate scenarios',
        }));
        continue;
      }
      causeToken = child.keyword;
      scenario[spec.collection] = item;
      reader.read(child, spec, `${path}.${spec.collection}`, item);
      spans.set(`${path}.${spec.collection}`, tokenSpan(child.keyword));
    } else {
      const list = (scenario[spec.collection] ??= []) as Raw[];
      list.push(item);
      reader.read(child, spec, `${path}.${spec.collection}.${list.length - 1}`, item);
    }
  }
}
