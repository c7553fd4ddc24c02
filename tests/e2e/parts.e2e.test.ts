// `bulkhead view` on a model split over part files (issue 13): the demo built from the plant workbook,
// whose main file names `generated/plant.bulk`, opens with its graph and no error; a save of the part
// reaches the page; a bad save of the part shows the error at the part's own file, line and column.
import { cpSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { focusScenario, GRAPH_BOX, openViewer, ROOT, screenshot, tempDir, type Session } from './harness.ts';

describe('bulkhead view on a model split over part files', () => {
  const dir = tempDir('bulkhead-parts-');
  const file = join(dir, 'marrow-fen-site.bulk');
  const part = join(dir, 'generated', 'plant.bulk');
  let original: string;
  let session: Session;
  let page: Page;

  beforeAll(async () => {
    cpSync(join(ROOT, 'fixtures/demo/tables'), dir, { recursive: true });
    original = readFileSync(part, 'utf8');
    expect(readFileSync(file, 'utf8')).toContain('part "generated/plant.bulk"');
    session = await openViewer(file, GRAPH_BOX);
    page = session.page;
    await page.waitForSelector('[data-testid=live][data-live=connected]');
  });

  afterAll(async () => {
    await session?.close();
  });

  it('shows the graph of the plant the part file holds, with no error', async () => {
    expect(await page.locator('[data-testid=diagnostics]').count()).toBe(0);
    await focusScenario(page, 'S-101');
    // BR-101 and LT-102 are defined only in the part file; the scenario is in the main file.
    expect(
      await page
        .locator('svg[data-testid=graph] g.box[data-tag="BR-101"] text.title:has-text("Level bridle on V-101")')
        .count(),
    ).toBe(1);
    expect(await page.locator('svg[data-testid=graph] g.box[data-tag="LT-102"]').count()).toBe(1);
    await screenshot(page, 'parts-site');
    expect(session.seen.errors).toEqual([]);
  });

  it('follows a save of the part file', async () => {
    const renamed = original.replace('title="Level bridle on V-101"', 'title="Bridle renamed in the part"');
    expect(renamed).not.toBe(original);
    writeFileSync(part, renamed);
    await page.waitForSelector(
      'svg[data-testid=graph] g.box[data-tag="BR-101"] text.title:has-text("Bridle renamed in the part")',
      { timeout: 5_000 },
    );
    expect(await page.getAttribute('svg[data-testid=graph]', 'data-scenario')).toBe('S-101');
    expect(session.view.output()).toContain(`saved: ${join(dir, 'generated', 'plant.bulk')}; ${file} loads cleanly`);
  });

  it("shows a bad save of the part at the part's file, line and column, keeping the last good view", async () => {
    const lines = original.split('\n');
    const at = lines.findIndex((l) => l.startsWith('transmitter LT-102 '));
    lines[at] = lines[at]!.replace('mounted-on=BR-101', 'mounted-on=BR-999');
    writeFileSync(part, lines.join('\n'));
    const position = page.locator('[data-testid=diagnostic-position]').first();
    await position.waitFor({ timeout: 5_000 });
    const column = lines[at]!.indexOf('BR-999') + 1;
    expect(await position.innerText()).toBe(`generated/plant.bulk, line ${at + 1}, column ${column}`);
    expect(await page.innerText('[data-testid=diagnostics]')).toContain(`generated/plant.bulk:${at + 1}:${column}`);
    await page.waitForSelector('[data-testid=stale]');
    expect(await page.locator('svg[data-testid=graph] g.box[data-tag="BR-101"]').count()).toBe(1);
    await screenshot(page, 'parts-bad-save');
  });

  it('clears the error when the part is fixed', async () => {
    writeFileSync(part, original);
    await page.waitForSelector('[data-testid=diagnostics]', { state: 'detached', timeout: 5_000 });
    await page.waitForSelector(
      'svg[data-testid=graph] g.box[data-tag="BR-101"] text.title:has-text("Level bridle on V-101")',
    );
    expect(session.seen.errors).toEqual([]);
  });
});
