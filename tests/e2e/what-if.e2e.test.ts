// What-if in the page: accepting the open findings of a scenario gives the LOPA that the CLI's JSON
// report calls "if open findings accepted"; giving a layer its own twin of a shared element gives the
// findings and figures of the CLI run on the model with the viewer's "lines to paste" pasted in. The
// page marks every what-if as such, and the file on disk is never written.
import { readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { seriousViolations } from './axe.ts';
import {
  DEMO,
  type DemoTruth,
  docScreenshot,
  focusScenario,
  sameFigure,
  tempDir,
  truthFor,
  viewerForTests,
} from './harness.ts';

const truth: DemoTruth = truthFor(DEMO);
const before = readFileSync(DEMO);

describe('what-if in the viewer', () => {
  const viewer = viewerForTests(DEMO);
  let page: Page;
  beforeAll(() => {
    page = viewer.page;
  });

  const figure = (name: string) => page.locator(`[data-testid=lopa] [data-figure=${name}]`).first().innerText();

  it('accepting every open finding of S-103 gives the figure the CLI reports as "if open findings accepted"', async () => {
    await focusScenario(page, 'S-103');
    const open = truth.analysis.findings.filter(
      (f) => f.scenario === 'S-103' && f.severity === 'needs-justification' && !f.accepted,
    );
    expect(open.length).toBeGreaterThan(0);
    for (const f of open) {
      await page.click(`[data-finding="${f.key}"]`);
      await page.click('[data-testid=what-if-accept]');
      await page.waitForSelector(`[data-testid=what-if] li[data-change=accept]:has-text("${f.key}")`);
    }
    const report = truth.report.scenarios.find((s) => s.id === 'S-103')!;
    const ifAccepted = report.lopa.find((l) => l.figure === 'if-accepted')!;
    await expect.poll(async () => sameFigure(await figure('mitigatedAfter'), ifAccepted.mitigated)).toBe(true);
    expect(await page.getAttribute('[data-testid=lopa]', 'data-what-if')).toBe('yes');
    expect(await page.isVisible('[data-testid=figures-what-if]')).toBe(true);
    const paste = await page.inputValue('[data-testid=what-if-add]');
    for (const f of open) expect(paste).toContain(`accept ${f.key} by="WHAT-IF"`);
    expect(await seriousViolations(page)).toEqual([]);
  });

  it('goes back to the file, with its own figures', async () => {
    await page.click('[data-testid=what-if-reset]');
    await page.waitForSelector('[data-testid=what-if]', { state: 'detached' });
    const after = truth.report.scenarios
      .find((s) => s.id === 'S-103')!
      .lopa.find((l) => l.figure === 'after-independence')!;
    await expect.poll(async () => sameFigure(await figure('mitigatedAfter'), after.mitigated)).toBe(true);
    expect(await page.getAttribute('[data-testid=lopa]', 'data-what-if')).toBe('no');
  });

  it("a twin of the shared bridle gives what the CLI finds once the viewer's lines are pasted into the model", async () => {
    await focusScenario(page, 'S-101');
    const bridle = truth.analysis.findings.find((f) => f.scenario === 'S-101' && f.rule === 'shared-bridle')!;
    await page.click(`[data-finding="${bridle.key}"]`);
    await page.click('[data-testid=what-if-twin]');
    await page.waitForSelector('[data-testid=what-if] li[data-change=twin]');
    const add = (await page.inputValue('[data-testid=what-if-add]')).split('\n');
    const remove = (await page.innerText('[data-testid=what-if-remove]'))
      .replace(/^Lines to delete: /, '')
      .split(' · ');
    // Paste: drop the lines to delete, add the lines to add, and let the CLI judge the result.
    const original = readFileSync(DEMO, 'utf8').split('\n');
    for (const line of remove) expect(original, line).toContain(line);
    const pasted = [...original.filter((l) => !remove.includes(l)), ...add].join('\n');
    const file = join(tempDir('bulkhead-what-if-'), 'marrow-fen.bulk');
    writeFileSync(file, pasted);
    const expected = truthFor(file);
    const keys = expected.analysis.findings
      .filter((f) => f.scenario === 'S-101')
      .map((f) => f.key)
      .sort();
    expect(keys).not.toContain(bridle.key);
    await expect
      .poll(async () =>
        (
          await page
            .locator('[data-testid=findings] [data-finding]')
            .evaluateAll((els) => els.map((e) => e.getAttribute('data-finding')!))
        ).sort(),
      )
      .toEqual(keys);
    const after = expected.report.scenarios
      .find((s) => s.id === 'S-101')!
      .lopa.find((l) => l.figure === 'after-independence')!;
    expect(sameFigure(await figure('mitigatedAfter'), after.mitigated)).toBe(true);
    await page.mouse.move(0, 0);
    await page.addStyleTag({ content: '[data-testid=layout-status] { visibility: hidden; }' });
    await docScreenshot(page, 'what-if', 'docs/viewer-what-if.png');
  });

  it('never writes the file', () => {
    expect(readFileSync(DEMO).equals(before)).toBe(true);
    expect(viewer.session.seen.errors).toEqual([]);
  });
});
