// `bulkhead view` follows the file: a save reaches the page within a second, a save with errors shows
// them (line and column) and keeps the last good view, and the next good save clears them.
import { readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { DEMO, GRAPH_BOX, openViewer, screenshot, type Session, tempDir } from './harness.ts';

describe('live reload from bulkhead view', () => {
  const file = join(tempDir('bulkhead-live-'), 'marrow-fen.bulk');
  const original = readFileSync(DEMO, 'utf8');
  let session: Session;
  let page: Page;

  beforeAll(async () => {
    writeFileSync(file, original);
    session = await openViewer(file, GRAPH_BOX);
    page = session.page;
    await page.waitForSelector('[data-testid=live][data-live=connected]');
  });

  afterAll(async () => {
    await session?.close();
  });

  it('shows a saved change within a second', async () => {
    await page.click('[data-testid=scenarios] button[data-scenario="S-101"]');
    await page.waitForSelector('svg[data-testid=graph][data-scenario="S-101"]');
    const renamed = original.replace('title="Level bridle on V-101"', 'title="Bridle renamed in a save"');
    expect(renamed).not.toBe(original);
    const saved = Date.now();
    writeFileSync(file, renamed);
    await page.waitForSelector(
      'svg[data-testid=graph] g.box[data-tag="BR-101"] text.title:has-text("Bridle renamed in a save")',
      { timeout: 5_000 },
    );
    const elapsed = Date.now() - saved;
    expect(elapsed).toBeLessThan(1_000);
    // The focused scenario stays in focus across the reload.
    expect(await page.getAttribute('svg[data-testid=graph]', 'data-scenario')).toBe('S-101');
  });

  it('shows the errors of a bad save with line and column, and keeps the last good view', async () => {
    const lines = original.split('\n');
    const at = lines.findIndex((l) => l.startsWith('transmitter LT-102 '));
    lines[at] = lines[at]!.replace('mounted-on=BR-101', 'mounted-on=BR-999');
    writeFileSync(file, lines.join('\n'));
    const position = page.locator('[data-testid=diagnostic-position]').first();
    await position.waitFor({ timeout: 5_000 });
    const column = lines[at]!.indexOf('BR-999') + 1;
    expect(await position.innerText()).toBe(`line ${at + 1}, column ${column}`);
    expect(await page.innerText('[data-testid=diagnostics]')).toContain('BR-999');
    expect(await page.innerText('[data-testid=diagnostics]')).toContain(`marrow-fen.bulk:${at + 1}:${column}`);
    await page.waitForSelector('[data-testid=stale]');
    expect(await page.locator('svg[data-testid=graph] g.box[data-tag="BR-101"]').count()).toBe(1);
    await screenshot(page, 'live-bad-save');
  });

  it('clears the errors when the file is fixed', async () => {
    writeFileSync(file, original);
    await page.waitForSelector('[data-testid=diagnostics]', { state: 'detached', timeout: 5_000 });
    await page.waitForSelector(
      'svg[data-testid=graph] g.box[data-tag="BR-101"] text.title:has-text("Level bridle on V-101")',
    );
    expect(session.seen.errors).toEqual([]);
  });
});
