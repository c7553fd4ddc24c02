// The rule set as a whole: every rule has a case table, the base test site is clean, and every kind of
// element two sides can share is claimed by some rule, so no shared element goes unreported.
import { readdirSync, readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { ELEMENT_GROUPS, RULES, type Element, type SharedElementRule } from '@bulkhead/core';
import { analyseCase } from './harness.ts';

describe('the independence rule set', () => {
  it("has a case table file for every rule, which runs that rule's table", () => {
    const folder = new URL('.', import.meta.url);
    const files = new Set(readdirSync(folder));
    for (const rule of RULES) {
      const file = `${rule.id}.test.ts`;
      expect(files, `tests/core/rules/${file}`).toContain(file);
      expect(readFileSync(new URL(file, folder), 'utf8'), file).toContain(`ruleTable('${rule.id}', {`);
    }
  });

  it("keeps each rule's check in one source file named by its id, so a rule is found from its id", () => {
    const checks = new URL('../../../packages/core/src/rules/checks/', import.meta.url);
    const ruleFiles = readdirSync(checks);
    expect(ruleFiles.sort()).toEqual(RULES.map((r) => `${r.id}.ts`).sort());
    for (const rule of RULES) {
      const text = readFileSync(new URL(`${rule.id}.ts`, checks), 'utf8');
      expect(text.match(/\bdefine\w*Rule\(/g), `${rule.id}.ts defines one rule`).toHaveLength(1);
      expect(text, `${rule.id}.ts takes its data from the catalogue`).toContain(
        `catalogue/independence/${rule.id}.ts'`,
      );
    }
  });

  it('has unique, kebab-case ids, each with a title, a rationale and a source', () => {
    const ids = RULES.map((r) => r.id);
    expect(new Set(ids).size).toBe(ids.length);
    for (const r of RULES) {
      expect(r.id).toMatch(/^[a-z]+(-[a-z0-9]+)*$/);
      expect(r.title.length).toBeGreaterThan(5);
      expect(r.rationale.length).toBeGreaterThan(20);
      expect(r.source.length).toBeGreaterThan(5);
    }
  });

  it('finds nothing at all in the base site, whose cause and layer share no element', () => {
    expect(analyseCase({ name: 'base' }).findings).toEqual([]);
  });

  it('claims every kind of element but process equipment with some shared-element rule', () => {
    const shared = RULES.filter((r): r is SharedElementRule => r.type === 'shared');
    for (const [group, kinds] of Object.entries(ELEMENT_GROUPS)) {
      if (group === 'equipment') continue;
      for (const kind of kinds) {
        const element = { kind, tag: 'X-1' } as Element;
        // Rules that need a pair to decide are specific cases; the fallback for the group must not.
        const claimed = shared.some(
          (r) =>
            r.groups.includes(group as never) &&
            (r.claims === undefined || (r.claims.length < 2 && r.claims(element, {} as never))),
        );
        expect(claimed, `${kind} (${group})`).toBe(true);
      }
    }
  });
});
