// `bulkhead view` through anything that can happen to the watched file (issue 10): garbage, binary, empty,
// hostile names, deleted, renamed, replaced by a directory, restored. The page shows the diagnostics or
// "file missing", the header marks the view stale while the file is broken, and both recover; the
// server process stays up throughout.
import { mkdirSync, readFileSync, renameSync, rmdirSync, rmSync, writeFileSync } from 'node:fs';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { seriousViolations } from './axe.ts';
import { DEMO, GRAPH_BOX, openLiveDemo, screenshot } from './harness.ts';

describe('the watched file through its life', () => {
  let session: Awaited<ReturnType<typeof openLiveDemo>>;
  let page: Page;
  let file: string;
  // Read here, not in beforeAll: the table below is built when the file is collected.
  const original = readFileSync(DEMO, 'utf8');

  beforeAll(async () => {
    session = await openLiveDemo('bulkhead-life-');
    ({ page, file } = session);
  });

  afterAll(async () => {
    await session?.close();
  });

  /** The page shows the diagnostics with this code, marks the view stale, and still shows the graph. */
  async function showsBroken(code: string) {
    await page.waitForSelector(`[data-testid=diagnostics]:has-text("${code}")`, { timeout: 5_000 });
    await page.waitForSelector('[data-testid=stale-header]');
    expect(await page.locator(GRAPH_BOX).count()).toBeGreaterThan(0);
    expect(session.view.child.exitCode).toBeNull();
  }

  /**
   * The page says the file is missing: the notice (each sentence starting with a capital), the header
   * (never "live" while the file is gone), and the status a screen reader announces.
   */
  async function showsMissing(says: string) {
    await page.waitForSelector(`[data-testid=missing]:has-text("${says}")`, { timeout: 5_000 });
    await page.waitForSelector('[data-testid=stale-header]');
    const notice = await page.innerText('[data-testid=missing] p');
    const sentences = notice.split(/(?<=\.)\s+/);
    expect(sentences.length).toBeGreaterThan(1);
    for (const sentence of sentences) expect(sentence, notice).toMatch(/^[A-Z]/);
    expect(await page.innerText('[data-testid=live]')).toBe('not live: file missing');
    expect(await page.getAttribute('[data-testid=live]', 'data-live')).toBe('missing');
    await expect.poll(() => page.innerText('[data-testid=announce]')).toMatch(/^File missing: marrow-fen\.bulk\. /);
    expect(await page.locator(GRAPH_BOX).count()).toBeGreaterThan(0);
    expect(session.view.child.exitCode).toBeNull();
  }

  async function recovers() {
    writeFileSync(file, original);
    await page.waitForSelector('[data-testid=diagnostics]', { state: 'detached', timeout: 5_000 });
    await page.waitForSelector('[data-testid=missing]', { state: 'detached', timeout: 5_000 });
    await page.waitForSelector('[data-testid=stale-header]', { state: 'detached' });
    await page.waitForSelector(GRAPH_BOX);
  }

  it.each([
    ['bytes that are not UTF-8', Buffer.from([0x73, 0x69, 0x74, 0x65, 0x20, 0xff, 0xfe, 0x80, 0x0a]), 'BH102'],
    ['a binary file (NUL bytes)', Buffer.from([0x00, 0x01, 0x02, 0x03, 0x00]), 'BH102'],
    ['an empty file', Buffer.alloc(0), 'BH100'],
    ['a statement named `constructor`', Buffer.from(`${original}constructor X-1\n`), 'BH115'],
    [
      'a scenario line named `__proto__`',
      Buffer.from(`${original}scenario S-900 category=people-serious\n  __proto__ X\n`),
      'BH115',
    ],
    ['JSON-looking garbage nested 100,000 deep', Buffer.from('['.repeat(100_000)), 'BH1'],
  ])('%s: diagnostics, a stale header, then recovery', async (_, bytes, code) => {
    writeFileSync(file, bytes);
    await showsBroken(code);
    await recovers();
  });

  it('deleted: "file missing", then recovery when it is written again, both announced', async () => {
    rmSync(file);
    await showsMissing('missing');
    await screenshot(page, 'file-missing');
    expect(await seriousViolations(page)).toEqual([]);
    await recovers();
    await expect.poll(() => page.innerText('[data-testid=announce]')).toMatch(/^marrow-fen\.bulk is back\. Scenario /);
    expect(await page.getAttribute('[data-testid=live]', 'data-live')).toBe('connected');
  });

  it('renamed away and back', async () => {
    renameSync(file, `${file}.moved`);
    await showsMissing('missing');
    renameSync(`${file}.moved`, file);
    await page.waitForSelector('[data-testid=missing]', { state: 'detached', timeout: 5_000 });
    await page.waitForSelector('[data-testid=stale-header]', { state: 'detached' });
  });

  it('replaced by a directory, then restored', async () => {
    rmSync(file);
    mkdirSync(file);
    await showsMissing('directory');
    rmdirSync(file);
    await recovers();
  });

  it('ends with the live connection up, the server running and no script error on the page', async () => {
    expect(await page.innerText('[data-testid=live]')).toContain('live');
    expect(session.view.child.exitCode).toBeNull();
    // A missing file is a 404 for /model, which the browser logs; nothing else may appear.
    expect(session.seen.errors.filter((e) => !/status of 404/.test(e))).toEqual([]);
    expect(session.seen.dialogs).toEqual([]);
  });
});
