// The assessment's own limit checks (PFD rules, BPCS limits, modifier and cause checks) as one table of
// rule records, so the rule set in force can list them beside the independence rules, and the findings they make.
import type { Finding, RuleInForce } from '../vocabulary/types.ts';
import type { Model, SeverityLevel } from '../model/schema.ts';
import { justificationOf } from '../model/lookup.ts';

export interface AssessRule {
  id: string;
  title: string;
  rationale: string;
  source: string;
  defaultSeverity: SeverityLevel;
}

export const ASSESS_RULES = [
  {
    id: 'sif-pfd-outside-sil',
    title: 'SIF PFD outside its claimed SIL band',
    rationale:
      'A PFD better than the claimed SIL band is credited only down to the band (the SIL, not the figure, sets the design and test regime); a PFD worse than the band is used as claimed and the SIL claim is wrong.',
    source: 'IEC 61511-1:2016 Table 4',
    defaultSeverity: 'needs-justification',
  },
  {
    id: 'sif-pfh-outside-sil',
    title: 'SIF PFH outside its claimed SIL band (high demand)',
    rationale:
      'Demanded more than once a year, a SIF is judged by its dangerous failure rate per hour. A PFH better than the claimed SIL band is credited only down to the band; a PFH worse than the band is used as claimed and the SIL claim is wrong.',
    source: 'IEC 61511-1:2016 Table 5',
    defaultSeverity: 'needs-justification',
  },
  {
    id: 'sif-high-demand-no-pfh',
    title: 'SIF in high demand with no PFH and no SIL',
    rationale:
      'Demanded more than once a year, a SIF is judged by PFH, not PFD. With neither pfh= nor a claimed SIL (whose Table 5 band edge would serve) there is nothing to judge it by, and it earns no credit.',
    source: 'IEC 61511-1:2016 definitions of the demand modes and Table 5',
    defaultSeverity: 'voids-credit',
  },
  {
    id: 'bpcs-layer-cap',
    title: 'BPCS layer claims a PFD better than 0.1',
    rationale:
      'A protection layer in a BPCS not designed to IEC 61511 may claim at most a risk reduction of 10; more makes it a SIF, to be modelled as one.',
    source: 'IEC 61511-1:2016 9.3 (2003: 9.4)',
    defaultSeverity: 'voids-credit',
  },
  {
    id: 'bpcs-layer-count',
    title: 'More than two BPCS layers in one scenario',
    rationale: 'Total reliance on the BPCS in one scenario is at most two layers (two orders of magnitude).',
    source: 'IEC 61511-1:2016 9.3',
    defaultSeverity: 'voids-credit',
  },
  {
    id: 'bpcs-same-controller',
    title: 'Two BPCS layers in the same controller',
    rationale:
      'Two BPCS layers in one controller earn at most one credit (policy same-controller-layers=one-credit, the default); older CCPS practice (policy both) allowed both under conditions.',
    source: 'IEC 61511-1:2016 9.3; CCPS, Layer of Protection Analysis (2001) for the policy "both"',
    defaultSeverity: 'voids-credit',
  },
  {
    id: 'bpcs-layer-with-bpcs-cause',
    title: 'BPCS layer credited although a BPCS failure is the cause',
    rationale: 'The owner\'s policy (same-controller-layers=none) allows no BPCS layer when a BPCS failure starts the scenario.',
    source: "owner's policy, stricter than IEC 61511-1:2016 9.3 (common practice, no source)",
    defaultSeverity: 'voids-credit',
  },
  {
    id: 'human-response-floor',
    title: 'Operator response claims a PFD better than 0.1 without a human-reliability basis',
    rationale:
      'An alarm with operator response is credited at PFD 0.1 at best, wherever the alarm is raised (BPCS, SIS or a panel), unless a documented human-reliability analysis supports a lower figure (hra-basis).',
    source:
      'CCPS, Layer of Protection Analysis (2001), Table 6.5 (human response); CCPS, Guidelines for Initiating Events and Independent Protection Layers (2015), human IPLs',
    defaultSeverity: 'voids-credit',
  },
  {
    id: 'alarm-response-time',
    title: 'Too little time for the operator response',
    rationale:
      'An alarm with operator response earns credit only when the time available is at least the minimum in the criteria (policy min-response-minutes, default 10).',
    source: 'CCPS, Layer of Protection Analysis (2001), human response with at least 10 minutes (from memory)',
    defaultSeverity: 'voids-credit',
  },
  {
    id: 'check-valve-no-credit',
    title: 'Check valve credited without a stated basis',
    rationale: 'A single check valve earns little or no credit unless the model says why (credit-basis) and gives a PFD.',
    source: 'CCPS, Layer of Protection Analysis (2001), Tables 6.3 to 6.5 (from memory)',
    defaultSeverity: 'voids-credit',
  },
  {
    id: 'layer-no-pfd',
    title: 'Layer with no PFD and no default',
    rationale: 'A layer with neither a claimed PFD nor a row in the defaults table earns no credit: no number is taken as given.',
    source: 'common practice, no source',
    defaultSeverity: 'voids-credit',
  },
  {
    id: 'modifier-not-allowed',
    title: 'Conditional modifier on a criterion that is not harm to people',
    rationale:
      'Conditional modifiers (ignition, presence, injury) apply only when the consequence criterion is harm to people, not loss of containment or asset damage; the modifier is not applied.',
    source: 'CCPS, Layer of Protection Analysis (2001), conditional modifiers',
    defaultSeverity: 'voids-credit',
  },
  {
    id: 'presence-above-limit',
    title: 'Presence modifier above the policy limit',
    rationale:
      'Credit for the presence of people needs presence well below all of the time; above the policy limit (presence-limit, default 0.1) the modifier is not applied until justified.',
    source: "owner's policy (common practice, no source)",
    defaultSeverity: 'needs-justification',
  },
  {
    id: 'condition-no-basis',
    title: 'Enabling condition or conditional modifier without a basis',
    rationale:
      'An enabling condition or conditional modifier is a credit like any layer and needs a stated basis (a study, records, a time fraction worked out); without one it is not applied until a basis is recorded or a justification accepts it.',
    source: 'CCPS, Guidelines for Enabling Conditions and Conditional Modifiers in Layer of Protection Analysis (2013)',
    defaultSeverity: 'needs-justification',
  },
  {
    id: 'condition-credit-limit',
    title: 'Enablers and modifiers together take more credit than the policy allows',
    rationale:
      "The combined credit of enabling conditions and conditional modifiers is limited by the owner's policy (condition-credit-limit, default 100, two orders of magnitude); the excess is not taken until a justification accepts it.",
    source:
      "CCPS, Guidelines for Enabling Conditions and Conditional Modifiers in Layer of Protection Analysis (2013); the default limit is owner's policy, from memory",
    defaultSeverity: 'needs-justification',
  },
  {
    id: 'cause-no-basis',
    title: 'Cause frequency without a basis',
    rationale:
      'An initiating-event frequency drives every figure of the scenario; one given without a basis (failure data, site history, a table row) is used as given but stays open until a basis is recorded or a justification accepts it.',
    source: 'CCPS, Guidelines for Initiating Events and Independent Protection Layers (2015); CCPS, Guidelines for Enabling Conditions and Conditional Modifiers in Layer of Protection Analysis (2013)',
    defaultSeverity: 'needs-justification',
  },
  {
    id: 'sif-claim-no-basis',
    title: 'SIF claims a PFD or PFH without a verification basis',
    rationale:
      "A SIF's PFD (or, in high demand, PFH) must come from a SIL verification; a figure given without a basis is credited only at the conservative edge of its claimed SIL band, or not at all without a SIL, until a basis is recorded or a justification accepts it.",
    source: 'IEC 61511-1:2016 11.9 (SIF probability of failure verification) [from memory for the clause]',
    defaultSeverity: 'needs-justification',
  },
  {
    id: 'bpcs-cause-frequency-low',
    title: 'BPCS loop failure claimed below 0.1 per year',
    rationale:
      'A BPCS not designed to IEC 61511 may not be assumed to fail dangerously less often than 1e-5 per hour (about 0.0876 per year, conventionally 0.1 per year); a lower figure needs a justification and 0.1 is used until then.',
    source: 'IEC 61511-1:2003 8.2.2 (kept in 2016)',
    defaultSeverity: 'needs-justification',
  },
] as const satisfies readonly AssessRule[];

export type AssessRuleId = (typeof ASSESS_RULES)[number]['id'];

const RULES_BY_ID = new Map<string, AssessRule>(ASSESS_RULES.map((r) => [r.id, r]));

export function assessRule(id: AssessRuleId): AssessRule {
  return RULES_BY_ID.get(id)!;
}

/** The severity in force: the model's override for the rule id, else the rule's default. */
export function severityInForce(model: Model, rule: AssessRule): { severity: SeverityLevel; reason?: string } {
  const setting = model.rules?.find((r) => r.id === rule.id);
  if (!setting) return { severity: rule.defaultSeverity };
  return { severity: setting.severity, ...(setting.reason !== undefined ? { reason: setting.reason } : {}) };
}

/** Any table of rule records as the rule set in force lists them, in table order, with the model's overrides. */
export function rulesInForce(model: Model, rules: readonly AssessRule[]): RuleInForce[] {
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
  message: string;
}

export function limitFinding(model: Model, scenario: string, id: AssessRuleId, input: LimitFindingInput): Finding {
  const rule = assessRule(id);
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
    message: input.message,
    rationale: rule.rationale,
    source: rule.source,
    ...(justification ? { accepted: { by: justification.by, date: justification.date, reason: justification.reason } } : {}),
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
