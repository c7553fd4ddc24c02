// Text output of `bulkhead check`: findings grouped by scenario in the notice look, each pointing at the
// claimed layer in the model file, then the LOPA lines and a one-line verdict.
import {
  ASSESSMENT_CAUTION,
  edgeRelation,
  formatFrequency,
  formatPerHour,
  formatRatio,
  ModelLocator,
  renderFindingText,
  renderAssessmentText,
  type Analysis,
  type Finding,
  type LoadResult,
  type Model,
  type ScenarioAssessment,
} from '@bulkhead/core';

export function verdictLine(a: ScenarioAssessment): string {
  const after = formatFrequency(a.mitigatedAfter);
  const tolerable = formatFrequency(a.tolerable);
  if (a.meetsAfter) return `${a.scenario}: meets its criterion after independence (${after} against ${tolerable})`;
  const sifLayer = a.layers.find((l) => l.function === a.sif?.function);
  const lost = sifLayer && !sifLayer.creditedIfAccepted ? ` (\`${sifLayer.function}\` as drawn is ${sifLayer.verdict})` : '';
  const who = a.sif?.function && !lost ? `\`${a.sif.function}\`` : 'an independent SIF';
  const sil = a.sif ? (a.sif.sil === 0 ? `; ${who} needs an RRF of at most 10, below SIL 1${lost}` : a.sif.sil > 4 ? '; beyond what one SIF can give' : `; ${who} needs SIL ${a.sif.sil}${lost}`) : '';
  const pfh = a.sif?.mode === 'high-demand' && a.sif.requiredPfh !== undefined && a.sif.sil > 0 && a.sif.sil <= 4 ? ` (high demand: PFH ${edgeRelation(a.edge)} ${formatPerHour(a.sif.requiredPfh)})` : '';
  const open = a.layers.filter((l) => l.verdict === 'open').map((l) => `\`${l.function}\``);
  const hint = a.meetsIfAccepted && open.length
    ? ` (it would meet it if the open findings on ${open.join(', ')} were resolved or accepted)`
    : a.meetsClaimed ? '; it meets it only as claimed' : '';
  return `${a.scenario}: falls short after independence: ${after} against ${tolerable}, gap ${formatRatio(a.gap)} x${sil}${pfh}${hint}`;
}

export function renderCheck(result: LoadResult & { model: Model }, analysis: Analysis): string {
  const { model, source } = result;
  const locate = new ModelLocator(model, result.spans);
  const out: string[] = [];
  // Grouped once: filtering every finding for each scenario would grow with scenarios times findings.
  const byScenario = new Map<string | undefined, Finding[]>();
  for (const f of analysis.findings) (byScenario.get(f.scenario) ?? byScenario.set(f.scenario, []).get(f.scenario)!).push(f);
  for (const assessment of analysis.assessments) {
    const findings = byScenario.get(assessment.scenario) ?? [];
    out.push(`== ${assessment.scenario}${assessment.title ? `: ${assessment.title}` : ''} ==`, '');
    for (const f of findings) out.push(renderFindingText(f, source, locate), '');
    out.push(...renderAssessmentText(assessment), '');
  }
  const loose = analysis.findings.filter((f) => f.scenario === undefined);
  if (loose.length) {
    out.push('== model ==', '');
    for (const f of loose) out.push(renderFindingText(f, source, locate), '');
  }
  const counts = { 'voids-credit': 0, 'needs-justification': 0, note: 0, accepted: 0 };
  for (const f of analysis.findings) counts[f.accepted ? 'accepted' : f.severity]++;
  out.push('== verdict ==');
  for (const a of analysis.assessments) out.push(verdictLine(a));
  out.push(
    '',
    `${source.file}: ${analysis.assessments.length} scenarios; findings: ${counts['voids-credit']} void credit, ${counts['needs-justification']} need a justification, ${counts.note} notes, ${counts.accepted} accepted`,
    `Caution: ${ASSESSMENT_CAUTION}`,
    '',
  );
  return out.join('\n');
}
