// The plant as a graph: one node per element and per function, one typed edge per dependency link
// and per function role. Edges point from what relies to what is relied on.
import { MultiDirectedGraph } from 'graphology';
import { groupOf, LINK_FIELDS, type ElementGroup, type ElementKind, type FunctionKind } from '../model/kinds.ts';
import type { Element, Model, PlantFunction, SupplyExemption } from '../model/schema.ts';
import type { EdgeRole } from '../vocabulary/types.ts';

export type NodeAttributes =
  | { type: 'element'; kind: ElementKind; group: ElementGroup; supply?: SupplyExemption }
  | { type: 'function'; kind: FunctionKind };

export interface EdgeAttributes {
  role: EdgeRole;
  /** For sensor and final roles, the channel's position in the function's list. */
  channel?: number;
}

export type PlantGraph = MultiDirectedGraph<NodeAttributes, EdgeAttributes>;

/** The role edges of a function, in a fixed order: sensors, solver, finals, then the alarm's people. */
export function roleTargets(fn: PlantFunction): { role: EdgeRole; tag: string; channel?: number }[] {
  const out: { role: EdgeRole; tag: string; channel?: number }[] = [];
  const channels = (role: EdgeRole, tags: readonly string[] | undefined) =>
    (tags ?? []).forEach((tag, channel) => out.push({ role, tag, channel }));
  switch (fn.kind) {
    case 'loop':
    case 'sif':
    case 'trip':
      channels('sensor', fn.sensors);
      out.push({ role: 'solver', tag: fn.solver });
      channels('final', fn.finals);
      break;
    case 'alarm':
      channels('sensor', fn.sensors);
      out.push({ role: 'raisedIn', tag: fn.raisedIn });
      if (fn.console !== undefined) out.push({ role: 'console', tag: fn.console });
      out.push({ role: 'operator', tag: fn.operator });
      channels('final', fn.finals);
      break;
    case 'device':
      out.push({ role: 'device', tag: fn.device });
      break;
  }
  return out;
}

export function buildPlantGraph(model: Model): PlantGraph {
  const graph: PlantGraph = new MultiDirectedGraph<NodeAttributes, EdgeAttributes>();
  for (const element of model.elements) {
    const supply = 'supply' in element ? element.supply : undefined;
    graph.addNode(element.tag, {
      type: 'element',
      kind: element.kind,
      group: groupOf(element.kind),
      ...(supply ? { supply } : {}),
    });
  }
  for (const fn of model.functions) graph.addNode(fn.tag, { type: 'function', kind: fn.kind });
  for (const element of model.elements) addLinks(graph, element);
  for (const fn of model.functions) {
    for (const { role, tag, channel } of inTagOrder(roleTargets(fn))) {
      if (graph.hasNode(tag)) graph.addEdge(fn.tag, tag, channel === undefined ? { role } : { role, channel });
    }
  }
  return graph;
}

/**
 * A node's edges are added by target tag, never in the order the user listed them: traversals visit them
 * in this order, so the path shown when two are equally short does not change when a list is reordered.
 */
function inTagOrder<T extends { tag: string; role: string }>(edges: T[]): T[] {
  return edges.sort((x, y) =>
    x.tag < y.tag ? -1 : x.tag > y.tag ? 1 : x.role < y.role ? -1 : x.role > y.role ? 1 : 0,
  );
}

function addLinks(graph: PlantGraph, element: Element): void {
  const edges: { tag: string; role: (typeof LINK_FIELDS)[number] }[] = [];
  for (const link of LINK_FIELDS) for (const tag of element[link] ?? []) edges.push({ tag, role: link });
  for (const { tag, role } of inTagOrder(edges)) {
    if (graph.hasNode(tag)) graph.addEdge(element.tag, tag, { role });
  }
}
