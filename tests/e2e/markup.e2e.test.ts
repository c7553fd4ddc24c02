// Model text is shown as text, never markup: titles holding an <img onerror> tag appear literally in
// the page, the graph and the SVG export, and no script runs (no dialog, no img element).
import { readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { loadModelText } from '@bulkhead/core';
import { DEMO, GRAPH_BOX, openViewer, screenshot, type Session, tempDir } from './harness.ts';

const PAYLOAD = '<img src=x onerror=alert(1)>';
const SVG_PAYLOAD = '<svg onload=alert(2)>';

describe('markup in a model', () => {
  const file = join(tempDir('bulkhead-markup-'), 'markup.bulk');
  let session: Session;
  let page: Page;

  beforeAll(async () => {
    // Tags cannot hold `<` (the loader allows letters, digits and _ . - / + :), so the payload goes in
    // quoted titles: the site's name, an element, a function, a scenario.
    const text = readFileSync(DEMO, 'utf8')
      .replace('site "Marrow Fen Chemical Works, Unit 100"', `site "${PAYLOAD}"`)
      .replace('title="Level bridle on V-101"', `title="${PAYLOAD}"`)
      .replace('title="V-101 high-high level closes XV-101"', `title="${SVG_PAYLOAD}"`)
      .replace('title="V-101 overfills and solvent reaches the vent stack"', `title="${PAYLOAD}"`);
    writeFileSync(file, text);
    session = await openViewer(file, GRAPH_BOX);
    page = session.page;
  });

  afterAll(async () => {
    await session?.close();
  });

  it('is a model that loads, with the payload in its titles', () => {
    const loaded = loadModelText('markup.bulk', readFileSync(file, 'utf8'));
    expect(loaded.model?.site.name).toBe(PAYLOAD);
  });

  it('shows the payload as text and creates no element from it', async () => {
    expect(await page.innerText('[data-testid=file]')).toContain(PAYLOAD);
    expect(await page.innerText('[data-testid=headline]')).toContain(PAYLOAD);
    await page.waitForSelector('svg[data-testid=graph] g.box[data-tag="BR-101"]');
    const title = await page.locator('svg[data-testid=graph] g.box[data-tag="BR-101"] text.title').textContent();
    // Each text in a box ends in a space (so assistive technology reads its lines as separate words).
    expect(title?.trimEnd()).toBe(PAYLOAD);
    expect(await page.locator('img').count()).toBe(0);
    expect(await page.locator('svg svg').count()).toBe(0);
    await screenshot(page, 'markup-as-text');
  });

  it('escapes the payload in the SVG export', async () => {
    const [download] = await Promise.all([page.waitForEvent('download'), page.click('[data-testid=export]')]);
    const text = readFileSync((await download.path())!, 'utf8');
    expect(text).toContain('&lt;img src=x onerror=alert(1)&gt;');
    expect(text).not.toContain(PAYLOAD);
    expect(text).not.toContain(SVG_PAYLOAD);
  });

  it('ran no script: no dialog opened and no error was thrown', async () => {
    await page.waitForTimeout(300);
    expect(session.seen.dialogs).toEqual([]);
    expect(session.seen.errors).toEqual([]);
  });
});
