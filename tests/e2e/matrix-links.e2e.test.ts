// All scenarios at once, tags across the site and links: the matrix lists every scenario with the
// verdicts of the CLI's JSON report and sorts and filters them; the tag search finds any tag and the
// scenarios that rely on it (checked against the analysis' traces); a link names a scenario, an
// element or a finding and opening it shows exactly that.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { seriousViolations } from './axe.ts';
import {
  DEMO,
  type DemoTruth,
  docScreenshot,
  focusScenario,
  launch,
  sameFigure,
  startView,
  truthFor,
  viewerForTests,
  type ViewProcess,
} from './harness.ts';

const truth: DemoTruth = truthFor(DEMO);

describe('the all-scenarios matrix and the tag search', () => {
  const viewer = viewerForTests(DEMO);
  let page: Page;
  beforeAll(() => {
    page = viewer.page;
  });

  const matrixIds = () =>
    page
      .locator('[data-testid=matrix] tbody tr[data-scenario]')
      .evaluateAll((rows) => rows.map((r) => r.getAttribute('data-scenario')!));

  it('lists every scenario with its verdict after independence and each layer under its verdict', async () => {
    await page.click('[data-testid=mode-matrix]');
    await page.waitForSelector('[data-testid=matrix]');
    expect((await matrixIds()).sort()).toEqual(truth.report.scenarios.map((s) => s.id).sort());
    for (const s of truth.report.scenarios) {
      const row = page.locator(`[data-testid=matrix] tr[data-scenario="${s.id}"]`);
      const after = s.lopa.find((l) => l.figure === 'after-independence')!;
      expect(await row.locator('[data-cell=after]').innerText()).toBe(after.meets ? '✓ meets' : '✗ falls short');
      for (const layer of s.layers) {
        expect(
          await row.locator(`[data-cell="${layer.verdict}"] button`, { hasText: layer.function }).count(),
          `${s.id} ${layer.function}`,
        ).toBe(1);
      }
    }
    expect(await seriousViolations(page)).toEqual([]);
    await docScreenshot(page, 'matrix', 'docs/viewer-matrix.png');
  });

  it('sorts by gap, both ways, and filters by text and by falling short', async () => {
    const byGap = [...truth.report.scenarios]
      .sort((a, b) => b.gap - a.gap || a.id.localeCompare(b.id, 'en', { numeric: true }))
      .map((s) => s.id);
    // Opens sorted by gap, largest first; one click on the heading turns the order round.
    expect(await matrixIds()).toEqual(byGap);
    await page.click('[data-testid=matrix] [data-sort=gap]');
    expect(await matrixIds()).toEqual(
      [...truth.report.scenarios]
        .sort((a, b) => a.gap - b.gap || a.id.localeCompare(b.id, 'en', { numeric: true }))
        .map((s) => s.id),
    );
    await page.check('[data-testid=matrix-short]');
    const short = truth.report.scenarios
      .filter((s) => !s.lopa.find((l) => l.figure === 'after-independence')!.meets)
      .map((s) => s.id)
      .sort();
    expect((await matrixIds()).sort()).toEqual(short);
    await page.uncheck('[data-testid=matrix-short]');
    await page.fill('[data-testid=matrix-filter]', 'SIF-201');
    const withSif201 = truth.model.scenarios
      .filter((s) => (s.layers ?? []).some((l) => l.function === 'SIF-201'))
      .map((s) => s.id)
      .sort();
    expect((await matrixIds()).sort()).toEqual(withSif201);
    await page.fill('[data-testid=matrix-filter]', '');
  });

  it('ranks the common causes under the matrix as the CLI report does, each a link to its element', async () => {
    // The truth is the CLI's JSON report of the same file (`bulkhead report --format json`, commonCauses).
    const expected = truth.report.commonCauses.elements;
    expect(expected.length).toBeGreaterThan(1);
    const ranking = page.locator('[data-testid=ranking]');
    await ranking.locator('tbody tr').first().waitFor();
    const rows = ranking.locator('tbody tr');
    expect(await rows.evaluateAll((trs) => trs.map((tr) => tr.getAttribute('data-element')))).toEqual(
      expected.slice(0, 25).map((e) => e.element),
    );
    for (const e of expected.slice(0, 25)) {
      const row = ranking.locator(`tr[data-element="${e.element}"]`);
      expect(await row.locator('[data-cell=rank]').innerText()).toBe(String(e.rank));
      expect(await row.locator('[data-cell=layers]').innerText()).toBe(String(e.layers));
      expect(await row.locator('[data-cell=scenarios] a').allInnerTexts()).toEqual(e.scenarios);
      for (const [cell, exact] of [
        ['cost', e.frequencyCost],
        ['at-stake', e.frequencyAtStake],
      ] as const) {
        const shown = await row.locator(`[data-cell=${cell}]`).innerText();
        if (exact === 0) expect(shown, `${e.element} ${cell}`).toBe('—');
        else
          expect(sameFigure(shown.replace(' /yr', ''), exact), `${e.element} ${cell}: ${shown} vs ${exact}`).toBe(true);
      }
    }
    expect(await ranking.innerText()).toContain(truth.report.commonCauses.order);
    expect(await seriousViolations(page)).toEqual([]);
    await ranking.scrollIntoViewIfNeeded();
    await docScreenshot(page, 'ranking', 'docs/viewer-ranking.png');
    // The top element's link shows it in the first scenario it touches, its card open.
    const top = expected[0]!;
    await ranking.locator(`tr[data-element="${top.element}"] [data-cell=element]`).click();
    await page.waitForSelector(`svg[data-testid=graph][data-scenario="${top.scenarios[0]}"] g.box`);
    await page.waitForSelector(`[data-testid=details][data-tag="${top.element}"]`);
    await page.click('[data-testid=mode-matrix]');
    await page.waitForSelector('[data-testid=matrix]');
  });

  it('opens a scenario from its row', async () => {
    await page.click('[data-testid=matrix] tr[data-scenario="S-103"] th button');
    await page.waitForSelector('svg[data-testid=graph][data-scenario="S-103"] g.box');
  });

  it('finds a tag across the site with every scenario that relies on it, and shows it', async () => {
    const tag = 'UPS-1';
    const relying = new Set(
      truth.analysis.traces.filter((t) => t.elements.some((e) => e.tag === tag)).map((t) => t.function),
    );
    const expected = truth.model.scenarios
      .filter((s) =>
        [s.cause.function ?? s.cause.element, ...(s.layers ?? []).map((l) => l.function)].some(
          (t) => t && relying.has(t),
        ),
      )
      .map((s) => s.id);
    expect(expected.length).toBeGreaterThan(1);
    await page.fill('[data-testid=tag-search]', 'ups-');
    const result = page.locator(`[data-tag-result="${tag}"]`);
    await result.waitFor();
    expect(await result.locator('.where').innerText()).toBe(expected.join(', '));
    await result.click();
    await page.waitForSelector(`[data-testid=details][data-tag="${tag}"]`);
    expect(expected).toContain(await page.getAttribute('svg[data-testid=graph]', 'data-scenario'));
  });

  it('says when no tag matches', async () => {
    await page.fill('[data-testid=tag-search]', 'no-such-tag-anywhere');
    await page.waitForSelector('[data-testid=tag-results] .none');
    await page.fill('[data-testid=tag-search]', '');
    expect(viewer.session.seen.errors).toEqual([]);
  });
});

describe('links to what is in view', () => {
  let view: ViewProcess;
  let close: () => Promise<void>;
  let page: Page;

  beforeAll(async () => {
    view = await startView(DEMO);
    const context = await launch();
    close = async () => {
      await context.close();
      view.stop();
    };
    page = await context.newPage();
  });

  afterAll(async () => {
    await close?.();
  });

  it("writes the finding in view into the page's address, and that address opens its proof", async () => {
    await page.goto(view.url);
    await focusScenario(page, 'S-101');
    const finding = truth.analysis.findings.find((f) => f.scenario === 'S-101' && f.rule === 'shared-bridle')!;
    await page.click(`[data-finding="${finding.key}"]`);
    await expect
      .poll(() => new URL(page.url()).hash)
      .toBe(`#scenario=S-101&finding=${encodeURIComponent(finding.key)}`);
    const link = page.url();
    await page.goto('about:blank');
    await page.goto(link);
    await page.waitForSelector(`[data-testid=proof][data-finding="${finding.key}"]`, { timeout: 20_000 });
    expect(await page.getAttribute('svg[data-testid=graph]', 'data-scenario')).toBe('S-101');
  });

  it('opens a scenario with an element selected, and the matrix, from their links', async () => {
    await page.goto('about:blank');
    await page.goto(`${view.url}#scenario=S-103&element=SIS-1`);
    await page.waitForSelector('[data-testid=details][data-tag="SIS-1"]', { timeout: 20_000 });
    expect(await page.getAttribute('svg[data-testid=graph]', 'data-scenario')).toBe('S-103');
    await page.goto('about:blank');
    await page.goto(`${view.url}#view=matrix`);
    await page.waitForSelector('[data-testid=matrix]', { timeout: 20_000 });
  });

  it('ignores a link to a scenario the model does not have', async () => {
    await page.goto('about:blank');
    await page.goto(`${view.url}#scenario=S-999`);
    await page.waitForSelector('svg[data-testid=graph] g.box', { timeout: 20_000 });
    expect(await page.getAttribute('svg[data-testid=graph]', 'data-scenario')).toBe(truth.model.scenarios[0]!.id);
  });
});
