// A model that does not load shows the loader's diagnostics (line and column, code, excerpt), both
// when `bulkhead view` serves it and when it is opened with the file picker; never a blank page.
import { writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { loadModelText } from '@bulkhead/core';
import { DEMO, GRAPH_BOX, openViewer, screenshot, type Session, tempDir } from './harness.ts';

const BAD = [
  'site "Bad site"',
  'category c tolerable=1e-4 harm=people',
  'vessel V-1',
  'transmitter LT-1 variable=level mounted-on=N-404',
  'scenario S-1 category=c',
  '  cause function=LIC-9 frequency=0.1',
  '',
].join('\n');

describe('a model with errors', () => {
  const dir = tempDir('bulkhead-bad-');
  const file = join(dir, 'bad.bulk');
  const expected = loadModelText('bad.bulk', BAD).diagnostics.filter((d) => d.severity === 'error');
  let session: Session;
  let page: Page;

  beforeAll(async () => {
    writeFileSync(file, BAD);
    session = await openViewer(file);
    page = session.page;
  });

  afterAll(async () => {
    await session?.close();
  });

  it('is a model the loader rejects (the test needs errors to show)', () => {
    expect(expected.length).toBeGreaterThanOrEqual(2);
    expect(expected.every((d) => d.span)).toBe(true);
  });

  it('shows every error with its line and column when served', async () => {
    await page.waitForSelector('[data-testid=diagnostics]');
    const positions = await page.locator('[data-testid=diagnostic-position]').allInnerTexts();
    expect(positions).toEqual(expected.map((d) => `line ${d.span!.line}, column ${d.span!.column}`));
    const text = await page.innerText('[data-testid=diagnostics]');
    for (const d of expected) {
      expect(text).toContain(d.code);
      expect(text).toContain(`bad.bulk:${d.span!.line}:${d.span!.column}`);
    }
    expect(await page.locator('svg[data-testid=graph]').count()).toBe(0);
    // Nothing of the file is shown, so the header must not say "live"; the status says why.
    expect(await page.innerText('[data-testid=live]')).toBe('not live: the saved file does not load');
    expect(await page.innerText('[data-testid=announce]')).toBe('bad.bulk as saved does not load.');
    await screenshot(page, 'bad-model-served');
  });

  it('shows the errors of a bad file opened with the picker, and then a good one', async () => {
    const picked = join(dir, 'picked.bulk');
    writeFileSync(picked, BAD.replace('N-404', 'N-405'));
    await page.setInputFiles('[data-testid=open]', picked);
    await page.waitForSelector('[data-testid=diagnostics] :text("picked.bulk")');
    expect(await page.innerText('[data-testid=diagnostics]')).toContain('N-405');
    await page.setInputFiles('[data-testid=open]', DEMO);
    await page.waitForSelector('[data-testid=diagnostics]', { state: 'detached' });
    await page.waitForSelector(GRAPH_BOX);
    expect(await page.innerText('[data-testid=live]')).toBe('opened from disk');
    expect(session.seen.errors).toEqual([]);
  });

  it('opens a model dropped on the page', async () => {
    const text = BAD.replace('N-404', 'N-406');
    await page.evaluate((content) => {
      const data = new DataTransfer();
      data.items.add(new File([content], 'dropped.bulk', { type: 'text/plain' }));
      window.dispatchEvent(new DragEvent('dragover', { dataTransfer: data, bubbles: true, cancelable: true }));
      window.dispatchEvent(new DragEvent('drop', { dataTransfer: data, bubbles: true, cancelable: true }));
    }, text);
    await page.waitForSelector('[data-testid=diagnostics] :text("dropped.bulk")');
    expect(await page.innerText('[data-testid=diagnostics]')).toContain('N-406');
  });
});
