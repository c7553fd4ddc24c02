// Square-cornered routes for a sheet in columns (./stage-columns.ts). A link between neighbouring
// columns turns once in the gap between them; a link that spans columns runs along a corridor, a
// height free of boxes in every column it passes; a link inside one column is a short down arrow when
// the two boxes are stacked in one chain, else a bracket in the gap to the column's right. Vertical
// runs in a gap get tracks of their own, ordered to cross as few of their neighbours' runs as can be
// found by insertion, and the gap is as wide as its tracks need. Deterministic, no DOM, no ELK.
import { LANE_GAP, type Point } from './drawing.ts';
import type { Scene } from './scene.ts';

export interface PlacedColumn {
  width: number;
  boxes: { id: string; y: number; width: number; height: number; chainNext: boolean }[];
}

export interface RoutedSheet {
  columnX: number[];
  routes: Map<string, Point[]>;
  /** Right edge of the last column or gap used. */
  width: number;
  /** Lowest corridor used (corridors below every box make the sheet taller). */
  bottom: number;
}

const MIN_GAP = 56;
const GAP_PAD = 14;
const TRACK = 12;
/** Clearance kept between a corridor or port and a box edge. */
const CLEAR = 7;
const CORRIDOR_STEP = 6;
/** How far above and below a box corridor heights are tried (a chain gap is smaller than this). */
const BLOCK_ROOM = 40;

type X = { box: string; at: 'left' | 'right' | 'centre' } | { gap: number; run: Run };

/** One vertical run in a gap: the y of the horizontals that leave it leftwards and rightwards. */
interface Run {
  key: string;
  gap: number;
  lo: number;
  hi: number;
  lanes: number;
  left: number[];
  right: number[];
  track: number;
}

interface Draft {
  id: string;
  points: { x: X; y: number }[];
}

interface Box {
  id: string;
  column: number;
  index: number;
  y: number;
  width: number;
  height: number;
  chainNext: boolean;
}

/** Crossings if run `a` takes a track left of run `b`. */
function cost(a: Run, b: Run): number {
  const inside = (y: number, r: Run) => y > r.lo && y < r.hi;
  return b.left.filter((y) => inside(y, a)).length + a.right.filter((y) => inside(y, b)).length;
}

const overlaps = (a: Run, b: Run) => a.lo < b.hi + CLEAR && b.lo < a.hi + CLEAR;

/** Orders a gap's runs by insertion at the cheapest place, then gives each the lowest track it can share. */
function assignTracks(runs: Run[]): number {
  const order: Run[] = [];
  for (const run of [...runs].sort(
    (a, b) => a.hi - a.lo - (b.hi - b.lo) || a.lo - b.lo || a.key.localeCompare(b.key),
  )) {
    let bestAt = 0;
    let bestCost = Infinity;
    for (let at = 0; at <= order.length; at++) {
      let c = 0;
      order.forEach((other, i) => {
        if (!overlaps(run, other)) return;
        c += i < at ? cost(other, run) : cost(run, other);
      });
      if (c < bestCost) [bestAt, bestCost] = [at, c];
    }
    order.splice(bestAt, 0, run);
  }
  let tracks = 0;
  order.forEach((run, i) => {
    run.track = 0;
    for (let j = 0; j < i; j++) if (overlaps(run, order[j]!)) run.track = Math.max(run.track, order[j]!.track + 1);
    tracks = Math.max(tracks, run.track + 1);
  });
  return tracks;
}

export function routeEdges(scene: Scene, columns: PlacedColumn[], origin: { left: number; top: number }): RoutedSheet {
  const boxes = new Map<string, Box>();
  columns.forEach((col, c) => col.boxes.forEach((b, index) => boxes.set(b.id, { ...b, column: c, index })));
  const edges = scene.edges.filter((e) => boxes.has(e.source) && boxes.has(e.target) && e.source !== e.target);
  const mid = (b: Box) => b.y + b.height / 2;

  // Ports: the ends on each side of a box, spread down the side in the order of where they head.
  type End = { edge: string; box: Box; side: 'left' | 'right'; toward: number };
  const ends: End[] = [];
  const stacked = (s: Box, t: Box) =>
    s.column === t.column && Math.abs(s.index - t.index) === 1 && (s.index < t.index ? s.chainNext : t.chainNext);
  // A link inside a column is a bracket on the side of the column with less traffic across it.
  const across = columns.map(() => ({ left: 0, right: 0 }));
  for (const e of edges) {
    const s = boxes.get(e.source)!;
    const t = boxes.get(e.target)!;
    if (s.column === t.column) continue;
    across[s.column]![t.column > s.column ? 'right' : 'left']++;
    across[t.column]![t.column > s.column ? 'left' : 'right']++;
  }
  const bracketSide = across.map((a, c): 'left' | 'right' => (c > 0 && a.left < a.right ? 'left' : 'right'));
  for (const e of edges) {
    const s = boxes.get(e.source)!;
    const t = boxes.get(e.target)!;
    if (stacked(s, t)) continue;
    const sSide = s.column === t.column ? bracketSide[s.column]! : t.column > s.column ? 'right' : 'left';
    const tSide = s.column === t.column ? bracketSide[t.column]! : t.column > s.column ? 'left' : 'right';
    ends.push({ edge: e.id, box: s, side: sSide, toward: mid(t) });
    ends.push({ edge: e.id, box: t, side: tSide, toward: mid(s) });
  }
  const portY = new Map<string, number>();
  const bySide = new Map<string, End[]>();
  for (const end of ends) {
    const k = `${end.box.id}|${end.side}`;
    bySide.set(k, [...(bySide.get(k) ?? []), end]);
  }
  for (const list of bySide.values()) {
    list.sort((a, b) => a.toward - b.toward || a.edge.localeCompare(b.edge));
    const box = list[0]!.box;
    list.forEach((end, i) =>
      portY.set(`${end.edge}|${end.box.id}`, Math.round(box.y + (box.height * (i + 1)) / (list.length + 1))),
    );
  }

  const columnBoxes = columns.map((_, c) => [...boxes.values()].filter((b) => b.column === c));
  const lowest = Math.max(origin.top, ...[...boxes.values()].map((b) => b.y + b.height));
  const corridors: { y: number; from: number; to: number; half: number }[] = [];
  const free = (y: number, from: number, to: number, half: number) =>
    columnBoxes
      .slice(from, to + 1)
      .every((list) => list.every((b) => y + half + CLEAR <= b.y || y - half - CLEAR >= b.y + b.height)) &&
    corridors.every((c) => c.to < from || c.from > to || Math.abs(c.y - y) >= c.half + half + CORRIDOR_STEP);
  let bottom = lowest;
  const corridor = (ys: number, yt: number, from: number, to: number, half: number): number => {
    const candidates = [ys, yt];
    for (const list of columnBoxes.slice(from, to + 1))
      for (const b of list) {
        for (let y = b.y + b.height + CLEAR; y < b.y + b.height + BLOCK_ROOM; y += CORRIDOR_STEP) candidates.push(y);
        for (let y = b.y - CLEAR; y > b.y - BLOCK_ROOM; y -= CORRIDOR_STEP) candidates.push(y);
      }
    const fits = candidates
      .filter((y) => y > origin.top && free(y, from, to, half))
      .sort((a, b) => Math.abs(a - ys) + Math.abs(a - yt) - (Math.abs(b - ys) + Math.abs(b - yt)) || a - b);
    let y = fits[0];
    for (let below = lowest + CLEAR + half; y === undefined; below += CORRIDOR_STEP)
      if (free(below, from, to, half)) y = below;
    corridors.push({ y, from, to, half });
    bottom = Math.max(bottom, y + half);
    return y;
  };

  const runs: Run[] = [];
  const run = (key: string, gap: number, a: number, b: number, lanes: number, left: number[], right: number[]) => {
    const r: Run = { key, gap, lo: Math.min(a, b), hi: Math.max(a, b), lanes, left, right, track: 0 };
    runs.push(r);
    return { gap, run: r };
  };
  const drafts: Draft[] = [];
  for (const e of edges) {
    const s = boxes.get(e.source)!;
    const t = boxes.get(e.target)!;
    const lanes = Math.max(1, e.sides.length);
    const half = ((lanes - 1) * LANE_GAP) / 2;
    if (stacked(s, t)) {
      const down = s.index < t.index;
      drafts.push({
        id: e.id,
        points: [
          { x: { box: s.id, at: 'centre' }, y: down ? s.y + s.height : s.y },
          { x: { box: t.id, at: 'centre' }, y: down ? t.y : t.y + t.height },
        ],
      });
      continue;
    }
    const ys = portY.get(`${e.id}|${s.id}`)!;
    const yt = portY.get(`${e.id}|${t.id}`)!;
    if (s.column === t.column) {
      const side = bracketSide[s.column]!;
      const bracket =
        side === 'right'
          ? run(e.id, s.column, ys, yt, lanes, [ys, yt], [])
          : run(e.id, s.column - 1, ys, yt, lanes, [], [ys, yt]);
      drafts.push({
        id: e.id,
        points: [
          { x: { box: s.id, at: side }, y: ys },
          { x: bracket, y: ys },
          { x: bracket, y: yt },
          { x: { box: t.id, at: side }, y: yt },
        ],
      });
      continue;
    }
    const rightward = t.column > s.column;
    const start = { x: { box: s.id, at: rightward ? 'right' : 'left' } as X, y: ys };
    const end = { x: { box: t.id, at: rightward ? 'left' : 'right' } as X, y: yt };
    // Gaps are numbered by the column on their left; a leftward link runs through them mirrored.
    const firstGap = rightward ? s.column : s.column - 1;
    const lastGap = rightward ? t.column - 1 : t.column;
    const [nearY, farY] = rightward ? [ys, yt] : [yt, ys];
    const between = rightward ? [s.column + 1, t.column - 1] : [t.column + 1, s.column - 1];
    if (between[0]! > between[1]!) {
      if (Math.abs(ys - yt) < 1) {
        drafts.push({ id: e.id, points: [start, { ...end, y: ys }] });
        continue;
      }
      const turn = run(e.id, firstGap, ys, yt, lanes, [nearY], [farY]);
      drafts.push({ id: e.id, points: [start, { x: turn, y: ys }, { x: turn, y: yt }, end] });
      continue;
    }
    const c = corridor(ys, yt, between[0]!, between[1]!, half);
    const points: Draft['points'] = [start];
    if (Math.abs(c - ys) >= 1) {
      const first = run(`${e.id}|1`, firstGap, ys, c, lanes, rightward ? [ys] : [c], rightward ? [c] : [ys]);
      points.push({ x: first, y: ys }, { x: first, y: c });
    }
    if (Math.abs(c - yt) >= 1) {
      const last = run(`${e.id}|2`, lastGap, c, yt, lanes, rightward ? [c] : [yt], rightward ? [yt] : [c]);
      points.push({ x: last, y: c }, { x: last, y: yt });
    }
    points.push(end);
    drafts.push({ id: e.id, points });
  }

  // Tracks per gap, then the gap widths, then every x.
  const gapWidth: number[] = columns.map(() => 0);
  const trackWidth: number[] = columns.map(() => TRACK);
  columns.forEach((_, g) => {
    const mine = runs.filter((r) => r.gap === g);
    const tracks = assignTracks(mine);
    trackWidth[g] = TRACK + Math.max(0, ...mine.map((r) => (r.lanes - 1) * LANE_GAP));
    const need = tracks === 0 ? 0 : 2 * GAP_PAD + (tracks - 1) * trackWidth[g]!;
    gapWidth[g] = g === columns.length - 1 ? need : Math.max(MIN_GAP, need);
  });
  const columnX: number[] = [];
  let x = origin.left;
  columns.forEach((col, c) => {
    columnX.push(x);
    x += col.width + gapWidth[c]!;
  });
  const xOf = (p: X): number => {
    if ('gap' in p) return columnX[p.gap]! + columns[p.gap]!.width + GAP_PAD + p.run.track * trackWidth[p.gap]!;
    const box = boxes.get(p.box)!;
    const centre = columnX[box.column]! + columns[box.column]!.width / 2;
    const left = Math.round(centre - box.width / 2);
    return p.at === 'left' ? left : p.at === 'right' ? left + box.width : Math.round(centre);
  };
  const routes = new Map<string, Point[]>();
  for (const d of drafts)
    routes.set(
      d.id,
      d.points.map((p) => ({ x: xOf(p.x), y: p.y })),
    );
  return { columnX, routes, width: x, bottom };
}

/** Crossings between the routes of different edges: a horizontal run crossing a vertical run. */
export function countCrossings(routes: ReadonlyMap<string, readonly Point[]>): number {
  const horizontal: { edge: string; y: number; x1: number; x2: number }[] = [];
  const vertical: { edge: string; x: number; y1: number; y2: number }[] = [];
  for (const [edge, points] of routes)
    for (let i = 1; i < points.length; i++) {
      const a = points[i - 1]!;
      const b = points[i]!;
      if (a.y === b.y) horizontal.push({ edge, y: a.y, x1: Math.min(a.x, b.x), x2: Math.max(a.x, b.x) });
      else if (a.x === b.x) vertical.push({ edge, x: a.x, y1: Math.min(a.y, b.y), y2: Math.max(a.y, b.y) });
    }
  let count = 0;
  for (const h of horizontal)
    for (const v of vertical) if (h.edge !== v.edge && v.x > h.x1 && v.x < h.x2 && h.y > v.y1 && h.y < v.y2) count++;
  return count;
}
