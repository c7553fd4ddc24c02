// Spans worked out on demand from each statement's token positions (bulk/spans.ts): every value of the
// demo model must point at its own text in the file, and a path that names nothing must give nothing.
// The check is against the file itself: the text under each span is the value the model holds.
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { loadModelText, spanAt, type Span } from '@bulkhead/core';

const FILE = new URL('../../../fixtures/demo/marrow-fen.bulk', import.meta.url);
const text = readFileSync(FILE, 'utf8');
const lines = text.split('\n');
const loaded = loadModelText('marrow-fen.bulk', text);
const model = loaded.model!;

/** The source text under a span, with the quotes of a quoted value taken off. */
function textAt(span: Span | undefined): string | undefined {
  if (!span) return undefined;
  const raw = lines[span.line - 1]!.slice(span.column - 1, span.column - 1 + span.length);
  return raw.startsWith('"') && raw.endsWith('"') ? raw.slice(1, -1) : raw;
}

/** Every path to a plain value (string or number) in the model, with the value. */
function leaves(value: unknown, path: string[], out: [string, string | number][]): [string, string | number][] {
  if (typeof value === 'string' || typeof value === 'number') out.push([path.join('.'), value]);
  else if (Array.isArray(value)) value.forEach((v, i) => leaves(v, [...path, String(i)], out));
  else if (value && typeof value === 'object') for (const [k, v] of Object.entries(value)) leaves(v, [...path, k], out);
  return out;
}

describe('spans on demand', () => {
  it('loads the demo cleanly', () => {
    expect(loaded.diagnostics).toEqual([]);
  });

  // `kind` is the keyword of an element or function statement, comments are not values: neither has a span.
  const written = leaves(
    { elements: model.elements, functions: model.functions, scenarios: model.scenarios, categories: model.categories },
    [],
    [],
  ).filter(([path]) => !/\.kind$|comments|trailingComment/.test(path) || /modifiers\.\d+\.kind$/.test(path));

  it('point every written value of the demo at its own text', () => {
    expect(written.length).toBeGreaterThan(400);
    const wrong = written.filter(([path, value]) => {
      const shown = textAt(loaded.spans.get(path));
      return shown === undefined || (typeof value === 'number' ? Number(shown) !== value : shown !== value);
    });
    expect(wrong).toEqual([]);
  });

  it('point a whole list at its first to its last item, and a statement at its tag', () => {
    const i = model.functions.findIndex((f) => 'sensors' in f && (f.sensors?.length ?? 0) > 1);
    const sensors = (model.functions[i] as { sensors: string[] }).sensors;
    expect(textAt(loaded.spans.get(`functions.${i}.sensors`))).toBe(sensors.join(','));
    expect(textAt(loaded.spans.get(`functions.${i}`))).toBe(model.functions[i]!.tag);
  });

  it("point a scenario's cause line at its keyword", () => {
    expect(textAt(loaded.spans.get('scenarios.0.cause'))).toBe('cause');
    expect(textAt(loaded.spans.get('scenarios.0.cause.function'))).toBe(model.scenarios[0]!.cause.function);
  });

  it('give nothing for a path that names nothing', () => {
    for (const path of [
      'elements',
      'elements.01',
      'elements.1e0',
      `elements.${model.elements.length}`,
      'elements.0.nope',
      'elements.0.tag.0',
      'elements.0.kind',
      'site.name#key',
      'scenarios.0.layers',
      'scenarios.0.layers.9.function',
      'nothing.0',
    ]) {
      expect(loaded.spans.get(path), path).toBeUndefined();
    }
  });

  it('answer spanAt with the longest prefix that has a span', () => {
    expect(spanAt(loaded.spans, ['elements', 0, 'nope', 3])).toEqual(loaded.spans.get('elements.0'));
    expect(spanAt(loaded.spans, [])).toEqual(loaded.spans.get(''));
    expect(textAt(spanAt(loaded.spans, ['nothing']))).toBe('site');
  });
});
