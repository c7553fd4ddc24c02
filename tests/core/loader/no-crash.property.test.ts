// Whatever a user types, the loader answers with diagnostics, never an exception: valid models are
// mangled at random (cut, spliced, lines swapped or repeated) and every diagnostic must carry a
// catalogue code and, where it has a position, one that lies inside the file.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { CODES, loadModelText, printBulk, printJson, renderDiagnostics } from '@bulkhead/core';
import { validModel } from '../bulk/model-arbitrary.ts';

const junk = fc.string({
  unit: fc.constantFrom(
    '"',
    '\\',
    '#',
    ',',
    '=',
    ' ',
    '\t',
    '\n',
    '\r',
    '{',
    '}',
    '[',
    ']',
    ':',
    'a',
    '1',
    'e',
    '-',
    '.',
    '\u0000',
    'é',
    '\ufeff',
  ),
  maxLength: 6,
});
type Edit = typeof edit extends fc.Arbitrary<infer T> ? T : never;
const edit = fc.oneof(
  fc.record({ op: fc.constant('cut' as const), at: fc.nat(), length: fc.nat({ max: 12 }) }),
  fc.record({ op: fc.constant('insert' as const), at: fc.nat(), text: junk }),
  fc.record({ op: fc.constant('swap' as const), a: fc.nat(), b: fc.nat() }),
  fc.record({ op: fc.constant('repeat' as const), a: fc.nat() }),
);

function mangle(text: string, edits: Edit[]): string {
  let out = text;
  for (const e of edits) {
    if (e.op === 'cut') {
      const at = e.at % (out.length + 1);
      out = out.slice(0, at) + out.slice(at + e.length);
    } else if (e.op === 'insert') {
      const at = e.at % (out.length + 1);
      out = out.slice(0, at) + e.text + out.slice(at);
    } else {
      const lines = out.split('\n');
      const a = e.a % lines.length;
      if (e.op === 'repeat') lines.splice(a, 0, lines[a]!);
      else {
        const b = e.b % lines.length;
        [lines[a], lines[b]] = [lines[b]!, lines[a]!];
      }
      out = lines.join('\n');
    }
  }
  return out;
}

function checkAnswer(file: string, text: string): void {
  const result = loadModelText(file, text);
  for (const d of result.diagnostics) {
    expect(Object.keys(CODES)).toContain(d.code);
    expect(d.message.length).toBeGreaterThan(0);
    for (const span of [d.span, ...(d.related ?? []).map((r) => r.span)]) {
      if (!span) continue;
      const line = result.source.lines[span.line - 1];
      expect(line, `${d.code} at ${span.line}:${span.column}`).toBeDefined();
      expect(span.column).toBeGreaterThanOrEqual(1);
      expect(span.column).toBeLessThanOrEqual(line!.length + 1);
    }
  }
  if (result.model === undefined) expect(result.diagnostics.some((d) => d.severity === 'error')).toBe(true);
  expect(typeof renderDiagnostics(result.diagnostics, result.source)).toBe('string');
}

describe('the loader never throws on mangled input', () => {
  it('.bulk', () => {
    fc.assert(
      fc.property(validModel, fc.array(edit, { minLength: 1, maxLength: 4 }), (model, edits) => {
        checkAnswer('mangled.bulk', mangle(printBulk(model), edits));
      }),
      { numRuns: 300 },
    );
  });

  it('JSON', () => {
    fc.assert(
      fc.property(validModel, fc.array(edit, { minLength: 1, maxLength: 4 }), (model, edits) => {
        checkAnswer('mangled.json', mangle(printJson(model), edits));
      }),
      { numRuns: 300 },
    );
  });
});
