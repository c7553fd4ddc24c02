// Canary for the browser tier: fails if the page did not load, if Svelte effects do not run in the
// browser, or if the layout worker does not run (no boxes are ever drawn without it).
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { BrowserContext, Page } from 'playwright-core';
import { DEMO, launch, startView, watchPage, type ViewProcess } from './harness.ts';

describe('browser canary', () => {
  let view: ViewProcess;
  let context: BrowserContext;
  let page: Page;
  let seen: ReturnType<typeof watchPage>;

  beforeAll(async () => {
    view = await startView(DEMO);
    context = await launch();
    page = await context.newPage();
    seen = watchPage(page);
    await page.goto(view.url);
  });

  afterAll(async () => {
    await context?.close();
    view?.stop();
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
    await page.waitForSelector('svg[data-testid=graph] g.box', { timeout: 20_000 });
    const ms = Number(await page.textContent('[data-testid=layout-ms]'));
    expect(ms).toBeGreaterThanOrEqual(0);
    expect(await page.locator('svg[data-testid=graph] g.box').count()).toBeGreaterThan(5);
  });

  it('has thrown no error on the way', () => {
    expect(seen.errors).toEqual([]);
  });
});
