// A small invented scene for warming up ELK: the first layout in a fresh worker pays for JIT
// compilation (about half a second in Chromium), so the worker lays this out while the page loads.
import type { Scene, SceneEdge, SceneNode } from './scene.ts';

export function warmUpScene(size = 60): Scene {
  const nodes: SceneNode[] = [];
  const edges: SceneEdge[] = [];
  for (let i = 0; i < size; i++) {
    nodes.push({
      id: `n${i}`,
      role: 'element',
      tag: `N-${i}`,
      kind: 'transmitter',
      group: 'sensor',
      facts: [],
      sides: [i % 3],
      partition: i % 12,
    });
    if (i > 0)
      edges.push({
        id: `e${i}`,
        source: `n${Math.floor((i - 1) / 2)}`,
        target: `n${i}`,
        link: 'signalVia',
        sides: [i % 3],
        onPath: [],
      });
    if (i > 3)
      edges.push({
        id: `f${i}`,
        source: `n${i - 3}`,
        target: `n${i}`,
        link: 'mountedOn',
        sides: [(i + 1) % 3],
        onPath: [],
      });
  }
  return { view: 'overview', title: 'warm-up', sides: [], nodes, edges, findings: [], clusters: [], notes: [] };
}
