// The model lookups that replace scans per scenario and per finding must answer exactly what
// Array.prototype.find answers over the same list (the reference), including after the list grows.
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { loadModelText, type Model } from '@bulkhead/core';
import { elementByTag, functionByTag, justificationOf, scenarioById } from '../../../packages/core/src/model/lookup.ts';

function demo(file: string): Model {
  const loaded = loadModelText(file, readFileSync(new URL(`../../../fixtures/demo/${file}`, import.meta.url)));
  if (!loaded.model) throw new Error(`${file} does not load`);
  return loaded.model;
}

describe('model lookups', () => {
  it.each(['marrow-fen.bulk', 'marrow-fen-rev-b.bulk'])(
    'answer as find does for every tag, id and key of %s',
    (file) => {
      const model = demo(file);
      for (const e of model.elements)
        expect(elementByTag(model, e.tag)).toBe(model.elements.find((x) => x.tag === e.tag));
      for (const f of model.functions)
        expect(functionByTag(model, f.tag)).toBe(model.functions.find((x) => x.tag === f.tag));
      for (const s of model.scenarios)
        expect(scenarioById(model, s.id)).toBe(model.scenarios.find((x) => x.id === s.id));
      for (const j of model.justifications ?? [])
        expect(justificationOf(model, j.finding)).toBe(model.justifications!.find((x) => x.finding === j.finding));
      expect(elementByTag(model, 'NO-SUCH-TAG')).toBeUndefined();
      expect(justificationOf({ ...model, justifications: undefined }, 'any:key')).toBeUndefined();
    },
  );

  it('keep the first of two entries with one key, and see an entry appended after the first lookup', () => {
    const model = demo('marrow-fen-rev-b.bulk'); // the revision with an accept statement
    const first = model.justifications![0]!;
    expect(justificationOf(model, first.finding)).toBe(first);
    const later = { ...first, by: 'A second reviewer' };
    const added = { ...first, finding: 'shared-sensor:S-999:A:B' };
    model.justifications!.push(later, added);
    expect(justificationOf(model, first.finding)).toBe(first);
    expect(justificationOf(model, added.finding)).toBe(added);
  });
});
