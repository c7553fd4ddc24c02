// Traces each function to every element it relies on, with the shortest path that explains why each
// one is there. Element closures, paths and traces are memoised, so cost grows with the site, not with
// functions times elements, and a function traced again for each scenario that claims it costs nothing.
// Memoised results are shared: callers must treat them as read-only.
// The walks run over the plant index (numbered nodes, flat edge arrays), never over the graphology graph.
import type { ChannelTrace, EdgeRole, FunctionTrace, MissingPart, TracedElement } from '../vocabulary/types.ts';
import type { PlantGraph } from '../graph/plant-graph.ts';
import { PlantIndex } from '../graph/plant-index.ts';
import { ACTIVE_KINDS, SUPPLY_LINKS, type ElementGroup, type ElementKind, type LinkField } from '../model/kinds.ts';
import type { Model } from '../model/schema.ts';

const PROCESS_SIDE: ReadonlySet<ElementGroup> = new Set(['connection', 'impulse', 'equipment']);

/** Whether any item passes, without copying the items into an array first. */
function some<T>(items: Iterable<T>, test: (item: T) => boolean): boolean {
  for (const item of items) if (test(item)) return true;
  return false;
}

export class Tracer {
  readonly index: PlantIndex;
  private readonly closures = new Map<number, ReadonlySet<string>>();
  private readonly pathsFrom = new Map<number, TracedElement[]>();
  private readonly traces = new Map<number, FunctionTrace>();
  /** Scratch of the breadth-first walk: a node is reached in this walk when its stamp is the walk's number. */
  private readonly stamp: Int32Array;
  private readonly parentNode: Int32Array;
  private readonly parentEdge: Int32Array;
  private walk = 0;

  /** Traces a plant index, or a graph as given (one built by hand, in tests). */
  constructor(plant: PlantGraph | PlantIndex) {
    this.index = plant instanceof PlantIndex ? plant : PlantIndex.ofGraph(plant);
    this.stamp = new Int32Array(this.index.size);
    this.parentNode = new Int32Array(this.index.size);
    this.parentEdge = new Int32Array(this.index.size);
  }

  /** The tracer of a model's plant. */
  static ofModel(model: Model): Tracer {
    return new Tracer(PlantIndex.ofModel(model));
  }

  /** The plant as a graphology graph, for graph algorithms and drawing; built when first asked for. */
  get graph(): PlantGraph {
    return this.index.graph();
  }

  private node(tag: string): number {
    const id = this.index.ids.get(tag);
    if (id === undefined) throw new Error(`${tag} is not in the plant graph`);
    return id;
  }

  group(tag: string): ElementGroup | undefined {
    return this.index.groups[this.node(tag)];
  }

  /** Calls `visit` with each node that `tag` links to, once each, in the graph's order. */
  forEachOutNeighbor(tag: string, visit: (neighbor: string) => void): void {
    const { edgeStart, edgeTarget, tags } = this.index;
    const n = this.node(tag);
    for (let e = edgeStart[n]!; e < edgeStart[n + 1]!; e++) {
      // The edges to one node stand together: a node linked twice is visited once.
      if (e > edgeStart[n]! && edgeTarget[e] === edgeTarget[e - 1]) continue;
      visit(tags[edgeTarget[e]!]!);
    }
  }

  /**
   * Whether `tag` is an active element with no declared supply route: no supply link of its own and no
   * `supply=` saying why it needs none (`from-signal` counts only with a signal link to draw on).
   */
  lacksSupplyRoute(tag: string): boolean {
    const n = this.node(tag);
    const { edgeStart, edgeRole } = this.index;
    if (this.index.isFunction(n) || !ACTIVE_KINDS.has(this.index.kinds[n] as ElementKind)) return false;
    let supplied = false;
    let signal = false;
    for (let e = edgeStart[n]!; e < edgeStart[n + 1]!; e++) {
      if (SUPPLY_LINKS.has(edgeRole[e] as LinkField)) supplied = true;
      if (edgeRole[e] === 'signalVia') signal = true;
    }
    if (supplied) return false;
    const supply = this.index.supplies[n];
    if (supply === 'mechanical' || supply === 'self-contained') return false;
    return !(supply === 'from-signal' && signal);
  }

  /** Every element `tag` relies on, itself included. Process equipment is included but not expanded. */
  closure(tag: string): ReadonlySet<string> {
    return this.closureOf(this.node(tag));
  }

  /** The nodes `n` links to, once each, in the graph's order; none beyond process equipment. */
  private children(n: number): number[] {
    const { edgeStart, edgeTarget, groups } = this.index;
    const out: number[] = [];
    if (groups[n] === 'equipment') return out;
    for (let e = edgeStart[n]!; e < edgeStart[n + 1]!; e++) {
      if (e === edgeStart[n]! || edgeTarget[e] !== edgeTarget[e - 1]) out.push(edgeTarget[e]!);
    }
    return out;
  }

  private closureOf(start: number): ReadonlySet<string> {
    const known = this.closures.get(start);
    if (known) return known;
    const { tags } = this.index;
    // Iterative post-order walk: children's closures are built before their parent's.
    const stack: { n: number; expanded: boolean }[] = [{ n: start, expanded: false }];
    while (stack.length) {
      const top = stack[stack.length - 1]!;
      if (this.closures.has(top.n)) {
        stack.pop();
        continue;
      }
      const children = this.children(top.n);
      if (!top.expanded) {
        top.expanded = true;
        for (const child of children) if (!this.closures.has(child)) stack.push({ n: child, expanded: false });
        continue;
      }
      stack.pop();
      const set = new Set<string>([tags[top.n]!]);
      for (const child of children) for (const t of this.closures.get(child) ?? [tags[child]!]) set.add(t);
      this.closures.set(top.n, set);
    }
    return this.closures.get(start)!;
  }

  /** The controller or logic solver a function acts through, if the model gives one (the last so linked). */
  private solverOf(fn: number): string | undefined {
    const { edgeStart, edgeTarget, edgeRole, tags } = this.index;
    let solver: string | undefined;
    for (let e = edgeStart[fn]!; e < edgeStart[fn + 1]!; e++) {
      if (edgeRole[e] === 'solver' || edgeRole[e] === 'raisedIn') solver = tags[edgeTarget[e]!];
    }
    return solver;
  }

  /**
   * A function relies on an element for the role it uses. Where an element takes its signal from several
   * places (a valve moved by the BPCS positioner and by a SIS solenoid), a function does not follow a
   * signal link that serves only other solvers, provided another link leads to its own solver. Links in
   * series with no solver behind them (a network) are followed; nothing is dropped on a guess.
   */
  private followsSignal(solver: string | undefined, node: number, target: number): boolean {
    if (solver === undefined) return true;
    const { edgeStart, edgeTarget, edgeRole, groups } = this.index;
    const branches: number[] = [];
    for (let e = edgeStart[node]!; e < edgeStart[node + 1]!; e++)
      if (edgeRole[e] === 'signalVia') branches.push(edgeTarget[e]!);
    if (branches.length < 2 || this.closureOf(target).has(solver)) return true;
    const servesOthersOnly = some(this.closureOf(target), (t) => groups[this.index.ids.get(t)!] === 'solver');
    return !(servesOthersOnly && branches.some((b) => this.closureOf(b).has(solver)));
  }

  /**
   * Breadth-first from `start` (a function or an element), keeping the first path to each element. From
   * a function, signal links that serve another function's solver are not followed (see followsSignal).
   */
  paths(start: string): TracedElement[] {
    const s = this.node(start);
    const known = this.pathsFrom.get(s);
    if (known) return known;
    const order = this.reach(s);
    const { tags, kinds, groups, edgeRole } = this.index;
    const out: TracedElement[] = [];
    for (const n of order) {
      const group = groups[n];
      if (group === undefined) continue;
      const path = [tags[n]!];
      const links: EdgeRole[] = [];
      for (let at = n; at !== s; at = this.parentNode[at]!) {
        path.unshift(tags[this.parentNode[at]!]!);
        links.unshift(edgeRole[this.parentEdge[at]!]!);
      }
      out.push({ tag: tags[n]!, kind: kinds[n] as ElementKind, group, path, links });
    }
    out.sort((x, y) => (x.tag < y.tag ? -1 : x.tag > y.tag ? 1 : 0));
    this.pathsFrom.set(s, out);
    return out;
  }

  /**
   * Breadth-first reach from `start`, stopping at process equipment; from a function, by role. Returns the
   * nodes in the order reached; each one's parent stays in the scratch arrays until the next walk.
   */
  private reach(start: number, fn?: number): number[] {
    const { edgeStart, edgeTarget, edgeRole, groups } = this.index;
    const solver = this.index.isFunction(start)
      ? this.solverOf(start)
      : fn !== undefined
        ? this.solverOf(fn)
        : undefined;
    const walk = ++this.walk;
    const order = [start];
    this.stamp[start] = walk;
    for (let i = 0; i < order.length; i++) {
      const node = order[i]!;
      if (node !== start && groups[node] === 'equipment') continue;
      for (let e = edgeStart[node]!; e < edgeStart[node + 1]!; e++) {
        const target = edgeTarget[e]!;
        if (this.stamp[target] === walk) continue;
        if (edgeRole[e] === 'signalVia' && !this.followsSignal(solver, node, target)) continue;
        this.stamp[target] = walk;
        this.parentNode[target] = node;
        this.parentEdge[target] = e;
        order.push(target);
      }
    }
    return order;
  }

  /** What one channel of a function relies on: its head and everything reached from it by that role. */
  private channelElements(fn: number, head: number): string[] {
    const { tags } = this.index;
    return this.reach(head, fn)
      .map((n) => tags[n]!)
      .sort();
  }

  traceFunction(tag: string): FunctionTrace {
    const f = this.node(tag);
    const known = this.traces.get(f);
    if (known) return known;
    if (!this.index.isFunction(f)) throw new Error(`${tag} is not a function`);
    const { edgeStart, edgeTarget, edgeRole, tags, groups } = this.index;
    const channels: ChannelTrace[] = [];
    let solver = false;
    for (let e = edgeStart[f]!; e < edgeStart[f + 1]!; e++) {
      const role = edgeRole[e];
      if (role === 'sensor' || role === 'final')
        channels.push({ role, head: tags[edgeTarget[e]!]!, elements: this.channelElements(f, edgeTarget[e]!) });
      if (role === 'solver' || role === 'raisedIn') solver = true;
    }
    const missing: MissingPart[] = [];
    const sensors = channels.filter((c) => c.role === 'sensor');
    const finals = channels.filter((c) => c.role === 'final');
    const reachesProcess = (elements: Iterable<string>) =>
      some(elements, (t) => PROCESS_SIDE.has(groups[this.index.ids.get(t)!]!));
    const kind = this.index.kinds[f]!;
    if (kind === 'device') {
      const device = edgeStart[f]! < edgeStart[f + 1]! ? edgeTarget[edgeStart[f]!]! : undefined;
      if (device === undefined || !reachesProcess(this.closureOf(device))) missing.push('process-connection');
    } else {
      if (sensors.length === 0) missing.push('sensor');
      else if (sensors.some((c) => !reachesProcess(c.elements))) missing.push('process-connection');
      if (!solver) missing.push('solver');
      if (finals.length === 0) missing.push('final-element');
    }
    const trace = { function: tag, kind, elements: this.paths(tag), channels, missing } as FunctionTrace;
    this.traces.set(f, trace);
    return trace;
  }
}
