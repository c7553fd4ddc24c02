// Chain heights on a stage-column sheet: the least-squares non-decreasing fit (pool adjacent
// violators) against hand-worked cases and a brute-force search, and chains pulled level with the
// boxes they link to without ever overlapping or changing order.
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { alignChains, nonDecreasingFit } from '../../packages/layout/src/column-alignment.ts';

const squaredError = (fit: readonly number[], targets: readonly number[]) =>
  fit.reduce((s, v, i) => s + (v - targets[i]!) ** 2, 0);

describe('nonDecreasingFit', () => {
  // Worked by hand: a run that goes down is replaced by its mean, pooling again while it still goes down.
  const cases: { targets: number[]; fit: number[] }[] = [
    { targets: [], fit: [] },
    { targets: [5], fit: [5] },
    { targets: [1, 2, 3], fit: [1, 2, 3] },
    { targets: [3, 1], fit: [2, 2] },
    { targets: [1, 3, 2, 4], fit: [1, 2.5, 2.5, 4] },
    { targets: [4, 3, 2, 1], fit: [2.5, 2.5, 2.5, 2.5] },
    { targets: [1, 5, 0, 6], fit: [1, 2.5, 2.5, 6] },
    { targets: [2, 8, 3, 1, 9], fit: [2, 4, 4, 4, 9] },
  ];
  for (const c of cases)
    it(`fits [${c.targets.join(', ')}] with [${c.fit.join(', ')}]`, () => {
      expect(nonDecreasingFit(c.targets)).toEqual(c.fit);
    });

  it('is never beaten by any non-decreasing sequence of whole numbers (brute force, up to 4 values in 0..6)', () => {
    const all = (n: number): number[][] =>
      n === 0 ? [[]] : all(n - 1).flatMap((rest) => [0, 1, 2, 3, 4, 5, 6].map((v) => [...rest, v]));
    fc.assert(
      fc.property(fc.array(fc.integer({ min: 0, max: 6 }), { minLength: 1, maxLength: 4 }), (targets) => {
        const fit = nonDecreasingFit(targets);
        for (let i = 1; i < fit.length; i++) expect(fit[i]!).toBeGreaterThanOrEqual(fit[i - 1]!);
        const best = Math.min(
          ...all(targets.length)
            .filter((s) => s.every((v, i) => i === 0 || v >= s[i - 1]!))
            .map((s) => squaredError(s, targets)),
        );
        expect(squaredError(fit, targets)).toBeLessThanOrEqual(best + 1e-9);
      }),
      { numRuns: 200 },
    );
  });
});

describe('alignChains', () => {
  const gaps = { chain: 30, block: 24, top: 50 };
  const chain = (id: string, height = 60) => ({ ids: [id], heights: [height] });

  it('brings a lone box level with the box it links to in the next column', () => {
    const tops = alignChains(
      [[chain('a'), chain('b'), chain('c')], [chain('x')]],
      new Map([
        ['x', ['c']],
        ['c', ['x']],
      ]),
      gaps,
    );
    // a, b, c stack from 50 (c at 50 + 2 * 84 = 218); x's centre ends level with c's.
    expect(tops).toEqual([[50, 134, 218], [218]]);
  });

  it('keeps the order and the gap when two boxes both want the same height', () => {
    const tops = alignChains(
      [[chain('a')], [chain('x'), chain('y')]],
      new Map([
        ['a', ['x', 'y']],
        ['x', ['a']],
        ['y', ['a']],
      ]),
      gaps,
    );
    const [x, y] = tops[1]!;
    expect(y! - x!).toBeGreaterThanOrEqual(60 + gaps.block);
    expect(Math.min(...tops.flat())).toBe(gaps.top);
  });
});
