// Turns parsed .bulk statements into the model's JSON shape, typing each value by its schema field
// and keeping the token positions of every statement, so later checks can point at the exact text.
import { error, type Diagnostic } from '../diagnostics/diagnostic.ts';
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
import { StatementSpans, type FieldTable, type SpanMap, type StatementPlace } from './spans.ts';

export type { SpanMap } from './spans.ts';
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

interface StatementLayout {
  fields: Map<string, FieldType>;
  /** The attributes a statement takes, by their kebab-case key, with the number the spans know them by. */
  allowedKeys: Map<string, { name: string; f: FieldType; number: number }>;
  table: FieldTable;
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
        name !== spec.positional &&
        name !== 'kind' &&
        !COMMENT_FIELDS.has(name) &&
        f.type !== 'literal' &&
        f.type !== 'nested' &&
        name !== '$schema',
    );
    const table: FieldTable = {
      number: new Map(allowed.map(([name], number) => [name, number])),
      isList: allowed.map(([, f]) => f.type === 'list'),
      ...(spec.positional !== undefined ? { positional: spec.positional } : {}),
    };
    layout = {
      fields,
      allowedKeys: new Map(allowed.map(([name, f], number) => [kebab(name), { name, f, number }])),
      table,
    };
    layouts.set(spec, layout);
  }
  return layout;
}

class StatementReader {
  constructor(
    private readonly diagnostics: Diagnostic[],
    private readonly spans: StatementSpans,
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
      this.diagnostics.push(
        error('BH112', `malformed number \`${token.value}\``, tokenSpan(token), {
          help: 'write numbers like 0.1, 1e-4 or 2.5E-3 (an exponent needs digits after the e)',
        }),
      );
      return undefined;
    }
    this.diagnostics.push(
      error(
        'BH201',
        `\`${key}\` takes a number, found \`${token.value}\``,
        tokenSpan(token),
        token.type === 'string' ? { help: 'write the number without quotes' } : {},
      ),
    );
    return undefined;
  }

  /**
   * Reads one statement into `target`, keeping its token positions for the spans of `path` (filed at
   * `place`); the item itself points at `itemToken`, by default its name or else its keyword. Returns the
   * statement's number in the spans, under which its own indented lines are filed.
   */
  read(
    statement: Statement,
    spec: StatementSpec,
    path: string,
    target: Raw,
    place: StatementPlace,
    itemToken?: Token,
  ): number {
    const { fields, allowedKeys, table } = layoutOf(spec);
    const id = this.spans.open(table, itemToken ?? statement.name ?? statement.keyword, statement.name, place);
    if (statement.incomplete) this.incompletePaths.add(path);
    if (statement.comments.length) target.comments = statement.comments;
    if (statement.trailingComment !== undefined) target.trailingComment = statement.trailingComment;
    if (statement.name) {
      if (!spec.positional) {
        this.diagnostics.push(
          error(
            'BH116',
            `\`${statement.keyword.value}\` takes no name, only key=value attributes`,
            tokenSpan(statement.name),
          ),
        );
      } else {
        const field = fields.get(spec.positional)!;
        const value = this.convert(statement.name, field, spec.positional, `${path}.${spec.positional}`);
        if (value !== undefined) target[spec.positional] = value;
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
            help:
              positionalHint ??
              didYouMean(key, allowedKeys.keys()) ??
              `allowed here: ${[...allowedKeys.keys()].join(', ')}`,
          }),
        );
        continue;
      }
      const earlier = seen.get(key);
      if (earlier) {
        this.diagnostics.push(
          error('BH117', `attribute \`${key}\` given twice`, tokenSpan(attribute.key), {
            related: [{ message: 'first given here', span: tokenSpan(earlier) }],
          }),
        );
        continue;
      }
      seen.set(key, attribute.key);
      this.spans.attribute(entry.number, attribute.values);
      if (entry.f.type === 'list') {
        target[entry.name] = attribute.values.map((token) => token.value);
      } else if (attribute.values.length > 1) {
        this.reportedPaths.add(`${path}.${entry.name}`);
        this.diagnostics.push(
          error('BH201', `\`${key}\` takes one value, found a list`, tokenSpan(attribute.values[1]!), {
            help: 'quote text that contains a comma: key="a, b"',
          }),
        );
      } else {
        const value = this.convert(attribute.values[0]!, entry.f, key, `${path}.${entry.name}`);
        if (value !== undefined) target[entry.name] = value;
      }
    }
    return id;
  }
}

/** Builds the raw model object (not yet validated) and its span map from parsed statements. */
export function statementsToRaw(parsed: ParsedFile, diagnostics: Diagnostic[]): RawModel {
  const builder = new RawModelBuilder(diagnostics);
  for (const statement of parsed.statements) builder.add(statement);
  return builder.finish(parsed.endComments);
}

/**
 * The raw model built a statement at a time, in file order: the loader feeds it each statement as the
 * parser completes it, so the statements' tokens are dropped as it goes rather than held for the whole file.
 */
export class RawModelBuilder {
  private readonly spans = new StatementSpans();
  private readonly reportedPaths = new Set<string>();
  private readonly unknownNames = new Set<string>();
  private readonly incompletePaths = new Set<string>();
  private readonly reader: StatementReader;
  private readonly raw: Raw = { categories: [], elements: [], functions: [], scenarios: [] };
  private readonly firstSeen = new Map<string, Token>();
  private first = true;

  constructor(private readonly diagnostics: Diagnostic[]) {
    this.reader = new StatementReader(diagnostics, this.spans, this.reportedPaths, this.incompletePaths);
  }

  private push(collection: string, item: Raw): number {
    const list = (this.raw[collection] ??= []) as Raw[];
    list.push(item);
    return list.length - 1;
  }

  add(statement: Statement): void {
    const { diagnostics, reader, raw } = this;
    // Problems with the model as a whole (no `site`) point at the first statement.
    if (this.first) this.spans.pointRootAt(tokenSpan(statement.keyword));
    this.first = false;
    const keyword = statement.keyword.value;
    const item: Raw = {};
    const single = SINGLE_SPEC_BY_KEYWORD.get(keyword);
    const listed = LIST_SPEC_BY_KEYWORD.get(keyword);
    if (single) {
      const earlier = this.firstSeen.get(keyword);
      if (earlier) {
        diagnostics.push(
          error('BH120', `\`${keyword}\` given twice`, tokenSpan(statement.keyword), {
            related: [{ message: 'first given here', span: tokenSpan(earlier) }],
            help: `a model has one \`${keyword}\` statement; continue it on indented lines instead`,
          }),
        );
        return;
      }
      this.firstSeen.set(keyword, statement.keyword);
      reader.read(statement, single, keyword, item, { collection: keyword });
      raw[keyword] = item;
    } else if (listed) {
      const spec = listed;
      const index = this.push(spec.collection, item);
      const id = reader.read(statement, spec, `${spec.collection}.${index}`, item, {
        collection: spec.collection,
        index,
      });
      if (keyword === 'scenario')
        readScenarioLines(statement, `${spec.collection}.${index}`, id, item, reader, diagnostics);
    } else if (ELEMENT_SPECS.has(keyword)) {
      item.kind = keyword;
      const index = this.push('elements', item);
      reader.read(statement, ELEMENT_SPECS.get(keyword)!, `elements.${index}`, item, { collection: 'elements', index });
    } else if (FUNCTION_SPECS.has(keyword)) {
      item.kind = keyword;
      const index = this.push('functions', item);
      reader.read(statement, FUNCTION_SPECS.get(keyword)!, `functions.${index}`, item, {
        collection: 'functions',
        index,
      });
    } else {
      diagnostics.push(
        error('BH115', `unknown statement \`${keyword}\``, tokenSpan(statement.keyword), {
          help:
            didYouMean(keyword, TOP_KEYWORDS) ??
            'see `bulkhead --help` and the README for the statements of the language',
        }),
      );
      if (statement.name) this.unknownNames.add(statement.name.value);
      return;
    }
    if (keyword !== 'scenario') rejectChildren(statement, diagnostics);
  }

  finish(endComments: string[]): RawModel {
    if (endComments.length) this.raw.endComments = endComments;
    return {
      raw: this.raw,
      spans: this.spans,
      reportedPaths: this.reportedPaths,
      unknownNames: this.unknownNames,
      incompletePaths: this.incompletePaths,
    };
  }
}

function rejectChildren(statement: Statement, diagnostics: Diagnostic[]): void {
  for (const child of statement.children) {
    diagnostics.push(
      error(
        'BH114',
        `\`${child.keyword.value}\` lines belong under a scenario, not \`${statement.keyword.value}\``,
        tokenSpan(child.keyword),
        {
          help: 'indented lines under an element or function may only continue it with key=value attributes',
        },
      ),
    );
  }
}

/** A scenario's indented lines, filed in the spans under the scenario's statement (`parent`). */
function readScenarioLines(
  statement: Statement,
  path: string,
  parent: number,
  scenario: Raw,
  reader: StatementReader,
  diagnostics: Diagnostic[],
): void {
  let causeToken: Token | undefined;
  for (const child of statement.children) {
    const keyword = child.keyword.value;
    const spec = SCENARIO_LINE_SPECS.get(keyword);
    if (!spec) {
      diagnostics.push(
        error('BH115', `unknown scenario line \`${keyword}\``, tokenSpan(child.keyword), {
          help:
            didYouMean(keyword, SCENARIO_LINE_SPECS.keys()) ??
            `a scenario's lines are ${[...SCENARIO_LINE_SPECS.keys()].join(', ')}`,
        }),
      );
      continue;
    }
    const item: Raw = {};
    if (spec.single) {
      if (causeToken) {
        diagnostics.push(
          error('BH120', 'a scenario has one `cause` line', tokenSpan(child.keyword), {
            related: [{ message: 'first cause here', span: tokenSpan(causeToken) }],
            help: 'split scenarios with different causes into separate scenarios',
          }),
        );
        continue;
      }
      causeToken = child.keyword;
      scenario[spec.collection] = item;
      // The line itself points at its keyword: a cause has no name.
      reader.read(
        child,
        spec,
        `${path}.${spec.collection}`,
        item,
        { collection: spec.collection, parent },
        child.keyword,
      );
    } else {
      const list = (scenario[spec.collection] ??= []) as Raw[];
      list.push(item);
      reader.read(child, spec, `${path}.${spec.collection}.${list.length - 1}`, item, {
        collection: spec.collection,
        index: list.length - 1,
        parent,
      });
    }
  }
}
