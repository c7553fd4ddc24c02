// Builds one scenario's fault tree from the traces: the scenario happens when an element of the cause's
// element set fails AND every claimed layer is defeated. A layer is defeated by any element it relies on
// outside its voted channels (solver, console, operator, their supports), or by enough of its channels:
// a MooN group acts while M channels work, so N-M+1 channel failures defeat it (1oo2: both).
// Direction of failure is judged as the rules judge it (fail-direction.ts): a support whose loss trips a
// layer does not defeat it, and one whose loss drives the cause away from its dangerous direction does
// not start the scenario. Where the model does not say, the loss counts against independence.
import type { PlantFunction, Scenario } from '../model/schema.ts';
import { failsSafeWhenLost, isPowerSupport, judgeCauseSide } from '../rules/fail-direction.ts';
import { scenarioContext, type RuleEnvironment } from '../rules/run.ts';
import type { Tracer } from '../trace/trace.ts';
import { andGate, atLeastGate, event, orGate, type FaultTree } from './mocus.ts';

/** The parts of one scenario's tree a reader needs beside the cut sets: paths and gaps. */
export interface ScenarioTree {
  tree: FaultTree | undefined;
  /** Tag -> path from the cause (function or element) to it. */
  causePaths: ReadonlyMap<string, readonly string[]>;
  /** Layer tag -> (element tag -> path from the layer's function to it). */
  layerPaths: ReadonlyMap<string, ReadonlyMap<string, readonly string[]>>;
  /** Claimed layers whose trace misses a part: their cut sets are only as complete as the model. */
  incompleteLayers: string[];
  /** Claimed layers that name no function in the model. */
  unknownLayers: string[];
}

/** M and N of MooN voting; a group with no voting stated is 1ooN only when it has one channel. */
export function votingOf(voting: string | undefined, channels: number): { m: number; n: number } {
  const match = voting === undefined ? null : /^(\d+)oo(\d+)$/.exec(voting);
  // Without a stated voting, every channel is taken as needed (NooN): the conservative reading.
  return match ? { m: Number(match[1]), n: Number(match[2]) } : { m: channels, n: channels };
}

/** The vessel or line being protected is shared by nature: it is no basic event. */
const isBasic = (tracer: Tracer, tag: string) => tracer.group(tag) !== 'equipment';

/**
 * What defeats one layer, with the elements it relies on outside its channels. `failsSafe` names the
 * elements whose loss drives this layer to its trip position: they do not defeat it.
 */
export function layerTree(
  tracer: Tracer,
  fn: PlantFunction,
  failsSafe: (tag: string) => boolean = () => false,
): FaultTree {
  const anyOf = (tags: Iterable<string>): FaultTree[] => {
    const out: FaultTree[] = [];
    for (const tag of tags) if (isBasic(tracer, tag) && !failsSafe(tag)) out.push(event(tag));
    return out;
  };
  const trace = tracer.traceFunction(fn.tag);
  const relied = new Set(trace.elements.map((e) => e.tag));
  const heads = new Set(trace.channels.map((c) => c.head));
  const common = new Set<string>();
  // Solver, console, operator, device: whatever the function relies on through them, within its trace.
  tracer.graph.forEachOutEdge(fn.tag, (_edge, attributes, _source, target) => {
    if ((attributes.role === 'sensor' || attributes.role === 'final') && heads.has(target)) return;
    for (const tag of tracer.closure(target)) if (relied.has(tag)) common.add(tag);
  });
  const inputs: FaultTree[] = anyOf([...common].sort());
  for (const role of ['sensor', 'final'] as const) {
    const channels = trace.channels.filter((c) => c.role === role);
    if (channels.length === 0) continue;
    const voting = votingOf(
      role === 'sensor'
        ? 'sensorVoting' in fn
          ? fn.sensorVoting
          : undefined
        : 'finalVoting' in fn
          ? fn.finalVoting
          : undefined,
      channels.length,
    );
    const channelTrees = channels.map((c) => orGate(anyOf(c.elements.filter((t) => !common.has(t)))));
    // A channel that relies only on common elements is an empty OR: it never fails on its own.
    inputs.push(atLeastGate(voting.n - voting.m + 1, channelTrees));
  }
  return orGate(inputs);
}

/** The fault tree of one scenario, or none when nothing in the model can start it (an external cause). */
export function scenarioTree(env: RuleEnvironment, scenario: Scenario): ScenarioTree {
  const { tracer } = env;
  const ctx = scenarioContext(env, scenario);
  const isSupport = (tag: string) => tracer.group(tag) === 'support';
  const power = (tag: string) => isPowerSupport(ctx.element(tag));
  const causePaths = new Map<string, readonly string[]>();
  for (const [tag, traced] of ctx.cause.elements) {
    if (!isBasic(tracer, tag)) continue;
    if (isSupport(tag) && tag !== ctx.cause.party.tag && !judgeCauseSide(ctx.cause, tag, power(tag), ctx).dangerous)
      continue;
    causePaths.set(tag, traced.path);
  }
  const layerPaths = new Map<string, ReadonlyMap<string, readonly string[]>>();
  const incompleteLayers: string[] = [];
  const unknownLayers: string[] = [];
  const layers: FaultTree[] = [];
  for (const side of ctx.layers) {
    const fn = side.fn;
    if (!fn) {
      unknownLayers.push(side.party.tag!);
      continue;
    }
    if (tracer.traceFunction(fn.tag).missing.length) incompleteLayers.push(fn.tag);
    const failsSafe = (tag: string) => isSupport(tag) && failsSafeWhenLost(side, tag, power(tag), ctx);
    layerPaths.set(
      fn.tag,
      new Map([...side.elements].filter(([tag]) => !failsSafe(tag)).map(([tag, e]) => [tag, e.path])),
    );
    layers.push(layerTree(tracer, fn, failsSafe));
  }
  const starts = [...causePaths.keys()].sort().map(event);
  const tree = starts.length === 0 ? undefined : andGate([orGate(starts), ...layers]);
  return { tree, causePaths, layerPaths, incompleteLayers, unknownLayers };
}
