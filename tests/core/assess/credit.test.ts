// The best creditable set: exact, deterministic on ties, lists maximal alternatives best first, honours
// group limits, and stays quick at 25 layers. Cross-checked against brute force over every subset.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { bestCreditableSet, type CreditProblem } from '../../../packages/core/src/assess/index.ts';

/** Every feasible subset, scored the same way; the reference the search must agree with. */
function bruteForce(problem: CreditProblem): { best: string[]; weight: number } {
  const items = problem.candidates.filter((c) => c.pfd > 0 && c.pfd < 1);
  const conflict = (a: string, b: string) =>
    problem.conflicts.some(([x, y]) => (x === a && y === b) || (x === b && y === a));
  let best: { tags: string[]; weight: number } | undefined;
  for (let mask = 0; mask < 1 << items.length; mask++) {
    const set = items.filter((_, i) => mask & (1 << i));
    if (set.some((a, i) => set.some((b, j) => j > i && conflict(a.tag, b.tag)))) continue;
    const groups = new Map<string, number>();
    for (const c of set) if (c.group) groups.set(c.group, (groups.get(c.group) ?? 0) + 1);
    if ([...groups].some(([g, n]) => n > (problem.groupLimits?.[g] ?? Infinity))) continue;
    const weight = set.reduce((s, c) => s - Math.log10(c.pfd), 0);
    const tags = set.map((c) => c.tag).sort();
    const better =
      !best ||
      weight > best.weight + 1e-9 ||
      (Math.abs(weight - best.weight) <= 1e-9 &&
        (tags.length < best.tags.length || (tags.length === best.tags.length && tags.join() < best.tags.join())));
    if (better) best = { tags, weight };
  }
  return { best: best!.tags, weight: best!.weight };
}

describe('bestCreditableSet', () => {
  it('credits nothing when there are no candidates', () => {
    expect(bestCreditableSet({ candidates: [], conflicts: [] })).toEqual({ best: [], pfdProduct: 1, alternatives: [] });
  });

  it('credits every layer when none conflict, with no alternatives', () => {
    const r = bestCreditableSet({
      candidates: [
        { tag: 'B', pfd: 0.1 },
        { tag: 'A', pfd: 0.01 },
      ],
      conflicts: [],
    });
    expect(r.best).toEqual(['A', 'B']);
    expect(r.pfdProduct).toBeCloseTo(1e-3, 15);
    expect(r.alternatives).toEqual([]);
  });

  it('ignores layers that give no risk reduction (PFD 1)', () => {
    expect(bestCreditableSet({ candidates: [{ tag: 'A', pfd: 1 }], conflicts: [] }).best).toEqual([]);
  });

  it('chooses the stronger of two conflicting layers and lists the other as the alternative', () => {
    const r = bestCreditableSet({
      candidates: [
        { tag: 'ALARM', pfd: 0.1 },
        { tag: 'SIF', pfd: 0.005 },
      ],
      conflicts: [['ALARM', 'SIF']],
    });
    expect(r.best).toEqual(['SIF']);
    expect(r.alternatives).toEqual([{ layers: ['ALARM'], pfdProduct: 0.1 }]);
  });

  it('prefers two weaker independent layers over one stronger layer that conflicts with both', () => {
    const r = bestCreditableSet({
      candidates: [
        { tag: 'X', pfd: 0.02 },
        { tag: 'Y', pfd: 0.1 },
        { tag: 'Z', pfd: 0.1 },
      ],
      conflicts: [
        ['X', 'Y'],
        ['X', 'Z'],
      ],
    });
    expect(r.best).toEqual(['Y', 'Z']);
    expect(r.alternatives.map((a) => a.layers)).toEqual([['X']]);
  });

  it('breaks an exact tie by fewer layers: one layer at 0.01 beats two at 0.1 (0.1 x 0.1 is 0.01 to the tolerance)', () => {
    const r = bestCreditableSet({
      candidates: [
        { tag: 'A', pfd: 0.1 },
        { tag: 'B', pfd: 0.1 },
        { tag: 'C', pfd: 0.01 },
      ],
      conflicts: [
        ['A', 'C'],
        ['B', 'C'],
      ],
    });
    expect(r.best).toEqual(['C']);
    expect(r.alternatives.map((a) => a.layers)).toEqual([['A', 'B']]);
  });

  it('breaks a tie of equal size by the tags in lexicographic order, whatever the input order', () => {
    const problem: CreditProblem = {
      candidates: [
        { tag: 'M', pfd: 0.1 },
        { tag: 'K', pfd: 0.1 },
      ],
      conflicts: [['M', 'K']],
    };
    expect(bestCreditableSet(problem).best).toEqual(['K']);
    expect(bestCreditableSet({ ...problem, candidates: [...problem.candidates].reverse() }).best).toEqual(['K']);
  });

  it('credits at most the group limit from a group', () => {
    const r = bestCreditableSet({
      candidates: [
        { tag: 'B1', pfd: 0.1, group: 'bpcs' },
        { tag: 'B2', pfd: 0.1, group: 'bpcs' },
        { tag: 'B3', pfd: 0.1, group: 'bpcs' },
        { tag: 'PSV', pfd: 0.01 },
      ],
      conflicts: [],
      groupLimits: { bpcs: 2 },
    });
    expect(r.best).toEqual(['B1', 'B2', 'PSV']);
    expect(r.alternatives.map((a) => a.layers)).toEqual([
      ['B1', 'B3', 'PSV'],
      ['B2', 'B3', 'PSV'],
    ]);
  });

  it('lists only maximal sets as alternatives, capped at the number asked for', () => {
    const candidates = ['A', 'B', 'C', 'D', 'E', 'F'].map((tag) => ({ tag, pfd: 0.1 }));
    const conflicts = [
      ['A', 'B'],
      ['C', 'D'],
      ['E', 'F'],
    ] as [string, string][];
    const r = bestCreditableSet({ candidates, conflicts }, 3);
    expect(r.best).toEqual(['A', 'C', 'E']);
    expect(r.alternatives.map((a) => a.layers)).toEqual([
      ['A', 'C', 'F'],
      ['A', 'D', 'E'],
      ['A', 'D', 'F'],
    ]);
  });

  it('agrees with brute force on random problems', () => {
    const problem = fc.integer({ min: 0, max: 10 }).chain((n) =>
      fc.record({
        pfds: fc.array(fc.constantFrom(0.5, 0.1, 0.05, 0.02, 0.01, 0.005, 0.001, 1), { minLength: n, maxLength: n }),
        groups: fc.array(fc.boolean(), { minLength: n, maxLength: n }),
        edges: fc.array(fc.tuple(fc.nat(Math.max(n - 1, 0)), fc.nat(Math.max(n - 1, 0))), { maxLength: 20 }),
        limit: fc.integer({ min: 1, max: 3 }),
      }),
    );
    fc.assert(
      fc.property(problem, ({ pfds, groups, edges, limit }) => {
        const p: CreditProblem = {
          candidates: pfds.map((pfd, i) => ({
            tag: `L${String(i).padStart(2, '0')}`,
            pfd,
            ...(groups[i] ? { group: 'bpcs' } : {}),
          })),
          conflicts: edges
            .filter(([a, b]) => a !== b && a < pfds.length && b < pfds.length)
            .map(([a, b]) => [`L${String(a).padStart(2, '0')}`, `L${String(b).padStart(2, '0')}`] as const),
          groupLimits: { bpcs: limit },
        };
        const got = bestCreditableSet(p);
        const want = bruteForce(p);
        expect(got.best).toEqual(want.best);
        for (const alt of got.alternatives) expect(-Math.log10(alt.pfdProduct)).toBeLessThanOrEqual(want.weight + 1e-9);
      }),
      { numRuns: 300, seed: 4 },
    );
  });

  it('returns the exact best set for 25 layers with many conflicts', () => {
    // A deterministic pseudo-random conflict graph: about half of all pairs conflict.
    let seed = 12345;
    const next = () => (seed = (seed * 1103515245 + 12345) % 2147483648) / 2147483648;
    const pfds = [0.1, 0.01, 0.05, 0.001, 0.2];
    const candidates = Array.from({ length: 25 }, (_, i) => ({
      tag: `L${String(i).padStart(2, '0')}`,
      pfd: pfds[i % pfds.length]!,
      ...(i % 3 === 0 ? { group: 'bpcs' } : {}),
    }));
    const conflicts: [string, string][] = [];
    for (let i = 0; i < 25; i++)
      for (let j = i + 1; j < 25; j++) if (next() < 0.5) conflicts.push([candidates[i]!.tag, candidates[j]!.tag]);
    const r = bestCreditableSet({ candidates, conflicts, groupLimits: { bpcs: 2 } });
    const chosen = new Set(r.best);
    expect(conflicts.some(([a, b]) => chosen.has(a) && chosen.has(b))).toBe(false);
    expect(r.best.filter((t) => candidates.find((c) => c.tag === t)!.group === 'bpcs').length).toBeLessThanOrEqual(2);
    expect(r.alternatives.length).toBe(5);
    for (const alt of r.alternatives) expect(alt.pfdProduct).toBeGreaterThanOrEqual(r.pfdProduct * (1 - 1e-9));
  });

  it('returns for 25 layers with no conflicts and 25 layers all in one limited group', () => {
    const free = Array.from({ length: 25 }, (_, i) => ({ tag: `L${String(i).padStart(2, '0')}`, pfd: 0.1 }));
    expect(bestCreditableSet({ candidates: free, conflicts: [] }).best).toHaveLength(25);
    const grouped = free.map((c) => ({ ...c, group: 'bpcs' }));
    const r = bestCreditableSet({ candidates: grouped, conflicts: [], groupLimits: { bpcs: 2 } });
    expect(r.best).toEqual(['L00', 'L01']);
    expect(r.alternatives.map((a) => a.layers)[0]).toEqual(['L00', 'L02']);
  });

  it('returns for 25 layers in a dense conflict graph of equal PFDs (the worst case for ties)', () => {
    // Eight disjoint triangles and one pair: 3^8 x 2 maximum sets of equal weight; the tie rule picks one.
    const candidates = Array.from({ length: 26 }, (_, i) => ({ tag: `L${String(i).padStart(2, '0')}`, pfd: 0.1 }));
    const conflicts: [string, string][] = [];
    for (let t = 0; t < 8; t++) {
      const [a, b, c] = [3 * t, 3 * t + 1, 3 * t + 2].map((i) => candidates[i]!.tag) as [string, string, string];
      conflicts.push([a, b], [b, c], [a, c]);
    }
    conflicts.push(['L24', 'L25']);
    const r = bestCreditableSet({ candidates, conflicts });
    expect(r.best).toEqual(['L00', 'L03', 'L06', 'L09', 'L12', 'L15', 'L18', 'L21', 'L24']);
  });
});
