// axe-core on the views a model's own pages do not reach: the welcome page (no model yet) together with
// the "file missing" notice, when the watched file is gone before the page first loads it, and then the
// demo once the file is written. (The missing notice over a good view is checked in
// file-life.e2e.test.ts; the 10k site's overview table in large-site.e2e.test.ts.)
import { copyFileSync, rmSync } from 'node:fs';
import { join } from 'node:path';
import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { seriousViolations } from './axe.ts';
import { DEMO, GRAPH_BOX, openViewer, screenshot, type Session, tempDir } from './harness.ts';

describe('the welcome page and the missing-file notice with assistive technology', () => {
  const file = join(tempDir('bulkhead-welcome-'), 'marrow-fen.bulk');
  let session: Session;
  let page: Page;

  beforeAll(async () => {
    copyFileSync(DEMO, file);
    session = await openViewer(file, GRAPH_BOX);
    page = session.page;
    rmSync(file);
    // A fresh page: it has never seen a good model, so it shows the welcome under the notice.
    await page.goto('about:blank');
    await page.goto(session.view.url);
  });

  afterAll(async () => {
    await session?.close();
  });

  it('shows the missing-file notice and the welcome, with no serious or critical axe violation', async () => {
    await page.waitForSelector('[data-testid=missing]');
    await page.waitForSelector('.welcome h1');
    // No version ever loaded and the file is gone: the header must not say "live", and the status says why.
    expect(await page.innerText('[data-testid=live]')).toBe('not live: file missing');
    await expect.poll(() => page.innerText('[data-testid=announce]')).toMatch(/^File missing: marrow-fen\.bulk\. The /);
    await screenshot(page, 'welcome-missing');
    expect(await seriousViolations(page)).toEqual([]);
  });

  it('shows the model once the file is back, and has thrown no error', async () => {
    copyFileSync(DEMO, file);
    await page.waitForSelector(GRAPH_BOX, { timeout: 10_000 });
    await page.waitForSelector('[data-testid=missing]', { state: 'detached' });
    await expect.poll(() => page.innerText('[data-testid=announce]')).toMatch(/^marrow-fen\.bulk is back\. /);
    expect(await page.innerText('[data-testid=live]')).toBe('live: updates on every save');
    // A missing file is a 404 for /model, which the browser logs; nothing else may appear.
    expect(session.seen.errors.filter((e) => !/status of 404/.test(e))).toEqual([]);
  });
});
