// The truth the compare tests check the viewer against: the CLI's own JSON diff of two model files
// (`bulkhead diff OLD NEW --format json`), and the marks the viewer should show from it.
import { spawnSync } from 'node:child_process';
import { join } from 'node:path';
import type { Page } from 'playwright-core';
import { expect } from 'vitest';
import { ROOT } from './harness.ts';

const BIN = join(ROOT, 'packages/cli/bin/bulkhead.js');

export interface CliFindingRef {
  key: string;
  scenario?: string;
  element?: string;
}
export interface CliDiff {
  verdicts: { scenario: string; change: string }[];
  appeared: CliFindingRef[];
  disappeared: CliFindingRef[];
  severityChanged: { new: CliFindingRef }[];
  acceptanceChanged: { new: CliFindingRef }[];
}

export function cliDiff(older: string, newer: string): CliDiff {
  const run = spawnSync(process.execPath, [BIN, 'diff', older, newer, '--format', 'json'], {
    cwd: ROOT,
    encoding: 'utf8',
  });
  if (run.status !== 0) throw new Error(`bulkhead diff failed (${run.status}): ${run.stderr}`);
  return JSON.parse(run.stdout) as CliDiff;
}

/** Each scenario still in the new revision, with its verdict change, as the matrix's change column should mark it. */
export function expectedChangeCells(truth: CliDiff): Record<string, string> {
  return Object.fromEntries(truth.verdicts.filter((v) => v.change !== 'removed').map((v) => [v.scenario, v.change]));
}

/** The keys of the findings whose severity or acceptance changed. */
function changedKeys(truth: CliDiff): string[] {
  return [...truth.severityChanged, ...truth.acceptanceChanged].map((c) => c.new.key).sort();
}

/**
 * The elements of one scenario the graph should mark, each with the changes its mark may show: new or
 * gone as the diff says; a changed finding's direction (worse or better) is the viewer's own call.
 */
function expectedGraphMarks(truth: CliDiff, scenario: string): Map<string, string[]> {
  const byElement = new Map<string, string[]>();
  for (const [change, refs] of [
    ['new', truth.appeared],
    ['gone', truth.disappeared],
  ] as const)
    for (const f of refs) if (f.scenario === scenario && f.element) byElement.set(f.element, [change]);
  for (const c of [...truth.severityChanged, ...truth.acceptanceChanged])
    if (c.new.scenario === scenario && c.new.element) byElement.set(c.new.element, ['worse', 'better']);
  return byElement;
}

/**
 * The graph in view marks every drawn element of `scenario` whose findings the diff says changed, and
 * no other, each with a change the diff allows.
 */
export async function expectGraphMarksAsDiff(page: Page, truth: CliDiff, scenario: string): Promise<void> {
  const expected = expectedGraphMarks(truth, scenario);
  const marked = await page
    .locator('svg[data-testid=graph] g.box[data-change]')
    .evaluateAll((gs) => gs.map((g) => [g.getAttribute('data-tag')!, g.getAttribute('data-change')!] as const));
  expect(marked.length).toBeGreaterThan(0);
  for (const [tag, change] of marked) expect(expected.get(tag), tag).toContain(change);
  const drawn = new Set(
    await page.locator('svg[data-testid=graph] g.box').evaluateAll((gs) => gs.map((g) => g.getAttribute('data-tag'))),
  );
  for (const tag of expected.keys())
    if (drawn.has(tag))
      expect(
        marked.map(([t]) => t),
        tag,
      ).toContain(tag);
}

/** The matrix's change column: each scenario row's mark, by scenario. */
export function matrixChangeCells(page: Page): Promise<Record<string, string | null | undefined>> {
  return page
    .locator('[data-testid=matrix] tr[data-scenario]')
    .evaluateAll((rows) =>
      Object.fromEntries(
        rows.map((r) => [
          r.getAttribute('data-scenario')!,
          r.querySelector('[data-cell=change]')?.getAttribute('data-change'),
        ]),
      ),
    );
}

/** The compare panel lists each finding the diff says appeared, disappeared or changed, and no other. */
export async function expectChangedFindingsAsDiff(page: Page, truth: CliDiff): Promise<void> {
  const shown = await page
    .locator('[data-testid=compare-findings] tbody tr')
    .evaluateAll((rows) =>
      rows.map((r) => `${r.getAttribute('data-change')} ${r.getAttribute('data-finding')}`).sort(),
    );
  expect(shown.filter((s) => s.startsWith('new ') || s.startsWith('gone '))).toEqual(
    [...truth.appeared.map((f) => `new ${f.key}`), ...truth.disappeared.map((f) => `gone ${f.key}`)].sort(),
  );
  expect(
    shown
      .filter((s) => s.startsWith('worse ') || s.startsWith('better '))
      .map((s) => s.split(' ')[1])
      .sort(),
  ).toEqual(changedKeys(truth));
}
