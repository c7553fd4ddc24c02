// What a reviewer reads on the demo: the proof of a finding (the cause chain and the layer chain
// meeting at the shared element, the rule, the basis, the accept statement) at a readable scale with
// the graph still in view; the headline and the LOPA rows that say why a layer has no credit; the
// findings grouped by layer; an element's card that lists its findings. The expected values come
// from the CLI's JSON report and the analysis of the same file (harness.truthFor), not from the page.
import { beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { DEMO, type DemoTruth, docScreenshot, focusScenario, truthFor, viewerForTests } from './harness.ts';

const truth: DemoTruth = truthFor(DEMO);
/** The first view and a finding's view never zoom below this (apps/viewer/src/lib/panzoom.svelte.ts). */
const READING_PERCENT = 85;

describe('reviewing a finding in the viewer', () => {
  const viewer = viewerForTests(DEMO);
  const focus = (id: string) => focusScenario(viewer.page, id);
  let page: Page;
  beforeAll(() => {
    page = viewer.page;
  });

  const percent = async () => Number((await page.innerText('.pct')).replace('%', ''));

  const sharedFindings = truth.analysis.findings.filter(
    (f) => f.scenario && f.element && f.paths.length === 2 && f.paths.every((p) => p.at(-1) === f.element),
  );

  for (const f of sharedFindings.filter((x) => x.severity === 'voids-credit')) {
    it(`shows the proof of ${f.key}: both chains meet at ${f.element}, readable, in view`, async () => {
      await focus(f.scenario!);
      await page.locator('svg[data-testid=graph]').hover();
      await page.mouse.wheel(0, 900); // zoom far out first: the click must bring the reading scale back
      await page.click(`[data-finding="${f.key}"]`);
      const proof = page.locator(`[data-testid=proof][data-finding="${f.key}"]`);
      await proof.waitFor();
      const chains = await proof
        .locator('ol.chain')
        .evaluateAll((ols) => ols.map((ol) => [...ol.querySelectorAll('button')].map((b) => b.textContent!.trim())));
      expect(chains).toEqual(f.paths.map((p) => p.slice(0, -1)));
      expect((await proof.locator('[data-testid=proof-meeting] button').innerText()).trim()).toBe(f.element);
      expect(await proof.innerText()).toContain(f.rule);
      expect(await proof.innerText()).toContain(f.source);
      expect(await proof.locator('[data-testid=accept-line]').inputValue()).toMatch(
        new RegExp(
          `^accept ${f.key.replace(/[.*+?^${}()|[\]\\]/g, '\\$&')} by="[^"]+" date=\\d{4}-\\d{2}-\\d{2} reason="[^"]+"$`,
        ),
      );
      // The element card does not open over the graph; the graph shows the shared element whole.
      expect(await page.locator('[data-testid=details]').count()).toBe(0);
      await expect.poll(percent).toBeGreaterThanOrEqual(READING_PERCENT);
      const graph = (await page.locator('svg[data-testid=graph]').boundingBox())!;
      const shared = page.locator(`svg[data-testid=graph] g.box[data-tag="${f.element}"] rect.body`);
      await expect
        .poll(async () => {
          const b = (await shared.boundingBox())!;
          return (
            b.x >= graph.x &&
            b.y >= graph.y &&
            b.x + b.width <= graph.x + graph.width &&
            b.y + b.height <= graph.y + graph.height
          );
        })
        .toBe(true);
      expect(
        await page.locator(`svg[data-testid=graph] g.box[data-tag="${f.element}"]`).getAttribute('class'),
      ).toContain('in-focus');
    });
  }

  it('highlights what the shared bridle carries with it (its nozzles) and names them in the proof', async () => {
    const bridle = sharedFindings.find((f) => f.rule === 'shared-bridle')!;
    await focus(bridle.scenario!);
    await page.click(`[data-finding="${bridle.key}"]`);
    // The message of the finding names them ("and through it ..."): the analysis' own words.
    const named = [...bridle.message.matchAll(/`([^`]+)`/g)].map((m) => m[1]!).filter((t) => /^N-/.test(t));
    expect(named.length).toBeGreaterThan(0);
    for (const tag of named) {
      await expect
        .poll(() => page.locator(`svg[data-testid=graph] g.box[data-tag="${tag}"]`).getAttribute('class'))
        .toContain('through');
      expect(await page.innerText('[data-testid=proof-through]')).toContain(tag);
    }
    await page.mouse.move(0, 0);
    await page.addStyleTag({ content: '[data-testid=layout-status] { visibility: hidden; }' });
    await docScreenshot(page, 'review-proof', 'docs/viewer-proof.png');
  });

  it('closes the proof with Escape', async () => {
    await page.keyboard.press('Escape');
    await page.waitForSelector('[data-testid=proof]', { state: 'detached' });
  });

  for (const scenario of truth.report.scenarios) {
    it(`${scenario.id}: the headline says what the SIF must reach, and whether the SIF as drawn counts`, async () => {
      await focus(scenario.id);
      const need = page.locator('[data-testid=sif-need]');
      if (!scenario.sif) {
        expect(await need.count()).toBe(0);
        return;
      }
      const words = await need.innerText();
      const sil = scenario.sif.sil;
      const silWords = sil === 0 ? 'no SIL' : sil > 4 ? 'more than SIL 4' : `SIL ${sil}`;
      const own = scenario.layers.find((l) => l.function === scenario.sif!.function);
      if (own && !own.credited) {
        expect(words).toContain(`an independent SIF needs ${silWords}`);
        expect(words).toContain(`${own.function} as drawn has no credit: ${own.verdict}`);
      } else {
        expect(words).toBe(`${scenario.sif.function ?? 'a SIF'} needs ${silWords}`);
      }
    });

    it(`${scenario.id}: each layer without credit names the element and rule that decide it`, async () => {
      await focus(scenario.id);
      const assessment = truth.analysis.assessments.find((a) => a.scenario === scenario.id)!;
      for (const layer of assessment.layers) {
        const why = page.locator(`[data-testid=lopa] tr[data-layer="${layer.function}"] [data-testid=verdict-why]`);
        const deciding = (layer.reasons ?? []).filter((r) => !r.accepted && r.effect !== 'note');
        if (deciding.length === 0) {
          expect(await why.count(), layer.function).toBe(0);
          continue;
        }
        const text = await why.innerText();
        for (const r of deciding) {
          expect(text, `${layer.function} names rule ${r.rule}`).toContain(`(${r.rule})`);
          if (r.element && r.effect === 'voids') expect(text).toContain(`shares ${r.element}`);
        }
      }
    });

    it(`${scenario.id}: findings are grouped under the layer they bear on`, async () => {
      await focus(scenario.id);
      const layers = (truth.model.scenarios.find((s) => s.id === scenario.id)!.layers ?? []).map((l) => l.function);
      const findings = truth.analysis.findings.filter((f) => f.scenario === scenario.id);
      for (const f of findings) {
        const first = layers.find((tag) => f.parties.some((p) => p.role === 'layer' && p.tag === tag));
        const group = first ?? 'scenario';
        expect(
          await page.locator(`[data-testid=findings] ul[data-group="${group}"] [data-finding="${f.key}"]`).count(),
          f.key,
        ).toBe(1);
      }
      expect(await page.locator('[data-testid=findings] [data-finding]').count()).toBe(findings.length);
    });
  }

  it('opens the proof from a LOPA row that has no credit', async () => {
    await focus('S-101');
    const assessment = truth.analysis.assessments.find((a) => a.scenario === 'S-101')!;
    const voided = assessment.layers.find((l) => l.verdict === 'voided')!;
    const key = (voided.reasons ?? []).find((r) => !r.accepted && r.effect !== 'note')!.key;
    await page.click(`[data-testid=lopa] [data-proof-of="${voided.function}"]`);
    await page.waitForSelector(`[data-testid=proof][data-finding="${key}"]`);
    await page.keyboard.press('Escape');
  });

  it("lists an element's findings on its card, and a click there opens the proof", async () => {
    await focus('S-101');
    await page.locator('svg[data-testid=graph] g.box[data-tag="BR-101"]').dispatchEvent('click');
    const card = page.locator('[data-testid=details][data-tag="BR-101"]');
    await card.waitFor();
    const expected = truth.analysis.findings
      .filter((f) => f.scenario === 'S-101' && (f.element === 'BR-101' || f.paths.some((p) => p.includes('BR-101'))))
      .map((f) => f.key)
      .sort();
    expect(expected.length).toBeGreaterThan(0);
    const listed = (
      await card
        .locator('[data-testid=element-findings] [data-finding-link]')
        .evaluateAll((els) => els.map((e) => e.getAttribute('data-finding-link')!))
    ).sort();
    expect(listed).toEqual(expected);
    await card.locator(`[data-finding-link="${expected[0]}"]`).click();
    await page.waitForSelector(`[data-testid=proof][data-finding="${expected[0]}"]`);
    expect(viewer.session.seen.errors).toEqual([]);
  });
});
