// The HTML report in a real browser (Debian's Chromium, headless): it loads nothing from the network,
// and printed on A4 every scenario starts a page and no table is wider than the page.
import { existsSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { chromium, type BrowserContext } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { renderReport } from '@bulkhead/core';
import { DEMO, demoInput } from './demo.ts';

const CHROMIUM = '/usr/bin/chromium';
/** A4 (210 mm) less 12 mm margins each side, in CSS pixels at 96 per inch. */
const A4_PRINTABLE_PX = Math.floor(((210 - 24) / 25.4) * 96);

describe.skipIf(!existsSync(CHROMIUM))('HTML report in a browser', () => {
  let context: BrowserContext;
  let dir: string;
  let file: string;
  beforeAll(async () => {
    dir = mkdtempSync(join(tmpdir(), 'bulkhead-html-'));
    file = join(dir, 'report.html');
    writeFileSync(file, renderReport(demoInput(DEMO), 'html'));
    context = await chromium.launchPersistentContext(join(dir, 'profile'), {
      executablePath: CHROMIUM,
      headless: true,
      args: [
        '--no-sandbox',
        '--disable-gpu',
        '--no-first-run',
        '--disable-background-networking',
        '--disable-component-update',
        '--disable-sync',
      ],
    });
  }, 60_000);
  afterAll(async () => {
    await context?.close();
    rmSync(dir, { recursive: true, force: true });
  });

  it('loads the page and nothing else, and prints each scenario on a new page without cut-off tables', async () => {
    const page = await context.newPage();
    const requests: string[] = [];
    page.on('request', (r) => requests.push(r.url()));
    await page.goto(`file://${file}`);
    // Canary: the browser really rendered the report.
    expect(await page.locator('section.scenario h2').count()).toBe(4);
    expect(requests).toEqual([`file://${file}`]);
    await page.emulateMedia({ media: 'print' });
    await page.setViewportSize({ width: A4_PRINTABLE_PX, height: 1000 });
    // A string, evaluated in the page: the repository's type check has no DOM library, on purpose.
    const layout = (await page.evaluate(`({
      wide: [...document.querySelectorAll('table')].filter((t) => t.scrollWidth > t.parentElement.clientWidth + 1).map((t) => t.querySelector('caption')?.textContent),
      breaks: [...document.querySelectorAll('section.scenario, section.appendix')].map((s) => getComputedStyle(s).breakBefore),
      width: document.documentElement.scrollWidth,
    })`)) as { wide: string[]; breaks: string[]; width: number };
    expect(layout.wide).toEqual([]);
    // Four scenarios and three appendices (traces, findings, sources), each from a new page.
    expect(layout.breaks).toEqual(['page', 'page', 'page', 'page', 'page', 'page', 'page']);
    expect(layout.width).toBeLessThanOrEqual(A4_PRINTABLE_PX);
  }, 60_000);
});
