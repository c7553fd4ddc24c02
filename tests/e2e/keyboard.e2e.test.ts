// The keyboard alone reaches and works every control on every view of the viewer (issue 17): the site
// overview, a scenario, a finding's proof, an element's card, the all-scenarios matrix with the
// common-cause ranking, tag search results, a what-if, a comparison, the file gone, a bad save, a bad
// model and the welcome page. On each, Tab from the top must reach every visible control, show where
// focus is, and come round again (WCAG 2.2 SC 2.1.1, 2.1.2, 2.4.7; see keyboard.ts); the key controls
// must work with Enter or Space as the WAI-ARIA Authoring Practices' button pattern has it (a native
// <button> does both; a <summary> toggles its <details> on Enter, per the HTML standard).
import { readFileSync, rmSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEMO, focusScenario, GRAPH_BOX, openViewer, ROOT, screenshot, type Session, tempDir } from './harness.ts';
import { focusMarkPixels, type TabWalk, tabTo, walkWithTab } from './keyboard.ts';

const REV_B = join(ROOT, 'fixtures/demo/marrow-fen-rev-b.bulk');
// A model the loader rejects: an unknown mounting and an unknown cause function.
const BAD = ['site "Bad site"', 'vessel V-1', 'transmitter LT-1 variable=level mounted-on=N-404', ''].join('\n');

/** Every control reached, none without a visible focus, focus back at the start, no Tab swallowed. */
function expectAllReached(walk: TabWalk, atLeast: number) {
  expect(walk.controls.length).toBeGreaterThanOrEqual(atLeast);
  expect(walk.missed.map((c) => c.html)).toEqual([]);
  expect(walk.unmarked.map((c) => c.html)).toEqual([]);
  expect(walk.covered.map((c) => `${c.html} under ${c.under}`)).toEqual([]);
  expect(walk.wrapped).toBe(true);
  expect(walk.stuck).toEqual([]);
}

/**
 * Focus reached from the keyboard shows on screen on each of these controls: the pixels around it
 * change at least as many as a one-pixel ring all round would (WCAG 2.2 SC 2.4.7).
 */
async function expectFocusMarks(page: Page, selectors: string[]) {
  for (const selector of selectors) {
    expect(await tabTo(page, selector), `Tab reaches ${selector}`).toBe(true);
    const mark = await focusMarkPixels(page);
    expect(
      mark.changed,
      `pixels changed by focus on ${selector} (a ring all round is ${mark.ring})`,
    ).toBeGreaterThanOrEqual(mark.ring);
  }
}

const focusedOn = (page: Page, selector: string) =>
  page.evaluate((s) => document.activeElement?.matches(s) ?? false, selector);

describe('the viewer with the keyboard alone', () => {
  const file = join(tempDir('bulkhead-keys-'), 'marrow-fen.bulk');
  let session: Session;
  let page: Page;

  beforeAll(async () => {
    writeFileSync(file, readFileSync(DEMO));
    session = await openViewer(file, GRAPH_BOX);
    page = session.page;
    // Listening from the start turns on the browser's file-chooser interception before any key press
    // opens one (turned on by the first listener, it would race the press).
    page.on('filechooser', () => undefined);
    await session.context.grantPermissions(['clipboard-read', 'clipboard-write'], { origin: session.view.url });
    await page.waitForSelector('[data-testid=live][data-live=connected]');
  });

  afterAll(async () => {
    await session?.close();
  });

  it('can fail: a control taken out of the tab order is missed, a focus without a mark is caught', async () => {
    await focusScenario(page, 'S-101');
    await page.evaluate(() => document.querySelector('[data-testid=print]')!.setAttribute('tabindex', '-1'));
    const walk = await walkWithTab(page);
    expect(walk.missed.map((c) => c.html)).toEqual([expect.stringContaining('data-testid="print"')]);
    await page.evaluate(() => document.querySelector('[data-testid=print]')!.removeAttribute('tabindex'));
    await page.addStyleTag({ content: '[data-testid=print]:focus-visible { outline: none !important; }' });
    const unmarked = await walkWithTab(page);
    expect(unmarked.unmarked.map((c) => c.html)).toEqual([expect.stringContaining('data-testid="print"')]);
    // A mark the style gives but the page does not paint: drawn outside a row that clips its paint.
    await page.addStyleTag({ content: '[data-finding]:focus-visible { outline-offset: 1px !important; }' });
    expect(await tabTo(page, '[data-finding]')).toBe(true);
    const clipped = await focusMarkPixels(page);
    expect(clipped.changed).toBeLessThan(clipped.ring);
    await page.reload();
    await page.waitForSelector(GRAPH_BOX);
  });

  it('site overview: Tab reaches every control', async () => {
    await page.click('[data-testid=overview]');
    await page.waitForSelector('svg[data-testid=graph][data-scenario=overview] g.box');
    expectAllReached(await walkWithTab(page), 10);
  });

  it('a scenario: Tab reaches every control, every box of the graph among them', async () => {
    await focusScenario(page, 'S-101');
    const walk = await walkWithTab(page);
    expectAllReached(walk, 40);
    const boxes = await page.locator(GRAPH_BOX).count();
    expect(walk.controls.filter((c) => c.html.startsWith('<g')).length).toBe(boxes);
    await expectFocusMarks(page, [
      '[data-testid=tag-search]',
      '[data-testid=open-button]',
      'button[data-scenario="S-102"]',
      '[data-testid=mode-matrix]',
      GRAPH_BOX,
      'button[aria-label="Zoom in"]',
      '[data-proof-of]',
      '[data-finding]',
      '[data-testid=cautions] summary',
    ]);
    await screenshot(page, 'keyboard-scenario');
  });

  it('a scenario: Enter on a finding in the list opens its proof; Tab reaches every control of the proof', async () => {
    expect(await tabTo(page, '[data-finding^="shared-bridle:"]')).toBe(true);
    await page.keyboard.press('Enter');
    await page.waitForSelector('[data-testid=proof][data-finding^="shared-bridle:"]');
    expectAllReached(await walkWithTab(page), 45);
    await expectFocusMarks(page, [
      '[data-testid=proof-link]',
      '[data-testid=proof] .chain button',
      '[data-testid=what-if-accept]',
      '[data-testid=accept-line]',
    ]);
  });

  it('a box with focus: arrow keys pan the graph and + and - zoom it, as dragging and the wheel do', async () => {
    expect(await tabTo(page, GRAPH_BOX)).toBe(true);
    const view = () =>
      page.evaluate(() => {
        const t = document.querySelector('svg[data-testid=graph] > g')!.getAttribute('transform')!;
        const [x, y, k] = /translate\(([-\d.e]+) ([-\d.e]+)\) scale\(([-\d.e]+)\)/.exec(t)!.slice(1).map(Number);
        return { x: x!, y: y!, k: k! };
      });
    const before = await view();
    await page.keyboard.press('ArrowLeft');
    await page.keyboard.press('ArrowUp');
    const panned = await view();
    expect(panned.x).toBeGreaterThan(before.x);
    expect(panned.y).toBeGreaterThan(before.y);
    expect(panned.k).toBe(before.k);
    await page.keyboard.press('+');
    expect((await view()).k).toBeGreaterThan(before.k);
    await page.keyboard.press('-');
    await page.keyboard.press('-');
    expect((await view()).k).toBeLessThan(before.k);
  });

  it("the proof's Copy puts the accept statement on the clipboard, from the keyboard", async () => {
    expect(await tabTo(page, '[data-testid=proof] .accept button')).toBe(true);
    await page.keyboard.press('Enter');
    const statement = await page.inputValue('[data-testid=accept-line]');
    expect(statement).toMatch(/^accept /);
    await expect.poll(() => page.evaluate(() => navigator.clipboard.readText())).toBe(statement);
  });

  it("a box: Space opens the element's card; Tab reaches every control of the card; Escape closes it", async () => {
    expect(await tabTo(page, `${GRAPH_BOX}[data-tag="BR-101"]`)).toBe(true);
    await page.keyboard.press(' ');
    await page.waitForSelector('[data-testid=details][data-tag="BR-101"]');
    const walk = await walkWithTab(page);
    expectAllReached(walk, 45);
    expect(walk.controls.some((c) => c.html.includes('Close details'))).toBe(true);
    await expectFocusMarks(page, ['button[aria-label="Close details"]', '[data-testid=details] button.link']);
    await screenshot(page, 'keyboard-card');
    await page.keyboard.press('Escape');
    await page.waitForSelector('[data-testid=details]', { state: 'detached' });
  });

  const BOX = `${GRAPH_BOX}[data-tag="BR-101"]`;
  const FINDING = '[data-testid=findings] button[data-finding^="shared-bridle:"]';
  it.each([
    ['the card', BOX, 'Enter', 'button[aria-label="Close details"]', 'Enter', '[data-testid=details]'],
    ['the card', BOX, ' ', 'button[aria-label="Close details"]', 'Escape', '[data-testid=details]'],
    ['the proof', FINDING, 'Enter', '[data-testid=proof] button.close', 'Enter', '[data-testid=proof]'],
    ['the proof', FINDING, 'Enter', '[data-testid=proof-link]', 'Escape', '[data-testid=proof]'],
  ])(
    '%s: opened from %s with %j, closed from %s inside it with %j: focus goes back to what opened it',
    async (_, opener, openKey, inside, closeKey, panel) => {
      expect(await tabTo(page, opener)).toBe(true);
      await page.keyboard.press(openKey);
      expect(await tabTo(page, inside)).toBe(true);
      await page.keyboard.press(closeKey);
      await page.waitForSelector(panel, { state: 'detached' });
      await expect.poll(() => page.evaluate((s) => document.activeElement?.matches(s) ?? false, opener)).toBe(true);
    },
  );

  it('"Show all paths" takes its own button away: focus moves to the finding\'s line in the list', async () => {
    expect(await tabTo(page, FINDING)).toBe(true);
    await page.keyboard.press('Enter');
    await page.waitForSelector('[data-testid=proof]');
    expect(await tabTo(page, '[data-testid=show-all-paths]')).toBe(true);
    await page.keyboard.press('Enter');
    await expect.poll(() => page.locator('[data-testid=show-all-paths]').count()).toBe(0);
    await expect.poll(() => focusedOn(page, FINDING)).toBe(true);
  });

  it('the cautions open with Enter on their summary', async () => {
    expect(await tabTo(page, '[data-testid=cautions] summary')).toBe(true);
    await page.keyboard.press('Enter');
    expect(await page.getAttribute('[data-testid=cautions]', 'open')).not.toBeNull();
  });

  it('what-if: Enter asks each kind (accept, withdraw, twin), Tab reaches every control, the lines copy, Space goes back', async () => {
    await focusScenario(page, 'S-101');
    // A finding the file accepts, so the proof offers to withdraw that acceptance.
    const key = (await page
      .locator('[data-testid=findings] button:has(.sev-needs-justification)')
      .first()
      .getAttribute('data-finding'))!;
    writeFileSync(
      file,
      `${readFileSync(DEMO, 'utf8')}accept ${key} by="A. Reviewer" date=2026-01-05 reason="Checked by the team"\n`,
    );
    await page.waitForSelector(`[data-finding="${key}"] .sev-accepted`, { timeout: 10_000 });
    await page.click(`[data-finding="${key}"]`);
    expect(await tabTo(page, '[data-testid=what-if-reject]')).toBe(true);
    await page.keyboard.press('Enter');
    await page.waitForSelector('[data-testid=what-if] li[data-change=reject]');
    await page.click('[data-finding^="shared-bridle:"]');
    expect(await tabTo(page, '[data-testid=what-if-accept]')).toBe(true);
    await page.keyboard.press('Enter');
    await page.waitForSelector('[data-testid=what-if] li[data-change=accept]');
    expect(await tabTo(page, '[data-testid=what-if-twin]')).toBe(true);
    await page.keyboard.press('Enter');
    await page.waitForSelector('[data-testid=what-if] li[data-change=twin]');
    const walk = await walkWithTab(page);
    expectAllReached(walk, 45);
    expect(walk.controls.some((c) => c.html.includes('data-testid="what-if-add"'))).toBe(true);
    expect(walk.controls.filter((c) => c.html.startsWith('<button') && c.html.includes('undo'))).toHaveLength(3);
    await expectFocusMarks(page, ['[data-testid=what-if] li button', '[data-testid=what-if-add]']);
    expect(await tabTo(page, '[data-testid=what-if-copy]')).toBe(true);
    await page.keyboard.press('Enter');
    const lines = await page.inputValue('[data-testid=what-if-add]');
    expect(lines).toContain('BR-101');
    await expect.poll(() => page.evaluate(() => navigator.clipboard.readText())).toBe(lines);
    // Undo takes its own button away: focus moves to the next change's undo, not to the page's body.
    expect(await tabTo(page, '[data-testid=what-if] li button')).toBe(true);
    await page.keyboard.press('Enter');
    await expect.poll(() => page.locator('[data-testid=what-if] li').count()).toBe(2);
    await expect.poll(() => focusedOn(page, '[data-testid=what-if] li button')).toBe(true);
    expect(await tabTo(page, '[data-testid=what-if-reset]')).toBe(true);
    await page.keyboard.press(' ');
    await page.waitForSelector('[data-testid=what-if]', { state: 'detached' });
    // The bar goes with Back (and the proof, whose finding the what-if made): focus moves to the findings.
    await expect
      .poll(() => focusedOn(page, '[data-testid=proof] .what-if button, [data-testid=findings] button'))
      .toBe(true);
    writeFileSync(file, readFileSync(DEMO));
    await page.waitForSelector(`[data-finding="${key}"] .sev-needs-justification`, { timeout: 10_000 });
  });

  it('tag search: typed, its results reached with Tab, Enter shows the tag', async () => {
    expect(await tabTo(page, '[data-testid=tag-search]')).toBe(true);
    await page.keyboard.type('BR-10');
    await page.waitForSelector('[data-testid=tag-results] button');
    expectAllReached(await walkWithTab(page), 40);
    await expectFocusMarks(page, ['[data-tag-result]']);
    expect(await tabTo(page, '[data-tag-result="BR-101"]')).toBe(true);
    await page.keyboard.press('Enter');
    await page.waitForSelector('[data-testid=details][data-tag="BR-101"]');
    // The results go with the query: focus moves to the box shown.
    await expect.poll(() => focusedOn(page, `${GRAPH_BOX}[data-tag="BR-101"]`)).toBe(true);
    await page.keyboard.press('Escape');
  });

  it('the matrix: Space on its mode, Tab reaches the sort, filter and every link; Enter and Space sort', async () => {
    expect(await tabTo(page, '[data-testid=mode-matrix]')).toBe(true);
    await page.keyboard.press(' ');
    await page.waitForSelector('[data-testid=ranking] table');
    const walk = await walkWithTab(page);
    expectAllReached(walk, 30);
    for (const control of [
      'data-sort="id"',
      'data-testid="matrix-filter"',
      'data-testid="matrix-short"',
      'data-cell="element"',
    ])
      expect(
        walk.controls.some((c) => c.html.includes(control)),
        control,
      ).toBe(true);
    await expectFocusMarks(page, [
      '[data-sort=gap]',
      '[data-testid=matrix-filter]',
      '[data-testid=matrix-short]',
      '[data-testid=matrix] td button.link',
      '[data-testid=compare-button]',
      '[data-cell=element]',
    ]);
    const idHeading = page.locator('[data-testid=matrix] th:has([data-sort=id])');
    expect(await tabTo(page, '[data-sort=id]')).toBe(true);
    await page.keyboard.press('Enter');
    expect(await idHeading.getAttribute('aria-sort')).toBe('ascending');
    await page.keyboard.press(' ');
    expect(await idHeading.getAttribute('aria-sort')).toBe('descending');
    expect(await tabTo(page, '[data-testid=matrix-short]')).toBe(true);
    await page.keyboard.press(' ');
    expect(await page.isChecked('[data-testid=matrix-short]')).toBe(true);
    await page.keyboard.press(' ');
  });

  it('compare: Enter on its button opens the file chooser; Tab reaches the legend and the list of changes', async () => {
    expect(await tabTo(page, '[data-testid=compare-button]')).toBe(true);
    const [chooser] = await Promise.all([page.waitForEvent('filechooser'), page.keyboard.press('Enter')]);
    await chooser.setFiles(REV_B);
    await page.waitForSelector('[data-testid=compare-legend]');
    await page.waitForSelector('[data-testid=compare-findings]');
    const walk = await walkWithTab(page);
    expectAllReached(walk, 30);
    expect(walk.controls.some((c) => c.html.includes('data-testid="compare-stop"'))).toBe(true);
    await expectFocusMarks(page, ['[data-testid=compare-findings] a']);
    expect(await tabTo(page, '[data-testid=compare-stop]')).toBe(true);
    await page.keyboard.press('Enter');
    await page.waitForSelector('[data-testid=compare-legend]', { state: 'detached' });
    // The Stop button is gone; focus is on the button that opens an earlier file, not lost.
    expect(await page.evaluate(() => document.activeElement?.getAttribute('data-testid'))).toBe('compare-button');
  });

  it('"Open model…" opens the file chooser with Enter', async () => {
    expect(await tabTo(page, '[data-testid=open-button]')).toBe(true);
    const [chooser] = await Promise.all([page.waitForEvent('filechooser'), page.keyboard.press('Enter')]);
    expect(chooser.isMultiple()).toBe(false);
  });

  it('the file gone: Tab reaches every control over the last good view', async () => {
    await page.click('[data-testid=mode-graph]');
    rmSync(file);
    await page.waitForSelector('[data-testid=missing]', { timeout: 10_000 });
    expectAllReached(await walkWithTab(page), 40);
  });

  it('a bad save: Tab reaches every control over the last good view and its diagnostics', async () => {
    writeFileSync(file, BAD);
    await page.waitForSelector('[data-testid=diagnostics]', { timeout: 10_000 });
    expectAllReached(await walkWithTab(page), 40);
  });

  it('a bad model with nothing good before it: Tab reaches every control', async () => {
    await page.goto('about:blank');
    await page.goto(session.view.url);
    await page.waitForSelector('[data-testid=diagnostics]');
    expectAllReached(await walkWithTab(page), 1);
  });

  it('the welcome page under the missing-file notice: Tab reaches "Open model…"', async () => {
    rmSync(file);
    await page.goto('about:blank');
    await page.goto(session.view.url);
    await page.waitForSelector('.welcome');
    await page.waitForSelector('[data-testid=missing]');
    const walk = await walkWithTab(page);
    expectAllReached(walk, 1);
    expect(walk.controls.some((c) => c.html.includes('data-testid="open-button"'))).toBe(true);
    // A missing file is a 404 for /model, which the browser logs; nothing else may appear.
    expect(session.seen.errors.filter((e) => !/status of 404/.test(e))).toEqual([]);
  });
});
