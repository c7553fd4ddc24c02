// assessScenario: one scenario's LOPA after independence. Applies the PFD and BPCS limits, then the independence
// findings, then picks the best creditable set, and computes the figures, the gap and the SIF requirement.
import type {
  CreditAlternative,
  Finding,
  LayerAssessment,
  LayerReason,
  ScenarioAssessment,
  Sourced,
} from '../vocabulary/types.ts';
import type { Model, PlantFunction, Scenario } from '../model/schema.ts';
import { assessConditions } from './conditions.ts';
import { bestCreditableSet, type CreditProblem } from './credit.ts';
import { PER_100_M_ROWS, PER_ROW_METRES, TYPICAL_CAUSE_FREQUENCIES } from './defaults.ts';
import { bpcsFactsOf, causeIsBpcsLoopFailure, type BpcsFacts } from './facts.ts';
import { say } from '../catalogue/catalogue.ts';
import { mitigatedFigure } from './demand.ts';
import { FIGURES, assessLayerLimits, claimedPfhOf, type LayerWork, type PerFigure } from './layers.ts';
import { inForce, limitFinding, type Figure } from './limits.ts';
import { below, meetsCriterion } from './numbers.ts';
import type { OrderedLayer } from './order.ts';
import { BPCS_CAUSE_LOWEST_FREQUENCY, BPCS_LAYERS_PER_SCENARIO, resolvedPolicy } from '../vocabulary/policy.ts';
import { sifRequirement } from './requirement.ts';

export interface AssessInput {
  model: Model;
  scenario: Scenario;
  /** The independence findings; those of other scenarios are ignored. */
  findings: readonly Finding[];
  /** Controller and system of each function; read from the model when absent. */
  bpcs?: BpcsFacts;
  /** The model's functions by tag; built from the model when absent (give it when assessing many scenarios). */
  functions?: ReadonlyMap<string, PlantFunction>;
  /**
   * The independence findings as they stand once the cause's narrowing (cause only=) is accepted: the "if open findings
   * are accepted" figure uses them, so it equals the figure the tool gives after that acceptance.
   */
  findingsIfAccepted?: readonly Finding[];
  /** How many alternative credit sets to list (default 5). */
  alternatives?: number;
}

export interface AssessOutput {
  assessment: ScenarioAssessment;
  /** The findings the assessment's own limit rules made for this scenario, sorted by key. */
  findings: Finding[];
}

/** The rule id the trace rules use for a layer whose trace is incomplete: its verdict is "unverified". */
export const INCOMPLETE_TRACE_RULE = 'incomplete-trace';
/** Rules whose findings leave a layer "unverified" (what the model does not say), not "voided". */
const UNVERIFIED_RULES: ReadonlySet<string> = new Set([INCOMPLETE_TRACE_RULE, 'undeclared-supply']);

interface CauseWork {
  label: string;
  frequency: Sourced;
  perFigure: PerFigure<number>;
}

function assessCause(
  model: Model,
  scenario: Scenario,
  facts: BpcsFacts,
  functions: ReadonlyMap<string, PlantFunction>,
  mine: Finding[],
): CauseWork {
  const cause = scenario.cause;
  const fn = cause.function !== undefined ? functions.get(cause.function) : undefined;
  const label =
    cause.function !== undefined
      ? `failure of ${cause.function}${fn?.title ? ` (${fn.title})` : ''}${cause.only !== undefined ? `, narrowed to ${cause.only}` : ''}`
      : cause.element !== undefined
        ? `failure of ${cause.element}`
        : (cause.external ?? 'unnamed cause');
  let frequency: Sourced;
  if (cause.frequency !== undefined) {
    frequency = {
      value: cause.frequency,
      origin: 'model',
      ...(cause.basis !== undefined ? { basis: cause.basis } : {}),
    };
  } else if (cause.typical !== undefined) {
    const row = TYPICAL_CAUSE_FREQUENCIES[cause.typical];
    if (PER_100_M_ROWS.has(cause.typical) && cause.pipeMetres !== undefined) {
      // The row is per 100 m of pipe (CCPS 2001 Table 5.1); the loader refuses a piping row without a length.
      const value = (row.frequency * cause.pipeMetres) / PER_ROW_METRES;
      frequency = {
        value,
        origin: 'default',
        basis: `${row.title} x ${cause.pipeMetres} m / ${PER_ROW_METRES} m: ${row.source}`,
      };
    } else {
      frequency = { value: row.frequency, origin: 'default', basis: `${row.title}: ${row.source}` };
    }
  } else {
    throw new Error(`scenario ${scenario.id}: the cause has no frequency (the loader should have refused the model)`);
  }
  const perFigure = { after: frequency.value, 'if-accepted': frequency.value };
  if (frequency.origin === 'model' && frequency.basis === undefined) {
    mine.push(
      limitFinding(model, scenario.id, {
        tags: [],
        parties: [
          {
            role: 'cause',
            ...(cause.function !== undefined
              ? { tag: cause.function }
              : cause.element !== undefined
                ? { tag: cause.element }
                : {}),
          },
        ],
        says: say('cause-no-basis/no-basis', { frequency: frequency.value }),
      }),
    );
  }
  if (
    frequency.origin === 'model' &&
    causeIsBpcsLoopFailure(model, scenario, facts) &&
    below(frequency.value, BPCS_CAUSE_LOWEST_FREQUENCY)
  ) {
    const f = limitFinding(model, scenario.id, {
      tags: cause.function !== undefined ? [cause.function] : [],
      parties: [{ role: 'cause', ...(cause.function !== undefined ? { tag: cause.function } : {}) }],
      says: say('bpcs-cause-frequency-low/below-floor', {
        frequency: frequency.value,
        lowest: BPCS_CAUSE_LOWEST_FREQUENCY,
      }),
    });
    mine.push(f);
    for (const figure of FIGURES) if (inForce(f, figure)) perFigure[figure] = BPCS_CAUSE_LOWEST_FREQUENCY;
  }
  return { label, frequency, perFigure };
}

interface Conflict {
  a: string;
  b: string;
  finding: Finding;
}

/**
 * Whether the trace rules already report this pair of layers at this element with an effect on credit. Their
 * note on two BPCS layers in one controller defers to this rule, so a note does not count.
 */
function reportedPair(findings: readonly Finding[], x: string, y: string, element: string): boolean {
  return findings.some((f) => {
    if (f.severity === 'note') return false;
    const tags = f.parties.filter((p) => p.role === 'layer').map((p) => p.tag);
    return f.element === element && tags.length === 2 && tags.includes(x) && tags.includes(y);
  });
}

/**
 * The BPCS limits that bind layers together: at most two BPCS layers, at most one per controller. A pair the
 * trace rules already report at the same controller is left to them, so one fact makes one finding.
 */
function bpcsGroupFindings(
  model: Model,
  scenario: Scenario,
  works: LayerWork[],
  facts: BpcsFacts,
  reported: readonly Finding[],
  mine: Finding[],
) {
  const bpcs = works.filter((w) => w.bpcs);
  const conflicts: Conflict[] = [];
  let countFinding: Finding | undefined;
  if (bpcs.length > BPCS_LAYERS_PER_SCENARIO) {
    countFinding = limitFinding(model, scenario.id, {
      tags: [],
      parties: bpcs.map((w) => ({ role: 'layer' as const, tag: w.fn.tag })),
      says: say('bpcs-layer-count/too-many', { layers: bpcs.map((w) => w.fn.tag), most: BPCS_LAYERS_PER_SCENARIO }),
    });
    mine.push(countFinding);
  }
  if (resolvedPolicy(model).sameControllerLayers !== 'both') {
    for (let i = 0; i < bpcs.length; i++) {
      for (let j = i + 1; j < bpcs.length; j++) {
        const [x, y] = [bpcs[i]!.fn.tag, bpcs[j]!.fn.tag].sort() as [string, string];
        const controller = facts[x]?.solver;
        if (controller === undefined || controller !== facts[y]?.solver || reportedPair(reported, x, y, controller))
          continue;
        const f = limitFinding(model, scenario.id, {
          tags: [x, y],
          parties: [
            { role: 'layer', tag: x },
            { role: 'layer', tag: y },
          ],
          element: controller,
          paths: [
            [x, controller],
            [y, controller],
          ],
          says: say('bpcs-same-controller/one-controller', { layers: [x, y], controller }),
        });
        mine.push(f);
        conflicts.push({ a: x, b: y, finding: f });
      }
    }
  }
  return { countFinding, conflicts };
}

function reasonOf(f: Finding, effect: LayerReason['effect'], other?: string): LayerReason {
  return {
    key: f.key,
    rule: f.rule,
    severity: f.severity,
    effect: f.severity === 'note' ? 'note' : effect,
    ...(f.accepted ? { accepted: true } : {}),
    ...(f.element !== undefined ? { element: f.element } : {}),
    ...(other !== undefined ? { with: other } : {}),
  };
}

/**
 * A voted-group common cause that the SIF's computed figure counts (issue 16, item 3): it caps the layer's credit at
 * the computed PFD and PFH where it is in force, and never removes the credit.
 */
function countedFigures(f: Finding): { pfd: number; pfh: number } | undefined {
  if (
    f.messageId !== 'voted-group-common-cause/counted-within-claim' &&
    f.messageId !== 'voted-group-common-cause/counted-claim-missed'
  )
    return undefined;
  return { pfd: f.data.computed, pfh: f.data.computedPfh };
}

function capAtCounted(w: LayerWork, f: Finding, counted: { pfd: number; pfh: number }): void {
  // Within the claim (a note) nothing is capped; above it the computed figure is the cap.
  w.reasons.push({ ...reasonOf(f, 'caps'), ...(f.severity !== 'note' ? { cap: counted.pfd } : {}) });
  for (const figure of FIGURES) {
    if (!inForce(f, figure)) continue;
    w.pfd[figure] = Math.max(w.pfd[figure], counted.pfd);
    if (w.pfh) w.pfh[figure] = Math.max(w.pfh[figure], counted.pfh);
  }
}

/** Sorts the independence findings into single-layer effects and layer-layer conflicts. */
function applyIndependence(
  findings: readonly Finding[],
  works: Map<string, LayerWork>,
  conflicts: Conflict[],
): Map<string, Finding[]> {
  const againstLayer = new Map<string, Finding[]>();
  for (const f of findings) {
    const layers = f.parties
      .filter((p) => p.role === 'layer' && p.tag !== undefined && works.has(p.tag))
      .map((p) => p.tag!);
    const counted = countedFigures(f);
    if (counted && layers.length === 1) {
      capAtCounted(works.get(layers[0]!)!, f, counted);
      continue;
    }
    const withCause = f.parties.some((p) => p.role === 'cause');
    if (layers.length === 2 && layers[0] !== layers[1]) {
      const [a, b] = layers as [string, string];
      conflicts.push({ a, b, finding: f });
      works.get(a)!.reasons.push(reasonOf(f, 'conflict', b));
      works.get(b)!.reasons.push(reasonOf(f, 'conflict', a));
    } else if (layers.length >= 1) {
      const tag = layers[0]!;
      const effect = UNVERIFIED_RULES.has(f.rule) ? 'unverified' : 'voids';
      works.get(tag)!.reasons.push(reasonOf(f, effect, withCause ? 'cause' : undefined));
      againstLayer.set(tag, [...(againstLayer.get(tag) ?? []), f]);
    }
  }
  return againstLayer;
}

/** The same sorting as applyIndependence, without touching the layers' reasons: for the "if accepted" figure. */
function independenceEffects(
  findings: readonly Finding[],
  works: Map<string, LayerWork>,
): { conflicts: Conflict[]; againstLayer: Map<string, Finding[]> } {
  const conflicts: Conflict[] = [];
  const againstLayer = new Map<string, Finding[]>();
  for (const f of findings) {
    const layers = f.parties
      .filter((p) => p.role === 'layer' && p.tag !== undefined && works.has(p.tag))
      .map((p) => p.tag!);
    // Its cap is already on the layer, from the same finding in the headline figure.
    if (countedFigures(f)) continue;
    if (layers.length === 2 && layers[0] !== layers[1]) conflicts.push({ a: layers[0]!, b: layers[1]!, finding: f });
    else if (layers.length >= 1) againstLayer.set(layers[0]!, [...(againstLayer.get(layers[0]!) ?? []), f]);
  }
  return { conflicts, againstLayer };
}

function verdictOf(w: LayerWork, eligible: boolean, selected: boolean): LayerAssessment['verdict'] {
  const removes = (r: LayerReason) => r.effect === 'voids' || r.effect === 'unverified';
  const binding = (r: LayerReason) => !r.accepted && r.severity !== 'note';
  if (w.reasons.some((r) => r.effect === 'voids' && binding(r) && r.severity === 'voids-credit')) return 'voided';
  if (w.reasons.some((r) => r.effect === 'unverified' && binding(r))) return 'unverified';
  if (w.reasons.some((r) => removes(r) && binding(r))) return 'open';
  if (eligible && w.pfd.after < 1 && !selected) return 'not-selected';
  if (w.reasons.some((r) => r.effect !== 'note' && r.accepted)) return 'accepted';
  return 'independent';
}

/**
 * Assesses once in low-demand terms; when the demand on the scenario's SIF turns out to exceed once a year, assesses
 * again with that SIF judged by PFH (IEC 61511-1:2016 Table 5) instead of PFD (Table 4).
 */
export function assessScenario(input: AssessInput): AssessOutput {
  const first = assessOnce(input, undefined);
  const sif = first.assessment.sif;
  if (sif?.mode === 'high-demand' && sif.function !== undefined) return assessOnce(input, sif.function);
  return first;
}

function assessOnce(input: AssessInput, highDemandSif: string | undefined): AssessOutput {
  const { model, scenario } = input;
  const facts = input.bpcs ?? bpcsFactsOf(model);
  const category = model.categories.find((c) => c.id === scenario.category);
  if (!category)
    throw new Error(
      `scenario ${scenario.id}: unknown category ${scenario.category} (the loader should have refused the model)`,
    );
  const edge = category.edge ?? 'below';
  const mine: Finding[] = [];

  const functions = input.functions ?? new Map(model.functions.map((f) => [f.tag, f]));
  const cause = assessCause(model, scenario, facts, functions, mine);
  const conditions = assessConditions(model, scenario, category.harm, mine);
  const { enablers, modifiers, modifierProduct } = conditions;

  const works: LayerWork[] = [];
  for (const claim of scenario.layers ?? []) {
    const fn = functions.get(claim.function);
    if (fn)
      works.push(
        assessLayerLimits(
          { model, scenario, facts, ...(highDemandSif !== undefined ? { highDemandSif } : {}) },
          claim,
          fn,
        ),
      );
  }
  for (const w of works) mine.push(...w.findings);
  const byTag = new Map(works.map((w) => [w.fn.tag, w]));
  const scenarioFindings = input.findings.filter((f) => f.scenario === scenario.id);
  const { countFinding, conflicts } = bpcsGroupFindings(model, scenario, works, facts, scenarioFindings, mine);
  for (const c of conflicts) {
    byTag.get(c.a)!.reasons.push(reasonOf(c.finding, 'conflict', c.b));
    byTag.get(c.b)!.reasons.push(reasonOf(c.finding, 'conflict', c.a));
  }
  if (countFinding) for (const w of works.filter((x) => x.bpcs)) w.reasons.push(reasonOf(countFinding, 'conflict'));
  const groupConflicts = [...conflicts];
  const againstLayer = applyIndependence(scenarioFindings, byTag, conflicts);
  const narrowed = input.findingsIfAccepted
    ? independenceEffects(
        input.findingsIfAccepted.filter((f) => f.scenario === scenario.id),
        byTag,
      )
    : undefined;
  const conflictsFor = (figure: Figure) =>
    figure === 'if-accepted' && narrowed ? [...groupConflicts, ...narrowed.conflicts] : conflicts;
  const againstFor = (figure: Figure) => (figure === 'if-accepted' && narrowed ? narrowed.againstLayer : againstLayer);

  const eligible = (w: LayerWork, figure: Figure) =>
    !w.noCredit[figure] && !(againstFor(figure).get(w.fn.tag) ?? []).some((f) => inForce(f, figure));
  const problemFor = (figure: Figure): CreditProblem => ({
    candidates: works
      .filter((w) => eligible(w, figure))
      .map((w) => ({ tag: w.fn.tag, pfd: w.pfd[figure], ...(w.bpcs ? { group: 'bpcs' } : {}) })),
    conflicts: conflictsFor(figure)
      .filter((c) => inForce(c.finding, figure))
      .map((c) => [c.a, c.b] as const),
    ...(countFinding && inForce(countFinding, figure) ? { groupLimits: { bpcs: BPCS_LAYERS_PER_SCENARIO } } : {}),
  });
  const after = bestCreditableSet(problemFor('after'), input.alternatives ?? 5);
  const ifAccepted = bestCreditableSet(problemFor('if-accepted'), 0);
  const selectedAfter = new Set(after.best);
  const selectedIfAccepted = new Set(ifAccepted.best);

  const enablerProduct = conditions.enablerProduct;
  // The SIF the scenario is judged by: the first credited one, else the first claimed.
  const sifWork =
    works.find((w) => w.fn.kind === 'sif' && selectedAfter.has(w.fn.tag)) ?? works.find((w) => w.fn.kind === 'sif');
  const ordered = (w: LayerWork, pfd: number): OrderedLayer => ({ tag: w.fn.tag, pfd, acts: w.order.acts });
  const figureOf = (figure: Figure | 'claimed', credited: readonly LayerWork[], cause: number) => {
    const hasSif = sifWork !== undefined && credited.includes(sifWork);
    const pfh =
      sifWork === undefined
        ? undefined
        : figure === 'claimed'
          ? claimedPfhOf(sifWork.fn)?.value
          : (sifWork.pfh?.[figure] ?? claimedPfhOf(sifWork.fn)?.value);
    return mitigatedFigure({
      cause,
      enablers: enablerProduct(figure),
      modifiers: modifierProduct(figure),
      credited: credited.map((w) => ordered(w, figure === 'claimed' ? w.claimed.value : w.pfd[figure])),
      ...(hasSif ? { sif: { tag: sifWork!.fn.tag, ...(pfh !== undefined ? { pfh } : {}) } } : {}),
    }).mitigated;
  };
  const mitigatedClaimed = figureOf('claimed', works, cause.frequency.value);
  const mitigatedAfter = figureOf(
    'after',
    works.filter((w) => selectedAfter.has(w.fn.tag)),
    cause.perFigure.after,
  );
  const mitigatedIfAccepted = figureOf(
    'if-accepted',
    works.filter((w) => selectedIfAccepted.has(w.fn.tag)),
    cause.perFigure['if-accepted'],
  );
  const meetsAfter = meetsCriterion(mitigatedAfter, category.tolerable, edge);

  const layers: LayerAssessment[] = works.map((w) => {
    const f = facts[w.fn.tag];
    return {
      function: w.fn.tag,
      kind: w.fn.kind,
      ...(w.fn.title !== undefined ? { title: w.fn.title } : {}),
      claimedPfd: w.claimed,
      allowedPfd: w.noCredit.after ? 1 : w.pfd.after,
      verdict: verdictOf(w, eligible(w, 'after'), selectedAfter.has(w.fn.tag)),
      credited: selectedAfter.has(w.fn.tag),
      creditedIfAccepted: selectedIfAccepted.has(w.fn.tag),
      findings: [...new Set(w.reasons.filter((r) => r.effect !== 'note').map((r) => r.key))],
      ...(!w.noCredit['if-accepted'] && w.pfd['if-accepted'] !== (w.noCredit.after ? 1 : w.pfd.after)
        ? { allowedPfdIfAccepted: w.pfd['if-accepted'] }
        : {}),
      ...(f?.solver !== undefined ? { solver: f.solver } : {}),
      ...(f?.system !== undefined ? { system: f.system } : {}),
      reasons: w.reasons,
      // The SIF the scenario is judged by is the reference point of the order, so it has none of its own.
      ...(w !== sifWork ? { acts: w.order.acts, ...(w.order.stated ? { actsStated: true } : {}) } : {}),
      ...(w.claimedPfh !== undefined ? { claimedPfh: w.claimedPfh } : {}),
      ...(w.pfh !== undefined && !w.noCredit.after ? { allowedPfh: w.pfh.after } : {}),
    };
  });

  const sifTag = sifWork?.fn.tag;
  const sif = sifRequirement({
    tolerable: category.tolerable,
    edge,
    causeFrequency: cause.perFigure.after,
    enablers: enablerProduct('after'),
    modifiers: modifierProduct('after'),
    credited: works
      .filter((w) => selectedAfter.has(w.fn.tag))
      .map((w) => ({
        tag: w.fn.tag,
        kind: w.fn.kind,
        pfd: w.pfd.after,
        acts: w.order.acts,
        ...(w.order.stated ? { stated: true } : {}),
      })),
    ...(sifTag !== undefined ? { sif: sifTag } : {}),
    meets: meetsAfter,
  });

  const alternatives: CreditAlternative[] = after.alternatives.map((a) => ({
    ...a,
    mitigated: figureOf(
      'after',
      works.filter((w) => a.layers.includes(w.fn.tag)),
      cause.perFigure.after,
    ),
  }));
  mine.sort((a, b) => (a.key < b.key ? -1 : a.key > b.key ? 1 : 0));
  const assessment: ScenarioAssessment = {
    scenario: scenario.id,
    ...(scenario.title !== undefined ? { title: scenario.title } : {}),
    category: category.id,
    harm: category.harm,
    tolerable: category.tolerable,
    edge,
    cause: {
      label: cause.label,
      frequency: cause.frequency,
      ...(cause.perFigure.after !== cause.frequency.value ? { frequencyAfter: cause.perFigure.after } : {}),
      ...(cause.perFigure['if-accepted'] !== cause.frequency.value
        ? { frequencyIfAccepted: cause.perFigure['if-accepted'] }
        : {}),
    },
    enablers,
    modifiers,
    layers,
    mitigatedClaimed,
    mitigatedAfter,
    mitigatedIfAccepted,
    gap: mitigatedAfter / category.tolerable,
    meetsClaimed: meetsCriterion(mitigatedClaimed, category.tolerable, edge),
    meetsAfter,
    meetsIfAccepted: meetsCriterion(mitigatedIfAccepted, category.tolerable, edge),
    ...(sif ? { sif } : {}),
    alternatives,
    findings: [...new Set([...scenarioFindings, ...mine].map((f) => f.key))].sort(),
  };
  return { assessment, findings: mine };
}
