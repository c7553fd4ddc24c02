// The invented demo site's plant workbook (fixtures/demo/tables, written by scripts/demo-tables.ts
// under company-style headers, with an I/O list apart from the index and two kinds left to the tag
// letters) imports to a model that gives exactly the demo's findings and LOPA figures.
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { loadModelText } from '@bulkhead/core';
import { importTables, readMapping, readXlsxTables, renderReport, type ImportIssue } from '@bulkhead/import';
import { content, loadWithParts, memoryReader, outcome } from './helpers.ts';

const DIR = 'fixtures/demo/tables';
const SITE = `${DIR}/marrow-fen-site.bulk`;
const PART = `${DIR}/generated/plant.bulk`;

async function importDemo() {
  const issues: ImportIssue[] = [];
  const map = readMapping(
    `${DIR}/marrow-fen-mapping.txt`,
    readFileSync(`${DIR}/marrow-fen-mapping.txt`, 'utf8'),
    issues,
  );
  const tables = await readXlsxTables(
    `${DIR}/marrow-fen-plant.xlsx`,
    readFileSync(`${DIR}/marrow-fen-plant.xlsx`),
    issues,
  );
  const model = { file: SITE, text: readFileSync(SITE, 'utf8'), readPart: memoryReader({}) };
  return importTables(tables, map, { generatedPath: PART, model }, issues);
}

describe('the demo plant workbook', () => {
  it('imports with no error and no warning, every row counted', async () => {
    const result = await importDemo();
    expect(result.issues).toEqual([]);
    expect(result.modelProblems).toEqual([]);
    expect(result.text).toBeDefined();
    // Rows read = imported + skipped, table by table: nothing is dropped unseen.
    for (const t of result.tallies)
      expect(t.read).toBe(
        t.imported + [...t.skipped].filter(([r]) => r !== 'blank row').reduce((n, [, c]) => n + c, 0),
      );
    expect(result.tallies.find((t) => t.table.endsWith('[IO List]'))!.skipped.get('spare')).toBe(1);
    expect(result.suggestedKinds).toBe(2);
    expect(renderReport(result.tallies, result.suggestedKinds)).toContain('2 kinds suggested from ISA-5.1 tag letters');
  });

  it('gives exactly the demo model, findings and LOPA figures', async () => {
    const result = await importDemo();
    const imported = loadWithParts(SITE, readFileSync(SITE, 'utf8'), { [PART]: result.text! });
    const demo = loadModelText('marrow-fen.bulk', readFileSync('fixtures/demo/marrow-fen.bulk')).model!;
    expect(content(imported)).toBe(content(demo));
    expect(outcome(imported)).toBe(outcome(demo));
  });

  it('is the generated file checked in beside it, so the example in the README is current', async () => {
    const result = await importDemo();
    expect(result.text).toBe(readFileSync(PART, 'utf8'));
  });

  it('marks each kind taken from tag letters, and keeps loop and channel as provenance', async () => {
    const text = (await importDemo()).text!;
    const lt103 = text.split('\n').find((l) => l.startsWith('transmitter LT-103 '))!;
    expect(lt103).toContain('kind suggested from ISA-5.1 letters LT');
    expect(lt103).toContain('[IO List] row 4');
    expect(lt103).toContain('loop LAH-101');
  });
});
