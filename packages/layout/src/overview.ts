// The site overview: one node per process unit (the equipment the functions measure or protect) and
// per logic solver or controller, so a 5,000-element site never goes to the layout engine whole.
import type { Analysis, ElementGroup, Model } from '@bulkhead/core';
import { groupOf, type ElementKind } from '@bulkhead/core';
import { edgeId, type Scene, type SceneCluster, type SceneEdge, type SceneNode } from './scene.ts';

/** Most nodes the overview lays out; beyond it the units with the most findings are kept. */
export const OVERVIEW_NODE_LIMIT = 250;

const SYSTEM_LABELS: Record<string, string> = {
  bpcs: 'BPCS',
  sis: 'SIS',
  machine: 'Machine panels',
  relay: 'Relay systems',
};

export function siteOverview(model: Model, analysis: Analysis): Scene {
  const elements = new Map(model.elements.map((e) => [e.tag, e]));
  const unitFunctions = new Map<string, Set<string>>();
  const solverFunctions = new Map<string, Set<string>>();
  const pairs = new Map<string, { unit: string; solver: string }>();
  const add = (map: Map<string, Set<string>>, key: string, fn: string) => {
    const set = map.get(key) ?? new Set<string>();
    set.add(fn);
    map.set(key, set);
  };
  for (const trace of analysis.traces) {
    const measured = trace.elements.filter((t) => t.group === 'equipment' && t.links[0] !== 'final');
    const units = (measured.length > 0 ? measured : trace.elements.filter((t) => t.group === 'equipment')).map(
      (t) => t.tag,
    );
    const solvers = trace.elements.filter((t) => t.group === 'solver').map((t) => t.tag);
    for (const u of units) add(unitFunctions, u, trace.function);
    for (const s of solvers) add(solverFunctions, s, trace.function);
    for (const u of units) for (const s of solvers) pairs.set(edgeId(u, s), { unit: u, solver: s });
  }

  const scenariosOf = new Map<string, Set<string>>();
  for (const scenario of model.scenarios) {
    const tags = [scenario.cause.function, ...(scenario.layers ?? []).map((l) => l.function)].filter(
      (t): t is string => !!t,
    );
    for (const [unit, fns] of unitFunctions) if (tags.some((t) => fns.has(t))) add(scenariosOf, unit, scenario.id);
  }
  const countable = analysis.findings.filter((f) => f.severity !== 'note' && !f.accepted);
  const unitFindings = (unit: string) =>
    countable.filter((f) => f.scenario && scenariosOf.get(unit)?.has(f.scenario)).length;
  const solverFindings = (solver: string) =>
    countable.filter((f) => f.element === solver || f.paths.some((p) => p.includes(solver))).length;

  const node = (
    tag: string,
    group: ElementGroup,
    partition: number,
    facts: string[],
    findingCount: number,
  ): SceneNode => {
    const e = elements.get(tag);
    return {
      id: tag,
      role: 'area',
      tag,
      kind: e?.kind ?? group,
      group,
      facts,
      sides: [],
      partition,
      findingCount,
      ...(e?.title ? { title: e.title } : {}),
    };
  };
  const plural = (n: number, word: string) => `${n} ${word}${n === 1 ? '' : 's'}`;
  let units = [...unitFunctions].map(([tag, fns]) =>
    node(
      tag,
      'equipment',
      0,
      [plural(fns.size, 'function'), plural(scenariosOf.get(tag)?.size ?? 0, 'scenario')],
      unitFindings(tag),
    ),
  );
  const solvers = [...solverFunctions].map(([tag, fns]) => {
    const e = elements.get(tag);
    return node(
      tag,
      e ? groupOf(e.kind as ElementKind) : 'solver',
      1,
      [plural(fns.size, 'function')],
      solverFindings(tag),
    );
  });
  const notes: string[] = [];
  let shownSolvers = solvers;
  if (units.length + solvers.length > OVERVIEW_NODE_LIMIT) {
    // Too many to draw: the units with the most open findings first, each with the solvers it uses,
    // while they fit. The rest are counted in a note, never silently dropped.
    const solverOf = new Map<string, string[]>();
    for (const p of pairs.values()) solverOf.set(p.unit, [...(solverOf.get(p.unit) ?? []), p.solver]);
    const ranked = [...units].sort((a, b) => (b.findingCount ?? 0) - (a.findingCount ?? 0) || a.id.localeCompare(b.id));
    const keptUnits: SceneNode[] = [];
    const keptSolvers = new Set<string>();
    for (const unit of ranked) {
      const extra = (solverOf.get(unit.id) ?? []).filter((s) => !keptSolvers.has(s));
      if (keptUnits.length + keptSolvers.size + 1 + extra.length > OVERVIEW_NODE_LIMIT) break;
      keptUnits.push(unit);
      for (const s of extra) keptSolvers.add(s);
    }
    notes.push(
      `${units.length - keptUnits.length} of ${units.length} process units and ${solvers.length - keptSolvers.size} of ${solvers.length} solvers are not drawn; ` +
        'the units with the most open findings are. Pick a scenario to see its elements.',
    );
    units = keptUnits;
    shownSolvers = solvers.filter((s) => keptSolvers.has(s.id));
  }
  const kept = new Set(units.map((u) => u.id));
  const keptSolverIds = new Set(shownSolvers.map((s) => s.id));
  const edges: SceneEdge[] = [...pairs.values()]
    .filter((p) => kept.has(p.unit) && keptSolverIds.has(p.solver))
    .map((p) => ({
      id: edgeId(p.unit, p.solver),
      source: p.unit,
      target: p.solver,
      link: 'serves' as const,
      sides: [],
      onPath: [],
    }))
    .sort((a, b) => a.id.localeCompare(b.id));

  const bySystem = new Map<string, string[]>();
  for (const s of shownSolvers) {
    const e = elements.get(s.id);
    const system = e && 'system' in e ? e.system : 'other';
    bySystem.set(system, [...(bySystem.get(system) ?? []), s.id]);
  }
  const clusters: SceneCluster[] = [...bySystem]
    .sort(([a], [b]) => a.localeCompare(b))
    .map(([system, children]) => ({
      id: `system:${system}`,
      label: SYSTEM_LABELS[system] ?? system,
      children: children.sort(),
    }));

  return {
    view: 'overview',
    title: `${model.site.name}: overview`,
    sides: [],
    nodes: [...units, ...shownSolvers].sort((a, b) => a.id.localeCompare(b.id)),
    edges,
    findings: [],
    clusters,
    notes,
  };
}
