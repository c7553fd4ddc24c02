// The evidence list and the LOPA worksheet printed to PDF by headless Chromium, on A4 and on US Letter, and
// read back page by page with PDF.js: every page carries the model file, its SHA-256 and "Page N of M",
// and no table row is split across two pages (each row's text stands whole on one page).
import { writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { parse as parseHtml } from 'node-html-parser';
import { getDocument } from 'pdfjs-dist/legacy/build/pdf.mjs';
import type { BrowserContext } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { renderReport, type ReportContents } from '@bulkhead/core';
import { demoInput } from '../report/demo.ts';
import { launch, tempDir } from './harness.ts';

const DEMO_FILE = 'fixtures/demo/marrow-fen.bulk';
/** Text as compared: no white space (lines wrap anywhere in a cell) and ligatures unfolded. */
const squeeze = (text: string) => text.normalize('NFKC').replace(/\s+/g, '');

async function pageTexts(pdf: Uint8Array): Promise<string[]> {
  const doc = await getDocument({ data: pdf, useSystemFonts: false, isEvalSupported: false }).promise;
  const texts: string[] = [];
  for (let n = 1; n <= doc.numPages; n++) {
    const content = await (await doc.getPage(n)).getTextContent();
    texts.push(squeeze(content.items.map((item) => ('str' in item ? item.str : '')).join('')));
  }
  await doc.destroy();
  return texts;
}

describe('printed reports', () => {
  let context: BrowserContext;
  const dir = tempDir('bulkhead-print-');
  const input = demoInput(DEMO_FILE);
  beforeAll(async () => {
    context = await launch();
  });
  afterAll(async () => context?.close());

  it.each([
    ['evidence', 'A4'],
    ['evidence', 'Letter'],
    ['worksheet', 'A4'],
    ['worksheet', 'Letter'],
  ] as [ReportContents, 'A4' | 'Letter'][])('%s on %s: hash and page number on every page, no row split', async (contents, paper) => {
    const html = renderReport(input, 'html', contents);
    const file = join(dir, `${contents}.html`);
    writeFileSync(file, html);
    const page = await context.newPage();
    await page.goto(`file://${file}`);
    const pdf = new Uint8Array(await page.pdf({ format: paper, landscape: contents === 'worksheet', printBackground: true }));
    await page.close();
    const pages = await pageTexts(pdf);
    // Canary: a real multi-page document was printed.
    expect(pages.length).toBeGreaterThan(contents === 'evidence' ? 5 : 1);
    pages.forEach((text, i) => {
      expect(text, `page ${i + 1}`).toContain(input.sha256);
      expect(text, `page ${i + 1}`).toContain(squeeze(DEMO_FILE));
      expect(text, `page ${i + 1}`).toContain(`Page${i + 1}of${pages.length}`);
    });
    // Each table row, as its text, stands whole on one page: a row cut by a page break would not.
    const rows = parseHtml(html).querySelectorAll('tbody tr').map((tr) => squeeze(tr.text)).filter((t) => t !== '');
    expect(rows.length).toBeGreaterThan(10);
    const split = rows.filter((row) => !pages.some((text) => text.includes(row)));
    expect(split).toEqual([]);
  });
});
