// Runs the independence rules over one scenario: builds each side's element set, compares every
// pair (cause and layer, layer and layer), gives each shared element to the first rule that claims
// it, and turns drafts into findings with stable keys and a stable order.
import type { Finding, Party, TracedElement } from '../vocabulary/types.ts';
import type { Element, Model, PlantFunction, Scenario, SeverityLevel } from '../model/schema.ts';
import type { Tracer } from '../trace/trace.ts';
import {
  findingKey,
  SEVERITY_RANK,
  sidesInKeyOrder,
  type FindingDraft,
  type PairContext,
  type ResolvedPolicy,
  type Rule,
  type ScenarioContext,
  type SharedElementRule,
  type Side,
} from './define.ts';
import { RULES } from './registry.ts';
import { renderMessage } from '../catalogue/catalogue.ts';

export interface RuleEnvironment {
  model: Model;
  tracer: Tracer;
  elements: ReadonlyMap<string, Element>;
  functions: ReadonlyMap<string, PlantFunction>;
  policy: ResolvedPolicy;
  severity(ruleId: string): SeverityLevel;
  /** Finding keys accepted by a justification (needed before the run for a narrowed cause). */
  acceptedKeys: ReadonlySet<string>;
}

function byTag(elements: TracedElement[]): Map<string, TracedElement> {
  return new Map(elements.map((e) => [e.tag, e]));
}

/** The cause's side: its element set as the rules compare it, with the path to each element. */
export function causeSide(env: RuleEnvironment, scenario: Scenario): Side {
  const { cause } = scenario;
  if (cause.function !== undefined) {
    const fn = env.functions.get(cause.function);
    const party: Party = { role: 'cause', tag: cause.function };
    const narrowedKey = findingKey('cause-narrowed', scenario.id, [party], cause.only);
    // A narrowed cause counts only once its finding is accepted; until then the whole loop fails.
    const start = cause.only !== undefined && env.acceptedKeys.has(narrowedKey) ? cause.only : cause.function;
    return { party, ...(fn ? { fn } : {}), elements: byTag(env.tracer.paths(start)) };
  }
  if (cause.element !== undefined)
    return { party: { role: 'cause', tag: cause.element }, elements: byTag(env.tracer.paths(cause.element)) };
  return { party: { role: 'cause' }, elements: new Map() };
}

export function scenarioContext(env: RuleEnvironment, scenario: Scenario): ScenarioContext {
  const layers: Side[] = (scenario.layers ?? []).map((claim, layerIndex) => {
    const fn = env.functions.get(claim.function);
    return {
      party: { role: 'layer', tag: claim.function },
      ...(fn ? { fn } : {}),
      elements: fn ? byTag(env.tracer.traceFunction(fn.tag).elements) : new Map(),
      layerIndex,
    };
  });
  return {
    model: env.model,
    scenario,
    cause: causeSide(env, scenario),
    layers,
    tracer: env.tracer,
    element: (tag) => env.elements.get(tag)!,
    fn: (tag) => env.functions.get(tag),
    policy: env.policy,
    severity: env.severity,
  };
}

/**
 * The elements a side reaches from its start without passing through a shared element ranked at least
 * `level` (such an element is reached, but not gone beyond), each with the element it was reached from.
 * Tracing stops at process equipment, as in the paths. A start that is itself such an element (an
 * element cause) reaches nothing beyond itself.
 */
function reachedAvoiding(
  tracer: Tracer,
  side: Side,
  rank: ReadonlyMap<string, number>,
  level: number,
): ReadonlyMap<string, string | undefined> {
  const first = side.elements.values().next();
  if (first.done) return new Map();
  const start = first.value.path[0]!;
  const reached = new Map<string, string | undefined>([[start, undefined]]);
  const blocks = (tag: string) => (rank.get(tag) ?? 0) >= level || tracer.group(tag) === 'equipment';
  if ((rank.get(start) ?? 0) >= level) return reached;
  const queue = [start];
  for (let i = 0; i < queue.length; i++) {
    const from = queue[i]!;
    tracer.forEachOutNeighbor(from, (next) => {
      // Only what the side relies on (a function follows only the signal links of its own role).
      if (reached.has(next) || !side.elements.has(next)) return;
      reached.set(next, from);
      if (!blocks(next)) queue.push(next);
    });
  }
  return reached;
}

function pathTo(reached: ReadonlyMap<string, string | undefined>, tag: string): string[] {
  const path = [tag];
  for (let at = reached.get(tag); at !== undefined; at = reached.get(at)) path.unshift(at);
  return path;
}

function sharedDrafts(pair: PairContext, shared: readonly SharedElementRule[]): (FindingDraft & { rule: Rule })[] {
  const common = [...pair.b.elements.keys()].filter(
    (tag) => pair.a.elements.has(tag) && pair.tracer.group(tag) !== 'equipment',
  );
  const claimed: { tag: string; rule: SharedElementRule; severity: SeverityLevel }[] = [];
  for (const tag of common) {
    const element = pair.element(tag);
    const group = pair.tracer.group(tag)!;
    const rule = shared.find((r) => r.groups.includes(group) && (r.claims?.(element, pair) ?? true));
    if (!rule) continue;
    const inForce = pair.severity(rule.id);
    claimed.push({ tag, rule, severity: rule.judge ? rule.judge(element, pair, inForce) : inForce });
  }
  // What a shared element relies on is shared too. List it on its own only where one side reaches it
  // by some route that passes no other shared element at least as serious: judged over every route,
  // not the one shortest path, so accepting the upper finding cannot hide a second, direct dependency.
  const rank = new Map(
    claimed.map((c) => [
      c.tag,
      c.rule.coversDependencies?.(pair.element(c.tag)) ? Infinity : SEVERITY_RANK[c.severity],
    ]),
  );
  const reach = new Map<string, ReadonlyMap<string, string | undefined>>();
  const reachOf = (side: Side, c: (typeof claimed)[number]) => {
    const level = rank.get(c.tag)!;
    const id = `${side === pair.a ? 'a' : 'b'}${level}`;
    if (!reach.has(id)) reach.set(id, reachedAvoiding(pair.tracer, side, rank, level));
    return reach.get(id)!;
  };
  const kept = claimed.filter((c) => reachOf(pair.a, c).has(c.tag) || reachOf(pair.b, c).has(c.tag));
  // The path shown is the shortest one, unless only a longer route explains why the element is listed.
  const pathFor = (side: Side, c: (typeof claimed)[number]) => {
    const reached = reachOf(side, c);
    return reached.has(c.tag) ? pathTo(reached, c.tag) : side.elements.get(c.tag)!.path;
  };
  return kept.map((c) => {
    const element = pair.element(c.tag);
    const beneath = claimed
      .filter((o) => o.tag !== c.tag && !kept.includes(o) && pair.tracer.closure(c.tag).has(o.tag))
      .map((o) => o.tag)
      .sort();
    return {
      rule: c.rule,
      parties: [pair.a.party, pair.b.party],
      element: c.tag,
      paths: [pathFor(pair.a, c), pathFor(pair.b, c)],
      says: c.rule.message(element, pair, c.severity, beneath),
      severity: c.severity,
    };
  });
}

export function runRules(env: RuleEnvironment, scenario: Scenario, rules: readonly Rule[] = RULES): Finding[] {
  const ctx = scenarioContext(env, scenario);
  const shared = rules.filter((r): r is SharedElementRule => r.type === 'shared');
  const drafts: (FindingDraft & { rule: Rule })[] = [];
  const sides = sidesInKeyOrder(ctx);
  for (let i = 0; i < sides.length; i++) {
    for (let j = i + 1; j < sides.length; j++) {
      if (j === 0) continue;
      drafts.push(...sharedDrafts({ ...ctx, a: sides[i]!, b: sides[j]! }, shared));
    }
  }
  for (const rule of rules) if (rule.type === 'scenario') drafts.push(...rule.check(ctx).map((d) => ({ ...d, rule })));
  const order = new Map<string, number>(rules.map((r, i) => [r.id, i]));
  return drafts
    .map((d): Finding => ({
      key: findingKey(d.rule.id, scenario.id, d.parties, d.element, d.keyDetail),
      rule: d.rule.id,
      title: d.rule.title,
      severity: d.severity ?? env.severity(d.rule.id),
      scenario: scenario.id,
      parties: d.parties,
      ...(d.element ? { element: d.element } : {}),
      paths: d.paths,
      ...d.says,
      message: renderMessage(d.says),
      rationale: d.rule.rationale,
      source: d.rule.source,
    }))
    .sort(
      (a, b) =>
        SEVERITY_RANK[b.severity] - SEVERITY_RANK[a.severity] ||
        order.get(a.rule)! - order.get(b.rule)! ||
        (a.key < b.key ? -1 : a.key > b.key ? 1 : 0),
    );
}
