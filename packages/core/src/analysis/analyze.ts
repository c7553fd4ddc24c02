// The analysis, one straight line: model -> graph -> traces -> independence findings -> justifications
// -> assessment per scenario. Pure and deterministic: the same model always gives the same analysis.
import { assessRulesInForce, assessScenario, bpcsFactsOf, resolvedPolicy, rulesInForce } from '../assess/index.ts';
import { INDEPENDENCE_ENTRIES } from '../catalogue/catalogue.ts';
import {
  acceptancesOf,
  acceptFindings,
  applyJustifications,
  JUSTIFICATION_RULES,
  type Acceptances,
} from '../justify/index.ts';
import type { SpanMap } from '../bulk/to-model.ts';
import { findingSpans, ModelLocator } from '../loader/locate.ts';
import type { Model, Scenario, SeverityLevel } from '../model/schema.ts';
import { findingKey as independenceFindingKey } from '../rules/define.ts';
import { causeSide, runRules, type RuleEnvironment } from '../rules/run.ts';
import { Tracer } from '../trace/trace.ts';
import { countSharedInCalculation } from './counted-in-calculation.ts';
import type { Analysis, Finding, RuleInForce, ScenarioAssessment } from '../vocabulary/types.ts';

export interface AnalyzeOptions {
  /** Spans from the loader, so each finding can point at the model lines it concerns. */
  spans?: SpanMap;
}

/** The independence rules with the severity the model's policy and rule settings put in force. */
export function independenceRulesInForce(model: Model): RuleInForce[] {
  return rulesInForce(model, INDEPENDENCE_ENTRIES);
}

/** What the rules read besides the scenario: lookups, policy and severities in force, built once per model. */
export function ruleEnvironment(
  model: Model,
  tracer: Tracer,
  independence = independenceRulesInForce(model),
): RuleEnvironment {
  const severities = new Map(independence.map((r) => [r.id, r.severity]));
  return {
    model,
    tracer,
    elements: new Map(model.elements.map((e) => [e.tag, e])),
    functions: new Map(model.functions.map((f) => [f.tag, f])),
    policy: resolvedPolicy(model),
    severity: (id) => severities.get(id) ?? 'voids-credit',
    acceptedKeys: new Set((model.justifications ?? []).map((j) => j.finding)),
  };
}

export function analyze(model: Model, options: AnalyzeOptions = {}): Analysis {
  const tracer = Tracer.ofModel(model);
  const traces = model.functions.map((f) => tracer.traceFunction(f.tag));
  const independence = independenceRulesInForce(model);
  const env = ruleEnvironment(model, tracer, independence);
  const raw: Finding[] = model.scenarios.flatMap((s) => runRules(env, s));
  // Facts and findings are gathered once for all scenarios: per scenario, the cost would grow with
  // scenarios times the site.
  const bpcs = bpcsFactsOf(model);
  // A shared element of a voted group that the SIF's computed PFD counts no longer withholds credit (issue 16, item 3).
  const counted = countSharedInCalculation(model, tracer, raw, bpcs);
  // The assessment's limit findings read their own acceptances; staleness is judged over all findings.
  const independent = applyJustifications(counted, model.justifications, options.spans).findings;
  const byScenario = groupByScenario(independent);
  const acceptances = acceptancesOf(model.justifications);
  const narrowedEnv = environmentOnceNarrowed(env);
  const assessed = model.scenarios.map((scenario) => {
    const narrowed = findingsOnceNarrowed(env, narrowedEnv, scenario, acceptances, (fs) =>
      countSharedInCalculation(model, tracer, fs, bpcs),
    );
    return assessScenario({
      model,
      scenario,
      findings: byScenario.get(scenario.id) ?? [],
      bpcs,
      functions: env.functions,
      ...(narrowed ? { findingsIfAccepted: narrowed } : {}),
    });
  });
  const all = [...independent, ...assessed.flatMap((a) => a.findings)];
  const { stale } = applyJustifications(all, model.justifications, options.spans);
  const findings = [...sortByScenario(model, all), ...stale];
  return {
    traces,
    findings: options.spans ? withSpans(findings, new ModelLocator(model, options.spans)) : findings,
    assessments: assessed.map((a, i) => withCauseElements(a.assessment, env, model.scenarios[i]!)),
    rules: [
      ...independence,
      ...assessRulesInForce(model),
      ...JUSTIFICATION_RULES.map(({ rationale: _r, ...rule }) => rule),
    ],
  };
}

/** Each finding with the places it points at in the model file, where the loader gave them. */
function withSpans(findings: Finding[], locate: ModelLocator): Finding[] {
  return findings.map((f) => {
    const { span, related } = findingSpans(f, locate);
    return { ...f, ...(span ? { span } : {}), ...(related.length ? { related } : {}) };
  });
}

/** The cause's element set travels with the assessment, so reports show what the rules compared. */
function withCauseElements(
  assessment: ScenarioAssessment,
  env: RuleEnvironment,
  scenario: Scenario,
): ScenarioAssessment {
  const elements = [...causeSide(env, scenario).elements.keys()].sort();
  return { ...assessment, cause: { ...assessment.cause, elements } };
}

/** The key of the finding that a scenario's cause is narrowed (only=), if it is. */
function narrowingKey(scenario: Scenario): string | undefined {
  const cause = scenario.cause;
  if (cause.function === undefined || cause.only === undefined) return undefined;
  return independenceFindingKey('cause-narrowed', scenario.id, [{ role: 'cause', tag: cause.function }], cause.only);
}

/**
 * The rule environment with every narrowing accepted. Built once: each key names its own scenario, so one
 * set serves all, and a copy of the accepted keys per narrowed scenario would grow with scenarios times
 * justifications.
 */
function environmentOnceNarrowed(env: RuleEnvironment): RuleEnvironment {
  const keys = env.model.scenarios
    .map(narrowingKey)
    .filter((k): k is string => k !== undefined && !env.acceptedKeys.has(k));
  return keys.length ? { ...env, acceptedKeys: new Set([...env.acceptedKeys, ...keys]) } : env;
}

/**
 * A narrowed cause (only=) not yet accepted: the rules run again as if its narrowing were accepted, so the "if open
 * findings are accepted" figure is the figure the tool will give once it is (issue 9, item 7).
 */
function findingsOnceNarrowed(
  env: RuleEnvironment,
  narrowedEnv: RuleEnvironment,
  scenario: Scenario,
  acceptances: Acceptances,
  counted: (findings: Finding[]) => Finding[],
): Finding[] | undefined {
  const key = narrowingKey(scenario);
  if (key === undefined || env.acceptedKeys.has(key)) return undefined;
  return acceptFindings(counted(runRules(narrowedEnv, scenario)), acceptances).findings;
}

function groupByScenario(findings: readonly Finding[]): Map<string | undefined, Finding[]> {
  const groups = new Map<string | undefined, Finding[]>();
  for (const f of findings) (groups.get(f.scenario) ?? groups.set(f.scenario, []).get(f.scenario)!).push(f);
  return groups;
}

function sortByScenario(model: Model, findings: Finding[]): Finding[] {
  const order = new Map(model.scenarios.map((s, i) => [s.id, i]));
  const rank: Record<SeverityLevel, number> = { 'voids-credit': 0, 'needs-justification': 1, note: 2 };
  return findings
    .map((f, i) => ({ f, i }))
    .sort(
      (a, b) =>
        (order.get(a.f.scenario ?? '') ?? 1e9) - (order.get(b.f.scenario ?? '') ?? 1e9) ||
        rank[a.f.severity] - rank[b.f.severity] ||
        a.i - b.i,
    )
    .map((x) => x.f);
}
