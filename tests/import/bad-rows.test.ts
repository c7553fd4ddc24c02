// Every bad row is reported at its file, sheet, row and column with a stable code, and the import writes
// nothing (exit 2) unless --partial asks for the rows without errors; unknown columns are reported.
import { existsSync, mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import {
  defaultHeaderMap,
  describePlace,
  importTables,
  readCsvTable,
  readMapping,
  renderReport,
  revisionChanges,
  staleJustifications,
  suggestKind,
  type ImportIssue,
} from '@bulkhead/import';
import { runCli } from '../helpers/cli.ts';

function run(csv: string, name = 'index.csv') {
  const issues: ImportIssue[] = [];
  const table = readCsvTable(name, csv, issues);
  return importTables(table ? [table] : [], defaultHeaderMap(), { generatedPath: 'plant.bulk' }, issues);
}

const first = (csv: string) => {
  const result = run(csv);
  const i = result.issues.find((x) => x.severity === 'error')!;
  return { code: i.code, where: describePlace(i.place), message: i.message, text: result.text };
};

describe('bad rows', () => {
  it.each([
    ['a row with no tag', 'Tag,Type\nLT-1,transmitter\n,transmitter\n', 'BH503', 'index.csv, row 3, column A (Tag)'],
    [
      'a tag twice in one table',
      'Tag,Type\nLT-1,transmitter\nLT-1,transmitter\n',
      'BH504',
      'index.csv, row 3, column A (Tag)',
    ],
    ['no kind and no letters to go by', 'Tag,Service\nQQ,Something\n', 'BH506', 'index.csv, row 2, column A (Tag)'],
    ['an unknown kind', 'Tag,Type\nLT-1,transmiter\n', 'BH507', 'index.csv, row 2, column B (Type)'],
    [
      'a value not among the allowed words',
      'Tag,Type,Fail Action\nXV-1,shutdown-valve,shut\n',
      'BH507',
      'index.csv, row 2, column C (Fail Action)',
    ],
    [
      'a field the kind does not take',
      'Tag,Type,Measured Variable\nXV-1,shutdown-valve,level\n',
      'BH507',
      'index.csv, row 2, column C (Measured Variable)',
    ],
    [
      'a number that is not one',
      'Tag,Type,Sensors,Solver,Finals,PFD\nSIF-1,sif,LT-1,S-1,XV-1,low\n',
      'BH507',
      'index.csv, row 2, column F (PFD)',
    ],
    ['malformed CSV', 'Tag,Type\n"LT-1,transmitter\n', 'BH501', 'index.csv:2:1'],
  ])('%s: %s at %s', (_what, csv, code, where) => {
    const got = first(csv);
    expect(got.code).toBe(code);
    expect(got.where).toBe(where);
    expect(got.text).toBeUndefined();
  });

  it('names both cells when two tables disagree on a field', () => {
    const issues: ImportIssue[] = [];
    const a = readCsvTable('index.csv', 'Tag,Type,Card\nLT-1,transmitter,AI-1\n', issues)!;
    const b = readCsvTable('io.csv', 'Tag,Card\nLT-1,AI-2\n', issues)!;
    const result = importTables([a, b], defaultHeaderMap(), { generatedPath: 'plant.bulk' }, issues);
    const conflict = result.issues.find((i) => i.code === 'BH505')!;
    expect(describePlace(conflict.place)).toBe('io.csv, row 2, column B (Card)');
    expect(describePlace(conflict.related![0]!.place)).toBe('index.csv, row 2, column C (Card)');
  });

  it('reports a column the mapping does not know, and reads the rest', () => {
    const result = run('Tag,Type,Colour\nV-1,vessel,red\n');
    expect(result.issues).toMatchObject([
      { code: 'BH510', severity: 'warning', place: { column: 3, header: 'Colour' } },
    ]);
    expect(result.text).toContain('vessel V-1');
    expect(result.tallies[0]!.unknownColumns).toEqual(['Colour']);
  });

  it('counts blank and spare rows as skipped, with their reason', () => {
    const result = run('Tag,Type\nV-1,vessel\n,\nSPARE,io-card\n');
    expect([...result.tallies[0]!.skipped]).toEqual([
      ['blank row', 1],
      ['spare', 1],
    ]);
    expect(result.tallies[0]).toMatchObject({ read: 2, imported: 1, skippedRows: ['row 4: spare'] });
    expect(renderReport(result.tallies, 0)).toContain('index.csv: skipped\n  row 4: spare');
  });
});

describe('the mapping file', () => {
  it('maps a header to a field, drops a column knowingly, and reports a malformed line at its line', () => {
    const issues: ImportIssue[] = [];
    const map = readMapping(
      'map.txt',
      '# ours\nPos. on Fail = fails-to\nRev = ignore\nno equals here\nX = colour\n',
      issues,
    );
    expect(map.get('pos on fail')).toBe('fails-to');
    expect(map.get('rev')).toBe('ignore');
    expect(issues.map((i) => [i.code, describePlace(i.place)])).toEqual([
      ['BH508', 'map.txt:4:1'],
      ['BH508', 'map.txt:5:5'],
    ]);
  });
});

describe('ISA-5.1 letters suggest a kind', () => {
  // ANSI/ISA-5.1-2009 Table 4.1 (identification letters), from memory: first letter the measured variable
  // (L level, P pressure, T temperature, F flow), succeeding T transmit, V valve, S switch; PSV a pressure
  // safety valve; XV and XY as the trade writes on/off valves and their solenoids (common practice, no source).
  it.each([
    ['LT-101', 'transmitter', 'level'],
    ['PT-202A', 'transmitter', 'pressure'],
    ['TT301', 'transmitter', 'temperature'],
    ['LV-101', 'control-valve', undefined],
    ['XV-101', 'shutdown-valve', undefined],
    ['PSV-201', 'relief-valve', undefined],
    ['XY-101', 'solenoid', undefined],
    ['LSHH-5', 'switch', 'level'],
  ])('%s -> %s', (tag, kind, variable) => {
    expect(suggestKind(tag)).toMatchObject({ kind, ...(variable ? { variable } : {}) });
  });

  it.each(['V-101', 'CAB-1', 'LIC-101', 'QQ-1', 'LT'])('suggests nothing for %s', (tag) => {
    expect(suggestKind(tag)).toBeUndefined();
  });
});

describe('bulkhead import on the command line', () => {
  it('exits 2 and writes nothing when a row is bad, and --partial writes the rest, saying what was left out', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'bh-import-'));
    writeFileSync(join(dir, 'index.csv'), 'Tag,Type\nV-1,vessel\nN-1,nozle\n');
    const out = join(dir, 'plant.bulk');
    const bad = await runCli(['import', join(dir, 'index.csv'), '-o', out]);
    expect(bad.code).toBe(2);
    expect(bad.stderr).toContain('row 3, column B (Type)');
    expect(bad.stderr).toContain('BH507');
    expect(existsSync(out)).toBe(false);
    expect(bad.stderr).not.toContain('importing:'); // no progress line when piped
    const partial = await runCli(['import', join(dir, 'index.csv'), '-o', out, '--partial']);
    expect(partial.code).toBe(2);
    expect(partial.stdout).toContain('left out for errors (--partial): N-1');
    expect(readFileSync(out, 'utf8')).toContain('vessel V-1');
  });

  it('re-import is a revision: lists what was added, removed and changed, and refuses a hand-written file', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'bh-import-'));
    const out = join(dir, 'plant.bulk');
    writeFileSync(join(dir, 'index.csv'), 'Tag,Type,Service\nV-1,vessel,Drum\nV-2,vessel,Tank\n');
    expect((await runCli(['import', join(dir, 'index.csv'), '-o', out])).code).toBe(0);
    writeFileSync(join(dir, 'index.csv'), 'Tag,Type,Service\nV-1,vessel,Surge drum\nV-3,vessel,New tank\n');
    const again = await runCli(['import', join(dir, 'index.csv'), '-o', out]);
    expect(again.code).toBe(0);
    expect(again.stdout).toContain('added (1): V-3');
    expect(again.stdout).toContain('removed (1): V-2');
    expect(again.stdout).toContain('changed (1): V-1');
    writeFileSync(out, 'vessel V-9\n');
    const refused = await runCli(['import', join(dir, 'index.csv'), '-o', out]);
    expect(refused.code).toBe(2);
    expect(readFileSync(out, 'utf8')).toBe('vessel V-9\n');
  });
});

describe('re-import as a revision', () => {
  // Finding keys as rules/define.ts findingKey writes them: rule:scenario:party+party:element.
  it('compares statements by tag, comments aside, and lists accepts whose finding names a changed or removed tag', () => {
    const before =
      'vessel V-1 title="Drum" # from a.csv row 2\nvessel V-2\ntransmitter LT-1 variable=level mounted-on=V-1\n';
    const after =
      'vessel V-1 title="Drum" # from a.csv row 9\nvessel V-3\ntransmitter LT-1 variable=level mounted-on=V-3\n';
    const changes = revisionChanges(before, after);
    expect(changes).toEqual({ added: ['V-3'], removed: ['V-2'], changed: ['LT-1'] });
    const accepts = [
      { finding: 'shared-bridle:S-1:LIC-1+SIF-1:LT-1', by: 'A', date: '2026-01-01', reason: 'r' },
      { finding: 'shared-bridle:S-1:LIC-1+SIF-1:BR-9', by: 'A', date: '2026-01-01', reason: 'r' },
    ];
    expect(staleJustifications(accepts, changes).map((j) => j.finding)).toEqual([accepts[0]!.finding]);
  });
});
