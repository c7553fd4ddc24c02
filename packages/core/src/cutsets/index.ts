// Minimal cut sets per scenario: the smallest sets of elements whose failure both starts the scenario
// and defeats every claimed layer. A cut set of one element is the plainest evidence of a missing
// independence; pairs follow. Built from the traces (see scenario-tree.ts), solved by MOCUS (mocus.ts).
import { ruleEnvironment } from '../analysis/analyze.ts';
import { buildPlantGraph } from '../graph/plant-graph.ts';
import type { Model } from '../model/schema.ts';
import { Tracer } from '../trace/trace.ts';
import type { Finding } from '../vocabulary/types.ts';
import { minimalCutSets } from './mocus.ts';
import { scenarioTree } from './scenario-tree.ts';

export {
  minimalCutSets,
  minimalSets,
  occurs,
  basicEvents,
  orGate,
  andGate,
  atLeastGate,
  event,
  type FaultTree,
} from './mocus.ts';
export { scenarioTree, layerTree, votingOf, type ScenarioTree } from './scenario-tree.ts';

/** The order used when the user gives none: single points of failure and pairs. */
export const DEFAULT_CUT_SET_ORDER = 2;

export interface CutSetPath {
  element: string;
  /** 'cause', or the tag of the claimed layer this path belongs to. */
  party: string;
  path: string[];
}

export interface CutSet {
  /** The elements whose joint failure starts the scenario and defeats every claimed layer, sorted. */
  elements: string[];
  /** For each element, the path from each side that relies on it. */
  paths: CutSetPath[];
  /** Keys of the scenario's findings about these elements (a fail-safe note, an accepted finding...). */
  findings: string[];
}

export interface ScenarioCutSets {
  scenario: string;
  maxOrder: number;
  /** The claimed layers the tree requires defeated, sorted by tag (statement order does not matter). */
  layers: string[];
  /** True when no element of the model starts the scenario (an external cause): it has no cut set. */
  noStartingElement: boolean;
  cutSets: CutSet[];
  incompleteLayers: string[];
  unknownLayers: string[];
}

export interface CutSetOptions {
  maxOrder?: number;
  /** The model's findings, so each cut set lists those about its elements. */
  findings?: readonly Finding[];
  /** A tracer already built for this model (traces are memoised in it). */
  tracer?: Tracer;
}

const compareText = (a: string, b: string) => (a < b ? -1 : a > b ? 1 : 0);

/** Minimal cut sets up to `maxOrder` for every scenario, in model order. */
export function modelCutSets(model: Model, options: CutSetOptions = {}): ScenarioCutSets[] {
  const maxOrder = options.maxOrder ?? DEFAULT_CUT_SET_ORDER;
  const env = ruleEnvironment(model, options.tracer ?? new Tracer(buildPlantGraph(model)));
  const byScenario = new Map<string, Finding[]>();
  for (const f of options.findings ?? [])
    if (f.scenario !== undefined && f.element !== undefined)
      (byScenario.get(f.scenario) ?? byScenario.set(f.scenario, []).get(f.scenario)!).push(f);
  return model.scenarios.map((scenario) => {
    const built = scenarioTree(env, scenario);
    const sets = built.tree ? minimalCutSets(built.tree, maxOrder) : [];
    const findings = byScenario.get(scenario.id) ?? [];
    const cutSets = sets.map((elements): CutSet => {
      const paths: CutSetPath[] = [];
      for (const element of elements) {
        const fromCause = built.causePaths.get(element);
        if (fromCause) paths.push({ element, party: 'cause', path: [...fromCause] });
        for (const layer of [...built.layerPaths.keys()].sort(compareText)) {
          const tags = built.layerPaths.get(layer)!;
          const path = tags.get(element);
          if (path) paths.push({ element, party: layer, path: [...path] });
        }
      }
      const keys = findings.filter((f) => elements.includes(f.element!)).map((f) => f.key);
      return { elements, paths, findings: [...new Set(keys)].sort() };
    });
    return {
      scenario: scenario.id,
      maxOrder,
      layers: (scenario.layers ?? []).map((l) => l.function).sort(compareText),
      noStartingElement: built.tree === undefined,
      cutSets,
      incompleteLayers: [...built.incompleteLayers].sort(compareText),
      unknownLayers: [...built.unknownLayers].sort(compareText),
    };
  });
}
