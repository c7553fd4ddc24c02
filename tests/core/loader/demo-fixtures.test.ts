// Keeps every demo model's JSON twin equal to what `convert --to json` prints, and checks that every
// model fixture is in canonical form and converts both ways without loss (the "done when").
import { existsSync, readdirSync, readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { loadModelText, printBulk, printJson, type Model } from '@bulkhead/core';

const DEMO = new URL('../../../fixtures/demo/', import.meta.url);
const bulkFiles = readdirSync(DEMO)
  .filter((f) => f.endsWith('.bulk'))
  .sort();
const jsonFiles = readdirSync(DEMO)
  .filter((f) => f.endsWith('.json'))
  .sort();

function load(file: string): { model: Model; text: string } {
  const text = readFileSync(new URL(file, DEMO), 'utf8');
  const result = loadModelText(file, text);
  expect(result.diagnostics).toEqual([]);
  return { model: result.model!, text };
}

describe('demo fixtures', () => {
  it('include the revision A demo and its second revision', () => {
    expect(bulkFiles).toContain('marrow-fen.bulk');
    expect(bulkFiles).toContain('marrow-fen-rev-b.bulk');
  });

  it('have a JSON twin for every .bulk file and no JSON without a .bulk source', () => {
    expect(jsonFiles).toEqual(bulkFiles.map((f) => f.replace(/\.bulk$/, '.json')));
  });

  describe.each(bulkFiles)('%s', (file) => {
    const twin = file.replace(/\.bulk$/, '.json');

    it('is in canonical form (fmt changes nothing)', () => {
      const { model, text } = load(file);
      expect(printBulk(model)).toBe(text);
    });

    it('has a JSON twin equal to convert --to json (regenerate with `bulkhead convert FILE --to json -o TWIN`)', () => {
      const { model } = load(file);
      expect(existsSync(new URL(twin, DEMO))).toBe(true);
      expect(readFileSync(new URL(twin, DEMO), 'utf8')).toBe(printJson(model));
    });

    it('round-trips bulk -> json -> bulk to the same model and the same text', () => {
      const { model, text } = load(file);
      const viaJson = loadModelText('x.json', printJson(model));
      expect(viaJson.diagnostics).toEqual([]);
      expect(viaJson.model).toEqual(model);
      expect(printBulk(viaJson.model!)).toBe(text);
    });
  });

  describe.each(jsonFiles)('%s', (file) => {
    it('is in canonical form and round-trips json -> bulk -> json to the same text', () => {
      const { model, text } = load(file);
      expect(printJson(model)).toBe(text);
      const viaBulk = loadModelText('x.bulk', printBulk(model));
      expect(viaBulk.diagnostics).toEqual([]);
      expect(printJson(viaBulk.model!)).toBe(text);
    });
  });

  it('the .bulk demo and its JSON twin load as the same model', () => {
    expect(load('marrow-fen.json').model).toEqual(load('marrow-fen.bulk').model);
  });

  it('the demo keeps its comments through JSON (they are part of the model)', () => {
    const { model } = load('marrow-fen.json');
    expect(model.site.comments?.[0]).toContain('Marrow Fen');
    // A comment inside a scenario, on its cause line, survives the trip through JSON.
    const s101 = model.scenarios.find((s) => s.id === 'S-101');
    expect(s101?.cause.comments?.join('\n')).toContain('typical=');
  });
});
