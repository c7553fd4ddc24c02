// Comparing two revisions in the viewer: the page serves revision B of the demo and the reviewer opens
// the first revision as the earlier file. The truth is the CLI's own JSON diff of the same two files
// (`bulkhead diff OLD NEW --format json`): each scenario's verdict change in the matrix, and every finding
// that appeared, disappeared or changed severity or acceptance in the list, each marked in words and a
// symbol (no colour needed). A save of the served file compares again with the same earlier file.
import { spawnSync } from 'node:child_process';
import { copyFileSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { seriousViolations } from './axe.ts';
import { copyTo, DEMO, GRAPH_BOX, openViewer, ROOT, screenshot, type Session, tempDir } from './harness.ts';

const REV_B = join(ROOT, 'fixtures/demo/marrow-fen-rev-b.bulk');
const BIN = join(ROOT, 'packages/cli/bin/bulkhead.js');

interface CliFindingRef {
  key: string;
  scenario?: string;
  element?: string;
}
interface CliDiff {
  verdicts: { scenario: string; change: string }[];
  appeared: CliFindingRef[];
  disappeared: CliFindingRef[];
  severityChanged: { new: CliFindingRef }[];
  acceptanceChanged: { new: CliFindingRef }[];
}

function cliDiff(older: string, newer: string): CliDiff {
  const run = spawnSync(process.execPath, [BIN, 'diff', older, newer, '--format', 'json'], {
    cwd: ROOT,
    encoding: 'utf8',
  });
  if (run.status !== 0) throw new Error(`bulkhead diff failed (${run.status}): ${run.stderr}`);
  return JSON.parse(run.stdout) as CliDiff;
}

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

  const changeCells = () =>
    page
      .locator('[data-testid=matrix] tr[data-scenario]')
      .evaluateAll((rows) =>
        Object.fromEntries(
          rows.map((r) => [
            r.getAttribute('data-scenario')!,
            r.querySelector('[data-cell=change]')?.getAttribute('data-change'),
          ]),
        ),
      );
  const changedFindings = () =>
    page
      .locator('[data-testid=compare-findings] tbody tr')
      .evaluateAll((rows) =>
        rows.map((r) => `${r.getAttribute('data-change')} ${r.getAttribute('data-finding')}`).sort(),
      );

  it("marks each scenario's verdict change and each changed finding as the CLI's diff has them", async () => {
    expect(truth.verdicts.some((v) => v.change === 'better')).toBe(true);
    expect(truth.disappeared.length).toBeGreaterThan(0);
    await page.setInputFiles('[data-testid=compare-open]', DEMO);
    await page.waitForSelector('[data-testid=compare-summary]');
    const expectedCells = Object.fromEntries(
      truth.verdicts.filter((v) => v.change !== 'removed').map((v) => [v.scenario, v.change]),
    );
    expect(await changeCells()).toEqual(expectedCells);
    const changedKeys = [...truth.severityChanged, ...truth.acceptanceChanged].map((c) => c.new.key);
    const shown = await changedFindings();
    expect(shown.filter((s) => s.startsWith('new ') || s.startsWith('gone '))).toEqual(
      [...truth.appeared.map((f) => `new ${f.key}`), ...truth.disappeared.map((f) => `gone ${f.key}`)].sort(),
    );
    expect(
      shown
        .filter((s) => s.startsWith('worse ') || s.startsWith('better '))
        .map((s) => s.split(' ')[1])
        .sort(),
    ).toEqual(changedKeys.sort());
    // Without colour: every mark comes with its words, and the legend names each mark.
    expect(await page.locator('[data-testid=matrix] tr[data-scenario="S-101"] [data-cell=change]').innerText()).toMatch(
      /^▼ better/,
    );
    const legend = await page.innerText('[data-testid=compare-legend]');
    for (const words of ['▲ worse', '▼ better', '+ new scenario', '− scenario gone', '+ new finding', '− finding gone'])
      expect(legend).toContain(words);
    expect(await seriousViolations(page)).toEqual([]);
    copyTo(await screenshot(page, 'compare'), join(ROOT, 'docs/viewer-compare.png'));
  });

  it('marks on the graph each element of the scenario whose findings changed, and keys the marks in the legend', async () => {
    await page.click('[data-testid=mode-graph]');
    await page.waitForSelector('svg[data-testid=graph][data-scenario="S-101"] g.box');
    // The worst news shows when an element has several: worse, then new, then better, then gone.
    const byElement = new Map<string, string>();
    const changed = [...truth.severityChanged, ...truth.acceptanceChanged].map((c) => c.new);
    for (const [change, refs] of [
      ['new', truth.appeared],
      ['gone', truth.disappeared],
    ] as const)
      for (const f of refs) if (f.scenario === 'S-101' && f.element) byElement.set(f.element, change);
    // A changed finding's direction is the viewer's own call (severity and acceptance); only its presence is checked here.
    for (const f of changed) if (f.scenario === 'S-101' && f.element) byElement.set(f.element, 'worse|better');
    const marked = await page
      .locator('svg[data-testid=graph] g.box[data-change]')
      .evaluateAll((gs) => gs.map((g) => [g.getAttribute('data-tag')!, g.getAttribute('data-change')!]));
    expect(marked.length).toBeGreaterThan(0);
    for (const [tag, change] of marked) expect(byElement.get(tag)?.split('|'), tag).toContain(change);
    const drawn = new Set(
      await page.locator('svg[data-testid=graph] g.box').evaluateAll((gs) => gs.map((g) => g.getAttribute('data-tag'))),
    );
    for (const tag of byElement.keys())
      if (drawn.has(tag))
        expect(
          marked.map(([t]) => t),
          tag,
        ).toContain(tag);
    expect(await page.innerText('[data-testid=graph-compare-key]')).toContain('▲ worse');
    expect(await seriousViolations(page)).toEqual([]);
    copyTo(await screenshot(page, 'compare-graph'), join(ROOT, 'docs/viewer-compare-graph.png'));
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
    const cells = await changeCells();
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
