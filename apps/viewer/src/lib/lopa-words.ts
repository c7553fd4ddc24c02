// The words the viewer puts beside the LOPA figures: why a layer has no credit (naming the shared
// element and the rule of each finding that decides it), what the SIF must reach when the SIF as drawn
// is itself voided, and the findings of a scenario grouped under the layer they bear on.
import type { Finding, LayerAssessment, LayerReason, ScenarioAssessment } from '@bulkhead/core';

/** The reasons that decide a layer's verdict: accepted ones and notes change nothing. */
function decidingReasons(layer: LayerAssessment): LayerReason[] {
  return (layer.reasons ?? []).filter((r) => !r.accepted && r.effect !== 'note');
}

function otherParty(reason: LayerReason): string {
  if (reason.with === undefined) return '';
  return reason.with === 'cause' ? ' with the cause' : ` with ${reason.with}`;
}

/** One reason in plain words: "shares BR-101 with the cause (shared-bridle)". */
export function reasonWords(reason: LayerReason): string {
  const what =
    reason.effect === 'unverified'
      ? 'model incomplete'
      : reason.effect === 'caps'
        ? `PFD capped at ${reason.cap ?? '?'}`
        : reason.effect === 'conflict'
          ? `conflicts${otherParty(reason)}`
          : reason.element
            ? `shares ${reason.element}${otherParty(reason)}`
            : `voided${otherParty(reason)}`;
  return `${what} (${reason.rule})`;
}

/** Why a layer has the credit it has, in a line; empty for a layer credited without a finding. */
export function layerWhy(layer: LayerAssessment): string {
  const reasons = decidingReasons(layer);
  if (reasons.length === 0) return '';
  return reasons.map(reasonWords).join('; ');
}

/** The key of the first finding that decides the layer's verdict, to show its proof. */
export function decidingFinding(layer: LayerAssessment): string | undefined {
  return decidingReasons(layer)[0]?.key ?? layer.findings[0];
}

function silWords(sil: number): string {
  return sil === 0 ? 'no SIL' : sil > 4 ? 'more than SIL 4' : `SIL ${sil}`;
}

/**
 * What the scenario asks of a SIF. When the scenario's own SIF has no credit, the requirement is for
 * an independent SIF and the words say that the one drawn is not it (as `check`'s verdict line does).
 */
export function sifNeedWords(a: ScenarioAssessment): string | undefined {
  const sif = a.sif;
  if (!sif) return undefined;
  const layer = sif.function === undefined ? undefined : a.layers.find((l) => l.function === sif.function);
  if (layer && !layer.credited) {
    const first = decidingReasons(layer)[0];
    return `an independent SIF needs ${silWords(sif.sil)} (${layer.function} as drawn has no credit: ${layer.verdict}${first ? ', ' + reasonWords(first) : ''})`;
  }
  return `${sif.function ?? 'a SIF'} needs ${silWords(sif.sil)}`;
}

export interface FindingGroup {
  /** Layer function tag, or undefined for the cause, the scenario and the model. */
  layer?: string;
  heading: string;
  findings: Finding[];
}

/**
 * A scenario's findings under the layer each bears on (the first layer it names, in claim order), then
 * those about the cause or the scenario as a whole. Order inside a group is the list's own.
 */
export function groupByLayer(findings: readonly Finding[], layers: readonly string[]): FindingGroup[] {
  const groups: FindingGroup[] = layers.map((tag, i) => ({
    layer: tag,
    heading: `Layer ${i + 1}: ${tag}`,
    findings: [],
  }));
  const rest: FindingGroup = { heading: 'Cause and scenario', findings: [] };
  for (const f of findings) {
    const index = Math.min(
      ...f.parties
        .filter((p) => p.role === 'layer')
        .map((p) => layers.indexOf(p.tag ?? ''))
        .filter((i) => i >= 0),
    );
    (Number.isFinite(index) ? groups[index]! : rest).findings.push(f);
  }
  return [...groups, rest].filter((g) => g.findings.length > 0);
}
