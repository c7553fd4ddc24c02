// The rule catalogue (packages/core/src/catalogue/) is the one list of rules of every kind: each rule is one
// file named by its id, the ids are unique, and every rule the analysis runs, lists or the loader accepts is
// in it, with the kind of the stage that runs it.
import { readdirSync, readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import {
  ALL_RULE_IDS,
  ASSESS_RULES,
  CATALOGUE,
  JUSTIFICATION_RULES,
  RULES,
  analyze,
  loadModelText,
  renderMessage,
  say,
} from '@bulkhead/core';

const FOLDER = new URL('../../../packages/core/src/catalogue/', import.meta.url);

describe('the rule catalogue', () => {
  it('has unique, kebab-case ids', () => {
    const ids = CATALOGUE.map((e) => e.id);
    expect(new Set(ids).size).toBe(ids.length);
    for (const id of ids) expect(id).toMatch(/^[a-z]+(-[a-z0-9]+)*$/);
    expect(ids.length).toBe(40);
  });

  it('keeps each rule in one file named by its id, under the folder of its kind', () => {
    for (const kind of ['independence', 'assessment', 'justification'] as const) {
      const files = readdirSync(new URL(`${kind}/`, FOLDER)).sort();
      expect(files, kind).toEqual(
        CATALOGUE.filter((e) => e.kind === kind)
          .map((e) => `${e.id}.ts`)
          .sort(),
      );
      for (const file of files) {
        const text = readFileSync(new URL(`${kind}/${file}`, FOLDER), 'utf8');
        expect(text.match(/\bruleEntry\(/g), `${file} declares one rule`).toHaveLength(1);
        expect(text).toContain(`id: '${file.slice(0, -3)}'`);
      }
    }
  });

  it('gives every rule a title, a rationale, a source and at least one message', () => {
    for (const e of CATALOGUE) {
      expect(e.title.length, e.id).toBeGreaterThan(5);
      expect(e.rationale.length, e.id).toBeGreaterThan(20);
      expect(e.source.length, e.id).toBeGreaterThan(5);
      expect(Object.keys(e.messages).length, e.id).toBeGreaterThan(0);
    }
  });

  it('is the rule list of every stage, in its order, with the kind of that stage', () => {
    const ofKind = (kind: string) => CATALOGUE.filter((e) => e.kind === kind).map((e) => e.id);
    expect(RULES.map((r) => r.id)).toEqual(ofKind('independence'));
    expect(ASSESS_RULES.map((r) => r.id)).toEqual(ofKind('assessment'));
    expect(JUSTIFICATION_RULES.map((r) => r.id)).toEqual(ofKind('justification'));
  });

  it('is what the loader accepts in `rule` statements, and a rule outside it is refused', () => {
    expect([...ALL_RULE_IDS].sort()).toEqual(CATALOGUE.map((e) => e.id).sort());
    const text = (id: string) => `site "Catalogue test (invented)"\nrule ${id} severity=note reason="test"\n`;
    for (const id of ALL_RULE_IDS) expect(loadModelText('m.bulk', text(id)).diagnostics, id).toEqual([]);
    expect(loadModelText('m.bulk', text('shared-nozzle')).diagnostics.map((d) => d.severity)).toContain('error');
  });

  it('lists every rule of the catalogue in the rule set in force of an analysis, once', () => {
    const loaded = loadModelText('m.bulk', 'site "Catalogue test (invented)"\n');
    expect(analyze(loaded.model!).rules.map((r) => r.id)).toEqual(CATALOGUE.map((e) => e.id));
  });

  it('renders a message from its id and data alone', () => {
    // The words of rule incomplete-trace, as the rule table tests/core/rules/incomplete-trace.test.ts sees them.
    expect(
      renderMessage(say('incomplete-trace/untraced', { function: 'SF-1', missing: ['solver', 'final-element'] })),
    ).toBe(
      '`SF-1` cannot be traced: the model gives no controller or logic solver, no final element; its independence is unverified',
    );
  });

  it('refuses, at compile time, a message id that does not exist or data of the wrong shape', () => {
    // @ts-expect-error: no such message
    expect(() => renderMessage(say('incomplete-trace/missing', { function: 'SF-1', missing: [] }))).toThrow(
      /not in the rule catalogue/,
    );
    // @ts-expect-error: `missing` must list parts
    expect(() => renderMessage(say('incomplete-trace/untraced', { function: 'SF-1' }))).toThrow(TypeError);
  });
});
