// The site-wide views as text and CSV: minimal cut sets per scenario (single points of failure first)
// and the common-cause ranking with its order stated. Answer first, then the evidence, one line a fact.
import { stringify } from 'csv-stringify/browser/esm/sync';
import { ASSESSMENT_CAUTION, formatFrequency } from '../assess/index.ts';
import type { ScenarioCutSets } from '../cutsets/index.ts';
import type { Model } from '../model/schema.ts';
import { RANKING_ORDER, type RankedCommonCause } from '../ranking/index.ts';
import { csvFigure, guardFormula } from './csv.ts';

const plural = (n: number, word: string) => `${n} ${word}${n === 1 ? '' : 's'}`;

/** "0 single points, 83 pairs": one count per order up to the largest asked (text and the evidence list). */
export function countByOrder(s: Pick<ScenarioCutSets, 'maxOrder' | 'cutSets'>): string {
  const counts: string[] = [];
  for (let order = 1; order <= Math.min(s.maxOrder, 9); order++) {
    const n = s.cutSets.filter((c) => c.elements.length === order).length;
    counts.push(
      order === 1
        ? plural(n, 'single point')
        : order === 2
          ? `${n} ${n === 1 ? 'pair' : 'pairs'}`
          : `${n} of order ${order}`,
    );
  }
  return counts.join(', ');
}

export const CUT_SET_METHOD =
  'A cut set is a set of elements whose joint failure both starts the scenario (an element of the cause) and defeats every claimed layer; minimal: no smaller set does. A MooN group is defeated when N-M+1 of its channels are. A support whose loss trips a layer, or drives the cause away from its stated dangerous direction, is not counted on that side. Method: MOCUS (Fussell and Vesely, 1972; NUREG-0492, ch. VII).';

/** Text for `bulkhead cut-sets`: the answer per scenario first, then each set with the paths that explain it. */
export function renderCutSetsText(model: Model, all: readonly ScenarioCutSets[]): string {
  const maxOrder = all[0]?.maxOrder ?? 0;
  const singles = all.filter((s) => s.cutSets.some((c) => c.elements.length === 1));
  const titles = new Map(model.scenarios.map((s) => [s.id, s.title]));
  const lines = [
    singles.length
      ? `${plural(singles.length, 'scenario')} of ${all.length} can be started and left unprotected by one element: ${singles.map((s) => s.scenario).join(', ')}`
      : `No scenario of ${all.length} can be started and left unprotected by one element.`,
    `Minimal cut sets up to order ${maxOrder}. ${CUT_SET_METHOD}`,
    '',
  ];
  for (const s of all) {
    const title = titles.get(s.scenario);
    lines.push(`== ${s.scenario}${title ? `: ${title}` : ''} ==`);
    lines.push(
      `  layers claimed: ${s.layers.length ? s.layers.join(', ') : 'none (any cause element alone is a cut set)'}`,
    );
    if (s.noStartingElement) {
      lines.push('  no cut set: no element of the model starts the scenario (an external cause)', '');
      continue;
    }
    lines.push(`  ${countByOrder(s)}`);
    if (s.incompleteLayers.length)
      lines.push(
        `  caution: ${s.incompleteLayers.join(', ')} has an incomplete trace; its cut sets are only as complete as the model`,
      );
    s.cutSets.forEach((c, i) => {
      lines.push(`  ${i + 1}. ${c.elements.join(' + ')}`);
      for (const p of c.paths)
        lines.push(`       ${p.element}  ${p.party === 'cause' ? 'cause' : `layer`} ${p.path.join(' -> ')}`);
      if (c.findings.length) lines.push(`       findings: ${c.findings.join(', ')}`);
    });
    lines.push('');
  }
  lines.push(ASSESSMENT_CAUTION, '');
  return lines.join('\n');
}

const frequency = (perYear: number) => formatFrequency(Math.max(0, perYear));

/** Text for `bulkhead common-causes`: the first line names the element that matters most. */
export function renderCommonCausesText(ranking: readonly RankedCommonCause[]): string {
  const open = ranking.filter((r) => r.openFindings > 0);
  const top = open[0];
  const lines = [
    top
      ? `${plural(open.length, 'element')} take part in open findings; first: ${top.element}: ${plural(top.layers, 'layer')} in ${plural(top.scenarios.length, 'scenario')}, ${frequency(top.frequencyCost)} for it alone, ${frequency(top.frequencyAtStake)} at stake in its layers`
      : 'No element takes part in an open finding.',
    RANKING_ORDER,
    '',
  ];
  for (const r of ranking) {
    const meet = r.wouldMeet.length ? `; without it ${r.wouldMeet.join(', ')} would meet the criterion` : '';
    lines.push(
      `${String(r.rank).padStart(3)}. ${r.element} (${r.kind}${r.title ? `, ${r.title}` : ''}): ${plural(r.layers, 'layer')} in ${plural(r.scenarios.length, 'scenario')}${r.scenarios.length ? ` (${r.scenarios.join(', ')})` : ''}; ${r.openFindings} of ${plural(r.findings, 'finding')} open`,
    );
    lines.push(
      `       alone it costs ${frequency(r.frequencyCost)} (summed gap lower by ${frequency(r.gapReduction)}); ${frequency(r.frequencyAtStake)} at stake in its layers${meet}`,
    );
  }
  lines.push('', ASSESSMENT_CAUTION);
  return `${lines.join('\n')}\n`;
}

export const COMMON_CAUSE_CSV_COLUMNS = [
  'rank',
  'element',
  'kind',
  'title',
  'layers',
  'scenarios',
  'scenario_ids',
  'findings',
  'open_findings',
  'frequency_cost_per_year',
  'frequency_at_stake_per_year',
  'gap_reduction_per_year',
  'would_meet',
] as const;

/** RFC 4180 CSV, one row per element, in rank order; text cells are guarded against spreadsheet formulas. */
export function renderCommonCausesCsv(ranking: readonly RankedCommonCause[]): string {
  const rows = ranking.map((r) => [
    r.rank,
    guardFormula(r.element),
    r.kind,
    guardFormula(r.title ?? ''),
    r.layers,
    r.scenarios.length,
    guardFormula(r.scenarios.join(' ')),
    r.findings,
    r.openFindings,
    csvFigure(r.frequencyCost),
    csvFigure(r.frequencyAtStake),
    csvFigure(r.gapReduction),
    guardFormula(r.wouldMeet.join(' ')),
  ]);
  return stringify([[...COMMON_CAUSE_CSV_COLUMNS], ...rows], { record_delimiter: '\r\n' });
}
