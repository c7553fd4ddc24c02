// Canary for the browser tier: fails if the page did not load, if Svelte effects do not run in the
// browser, or if the layout worker does not run (no boxes are ever drawn without it).
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { DEMO, GRAPH_BOX, openViewer, type Session } from './harness.ts';

describe('browser canary', () => {
  let session: Session;
  let page: Page;

  beforeAll(async () => {
    session = await openViewer(DEMO);
    page = session.page;
  });

  afterAll(async () => {
    await session?.close();
  });

  it('loads the page with its title', async () => {
    expect(await page.title()).toBe('Bulkhead viewer');
    await page.waitForSelector('[data-testid=file]');
  });

  it('runs Svelte effects in the browser', async () => {
    await page.waitForSelector('.app[data-effects=ran]', { timeout: 10_000 });
  });

  it('runs the layout worker and draws what it returns', async () => {
    await page.waitForSelector('.app[data-worker=ready]', { timeout: 10_000 });
    await page.waitForSelector(GRAPH_BOX);
    const ms = Number(await page.textContent('[data-testid=layout-ms]'));
    expect(ms).toBeGreaterThanOrEqual(0);
    expect(await page.locator(GRAPH_BOX).count()).toBeGreaterThan(5);
  });

  it('has thrown no error on the way', () => {
    expect(session.seen.errors).toEqual([]);
  });
});
