// The evidence list and the LOPA worksheet printed to PDF by headless Chromium, on A4 and on US Letter, and
// read back page by page with PDF.js: every page carries the model file, its SHA-256 and "Page N of M",
// and no table row is split across two pages (each row's text stands whole on one page). Each page is
// also rendered to an image (test-artifacts/e2e/print-*.png) and its foot checked for printed ink.
import { mkdirSync, writeFileSync } from 'node:fs';
import { createCanvas } from '@napi-rs/canvas';
import { join } from 'node:path';
import { parse as parseHtml } from 'node-html-parser';
import { getDocument } from 'pdfjs-dist/legacy/build/pdf.mjs';
import type { BrowserContext } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { renderReport, type ReportContents } from '@bulkhead/core';
import { demoInput } from '../report/demo.ts';
import { ARTIFACTS, launch, tempDir } from './harness.ts';

const DEMO_FILE = 'fixtures/demo/marrow-fen.bulk';
/** Text as compared: no white space (lines wrap anywhere in a cell) and ligatures unfolded. */
const squeeze = (text: string) => text.normalize('NFKC').replace(/\s+/g, '');

async function pageTexts(pdf: Uint8Array): Promise<string[]> {
  const doc = await getDocument({ data: pdf.slice(), useSystemFonts: false, isEvalSupported: false }).promise;
  const texts: string[] = [];
  for (let n = 1; n <= doc.numPages; n++) {
    const content = await (await doc.getPage(n)).getTextContent();
    texts.push(squeeze(content.items.map((item) => ('str' in item ? item.str : '')).join('')));
  }
  await doc.destroy();
  return texts;
}

/**
 * Renders each page to a PNG in the artifacts folder and returns, per page, the share of dark pixels in
 * the bottom margin (below the last 18 mm of the sheet less 4 mm), where only the running footer prints.
 */
async function footerInk(pdf: Uint8Array, name: string): Promise<number[]> {
  mkdirSync(ARTIFACTS, { recursive: true });
  const doc = await getDocument({ data: pdf.slice(), isEvalSupported: false }).promise;
  const ink: number[] = [];
  for (let n = 1; n <= doc.numPages; n++) {
    const page = await doc.getPage(n);
    const viewport = page.getViewport({ scale: 1 });
    const canvas = createCanvas(Math.ceil(viewport.width), Math.ceil(viewport.height));
    const context = canvas.getContext('2d');
    context.fillStyle = '#fff';
    context.fillRect(0, 0, canvas.width, canvas.height);
    await page.render({ canvasContext: context as never, viewport }).promise;
    writeFileSync(join(ARTIFACTS, `print-${name}-p${n}.png`), canvas.toBuffer('image/png'));
    const mm = viewport.height / ((page.view[3]! / 72) * 25.4);
    const top = Math.floor(canvas.height - 14 * mm);
    const strip = context.getImageData(0, top, canvas.width, Math.floor(10 * mm)).data;
    let dark = 0;
    for (let i = 0; i < strip.length; i += 4) if (strip[i]! < 128) dark++;
    ink.push(dark / (strip.length / 4));
  }
  await doc.destroy();
  return ink;
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
  ] as [ReportContents, 'A4' | 'Letter'][])(
    '%s on %s: hash and page number on every page, no row split',
    async (contents, paper) => {
      const html = renderReport(input, 'html', contents);
      const file = join(dir, `${contents}.html`);
      writeFileSync(file, html);
      const page = await context.newPage();
      await page.goto(`file://${file}`);
      const pdf = new Uint8Array(
        await page.pdf({ format: paper, landscape: contents === 'worksheet', printBackground: true }),
      );
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
      const rows = parseHtml(html)
        .querySelectorAll('tbody tr')
        .map((tr) => squeeze(tr.text))
        .filter((t) => t !== '');
      expect(rows.length).toBeGreaterThan(10);
      const split = rows.filter((row) => !pages.some((text) => text.includes(row)));
      expect(split).toEqual([]);
      // The page images: the foot of every page has print on it (the footer), yet is mostly white paper.
      const ink = await footerInk(pdf, `${contents}-${paper}`);
      expect(ink).toHaveLength(pages.length);
      for (const [i, share] of ink.entries()) expect(share, `page ${i + 1}`).toBeGreaterThan(0.001);
      for (const [i, share] of ink.entries()) expect(share, `page ${i + 1}`).toBeLessThan(0.2);
    },
  );
});
