// Heights for the chains of a stage-column sheet: each chain as near the height of the boxes it links
// to in other columns as the column's order allows, so more lines run straight across instead of
// turning. Within a column the order is kept and chains never come closer than the gap; the best
// heights under that constraint are an isotonic regression (pool adjacent violators), a few rounds
// across the columns since each column's targets move with its neighbours.

export interface AlignedChain {
  ids: readonly string[];
  heights: readonly number[];
}

const ROUNDS = 4;

/** Least-squares non-decreasing fit to `targets` (pool adjacent violators). */
export function nonDecreasingFit(targets: readonly number[]): number[] {
  const pools: { sum: number; count: number }[] = [];
  for (const t of targets) {
    pools.push({ sum: t, count: 1 });
    while (pools.length > 1) {
      const last = pools[pools.length - 1]!;
      const before = pools[pools.length - 2]!;
      if (before.sum / before.count <= last.sum / last.count) break;
      pools.pop();
      before.sum += last.sum;
      before.count += last.count;
    }
  }
  return pools.flatMap((p) => Array<number>(p.count).fill(p.sum / p.count));
}

/**
 * The top of each chain, column by column in the given order. `neighbours` are the boxes in other
 * columns each box links to; `chainGap` separates boxes in a chain, `blockGap` chains in a column.
 */
export function alignChains(
  columns: readonly (readonly AlignedChain[])[],
  neighbours: ReadonlyMap<string, readonly string[]>,
  gaps: { chain: number; block: number; top: number },
): number[][] {
  const length = (c: AlignedChain) => c.heights.reduce((s, h) => s + h, 0) + (c.heights.length - 1) * gaps.chain;
  // Offset of each box's centre from the top of its chain.
  const centreOffset = new Map<string, number>();
  for (const chains of columns)
    for (const chain of chains) {
      let y = 0;
      chain.ids.forEach((id, i) => {
        centreOffset.set(id, y + chain.heights[i]! / 2);
        y += chain.heights[i]! + gaps.chain;
      });
    }
  const tops = columns.map((chains) => {
    let y = gaps.top;
    return chains.map((c) => {
      const top = y;
      y += length(c) + gaps.block;
      return top;
    });
  });
  const centre = new Map<string, number>();
  const refresh = () =>
    columns.forEach((chains, c) =>
      chains.forEach((chain, i) => chain.ids.forEach((id) => centre.set(id, tops[c]![i]! + centreOffset.get(id)!))),
    );
  refresh();
  for (let round = 0; round < ROUNDS; round++) {
    const order = round % 2 === 0 ? columns.map((_, i) => i) : columns.map((_, i) => columns.length - 1 - i);
    for (const c of order) {
      const chains = columns[c]!;
      // Chain i may start no higher than the chains above it allow: z = top - (room they take).
      let room = 0;
      const rooms = chains.map((chain) => {
        const r = room;
        room += length(chain) + gaps.block;
        return r;
      });
      const wanted = chains.map((chain, i) => {
        const pulls = chain.ids.flatMap((id) =>
          (neighbours.get(id) ?? []).map((m) => centre.get(m)! - centreOffset.get(id)!),
        );
        const top = pulls.length > 0 ? pulls.reduce((s, y) => s + y, 0) / pulls.length : tops[c]![i]!;
        return top - rooms[i]!;
      });
      const fitted = nonDecreasingFit(wanted);
      tops[c] = fitted.map((z, i) => Math.round(Math.max(z, gaps.top) + rooms[i]!));
      refresh();
    }
  }
  const highest = Math.min(...tops.flatMap((t) => t));
  return tops.map((t) => t.map((y) => y - highest + gaps.top));
}
