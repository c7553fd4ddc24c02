// Facts about each function that the limit rules need: which controller or logic solver it runs in and that
// solver's system (BPCS or SIS), and what a mechanical layer's device is. Read from the model, or given.
import type { Model, PlantFunction, Scenario } from '../model/schema.ts';
import { SYSTEMS } from '../model/schema.ts';
import { elementByTag, functionByTag } from '../model/lookup.ts';

export type SolverSystem = (typeof SYSTEMS)[number];

export interface FunctionFacts {
  /** The controller or logic solver the function runs in (an alarm: where it is raised). */
  solver?: string;
  system?: SolverSystem;
  /** A mechanical layer: the kind of its device (relief-valve, rupture-disc, check-valve). */
  deviceKind?: string;
}

/** Facts by function tag. */
export type BpcsFacts = Record<string, FunctionFacts>;

function solverOf(fn: PlantFunction): string | undefined {
  if (fn.kind === 'alarm') return fn.raisedIn;
  if (fn.kind === 'device') return undefined;
  return fn.solver;
}

export function bpcsFactsOf(model: Model): BpcsFacts {
  const elements = new Map(model.elements.map((e) => [e.tag, e]));
  const facts: BpcsFacts = Object.create(null) as BpcsFacts; // keyed by the user's tags
  for (const fn of model.functions) {
    const solver = solverOf(fn);
    const element = solver !== undefined ? elements.get(solver) : undefined;
    const entry: FunctionFacts = {};
    if (solver !== undefined) entry.solver = solver;
    if (element && 'system' in element) entry.system = element.system;
    if (fn.kind === 'device') {
      const device = elements.get(fn.device);
      if (device) entry.deviceKind = device.kind;
    }
    facts[fn.tag] = entry;
  }
  return facts;
}

/** A BPCS layer: a loop, trip or alarm whose controller belongs to the BPCS (IEC 61511-1:2016 9.3). */
export function isBpcsLayer(fn: PlantFunction, facts: BpcsFacts): boolean {
  return (fn.kind === 'loop' || fn.kind === 'trip' || fn.kind === 'alarm') && facts[fn.tag]?.system === 'bpcs';
}

/** Whether a BPCS failure starts the scenario: a BPCS function, a BPCS controller, or the typical BPCS loop row. */
export function causeIsBpcsFailure(model: Model, scenario: Scenario, facts: BpcsFacts): boolean {
  const cause = scenario.cause;
  if (cause.typical === 'bpcs-loop-failure') return true;
  if (cause.function !== undefined) return facts[cause.function]?.system === 'bpcs';
  if (cause.element !== undefined) {
    const element = elementByTag(model, cause.element);
    return element !== undefined && 'system' in element && element.system === 'bpcs';
  }
  return false;
}

/** A BPCS loop failure as the cause, the case IEC 61511-1 8.2.2 bounds at 1e-5 per hour. */
export function causeIsBpcsLoopFailure(model: Model, scenario: Scenario, facts: BpcsFacts): boolean {
  const cause = scenario.cause;
  if (cause.typical === 'bpcs-loop-failure') return true;
  if (cause.function === undefined) return false;
  const fn = functionByTag(model, cause.function);
  return fn?.kind === 'loop' && facts[fn.tag]?.system === 'bpcs';
}
