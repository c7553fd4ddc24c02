// The graph on screens of several sizes: at 1440x900, after Fit, no box of any demo scenario is off
// screen; the first view of a scenario is at the reading scale; at 1024x768 and at 720x450 (a
// 1440x900 screen at 200% browser zoom) the side panels give way and the graph keeps room to be read.
import { beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { DEMO, type DemoTruth, focusScenario, GRAPH_BOX, screenshot, truthFor, viewerForTests } from './harness.ts';

const truth: DemoTruth = truthFor(DEMO);

describe('the graph at several screen sizes', () => {
  const viewer = viewerForTests(DEMO);
  let page: Page;
  beforeAll(() => {
    page = viewer.page;
  });

  async function offScreen(): Promise<string[]> {
    const graph = (await page.locator('svg[data-testid=graph]').boundingBox())!;
    const boxes = await page.locator(`${GRAPH_BOX} rect.body`).evaluateAll((els) =>
      els.map((e) => ({
        tag: e.closest('g.box')!.getAttribute('data-tag')!,
        r: e.getBoundingClientRect().toJSON() as DOMRect,
      })),
    );
    return boxes
      .filter(
        ({ r }) =>
          r.x < graph.x - 0.5 ||
          r.y < graph.y - 0.5 ||
          r.right > graph.x + graph.width + 0.5 ||
          r.bottom > graph.y + graph.height + 0.5,
      )
      .map((b) => b.tag);
  }

  for (const s of truth.model.scenarios) {
    it(`${s.id} at 1440x900: opens at the reading scale and shows every box after Fit`, async () => {
      await focusScenario(page, s.id);
      expect(Number((await page.innerText('.pct')).replace('%', ''))).toBeGreaterThanOrEqual(85);
      await page.click('button:text-is("Fit")');
      await expect.poll(offScreen).toEqual([]);
    });
  }

  for (const [width, height] of [
    [1024, 768],
    [720, 450],
  ] as const) {
    it(`gives the graph most of the width and room to read at ${width}x${height}`, async () => {
      await page.setViewportSize({ width, height });
      await focusScenario(page, 'S-101');
      const graph = (await page.locator('svg[data-testid=graph]').boundingBox())!;
      expect(graph.width).toBeGreaterThanOrEqual(width * 0.6);
      expect(graph.height).toBeGreaterThanOrEqual(Math.min(300, height * 0.6));
      await screenshot(page, `fit-${width}x${height}`);
    });
  }

  it('keeps the stage headings in view, pinned over their columns when the sheet is scrolled below them', async () => {
    await page.setViewportSize({ width: 1024, height: 768 });
    await focusScenario(page, 'S-101');
    const graph = (await page.locator('svg[data-testid=graph]').boundingBox())!;
    // Scroll the sheet up past its headings (arrow keys pan while a box has focus).
    await page.locator(`${GRAPH_BOX}[data-tag="BPCS-C1"]`).focus();
    for (let i = 0; i < 3; i++) await page.keyboard.press('ArrowDown');
    const inSheet = await page
      .locator('svg[data-testid=graph] g.stage text.stage-label')
      .evaluateAll((els) => els.map((e) => e.getBoundingClientRect().toJSON() as DOMRect));
    expect(inSheet.every((r) => r.bottom < graph.y)).toBe(true);
    const pinned = page.locator('[data-testid=pinned-stages] text.stage-label');
    expect(await pinned.count()).toBe(inSheet.length);
    // Each pinned heading sits in the graph's top strip, over the middle of its column's band.
    const bands = await page
      .locator('svg[data-testid=graph] g.stage rect.stage-band')
      .evaluateAll((els) => els.map((e) => e.getBoundingClientRect().toJSON() as DOMRect));
    const labels = await pinned.evaluateAll((els) => els.map((e) => e.getBoundingClientRect().toJSON() as DOMRect));
    labels.forEach((r, i) => {
      expect(r.top).toBeGreaterThanOrEqual(graph.y - 0.5);
      expect(r.bottom).toBeLessThanOrEqual(graph.y + 26);
      expect(Math.abs(r.x + r.width / 2 - (bands[i]!.x + bands[i]!.width / 2))).toBeLessThan(2);
    });
    await screenshot(page, 'pinned-stages');
    await page.click('button:text-is("Fit")');
    await expect.poll(() => pinned.count()).toBe(0);
  });
});
