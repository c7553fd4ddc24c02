// `check` writes its text in pieces (a large site's text is tens of megabytes); the pieces must add up to
// exactly the text built whole: lines joined by newlines, the run of newlines at the very end made one.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { LineWriter } from '../../packages/cli/src/commands/check-render.ts';

const whole = (lines: string[]) => `${lines.join('\n').replace(/\n+$/, '')}\n`;

function pieces(batches: string[][], flushAt: number): { text: string; writes: number } {
  const out: string[] = [];
  const writer = new LineWriter((t) => out.push(t), flushAt);
  for (const batch of batches) writer.push(...batch);
  writer.end();
  return { text: out.join(''), writes: out.length };
}

describe('check text written in pieces', () => {
  it('ends blank lines that straddle a flush as one newline, as the whole text does', () => {
    const batches = [
      ['a', 'bb'],
      ['', ''],
      ['', ''],
    ];
    const { text, writes } = pieces(batches, 1);
    expect(writes).toBeGreaterThan(1);
    expect(text).toBe('a\nbb\n');
  });

  it('gives the same bytes as the text built whole, for any lines and any flush size', () => {
    fc.assert(
      fc.property(
        fc.array(fc.array(fc.constantFrom('', 'x', 'line', 'two\nlines', ' '), { maxLength: 5 }), { maxLength: 12 }),
        fc.integer({ min: 0, max: 20 }),
        (batches, flushAt) => {
          expect(pieces(batches, flushAt).text).toBe(whole(batches.flat()));
        },
      ),
      { numRuns: 300 },
    );
  });
});
