// Scene to ELK graph and ELK result to Drawing: the pure half of layout, with no ELK code in it, so
// the viewer's main bundle can import it while elkjs itself runs only in the worker (or in Node).
import type { ElkExtendedEdge, ElkNode } from 'elkjs/lib/elk-api.js';
import { drawBox, drawEdges, boxSize, round, type DrawnCluster, type Drawing, type Point } from './drawing.ts';
import type { Scene, SceneNode } from './scene.ts';

/** ELK layout options. Values must be strings (elkjs parses them). */
const LAYERED: Record<string, string> = {
  'elk.algorithm': 'layered',
  'elk.direction': 'RIGHT',
  'elk.edgeRouting': 'ORTHOGONAL',
  'elk.spacing.nodeNode': '22',
  'elk.layered.spacing.nodeNodeBetweenLayers': '52',
  'elk.spacing.edgeEdge': '12',
  'elk.spacing.edgeNode': '16',
  'elk.layered.spacing.edgeEdgeBetweenLayers': '12',
  'elk.layered.spacing.edgeNodeBetweenLayers': '16',
  'elk.layered.nodePlacement.strategy': 'BRANDES_KOEPF',
  'elk.padding': '[top=28,left=28,bottom=28,right=28]',
  'elk.json.shapeCoords': 'ROOT',
  'elk.json.edgeCoords': 'ROOT',
};

/**
 * Above this many nodes, fewer crossing-minimisation sweeps: a 300-node scenario drops from about
 * 900 ms to about 150 ms (bench/layout.ts) for a drawing of much the same size. ELK is deterministic
 * either way (fixed random seed, input in sorted order).
 */
const LARGE_GRAPH = 120;

const CLUSTER_PADDING = '[top=30,left=14,bottom=14,right=14]';

function elkNode(node: SceneNode, scene: Scene): ElkNode {
  const { width, height } = boxSize(node, scene.sides);
  return { id: node.id, width, height };
}

/**
 * The ELK graph for the site overview (a scenario is drawn in stage columns by ./stage-columns.ts,
 * without ELK): areas and the systems of solvers that group them, each link as relied on.
 */
export function toElk(scene: Scene): ElkNode {
  const byId = new Map(scene.nodes.map((n) => [n.id, n]));
  const inCluster = new Map<string, string>();
  for (const c of scene.clusters) for (const child of c.children) if (byId.has(child)) inCluster.set(child, c.id);
  const children: ElkNode[] = scene.nodes.filter((n) => !inCluster.has(n.id)).map((n) => elkNode(n, scene));
  for (const c of scene.clusters) {
    const kids = c.children.filter((id) => byId.has(id)).map((id) => elkNode(byId.get(id)!, scene));
    if (kids.length > 0) children.push({ id: c.id, children: kids, layoutOptions: { 'elk.padding': CLUSTER_PADDING } });
  }
  const edges: ElkExtendedEdge[] = scene.edges
    .filter((e) => byId.has(e.source) && byId.has(e.target) && e.source !== e.target)
    .map((e) => ({ id: e.id, sources: [e.source], targets: [e.target] }));
  return {
    id: 'root',
    layoutOptions: {
      ...LAYERED,
      ...(scene.nodes.length > LARGE_GRAPH ? { 'elk.layered.thoroughness': '3' } : {}),
      ...(scene.clusters.length > 0 ? { 'elk.hierarchyHandling': 'INCLUDE_CHILDREN' } : {}),
    },
    children,
    edges,
  };
}

function endpoints(edge: ElkExtendedEdge): Point[] {
  const section = edge.sections?.[0];
  if (!section) return [];
  return [section.startPoint, ...(section.bendPoints ?? []), section.endPoint].map((p) => ({
    x: round(p.x),
    y: round(p.y),
  }));
}

/** Reads ELK's result (coordinates relative to the root, as asked for in toElk) into a Drawing. */
export function fromElk(scene: Scene, laidOut: ElkNode): Drawing {
  const nodes = new Map(scene.nodes.map((n) => [n.id, n]));
  const boxes: Drawing['boxes'] = [];
  const clusters: DrawnCluster[] = [];
  const clusterLabels = new Map(scene.clusters.map((c) => [c.id, c.label]));
  const walk = (elk: ElkNode) => {
    for (const child of elk.children ?? []) {
      const x = round(child.x ?? 0);
      const y = round(child.y ?? 0);
      const node = nodes.get(child.id);
      if (node) boxes.push(drawBox(node, scene.sides, x, y, child.width ?? 0, child.height ?? 0));
      else if (clusterLabels.has(child.id))
        clusters.push({
          id: child.id,
          label: clusterLabels.get(child.id)!,
          x,
          y,
          width: round(child.width ?? 0),
          height: round(child.height ?? 0),
        });
      walk(child);
    }
  };
  walk(laidOut);
  const routes = new Map<string, Point[]>();
  const collect = (elk: ElkNode) => {
    for (const e of elk.edges ?? []) {
      const points = endpoints(e);
      routes.set(e.id, points);
    }
    for (const child of elk.children ?? []) collect(child);
  };
  collect(laidOut);
  const edges = drawEdges(scene, routes);
  boxes.sort((a, b) => a.id.localeCompare(b.id));
  return {
    view: scene.view,
    title: scene.title,
    ...(scene.scenario ? { scenario: scene.scenario } : {}),
    width: Math.ceil(laidOut.width ?? 0),
    height: Math.ceil(laidOut.height ?? 0),
    sides: scene.sides,
    boxes,
    edges,
    clusters,
    findings: scene.findings,
    notes: scene.notes,
  };
}
