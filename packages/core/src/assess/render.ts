// The plain-text lines `bulkhead check` prints for one scenario assessment: criterion, cause, modifiers, each
// layer with claimed and allowed PFD and verdict, the three mitigated figures, gap, SIF requirement, demand mode.
import type { LayerAssessment, LayerReason, ScenarioAssessment, Sourced } from '../vocabulary/types.ts';
import { BEYOND_SIL_4, lowDemandBand } from './bands.ts';
import {
  edgeRelation,
  edgeText,
  formatFrequency,
  formatPerHour,
  formatProbability,
  formatRatio,
  gapParts,
} from './format.ts';
import { sameFigure } from './numbers.ts';

/** Printed once by a command that shows assessments: the tool supports a LOPA team, it does not replace one. */
export const ASSESSMENT_CAUTION =
  'Bulkhead checks independence and LOPA arithmetic from the model as written; it supports, and does not replace, ' +
  'a competent LOPA team. Defer to IEC 61511, local codes and licensed practice.';

const LABEL_WIDTH = 13;
const INDENT = '  ';

function row(label: string, text: string): string {
  return `${INDENT}${label.padEnd(LABEL_WIDTH)}${text}`;
}

function continuation(text: string): string {
  return `${INDENT}${' '.repeat(LABEL_WIDTH)}${text}`;
}

function origin(s: Sourced): string {
  if (s.origin === 'model') return s.basis !== undefined ? `basis: ${s.basis}` : 'no basis given';
  if (s.origin === 'sil-band') return `from the SIL band: ${s.basis ?? ''}`;
  return `default: ${s.basis ?? 'defaults table'}`;
}

const EFFECT_TEXT: Record<LayerReason['effect'], string> = {
  voids: 'no credit',
  caps: 'capped',
  unverified: 'trace incomplete, no credit',
  conflict: 'not credited together',
  note: 'noted',
};

function reasonText(r: LayerReason): string {
  const where = r.element !== undefined ? ` at ${r.element}` : '';
  const other = r.with === 'cause' ? ' with the cause' : r.with !== undefined ? ` with ${r.with}` : '';
  const effect =
    r.effect === 'caps' && r.cap !== undefined ? `capped at ${formatProbability(r.cap)}` : EFFECT_TEXT[r.effect];
  const state = r.accepted ? ', accepted' : r.severity === 'needs-justification' ? ', open until accepted' : '';
  return `- ${r.rule}${where}${other}: ${effect}${state}`;
}

function creditText(l: LayerAssessment): string {
  if (l.credited) return 'yes';
  return l.creditedIfAccepted ? 'if accepted' : 'no';
}

function pfdText(pfd: number): string {
  return pfd >= 1 ? 'none' : formatProbability(pfd);
}

function table(rows: string[][]): string[] {
  const widths: number[] = [];
  for (const r of rows) r.forEach((cell, i) => (widths[i] = Math.max(widths[i] ?? 0, cell.length)));
  return rows.map((r) =>
    r
      .map((cell, i) => (i === r.length - 1 ? cell : cell.padEnd(widths[i]! + 2)))
      .join('')
      .trimEnd(),
  );
}

function layerLines(a: ScenarioAssessment): string[] {
  if (a.layers.length === 0) return [row('layers', 'none claimed')];
  const mark = (s: Sourced) => (s.origin === 'default' ? ' (default)' : s.origin === 'sil-band' ? ' (SIL band)' : '');
  const rows = [['layer', 'kind', 'acts', 'claimed', 'allowed', 'credit', 'verdict']];
  for (const l of a.layers) {
    const allowed =
      l.allowedPfdIfAccepted !== undefined
        ? `${pfdText(l.allowedPfd)} (${pfdText(l.allowedPfdIfAccepted)} if accepted)`
        : pfdText(l.allowedPfd);
    const claimed =
      l.claimedPfd.value >= 1 && l.claimedPfd.origin === 'default'
        ? 'none'
        : `${formatProbability(l.claimedPfd.value)}${mark(l.claimedPfd)}`;
    const acts = l.function === a.sif?.function ? 'the SIF' : `${l.acts ?? 'unknown'}${l.actsStated ? '' : '*'}`;
    rows.push([l.function, l.kind, acts, claimed, allowed, creditText(l), l.verdict]);
  }
  const [head, ...body] = table(rows);
  const lines = [row('layers', head!)];
  a.layers.forEach((l, i) => {
    lines.push(continuation(body[i]!));
    if (l.claimedPfh !== undefined) {
      const allowedPfh = l.allowedPfh !== undefined ? formatPerHour(l.allowedPfh) : 'none';
      lines.push(
        continuation(
          `  high demand: judged by PFH ${formatPerHour(l.claimedPfh.value)} (${origin(l.claimedPfh)}), allowed ${allowedPfh}; its PFD does not apply`,
        ),
      );
    }
    for (const r of (l.reasons ?? []).filter((x) => x.effect !== 'note'))
      lines.push(continuation(`  ${reasonText(r)}`));
  });
  lines.push(
    continuation('acts: before or after the SIF; * by default for this type of layer, not stated on the layer line'),
  );
  return lines;
}

function verdictWord(meets: boolean): string {
  return meets ? 'meets the criterion' : 'falls short';
}

function silText(sil: number, band: { low: number; high: number } | undefined, format: (x: number) => string): string {
  if (sil === 0) return 'no SIL needed (RRF up to 10)';
  if (sil === BEYOND_SIL_4 || !band)
    return 'beyond SIL 4: not achievable by one SIF; add independent layers or change the design';
  return `SIL ${sil} (band ${format(band.low)} to ${format(band.high)})`;
}

/** The demand note, one sentence a line: it carries the order used and, in high demand, the formula and source. */
function demandLines(note: string): string[] {
  const [first, ...rest] = note.split(/(?<=\.) (?=[A-Z])/);
  return [row('demand', first!), ...rest.map(continuation)];
}

function requirementLines(a: ScenarioAssessment): string[] {
  const sif = a.sif;
  if (!sif) return [];
  const who = sif.function ?? 'a new SIF';
  const rel = edgeRelation(a.edge);
  const rrfRel = a.edge === 'below' ? '>' : '>=';
  const pfdNeed = `PFD ${rel} ${formatProbability(sif.requiredPfd)}, RRF ${rrfRel} ${formatRatio(sif.requiredRrf)}`;
  // Within a band a SIF of that SIL must still be verified to the figure; only the band's own edge is met by any SIF of it.
  const verify = (what: string, need: number, band: { high: number } | undefined, format: (x: number) => string) =>
    band && !(a.edge === 'below' && sameFigure(need, band.high)) ? `; verify ${what} ${rel} ${format(need)}` : '';
  const other =
    sif.otherReading !== undefined ? [continuation(`at this exact edge, the other reading: ${sif.otherReading}`)] : [];
  if (sif.noReductionNeeded) {
    return [
      row(
        'required',
        `${who}: no risk reduction needed from it (the other credited layers already meet the criterion)`,
      ),
      ...demandLines(sif.note),
    ];
  }
  if (sif.mode === 'low-demand') {
    const band = lowDemandBand(sif.sil);
    return [
      row(
        'required',
        `${who}: ${pfdNeed}: ${silText(sif.sil, band, formatProbability)}${verify('PFD', sif.requiredPfd, band, formatProbability)}`,
      ),
      ...other,
      ...demandLines(sif.note),
    ];
  }
  const pfh = sif.requiredPfh ?? 0;
  const lowSil = sif.lowDemandSil ?? sif.sil;
  return [
    row(
      'required',
      `${who}: PFH ${rel} ${formatPerHour(pfh)}: ${silText(sif.sil, sif.pfhBand, formatPerHour)}${verify('PFH', pfh, sif.pfhBand, formatPerHour)}`,
    ),
    ...other,
    continuation(
      `in low-demand terms ${pfdNeed} (${lowSil === BEYOND_SIL_4 ? 'beyond SIL 4' : lowSil === 0 ? 'no SIL' : `SIL ${lowSil}`}), which does not apply at this demand`,
    ),
    ...demandLines(sif.note),
  ];
}

export function renderAssessmentText(a: ScenarioAssessment): string[] {
  const lines = [`${a.scenario}${a.title !== undefined ? `  ${a.title}` : ''}`];
  const harm =
    a.harm === 'people' ? 'harm to people' : a.harm === 'containment' ? 'loss of containment' : 'asset damage';
  lines.push(
    row(
      'criterion',
      `${a.category} (${harm}): tolerable ${formatFrequency(a.tolerable)}; the mitigated frequency ${edgeText(a.edge)} it`,
    ),
  );
  lines.push(
    row('cause', `${a.cause.label}: ${formatFrequency(a.cause.frequency.value)}, ${origin(a.cause.frequency)}`),
  );
  if (a.cause.frequencyAfter !== undefined)
    lines.push(
      continuation(
        `${formatFrequency(a.cause.frequencyAfter)} used after independence until a justification accepts the claim`,
      ),
    );
  for (const e of a.enablers) {
    const state = e.allowed ? '' : e.allowedIfAccepted ? ', not applied until accepted' : ', not applied';
    lines.push(
      row(
        'enabler',
        `${e.title} ${formatProbability(e.probability)}${e.basis !== undefined ? `, basis: ${e.basis}` : ''}${state}${e.finding !== undefined && !e.allowed ? ` (${e.finding})` : ''}`,
      ),
    );
  }
  for (const m of a.modifiers) {
    const name = m.title !== undefined ? `${m.kind} (${m.title})` : m.kind;
    // A modifier the rules bar is still shown, with the finding that bars it, so nothing the user wrote vanishes.
    const state = m.allowed ? '' : m.allowedIfAccepted ? ', not applied until accepted' : ', not applied';
    lines.push(
      row(
        'modifier',
        `${name} ${formatProbability(m.probability)}${m.basis !== undefined ? `, basis: ${m.basis}` : ''}${state}${m.finding !== undefined && !m.allowed ? ` (${m.finding})` : ''}`,
      ),
    );
  }
  lines.push(...layerLines(a));
  const figures = table([
    ['as claimed', formatFrequency(a.mitigatedClaimed), verdictWord(a.meetsClaimed)],
    ['after independence', formatFrequency(a.mitigatedAfter), verdictWord(a.meetsAfter)],
    [
      'if open findings accepted',
      formatFrequency(a.mitigatedIfAccepted),
      verdictWord(a.meetsIfAccepted ?? a.mitigatedIfAccepted < a.tolerable),
    ],
  ]);
  lines.push(row('mitigated', figures[0]!), ...figures.slice(1).map(continuation));
  const gap = gapParts(a.gap);
  lines.push(row(gap.word, `${gap.figure}, after independence`));
  lines.push(...requirementLines(a));
  for (const alt of a.alternatives) {
    const set = alt.layers.length > 0 ? alt.layers.join(' + ') : 'no layer';
    lines.push(
      row(
        'alternative',
        `${set}: PFD product ${formatProbability(alt.pfdProduct)}${alt.mitigated !== undefined ? `, mitigated ${formatFrequency(alt.mitigated)}` : ''}`,
      ),
    );
  }
  return lines;
}
