// Comparing two revisions in the viewer: the page serves revision B of the demo and the reviewer opens
// the first revision as the earlier file. The truth is the CLI's own JSON diff of the same two files
// (`bulkhead diff OLD NEW --format json`): each scenario's verdict change in the matrix, and every finding
// that appeared, disappeared or changed severity or acceptance in the list, each marked in words and a
// symbol (no colour needed). A save of the served file compares again with the same earlier file.
import { copyFileSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { seriousViolations } from './axe.ts';
import { DEMO, docScreenshot, GRAPH_BOX, openViewer, ROOT, type Session, tempDir } from './harness.ts';
import {
  cliDiff,
  expectChangedFindingsAsDiff,
  expectedChangeCells,
  expectGraphMarksAsDiff,
  matrixChangeCells,
} from './diff-truth.ts';

const REV_B = join(ROOT, 'fixtures/demo/marrow-fen-rev-b.bulk');

describe('comparing two revisions in the viewer', () => {
  const file = join(tempDir('bulkhead-compare-'), 'marrow-fen.bulk');
  const truth = cliDiff(DEMO, REV_B);
  let session: Session;
  let page: Page;

  beforeAll(async () => {
    copyFileSync(REV_B, file);
    session = await openViewer(file, GRAPH_BOX);
    page = session.page;
    await page.click('[data-testid=mode-matrix]');
    await page.waitForSelector('[data-testid=matrix]');
  });

  afterAll(async () => {
    await session?.close();
  });

  it("marks each scenario's verdict change and each changed finding as the CLI's diff has them", async () => {
    expect(truth.verdicts.some((v) => v.change === 'better')).toBe(true);
    expect(truth.disappeared.length).toBeGreaterThan(0);
    await page.setInputFiles('[data-testid=compare-open]', DEMO);
    await page.waitForSelector('[data-testid=compare-summary]');
    expect(await matrixChangeCells(page)).toEqual(expectedChangeCells(truth));
    await expectChangedFindingsAsDiff(page, truth);
    // Without colour: every mark comes with its words, and the legend names each mark.
    expect(await page.locator('[data-testid=matrix] tr[data-scenario="S-101"] [data-cell=change]').innerText()).toMatch(
      /^▼ better/,
    );
    const legend = await page.innerText('[data-testid=compare-legend]');
    for (const words of ['▲ worse', '▼ better', '+ new scenario', '− scenario gone', '+ new finding', '− finding gone'])
      expect(legend).toContain(words);
    expect(await seriousViolations(page)).toEqual([]);
    await docScreenshot(page, 'compare', 'docs/viewer-compare.png');
  });

  it('marks on the graph each element of the scenario whose findings changed, and keys the marks in the legend', async () => {
    await page.click('[data-testid=mode-graph]');
    await page.waitForSelector('svg[data-testid=graph][data-scenario="S-101"] g.box');
    await expectGraphMarksAsDiff(page, truth, 'S-101');
    expect(await page.innerText('[data-testid=graph-compare-key]')).toContain('▲ worse');
    expect(await seriousViolations(page)).toEqual([]);
    await docScreenshot(page, 'compare-graph', 'docs/viewer-compare-graph.png');
    await page.click('[data-testid=mode-matrix]');
    await page.waitForSelector('[data-testid=compare-summary]');
  });

  it('compares again with the same earlier file when the served file is saved', async () => {
    // Saved with the earlier revision's text: nothing differs any more.
    writeFileSync(file, readFileSync(DEMO));
    await page.waitForFunction(
      () =>
        document
          .querySelector('[data-testid=compare-summary]')
          ?.textContent?.includes('0 scenarios changed verdict, 0 findings changed'),
      undefined,
      { timeout: 10_000 },
    );
    const cells = await matrixChangeCells(page);
    expect(Object.values(cells).every((c) => c === 'same')).toBe(true);
  });

  it("names the earlier file's first error by line and column when it does not load, and stops comparing", async () => {
    const broken = join(tempDir('bulkhead-compare-bad-'), 'broken.bulk');
    writeFileSync(broken, 'site "x"\nvessel V-1 bogus=\n');
    await page.setInputFiles('[data-testid=compare-open]', broken);
    await page.waitForSelector('[data-testid=compare-errors]');
    expect(await page.innerText('[data-testid=compare-errors]')).toMatch(/broken\.bulk:\d+:\d+/);
    await page.click('[data-testid=compare-stop]');
    await page.waitForSelector('[data-testid=compare-summary]', { state: 'detached' });
    expect(await page.locator('[data-testid=matrix] [data-cell=change]').count()).toBe(0);
    expect(session.seen.errors).toEqual([]);
  });
});
