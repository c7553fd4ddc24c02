// The PFD rules for each claimed layer: where its PFD comes from (claim, SIL band or defaults table) and the
// limits on it (SIL band, BPCS cap, operator response time, check valve, no number), each limit a finding.
import type { Finding, LayerReason, Sourced } from '../vocabulary/types.ts';
import type { LayerClaim, Model, PlantFunction, Scenario } from '../model/schema.ts';
import { highDemandBand, lowDemandBand } from './bands.ts';
import { SIF_BAND_SOURCE, TYPICAL_LAYER_PFDS, sifDefaultPfd, type LayerDefaultKey } from './defaults.ts';
import { causeIsBpcsFailure, isBpcsLayer, type BpcsFacts } from './facts.ts';
import { say } from '../catalogue/catalogue.ts';
import { inForce, limitFinding, type AssessmentMessage, type Figure } from './limits.ts';
import { above, below } from './numbers.ts';
import { orderOf, type LayerOrder } from './order.ts';
import { resolvedPolicy, BPCS_LAYER_BEST_PFD, HUMAN_RESPONSE_BEST_PFD } from '../vocabulary/policy.ts';

export const FIGURES: readonly Figure[] = ['after', 'if-accepted'];

export interface PerFigure<T> {
  after: T;
  'if-accepted': T;
}

/** One claimed layer as the assessment works on it. */
export interface LayerWork {
  claim: LayerClaim;
  fn: PlantFunction;
  claimed: Sourced;
  /** Whether any number (claim, band or default) backs the claim. */
  hasPfd: boolean;
  pfd: PerFigure<number>;
  /** A finding in force removes the layer's credit in this figure. */
  noCredit: PerFigure<boolean>;
  bpcs: boolean;
  /** Whether it acts before or after the scenario's SIF. */
  order: LayerOrder;
  /** The scenario's SIF in high demand: its PFH (per hour) as claimed, and as each figure allows it. */
  claimedPfh?: Sourced;
  pfh?: PerFigure<number>;
  findings: Finding[];
  reasons: LayerReason[];
}

export const PFH_BAND_SOURCE = 'IEC 61511-1:2016 Table 5, conservative edge of the claimed SIL band';

/** The PFH a SIF in high demand is judged by: its own pfh=, else the conservative edge of its SIL's Table 5 band. */
export function claimedPfhOf(fn: PlantFunction): Sourced | undefined {
  if (fn.kind !== 'sif') return undefined;
  if (fn.pfh !== undefined)
    return { value: fn.pfh, origin: 'model', ...(fn.pfhBasis !== undefined ? { basis: fn.pfhBasis } : {}) };
  const band = fn.sil !== undefined ? highDemandBand(fn.sil) : undefined;
  return band ? { value: band.high, origin: 'sil-band', basis: `SIL ${fn.sil}: ${PFH_BAND_SOURCE}` } : undefined;
}

function defaultKeyOf(fn: PlantFunction, facts: BpcsFacts): LayerDefaultKey | undefined {
  if (fn.kind === 'alarm') return 'human-response';
  if (fn.kind === 'loop' || fn.kind === 'trip') return isBpcsLayer(fn, facts) ? 'bpcs-layer' : undefined;
  if (fn.kind === 'device') {
    const kind = facts[fn.tag]?.deviceKind;
    if (kind === 'relief-valve' || kind === 'rupture-disc' || kind === 'check-valve') return kind;
  }
  return undefined;
}

/** The claimed PFD and where it came from: the scenario's claim, the function, the SIL band, or the defaults. */
export function claimedPfdOf(
  claim: LayerClaim,
  fn: PlantFunction,
  facts: BpcsFacts,
): { claimed: Sourced; hasPfd: boolean } {
  if (claim.pfd !== undefined) {
    const basis = claim.basis ?? fn.pfdBasis;
    return { claimed: { value: claim.pfd, origin: 'model', ...(basis !== undefined ? { basis } : {}) }, hasPfd: true };
  }
  if (fn.pfd !== undefined) {
    return {
      claimed: { value: fn.pfd, origin: 'model', ...(fn.pfdBasis !== undefined ? { basis: fn.pfdBasis } : {}) },
      hasPfd: true,
    };
  }
  if (fn.kind === 'sif' && fn.sil !== undefined) {
    const pfd = sifDefaultPfd(fn.sil);
    if (pfd !== undefined)
      return { claimed: { value: pfd, origin: 'sil-band', basis: `SIL ${fn.sil}: ${SIF_BAND_SOURCE}` }, hasPfd: true };
  }
  const key = defaultKeyOf(fn, facts);
  const row = key !== undefined ? TYPICAL_LAYER_PFDS[key] : undefined;
  if (row?.pfd !== undefined)
    return { claimed: { value: row.pfd, origin: 'default', basis: `${row.title}: ${row.source}` }, hasPfd: true };
  const basis = row ? `${row.title}: ${row.source}` : 'no PFD given and no default applies';
  return { claimed: { value: 1, origin: 'default', basis }, hasPfd: false };
}

interface LayerContext {
  model: Model;
  scenario: Scenario;
  facts: BpcsFacts;
  /** The scenario's SIF when the demand on it is high: it is judged by PFH (Table 5), not PFD (Table 4). */
  highDemandSif?: string;
}

class LayerBuilder {
  readonly work: LayerWork;
  constructor(
    private readonly ctx: LayerContext,
    claim: LayerClaim,
    fn: PlantFunction,
  ) {
    const { claimed, hasPfd } = claimedPfdOf(claim, fn, ctx.facts);
    this.work = {
      claim,
      fn,
      claimed,
      hasPfd,
      pfd: { after: claimed.value, 'if-accepted': claimed.value },
      noCredit: { after: false, 'if-accepted': false },
      bpcs: isBpcsLayer(fn, ctx.facts),
      order: orderOf(claim, fn, ctx.facts),
      findings: [],
      reasons: [],
    };
  }

  private finding(says: AssessmentMessage): Finding {
    const tag = this.work.fn.tag;
    const f = limitFinding(this.ctx.model, this.ctx.scenario.id, {
      tags: [tag],
      parties: [{ role: 'layer', tag }],
      says,
    });
    this.work.findings.push(f);
    return f;
  }

  private reason(f: Finding, effect: LayerReason['effect'], cap?: number): void {
    this.work.reasons.push({
      key: f.key,
      rule: f.rule,
      severity: f.severity,
      effect: f.severity === 'note' ? 'note' : effect,
      ...(f.accepted ? { accepted: true } : {}),
      ...(cap !== undefined ? { cap } : {}),
    });
  }

  cap(limit: number, says: AssessmentMessage): void {
    const f = this.finding(says);
    this.reason(f, 'caps', limit);
    for (const figure of FIGURES)
      if (inForce(f, figure)) this.work.pfd[figure] = Math.max(this.work.pfd[figure], limit);
  }

  void(says: AssessmentMessage): void {
    const f = this.finding(says);
    this.reason(f, 'voids');
    for (const figure of FIGURES) if (inForce(f, figure)) this.work.noCredit[figure] = true;
  }

  /** Caps the PFH of a SIF in high demand, as cap() does for a PFD. */
  capPfh(limit: number, says: AssessmentMessage): void {
    const f = this.finding(says);
    this.reason(f, 'caps', limit);
    const pfh = this.work.pfh!;
    for (const figure of FIGURES) if (inForce(f, figure)) pfh[figure] = Math.max(pfh[figure], limit);
  }

  /** A finding that changes no number (a SIL claim that the PFD contradicts on the safe side). */
  flag(says: AssessmentMessage): void {
    this.reason(this.finding(says), 'note');
  }
}

/** A SIF in high demand: its PFH, checked against the Table 5 band of its claimed SIL (not Table 4). */
function highDemandLimits(b: LayerBuilder, fn: Extract<PlantFunction, { kind: 'sif' }>): void {
  const claimed = claimedPfhOf(fn);
  if (!claimed) {
    b.void(say('sif-high-demand-no-pfh/no-figure', { function: fn.tag }));
    return;
  }
  b.work.claimedPfh = claimed;
  b.work.pfh = { after: claimed.value, 'if-accepted': claimed.value };
  const band = fn.sil !== undefined && claimed.origin === 'model' ? highDemandBand(fn.sil) : undefined;
  const data = band && { function: fn.tag, claimed: claimed.value, sil: fn.sil!, low: band.low, high: band.high };
  if (data && below(claimed.value, data.low)) b.capPfh(data.low, say('sif-pfh-outside-sil/better', data));
  else if (data && above(claimed.value, data.high)) b.flag(say('sif-pfh-outside-sil/worse', data));
}

/**
 * A SIF figure given without a verification basis: credited at the conservative edge of the claimed SIL's band
 * (Table 4 for a PFD, Table 5 for a PFH in high demand), or not at all without a SIL, until accepted.
 */
function unverifiedClaim(b: LayerBuilder, fn: Extract<PlantFunction, { kind: 'sif' }>, highDemand: boolean): void {
  const w = b.work;
  const claim = highDemand ? w.claimedPfh : w.claimed;
  if (!claim || claim.origin !== 'model' || claim.basis !== undefined) return;
  const band = fn.sil === undefined ? undefined : highDemand ? highDemandBand(fn.sil) : lowDemandBand(fn.sil);
  const claimed = { function: fn.tag, quantity: highDemand ? 'PFH' : 'PFD', claimed: claim.value } as const;
  if (!band) return b.void(say('sif-claim-no-basis/no-sil', claimed));
  // No better than the band's edge, the claim takes no more credit than the SIL alone would give: nothing to verify.
  if (!below(claim.value, band.high)) return;
  const says = say('sif-claim-no-basis/at-band-edge', { ...claimed, sil: fn.sil!, edge: band.high });
  if (highDemand) b.capPfh(band.high, says);
  else b.cap(band.high, says);
}

/** Applies the PFD rules to one claimed layer, in the order the brief of issue 4 gives. */
export function assessLayerLimits(ctx: LayerContext, claim: LayerClaim, fn: PlantFunction): LayerWork {
  const b = new LayerBuilder(ctx, claim, fn);
  const w = b.work;
  const policy = resolvedPolicy(ctx.model);
  const value = w.claimed.value;

  const highDemand = fn.kind === 'sif' && ctx.highDemandSif === fn.tag;
  if (highDemand) highDemandLimits(b, fn);
  else if (fn.kind === 'sif' && fn.sil !== undefined && w.claimed.origin === 'model') {
    const band = lowDemandBand(fn.sil);
    // The band's conservative edge is the conventional value for it (SIL 2 at 0.01), so it counts as inside.
    const data = band && { function: fn.tag, claimed: value, sil: fn.sil, low: band.low, high: band.high };
    if (data && below(value, data.low)) b.cap(data.low, say('sif-pfd-outside-sil/better', data));
    else if (data && above(value, data.high)) b.flag(say('sif-pfd-outside-sil/worse', data));
  }
  if (fn.kind === 'sif') unverifiedClaim(b, fn, highDemand);
  // The human floor applies wherever the alarm is raised; when it caps, the BPCS cap would say the same again.
  const humanCapped =
    fn.kind === 'alarm' && fn.hraBasis === undefined && w.hasPfd && below(value, HUMAN_RESPONSE_BEST_PFD);
  if (humanCapped) {
    b.cap(
      HUMAN_RESPONSE_BEST_PFD,
      say('human-response-floor/capped', { function: fn.tag, claimed: value, best: HUMAN_RESPONSE_BEST_PFD }),
    );
  }
  if (w.bpcs && w.hasPfd && !humanCapped && below(value, BPCS_LAYER_BEST_PFD)) {
    b.cap(
      BPCS_LAYER_BEST_PFD,
      say('bpcs-layer-cap/capped', { function: fn.tag, claimed: value, best: BPCS_LAYER_BEST_PFD }),
    );
  }
  if (w.bpcs && policy.sameControllerLayers === 'none' && causeIsBpcsFailure(ctx.model, ctx.scenario, ctx.facts)) {
    b.void(say('bpcs-layer-with-bpcs-cause/no-credit', { function: fn.tag }));
  }
  if (fn.kind === 'alarm' && below(fn.minutes, policy.minResponseMinutes)) {
    b.void(
      say('alarm-response-time/too-little-time', {
        function: fn.tag,
        minutes: fn.minutes,
        required: policy.minResponseMinutes,
      }),
    );
  }
  const isCheckValve = fn.kind === 'device' && ctx.facts[fn.tag]?.deviceKind === 'check-valve';
  if (isCheckValve && fn.kind === 'device' && fn.creditBasis === undefined) {
    b.void(say('check-valve-no-credit/no-basis', { function: fn.tag, device: fn.device }));
  } else if (!w.hasPfd) {
    b.void(say('layer-no-pfd/no-figure', { function: fn.tag, kind: fn.kind }));
  }
  return w;
}
