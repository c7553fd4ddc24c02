// Accessibility of the viewer on the demo, checked by axe-core (Deque's rules for WCAG 2.x, run in the
// page) on every view: the site overview, each scenario, a finding's proof, an element's card. Then
// what axe cannot see: the keyboard alone reaches every control, Escape closes the card, focusing a
// box off-screen pans to it, and a screen reader hears the scenario and its verdict when they change.
import { beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { seriousViolations } from './axe.ts';
import { DEMO, type DemoTruth, focusScenario, GRAPH_BOX, truthFor, viewerForTests } from './harness.ts';

const truth: DemoTruth = truthFor(DEMO);
describe('the viewer with assistive technology and the keyboard', () => {
  const viewer = viewerForTests(DEMO);
  const focus = (id: string) => focusScenario(viewer.page, id);
  let page: Page;
  beforeAll(() => {
    page = viewer.page;
  });

  it('has one main landmark and a level-one heading', async () => {
    expect(await page.locator('main').count()).toBe(1);
    expect(await page.locator('h1').count()).toBe(1);
  });

  it('has no serious or critical axe violation in the site overview', async () => {
    await page.click('[data-testid=overview]');
    await page.waitForSelector('svg[data-testid=graph][data-scenario=overview] g.box');
    expect(await seriousViolations(page)).toEqual([]);
  });

  for (const s of truth.model.scenarios) {
    it(`has no serious or critical axe violation in scenario ${s.id}`, async () => {
      await focus(s.id);
      expect(await seriousViolations(page)).toEqual([]);
    });
  }

  it("has no serious or critical axe violation with a finding's proof and an element's card open", async () => {
    await focus('S-101');
    await page.click('[data-finding^="shared-bridle:"]');
    await page.waitForSelector('[data-testid=proof]');
    expect(await seriousViolations(page)).toEqual([]);
    await page.locator('svg[data-testid=graph] g.box[data-tag="BR-101"]').dispatchEvent('click');
    await page.waitForSelector('[data-testid=details]');
    expect(await seriousViolations(page)).toEqual([]);
  });

  it('closes the card with Escape, then the proof', async () => {
    await page.keyboard.press('Escape');
    await page.waitForSelector('[data-testid=details]', { state: 'detached' });
    expect(await page.locator('[data-testid=proof]').count()).toBe(1);
    await page.keyboard.press('Escape');
    await page.waitForSelector('[data-testid=proof]', { state: 'detached' });
  });

  it('has no serious or critical axe violation with a box half out of view (each box named in full)', async () => {
    await focus('S-101');
    await page.keyboard.press('Escape');
    const graph = (await page.locator('svg[data-testid=graph]').boundingBox())!;
    const body = page.locator('svg[data-testid=graph] g.box[data-tag="AI-S-01"] rect.body');
    const box = (await body.boundingBox())!;
    const k = Number((await page.innerText('.pct')).replace('%', '')) / 100;
    // Drag the sheet (from the heading strip, where no box is) so the graph's left edge cuts AI-S-01 50
    // units into its text: its tag shows in part, its kind line ("io-card") not at all. A name given as
    // aria-label then fails axe (the visible words are no longer one run of the label).
    const dx = graph.x - (box.x + (10 + 50) * k);
    const from = { x: graph.x + graph.width / 2, y: graph.y + 6 };
    await page.mouse.move(from.x, from.y);
    await page.mouse.down();
    await page.mouse.move(from.x + dx / 2, from.y, { steps: 3 });
    await page.mouse.move(from.x + dx, from.y, { steps: 3 });
    await page.mouse.up();
    const moved = (await body.boundingBox())!;
    expect(moved.x).toBeLessThan(graph.x);
    expect(moved.x + moved.width).toBeGreaterThan(graph.x);
    expect(await seriousViolations(page)).toEqual([]);
  });

  it('reaches every control with Tab alone', async () => {
    await focus('S-101');
    // Every control a mouse user can use: buttons, fields, links and the focusable boxes, as shown.
    const controls = await page
      .locator('button:visible, input:visible, a[href]:visible, select:visible, [tabindex="0"]')
      .evaluateAll((els) =>
        els.map((e, i) => {
          e.setAttribute('data-reach', String(i));
          return String(i);
        }),
      );
    expect(controls.length).toBeGreaterThan(40);
    await page.locator('body').focus();
    const reached = new Set<string>();
    for (let i = 0; i < controls.length + 20; i++) {
      await page.keyboard.press('Tab');
      const mark = await page.evaluate(() => document.activeElement?.getAttribute('data-reach') ?? null);
      if (mark !== null) reached.add(mark);
    }
    const missed = controls.filter((c) => !reached.has(c));
    const names = await Promise.all(
      missed.map((c) => page.locator(`[data-reach="${c}"]`).evaluate((e) => e.outerHTML.slice(0, 80))),
    );
    expect(names).toEqual([]);
    expect(await page.getAttribute('[data-testid=open-button]', 'data-reach')).not.toBeNull();
  });

  it('pans to a box that gets keyboard focus off-screen', async () => {
    await focus('S-101');
    await page.locator('svg[data-testid=graph]').hover();
    await page.click('button[aria-label="Zoom in"]');
    await page.click('button[aria-label="Zoom in"]');
    const graph = (await page.locator('svg[data-testid=graph]').boundingBox())!;
    const inside = (b: { x: number; y: number; width: number; height: number }) =>
      b.x >= graph.x &&
      b.y >= graph.y &&
      b.x + b.width <= graph.x + graph.width &&
      b.y + b.height <= graph.y + graph.height;
    const tags = await page.locator(GRAPH_BOX).evaluateAll((els) => els.map((e) => e.getAttribute('data-tag')!));
    let offscreen: string | undefined;
    for (const tag of tags) {
      if (!inside((await page.locator(`${GRAPH_BOX}[data-tag="${tag}"] rect.body`).boundingBox())!)) {
        offscreen = tag;
        break;
      }
    }
    expect(offscreen, 'a box starts off-screen at this zoom').toBeDefined();
    await page.locator(`${GRAPH_BOX}[data-tag="${offscreen}"]`).focus();
    await expect
      .poll(async () => inside((await page.locator(`${GRAPH_BOX}[data-tag="${offscreen}"] rect.body`).boundingBox())!))
      .toBe(true);
  });

  it('announces the scenario and its verdict when they change', async () => {
    for (const id of ['S-102', 'S-101']) {
      await focus(id);
      const report = truth.report.scenarios.find((s) => s.id === id)!;
      const after = report.lopa.find((l) => l.figure === 'after-independence')!;
      const announce = page.locator('[role=status][aria-live=polite][data-testid=announce]');
      await expect
        .poll(() => announce.innerText())
        .toContain(`Scenario ${id}: ${after.meets ? 'meets' : 'falls short'}`);
    }
    expect(viewer.session.seen.errors).toEqual([]);
  });
});
