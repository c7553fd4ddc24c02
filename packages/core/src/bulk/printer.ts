// The canonical .bulk printer: one statement per line, attributes in schema order, sections in a
// fixed order, every comment kept. Printing a parsed file and parsing it again gives the same model.
import {
  COMMENT_FIELDS,
  ELEMENT_SPECS,
  fieldsOf,
  FUNCTION_SPECS,
  kebab,
  LIST_SPECS,
  SCENARIO_LINE_SPECS,
  SINGLE_SPECS,
  TEXT_FIELDS,
  type StatementSpec,
} from '../model/fields.ts';
import type { Model } from '../model/schema.ts';

const BARE = /^[A-Za-z0-9][A-Za-z0-9_.\-/+:]*$/;

export function formatNumber(n: number): string {
  if (Object.is(n, -0)) return '-0';
  if (n !== 0 && Math.abs(n) <= 1e-3) return n.toExponential();
  return String(n);
}

const SHORT_ESCAPES: Record<string, string> = { '\\': '\\\\', '"': '\\"', '\n': '\\n', '\r': '\\r', '\t': '\\t' };

/**
 * Quotes text so the lexer reads back exactly the same string: control characters, which would break
 * the line or hide in a terminal, and lone UTF-16 surrogates, which UTF-8 cannot store, become \u{...}.
 */
function quote(text: string): string {
  const escaped = text.replace(
    // eslint-disable-next-line no-control-regex -- matching control characters is the point of this pattern
    /[\\"\u0000-\u001f\u007f]|[\ud800-\udbff](?![\udc00-\udfff])|(?<![\ud800-\udbff])[\udc00-\udfff]/g,
    (c) => SHORT_ESCAPES[c] ?? `\\u{${c.charCodeAt(0).toString(16)}}`,
  );
  return `"${escaped}"`;
}

function printValue(field: string, value: unknown): string {
  if (typeof value === 'number') return formatNumber(value);
  const text = String(value);
  return !TEXT_FIELDS.has(field) && BARE.test(text) ? text : quote(text);
}

type Item = Record<string, unknown>;

function commentLines(item: Item, indent: string): string[] {
  const comments = (item.comments as string[] | undefined) ?? [];
  return comments.map((c) => `${indent}#${c}`);
}

/** The attributes a statement prints, in schema order, with their keys: worked out once per kind. */
const attributeLists = new WeakMap<StatementSpec, { name: string; key: string }[]>();

function attributesOf(spec: StatementSpec): { name: string; key: string }[] {
  let list = attributeLists.get(spec);
  if (!list) {
    list = [...fieldsOf(spec.schema)]
      .filter(
        ([name, field]) =>
          !(
            name === spec.positional ||
            name === 'kind' ||
            name === '$schema' ||
            COMMENT_FIELDS.has(name) ||
            field.type === 'literal' ||
            field.type === 'nested'
          ),
      )
      .map(([name]) => ({ name, key: kebab(name) }));
    attributeLists.set(spec, list);
  }
  return list;
}

function printLine(keyword: string, spec: StatementSpec, item: Item, indent: string): string[] {
  const parts = [keyword];
  if (spec.positional && item[spec.positional] !== undefined)
    parts.push(printValue(spec.positional, item[spec.positional]));
  for (const { name, key } of attributesOf(spec)) {
    const value = item[name];
    if (value === undefined) continue;
    const printed = Array.isArray(value) ? value.map((v) => printValue(name, v)).join(',') : printValue(name, value);
    parts.push(`${key}=${printed}`);
  }
  const trailing = item.trailingComment === undefined ? '' : ` #${String(item.trailingComment)}`;
  return [...commentLines(item, indent), `${indent}${parts.join(' ')}${trailing}`];
}

interface Block {
  section: string;
  lines: string[];
  commented: boolean;
}

function block(section: string, item: Item, lines: string[]): Block {
  return { section, lines, commented: ((item.comments as string[] | undefined) ?? []).length > 0 };
}

/** A `part` statement of a multi-file model, as the printer keeps it (see loader/parts.ts). */
export interface PartLine {
  path: string;
  comments?: string[];
  trailingComment?: string;
}

/**
 * Prints a model, or one file of a multi-file model: such a file may lack `site` and may name parts,
 * which print after the head statements in the order written.
 */
export function printBulk(model: Model, parts: readonly PartLine[] = []): string {
  const blocks: Block[] = [];
  const m = model as unknown as Record<string, unknown>;
  if (m.site) blocks.push(block('head', m.site as Item, printLine('site', SINGLE_SPECS.site, m.site as Item, '')));
  if (m.policy)
    blocks.push(block('head', m.policy as Item, printLine('policy', SINGLE_SPECS.policy, m.policy as Item, '')));
  for (const p of parts) {
    const trailing = p.trailingComment === undefined ? '' : ` #${p.trailingComment}`;
    blocks.push(
      block('part', p as unknown as Item, [
        ...commentLines(p as unknown as Item, ''),
        `part ${quote(p.path)}${trailing}`,
      ]),
    );
  }
  for (const c of model.categories) blocks.push(block('head', c, printLine('category', LIST_SPECS.category, c, '')));
  for (const r of model.rules ?? []) blocks.push(block('head', r, printLine('rule', LIST_SPECS.rule, r, '')));
  for (const e of model.elements)
    blocks.push(block('elements', e, printLine(e.kind, ELEMENT_SPECS.get(e.kind)!, e, '')));
  for (const f of model.functions)
    blocks.push(block('functions', f, printLine(f.kind, FUNCTION_SPECS.get(f.kind)!, f, '')));
  for (const s of model.scenarios) {
    const lines = printLine('scenario', LIST_SPECS.scenario, s, '');
    const item = s as unknown as Item;
    for (const [keyword, spec] of SCENARIO_LINE_SPECS) {
      const value = item[spec.collection];
      const children = (spec.single ? [value] : ((value as Item[] | undefined) ?? [])) as (Item | undefined)[];
      for (const child of children) if (child) lines.push(...printLine(keyword, spec, child, '  '));
    }
    blocks.push({ section: 'scenario', lines, commented: true });
  }
  for (const d of model.failureData ?? [])
    blocks.push(block('failure-data', d, printLine('failure-data', LIST_SPECS['failure-data'], d, '')));
  for (const c of model.commonCauses ?? [])
    blocks.push(block('common-cause', c, printLine('common-cause', LIST_SPECS['common-cause'], c, '')));
  for (const j of model.justifications ?? [])
    blocks.push(block('accept', j, printLine('accept', LIST_SPECS.accept, j, '')));
  const out: string[] = [];
  blocks.forEach((b, i) => {
    const previous = blocks[i - 1];
    if (previous && (b.commented || previous.section !== b.section || previous.section === 'scenario')) out.push('');
    out.push(...b.lines);
  });
  if (model.endComments?.length) {
    out.push('');
    out.push(...model.endComments.map((c) => `#${c}`));
  }
  return out.join('\n') + '\n';
}
