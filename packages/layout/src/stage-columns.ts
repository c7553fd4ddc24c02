// The focused scenario drawn as a sheet in stage columns, left to right as a loop reads: process and
// its connections, sensors, input signals, solvers with the functions they run, output signals, final
// elements with what they act on, then supports and housings. Chains inside one stage (a bridle on
// its nozzles on the vessel; a circuit fed by a UPS) stack down the column, so the sheet grows down
// rather than across. Order within a column is chosen to cut crossings (barycentre sweeps, keeping
// the order with the fewest crossings found); edges are routed by ./orthogonal-routes.ts.
// Deterministic: the same scene gives the same drawing, so a save that changes one attribute leaves
// every box where it was.
import { drawBox, boxSize, drawEdges, type Drawing, type DrawnStage } from './drawing.ts';
import { alignChains } from './column-alignment.ts';
import { countCrossings, routeEdges, type PlacedColumn } from './orthogonal-routes.ts';
import type { Scene, SceneNode } from './scene.ts';

export interface Stage {
  label: string;
  /** The scene partitions (see PARTITIONS in ./scene.ts) this column holds. */
  partitions: readonly number[];
}

export const STAGES: readonly Stage[] = [
  { label: 'Process and connections', partitions: [0, 1, 2] },
  { label: 'Sensors', partitions: [3] },
  { label: 'Signals in', partitions: [4] },
  { label: 'Solvers and functions', partitions: [5, 6] },
  { label: 'Signals out', partitions: [7] },
  { label: 'Final elements', partitions: [8, 9, 10] },
  { label: 'Supports and housings', partitions: [11] },
];

const MARGIN = 28;
/** Room above the boxes for the stage headings. */
const HEADING = 30;
/** Between two boxes joined by a short down arrow in one chain. */
const CHAIN_GAP = 30;
/** Between two chains (or lone boxes) in one column. */
const BLOCK_GAP = 24;
const SWEEPS = 8;
const TRANSPOSE_PASSES = 4;
/** Up to this many boxes, orders are judged by routing them in full and counting crossings. */
const EXACT_SCORING_LIMIT = 80;
const ORIGIN = { left: MARGIN, top: MARGIN + HEADING };
/** The column band reaches this far beyond its widest box. */
const STAGE_BAND_PAD = 8;

function stageOf(node: SceneNode): number {
  const i = STAGES.findIndex((s) => s.partitions.includes(node.partition));
  return i < 0 ? STAGES.length - 1 : i;
}

/** One chain inside a column: boxes joined by edges within the column, top (relies) to bottom (relied on). */
interface Block {
  nodes: SceneNode[];
  /** Sort key while sweeping. */
  key: number;
}

function unionFind(ids: readonly string[]) {
  const parent = new Map(ids.map((id) => [id, id]));
  const find = (id: string): string => {
    let root = id;
    while (parent.get(root) !== root) root = parent.get(root)!;
    parent.set(id, root);
    return root;
  };
  return { find, join: (a: string, b: string) => parent.set(find(a), find(b)) };
}

const bySideThenTag = (a: SceneNode, b: SceneNode) =>
  Math.min(...a.sides, 99) - Math.min(...b.sides, 99) || a.tag.localeCompare(b.tag);

/** The chains of one column, each in reading order: a box above what it relies on. */
function blocksOf(members: SceneNode[], scene: Scene, column: Map<string, number>): Block[] {
  const uf = unionFind(members.map((n) => n.id));
  const mine = new Set(members.map((n) => n.id));
  const down = new Map<string, string[]>();
  for (const e of scene.edges) {
    const c = column.get(e.source);
    if (c === undefined || c !== column.get(e.target) || e.source === e.target) continue;
    if (!mine.has(e.source)) continue;
    uf.join(e.source, e.target);
    down.set(e.source, [...(down.get(e.source) ?? []), e.target]);
  }
  // Depth = longest chain of "relies on" above a box inside its column (no cycles: a scene's links
  // only point from a relying element to what it relies on, but guard against one anyway).
  const depth = new Map<string, number>();
  const visit = (id: string, d: number, seen: Set<string>) => {
    if (seen.has(id) || (depth.get(id) ?? -1) >= d) return;
    depth.set(id, d);
    seen.add(id);
    for (const t of down.get(id) ?? []) visit(t, d + 1, seen);
    seen.delete(id);
  };
  for (const n of [...members].sort(bySideThenTag)) visit(n.id, 0, new Set());
  const groups = new Map<string, SceneNode[]>();
  for (const n of [...members].sort(bySideThenTag)) {
    const root = uf.find(n.id);
    groups.set(root, [...(groups.get(root) ?? []), n]);
  }
  return [...groups.values()].map((nodes, i) => ({
    nodes: nodes.sort((a, b) => depth.get(a.id)! - depth.get(b.id)! || bySideThenTag(a, b)),
    key: i,
  }));
}

function stack(columns: Block[][], sizes: Map<string, { width: number; height: number }>): Map<string, number> {
  const centre = new Map<string, number>();
  for (const blocks of columns) {
    let y = 0;
    for (const block of blocks) {
      block.nodes.forEach((n, i) => {
        const h = sizes.get(n.id)!.height;
        centre.set(n.id, y + h / 2);
        y += h + (i < block.nodes.length - 1 ? CHAIN_GAP : BLOCK_GAP);
      });
    }
  }
  return centre;
}

/** Crossings of the straight lines between column neighbours: the measure the sweeps try to lower. */
function crossings(links: readonly [string, string][], column: Map<string, number>, centre: Map<string, number>) {
  let count = 0;
  const segs = links.map(([a, b]) => {
    const [l, r] = column.get(a)! <= column.get(b)! ? [a, b] : [b, a];
    return { x1: column.get(l)!, y1: centre.get(l)!, x2: column.get(r)!, y2: centre.get(r)! };
  });
  for (let i = 0; i < segs.length; i++)
    for (let j = i + 1; j < segs.length; j++) {
      const s = segs[i]!;
      const t = segs[j]!;
      const lo = Math.max(s.x1, t.x1);
      const hi = Math.min(s.x2, t.x2);
      if (lo >= hi) continue;
      const at = (g: typeof s, x: number) => g.y1 + ((g.y2 - g.y1) * (x - g.x1)) / (g.x2 - g.x1);
      const d1 = at(s, lo) - at(t, lo);
      const d2 = at(s, hi) - at(t, hi);
      if (d1 * d2 < 0) count++;
    }
  return count;
}

function arrange(
  scene: Scene,
  sizes: Map<string, { width: number; height: number }>,
): { columns: Block[][]; used: number[]; tops: number[][] } {
  const column = new Map<string, number>();
  const byStage: SceneNode[][] = STAGES.map(() => []);
  for (const n of scene.nodes) byStage[stageOf(n)]!.push(n);
  const used = byStage.flatMap((members, i) => (members.length > 0 ? [i] : []));
  used.forEach((stage, c) => byStage[stage]!.forEach((n) => column.set(n.id, c)));
  const columns = used.map((stage) => blocksOf(byStage[stage]!, scene, column));
  const links: [string, string][] = scene.edges
    .filter((e) => column.has(e.source) && column.has(e.target) && column.get(e.source) !== column.get(e.target))
    .map((e) => [e.source, e.target]);
  const neighbours = new Map<string, string[]>();
  for (const [a, b] of links) {
    neighbours.set(a, [...(neighbours.get(a) ?? []), b]);
    neighbours.set(b, [...(neighbours.get(b) ?? []), a]);
  }
  // Small sheets are scored by the crossings of their real routes; large ones by straight lines
  // between centres, which costs far less and points the same way.
  const exact = scene.nodes.length <= EXACT_SCORING_LIMIT;
  const score = (order: Block[][]) =>
    exact
      ? countCrossings(routeEdges(scene, place(order, sizes), ORIGIN).routes)
      : crossings(links, column, stack(order, sizes));
  const snapshot = () => columns.map((c) => [...c]);
  let best = { order: snapshot(), score: score(columns) };
  for (let sweep = 0; sweep < SWEEPS && best.score > 0; sweep++) {
    const order = sweep % 2 === 0 ? columns.map((_, i) => i) : columns.map((_, i) => columns.length - 1 - i);
    let centre = stack(columns, sizes);
    for (const c of order) {
      const blocks = columns[c]!;
      blocks.forEach((block, i) => {
        const ys = block.nodes.flatMap((n) => (neighbours.get(n.id) ?? []).map((m) => centre.get(m)!));
        const own = block.nodes.reduce((s, n) => s + centre.get(n.id)!, 0) / block.nodes.length;
        // A block with no neighbour outside its column keeps its place (its own centre as the key).
        block.key = ys.length > 0 ? ys.reduce((s, y) => s + y, 0) / ys.length : own + i * 1e-6;
      });
      blocks.sort((a, b) => a.key - b.key);
      centre = stack(columns, sizes);
    }
    const now = score(columns);
    if (now < best.score) best = { order: snapshot(), score: now };
  }
  // Then swap neighbours in each column while that removes crossings (small sheets only).
  const order = best.order;
  for (let pass = 0; exact && pass < TRANSPOSE_PASSES && best.score > 0; pass++) {
    let improved = false;
    for (const blocks of order)
      for (let i = 0; i + 1 < blocks.length; i++) {
        [blocks[i], blocks[i + 1]] = [blocks[i + 1]!, blocks[i]!];
        const now = score(order);
        if (now < best.score) {
          best.score = now;
          improved = true;
        } else [blocks[i], blocks[i + 1]] = [blocks[i + 1]!, blocks[i]!];
      }
    if (!improved) break;
  }
  const tops = alignChains(
    order.map((blocks) =>
      blocks.map((b) => ({ ids: b.nodes.map((n) => n.id), heights: b.nodes.map((n) => sizes.get(n.id)!.height) })),
    ),
    neighbours,
    { chain: CHAIN_GAP, block: BLOCK_GAP, top: ORIGIN.top },
  );
  return { columns: order, used, tops };
}

function place(
  columns: Block[][],
  sizes: Map<string, { width: number; height: number }>,
  tops?: number[][],
): PlacedColumn[] {
  return columns.map((blocks, c) => {
    const width = Math.max(...blocks.flatMap((b) => b.nodes.map((n) => sizes.get(n.id)!.width)));
    const boxes: PlacedColumn['boxes'] = [];
    let y = ORIGIN.top;
    blocks.forEach((block, b) => {
      y = tops?.[c]?.[b] ?? y;
      block.nodes.forEach((n, i) => {
        const size = sizes.get(n.id)!;
        boxes.push({ id: n.id, y, width: size.width, height: size.height, chainNext: i < block.nodes.length - 1 });
        y += size.height + (i < block.nodes.length - 1 ? CHAIN_GAP : BLOCK_GAP);
      });
    });
    return { width, boxes };
  });
}

/** Lays out a focused-scenario scene in stage columns; pure and synchronous (no ELK). */
export function layoutStageColumns(scene: Scene): Drawing {
  const sizes = new Map(scene.nodes.map((n) => [n.id, boxSize(n, scene.sides)]));
  const { columns, used, tops } = arrange(scene, sizes);
  const placed = place(columns, sizes, tops);
  const routed = routeEdges(scene, placed, ORIGIN);
  const nodes = new Map(scene.nodes.map((n) => [n.id, n]));
  const boxes = placed.flatMap((col, c) =>
    col.boxes.map((b) => {
      const x = routed.columnX[c]! + (col.width - b.width) / 2;
      return drawBox(nodes.get(b.id)!, scene.sides, Math.round(x), b.y, b.width, b.height);
    }),
  );
  const height = Math.ceil(Math.max(routed.bottom, ...boxes.map((b) => b.y + b.height)) + MARGIN);
  const stages: DrawnStage[] = used.map((stage, c) => ({
    label: STAGES[stage]!.label,
    x: routed.columnX[c]! - STAGE_BAND_PAD,
    y: MARGIN - STAGE_BAND_PAD,
    width: placed[c]!.width + 2 * STAGE_BAND_PAD,
    height: height - MARGIN,
  }));
  boxes.sort((a, b) => a.id.localeCompare(b.id));
  return {
    view: scene.view,
    title: scene.title,
    ...(scene.scenario ? { scenario: scene.scenario } : {}),
    width: Math.ceil(routed.width + MARGIN),
    height,
    sides: scene.sides,
    boxes,
    edges: drawEdges(scene, routed.routes),
    clusters: [],
    stages,
    findings: scene.findings,
    notes: scene.notes,
  };
}
