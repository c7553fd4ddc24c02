// Writes the demo site's plant data as a company might keep it: one workbook with an instrument index,
// an I/O list, control-system, equipment, enclosure and supply schedules, a loop list and the LOPA
// worksheet, under invented company headers (Marrow Fen is invented). `tests/import/demo-tables.test.ts`
// imports it and checks the model gives the demo's findings and figures. Run: npx tsx scripts/demo-tables.ts
import { readFileSync } from 'node:fs';
import ExcelJS from 'exceljs';
import { ELEMENT_GROUPS, kebab, loadModelText, type Model } from '@bulkhead/core';
import { exportTables } from '@bulkhead/import';
import { parse } from 'csv-parse/sync';

type Item = Record<string, unknown>;
const OUT = 'fixtures/demo/tables/marrow-fen-plant.xlsx';
const model = loadModelText('marrow-fen.bulk', readFileSync('fixtures/demo/marrow-fen.bulk')).model as Model;

/** Company header words for the fields (invented, like the site); the mapping file covers the odd ones. */
const HEADERS: Record<string, string> = {
  tag: 'Tag No.',
  kind: 'Type',
  title: 'Service',
  variable: 'Measured Variable',
  make: 'Manufacturer',
  model: 'Model No.',
  technology: 'Principle',
  mountedOn: 'Process Connection',
  failsTo: 'Pos. on Fail',
  supply: 'Supply',
  airFrom: 'Air Supply',
  poweredBy: 'Fed From',
  housedIn: 'Cabinet',
  signalVia: 'Signal Via',
  system: 'System',
};
const header = (field: string) => HEADERS[field] ?? kebab(field);
const text = (v: unknown) => (v === undefined ? '' : Array.isArray(v) ? v.join(', ') : String(v));
const instrumentKinds = new Set<string>([
  ...ELEMENT_GROUPS.sensor,
  ...ELEMENT_GROUPS.final,
  ...ELEMENT_GROUPS.actuation,
]);
const loopOf = (tag: string) =>
  model.functions.find((f) =>
    [...(((f as Item).sensors as string[]) ?? []), ...(((f as Item).finals as string[]) ?? [])].includes(tag),
  )?.tag ?? '';

function sheet(book: ExcelJS.Workbook, name: string, columns: string[], rows: string[][]): void {
  const ws = book.addWorksheet(name);
  ws.addRow(columns);
  for (const r of rows) ws.addRow(r);
}

function tagSheet(
  book: ExcelJS.Workbook,
  name: string,
  items: Item[],
  options: { drop?: string[]; extra?: [string, (i: Item) => string][]; blankKind?: Set<string> } = {},
): void {
  const fields: string[] = [];
  for (const i of items)
    for (const k of Object.keys(i))
      if (!['tag', 'kind', 'comments', 'trailingComment', ...(options.drop ?? [])].includes(k) && !fields.includes(k))
        fields.push(k);
  const extra = options.extra ?? [];
  sheet(
    book,
    name,
    [header('tag'), header('kind'), ...fields.map(header), ...extra.map(([h]) => h)],
    items.map((i) => [
      text(i.tag),
      options.blankKind?.has(String(i.tag)) ? '' : text(i.kind),
      ...fields.map((f) => text(i[f])),
      ...extra.map(([, f]) => f(i)),
    ]),
  );
}

const book = new ExcelJS.Workbook();
const elements = model.elements as unknown as Item[];
const instruments = elements.filter((e) => instrumentKinds.has(String(e.kind)));
// The index leaves the kind blank for two tags: their ISA-5.1 letters (LT, XY) suggest it.
tagSheet(book, 'Instrument Index', instruments, {
  drop: ['signalVia'],
  extra: [
    ['Loop No.', (i) => loopOf(String(i.tag))],
    ['Rev', () => 'B'],
  ],
  blankKind: new Set(['LT-103', 'XY-101']),
});
const wired = instruments.filter((i) => i.signalVia);
sheet(
  book,
  'IO List',
  ['Tag No.', 'Signal Via', 'Channel'],
  [...wired.map((i, n) => [text(i.tag), text(i.signalVia), String(n + 1)]), ['SPARE-01', 'AI-1-03', '16']],
);
tagSheet(
  book,
  'Control System',
  elements.filter((e) =>
    ['solver', 'signal', 'people'].some((g) =>
      (ELEMENT_GROUPS as Record<string, readonly string[]>)[g]!.includes(String(e.kind)),
    ),
  ),
);
tagSheet(
  book,
  'Equipment',
  elements.filter((e) =>
    ['equipment', 'connection', 'impulse', 'mechanical'].some((g) =>
      (ELEMENT_GROUPS as Record<string, readonly string[]>)[g]!.includes(String(e.kind)),
    ),
  ),
);
tagSheet(
  book,
  'Enclosures',
  elements.filter((e) => (ELEMENT_GROUPS.housing as readonly string[]).includes(String(e.kind))),
);
tagSheet(
  book,
  'Supplies',
  elements.filter((e) => (ELEMENT_GROUPS.support as readonly string[]).includes(String(e.kind))),
);
tagSheet(book, 'Loops', model.functions as unknown as Item[]);
const lopa = parse(exportTables(model).get('lopa.csv')!) as string[][];
sheet(
  book,
  'LOPA',
  lopa[0]!.map((h) => (h === 'scenario-title' ? 'Scenario Description' : h === 'line' ? 'LOPA Line' : h)),
  lopa.slice(1),
);
await book.xlsx.writeFile(OUT);
process.stdout.write(`${OUT}\n`);
