// `bulkhead verify` as text: per SIF the subsystem table (architecture, PFDavg, share, PFH, equation and
// source), the total against the claim and the governing requirement, the architectural constraints, the
// inputs with their bases, and the findings. Answer first, workings after.
import { formatPerHour, formatProbability, formatRatio } from '../assess/format.ts';
import { ANNEX_B, PROOF_TEST_EXTENSION } from '../reliability/annex-b.ts';
import type { ElementFigures } from '../reliability/figures.ts';
import type { SubsystemResult } from '../reliability/subsystems.ts';
import { OUTCOME_SUM_SOURCE, type TargetCandidate } from './target.ts';
import { SUBSYSTEM_WORDS } from '../reliability/compute.ts';
import { VERIFY_CAUTION, type SifVerification, type TargetCheck } from './verify.ts';

const NAMES = SUBSYSTEM_WORDS;

function pad(text: string, width: number): string {
  return text.length >= width ? `${text} ` : text + ' '.repeat(width - text.length);
}

const WHOLE = new Intl.NumberFormat('en-US', { maximumFractionDigits: 0 });

/** 85%, 4.2%, 0.21%: two significant figures below 10%, so a small share never reads as none. */
function percent(share: number): string {
  const p = share * 100;
  return p === 0 || p >= 10 ? `${Math.round(p)}%` : `${Number(p.toPrecision(2))}%`;
}

/** Hours as given, in whole digits: 8,760 h, not rounded to two figures. */
function hours(h: number): string {
  return `${WHOLE.format(h)} h`;
}

function subsystemLines(r: SubsystemResult, share: number | undefined): string[] {
  const pfd = r.pfd !== undefined ? formatProbability(r.pfd) : 'not computed';
  const pfh = r.pfh !== undefined ? formatPerHour(r.pfh) : '';
  const equation = r.equation ? `${ANNEX_B} ${r.equation.clause}` : '';
  const lines = [
    `  ${pad(NAMES[r.subsystem], 16)}${pad(r.architecture, 7)}${pad(pfd, 14)}${pad(share !== undefined ? percent(share) : '', 7)}${pad(pfh, 12)}${equation}`,
  ];
  if (r.beta)
    lines.push(
      `      common cause: beta ${formatRatio(r.beta.beta)}, betaD ${formatRatio(r.beta.betaD)}${r.beta.fromDefault ? ' (default: no common-cause line)' : r.beta.basis ? ` (${r.beta.basis})` : ' (no basis)'}`,
    );
  for (const c of r.shared) {
    lines.push(
      `      shared by the channels, in series with the group: ${c.tag} PFD ${formatProbability(c.pfd)}; group alone ${formatProbability(r.groupPfd ?? Number.NaN)}`,
    );
  }
  for (const tag of r.sharedWithoutData)
    lines.push(`      shared by the channels with no failure data: ${tag} (left out of the figure: incomplete)`);
  for (const m of r.missing) lines.push(`      not computed: ${m.tag} ${m.why}`);
  for (const note of r.notes) lines.push(`      ${note}`);
  if (r.withoutData.length)
    lines.push(`      in the trace, no failure data (not counted): ${r.withoutData.join(', ')}`);
  return lines;
}

function requirementWords(c: TargetCandidate): string {
  const where =
    c.outcome !== undefined
      ? `outcome ${c.outcome} (scenarios ${c.scenarios.join(' + ')}, summed)`
      : `scenario ${c.scenarios[0]}`;
  const relation = c.edge === 'below' ? 'below' : 'at most';
  return c.mode === 'high-demand'
    ? `PFH ${relation} ${formatPerHour(c.requiredPfh!)} (${where}, high demand)`
    : `PFD ${relation} ${formatProbability(c.requiredPfd!)} (${where}, low demand)`;
}

function verdictWords(t: TargetCheck): string {
  const figure = t.mode === 'high-demand' ? formatPerHour(t.computed) : formatProbability(t.computed);
  const where = `(${t.mode}, ${t.scenarios.join(' + ')})`;
  if (t.meets) return `computed ${figure} meets the requirement ${where}, margin x${formatRatio(1 / t.ratio)}`;
  if (!Number.isFinite(t.ratio))
    return `cannot be met ${where}: the outcome's other scenarios already use the whole tolerable frequency`;
  if (t.ratio < 1)
    return `computed ${figure} would meet the requirement ${where}, but the calculation is incomplete: unverified`;
  return `computed ${figure} falls short of the requirement ${where} by a factor of ${formatRatio(t.ratio)}`;
}

function verdictLines(v: SifVerification): string[] {
  const lines: string[] = [];
  const claim: string[] = [];
  if (v.claimed.pfd !== undefined)
    claim.push(
      `PFD ${formatProbability(v.claimed.pfd)}${v.againstClaim?.pfdMeets === undefined ? '' : v.againstClaim.pfdMeets ? ' (computed meets it)' : ' (computed does NOT meet it)'}`,
    );
  if (v.claimed.pfh !== undefined)
    claim.push(
      `PFH ${formatPerHour(v.claimed.pfh)}${v.againstClaim?.pfhMeets === undefined ? '' : v.againstClaim.pfhMeets ? ' (computed meets it)' : ' (computed does NOT meet it)'}`,
    );
  if (v.claimed.sil !== undefined) claim.push(`SIL ${v.claimed.sil}`);
  lines.push(`  claimed:  ${claim.length ? claim.join(', ') : 'nothing'}`);
  const governing = [v.target.governingPfd, v.target.governingPfh].filter((g) => g !== undefined);
  const count = v.target.candidates.length;
  for (const g of governing) {
    lines.push(
      `  required: ${requirementWords(g)}: the most demanding in ${g.mode === 'high-demand' ? 'high' : 'low'} demand (${count} requirement${count === 1 ? '' : 's'} in all)`,
    );
    if (g.outcome !== undefined) lines.push(`            ${OUTCOME_SUM_SOURCE}${g.note ? `; ${g.note}` : ''}`);
  }
  if (!governing.length) lines.push('  required: no scenario credits this SIF');
  for (const t of v.againstTargets ?? []) lines.push(`  verdict:  ${verdictWords(t)}`);
  if (v.pfd === undefined) lines.push('  verdict:  not computed: unverified (see below)');
  const t = v.againstTarget;
  for (const s of t ? v.sharedInSeries : []) {
    const tags = [...s.tags, ...s.withoutData].join(', ');
    lines.push(
      t!.meets
        ? `  shared:   ${tags} (${NAMES[s.subsystem]}) in series with the voted group: with it the SIF still meets its requirement; ${
            v.complete
              ? '`check` credits the layer at the larger of its claimed and computed PFD'
              : 'the inputs are incomplete or take defaults, so `check` withholds the credit until a justification accepts it'
          }`
        : `  shared:   ${tags} (${NAMES[s.subsystem]}) in series with the voted group: with it the SIF falls short${Number.isFinite(t!.ratio) && t!.ratio >= 1 ? ` by a factor of ${formatRatio(t!.ratio)}` : ''}`,
    );
  }
  if (v.architecture) {
    const a = v.architecture;
    const each = a.bySubsystem.map((b) => `${NAMES[b.subsystem]} ${b.hft}${b.meets ? '' : ' (short)'}`).join(', ');
    lines.push(
      `  architecture: SIL ${a.sil} in ${a.mode} needs HFT ${a.required} (${a.source}); HFT ${each}: ${a.bySubsystem.every((b) => b.meets) ? 'met' : 'NOT met'}`,
    );
  }
  return lines;
}

function inputLine(f: ElementFigures): string {
  const parts = [`lambdaDU ${formatPerHour(f.lambdaDu)}`, `lambdaDD ${formatPerHour(f.lambdaDd)}`];
  if (f.lambdaSd > 0) parts.push(`lambdaSD ${formatPerHour(f.lambdaSd)}`);
  if (f.t1 !== undefined) parts.push(`T1 ${hours(f.t1)}`);
  if (f.coverage < 1)
    parts.push(`PTC ${percent(f.coverage)} over ${hours(f.missionHours ?? 0)}: T1 used ${hours(f.t1Effective ?? 0)}`);
  parts.push(`MTTR ${hours(f.mttr)}`);
  if (f.hft > 0) parts.push(`HFT ${f.hft}`);
  const basis = [`basis: ${f.basis ?? 'NONE'}`];
  if (f.t1 !== undefined) basis.push(`test basis: ${f.testBasis ?? 'NONE'}`);
  if (f.defaults.length) basis.push(`defaults: ${f.defaults.join(', ')}`);
  return `    ${pad(f.tag, 10)}[${f.row}] ${parts.join(', ')}; ${basis.join('; ')}`;
}

export function renderVerificationText(v: SifVerification): string {
  const lines = [
    `${v.sif}${v.title ? ` ${v.title}` : ''}`,
    `  ${pad('subsystem', 16)}${pad('vote', 7)}${pad('PFDavg', 14)}${pad('share', 7)}${pad('PFH', 12)}equation`,
  ];
  v.subsystems.forEach((s, i) => lines.push(...subsystemLines(s, v.shares?.[i])));
  lines.push(
    `  ${pad('total', 23)}${pad(v.pfd !== undefined ? formatProbability(v.pfd) : 'not computed', 21)}${v.pfh !== undefined ? formatPerHour(v.pfh) : ''}`,
  );
  lines.push('', ...verdictLines(v), '', '  inputs:');
  const seen = new Set<string>();
  for (const s of v.subsystems) {
    for (const f of s.inputs.filter((x) => !seen.has(x.tag))) {
      seen.add(f.tag);
      lines.push(inputLine(f));
    }
  }
  if (!seen.size)
    lines.push(
      '    none: the model gives no failure data for this SIF; add failure-data lines (see docs/failure-data.md)',
    );
  const equations = new Map(v.subsystems.filter((s) => s.equation).map((s) => [s.equation!.architecture, s.equation!]));
  lines.push('  equations:');
  for (const e of equations.values())
    lines.push(`    ${e.architecture}: PFDavg = ${e.pfd}; PFH = ${e.pfh} (${ANNEX_B} ${e.clause})`);
  lines.push(`    ${PROOF_TEST_EXTENSION}`);
  if (v.findings.length) {
    lines.push('  findings:');
    for (const f of v.findings) lines.push(`    [${f.code}] ${f.message}`);
  }
  return lines.join('\n');
}

export function renderVerificationsText(all: readonly SifVerification[]): string {
  const body = all.map(renderVerificationText).join('\n\n');
  return `${body}\n\n${VERIFY_CAUTION}\n`;
}
