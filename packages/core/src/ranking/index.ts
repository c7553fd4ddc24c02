// Common-cause ranking across the site: each element that takes part in findings, with how many claimed
// layers and scenarios its open findings touch and what they cost. The cost is measured, not guessed:
// each affected scenario is assessed again without the findings about that element, and the drop in its
// mitigated frequency after independence is summed, so the team fixes first what lowers risk most.
import { assessScenario, bpcsFactsOf, meetsCriterion, sameFigure } from '../assess/index.ts';
import type { Model, Scenario } from '../model/schema.ts';
import { RULE_IDS } from '../rules/registry.ts';
import type { Analysis, Finding } from '../vocabulary/types.ts';

/** The order of the ranking, in words: printed with it so a reader can check it. */
export const RANKING_ORDER =
  'Ranked by the mitigated frequency the element alone costs (each scenario assessed again without the findings about it, summed, per year), then by the frequency at stake in the layers it touches (assessed again without every open finding on those layers), then by the number of claimed layers its open findings touch, then by the number of scenarios, then by tag. Open findings: not accepted and not notes. A layer voided by several elements costs nothing for any one of them alone: that shows as frequency at stake.';

export interface RankedCommonCause {
  rank: number;
  element: string;
  kind: string;
  title?: string;
  /** Claimed layers (scenario and layer) named by the element's open findings. */
  layers: number;
  /** Scenarios with an open finding about the element, by id. */
  scenarios: string[];
  /** Every finding about the element, notes and accepted ones included. */
  findings: number;
  openFindings: number;
  /** Summed drop in mitigated frequency after independence, per year, if the element were no common cause. */
  frequencyCost: number;
  /**
   * Summed drop in mitigated frequency, per year, if every open finding on the layers the element touches
   * were resolved: what the element shares with the other common causes of those layers.
   */
  frequencyAtStake: number;
  /** Summed drop in frequency above the tolerable one (the site's summed gap), per year, for the element alone. */
  gapReduction: number;
  /** Scenarios that fall short now and would meet their criterion without this common cause. */
  wouldMeet: string[];
}

/** How much lower `after` is than `before`; rounding noise and a rise (which removing findings cannot cause) count as none. */
const drop = (before: number, after: number) => (sameFigure(before, after) ? 0 : Math.max(0, before - after));

// Sums run over scenarios in id order, so the figures (and ties) do not depend on statement order.
const compareText = (a: string, b: string) => (a < b ? -1 : a > b ? 1 : 0);

const isOpen = (f: Finding) => f.accepted === undefined && f.severity !== 'note';

interface ScenarioFigure {
  mitigated: number;
  excess: number;
  meets: boolean;
}

/** Ranks every element that takes part in an independence finding. */
export function rankCommonCauses(model: Model, analysis: Analysis): RankedCommonCause[] {
  const independence = analysis.findings.filter((f) => RULE_IDS.has(f.rule) && f.scenario !== undefined);
  const byScenario = new Map<string, Finding[]>();
  for (const f of independence)
    (byScenario.get(f.scenario!) ?? byScenario.set(f.scenario!, []).get(f.scenario!)!).push(f);
  const scenarios = new Map(model.scenarios.map((s) => [s.id, s]));
  const bpcs = bpcsFactsOf(model);
  const functions = new Map(model.functions.map((f) => [f.tag, f]));
  const figure = (scenario: Scenario, findings: readonly Finding[]): ScenarioFigure => {
    const { assessment } = assessScenario({ model, scenario, findings, bpcs, functions, alternatives: 0 });
    const mitigated = assessment.mitigatedAfter;
    return {
      mitigated,
      excess: Math.max(0, mitigated - assessment.tolerable),
      meets: meetsCriterion(mitigated, assessment.tolerable, assessment.edge),
    };
  };
  const baseline = new Map<string, ScenarioFigure>();
  const baselineOf = (id: string) =>
    baseline.get(id) ?? baseline.set(id, figure(scenarios.get(id)!, byScenario.get(id) ?? [])).get(id)!;

  const about = new Map<string, Finding[]>();
  for (const f of independence)
    if (f.element !== undefined) (about.get(f.element) ?? about.set(f.element, []).get(f.element)!).push(f);
  const elements = new Map(model.elements.map((e) => [e.tag, e]));
  const rows: Omit<RankedCommonCause, 'rank'>[] = [];
  for (const [tag, findings] of about) {
    const open = findings.filter(isOpen);
    const layers = new Set(
      open.flatMap((f) => f.parties.filter((p) => p.role === 'layer').map((p) => `${f.scenario} ${p.tag}`)),
    );
    const touched = [...new Set(open.map((f) => f.scenario!))].sort(compareText);
    let frequencyCost = 0;
    let gapReduction = 0;
    let frequencyAtStake = 0;
    const wouldMeet: string[] = [];
    for (const id of touched) {
      const before = baselineOf(id);
      const after = figure(
        scenarios.get(id)!,
        (byScenario.get(id) ?? []).filter((f) => f.element !== tag),
      );
      frequencyCost += drop(before.mitigated, after.mitigated);
      gapReduction += drop(before.excess, after.excess);
      if (!before.meets && after.meets) wouldMeet.push(id);
      const mine = new Set(
        open
          .filter((f) => f.scenario === id)
          .flatMap((f) => f.parties.filter((p) => p.role === 'layer').map((p) => p.tag)),
      );
      const resolved = figure(
        scenarios.get(id)!,
        (byScenario.get(id) ?? []).filter(
          (f) => !(isOpen(f) && f.parties.some((p) => p.role === 'layer' && mine.has(p.tag))),
        ),
      );
      frequencyAtStake += drop(before.mitigated, resolved.mitigated);
    }
    const element = elements.get(tag);
    rows.push({
      element: tag,
      kind: element?.kind ?? 'unknown',
      ...(element?.title !== undefined ? { title: element.title } : {}),
      layers: layers.size,
      scenarios: touched,
      findings: findings.length,
      openFindings: open.length,
      frequencyCost,
      frequencyAtStake,
      gapReduction,
      wouldMeet,
    });
  }
  rows.sort(
    (a, b) =>
      b.frequencyCost - a.frequencyCost ||
      b.frequencyAtStake - a.frequencyAtStake ||
      b.layers - a.layers ||
      b.scenarios.length - a.scenarios.length ||
      compareText(a.element, b.element),
  );
  return rows.map((row, i) => ({ rank: i + 1, ...row }));
}
