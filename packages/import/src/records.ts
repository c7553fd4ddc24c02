// Rows of tag tables merged by tag: the instrument index gives the kind and make, the I/O list the
// card, the cabinet schedule the enclosure. Each value remembers its cell, so every problem found
// later, by the importer or by the model loader, is reported at the cell it came from.
import { issue, type ImportIssue, type Place } from './issues.ts';
import { suggestKind } from './letters.ts';
import { headerWords, IGNORE, NOTED_FIELDS, type HeaderMap } from './mapping.ts';
import type { Table, TableRow } from './tables.ts';

export interface CellValue {
  value: string;
  place: Place;
}

export interface TagRecord {
  tag: CellValue;
  kind?: CellValue;
  /** Set when the kind came from the tag's ISA-5.1 letters, not from a column. */
  suggested?: string;
  fields: Map<string, CellValue>;
  /** Where the record's rows are: "index.csv row 4". */
  sources: string[];
  /** Values the model has no field for (loop, channel, remarks), kept in the provenance comment. */
  noted: string[];
}

/** Counts per table, for the `--report` summary. */
export interface TableTally {
  table: string;
  read: number;
  imported: number;
  skipped: Map<string, number>;
  /** Each row or object skipped for a reason other than being blank: "row 7: spare". */
  skippedRows: string[];
  unknownColumns: string[];
}

export function tableName(t: Pick<Table, 'file' | 'sheet'>): string {
  return t.sheet === undefined ? t.file : `${t.file} [${t.sheet}]`;
}

export function cellPlace(table: Table, row: number, column: number): Place {
  return {
    file: table.file,
    ...(table.sheet !== undefined ? { sheet: table.sheet } : {}),
    row,
    column: column + 1,
    header: table.headers[column] ?? '',
  };
}

/** The field each column holds (undefined: not read), reporting the columns no mapping knows. */
export function mapColumns(
  table: Table,
  map: HeaderMap,
  tally: TableTally,
  issues: ImportIssue[],
): (string | undefined)[] {
  return table.headers.map((header, column) => {
    if (header === '') {
      const used = table.rows.some((r) => (r.cells[column] ?? '').trim() !== '');
      if (used) {
        tally.unknownColumns.push(`(untitled column ${column + 1})`);
        issues.push(
          issue(
            'BH510',
            'a column with no header holds values; they were not read',
            cellPlace(table, table.headerRow, column),
            {
              severity: 'warning',
              help: 'give the column a header, and name its field in the mapping file',
            },
          ),
        );
      }
      return undefined;
    }
    const field = map.get(headerWords(header));
    if (field === undefined) {
      tally.unknownColumns.push(header);
      issues.push(
        issue(
          'BH510',
          `the column \`${header}\` is not one the mapping knows; its values were not read`,
          cellPlace(table, table.headerRow, column),
          {
            severity: 'warning',
            help: `name its field in a mapping file (\`${header} = field\`), or write \`${header} = ignore\` to drop it knowingly`,
          },
        ),
      );
      return undefined;
    }
    return field === IGNORE ? undefined : field;
  });
}

export const isBlankRow = (row: TableRow) => row.cells.every((c) => c.trim() === '');
const SPARE = /^spare\b/i;

export function skip(tally: TableTally, reason: string, where: string): void {
  tally.skipped.set(reason, (tally.skipped.get(reason) ?? 0) + 1);
  if (reason !== 'blank row') tally.skippedRows.push(`${where}: ${reason}`);
}

/** Normalises a kind as written in a sheet: "Control Valve" -> control-valve. */
export function kindWord(text: string): string {
  return text
    .trim()
    .toLowerCase()
    .replace(/[\s_]+/g, '-');
}

/** Merges the rows of tag tables into records by tag, in the order tags are first seen. */
export function mergeTagTables(
  tables: { table: Table; fields: (string | undefined)[]; tally: TableTally }[],
  issues: ImportIssue[],
): Map<string, TagRecord> {
  const records = new Map<string, TagRecord>();
  for (const { table, fields, tally } of tables) {
    const tagColumn = fields.indexOf('tag');
    const seenHere = new Map<string, number>();
    for (const row of table.rows) {
      if (isBlankRow(row)) {
        skip(tally, 'blank row', `row ${row.row}`);
        continue;
      }
      tally.read++;
      const tagText = tagColumn === -1 ? '' : (row.cells[tagColumn] ?? '').trim();
      if (tagText === '') {
        skip(tally, 'no tag (error)', `row ${row.row}`);
        issues.push(
          issue(
            'BH503',
            'the row has values but no tag',
            { ...cellPlace(table, row.row, Math.max(tagColumn, 0)) },
            {
              help:
                tagColumn === -1
                  ? 'the table needs a tag column (Tag, Tag No., ...); name it in the mapping file'
                  : 'give the row its tag, or clear the row',
            },
          ),
        );
        continue;
      }
      if (SPARE.test(tagText)) {
        skip(tally, 'spare', `row ${row.row}`);
        continue;
      }
      const earlier = seenHere.get(tagText);
      if (earlier !== undefined) {
        skip(tally, 'tag given twice (error)', `row ${row.row}`);
        issues.push(
          issue('BH504', `the tag \`${tagText}\` is given twice in this table`, cellPlace(table, row.row, tagColumn), {
            related: [{ message: 'first given here', place: cellPlace(table, earlier, tagColumn) }],
            help: 'a table lists each tag once; merge the two rows',
          }),
        );
        continue;
      }
      seenHere.set(tagText, row.row);
      let record = records.get(tagText);
      if (!record) {
        record = {
          tag: { value: tagText, place: cellPlace(table, row.row, tagColumn) },
          fields: new Map(),
          sources: [],
          noted: [],
        };
        records.set(tagText, record);
      }
      record.sources.push(`${tableName(table)} row ${row.row}`);
      tally.imported++;
      fields.forEach((field, column) => {
        if (field === undefined || field === 'tag') return;
        const value = (row.cells[column] ?? '').trim();
        if (value === '') return;
        const cell = { value: field === 'kind' ? kindWord(value) : value, place: cellPlace(table, row.row, column) };
        if ((NOTED_FIELDS as readonly string[]).includes(field)) {
          record.noted.push(`${field} ${value.replace(/[\r\n]+/g, ' ')}`);
          return;
        }
        const held = field === 'kind' ? record.kind : record.fields.get(field);
        if (held && held.value !== cell.value) {
          issues.push(
            issue(
              'BH505',
              `\`${tagText}\` has ${field} \`${held.value}\` in one table and \`${cell.value}\` in another`,
              cell.place,
              {
                related: [{ message: `${field} given as \`${held.value}\` here`, place: held.place }],
                help: 'correct the table that is out of date; the importer does not choose between them',
              },
            ),
          );
          return;
        }
        if (field === 'kind') record.kind = cell;
        else record.fields.set(field, cell);
      });
    }
  }
  return records;
}

/**
 * Gives each record without a kind one from its ISA-5.1 letters, marked as suggested; run after every
 * source is merged, as a P&ID may give the kind an I/O list row lacks.
 */
export function resolveKinds(records: Map<string, TagRecord>, issues: ImportIssue[]): void {
  for (const record of records.values()) {
    if (record.kind) continue;
    const suggestion = suggestKind(record.tag.value);
    if (!suggestion) {
      issues.push(
        issue('BH506', `\`${record.tag.value}\` has no kind, and its tag letters suggest none`, record.tag.place, {
          help: 'add a Kind column (transmitter, control-valve, io-card, ...) or give the kind in the instrument index',
        }),
      );
      continue;
    }
    record.kind = { value: suggestion.kind, place: record.tag.place };
    record.suggested = suggestion.letters;
    if (suggestion.variable && !record.fields.has('variable'))
      record.fields.set('variable', { value: suggestion.variable, place: record.tag.place });
  }
}

/**
 * Merges records from another source (the P&ID) into the table records by tag. A field both give
 * differently is an error naming both places; the importer does not choose between the sources.
 * Returns the tags each source alone holds, so the user can see what the other one lacks.
 */
export function mergeRecords(
  into: Map<string, TagRecord>,
  extra: readonly TagRecord[],
  issues: ImportIssue[],
): { onlyInExtra: string[]; onlyInTables: string[] } {
  const tableTags = new Set(into.keys());
  const extraTags = new Set<string>();
  for (const r of extra) {
    extraTags.add(r.tag.value);
    const held = into.get(r.tag.value);
    if (!held) {
      into.set(r.tag.value, r);
      continue;
    }
    held.sources.push(...r.sources);
    held.noted.push(...r.noted);
    const pairs: [string, CellValue | undefined][] = [['kind', r.kind], ...r.fields];
    for (const [field, cell] of pairs) {
      if (!cell) continue;
      const have = field === 'kind' ? held.kind : held.fields.get(field);
      if (!have) {
        if (field === 'kind') held.kind = cell;
        else held.fields.set(field, cell);
      } else if (have.value !== cell.value) {
        issues.push(
          issue(
            'BH505',
            `\`${r.tag.value}\` has ${field} \`${have.value}\` in the tables and \`${cell.value}\` in the P&ID`,
            cell.place,
            {
              related: [{ message: `${field} given as \`${have.value}\` here`, place: have.place }],
              help: 'correct the source that is out of date; the importer does not choose between them',
            },
          ),
        );
      }
    }
  }
  return {
    onlyInExtra: [...extraTags].filter((t) => !tableTags.has(t)),
    onlyInTables: [...tableTags].filter((t) => !extraTags.has(t)),
  };
}
