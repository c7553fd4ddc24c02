// `bulkhead export --tables`: the model's elements, functions and scenarios as CSV tables in the
// importer's own column words, so a model can go to a spreadsheet and come back. Site, policy,
// categories, rules and justifications are hand-written statements and stay in the model file.
import { ELEMENT_GROUPS, kebab, SCENARIO_LINE_SPECS, type Model } from '@bulkhead/core';

type Item = Record<string, unknown>;

/** Which table each element kind goes to, named as the trade names its schedules. */
const TABLE_OF_GROUP: Record<keyof typeof ELEMENT_GROUPS, string> = {
  equipment: 'equipment',
  connection: 'equipment',
  impulse: 'equipment',
  mechanical: 'equipment',
  sensor: 'instrument-index',
  final: 'instrument-index',
  actuation: 'instrument-index',
  signal: 'io-list',
  solver: 'io-list',
  people: 'io-list',
  housing: 'enclosures',
  support: 'supplies',
};

const SKIP = new Set(['kind', 'tag', 'comments', 'trailingComment']);

/** RFC 4180: a field holding a comma, quote or line break is quoted, with quotes doubled. */
export function csvField(text: string): string {
  return /[",\r\n]/.test(text) || text !== text.trim() ? `"${text.replace(/"/g, '""')}"` : text;
}

function csv(rows: string[][]): string {
  return rows.map((r) => r.map(csvField).join(',')).join('\r\n') + '\r\n';
}

function cell(value: unknown): string {
  if (value === undefined) return '';
  return Array.isArray(value) ? value.join(', ') : String(value);
}

function tagTable(items: Item[]): string {
  const columns: string[] = [];
  for (const item of items)
    for (const key of Object.keys(item)) if (!SKIP.has(key) && !columns.includes(key)) columns.push(key);
  return csv([
    ['tag', 'kind', ...columns.map(kebab)],
    ...items.map((i) => [cell(i.tag), cell(i.kind), ...columns.map((c) => cell(i[c]))]),
  ]);
}

function lopaTable(model: Model): string {
  const scenarioColumns: string[] = [];
  const lineColumns: string[] = [];
  const add = (list: string[], key: string) => {
    if (!list.includes(key)) list.push(key);
  };
  const rows: { scenario: Item; line?: string; item?: Item }[] = [];
  for (const s of model.scenarios as unknown as Item[]) {
    for (const key of Object.keys(s))
      if (!['id', 'category', 'cause', 'enablers', 'modifiers', 'layers', ...SKIP].includes(key))
        add(scenarioColumns, key);
    for (const [keyword, spec] of SCENARIO_LINE_SPECS) {
      const value = s[spec.collection];
      for (const item of (spec.single ? [value] : ((value as Item[] | undefined) ?? [])) as (Item | undefined)[]) {
        if (!item) continue;
        for (const key of Object.keys(item)) if (key !== 'comments' && key !== 'trailingComment') add(lineColumns, key);
        rows.push({ scenario: s, line: keyword, item });
      }
    }
  }
  const header = [
    'scenario',
    ...scenarioColumns.map((c) => `scenario-${kebab(c)}`),
    'category',
    'line',
    ...lineColumns.map(kebab),
  ];
  const body = rows.map(({ scenario, line, item }) => {
    return [
      cell(scenario.id),
      ...scenarioColumns.map((c) => cell(scenario[c])),
      cell(scenario.category),
      line ?? '',
      ...lineColumns.map((c) => cell(item?.[c])),
    ];
  });
  return csv([header, ...body]);
}

/** The tables, by file name, in a fixed order. Tables with no rows are left out. */
export function exportTables(model: Model): Map<string, string> {
  const groupOfKind = new Map<string, keyof typeof ELEMENT_GROUPS>();
  for (const [group, kinds] of Object.entries(ELEMENT_GROUPS))
    for (const k of kinds) groupOfKind.set(k, group as keyof typeof ELEMENT_GROUPS);
  const byTable = new Map<string, Item[]>();
  for (const e of model.elements as unknown as Item[]) {
    const table = TABLE_OF_GROUP[groupOfKind.get(String(e.kind))!];
    (byTable.get(table) ?? byTable.set(table, []).get(table)!).push(e);
  }
  const out = new Map<string, string>();
  for (const name of ['supplies', 'enclosures', 'io-list', 'equipment', 'instrument-index']) {
    const items = byTable.get(name);
    if (items?.length) out.set(`${name}.csv`, tagTable(items));
  }
  if (model.functions.length) out.set('loops.csv', tagTable(model.functions as unknown as Item[]));
  if (model.scenarios.length) out.set('lopa.csv', lopaTable(model));
  return out;
}
