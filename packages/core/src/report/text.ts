// The words and number formats the reports share: verdict labels, sourced values, paths, SIF lines.
// Numbers follow the assessment's own text format, so a report and `bulkhead check` print the same figures.
import { edgeRelation, edgeText, formatFrequency, formatProbability, formatRatio, gapText } from '../assess/format.ts';
import type { ReportDocument, ScenarioReport } from './document.ts';
import { code, codeList, type Rich } from './blocks.ts';

export { formatFrequency, formatProbability, formatRatio, gapText };

export const VERDICT_LABELS: Record<ScenarioReport['layers'][number]['verdict'], string> = {
  independent: 'independent',
  voided: 'voided',
  unverified: 'unverified',
  open: 'open: needs a justification',
  accepted: 'accepted',
  'not-selected': 'independent, not selected',
};

export const SEVERITY_LABELS = {
  'voids-credit': 'voids credit',
  'needs-justification': 'needs justification',
  note: 'note',
} as const;

export const FIGURE_LABELS = {
  claimed: 'As claimed',
  'after-independence': 'After independence',
  'if-accepted': 'If open findings are accepted',
} as const;

export const MISSING_LABELS: Record<string, string> = {
  sensor: 'no sensor',
  'process-connection': 'no process connection for a sensor',
  solver: 'no logic solver or controller',
  'final-element': 'no final element',
  operator: 'no operator',
};

type Sourced = ScenarioReport['cause']['frequency'];

function origin(value: Sourced): string {
  if (value.origin === 'model') return value.basis ? `given; basis: ${value.basis}` : 'given, no basis stated';
  if (value.origin === 'sil-band') return `edge of the claimed SIL band${value.basis ? `; ${value.basis}` : ''}`;
  return `default${value.basis ? `: ${value.basis}` : ''}`;
}

export function sourcedProbability(value: Sourced): string {
  return `${formatProbability(value.value)} (${origin(value)})`;
}

export function sourcedFrequency(value: Sourced): string {
  return `${formatFrequency(value.value)} (${origin(value)})`;
}

export function yesNo(value: boolean): string {
  return value ? 'yes' : 'no';
}

export function pathText(path: readonly string[]): Rich {
  return codeList(path, ' -> ');
}

const HARM_TEXT = { people: 'harm to people', containment: 'loss of containment', asset: 'asset damage' } as const;

export function criterionText(s: ScenarioReport): string {
  return `tolerable ${formatFrequency(s.tolerable)} for category ${s.category} (${HARM_TEXT[s.harm]}); the mitigated frequency ${edgeText(s.edge)} it`;
}

export function silText(sil: number): string {
  if (sil === 0) return 'no SIL needed (RRF 10 or less)';
  if (sil >= 5) return 'beyond SIL 4: no single SIF can close the gap';
  return `SIL ${sil}`;
}

/** The SIF requirement as one sentence, the other reading at an exact edge, then the note on demand mode and order. */
export function sifText(s: ScenarioReport): Rich | undefined {
  const sif = s.sif;
  if (!sif) return undefined;
  const who: Rich = sif.function
    ? ['Required of ', code(sif.function), ': ']
    : ['A SIF that closes the gap would need: '];
  const relation = edgeRelation(s.edge);
  const note = sif.note
    ? ` ${sif.note[0]!.toUpperCase()}${sif.note.slice(1)}${/[.!?]$/.test(sif.note) ? '' : '.'}`
    : '';
  if (sif.noReductionNeeded)
    return [...who, `no risk reduction (the other credited layers already meet the criterion).${note}`];
  const other = sif.otherReading !== undefined ? ` At this exact edge, the other reading: ${sif.otherReading}.` : '';
  const pfd = `PFD ${relation} ${formatProbability(sif.requiredPfd)} (RRF ${relation === '<' ? '>' : '>='} ${formatRatio(sif.requiredRrf)})`;
  if (sif.mode === 'high-demand' && sif.requiredPfh !== undefined) {
    const band = sif.pfhBand
      ? `, the PFH band of SIL ${sif.pfhBand.sil}, ${formatProbability(sif.pfhBand.low)} to ${formatProbability(sif.pfhBand.high)} /h`
      : '';
    const low =
      sif.lowDemandSil !== undefined
        ? ` In low-demand terms ${pfd}, ${silText(sif.lowDemandSil)}, which does not apply at this demand.`
        : '';
    return [
      ...who,
      `high demand: PFH ${relation} ${formatProbability(sif.requiredPfh)} /h: ${silText(sif.sil)}${band}.${other}${low}${note}`,
    ];
  }
  return [...who, `${pfd}: ${silText(sif.sil)}.${other}${note}`];
}

export function policyText(doc: ReportDocument): string[] {
  return doc.policy.map((p) => `${p.name}=${p.value}${p.origin === 'default' ? ' (default)' : ''}`);
}
