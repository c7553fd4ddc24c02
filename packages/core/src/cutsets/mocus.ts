// Minimal cut sets of a coherent fault tree by MOCUS (Method of Obtaining Cut Sets): the top gate is
// expanded row by row, an OR gate splitting a row and an AND gate widening it, then non-minimal rows
// are removed. Method: J. B. Fussell and W. E. Vesely, "A New Methodology for Obtaining Cut Sets for
// Fault Trees", Trans. Am. Nucl. Soc. 15 (1972); described in W. E. Vesely et al., Fault Tree
// Handbook, NUREG-0492 (U.S. NRC, 1981), chapter VII. Two exact reductions keep rows few: a gate
// already true under a row's events adds nothing (absorption, X.(X+Y) = X), and a row at the order
// limit whose next gate is still false can only grow past the limit, so it is dropped (truncation).

/** A coherent (monotone) fault tree: basic events joined by OR, AND and k-out-of-n gates. */
export type FaultTree = BasicEvent | AndGate | BranchingGate;
export interface BasicEvent {
  event: string;
}
export interface AndGate {
  gate: 'and';
  inputs: FaultTree[];
}
/** A gate that offers alternatives: OR (any input), or at least k of the inputs. */
export type BranchingGate = { gate: 'or'; inputs: FaultTree[] } | { gate: 'at-least'; k: number; inputs: FaultTree[] };

export const orGate = (inputs: FaultTree[]): FaultTree => (inputs.length === 1 ? inputs[0]! : { gate: 'or', inputs });
export const andGate = (inputs: FaultTree[]): FaultTree => (inputs.length === 1 ? inputs[0]! : { gate: 'and', inputs });
export const event = (tag: string): FaultTree => ({ event: tag });

/** At least k of the inputs fail; k <= 1 is an OR, k = n an AND, k > n cannot happen. */
export function atLeastGate(k: number, inputs: FaultTree[]): FaultTree {
  if (k <= 1) return orGate(inputs);
  if (k === inputs.length) return andGate(inputs);
  return { gate: 'at-least', k, inputs };
}

/** Whether the tree's top event occurs when exactly the events in `failed` occur. */
export function occurs(tree: FaultTree, failed: ReadonlySet<string>): boolean {
  if ('event' in tree) return failed.has(tree.event);
  if (tree.gate === 'or') return tree.inputs.some((i) => occurs(i, failed));
  if (tree.gate === 'and') return tree.inputs.every((i) => occurs(i, failed));
  let count = 0;
  for (const input of tree.inputs) if (occurs(input, failed) && ++count >= tree.k) return true;
  return false;
}

/** Every basic event of the tree, sorted. */
export function basicEvents(tree: FaultTree, into = new Set<string>()): string[] {
  if ('event' in tree) into.add(tree.event);
  else for (const input of tree.inputs) basicEvents(input, into);
  return [...into].sort();
}

interface Row {
  events: Set<string>;
  /** Gates (or events) still to expand; all must occur. */
  pending: FaultTree[];
}

/** The k-subsets of `items`, in order. */
function subsets<T>(items: readonly T[], k: number): T[][] {
  const out: T[][] = [];
  const pick = (from: number, chosen: T[]) => {
    if (chosen.length === k) {
      out.push([...chosen]);
      return;
    }
    for (let i = from; i <= items.length - (k - chosen.length); i++) pick(i + 1, [...chosen, items[i]!]);
  };
  pick(0, []);
  return out;
}

/** The alternatives a branching gate offers: each is a list of trees that must all occur. */
function branches(gate: BranchingGate): FaultTree[][] {
  return gate.gate === 'or' ? gate.inputs.map((i) => [i]) : subsets(gate.inputs, gate.k);
}

function compareSets(a: readonly string[], b: readonly string[]): number {
  if (a.length !== b.length) return a.length - b.length;
  for (let i = 0; i < a.length; i++) if (a[i] !== b[i]) return a[i]! < b[i]! ? -1 : 1;
  return 0;
}

/** Whether some proper subset of `set` (sorted) is already kept: by lookup of each subset while sets are small. */
function containsKept(
  set: readonly string[],
  kept: ReadonlySet<string>,
  keptSets: readonly ReadonlySet<string>[],
): boolean {
  if (set.length > 12) return keptSets.some((k) => k.size < set.length && [...k].every((e) => set.includes(e)));
  for (let mask = 1; mask < (1 << set.length) - 1; mask++) {
    if (kept.has(JSON.stringify(set.filter((_, i) => mask & (1 << i))))) return true;
  }
  return false;
}

/** Drops duplicates and every set that contains a smaller one; the result is sorted by size, then by tags. */
export function minimalSets(sets: readonly (readonly string[])[]): string[][] {
  const sorted = sets.map((s) => [...new Set(s)].sort()).sort(compareSets);
  const out: string[][] = [];
  const kept = new Set<string>();
  const keptSets: Set<string>[] = [];
  for (const candidate of sorted) {
    const key = JSON.stringify(candidate);
    if (kept.has(key) || containsKept(candidate, kept, keptSets)) continue;
    out.push(candidate);
    kept.add(key);
    keptSets.push(new Set(candidate));
  }
  return out;
}

/**
 * The minimal cut sets of `tree` with at most `maxOrder` events (all of them when maxOrder is
 * Infinity), each sorted by tag, listed by size and then by tags.
 */
export function minimalCutSets(tree: FaultTree, maxOrder = Infinity): string[][] {
  const found: string[][] = [];
  const rows: Row[] = [{ events: new Set(), pending: [tree] }];
  while (rows.length) {
    const row = rows.pop()!;
    // Widen the row with its events and AND gates until only branching gates are left.
    const branching: BranchingGate[] = [];
    for (let i = 0; i < row.pending.length; i++) {
      const node = row.pending[i]!;
      if ('event' in node) row.events.add(node.event);
      else if (node.gate === 'and') row.pending.push(...node.inputs);
      else branching.push(node);
    }
    if (row.events.size > maxOrder) continue;
    const open = branching.filter((g) => !occurs(g, row.events));
    if (open.length === 0) {
      found.push([...row.events]);
      continue;
    }
    if (row.events.size === maxOrder) continue;
    // Branch on the gate with the fewest alternatives: fewer rows, same result.
    const alternatives = open.map((g) => branches(g));
    let pick = 0;
    for (let i = 1; i < open.length; i++) if (alternatives[i]!.length < alternatives[pick]!.length) pick = i;
    const rest = open.filter((_, i) => i !== pick);
    for (const alternative of alternatives[pick]!)
      rows.push({ events: new Set(row.events), pending: [...alternative, ...rest] });
  }
  return minimalSets(found);
}
