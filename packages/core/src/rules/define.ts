// What an independence rule is: its catalogue entry (id, title, rationale, source, default severity,
// messages; catalogue/independence/<id>.ts) plus a check. Shared-element rules claim the elements two
// sides have in common; scenario rules look at a scenario as a whole. A rule never writes free text into
// a finding: it names one of its messages and gives that message's data.
import type { Finding, Party, TracedElement } from '../vocabulary/types.ts';
import type { FindingMessage, IndependenceRuleId } from '../catalogue/catalogue.ts';
import type { RuleEntry } from '../catalogue/define.ts';
import type { SharedVerdictData, SideRef } from '../catalogue/words.ts';
import type { ElementGroup } from '../model/kinds.ts';
import type { Element, Model, PlantFunction, Scenario, SeverityLevel } from '../model/schema.ts';
import type { ResolvedPolicy } from '../vocabulary/policy.ts';
import type { Tracer } from '../trace/trace.ts';

/** One side of a comparison: the cause's element set, or a claimed layer's trace. */
export interface Side {
  party: Party;
  fn?: PlantFunction;
  /** Tag to traced element, with the path from this side's function (or cause element) to it. */
  elements: ReadonlyMap<string, TracedElement>;
  /** For a layer, its index in the scenario's layer list (for spans). */
  layerIndex?: number;
}

export type { ResolvedPolicy };

export interface ScenarioContext {
  model: Model;
  scenario: Scenario;
  cause: Side;
  layers: Side[];
  tracer: Tracer;
  element(tag: string): Element;
  fn(tag: string): PlantFunction | undefined;
  policy: ResolvedPolicy;
  severity(ruleId: string): SeverityLevel;
}

export interface PairContext extends ScenarioContext {
  a: Side;
  b: Side;
}

/** A finding before the runner gives it its key, title, rationale and source. */
export interface FindingDraft {
  parties: Party[];
  element?: string;
  paths: string[][];
  says: FindingMessage;
  severity?: SeverityLevel;
  /** Extra words for the stable key when element alone does not make it unique. */
  keyDetail?: string;
}

type RuleMeta = Omit<RuleEntry<IndependenceRuleId>, 'messages' | 'kind'>;

export interface SharedElementRule extends RuleMeta {
  type: 'shared';
  /** Element groups this rule may claim; the runner asks rules in registry order. */
  groups: readonly ElementGroup[];
  claims?(element: Element, pair: PairContext): boolean;
  /**
   * The element and what it alone relies on are one unit (a controller with its power and cabinet): a
   * finding on it speaks for what lies beneath it at any severity, so a policy that allows sharing the
   * controller is not undone by its own power supply.
   */
  coversDependencies?(element: Element): boolean;
  /** Severity for this occurrence (e.g. a support that fails safe is a note); default: the rule's in force. */
  judge?(element: Element, pair: PairContext, inForce: SeverityLevel): SeverityLevel;
  /** What the finding says; `beneath` are the shared elements under this one that it speaks for. */
  message(element: Element, pair: PairContext, severity: SeverityLevel, beneath: string[]): FindingMessage;
}

export interface ScenarioRule extends RuleMeta {
  type: 'scenario';
  check(ctx: ScenarioContext): FindingDraft[];
}

export type Rule = SharedElementRule | ScenarioRule;

type Check<R> = Omit<R, 'type' | keyof RuleMeta>;

function metaOf(entry: RuleEntry<IndependenceRuleId>): RuleMeta {
  return {
    id: entry.id,
    title: entry.title,
    rationale: entry.rationale,
    source: entry.source,
    defaultSeverity: entry.defaultSeverity,
  };
}

export function defineSharedRule(
  entry: RuleEntry<IndependenceRuleId>,
  check: Check<SharedElementRule>,
): SharedElementRule {
  return { type: 'shared', ...metaOf(entry), ...check };
}

export function defineScenarioRule(entry: RuleEntry<IndependenceRuleId>, check: Check<ScenarioRule>): ScenarioRule {
  return { type: 'scenario', ...metaOf(entry), ...check };
}

export const SEVERITY_RANK: Record<SeverityLevel, number> = { 'voids-credit': 3, 'needs-justification': 2, note: 1 };

export function partyKey(party: Party): string {
  return party.tag ?? 'external';
}

/** A side as a message names it (catalogue/words.ts sideWords). */
export function sideRef(side: Side): SideRef {
  const ref: SideRef = { role: side.party.role };
  if (side.party.tag !== undefined) ref.tag = side.party.tag;
  if (side.party.role === 'cause' && side.fn) ref.functionKind = side.fn.kind;
  return ref;
}

export function findingKey(
  rule: string,
  scenario: string | undefined,
  parties: Party[],
  element?: string,
  detail?: string,
): string {
  return [
    rule,
    scenario ?? '-',
    parties.map(partyKey).join('+'),
    ...(element ? [element] : []),
    ...(detail ? [detail] : []),
  ].join(':');
}

/**
 * The sides compared pairwise, in the order that names a pair in keys and messages: the cause first,
 * then the layers by tag. Never the order the layers are listed in, so reordering them changes no key
 * and no accepted justification goes stale.
 */
export function sidesInKeyOrder(ctx: ScenarioContext): Side[] {
  const layers = [...ctx.layers].sort((x, y) => compareTags(x.party.tag ?? '', y.party.tag ?? ''));
  return [ctx.cause, ...layers];
}

function compareTags(a: string, b: string): number {
  return a < b ? -1 : a > b ? 1 : 0;
}

/** Rules whose key names one element from each side (element from the second party, detail from the first). */
const KEYED_BY_BOTH_SIDES = new Set(['same-make-model']);

/**
 * The key the finding had with its two layers the other way round, as keys were once given in list
 * order: a justification written against it still accepts the finding. Undefined unless both parties are layers.
 */
export function mirroredKeyOf(
  finding: Pick<Finding, 'key' | 'rule' | 'scenario' | 'parties' | 'element'>,
): string | undefined {
  const [first, second] = finding.parties;
  if (finding.parties.length !== 2 || first?.role !== 'layer' || second?.role !== 'layer') return undefined;
  const head = findingKey(finding.rule, finding.scenario, finding.parties, finding.element);
  if (finding.key !== head && !finding.key.startsWith(`${head}:`)) return undefined;
  const detail = finding.key.length > head.length ? finding.key.slice(head.length + 1) : undefined;
  const swapped = [second, first];
  return KEYED_BY_BOTH_SIDES.has(finding.rule) && detail !== undefined && finding.element !== undefined
    ? findingKey(finding.rule, finding.scenario, swapped, detail, finding.element)
    : findingKey(finding.rule, finding.scenario, swapped, finding.element, detail);
}

export type { Finding };

/** The data every shared-element message starts from (catalogue/words.ts SharedVerdictData). */
export function sharedData(
  element: Element,
  pair: PairContext,
  severity: SeverityLevel,
  beneath: string[],
): SharedVerdictData {
  return { a: sideRef(pair.a), b: sideRef(pair.b), element: element.tag, kind: element.kind, severity, beneath };
}
