// The focused-scenario scene: which elements to draw for one scenario (the cause's elements and each
// claimed layer's traced elements, with the links that explain them), which side relies on each, and
// which are shared. Pure data from the model and the analysis; no geometry yet.
import type {
  Analysis,
  EdgeRole,
  ElementGroup,
  ElementKind,
  Finding,
  FunctionKind,
  FunctionTrace,
  LayerVerdict,
  Model,
  SeverityLevel,
  TracedElement,
} from '@bulkhead/core';
import { groupOf } from '@bulkhead/core';
import { sideLetter, sideStyle, type SideStyle } from './sides.ts';

export interface Side {
  index: number;
  role: 'cause' | 'layer';
  /** The function (or element, for an element cause); absent for an external cause. */
  tag?: string;
  kind?: FunctionKind;
  letter: string;
  /** "Cause: LIC-101" or "Layer 1: SIF-101". */
  label: string;
  title?: string;
  verdict?: LayerVerdict;
  style: SideStyle;
}

export interface SharedMark {
  findings: string[];
  /** The most severe of the findings naming this element. */
  severity: SeverityLevel;
  /** Every finding naming it is accepted by a justification. */
  accepted: boolean;
  /** Sides the findings set against each other at this element. */
  sides: number[];
  /** shared: one element on both sides; alike: different elements that fail alike (same make and model). */
  relation: 'shared' | 'alike';
}

export type NodeRole = 'element' | 'function' | 'area';

export interface SceneNode {
  id: string;
  role: NodeRole;
  tag: string;
  /** Element kind, function kind, or for overview areas the kind of the equipment or solver. */
  kind: string;
  group: ElementGroup | 'function';
  title?: string;
  /** Short facts shown under the kind: "fails closed", "3 functions". */
  facts: string[];
  sides: number[];
  shared?: SharedMark;
  /** Rank in the reading order: process side first, then sensors, I/O, solvers, final elements. */
  partition: number;
  /** Overview only: how many findings touch this area. */
  findingCount?: number;
}

export interface SceneEdge {
  id: string;
  /** The element (or function) that relies on the target. */
  source: string;
  target: string;
  link: EdgeRole | 'serves';
  sides: number[];
  /** Sides whose finding paths run along this edge. */
  onPath: number[];
}

/** For one finding: the element it names and, per side, the edges of the path that reaches it. */
export interface FindingPath {
  key: string;
  element?: string;
  sides: number[];
  steps: { side: number; edges: string[]; nodes: string[] }[];
  /**
   * What the shared element itself relies on that every side reaches through it (a bridle's nozzles,
   * a card's cabinet): shared by the same token, with the edges from the shared element down to them.
   */
  through?: { nodes: string[]; edges: string[] };
}

/** A compound node drawn round its children: a system of solvers in the overview. */
export interface SceneCluster {
  id: string;
  label: string;
  children: string[];
}

export interface Scene {
  view: 'scenario' | 'overview';
  title: string;
  scenario?: string;
  sides: Side[];
  nodes: SceneNode[];
  edges: SceneEdge[];
  findings: FindingPath[];
  clusters: SceneCluster[];
  /** Things the reader should know about what is not drawn. */
  notes: string[];
}

/**
 * Ranks, left to right. Signal elements and equipment are split by which role reaches them, so the
 * drawing reads as a loop: process, measurement, input, solver, function, output, actuation, final element,
 * the process it acts on; supports and housings last.
 */
export const PARTITIONS = {
  equipment: 0,
  connection: 1,
  mechanical: 1,
  impulse: 2,
  sensor: 3,
  signalIn: 4,
  solver: 5,
  people: 5,
  function: 6,
  signalOut: 7,
  actuation: 8,
  final: 9,
  equipmentActedOn: 10,
  housing: 11,
  support: 11,
} as const;

const OUTPUT_ROLES = new Set<EdgeRole>(['final']);

export function edgeId(source: string, target: string): string {
  return `${source}\u2192${target}`;
}

interface NodeDraft {
  node: SceneNode;
  firstRoles: Set<EdgeRole>;
}

function failFact(element: Model['elements'][number]): string[] {
  return 'failsTo' in element && element.failsTo ? [`fails ${element.failsTo}`] : [];
}

function severityRank(s: SeverityLevel): number {
  return s === 'voids-credit' ? 2 : s === 'needs-justification' ? 1 : 0;
}

function partitionOf(group: ElementGroup | 'function', roles: Set<EdgeRole>): number {
  if (group === 'function') return PARTITIONS.function;
  const outputOnly = roles.size > 0 && [...roles].every((r) => OUTPUT_ROLES.has(r));
  if (group === 'signal') return outputOnly ? PARTITIONS.signalOut : PARTITIONS.signalIn;
  if (group === 'equipment') return outputOnly ? PARTITIONS.equipmentActedOn : PARTITIONS.equipment;
  return PARTITIONS[group];
}

/** Builds nodes and edges incrementally, merging what several sides share. */
class SceneBuilder {
  readonly nodes = new Map<string, NodeDraft>();
  readonly edges = new Map<string, SceneEdge>();
  private readonly elements: Map<string, Model['elements'][number]>;
  private readonly functions: Map<string, Model['functions'][number]>;

  constructor(model: Model) {
    this.elements = new Map(model.elements.map((e) => [e.tag, e]));
    this.functions = new Map(model.functions.map((f) => [f.tag, f]));
  }

  /** Adds a node, or adds `side` to it; without a side it is drawn but no side relies on it. */
  addNode(tag: string, side?: number, firstRole?: EdgeRole): void {
    let draft = this.nodes.get(tag);
    if (!draft) {
      const element = this.elements.get(tag);
      const fn = this.functions.get(tag);
      const node: SceneNode = element
        ? {
            id: tag,
            role: 'element',
            tag,
            kind: element.kind,
            group: groupOf(element.kind as ElementKind),
            facts: failFact(element),
            sides: [],
            partition: 0,
            ...(element.title ? { title: element.title } : {}),
          }
        : {
            id: tag,
            role: 'function',
            tag,
            kind: fn?.kind ?? 'function',
            group: 'function',
            facts: [],
            sides: [],
            partition: PARTITIONS.function,
            ...(fn?.title ? { title: fn.title } : {}),
          };
      draft = { node, firstRoles: new Set() };
      this.nodes.set(tag, draft);
    }
    if (side !== undefined && !draft.node.sides.includes(side)) draft.node.sides.push(side);
    if (firstRole) draft.firstRoles.add(firstRole);
  }

  addEdge(source: string, target: string, link: EdgeRole, side: number): SceneEdge {
    const id = edgeId(source, target);
    let edge = this.edges.get(id);
    if (!edge) {
      edge = { id, source, target, link, sides: [], onPath: [] };
      this.edges.set(id, edge);
    }
    if (!edge.sides.includes(side)) edge.sides.push(side);
    return edge;
  }

  /** Adds a traced element with every step of the path that explains it. */
  addTraced(traced: TracedElement, side: number): void {
    const role = traced.links[0];
    traced.path.forEach((tag, i) => {
      this.addNode(tag, side, i > 0 ? role : undefined);
      if (i > 0) this.addEdge(traced.path[i - 1]!, tag, traced.links[i - 1] ?? 'signalVia', side);
    });
  }

  finish(): { nodes: SceneNode[]; edges: SceneEdge[] } {
    const nodes = [...this.nodes.values()].map(({ node, firstRoles }) => {
      if (node.role === 'element') node.partition = partitionOf(node.group, firstRoles);
      node.sides.sort((a, b) => a - b);
      return node;
    });
    const edges = [...this.edges.values()];
    for (const e of edges) e.sides.sort((a, b) => a - b);
    return {
      nodes: nodes.sort((a, b) => a.id.localeCompare(b.id)),
      edges: edges.sort((a, b) => a.id.localeCompare(b.id)),
    };
  }
}

/** The part of a loop-failure cause that fails, when the scenario narrows it with `only`. */
function narrowCause(trace: FunctionTrace, only: string | undefined): TracedElement[] {
  if (!only) return trace.elements;
  return trace.elements.filter((t) => t.path.includes(only));
}

function partySide(finding: Finding, index: number, sides: Side[]): number | undefined {
  const party = finding.parties[index];
  if (!party) return undefined;
  if (party.role === 'cause') return 0;
  const side = sides.find((s) => s.role === 'layer' && s.tag === party.tag);
  return side?.index;
}

/** The elements every one of `sides` reaches through `element`, and the edges below it on those paths. */
function throughShared(
  element: string | undefined,
  sides: number[],
  sideTraces: Map<number, TracedElement[]>,
): FindingPath['through'] {
  if (element === undefined || sides.length < 2) return undefined;
  const perSide = sides.map((side) => {
    const reached = new Map<string, string[]>();
    for (const t of sideTraces.get(side) ?? []) {
      const at = t.path.indexOf(element);
      if (at >= 0 && t.tag !== element && t.group !== 'equipment') reached.set(t.tag, t.path.slice(at));
    }
    return reached;
  });
  const nodes = [...perSide[0]!.keys()].filter((tag) => perSide.every((r) => r.has(tag))).sort();
  if (nodes.length === 0) return undefined;
  const edges = new Set<string>();
  for (const tag of nodes) {
    const below = perSide[0]!.get(tag)!;
    for (let i = 1; i < below.length; i++) edges.add(edgeId(below[i - 1]!, below[i]!));
  }
  return { nodes, edges: [...edges].sort() };
}

export function scenarioScene(model: Model, analysis: Analysis, scenarioId: string): Scene {
  const scenario = model.scenarios.find((s) => s.id === scenarioId);
  if (!scenario) throw new Error(`no scenario ${scenarioId} in the model`);
  const assessment = analysis.assessments.find((a) => a.scenario === scenarioId);
  const traces = new Map(analysis.traces.map((t) => [t.function, t]));
  const builder = new SceneBuilder(model);
  const notes: string[] = [];

  const cause = scenario.cause;
  const causeTag = cause.function ?? cause.element;
  const sides: Side[] = [
    {
      index: 0,
      role: 'cause',
      letter: sideLetter(0),
      label: causeTag ? `Cause: ${causeTag}` : `Cause: ${cause.external ?? 'external'}`,
      style: sideStyle(0),
      ...(causeTag ? { tag: causeTag } : {}),
      ...(cause.function ? { kind: model.functions.find((f) => f.tag === cause.function)?.kind ?? 'loop' } : {}),
      ...(assessment?.cause.label ? { title: assessment.cause.label } : {}),
    },
  ];
  (scenario.layers ?? []).forEach((claim, i) => {
    const fn = model.functions.find((f) => f.tag === claim.function);
    const verdict = assessment?.layers.find((l) => l.function === claim.function)?.verdict;
    sides.push({
      index: i + 1,
      role: 'layer',
      tag: claim.function,
      letter: sideLetter(i + 1),
      label: `Layer ${i + 1}: ${claim.function}`,
      style: sideStyle(i + 1),
      ...(fn ? { kind: fn.kind } : {}),
      ...(fn?.title ? { title: fn.title } : {}),
      ...(verdict ? { verdict } : {}),
    });
  });

  if (cause.function) {
    const trace = traces.get(cause.function);
    builder.addNode(cause.function, 0);
    if (trace) for (const t of narrowCause(trace, cause.only)) builder.addTraced(t, 0);
    else notes.push(`No trace for the cause ${cause.function}.`);
  } else if (cause.element) {
    builder.addNode(cause.element, 0);
  } else {
    notes.push(`The cause is external (${cause.external ?? 'not named'}): it has no elements to draw.`);
  }
  for (const side of sides.slice(1)) {
    builder.addNode(side.tag!, side.index);
    const trace = traces.get(side.tag!);
    if (trace) for (const t of trace.elements) builder.addTraced(t, side.index);
    else notes.push(`No trace for ${side.tag}: it is drawn alone.`);
    if (trace && trace.missing.length > 0) notes.push(`${side.tag} is missing: ${trace.missing.join(', ')}.`);
  }

  const sideTraces = new Map<number, TracedElement[]>();
  if (cause.function && traces.get(cause.function))
    sideTraces.set(0, narrowCause(traces.get(cause.function)!, cause.only));
  for (const side of sides.slice(1)) sideTraces.set(side.index, traces.get(side.tag!)?.elements ?? []);

  const findings = analysis.findings.filter((f) => f.scenario === scenarioId);
  const findingPaths: FindingPath[] = [];
  const marks = new Map<string, SharedMark>();
  for (const finding of findings) {
    const fp: FindingPath = {
      key: finding.key,
      sides: [],
      steps: [],
      ...(finding.element ? { element: finding.element } : {}),
    };
    finding.paths.forEach((path, i) => {
      const side = partySide(finding, i, sides);
      if (side === undefined) return;
      fp.sides.push(side);
      const step = { side, edges: [] as string[], nodes: [...path] };
      path.forEach((tag, j) => {
        builder.addNode(tag, side);
        if (j === 0) return;
        const edge =
          builder.edges.get(edgeId(path[j - 1]!, tag)) ?? builder.addEdge(path[j - 1]!, tag, 'signalVia', side);
        if (!edge.onPath.includes(side)) edge.onPath.push(side);
        step.edges.push(edge.id);
      });
      fp.steps.push(step);
    });
    const through = throughShared(
      finding.element,
      fp.steps.map((st) => st.side),
      sideTraces,
    );
    if (through) fp.through = through;
    if (fp.sides.length === 0)
      for (const p of finding.parties) {
        const side = p.role === 'cause' ? 0 : sides.find((s) => s.tag === p.tag)?.index;
        if (side !== undefined && !fp.sides.includes(side)) fp.sides.push(side);
      }
    findingPaths.push(fp);
    const ends = [...new Set(finding.paths.map((p) => p[p.length - 1]).filter((t): t is string => t !== undefined))];
    const sharedOne = finding.element !== undefined && ends.every((t) => t === finding.element);
    const marked = sharedOne
      ? [finding.element!]
      : [...new Set([...(finding.element ? [finding.element] : []), ...(ends.length > 1 ? ends : [])])];
    for (const tag of marked) {
      const mark = marks.get(tag) ?? {
        findings: [],
        severity: 'note' as SeverityLevel,
        accepted: true,
        sides: [],
        relation: 'alike' as const,
      };
      mark.findings.push(finding.key);
      if (severityRank(finding.severity) > severityRank(mark.severity)) mark.severity = finding.severity;
      mark.accepted &&= finding.accepted !== undefined;
      if (sharedOne) mark.relation = 'shared';
      for (const s of fp.sides) if (!mark.sides.includes(s)) mark.sides.push(s);
      mark.sides.sort((a, b) => a - b);
      marks.set(tag, mark);
      builder.addNode(tag);
    }
  }

  const { nodes, edges } = builder.finish();
  for (const node of nodes) {
    const mark = marks.get(node.id);
    if (mark) node.shared = mark;
  }
  for (const e of edges) e.onPath.sort((a, b) => a - b);
  return {
    view: 'scenario',
    title: `${scenario.id}${scenario.title ? ': ' + scenario.title : ''}`,
    scenario: scenario.id,
    sides,
    nodes,
    edges,
    findings: findingPaths,
    clusters: [],
    notes,
  };
}
