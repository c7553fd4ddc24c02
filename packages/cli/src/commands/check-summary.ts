// The first screen of `bulkhead check`: per scenario the answer (meets or falls short after independence,
// against what, by how much), what the SIF must reach, and each layer that lost credit with the element
// that voided it. A reviewer reads this before any finding; the detail follows below it.
import {
  edgeRelation,
  formatFrequency,
  formatPerHour,
  gapParts,
  decidingReasons,
  decidingText,
  type LayerAssessment,
  type ScenarioAssessment,
} from '@bulkhead/core';
import type { Paint } from '../colour.ts';

const LABEL_WIDTH = 13;
const row = (label: string, text: string) => `  ${label.padEnd(LABEL_WIDTH)}${text}`;
const more = (text: string) => `  ${' '.repeat(LABEL_WIDTH)}${text}`;

/** The SIL the scenario asks of its SIF, and whether the SIF as drawn can be the one to give it. */
export function requirementText(a: ScenarioAssessment): string | undefined {
  const sif = a.sif;
  if (!sif) return undefined;
  if (sif.noReductionNeeded)
    return `${sif.function ?? 'a SIF'}: no risk reduction needed (the other credited layers meet the criterion)`;
  const layer = a.layers.find((l) => l.function === sif.function);
  const lost = layer && !layer.credited ? ` (${layer.function} as drawn is ${layer.verdict})` : '';
  const who = sif.function && !lost ? sif.function : 'an independent SIF';
  const pfh =
    sif.mode === 'high-demand' && sif.requiredPfh !== undefined && sif.sil > 0 && sif.sil <= 4
      ? `, high demand: PFH ${edgeRelation(a.edge)} ${formatPerHour(sif.requiredPfh)}`
      : '';
  if (sif.sil === 0) return `${who}: RRF of 10 or less, below SIL 1${lost}`;
  if (sif.sil > 4)
    return `beyond what one SIF can give (more than SIL 4): add independent layers or change the design${lost}`;
  return `${who} needs SIL ${sif.sil}${pfh}${lost}`;
}

const VERDICT_TEXT: Record<LayerAssessment['verdict'], string> = {
  independent: 'independent',
  accepted: 'credited on accepted findings',
  voided: 'voided',
  unverified: 'unverified (the model does not give every part)',
  open: 'open until justified',
  'not-selected': 'not credited: conflicts with a better layer',
};

/**
 * "SIF-101 voided by BR-101 (shared-bridle); 2 open findings": the layer, its verdict and the elements that
 * decide it, one line. A voided layer names what voids it; open findings on it are only counted.
 */
export function lostCreditText(layer: LayerAssessment): string {
  const { deciding, open } = decidingReasons(layer.reasons);
  const by = layer.verdict === 'voided' ? ' by ' : ': ';
  const rest = open > 0 ? `; ${open} open finding${open === 1 ? '' : 's'} too` : '';
  return `${layer.function} ${VERDICT_TEXT[layer.verdict]}${deciding.length ? `${by}${decidingText(deciding)}` : ''}${rest}`;
}

export function scenarioSummary(a: ScenarioAssessment, paint: Paint): string[] {
  const after = formatFrequency(a.mitigatedAfter);
  const tolerable = formatFrequency(a.tolerable);
  const gap = gapParts(a.gap);
  const verdict = a.meetsAfter ? paint.good('MEETS') : paint.bad('FALLS SHORT');
  const lines = [paint.strong(`${a.scenario}${a.title ? `  ${a.title}` : ''}`)];
  lines.push(
    row(
      'answer',
      `${verdict} after independence: ${after} against ${tolerable} tolerable, ${gap.word} ${gap.figure.replace(/ \(.*\)$/, '')}`,
    ),
  );
  const required = requirementText(a);
  if (required) lines.push(row('SIF', required));
  const lost = a.layers.filter((l) => !l.credited);
  lost.forEach((l, i) => lines.push(i === 0 ? row('lost credit', lostCreditText(l)) : more(lostCreditText(l))));
  if (!a.meetsAfter && a.meetsIfAccepted) {
    const open = a.layers.filter((l) => l.verdict === 'open').map((l) => l.function);
    lines.push(
      row(
        'if accepted',
        `meets it (${formatFrequency(a.mitigatedIfAccepted)}) once the open findings${open.length ? ` on ${open.join(', ')}` : ''} are resolved or accepted`,
      ),
    );
  } else if (!a.meetsAfter && a.meetsClaimed) {
    lines.push(row('as claimed', `meets it only as claimed (${formatFrequency(a.mitigatedClaimed)})`));
  }
  return lines;
}
