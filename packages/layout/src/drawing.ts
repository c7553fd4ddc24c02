// The positioned drawing: boxes, edge lanes and clusters with absolute coordinates and CSS classes.
// Both renderers (the viewer's Svelte component and toSvg) only map these primitives to SVG.
import type { FindingPath, Scene, SceneNode, Side } from './scene.ts';
import { sideLetter } from './sides.ts';

export interface Point {
  x: number;
  y: number;
}

export interface DrawnText {
  text: string;
  x: number;
  y: number;
  className: string;
}

export interface DrawnMark {
  side: number;
  letter: string;
  x: number;
  y: number;
  size: number;
}

export interface DrawnBox {
  id: string;
  tag: string;
  role: SceneNode['role'];
  kind: string;
  x: number;
  y: number;
  width: number;
  height: number;
  classes: string[];
  texts: DrawnText[];
  /** The band across the top of a shared element, with its words (never colour alone). */
  banner?: { text: string; height: number };
  marks: DrawnMark[];
  /** Plain text for a hover title. */
  tooltip: string;
  sides: number[];
}

export interface DrawnLane {
  /** The side this lane belongs to; undefined in the overview, where edges have no side. */
  side?: number;
  points: Point[];
  classes: string[];
}

export interface DrawnEdge {
  id: string;
  source: string;
  target: string;
  link: string;
  lanes: DrawnLane[];
}

export interface DrawnCluster {
  id: string;
  label: string;
  x: number;
  y: number;
  width: number;
  height: number;
}

/** A stage column's heading on a scenario sheet: "Sensors" over the sensors. */
export interface DrawnStage {
  label: string;
  x: number;
  y: number;
  width: number;
  /** Down to the foot of the sheet: the column's band is drawn this tall behind its boxes. */
  height: number;
}

export interface Drawing {
  view: Scene['view'];
  title: string;
  scenario?: string;
  width: number;
  height: number;
  sides: Side[];
  boxes: DrawnBox[];
  edges: DrawnEdge[];
  clusters: DrawnCluster[];
  /** Stage columns of a scenario sheet, left to right; absent in the overview. */
  stages?: DrawnStage[];
  findings: FindingPath[];
  notes: string[];
}

// Text metrics are estimated, not measured, so layout runs in Node and in a worker with no DOM.
// Tags use a monospace face (width 0.6 em is the common figure for DejaVu/Liberation Mono).
const TAG_FONT = 13;
const TAG_CHAR = TAG_FONT * 0.62;
const SMALL_CHAR = 11 * 0.6;
const PAD_X = 10;
const LINE_TAG = 17;
const LINE_SMALL = 14;
const MARK_SIZE = 14;
const MARK_GAP = 3;
const BANNER_HEIGHT = 17;
const MIN_WIDTH = 92;
const MAX_TITLE = 30;
/** Distance between the parallel lanes of an edge several sides rely on. */
export const LANE_GAP = 4;

function clip(text: string, max: number): string {
  return text.length <= max ? text : text.slice(0, max - 1) + '\u2026';
}

const SEVERITY_WORDS: Record<string, string> = {
  'voids-credit': 'voids credit',
  'needs-justification': 'needs justification',
  note: 'note',
};

export function bannerText(node: SceneNode): string | undefined {
  if (!node.shared) return undefined;
  const who = node.shared.sides.map(sideLetter).join('+');
  const state = node.shared.accepted ? 'accepted' : SEVERITY_WORDS[node.shared.severity];
  return `${node.shared.relation === 'shared' ? 'SHARED' : 'ALIKE'} ${who} \u00b7 ${state}`;
}

/** The lines of text in a box, each with its CSS class, top to bottom. */
export function boxLines(
  node: SceneNode,
  sides: readonly Side[],
): { text: string; className: string; char: number; height: number }[] {
  const lines: { text: string; className: string; char: number; height: number }[] = [];
  if (node.role === 'function') {
    const side = sides.find((s) => s.tag === node.tag && node.sides.includes(s.index));
    if (side)
      lines.push({
        text: (side.role === 'cause' ? 'CAUSE' : `LAYER ${side.index}`) + ` \u00b7 ${node.kind}`,
        className: 'side-label',
        char: SMALL_CHAR,
        height: LINE_SMALL,
      });
    lines.push({ text: node.tag, className: 'tag', char: TAG_CHAR, height: LINE_TAG });
  } else {
    lines.push({ text: node.tag, className: 'tag', char: TAG_CHAR, height: LINE_TAG });
    lines.push({
      text: [node.kind, ...node.facts].join(' \u00b7 '),
      className: 'kind',
      char: SMALL_CHAR,
      height: LINE_SMALL,
    });
  }
  if (node.title)
    lines.push({ text: clip(node.title, MAX_TITLE), className: 'title', char: SMALL_CHAR, height: LINE_SMALL });
  if (node.findingCount)
    lines.push({
      text: `${node.findingCount} open finding${node.findingCount === 1 ? '' : 's'}`,
      className: 'count',
      char: SMALL_CHAR,
      height: LINE_SMALL,
    });
  return lines;
}

export function boxSize(node: SceneNode, sides: readonly Side[]): { width: number; height: number } {
  const lines = boxLines(node, sides);
  const banner = bannerText(node);
  const marksWidth = node.role === 'element' ? node.sides.length * (MARK_SIZE + MARK_GAP) : 0;
  const textWidth = Math.max(
    ...lines.map((l) => l.text.length * l.char),
    banner ? banner.length * SMALL_CHAR : 0,
    marksWidth,
  );
  const height =
    8 + lines.reduce((h, l) => h + l.height, 0) + (marksWidth > 0 ? MARK_SIZE + 6 : 2) + (banner ? BANNER_HEIGHT : 0);
  return { width: Math.max(MIN_WIDTH, Math.ceil(textWidth + 2 * PAD_X)), height: Math.ceil(height) };
}

/** Places the texts, banner and side marks of a box laid out at (x, y). */
export function drawBox(
  node: SceneNode,
  sides: readonly Side[],
  x: number,
  y: number,
  width: number,
  height: number,
): DrawnBox {
  const banner = bannerText(node);
  let cursor = y + 4 + (banner ? BANNER_HEIGHT : 0);
  const texts: DrawnText[] = boxLines(node, sides).map((l) => {
    cursor += l.height;
    return { text: l.text, x: x + PAD_X, y: cursor - 4, className: l.className };
  });
  const marks: DrawnMark[] =
    node.role === 'element'
      ? node.sides.map((side, i) => ({
          side,
          letter: sideLetter(side),
          x: x + PAD_X + i * (MARK_SIZE + MARK_GAP),
          y: y + height - MARK_SIZE - 5,
          size: MARK_SIZE,
        }))
      : [];
  const headSide = node.role === 'function' ? node.sides[0] : undefined;
  const classes = [
    'box',
    `role-${node.role}`,
    `group-${node.group}`,
    ...(headSide !== undefined ? ['head', `side-${headSide}`] : []),
    ...(node.shared ? ['shared', `severity-${node.shared.accepted ? 'accepted' : node.shared.severity}`] : []),
    ...(node.findingCount ? ['has-findings'] : []),
  ];
  const tooltip = [node.tag, node.kind, node.title, ...node.facts, banner].filter(Boolean).join('\n');
  return {
    id: node.id,
    tag: node.tag,
    role: node.role,
    kind: node.kind,
    x,
    y,
    width,
    height,
    classes,
    texts,
    ...(banner ? { banner: { text: banner, height: BANNER_HEIGHT } } : {}),
    marks,
    tooltip,
    sides: [...node.sides],
  };
}

/**
 * Shifts a polyline sideways by `offset`, keeping corners square: each point moves by the normals of
 * the segments on either side (both, when they turn; one, when they run straight on).
 */
export function offsetPolyline(points: readonly Point[], offset: number): Point[] {
  if (offset === 0 || points.length < 2) return points.map((p) => ({ ...p }));
  const normals = points.slice(1).map((q, i) => {
    const p = points[i]!;
    const dx = q.x - p.x;
    const dy = q.y - p.y;
    const len = Math.hypot(dx, dy) || 1;
    return { x: -dy / len, y: dx / len };
  });
  return points.map((p, i) => {
    const before = normals[i - 1];
    const after = normals[i];
    const a = before ?? after!;
    const b = after ?? before!;
    const same = Math.abs(a.x - b.x) < 1e-9 && Math.abs(a.y - b.y) < 1e-9;
    const nx = same ? a.x : a.x + b.x;
    const ny = same ? a.y : a.y + b.y;
    return { x: round(p.x + nx * offset), y: round(p.y + ny * offset) };
  });
}

export function round(n: number): number {
  return Math.round(n * 10) / 10;
}

/**
 * The drawn edges of a scene from a route per edge (running from the box that relies to the box relied
 * on, so the arrowhead points at what is relied on): one lane per side that relies on the edge, side
 * by side, classed by side and by whether a finding's path runs along it.
 */
export function drawEdges(scene: Scene, routes: ReadonlyMap<string, Point[]>): DrawnEdge[] {
  return scene.edges.flatMap((e) => {
    const points = routes.get(e.id);
    if (!points || points.length < 2) return [];
    const lanes =
      e.sides.length === 0
        ? [{ points, classes: ['lane'] }]
        : e.sides.map((side, i) => ({
            side,
            points: offsetPolyline(points, (i - (e.sides.length - 1) / 2) * LANE_GAP),
            classes: ['lane', `side-${side}`, ...(e.onPath.includes(side) ? ['on-path'] : [])],
          }));
    return [{ id: e.id, source: e.source, target: e.target, link: e.link, lanes }];
  });
}
