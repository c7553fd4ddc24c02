// What both renderers draw for a drawing in a given view state (a selected element, a focused
// finding): final class lists computed once, so the viewer and the SVG export cannot drift apart.
import type { DrawnBox, DrawnEdge, DrawnLane, Drawing, Point } from './drawing.ts';

export interface ViewState {
  /** Tag of the element or function clicked. */
  selected?: string;
  /** Key of the finding clicked in the findings list. */
  finding?: string;
}

export interface PlannedBox extends DrawnBox {
  className: string;
}

export interface PlannedLane extends DrawnLane {
  className: string;
  pointsAttr: string;
}

export interface PlannedEdge extends DrawnEdge {
  title: string;
  planned: PlannedLane[];
}

export interface RenderPlan {
  className: string;
  boxes: PlannedBox[];
  edges: PlannedEdge[];
  /** Bounding box of what the focused finding touches, for centring the view on it. */
  focusBounds?: { x: number; y: number; width: number; height: number };
}

export const LINK_WORDS: Record<string, string> = {
  mountedOn: 'mounted on',
  connectedThrough: 'connected through',
  signalVia: 'signal via',
  housedIn: 'housed in',
  poweredBy: 'powered by',
  airFrom: 'air from',
  hydraulicFrom: 'hydraulic supply from',
  sensor: 'sensor',
  solver: 'logic solver',
  final: 'final element',
  raisedIn: 'alarm raised in',
  console: 'console',
  operator: 'operator',
  device: 'device',
  serves: 'uses solver',
};

export function pointsAttr(points: readonly Point[]): string {
  return points.map((p) => `${p.x},${p.y}`).join(' ');
}

export function renderPlan(drawing: Drawing, view: ViewState = {}): RenderPlan {
  const finding = view.finding ? drawing.findings.find((f) => f.key === view.finding) : undefined;
  const focusNodes = new Set<string>();
  const focusLanes = new Set<string>();
  const throughNodes = new Set<string>();
  if (finding) {
    if (finding.element) focusNodes.add(finding.element);
    for (const step of finding.steps) {
      for (const n of step.nodes) focusNodes.add(n);
      for (const e of step.edges) focusLanes.add(`${e}|${step.side}`);
    }
    const throughEdges = new Set(finding.through?.edges ?? []);
    for (const n of finding.through?.nodes ?? []) {
      focusNodes.add(n);
      throughNodes.add(n);
    }
    for (const e of drawing.edges)
      if (throughEdges.has(e.id))
        for (const l of e.lanes)
          if (l.side !== undefined && finding.sides.includes(l.side)) focusLanes.add(`${e.id}|${l.side}`);
    // A finding about a layer alone has no path: focus the layer's own node.
    if (finding.steps.length === 0)
      for (const s of finding.sides) {
        const tag = drawing.sides[s]?.tag;
        if (tag) focusNodes.add(tag);
      }
  }
  const boxes = drawing.boxes.map((b) => ({
    ...b,
    className: [
      ...b.classes,
      ...(focusNodes.has(b.id) ? ['in-focus'] : []),
      ...(throughNodes.has(b.id) ? ['through'] : []),
      ...(view.selected === b.id ? ['selected'] : []),
    ].join(' '),
  }));
  const edges = drawing.edges.map((e) => ({
    ...e,
    title: `${e.source} ${LINK_WORDS[e.link] ?? e.link} ${e.target}`,
    planned: e.lanes.map((l) => ({
      ...l,
      className: [...l.classes, ...(focusLanes.has(`${e.id}|${l.side}`) ? ['in-focus'] : [])].join(' '),
      pointsAttr: pointsAttr(l.points),
    })),
  }));
  let focusBounds: RenderPlan['focusBounds'];
  const focused = boxes.filter((b) => focusNodes.has(b.id));
  if (focused.length > 0) {
    const x = Math.min(...focused.map((b) => b.x));
    const y = Math.min(...focused.map((b) => b.y));
    focusBounds = {
      x,
      y,
      width: Math.max(...focused.map((b) => b.x + b.width)) - x,
      height: Math.max(...focused.map((b) => b.y + b.height)) - y,
    };
  }
  return {
    className: ['bh-drawing', `view-${drawing.view}`, ...(finding ? ['focusing'] : [])].join(' '),
    boxes,
    edges,
    ...(focusBounds ? { focusBounds } : {}),
  };
}
