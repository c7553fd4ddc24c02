// Builds the report document from a model and its analysis: joins traces, findings and assessments per
// scenario and layer, sorts everything one way, and adds the header (file, hash, rules, policy, cautions).
import type {
  Analysis,
  Finding,
  FunctionTrace,
  LayerAssessment,
  RuleInForce,
  ScenarioAssessment,
} from '../vocabulary/types.ts';
import type { SpanMap } from '../bulk/to-model.ts';
import { JUSTIFICATION_RULES } from '../justify/apply.ts';
import type { Model } from '../model/schema.ts';
import { scenarioById } from '../model/lookup.ts';
import { meetsCriterion } from '../assess/numbers.ts';
import { POLICY_DEFAULTS } from '../vocabulary/policy.ts';
import { CATALOGUE } from '../catalogue/catalogue.ts';
import { DEFAULT_CUT_SET_ORDER, modelCutSets } from '../cutsets/index.ts';
import { RANKING_ORDER, rankCommonCauses } from '../ranking/index.ts';
import { CUT_SET_METHOD } from './site-wide.ts';
import { REPORT_FORMAT_VERSION, type LayerReport, type ReportDocument, type ScenarioReport } from './document.ts';
import { byTag, compareFindings, compareTags } from './order.ts';
import { assumptions, documentControl } from './control.ts';
import { sourceList } from './sources.ts';

export interface ReportInput {
  model: Model;
  analysis: Analysis;
  /** The model file as the user named it; SARIF uses it as the artifact's URI. */
  file: string;
  /** SHA-256 of the model file's bytes, lower-case hex (the caller computes it; core has no Node APIs). */
  sha256: string;
  /** The part files the model names, in the order first read, each with the SHA-256 of the bytes read. */
  parts?: { file: string; sha256: string }[];
  /**
   * With part files: the hash over the model file and every part (modelContentHash), which the report
   * names the model by. Without parts the model's hash is `sha256`, the file's own.
   */
  contentSha256?: string;
  toolVersion: string;
  /** YYYY-MM-DD, only when the user asks for it: without it the output is reproducible. */
  date?: string;
  /** The loader's spans: SARIF locations come from them. */
  spans?: SpanMap;
  /** Document number, revision and status from the command line; each replaces the model's own. */
  control?: { document?: string; revision?: string; status?: string };
}

export const CAUTIONS = [
  'Decision support only: this report supports a competent LOPA team and does not replace its judgement.',
  'IEC 61511, local codes and licensed engineering practice govern; where this report differs from them, defer to them.',
  'The figures are only as good as the model and the bases given for them; every value taken from a built-in default is marked as a default.',
  'What the model does not say is never taken as independence: a layer with an untraced part is unverified and earns no credit.',
] as const;

export const CONVENTIONS = [
  'Frequencies are per year; PFD is the average probability of failure on demand; RRF = 1/PFD.',
  'Mitigated frequency = cause frequency x enabling conditions x allowed conditional modifiers x PFD of each credited layer.',
  'SIL bands: IEC 61511-1:2016 Table 4 (low demand, PFDavg) and Table 5 (high demand, PFH). Under a "below" criterion a required PFD on a band edge needs the next SIL up (a PFD that must be below 0.01 needs SIL 2).',
  'After independence: only layers independent of the cause and of each other are credited, and an open finding (needs justification) withholds credit until accepted. If accepted: every open finding accepted. A voided layer earns no credit in either figure.',
  'Figures in text are rounded to two significant figures; the JSON report holds them in full.',
] as const;

/** Policy switches as the .bulk `policy` statement names them; unset ones take the assessment's defaults. */
const POLICY_SWITCHES = [
  { field: 'sameControllerLayers', name: 'same-controller-layers' },
  { field: 'sharedSolver', name: 'shared-solver' },
  { field: 'minResponseMinutes', name: 'min-response-minutes' },
  { field: 'presenceLimit', name: 'presence-limit' },
  { field: 'conditionCreditLimit', name: 'condition-credit-limit' },
] as const;

function present<T extends object>(entries: T): { [K in keyof T]: Exclude<T[K], undefined> } {
  return Object.fromEntries(Object.entries(entries).filter(([, v]) => v !== undefined)) as never;
}

function rulesInForce(analysis: Analysis): ReportDocument['rules'] {
  // RuleInForce carries no rationale: take it from the rule catalogue, so a rule with no finding in this run
  // still shows why it exists; a rule from elsewhere takes it from its first finding.
  const rationaleOf = new Map<string, string>(CATALOGUE.map((r) => [r.id, r.rationale]));
  for (const f of [...analysis.findings].sort(compareFindings))
    if (!rationaleOf.has(f.rule)) rationaleOf.set(f.rule, f.rationale);
  const rules = new Map<string, RuleInForce & { rationale?: string }>();
  for (const r of analysis.rules) rules.set(r.id, r);
  // Rules raised outside the rule table (justification checks) still belong in the rule set shown.
  for (const r of JUSTIFICATION_RULES) {
    if (!rules.has(r.id) && analysis.findings.some((f) => f.rule === r.id)) rules.set(r.id, r);
  }
  for (const f of analysis.findings) {
    if (!rules.has(f.rule))
      rules.set(f.rule, {
        id: f.rule,
        title: f.title,
        severity: f.severity,
        defaultSeverity: f.severity,
        source: f.source,
      });
  }
  return [...rules.values()].sort(byTag((r) => r.id)).map((r) =>
    present({
      id: r.id,
      title: r.title,
      severity: r.severity,
      defaultSeverity: r.defaultSeverity,
      source: r.source,
      rationale: r.rationale ?? rationaleOf.get(r.id),
      reason: r.reason,
    }),
  );
}

function causeElements(
  model: Model,
  assessment: ScenarioAssessment,
  traces: Map<string, FunctionTrace>,
): string[] | null {
  // The analysis gives the cause set the rules compared (an element cause, a narrowed cause included).
  const given = assessment.cause.elements;
  if (given !== undefined) return [...given].sort(compareTags);
  const cause = scenarioById(model, assessment.scenario)?.cause;
  if (cause?.function !== undefined && cause.only === undefined) {
    const trace = traces.get(cause.function);
    if (trace) return trace.elements.map((e) => e.tag).sort(compareTags);
  }
  if (cause?.external !== undefined) return [];
  return null;
}

function elementTitles(model: Model): Map<string, string | undefined> {
  return new Map(model.elements.map((e) => [e.tag, e.title]));
}

function traceElements(trace: FunctionTrace | undefined, titles: Map<string, string | undefined>) {
  return [...(trace?.elements ?? [])].sort(byTag((e) => e.tag)).map((e) =>
    present({
      tag: e.tag,
      kind: e.kind,
      group: e.group,
      title: titles.get(e.tag),
      path: [...e.path],
      links: [...e.links],
    }),
  );
}

function layerReport(
  layer: LayerAssessment,
  scenarioFindings: Finding[],
  trace: FunctionTrace | undefined,
  inCause: Set<string>,
  titles: Map<string, string | undefined>,
): LayerReport {
  const aboutLayer = scenarioFindings.filter((f) =>
    f.parties.some((p) => p.role === 'layer' && p.tag === layer.function),
  );
  const decided = new Set(layer.findings);
  return present({
    function: layer.function,
    kind: layer.kind,
    title: layer.title,
    claimedPfd: present({ ...layer.claimedPfd }),
    allowedPfd: layer.allowedPfd,
    verdict: layer.verdict,
    credited: layer.credited,
    creditedIfAccepted: layer.creditedIfAccepted,
    elements: traceElements(trace, titles).map((e) => ({
      ...e,
      inCause: inCause.has(e.tag),
      findings: aboutLayer.filter((f) => f.element === e.tag).map((f) => f.key),
    })),
    missing: [...(trace?.missing ?? [])].sort(compareTags),
    findings: scenarioFindings.filter((f) => decided.has(f.key)).map((f) => f.key),
    allowedPfdIfAccepted: layer.allowedPfdIfAccepted,
    solver: layer.solver,
    system: layer.system,
    reasons: layer.reasons?.map((r) => present({ ...r })),
    acts: layer.acts,
    actsStated: layer.actsStated,
    claimedPfh: layer.claimedPfh ? present({ ...layer.claimedPfh }) : undefined,
    allowedPfh: layer.allowedPfh,
  });
}

function scenarioReport(
  model: Model,
  assessment: ScenarioAssessment,
  findings: FindingIndex,
  traces: Map<string, FunctionTrace>,
  titles: Map<string, string | undefined>,
): ScenarioReport {
  const scenario = scenarioById(model, assessment.scenario);
  const cause = scenario?.cause;
  const elements = causeElements(model, assessment, traces);
  const inCause = new Set(elements ?? []);
  const mine = new Set(assessment.findings);
  const scenarioFindings = findings.about(assessment.scenario, mine);
  const layers = [...assessment.layers]
    .sort(byTag((l) => l.function))
    .map((l) => layerReport(l, scenarioFindings, traces.get(l.function), inCause, titles));
  const tagsWhere = (keep: (l: LayerReport) => boolean) => layers.filter(keep).map((l) => l.function);
  return present({
    id: assessment.scenario,
    title: assessment.title,
    category: assessment.category,
    harm: assessment.harm,
    tolerable: assessment.tolerable,
    edge: assessment.edge,
    study: studyOf(scenario),
    cause: present({
      label: assessment.cause.label,
      function: cause?.function,
      only: cause?.only,
      element: cause?.element,
      external: cause?.external,
      frequency: present({ ...assessment.cause.frequency }),
      frequencyAfter: assessment.cause.frequencyAfter,
      frequencyIfAccepted: assessment.cause.frequencyIfAccepted,
      elements,
    }),
    enablers: assessment.enablers.map((e) => present({ ...e })),
    modifiers: assessment.modifiers.map((m) => present({ ...m })),
    layers,
    lopa: [
      {
        figure: 'claimed' as const,
        layers: layers.map((l) => l.function),
        mitigated: assessment.mitigatedClaimed,
        meets: assessment.meetsClaimed,
      },
      {
        figure: 'after-independence' as const,
        layers: tagsWhere((l) => l.credited),
        mitigated: assessment.mitigatedAfter,
        meets: assessment.meetsAfter,
      },
      {
        figure: 'if-accepted' as const,
        layers: tagsWhere((l) => l.creditedIfAccepted),
        mitigated: assessment.mitigatedIfAccepted,
        meets:
          assessment.meetsIfAccepted ??
          meetsCriterion(assessment.mitigatedIfAccepted, assessment.tolerable, assessment.edge),
      },
    ],
    gap: assessment.gap,
    sif: assessment.sif
      ? present({ ...assessment.sif, pfhBand: assessment.sif.pfhBand ? { ...assessment.sif.pfhBand } : undefined })
      : undefined,
    alternatives: assessment.alternatives.map((a) =>
      present({ layers: [...a.layers], pfdProduct: a.pfdProduct, mitigated: a.mitigated }),
    ),
    findings: scenarioFindings.map((f) => f.key),
  });
}

function studyOf(scenario: Model['scenarios'][number] | undefined): ScenarioReport['study'] {
  if (!scenario) return undefined;
  const study = present({
    document: scenario.study,
    node: scenario.studyNode,
    deviation: scenario.studyDeviation,
    recommendations: scenario.studyRecommendations ? [...scenario.studyRecommendations] : undefined,
  });
  return Object.keys(study).length ? study : undefined;
}

/** The sorted findings, indexed so each scenario picks its own without scanning them all. */
class FindingIndex {
  private readonly byScenario = new Map<string | undefined, number[]>();
  private readonly byKey = new Map<string, number[]>();

  constructor(private readonly sorted: readonly Finding[]) {
    sorted.forEach((f, i) => {
      (this.byScenario.get(f.scenario) ?? this.byScenario.set(f.scenario, []).get(f.scenario)!).push(i);
      (this.byKey.get(f.key) ?? this.byKey.set(f.key, []).get(f.key)!).push(i);
    });
  }

  /** The findings of a scenario and those its assessment names by key, in the sorted order. */
  about(scenario: string, keys: ReadonlySet<string>): Finding[] {
    const at = new Set(this.byScenario.get(scenario));
    for (const key of keys) for (const i of this.byKey.get(key) ?? []) at.add(i);
    return [...at].sort((a, b) => a - b).map((i) => this.sorted[i]!);
  }
}

function findingReport(f: Finding): ReportDocument['findings'][number] {
  return present({
    key: f.key,
    rule: f.rule,
    title: f.title,
    severity: f.severity,
    scenario: f.scenario,
    parties: f.parties.map((p) => present({ role: p.role, tag: p.tag })),
    element: f.element,
    paths: f.paths.map((p) => [...p]),
    message: f.message,
    rationale: f.rationale,
    source: f.source,
    accepted: f.accepted ? { by: f.accepted.by, date: f.accepted.date, reason: f.accepted.reason } : undefined,
  });
}

/**
 * `siteWide` adds the minimal cut sets and the common-cause ranking (the evidence list in JSON, Markdown
 * and HTML shows them); the other formats and contents do not, so they skip the work.
 */
function siteWide({ model, analysis }: ReportInput): Pick<ReportDocument, 'cutSets' | 'commonCauses'> {
  return {
    cutSets: {
      method: CUT_SET_METHOD,
      maxOrder: DEFAULT_CUT_SET_ORDER,
      scenarios: modelCutSets(model, { findings: analysis.findings }).sort(byTag((s) => s.scenario)),
    },
    commonCauses: { order: RANKING_ORDER, elements: rankCommonCauses(model, analysis) },
  };
}

export function buildReportDocument(input: ReportInput, options: { siteWide?: boolean } = {}): ReportDocument {
  const { model, analysis } = input;
  const titles = elementTitles(model);
  const traces = new Map(analysis.traces.map((t) => [t.function, t]));
  const findings = [...analysis.findings].sort(compareFindings);
  const index = new FindingIndex(findings);
  const scenarios = [...analysis.assessments]
    .sort(byTag((a) => a.scenario))
    .map((a) => scenarioReport(model, a, index, traces, titles));
  const functionTitles = new Map(model.functions.map((f) => [f.tag, f.title]));
  const count = (severity: Finding['severity']) => findings.filter((f) => f.severity === severity).length;
  const policy = POLICY_SWITCHES.map(({ field, name }) => {
    const value = model.policy?.[field];
    return value === undefined
      ? { name, value: String(POLICY_DEFAULTS[field]), origin: 'default' as const }
      : { name, value: String(value), origin: 'model' as const };
  });
  const rules = rulesInForce(analysis);
  return present({
    formatVersion: REPORT_FORMAT_VERSION,
    tool: { name: 'bulkhead' as const, version: input.toolVersion },
    model: present({
      file: input.file,
      sha256: input.parts?.length ? (input.contentSha256 ?? input.sha256) : input.sha256,
      parts: input.parts?.length ? input.parts.map((p) => ({ file: p.file, sha256: p.sha256 })) : undefined,
    }),
    site: present({ name: model.site.name, description: model.site.description }),
    date: input.date,
    control: documentControl(model, input.control),
    assumptions: assumptions(model, policy),
    sources: sourceList(rules),
    cautions: [...CAUTIONS],
    conventions: [...CONVENTIONS],
    policy,
    rules,
    summary: {
      scenarios: scenarios.length,
      scenariosMeetingAfter: scenarios.filter((s) => s.lopa[1]!.meets).length,
      findings: {
        'voids-credit': count('voids-credit'),
        'needs-justification': count('needs-justification'),
        note: count('note'),
      },
      accepted: findings.filter((f) => f.accepted).length,
    },
    scenarios,
    functions: [...analysis.traces].sort(byTag((t) => t.function)).map((t) =>
      present({
        function: t.function,
        kind: t.kind,
        title: functionTitles.get(t.function),
        elements: traceElements(t, titles),
        channels: t.channels.map((c) => ({ role: c.role, head: c.head, elements: [...c.elements].sort(compareTags) })),
        missing: [...t.missing].sort(compareTags),
      }),
    ),
    findings: findings.map(findingReport),
    ...(options.siteWide === false ? {} : siteWide(input)),
  });
}
