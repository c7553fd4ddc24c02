// MOCUS against published minimal cut sets and against brute force: every subset of the basic events up
// to the order, kept when the top event occurs and no smaller kept set is inside it.
import { describe, expect, it } from 'vitest';
import {
  andGate,
  atLeastGate,
  basicEvents,
  event,
  minimalCutSets,
  minimalSets,
  occurs,
  orGate,
  type FaultTree,
} from '../../../packages/core/src/cutsets/index.ts';
import { Random } from '../../helpers/random.ts';

const e = event;

/** All minimal cut sets up to `maxOrder` by trying every subset of the events, smallest first. */
function bruteForce(tree: FaultTree, maxOrder: number): string[][] {
  const events = basicEvents(tree);
  const found: string[][] = [];
  const limit = Math.min(maxOrder, events.length);
  for (let mask = 1; mask < 1 << events.length; mask++) {
    const chosen = events.filter((_, i) => mask & (1 << i));
    if (chosen.length > limit) continue;
    if (occurs(tree, new Set(chosen))) found.push(chosen);
  }
  return minimalSets(found);
}

describe('MOCUS on textbook fault trees', () => {
  it('reduces the handbook Boolean example to C + A.B', () => {
    // W. E. Vesely et al., Fault Tree Handbook, NUREG-0492 (1981), ch. VI (Boolean reduction worked example):
    // T = E1.E2, E1 = A + E3, E3 = B + C, E2 = C + E4, E4 = A.B; minimal cut sets {C}, {A, B} (from memory).
    const tree = andGate([orGate([e('A'), orGate([e('B'), e('C')])]), orGate([e('C'), andGate([e('A'), e('B')])])]);
    expect(minimalCutSets(tree)).toEqual([['C'], ['A', 'B']]);
  });

  it('finds the pressure-tank rupture cut sets T, K2, S.K1, S.R, S.S1', () => {
    // Fault Tree Handbook, NUREG-0492 (1981), ch. VIII, pressure tank example: tank rupture T, relay K2
    // contacts fail closed, or pressure switch S fails closed with S1, K1 or timer relay R failing too.
    // Published minimal cut sets {T}, {K2}, {S, K1}, {S, R}, {S, S1} (from memory, tree as recalled).
    const tree = orGate([e('T'), orGate([e('K2'), andGate([e('S'), orGate([e('S1'), orGate([e('K1'), e('R')])])])])]);
    expect(minimalCutSets(tree)).toEqual([['K2'], ['T'], ['K1', 'S'], ['R', 'S'], ['S', 'S1']]);
  });

  it('fails a 2oo3 group on any two channels and a 1oo2 group only on both', () => {
    // IEC 61508-6:2010 Annex B, MooN architectures (from memory): a MooN group acts while M of its N
    // channels work, so N-M+1 dangerous channel failures defeat it.
    expect(minimalCutSets(atLeastGate(2, [e('A'), e('B'), e('C')]))).toEqual([
      ['A', 'B'],
      ['A', 'C'],
      ['B', 'C'],
    ]);
    expect(minimalCutSets(atLeastGate(2, [e('A'), e('B')]))).toEqual([['A', 'B']]);
  });

  it('truncates at the order asked, keeping only sets that are minimal in the whole tree', () => {
    const tree = andGate([orGate([e('A'), e('B')]), orGate([e('A'), andGate([e('C'), e('D')])])]);
    expect(minimalCutSets(tree)).toEqual([['A'], ['B', 'C', 'D']]);
    expect(minimalCutSets(tree, 2)).toEqual([['A']]);
    expect(minimalCutSets(tree, 0)).toEqual([]);
  });

  it('finds no cut set for a gate that cannot occur (a layer that relies on nothing)', () => {
    expect(minimalCutSets(andGate([e('A'), orGate([])]))).toEqual([]);
  });
});

/** A random coherent tree in the shape of a scenario: cause OR, layers as ORs with voted channel groups. */
function randomTree(random: Random, events: string[], depth = 0): FaultTree {
  const pickEvents = (n: number) => random.shuffle(events).slice(0, Math.max(1, n)).map(e);
  if (depth >= 2 || random.next() < 0.3)
    return random.next() < 0.5 ? e(random.pick(events)) : orGate(pickEvents(1 + random.int(3)));
  const children = Array.from({ length: 1 + random.int(3) }, () => randomTree(random, events, depth + 1));
  const kind = random.int(3);
  if (kind === 0) return orGate(children);
  if (kind === 1) return andGate(children);
  return atLeastGate(1 + random.int(children.length), children);
}

describe('MOCUS against brute force on 600 seeded random trees', () => {
  it('gives exactly the brute-force minimal cut sets at orders 1, 2, 3 and unlimited', () => {
    const mismatches: string[] = [];
    for (let seed = 1; seed <= 600; seed++) {
      const random = new Random(seed);
      const events = Array.from({ length: 4 + random.int(6) }, (_, i) => `E${i}`);
      const tree = randomTree(random, events);
      for (const order of [1, 2, 3, Infinity]) {
        const fast = JSON.stringify(minimalCutSets(tree, order));
        const slow = JSON.stringify(bruteForce(tree, order));
        if (fast !== slow) mismatches.push(`seed ${seed} order ${order}: ${fast} vs ${slow}`);
      }
    }
    expect(mismatches).toEqual([]);
  });

  it('brute force itself finds cut sets on most trees (the comparison is not empty)', () => {
    let withSets = 0;
    for (let seed = 1; seed <= 600; seed++) {
      const random = new Random(seed);
      const events = Array.from({ length: 4 + random.int(6) }, (_, i) => `E${i}`);
      if (bruteForce(randomTree(random, events), 2).length > 0) withSets++;
    }
    expect(withSets).toBeGreaterThan(300);
  });
});
