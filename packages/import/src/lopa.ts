// The LOPA worksheet: one row per scenario line (cause, layer, modifier, enabler). The scenario's own
// fields (id, title, category) may be on every row or on its first only; a row with a blank scenario
// cell continues the scenario above, as worksheets are usually drawn.
import { issue, type ImportIssue } from './issues.ts';
import { cellPlace, isBlankRow, skip, type CellValue, type TableTally } from './records.ts';
import type { Table } from './tables.ts';

export interface LopaLine {
  keyword: 'cause' | 'layer' | 'modifier' | 'enabler';
  fields: Map<string, CellValue>;
  source: string;
}

export interface LopaScenario {
  id: CellValue;
  fields: Map<string, CellValue>;
  lines: LopaLine[];
  sources: string[];
}

const LINE_WORDS: Record<string, LopaLine['keyword']> = {
  cause: 'cause',
  'initiating cause': 'cause',
  'initiating event': 'cause',
  layer: 'layer',
  ipl: 'layer',
  'protection layer': 'layer',
  modifier: 'modifier',
  'conditional modifier': 'modifier',
  enabler: 'enabler',
  'enabling condition': 'enabler',
};

/** The field a line's first word fills (a layer's function, a modifier's kind, an enabler's title). */
export const LINE_POSITIONAL: Record<LopaLine['keyword'], string | undefined> = {
  cause: undefined,
  layer: 'function',
  modifier: 'kind',
  enabler: 'title',
};

export function readLopa(
  table: Table,
  fields: (string | undefined)[],
  tally: TableTally,
  issues: ImportIssue[],
  name: string,
): LopaScenario[] {
  const scenarios: LopaScenario[] = [];
  const byId = new Map<string, LopaScenario>();
  let current: LopaScenario | undefined;
  const column = (field: string) => fields.indexOf(field);
  for (const row of table.rows) {
    if (isBlankRow(row)) {
      skip(tally, 'blank row', `row ${row.row}`);
      continue;
    }
    tally.read++;
    const id = (row.cells[column('scenario')] ?? '').trim();
    if (id !== '') {
      const known = byId.get(id);
      if (known) current = known;
      else {
        current = {
          id: { value: id, place: cellPlace(table, row.row, column('scenario')) },
          fields: new Map(),
          lines: [],
          sources: [],
        };
        byId.set(id, current);
        scenarios.push(current);
      }
    }
    if (!current) {
      skip(tally, 'no scenario (error)', `row ${row.row}`);
      issues.push(
        issue('BH509', 'the row belongs to no scenario', cellPlace(table, row.row, Math.max(column('scenario'), 0)), {
          help: 'give the scenario id on the first row of each scenario',
        }),
      );
      continue;
    }
    current.sources.push(`${name} row ${row.row}`);
    const lineFields = new Map<string, CellValue>();
    let lineWord = '';
    let linePlace = cellPlace(table, row.row, 0);
    fields.forEach((field, c) => {
      const value = (row.cells[c] ?? '').trim();
      if (field === undefined || field === 'scenario' || value === '') return;
      const cell = { value, place: cellPlace(table, row.row, c) };
      if (field.startsWith('scenario-')) current!.fields.set(field.slice('scenario-'.length), cell);
      else if (field === 'category') current!.fields.set('category', cell);
      else if (field === 'line') {
        lineWord = value.toLowerCase();
        linePlace = cell.place;
      } else lineFields.set(field, cell);
    });
    if (lineWord === '' && lineFields.size === 0) {
      tally.imported++;
      continue;
    }
    const keyword = LINE_WORDS[lineWord.replace(/[^a-z]+/g, ' ').trim()];
    if (!keyword) {
      skip(tally, 'unknown line (error)', `row ${row.row}`);
      issues.push(
        issue(
          'BH509',
          lineWord === ''
            ? 'the row has line values but does not say which line it is'
            : `\`${lineWord}\` is not a scenario line`,
          linePlace,
          {
            help: 'the Line column holds cause, layer, modifier or enabler',
          },
        ),
      );
      continue;
    }
    tally.imported++;
    current.lines.push({ keyword, fields: lineFields, source: `${name} row ${row.row}` });
  }
  return scenarios;
}
