// The assessment's own limit checks (PFD rules, BPCS limits, modifier and cause checks): their rules come
// from the catalogue, and the findings they make are built here from a message of the rule.
import type { Finding, RuleInForce } from '../vocabulary/types.ts';
import type { Model, SeverityLevel } from '../model/schema.ts';
import { justificationOf } from '../model/lookup.ts';
import {
  ASSESSMENT_ENTRIES,
  catalogueEntry,
  renderMessage,
  ruleIdOf,
  type AssessmentRuleId as AssessRuleId,
  type FindingMessage,
} from '../catalogue/catalogue.ts';
import type { RuleEntry } from '../catalogue/define.ts';

/** An assessment rule as the catalogue gives it (catalogue/assessment/<id>.ts). */
export type AssessRule = RuleEntry<AssessRuleId>;

/** The assessment's rules, in the order the rule set in force lists them. */
export const ASSESS_RULES: readonly AssessRule[] = ASSESSMENT_ENTRIES;

export type { AssessRuleId };

/** The severity in force: the model's override for the rule id, else the rule's default. */
export function severityInForce(model: Model, rule: RuleEntry): { severity: SeverityLevel; reason?: string } {
  const setting = model.rules?.find((r) => r.id === rule.id);
  if (!setting) return { severity: rule.defaultSeverity };
  return { severity: setting.severity, ...(setting.reason !== undefined ? { reason: setting.reason } : {}) };
}

/** Any table of rule records as the rule set in force lists them, in table order, with the model's overrides. */
export function rulesInForce(model: Model, rules: readonly RuleEntry[]): RuleInForce[] {
  return rules.map((rule) => {
    const { severity, reason } = severityInForce(model, rule);
    return {
      id: rule.id,
      title: rule.title,
      severity,
      defaultSeverity: rule.defaultSeverity,
      source: rule.source,
      ...(reason !== undefined && severity !== rule.defaultSeverity ? { reason } : {}),
    };
  });
}

/** The assessment's own rules in force. */
export function assessRulesInForce(model: Model): RuleInForce[] {
  return rulesInForce(model, ASSESS_RULES);
}

/** Stable finding key: rule id, scenario id and the tags involved, joined by colons. */
export function findingKey(rule: string, scenario: string, tags: readonly string[]): string {
  return [rule, scenario, ...tags].join(':');
}

export interface LimitFindingInput {
  /** Tags that make the key unique within the scenario, in a stable order. */
  tags: string[];
  parties: Finding['parties'];
  element?: string;
  paths?: string[][];
  /** What the finding says: a message of an assessment rule, which names the rule. */
  says: AssessmentMessage;
}

/** A message of an assessment rule. */
export type AssessmentMessage = Extract<FindingMessage, { messageId: `${AssessRuleId}/${string}` }>;

export function limitFinding(model: Model, scenario: string, input: LimitFindingInput): Finding {
  const rule = catalogueEntry(ruleIdOf(input.says))!;
  const key = findingKey(rule.id, scenario, input.tags);
  const justification = justificationOf(model, key);
  return {
    key,
    rule: rule.id,
    title: rule.title,
    severity: severityInForce(model, rule).severity,
    scenario,
    parties: input.parties,
    ...(input.element !== undefined ? { element: input.element } : {}),
    // One path per party, as the independence findings give them; with no shared element a party's path is itself.
    paths: input.paths ?? input.parties.map((p) => (p.tag !== undefined ? [p.tag] : [])),
    ...input.says,
    message: renderMessage(input.says),
    rationale: rule.rationale,
    source: rule.source,
    ...(justification
      ? { accepted: { by: justification.by, date: justification.date, reason: justification.reason } }
      : {}),
  };
}

/** Which of the two figures a finding's effect applies to. */
export type Figure = 'after' | 'if-accepted';

/**
 * Whether a finding's effect applies to a figure. An accepted finding (a justification names its key) binds
 * neither figure, whatever its severity: the acceptance is the team's recorded decision and stays visible. Not
 * accepted, voids-credit binds both figures and needs-justification binds only the headline "after" figure
 * (the "if accepted" figure shows what accepting it is worth); a note binds nothing.
 */
export function inForce(finding: Finding, figure: Figure): boolean {
  if (finding.accepted !== undefined || finding.severity === 'note') return false;
  return finding.severity === 'voids-credit' || figure === 'after';
}
