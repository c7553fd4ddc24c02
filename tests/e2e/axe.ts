// axe-core (Deque's accessibility rules for WCAG 2.x) run inside a page under test.
import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import type { Page } from 'playwright-core';

const AXE_SOURCE = readFileSync(createRequire(import.meta.url).resolve('axe-core/axe.min.js'), 'utf8');

interface AxeViolation {
  id: string;
  impact: string | null;
  nodes: { target: string[] }[];
}

/** axe-core's serious and critical violations on the page as it is, as "rule: targets" lines. */
export async function seriousViolations(page: Page): Promise<string[]> {
  // Evaluated through the debugging protocol, which the page's script-src 'self' policy does not cover.
  await page.evaluate(AXE_SOURCE);
  const violations = await page.evaluate(async () => {
    const axe = (window as unknown as { axe: { run: (context: Document) => Promise<{ violations: AxeViolation[] }> } })
      .axe;
    return (await axe.run(document)).violations;
  });
  return violations
    .filter((v) => v.impact === 'serious' || v.impact === 'critical')
    .map((v) => `${v.id}: ${v.nodes.map((n) => n.target.join(' ')).join(', ')}`);
}
