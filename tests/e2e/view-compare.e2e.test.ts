// `bulkhead view NEW --compare OLD` (issue 17): the page opens already comparing revision B of the demo
// with revision A, with no file picked. The truth is the CLI's own JSON diff of the same two files
// (`bulkhead diff OLD NEW --format json`): the graph's marks and the matrix's change column and list are
// checked against it, not against counts written here. Both revisions are named by the models' own
// `document=` and `revision=`. A save of NEW compares again; a broken save of OLD shows in the page with
// file, line and column, and the last comparison stays. Then: the title block's hash of a split model
// (main file and part) is the one `bulkhead report` gives, and changes when only the part changes.
import { cpSync, readFileSync, writeFileSync, appendFileSync } from 'node:fs';
import { join } from 'node:path';
import { spawnSync } from 'node:child_process';
import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { seriousViolations } from './axe.ts';
import { DEMO, GRAPH_BOX, openViewer, ROOT, screenshot, type Session, tempDir } from './harness.ts';
import {
  cliDiff,
  expectChangedFindingsAsDiff,
  expectedChangeCells,
  expectGraphMarksAsDiff,
  matrixChangeCells,
} from './diff-truth.ts';

const REV_B = join(ROOT, 'fixtures/demo/marrow-fen-rev-b.bulk');
const BIN = join(ROOT, 'packages/cli/bin/bulkhead.js');

/** What the page's title block says (it is laid out only for print, so read as text, not as shown). */
const titleBlock = (page: Page) => page.locator('[data-testid=print-title]').evaluate((t) => t.textContent ?? '');

describe('bulkhead view NEW --compare OLD', () => {
  const dir = tempDir('bulkhead-view-compare-');
  const newer = join(dir, 'marrow-fen-rev-b.bulk');
  const older = join(dir, 'marrow-fen.bulk');
  const truth = cliDiff(DEMO, REV_B);
  let session: Session;
  let page: Page;

  beforeAll(async () => {
    cpSync(REV_B, newer);
    cpSync(DEMO, older);
    session = await openViewer(newer, GRAPH_BOX, ['--compare', older]);
    page = session.page;
    await page.waitForSelector('[data-testid=graph-compare-key]');
  });

  afterAll(async () => {
    await session?.close();
  });

  it("opens comparing, naming both revisions by the models' document and revision, and marks the graph as the diff has it", async () => {
    // The diff has something to show in S-101, or the checks below would pass on an empty page.
    expect(truth.disappeared.some((f) => f.scenario === 'S-101' && f.element)).toBe(true);
    expect(session.view.output()).toContain(`compared with the earlier revision ${older}`);
    // The terminal also says what `bulkhead diff OLD NEW` says first.
    const headline = spawnSync(process.execPath, [BIN, 'diff', older, newer], { cwd: ROOT, encoding: 'utf8' });
    expect(session.view.output()).toContain(`since ${older}: ${headline.stdout.split('\n')[0]}`);
    expect(await page.innerText('[data-testid=graph-compare-now]')).toBe('MF-100-LOPA-001 rev B');
    expect(await page.innerText('[data-testid=graph-compare-old]')).toBe('MF-100-LOPA-001 rev A');
    await page.waitForSelector('svg[data-testid=graph][data-scenario="S-101"] g.box[data-change]');
    await expectGraphMarksAsDiff(page, truth, 'S-101');
    // The title block names this revision and the one compared with.
    const title = await titleBlock(page);
    expect(title).toContain('MF-100-LOPA-001 rev B');
    expect(title).toContain('compared with');
    expect(title).toContain('MF-100-LOPA-001 rev A (marrow-fen.bulk)');
    expect(await seriousViolations(page)).toEqual([]);
    await screenshot(page, 'view-compare-graph');
  });

  it("shows in the matrix each scenario's verdict change and each changed finding as the diff has them", async () => {
    await page.click('[data-testid=mode-matrix]');
    await page.waitForSelector('[data-testid=compare-summary]');
    expect(await matrixChangeCells(page)).toEqual(expectedChangeCells(truth));
    await expectChangedFindingsAsDiff(page, truth);
    expect(await page.innerText('[data-testid=compare-now]')).toBe('MF-100-LOPA-001 rev B (marrow-fen-rev-b.bulk)');
    expect(await page.innerText('[data-testid=compare-old]')).toBe('MF-100-LOPA-001 rev A (marrow-fen.bulk)');
    expect(await seriousViolations(page)).toEqual([]);
    await screenshot(page, 'view-compare-matrix');
  });

  it('compares again when NEW is saved, with the same earlier revision', async () => {
    // NEW saved with OLD's text: nothing differs any more, and the compare is still on.
    writeFileSync(newer, readFileSync(DEMO));
    await page.waitForFunction(
      () =>
        document
          .querySelector('[data-testid=compare-summary]')
          ?.textContent?.replace(/\s+/g, ' ')
          .includes('0 scenarios changed verdict, 0 findings changed'),
      undefined,
      { timeout: 10_000 },
    );
    writeFileSync(newer, readFileSync(REV_B));
    await page.waitForFunction(
      () => !document.querySelector('[data-testid=compare-summary]')?.textContent?.includes('0 findings changed'),
      undefined,
      { timeout: 10_000 },
    );
  });

  it('shows a broken save of OLD in the page with file, line and column, keeps the last comparison, and recovers', async () => {
    const before = await page.innerText('[data-testid=compare-summary]');
    writeFileSync(older, readFileSync(DEMO, 'utf8').replace('\npolicy ', '\npolicy bogus=\npolicy '));
    await page.waitForSelector('[data-testid=compare-errors]', { timeout: 10_000 });
    const notice = await page.innerText('[data-testid=compare-errors]');
    expect(notice).toMatch(/marrow-fen\.bulk:\d+:\d+/);
    expect(notice).toMatch(/BH\d{3}/);
    expect(await page.innerText('[data-testid=compare-summary]')).toBe(before);
    expect(await seriousViolations(page)).toEqual([]);
    writeFileSync(older, readFileSync(DEMO));
    await page.waitForSelector('[data-testid=compare-errors]', { state: 'detached', timeout: 10_000 });
    expect(await page.innerText('[data-testid=compare-summary]')).toBe(before);
    expect(session.seen.errors).toEqual([]);
  });
});

describe('the title block hash of a model split over part files', () => {
  const dir = tempDir('bulkhead-view-hash-');
  const file = join(dir, 'marrow-fen-site.bulk');
  let session: Session;
  let page: Page;

  const reportHash = (): string => {
    const run = spawnSync(process.execPath, [BIN, 'report', file, '--format', 'json', '--fail-on', 'none'], {
      cwd: ROOT,
      encoding: 'utf8',
    });
    if (run.status !== 0) throw new Error(`bulkhead report failed (${run.status}): ${run.stderr}`);
    return (JSON.parse(run.stdout) as { model: { sha256: string } }).model.sha256;
  };

  beforeAll(async () => {
    cpSync(join(ROOT, 'fixtures/demo/tables'), dir, { recursive: true });
    session = await openViewer(file, GRAPH_BOX);
    page = session.page;
  });

  afterAll(async () => {
    await session?.close();
  });

  it('is the hash `bulkhead report` gives, over 2 files, and changes when only the part file changes', async () => {
    const first = reportHash();
    await page.waitForFunction(
      (hash) => document.querySelector('[data-testid=print-title]')?.textContent?.includes(hash),
      first,
    );
    expect(await titleBlock(page)).toContain(`${first} over 2 files: the model file and 1 part file`);
    appendFileSync(join(dir, 'generated/plant.bulk'), '# a comment in the part only\n');
    const second = reportHash();
    expect(second).not.toBe(first);
    await page.waitForFunction(
      (hash) => document.querySelector('[data-testid=print-title]')?.textContent?.includes(hash),
      second,
      { timeout: 10_000 },
    );
    expect(session.seen.errors).toEqual([]);
  });
});
