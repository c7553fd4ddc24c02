// The best creditable set: among layers that may not all be credited together (pairwise conflicts, and at most
// N layers from a group such as the BPCS), the set with the most risk reduction, found by exact branch and bound.
import type { CreditAlternative } from '../vocabulary/types.ts';
import { RELATIVE_TOLERANCE, product } from './numbers.ts';

export interface CreditCandidate {
  tag: string;
  pfd: number;
  /** A group with a limit on how many of its members may be credited (e.g. 'bpcs'). */
  group?: string;
}

export interface CreditProblem {
  candidates: readonly CreditCandidate[];
  /** Pairs of tags that may not both be credited. Pairs naming a non-candidate are ignored. */
  conflicts: readonly (readonly [string, string])[];
  groupLimits?: Readonly<Record<string, number>>;
}

export interface CreditChoice {
  /** The best set, tags sorted. Empty when nothing can be credited. */
  best: string[];
  pfdProduct: number;
  /** Other maximal sets, best first, at most `alternatives` of them. */
  alternatives: CreditAlternative[];
}

interface Ranked {
  tags: string[];
  weight: number;
}

/** Weights are decades of risk reduction; sums within this are a tie (the relative tolerance on a log scale). */
const WEIGHT_TOLERANCE = RELATIVE_TOLERANCE / Math.LN10;

/** Ties: more risk reduction first, then fewer layers, then tags in lexicographic order. */
function compareRanked(a: Ranked, b: Ranked): number {
  if (Math.abs(a.weight - b.weight) > WEIGHT_TOLERANCE) return b.weight - a.weight;
  if (a.tags.length !== b.tags.length) return a.tags.length - b.tags.length;
  for (let i = 0; i < a.tags.length; i++) {
    const x = a.tags[i]!;
    const y = b.tags[i]!;
    if (x !== y) return x < y ? -1 : 1;
  }
  return 0;
}

export function bestCreditableSet(problem: CreditProblem, alternatives = 5): CreditChoice {
  const items = problem.candidates
    .filter((c) => c.pfd > 0 && c.pfd < 1)
    .map((c) => ({ ...c, weight: -Math.log10(c.pfd) }))
    .sort((a, b) => b.weight - a.weight || (a.tag < b.tag ? -1 : a.tag > b.tag ? 1 : 0));
  const n = items.length;
  const index = new Map(items.map((c, i) => [c.tag, i]));
  const neighbours: number[][] = items.map(() => []);
  for (const [a, b] of problem.conflicts) {
    const i = index.get(a);
    const j = index.get(b);
    if (i === undefined || j === undefined || i === j || neighbours[i]!.includes(j)) continue;
    neighbours[i]!.push(j);
    neighbours[j]!.push(i);
  }
  const limits = problem.groupLimits ?? {};
  const limitOf = (i: number): number => {
    const group = items[i]!.group;
    return group !== undefined && limits[group] !== undefined ? limits[group]! : Infinity;
  };
  // Members of each limited group after position i, for the "can this exclusion still be maximal" test.
  const groupAfter: number[] = new Array<number>(n).fill(0);
  const seen = new Map<string, number>();
  for (let i = n - 1; i >= 0; i--) {
    const group = items[i]!.group ?? '';
    groupAfter[i] = seen.get(group) ?? 0;
    seen.set(group, groupAfter[i]! + 1);
  }

  const keep = alternatives + 1;
  const top: Ranked[] = [];
  const chosen: number[] = [];
  const blockedBy = new Array<number>(n).fill(0);
  const used = new Map<string, number>();

  const groupFull = (i: number): boolean => {
    const group = items[i]!.group;
    return group !== undefined && (used.get(group) ?? 0) >= limitOf(i);
  };
  const addable = (i: number): boolean => blockedBy[i] === 0 && !groupFull(i);

  const bound = (from: number, weight: number): number => {
    const room = new Map<string, number>();
    let total = weight;
    for (let j = from; j < n; j++) {
      if (blockedBy[j] !== 0) continue;
      const group = items[j]!.group;
      if (group !== undefined && limits[group] !== undefined) {
        const left = room.get(group) ?? limits[group]! - (used.get(group) ?? 0);
        if (left <= 0) continue;
        room.set(group, left - 1);
      }
      total += items[j]!.weight;
    }
    return total;
  };

  const record = (weight: number): void => {
    for (let j = 0; j < n; j++) if (!chosen.includes(j) && addable(j)) return; // not maximal
    const tags = chosen.map((j) => items[j]!.tag).sort();
    const entry: Ranked = { tags, weight };
    top.push(entry);
    top.sort(compareRanked);
    if (top.length > keep) top.pop();
  };

  const search = (i: number, weight: number): void => {
    if (top.length === keep && bound(i, weight) < top[keep - 1]!.weight - WEIGHT_TOLERANCE) return;
    if (i === n) return record(weight);
    if (!addable(i)) return search(i + 1, weight);
    const item = items[i]!;
    chosen.push(i);
    for (const j of neighbours[i]!) blockedBy[j]!++;
    if (item.group !== undefined) used.set(item.group, (used.get(item.group) ?? 0) + 1);
    search(i + 1, weight + item.weight);
    if (item.group !== undefined) used.set(item.group, used.get(item.group)! - 1);
    for (const j of neighbours[i]!) blockedBy[j]!--;
    chosen.pop();
    // Leaving i out can only give a maximal set if something later may still block it.
    const laterNeighbour = neighbours[i]!.some((j) => j > i);
    const groupCanFill = limitOf(i) !== Infinity && groupAfter[i]! >= limitOf(i) - (used.get(item.group ?? '') ?? 0);
    if (laterNeighbour || groupCanFill) search(i + 1, weight);
  };
  search(0, 0);

  const asAlternative = (r: Ranked): CreditAlternative => ({
    layers: r.tags,
    pfdProduct: product(r.tags.map((t) => items[index.get(t)!]!.pfd)),
  });
  const [first, ...rest] = top;
  if (!first) return { best: [], pfdProduct: 1, alternatives: [] };
  return { best: first.tags, pfdProduct: asAlternative(first).pfdProduct, alternatives: rest.map(asAlternative) };
}
