// Traces each function to every element it relies on, with the shortest path that explains why each
// one is there. Element closures, paths and traces are memoised, so cost grows with the site, not with
// functions times elements, and a function traced again for each scenario that claims it costs nothing.
// Memoised results are shared: callers must treat them as read-only.
import type { ChannelTrace, EdgeRole, FunctionTrace, MissingPart, TracedElement } from '../vocabulary/types.ts';
import type { PlantGraph } from '../graph/plant-graph.ts';
import { ACTIVE_KINDS, SUPPLY_LINKS, type ElementGroup, type LinkField } from '../model/kinds.ts';

const PROCESS_SIDE: ReadonlySet<ElementGroup> = new Set(['connection', 'impulse', 'equipment']);

/** Whether any item passes, without copying the items into an array first. */
function some<T>(items: Iterable<T>, test: (item: T) => boolean): boolean {
  for (const item of items) if (test(item)) return true;
  return false;
}

export class Tracer {
  private readonly closures = new Map<string, ReadonlySet<string>>();
  private readonly pathsFrom = new Map<string, TracedElement[]>();
  private readonly traces = new Map<string, FunctionTrace>();

  constructor(readonly graph: PlantGraph) {}

  group(tag: string): ElementGroup | undefined {
    const a = this.graph.getNodeAttributes(tag);
    return a.type === 'element' ? a.group : undefined;
  }

  /**
   * Whether `tag` is an active element with no declared supply route: no supply link of its own and no
   * `supply=` saying why it needs none (`from-signal` counts only with a signal link to draw on).
   */
  lacksSupplyRoute(tag: string): boolean {
    const a = this.graph.getNodeAttributes(tag);
    if (a.type !== 'element' || !ACTIVE_KINDS.has(a.kind)) return false;
    let supplied = false;
    let signal = false;
    this.graph.forEachOutEdge(tag, (_edge, attributes) => {
      if (SUPPLY_LINKS.has(attributes.role as LinkField)) supplied = true;
      if (attributes.role === 'signalVia') signal = true;
    });
    if (supplied) return false;
    if (a.supply === 'mechanical' || a.supply === 'self-contained') return false;
    return !(a.supply === 'from-signal' && signal);
  }

  /** Every element `tag` relies on, itself included. Process equipment is included but not expanded. */
  closure(tag: string): ReadonlySet<string> {
    const known = this.closures.get(tag);
    if (known) return known;
    // Iterative post-order walk: children's closures are built before their parent's.
    const stack: { tag: string; expanded: boolean }[] = [{ tag, expanded: false }];
    while (stack.length) {
      const top = stack[stack.length - 1]!;
      if (this.closures.has(top.tag)) {
        stack.pop();
        continue;
      }
      const children = this.group(top.tag) === 'equipment' ? [] : this.graph.outNeighbors(top.tag);
      if (!top.expanded) {
        top.expanded = true;
        for (const child of children) if (!this.closures.has(child)) stack.push({ tag: child, expanded: false });
        continue;
      }
      stack.pop();
      const set = new Set<string>([top.tag]);
      for (const child of children) for (const t of this.closures.get(child) ?? [child]) set.add(t);
      this.closures.set(top.tag, set);
    }
    return this.closures.get(tag)!;
  }

  /** The controller or logic solver a function acts through, if the model gives one. */
  private solverOf(fnTag: string): string | undefined {
    let solver: string | undefined;
    this.graph.forEachOutEdge(fnTag, (_edge, attributes, _source, target) => {
      if (attributes.role === 'solver' || attributes.role === 'raisedIn') solver = target;
    });
    return solver;
  }

  /**
   * A function relies on an element for the role it uses. Where an element takes its signal from several
   * places (a valve moved by the BPCS positioner and by a SIS solenoid), a function does not follow a
   * signal link that serves only other solvers, provided another link leads to its own solver. Links in
   * series with no solver behind them (a network) are followed; nothing is dropped on a guess.
   */
  private followsSignal(solver: string | undefined, node: string, target: string): boolean {
    if (solver === undefined) return true;
    const branches: string[] = [];
    this.graph.forEachOutEdge(node, (_edge, attributes, _source, to) => {
      if (attributes.role === 'signalVia') branches.push(to);
    });
    if (branches.length < 2 || this.closure(target).has(solver)) return true;
    const servesOthersOnly = some(this.closure(target), (t) => this.group(t) === 'solver');
    return !(servesOthersOnly && branches.some((b) => this.closure(b).has(solver)));
  }

  /**
   * Breadth-first from `start` (a function or an element), keeping the first path to each element. From
   * a function, signal links that serve another function's solver are not followed (see followsSignal).
   */
  paths(start: string): TracedElement[] {
    const known = this.pathsFrom.get(start);
    if (known) return known;
    const { parent, order } = this.reach(start);
    const out: TracedElement[] = [];
    for (const tag of order) {
      const a = this.graph.getNodeAttributes(tag);
      if (a.type !== 'element') continue;
      const path = [tag];
      const links: EdgeRole[] = [];
      for (let step = parent.get(tag); step; step = parent.get(step.from)) {
        path.unshift(step.from);
        links.unshift(step.role);
      }
      out.push({ tag, kind: a.kind, group: a.group, path, links });
    }
    out.sort((x, y) => (x.tag < y.tag ? -1 : x.tag > y.tag ? 1 : 0));
    this.pathsFrom.set(start, out);
    return out;
  }

  /** Breadth-first reach from `start`, stopping at process equipment; from a function, by role. */
  private reach(start: string, fnTag?: string): { parent: Map<string, { from: string; role: EdgeRole }>; order: string[] } {
    const a = this.graph.getNodeAttributes(start);
    const solver = a.type === 'function' ? this.solverOf(start) : fnTag !== undefined ? this.solverOf(fnTag) : undefined;
    const parent = new Map<string, { from: string; role: EdgeRole }>();
    const order = [start];
    const seen = new Set([start]);
    for (let i = 0; i < order.length; i++) {
      const node = order[i]!;
      if (node !== start && this.group(node) === 'equipment') continue;
      this.graph.forEachOutEdge(node, (_edge, attributes, _source, target) => {
        if (seen.has(target)) return;
        if (attributes.role === 'signalVia' && !this.followsSignal(solver, node, target)) return;
        seen.add(target);
        parent.set(target, { from: node, role: attributes.role });
        order.push(target);
      });
    }
    return { parent, order };
  }

  /** What one channel of a function relies on: its head and everything reached from it by that role. */
  private channelElements(fnTag: string, head: string): string[] {
    return this.reach(head, fnTag).order.sort();
  }

  traceFunction(tag: string): FunctionTrace {
    const known = this.traces.get(tag);
    if (known) return known;
    const a = this.graph.getNodeAttributes(tag);
    if (a.type !== 'function') throw new Error(`${tag} is not a function`);
    const channels: ChannelTrace[] = [];
    let solver = false;
    this.graph.forEachOutEdge(tag, (_edge, attributes, _source, target) => {
      if (attributes.role === 'sensor' || attributes.role === 'final') {
        channels.push({ role: attributes.role, head: target, elements: this.channelElements(tag, target) });
      }
      if (attributes.role === 'solver' || attributes.role === 'raisedIn') solver = true;
    });
    const missing: MissingPart[] = [];
    const sensors = channels.filter((c) => c.role === 'sensor');
    const finals = channels.filter((c) => c.role === 'final');
    const reachesProcess = (elements: Iterable<string>) => some(elements, (t) => PROCESS_SIDE.has(this.group(t)!));
    if (a.kind === 'device') {
      const device = this.graph.outNeighbors(tag)[0];
      if (device === undefined || !reachesProcess(this.closure(device))) missing.push('process-connection');
    } else {
      if (sensors.length === 0) missing.push('sensor');
      else if (sensors.some((c) => !reachesProcess(c.elements))) missing.push('process-connection');
      if (!solver) missing.push('solver');
      if (finals.length === 0) missing.push('final-element');
    }
    const trace: FunctionTrace = { function: tag, kind: a.kind, elements: this.paths(tag), channels, missing };
    this.traces.set(tag, trace);
    return trace;
  }
}
