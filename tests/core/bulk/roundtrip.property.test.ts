// Properties of the two model forms over generated valid models: .bulk printing then parsing gives
// the same model, printing is idempotent, and the same holds for JSON.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { groupOf, loadModelText, printBulk, printJson, type Model } from '@bulkhead/core';
import { ALL_GROUPS, validModel } from './model-arbitrary.ts';

function parse(file: string, text: string): Model | undefined {
  const result = loadModelText(file, text);
  expect(result.diagnostics).toEqual([]);
  return result.model;
}

const RUNS = { numRuns: 300 };

describe('round trips over generated models', () => {
  it('the generator makes models the loader accepts, reaching every element group', () => {
    const seen = new Set<string>();
    fc.assert(
      fc.property(validModel, (model) => {
        expect(loadModelText('gen.json', printJson(model)).diagnostics).toEqual([]);
        for (const e of model.elements) seen.add(groupOf(e.kind));
      }),
      RUNS,
    );
    expect([...seen].sort()).toEqual([...ALL_GROUPS].sort());
  });

  it('parse(printBulk(m)) deep-equals m', () => {
    fc.assert(
      fc.property(validModel, (model) => {
        expect(parse('gen.bulk', printBulk(model))).toEqual(model);
      }),
      RUNS,
    );
  });

  it('printing the parsed text again gives the same text (fmt twice equals fmt once)', () => {
    fc.assert(
      fc.property(validModel, (model) => {
        const once = printBulk(model);
        expect(printBulk(parse('gen.bulk', once)!)).toBe(once);
      }),
      RUNS,
    );
  });

  it('JSON: parse(printJson(m)) deep-equals m and printing is idempotent', () => {
    fc.assert(
      fc.property(validModel, (model) => {
        const once = printJson(model);
        const back = parse('gen.json', once)!;
        expect(back).toEqual(model);
        expect(printJson(back)).toBe(once);
      }),
      RUNS,
    );
  });

  it('bulk -> JSON -> bulk keeps the text', () => {
    fc.assert(
      fc.property(validModel, (model) => {
        const bulk = printBulk(model);
        const viaJson = parse('gen.json', printJson(parse('gen.bulk', bulk)!))!;
        expect(printBulk(viaJson)).toBe(bulk);
      }),
      RUNS,
    );
  });
});
