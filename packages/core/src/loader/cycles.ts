// Finds dependency cycles among elements with Tarjan's strongly connected components, iteratively so
// that a deep chain in a 100k-element site cannot overflow the call stack.

/** Each strongly connected component that holds a cycle, as node indices in a cycle order. */
export function findCycles(edges: readonly (readonly number[])[]): number[][] {
  const n = edges.length;
  const index = new Int32Array(n).fill(-1);
  const low = new Int32Array(n);
  const onStack = new Uint8Array(n);
  const stack: number[] = [];
  const cycles: number[][] = [];
  let counter = 0;
  for (let root = 0; root < n; root++) {
    if (index[root] !== -1) continue;
    const work: [number, number][] = [[root, 0]];
    while (work.length) {
      const frame = work[work.length - 1]!;
      const [v, next] = frame;
      if (next === 0) {
        index[v] = low[v] = counter++;
        stack.push(v);
        onStack[v] = 1;
      }
      const targets = edges[v]!;
      if (next < targets.length) {
        frame[1]++;
        const w = targets[next]!;
        if (index[w] === -1) work.push([w, 0]);
        else if (onStack[w]) low[v] = Math.min(low[v]!, index[w]!);
        continue;
      }
      work.pop();
      const parent = work[work.length - 1];
      if (parent) low[parent[0]] = Math.min(low[parent[0]]!, low[v]!);
      if (low[v] === index[v]) {
        const component: number[] = [];
        let w: number;
        do {
          w = stack.pop()!;
          onStack[w] = 0;
          component.push(w);
        } while (w !== v);
        if (component.length > 1 || targets.includes(v)) cycles.push(orderCycle(component, edges));
      }
    }
  }
  return cycles.sort((a, b) => a[0]! - b[0]!);
}

/** Walks the component from its smallest node along edges inside it, so the message reads as a loop. */
function orderCycle(component: number[], edges: readonly (readonly number[])[]): number[] {
  const members = new Set(component);
  const start = Math.min(...component);
  const path = [start];
  const seen = new Set(path);
  let current = start;
  for (;;) {
    const next = edges[current]!.find((w) => members.has(w) && !seen.has(w));
    if (next === undefined) break;
    path.push(next);
    seen.add(next);
    current = next;
  }
  return path;
}

/**
 * Far deeper than any plant's dependencies (a sensor's chain to its UPS is under a dozen links), shallow
 * enough that every element's path to what it relies on stays short, so tracing stays linear in the site.
 */
export const MAX_DEPENDENCY_DEPTH = 100;

/** The longest chain of links in an acyclic graph and the node it starts from, iteratively (memoised post-order). */
export function longestChain(edges: readonly (readonly number[])[]): { deepest: number; depth: number } {
  const depth = new Int32Array(edges.length).fill(-1);
  let best = { deepest: 0, depth: 0 };
  for (let root = 0; root < edges.length; root++) {
    if (depth[root] !== -1) continue;
    const work: [number, number][] = [[root, 0]];
    while (work.length) {
      const frame = work[work.length - 1]!;
      const [v, next] = frame;
      const targets = edges[v]!;
      if (next < targets.length) {
        frame[1]++;
        const w = targets[next]!;
        if (depth[w] === -1) work.push([w, 0]);
        continue;
      }
      work.pop();
      let d = 0;
      for (const w of targets) d = Math.max(d, depth[w]! + 1);
      depth[v] = d;
      if (d > best.depth || (d === best.depth && v < best.deepest)) best = { deepest: v, depth: d };
    }
  }
  return best;
}
