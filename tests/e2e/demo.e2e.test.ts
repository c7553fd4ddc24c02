// The demo site in the browser: every scenario's shared elements are marked on the graph, and the LOPA
// figures on screen equal the CLI's JSON report of the same file. Also the finding click-through, the
// element details, pan and zoom, SVG export and the site overview. Writes docs/viewer.png.
import { createHash } from 'node:crypto';
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import {
  copyTo,
  DEMO,
  type DemoTruth,
  GRAPH_BOX,
  openViewer,
  ROOT,
  sameFigure,
  screenshot,
  type Session,
  truthFor,
} from './harness.ts';

const truth: DemoTruth = truthFor(DEMO);

describe('sameFigure, the comparison the LOPA checks rest on', () => {
  it.each([
    ['2.5e-5', 0.000025, true],
    ['2.5e-5', 0.000026, false],
    ['500', 500, true],
    ['500', 560, false],
    ['12,000', 12_040, true],
    ['1.0e-1', 0.2, false],
    ['no credit', 0.1, false],
  ])('reads %s as %s: %s', (shown, exact, same) => expect(sameFigure(shown, exact)).toBe(same));
});

describe('the demo in the viewer', () => {
  let session: Session;
  let page: Page;

  beforeAll(async () => {
    session = await openViewer(DEMO, GRAPH_BOX);
    page = session.page;
  });

  afterAll(async () => {
    await session?.close();
  });

  async function focus(id: string): Promise<void> {
    await page.click(`[data-testid=scenarios] button[data-scenario="${id}"]`);
    await page.waitForSelector(`svg[data-testid=graph][data-scenario="${id}"]`);
    await page.waitForSelector(`[data-testid=lopa][data-scenario="${id}"]`);
  }

  const figure = (name: string, row = page.locator('[data-testid=lopa]')) =>
    row.locator(`[data-figure=${name}]`).first().innerText();

  it('lists every scenario of the model', async () => {
    const ids = await page
      .locator('[data-testid=scenarios] button[data-scenario]')
      .evaluateAll((els) => els.map((e) => e.getAttribute('data-scenario')));
    expect(ids).toEqual(truth.model.scenarios.map((s) => s.id));
  });

  for (const scenario of truth.report.scenarios) {
    describe(`scenario ${scenario.id}`, () => {
      it('marks each element a finding names, with its sides in words', async () => {
        await focus(scenario.id);
        const findings = truth.analysis.findings.filter((f) => f.scenario === scenario.id && f.element);
        // A scenario with no shared element (S-104: an external cause) must mark none.
        if (findings.length === 0) {
          await page.waitForSelector('svg[data-testid=graph] g.box');
          expect(await page.locator('svg[data-testid=graph] g.box[data-shared="yes"]').count()).toBe(0);
        }
        for (const f of findings) {
          const box = page.locator(`svg[data-testid=graph] g.box[data-tag="${f.element}"]`);
          await expect.poll(() => box.getAttribute('data-shared'), { message: `${f.element} marked` }).toBe('yes');
          const banner = await box.locator('.banner-text').textContent();
          const oneElement = f.paths.every((p) => p[p.length - 1] === f.element);
          expect(banner, `${f.key}`).toMatch(oneElement ? /^SHARED / : /^(SHARED|ALIKE) /);
          const letters = f.parties.map((p) =>
            p.role === 'cause'
              ? 'C'
              : String(
                  (truth.model.scenarios.find((s) => s.id === scenario.id)!.layers ?? []).findIndex(
                    (l) => l.function === p.tag,
                  ) + 1,
                ),
          );
          for (const letter of letters) expect(banner!.split(' ')[1]!.split('+'), `${f.key} sides`).toContain(letter);
        }
        await screenshot(page, `demo-${scenario.id}`);
      });

      it('shows the LOPA figures of the CLI JSON report', async () => {
        const byFigure = Object.fromEntries(scenario.lopa.map((l) => [l.figure, l]));
        expect(sameFigure(await figure('mitigatedClaimed'), byFigure.claimed!.mitigated)).toBe(true);
        expect(sameFigure(await figure('mitigatedAfter'), byFigure['after-independence']!.mitigated)).toBe(true);
        expect(sameFigure(await figure('mitigatedIfAccepted'), byFigure['if-accepted']!.mitigated)).toBe(true);
        expect(sameFigure(await figure('tolerable'), scenario.tolerable)).toBe(true);
        expect(sameFigure(await figure('gap'), scenario.gap)).toBe(true);
        const meets = (ok: boolean) => (ok ? '✓ meets' : '✗ falls short');
        expect(await page.innerText('[data-testid=meets-claimed]')).toBe(meets(byFigure.claimed!.meets));
        expect(await page.innerText('[data-testid=meets-after]')).toBe(meets(byFigure['after-independence']!.meets));
        for (const layer of scenario.layers) {
          const row = page.locator(`[data-testid=lopa] tr[data-layer="${layer.function}"]`);
          expect(sameFigure(await figure('claimedPfd', row), layer.claimedPfd.value), `${layer.function} claimed`).toBe(
            true,
          );
          const after = await figure('pfdAfter', row);
          if (layer.credited) expect(sameFigure(after, layer.allowedPfd)).toBe(true);
          else expect(after).toBe('no credit');
          expect(await row.locator('[data-testid=verdict]').getAttribute('data-verdict')).toBe(layer.verdict);
        }
        if (scenario.sif) {
          expect(sameFigure(await figure('requiredPfd'), scenario.sif.requiredPfd)).toBe(true);
          expect(sameFigure(await figure('requiredRrf'), scenario.sif.requiredRrf)).toBe(true);
          expect(await page.getAttribute('[data-testid=required-sil]', 'data-sil')).toBe(String(scenario.sif.sil));
          if (scenario.sif.sil >= 1 && scenario.sif.sil <= 4)
            expect(await page.innerText('[data-testid=required-sil]')).toBe(`SIL ${scenario.sif.sil}`);
        }
      });

      it('draws the cause and every claimed layer with its own line style, named in the legend', async () => {
        const labels = await page.locator('[data-testid=legend] [data-side] .label').allInnerTexts();
        const layers = truth.model.scenarios.find((s) => s.id === scenario.id)!.layers ?? [];
        expect(labels).toEqual([
          expect.stringMatching(/^Cause: /),
          ...layers.map((l, i) => `Layer ${i + 1}: ${l.function}`),
        ]);
        const dashes = await page
          .locator('[data-testid=legend] [data-side] line')
          .evaluateAll((lines) => lines.map((l) => getComputedStyle(l).strokeDasharray));
        expect(new Set(dashes).size).toBe(dashes.length);
        const colours = await page
          .locator('[data-testid=legend] [data-side] line')
          .evaluateAll((lines) => lines.map((l) => getComputedStyle(l).stroke));
        expect(new Set(colours).size).toBe(colours.length);
      });
    });
  }

  it('centres and highlights a finding when it is clicked in the list', async () => {
    await focus('S-101');
    const finding = truth.analysis.findings.find(
      (f) => f.scenario === 'S-101' && f.severity === 'voids-credit' && f.element,
    )!;
    await page.locator('svg[data-testid=graph]').hover();
    await page.mouse.wheel(0, 600); // zoom out first, so centring has to move the view
    await page.click(`[data-finding="${finding.key}"]`);
    const box = page.locator(`svg[data-testid=graph] g.box[data-tag="${finding.element}"]`);
    await expect.poll(() => box.getAttribute('class')).toContain('in-focus');
    expect(await page.getAttribute('svg[data-testid=graph]', 'class')).toContain('focusing');
    const pathEdges = finding.paths.reduce((n, p) => n + p.length - 1, 0);
    // Every step of each side's path is highlighted (and, beyond them, what the shared element relies on).
    for (const path of finding.paths) {
      for (let i = 1; i < path.length; i++) {
        expect(
          await page
            .locator(`svg[data-testid=graph] g.edge[data-edge="${path[i - 1]}\u2192${path[i]}"] polyline.in-focus`)
            .count(),
          `${path[i - 1]} to ${path[i]}`,
        ).toBeGreaterThan(0);
      }
    }
    expect(await page.locator('svg[data-testid=graph] polyline.in-focus').count()).toBeGreaterThanOrEqual(pathEdges);
    const graph = (await page.locator('svg[data-testid=graph]').boundingBox())!;
    const target = (await box.boundingBox())!;
    const cx = target.x + target.width / 2;
    const cy = target.y + target.height / 2;
    expect(cx).toBeGreaterThan(graph.x + graph.width * 0.15);
    expect(cx).toBeLessThan(graph.x + graph.width * 0.85);
    expect(cy).toBeGreaterThan(graph.y + graph.height * 0.15);
    expect(cy).toBeLessThan(graph.y + graph.height * 0.85);
    await screenshot(page, 'finding-focused');
  });

  it('shows an element: kind, links, and every function that relies on it', async () => {
    await focus('S-101');
    await page.click('[data-finding^="shared-bridle:"]');
    await page.locator('svg[data-testid=graph] g.box[data-tag="BR-101"]').click();
    const details = page.locator('[data-testid=details][data-tag="BR-101"]');
    await details.waitFor();
    expect(await details.locator('.kind').first().innerText()).toBe('bridle');
    expect(await details.innerText()).toContain('mounted on');
    const relying = truth.analysis.traces
      .filter((t) => t.elements.some((e) => e.tag === 'BR-101'))
      .map((t) => t.function)
      .sort();
    const shown = (await details.locator('[data-testid=relied-on-by] > li > button.link.tag').allInnerTexts()).sort();
    expect(shown).toEqual(relying);
    expect(relying).toEqual(expect.arrayContaining(['LIC-101', 'SIF-101']));
  });

  it('shows the fail action of a final element', async () => {
    await focus('S-101');
    await page.locator('svg[data-testid=graph] g.box[data-tag="XV-101"]').dispatchEvent('click');
    const fact = page.locator('[data-testid=details][data-tag="XV-101"] [data-fact="fail action"]');
    expect(await fact.innerText()).toBe('fails closed on loss of power, signal or air');
  });

  it('pans and zooms', async () => {
    await focus('S-102');
    const transform = () => page.getAttribute('svg[data-testid=graph] > g', 'transform');
    const before = await transform();
    await page.click('button[aria-label="Zoom in"]');
    const zoomed = await transform();
    expect(zoomed).not.toBe(before);
    const graph = (await page.locator('svg[data-testid=graph]').boundingBox())!;
    await page.mouse.move(graph.x + 40, graph.y + graph.height - 40);
    await page.mouse.down();
    await page.mouse.move(graph.x + 200, graph.y + graph.height - 140, { steps: 5 });
    await page.mouse.up();
    expect(await transform()).not.toBe(zoomed);
  });

  it('exports the current view as a standalone SVG', async () => {
    await focus('S-101');
    const [download] = await Promise.all([page.waitForEvent('download'), page.click('[data-testid=export]')]);
    // The file name carries the model file, the scenario and the revision (the model's `revision="A"`
    // and the content hash), so exports of two revisions never overwrite each other.
    const sha256 = createHash('sha256').update(readFileSync(DEMO)).digest('hex');
    expect(download.suggestedFilename()).toBe(`marrow-fen_S-101_rev-A_sha-${sha256.slice(0, 12)}.svg`);
    const text = readFileSync((await download.path())!, 'utf8');
    expect(text).toContain('<g class="title-block">');
    for (const row of ['Marrow Fen Chemical Works, Unit 100', 'marrow-fen.bulk', sha256, 'LOPA per year'])
      expect(text).toContain(`>${row}`);
    expect(text.startsWith('<svg xmlns="http://www.w3.org/2000/svg"')).toBe(true);
    for (const tag of ['BR-101', 'LIC-101', 'SIF-101', 'LAH-101']) expect(text).toContain(`data-tag="${tag}"`);
    expect(text).toContain('Decision support only');
    expect(text).toContain('SHARED C+1');
  });

  it('prints a sheet with its title block, without the controls and the scenario list', async () => {
    await focus('S-101');
    await page.emulateMedia({ media: 'print' });
    try {
      expect(await page.isVisible('[data-testid=print-title]')).toBe(true);
      const titleBlock = await page.innerText('[data-testid=print-title]');
      expect(titleBlock).toContain(createHash('sha256').update(readFileSync(DEMO)).digest('hex'));
      expect(titleBlock).toContain('S-101');
      expect(await page.isVisible('[data-testid=scenarios]')).toBe(false);
      expect(await page.isVisible('[data-testid=export]')).toBe(false);
      expect(await page.isVisible('svg[data-testid=graph]')).toBe(true);
      expect(await page.isVisible('[data-testid=lopa]')).toBe(true);
    } finally {
      await page.emulateMedia({ media: 'screen' });
    }
    expect(await page.isVisible('[data-testid=print-title]')).toBe(false);
  });

  it('shows the site overview by unit and solver', async () => {
    await page.click('[data-testid=overview]');
    await page.waitForSelector('svg[data-testid=graph][data-scenario=overview]');
    const tags = await page.locator(GRAPH_BOX).evaluateAll((els) => els.map((e) => e.getAttribute('data-tag')).sort());
    expect(tags).toEqual(['BPCS-C1', 'BPCS-C2', 'C-201', 'R-301', 'SIS-1', 'V-101']);
    await screenshot(page, 'demo-overview');
  });

  it('keeps the cautions in view', async () => {
    expect(await page.innerText('[data-testid=caution]')).toContain('IEC 61511');
  });

  it('makes the README screenshot of S-101 and throws no error', async () => {
    await focus('S-101');
    await page.mouse.move(0, 0);
    // The layout time differs on every run; hiding it keeps the checked-in image stable between runs.
    await page.addStyleTag({ content: '[data-testid=layout-status] { visibility: hidden; }' });
    const shot = await screenshot(page, 'viewer');
    copyTo(shot, join(ROOT, 'docs/viewer.png'));
    expect(session.seen.errors).toEqual([]);
    expect(session.seen.dialogs).toEqual([]);
  });
});
