// The plant as the analysis walks it: every element and function numbered, and each one's outgoing links
// in three flat arrays (target, role, channel), read from the model in one pass. It holds exactly the
// nodes and edges of the public graph (plant-graph.ts), in the order a walk of that graph meets them, so
// tracing over it gives the same paths; the graph itself is built only for whoever asks for it.
import { groupOf, LINK_FIELDS, type ElementGroup, type ElementKind, type FunctionKind } from '../model/kinds.ts';
import type { Model, SupplyExemption } from '../model/schema.ts';
import type { EdgeRole } from '../vocabulary/types.ts';
import { buildPlantGraph, roleTargets, type PlantGraph } from './plant-graph.ts';

interface Edge {
  tag: string;
  role: EdgeRole;
  channel?: number;
}

export class PlantIndex {
  /** Node numbers by tag: elements first, then functions, each in model order. */
  readonly ids = new Map<string, number>();
  readonly tags: string[] = [];
  readonly kinds: (ElementKind | FunctionKind)[] = [];
  /** An element's group; undefined for a function. */
  readonly groups: (ElementGroup | undefined)[] = [];
  readonly supplies: (SupplyExemption | undefined)[] = [];
  /** Node n's edges are numbers edgeStart[n] to edgeStart[n + 1] - 1. */
  edgeStart = new Int32Array(0);
  edgeTarget = new Int32Array(1024);
  readonly edgeRole: EdgeRole[] = [];
  /** A sensor or final edge's position in its function's list; -1 for other edges. */
  edgeChannel = new Int32Array(1024);
  private edges = 0;

  /** The public graph: the one this index was read from, or built from the model when first asked for. */
  private constructor(private source: PlantGraph | Model) {}

  graph(): PlantGraph {
    if (!('forEachNode' in this.source)) this.source = buildPlantGraph(this.source);
    return this.source;
  }

  get size(): number {
    return this.tags.length;
  }

  isFunction(node: number): boolean {
    return this.groups[node] === undefined;
  }

  /** Reads the model's elements, their links and the functions' roles, as buildPlantGraph does. */
  static ofModel(model: Model): PlantIndex {
    const index = new PlantIndex(model);
    for (const element of model.elements)
      index.node(element.tag, element.kind, groupOf(element.kind), 'supply' in element ? element.supply : undefined);
    for (const fn of model.functions) index.node(fn.tag, fn.kind, undefined, undefined);
    index.edgeStart = new Int32Array(index.size + 1);
    const links: Edge[] = [];
    model.elements.forEach((element, n) => {
      links.length = 0;
      for (const link of LINK_FIELDS) {
        for (const tag of element[link] ?? []) if (index.ids.has(tag)) links.push({ tag, role: link });
      }
      index.out(n, inWalkOrder(links));
    });
    model.functions.forEach((fn, n) =>
      index.out(model.elements.length + n, inWalkOrder(roleTargets(fn).filter((edge) => index.ids.has(edge.tag)))),
    );
    return index.done();
  }

  /** Reads a graph as it stands (a hand-built one too), nodes and edges in the graph's own order. */
  static ofGraph(graph: PlantGraph): PlantIndex {
    const index = new PlantIndex(graph);
    graph.forEachNode((tag, a) => {
      if (a.type === 'element') index.node(tag, a.kind, a.group, a.supply);
      else index.node(tag, a.kind, undefined, undefined);
    });
    index.edgeStart = new Int32Array(index.size + 1);
    const edges: Edge[] = [];
    graph.forEachNode((tag) => {
      edges.length = 0;
      graph.forEachOutEdge(tag, (_edge, attributes, _source, target) => {
        edges.push({
          tag: target,
          role: attributes.role,
          ...(attributes.channel !== undefined ? { channel: attributes.channel } : {}),
        });
      });
      index.out(index.ids.get(tag)!, edges);
    });
    return index.done();
  }

  private node(
    tag: string,
    kind: ElementKind | FunctionKind,
    group: ElementGroup | undefined,
    supply: SupplyExemption | undefined,
  ): void {
    // As adding a node twice to the graph would: a model that passed the loader has no repeated tag.
    if (this.ids.has(tag)) throw new Error(`the plant has two nodes tagged ${tag}`);
    this.ids.set(tag, this.tags.length);
    this.tags.push(tag);
    this.kinds.push(kind);
    this.groups.push(group);
    this.supplies.push(supply);
  }

  /** Node n's edges, in order; nodes are given in number order. */
  private out(n: number, edges: readonly Edge[]): void {
    this.edgeStart[n] = this.edges;
    if (this.edges + edges.length > this.edgeTarget.length) {
      const size = Math.max(this.edgeTarget.length * 2, this.edges + edges.length);
      this.edgeTarget = grown(this.edgeTarget, size);
      this.edgeChannel = grown(this.edgeChannel, size);
    }
    for (const edge of edges) {
      this.edgeTarget[this.edges] = this.ids.get(edge.tag)!;
      this.edgeChannel[this.edges] = edge.channel ?? -1;
      this.edgeRole.push(edge.role);
      this.edges++;
    }
  }

  private done(): this {
    this.edgeStart[this.size] = this.edges;
    this.edgeTarget = this.edgeTarget.slice(0, this.edges);
    this.edgeChannel = this.edgeChannel.slice(0, this.edges);
    return this;
  }
}

function grown(array: Int32Array, size: number): Int32Array<ArrayBuffer> {
  const out = new Int32Array(size);
  out.set(array);
  return out;
}

/**
 * A node's edges in the order a walk of the public graph meets them. The graph is given them sorted by
 * target tag, then role (plant-graph.ts), and keeps them per target: targets in the order they were first
 * given, except that a tag that reads as an array index ("101") comes first, in numeric order, as object
 * keys do in JavaScript; and the edges to one target newest first.
 */
function inWalkOrder(edges: Edge[]): Edge[] {
  if (edges.length < 2) return edges;
  edges.sort((x, y) => (x.tag < y.tag ? -1 : x.tag > y.tag ? 1 : x.role < y.role ? -1 : x.role > y.role ? 1 : 0));
  // Most nodes link to each target once and use no number as a tag: the sorted order is the walk order.
  if (edges.every((edge, i) => !isArrayIndex(edge.tag) && (i === 0 || edges[i - 1]!.tag !== edge.tag))) return edges;
  const groups: Edge[][] = [];
  for (const edge of edges) {
    const last = groups[groups.length - 1];
    if (last && last[0]!.tag === edge.tag) last.unshift(edge);
    else groups.push([edge]);
  }
  const indices = groups.filter((g) => isArrayIndex(g[0]!.tag)).sort((a, b) => Number(a[0]!.tag) - Number(b[0]!.tag));
  return [...indices, ...groups.filter((g) => !isArrayIndex(g[0]!.tag))].flat();
}

/** A property key JavaScript orders as an array index: a canonical decimal number below 2^32 - 1. */
function isArrayIndex(tag: string): boolean {
  const first = tag.charCodeAt(0);
  if (first < 48 || first > 57) return false;
  return /^(0|[1-9]\d{0,9})$/.test(tag) && Number(tag) < 4294967295;
}
