// A reviewer with the viewer open while the model is edited: the first graph does not wait long for
// the layout worker; a save that changes one attribute leaves every box where it was on screen, and
// one that resizes a box keeps the box in the middle of the view where it was; while the saved file
// does not load, the header stops saying "live" and the figures are marked stale (and the page stays
// free of serious axe violations).
import { mkdirSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { ARTIFACTS, GRAPH_BOX, openLiveDemo, screenshot, type Session } from './harness.ts';
import { seriousViolations } from './axe.ts';

type Rect = { x: number; y: number; width: number; height: number };

async function screenBoxes(page: Page): Promise<Map<string, Rect>> {
  const rects = await page.locator(`${GRAPH_BOX} rect.body`).evaluateAll((els) =>
    els.map((e) => {
      const r = e.getBoundingClientRect();
      return [
        e.closest('g.box')!.getAttribute('data-tag')!,
        { x: r.x, y: r.y, width: r.width, height: r.height },
      ] as const;
    }),
  );
  return new Map(rects);
}

describe('the viewer while the model is edited', () => {
  let session: Session & { file: string; original: string };
  let page: Page;

  beforeAll(async () => {
    session = await openLiveDemo('bulkhead-live-review-');
    page = session.page;
  });

  afterAll(async () => {
    await session?.close();
  });

  it('draws the first graph soon after the analysis answers (recorded in test-artifacts/e2e/first-graph.json)', async () => {
    const marks = await page.evaluate(() =>
      Object.fromEntries(performance.getEntriesByType('mark').map((m) => [m.name, Math.round(m.startTime)])),
    );
    const wait = marks['bulkhead:drawn']! - marks['bulkhead:view']!;
    mkdirSync(ARTIFACTS, { recursive: true });
    writeFileSync(join(ARTIFACTS, 'first-graph.json'), JSON.stringify({ ...marks, layoutWaitMs: wait }, null, 2));
    // A generous regression guard on a shared machine, not a speed target: the issue saw 7 to 9 s.
    expect(wait).toBeGreaterThanOrEqual(0);
    expect(wait).toBeLessThan(4000);
  });

  it('keeps every box where it was on screen across a save that changes one attribute', async () => {
    await page.click('[data-testid=scenarios] button[data-scenario="S-101"]');
    await page.waitForSelector('[data-testid=lopa][data-scenario="S-101"] tr[data-layer="SIF-101"]');
    const before = await screenBoxes(page);
    const edited = session.original.replace('layer SIF-101 pfd=0.005', 'layer SIF-101 pfd=0.004');
    expect(edited).not.toBe(session.original);
    writeFileSync(session.file, edited);
    await page.waitForSelector(
      '[data-testid=lopa] tr[data-layer="SIF-101"] [data-figure=claimedPfd]:has-text("4.0e-3")',
      { timeout: 5_000 },
    );
    const after = await screenBoxes(page);
    expect([...after.keys()].sort()).toEqual([...before.keys()].sort());
    for (const [tag, b] of after) {
      const a = before.get(tag)!;
      expect(Math.abs(b.x - a.x) + Math.abs(b.y - a.y), tag).toBeLessThan(1);
    }
  });

  it('keeps the box in the middle of the view in place when a save resizes boxes', async () => {
    const graph = (await page.locator('svg[data-testid=graph]').boundingBox())!;
    const centre = { x: graph.x + graph.width / 2, y: graph.y + graph.height / 2 };
    const before = await screenBoxes(page);
    const nearest = [...before].sort(
      ([, a], [, b]) =>
        Math.hypot(a.x + a.width / 2 - centre.x, a.y + a.height / 2 - centre.y) -
        Math.hypot(b.x + b.width / 2 - centre.x, b.y + b.height / 2 - centre.y),
    )[0]![0];
    const edited = session.original.replace(
      'transmitter LT-101 variable=level',
      'transmitter LT-101 title="Level transmitter on the north side of V-101" variable=level',
    );
    expect(edited).not.toBe(session.original);
    writeFileSync(session.file, edited);
    await page.waitForSelector(`${GRAPH_BOX}[data-tag="LT-101"] text.title`, { timeout: 5_000 });
    await expect
      .poll(async () => {
        const now = (await screenBoxes(page)).get(nearest)!;
        const was = before.get(nearest)!;
        return Math.abs(now.x - was.x) + Math.abs(now.y - was.y);
      })
      .toBeLessThan(1);
  });

  it('stops saying "live" and marks the figures stale while the saved file does not load', async () => {
    writeFileSync(
      session.file,
      session.original.replace('transmitter LT-102 ', 'transmitter LT-102 mounted-on=BR-999 '),
    );
    await page.waitForSelector('[data-testid=diagnostics]', { timeout: 5_000 });
    const live = page.locator('[data-testid=live]');
    expect(await live.getAttribute('data-live')).toBe('stale');
    expect(await live.innerText()).not.toMatch(/^live/);
    expect(await page.getAttribute('[data-testid=headline]', 'data-stale')).toBe('yes');
    expect(await page.getAttribute('[data-testid=lopa]', 'data-stale')).toBe('yes');
    expect(await page.innerText('[data-testid=lopa-stale]')).toContain('last version that loaded');
    expect(await page.innerText('[data-testid=announce]')).toContain('does not load');
    expect(await seriousViolations(page)).toEqual([]);
    await screenshot(page, 'live-stale');
  });

  it('is live again, and the figures current, once the file loads', async () => {
    writeFileSync(session.file, session.original);
    await page.waitForSelector('[data-testid=diagnostics]', { state: 'detached', timeout: 5_000 });
    expect(await page.getAttribute('[data-testid=live]', 'data-live')).toBe('connected');
    expect(await page.getAttribute('[data-testid=lopa]', 'data-stale')).toBe('no');
    expect(session.seen.errors).toEqual([]);
  });
});
