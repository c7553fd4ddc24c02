// The PFD rules for each claimed layer: where its PFD comes from (claim, SIL band or defaults table) and the
// limits on it (SIL band, BPCS cap, operator response time, check valve, no number), each limit a finding.
import type { Finding, LayerReason, Sourced } from '../vocabulary/types.ts';
import type { LayerClaim, Model, PlantFunction, Scenario } from '../model/schema.ts';
import { highDemandBand, lowDemandBand } from './bands.ts';
import { SIF_BAND_SOURCE, TYPICAL_LAYER_PFDS, sifDefaultPfd, type LayerDefaultKey } from './defaults.ts';
import { causeIsBpcsFailure, isBpcsLayer, type BpcsFacts } from './facts.ts';
import { formatPerHour, formatProbability } from './format.ts';
import { inForce, limitFinding, type AssessRuleId, type Figure } from './limits.ts';
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
  if (fn.pfh !== undefined) return { value: fn.pfh, origin: 'model', ...(fn.pfhBasis !== undefined ? { basis: fn.pfhBasis } : {}) };
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
export function claimedPfdOf(claim: LayerClaim, fn: PlantFunction, facts: BpcsFacts): { claimed: Sourced; hasPfd: boolean } {
  if (claim.pfd !== undefined) {
    const basis = claim.basis ?? fn.pfdBasis;
    return { claimed: { value: claim.pfd, origin: 'model', ...(basis !== undefined ? { basis } : {}) }, hasPfd: true };
  }
  if (fn.pfd !== undefined) {
    return { claimed: { value: fn.pfd, origin: 'model', ...(fn.pfdBasis !== undefined ? { basis: fn.pfdBasis } : {}) }, hasPfd: true };
  }
  if (fn.kind === 'sif' && fn.sil !== undefined) {
    const pfd = sifDefaultPfd(fn.sil);
    if (pfd !== undefined) return { claimed: { value: pfd, origin: 'sil-band', basis: `SIL ${fn.sil}: ${SIF_BAND_SOURCE}` }, hasPfd: true };
  }
  const key = defaultKeyOf(fn, facts);
  const row = key !== undefined ? TYPICAL_LAYER_PFDS[key] : undefined;
  if (row?.pfd !== undefined) return { claimed: { value: row.pfd, origin: 'default', basis: `${row.title}: ${row.source}` }, hasPfd: true };
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
  constructor(private readonly ctx: LayerContext, claim: LayerClaim, fn: PlantFunction) {
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

  private finding(rule: AssessRuleId, message: string, element?: string): Finding {
    const tag = this.work.fn.tag;
    const f = limitFinding(this.ctx.model, this.ctx.scenario.id, rule, {
      tags: [tag],
      parties: [{ role: 'layer', tag }],
      ...(element !== undefined ? { element } : {}),
      message,
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

  cap(rule: AssessRuleId, limit: number, message: string): void {
    const f = this.finding(rule, message);
    this.reason(f, 'caps', limit);
    for (const figure of FIGURES) if (inForce(f, figure)) this.work.pfd[figure] = Math.max(this.work.pfd[figure], limit);
  }

  void(rule: AssessRuleId, message: string): void {
    const f = this.finding(rule, message);
    this.reason(f, 'voids');
    for (const figure of FIGURES) if (inForce(f, figure)) this.work.noCredit[figure] = true;
  }

  /** Caps the PFH of a SIF in high demand, as cap() does for a PFD. */
  capPfh(rule: AssessRuleId, limit: number, message: string): void {
    const f = this.finding(rule, message);
    this.reason(f, 'caps', limit);
    const pfh = this.work.pfh!;
    for (const figure of FIGURES) if (inForce(f, figure)) pfh[figure] = Math.max(pfh[figure], limit);
  }

  /** A finding that changes no number (a SIL claim that the PFD contradicts on the safe side). */
  flag(rule: AssessRuleId, message: string): void {
    this.reason(this.finding(rule, message), 'note');
  }
}

/** A SIF in high demand: its PFH, checked against the Table 5 band of its claimed SIL (not Table 4). */
function highDemandLimits(b: LayerBuilder, fn: Extract<PlantFunction, { kind: 'sif' }>): void {
  const claimed = claimedPfhOf(fn);
  if (!claimed) {
    b.void('sif-high-demand-no-pfh', `\`${fn.tag}\` is demanded more than once a year but gives neither pfh= nor a SIL; its PFD does not apply at this demand, so it earns no credit`);
    return;
  }
  b.work.claimedPfh = claimed;
  b.work.pfh = { after: claimed.value, 'if-accepted': claimed.value };
  const band = fn.sil !== undefined && claimed.origin === 'model' ? highDemandBand(fn.sil) : undefined;
  if (band && below(claimed.value, band.low)) {
    b.capPfh('sif-pfh-outside-sil', band.low, `\`${fn.tag}\` claims PFH ${formatPerHour(claimed.value)}, better than its SIL ${fn.sil} band (${formatPerHour(band.low)} to ${formatPerHour(band.high)}); credited at ${formatPerHour(band.low)}`);
  } else if (band && above(claimed.value, band.high)) {
    b.flag('sif-pfh-outside-sil', `\`${fn.tag}\` claims SIL ${fn.sil} but PFH ${formatPerHour(claimed.value)}, worse than the band (${formatPerHour(band.low)} to ${formatPerHour(band.high)}); the PFH is used`);
  }
}

/**
 * A SIF figure given without a verification basis: credited at the conservative edge of the claimed SIL's band
 * (Table 4 for a PFD, Table 5 for a PFH in high demand), or not at all without a SIL, until accepted.
 */
function unverifiedClaim(b: LayerBuilder, fn: Extract<PlantFunction, { kind: 'sif' }>, highDemand: boolean): void {
  const w = b.work;
  const claim = highDemand ? w.claimedPfh : w.claimed;
  if (!claim || claim.origin !== 'model' || claim.basis !== undefined) return;
  const what = highDemand ? 'PFH' : 'PFD';
  const format = highDemand ? formatPerHour : formatProbability;
  const band = fn.sil === undefined ? undefined : highDemand ? highDemandBand(fn.sil) : lowDemandBand(fn.sil);
  const head = `\`${fn.tag}\` claims ${what} ${format(claim.value)} with no verification basis (${highDemand ? 'pfh-basis=' : 'pfd-basis= or basis= on the layer line'})`;
  if (!band) return b.void('sif-claim-no-basis', `${head} and no SIL: it earns no credit until a basis is recorded or a justification accepts it`);
  // No better than the band's edge, the claim takes no more credit than the SIL alone would give: nothing to verify.
  if (!below(claim.value, band.high)) return;
  const message = `${head}: credited at the edge of SIL ${fn.sil}, ${format(band.high)}, until a basis is recorded or a justification accepts it`;
  if (highDemand) b.capPfh('sif-claim-no-basis', band.high, message);
  else b.cap('sif-claim-no-basis', band.high, message);
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
    if (band && below(value, band.low)) {
      b.cap('sif-pfd-outside-sil', band.low, `\`${fn.tag}\` claims PFD ${formatProbability(value)}, better than its SIL ${fn.sil} band (${formatProbability(band.low)} to ${formatProbability(band.high)}); credited at ${formatProbability(band.low)}`);
    } else if (band && above(value, band.high)) {
      b.flag('sif-pfd-outside-sil', `\`${fn.tag}\` claims SIL ${fn.sil} but PFD ${formatProbability(value)}, worse than the band (${formatProbability(band.low)} to ${formatProbability(band.high)}); the PFD is used`);
    }
  }
  if (fn.kind === 'sif') unverifiedClaim(b, fn, highDemand);
  // The human floor applies wherever the alarm is raised; when it caps, the BPCS cap would say the same again.
  const humanCapped = fn.kind === 'alarm' && fn.hraBasis === undefined && w.hasPfd && below(value, HUMAN_RESPONSE_BEST_PFD);
  if (humanCapped) {
    b.cap('human-response-floor', HUMAN_RESPONSE_BEST_PFD, `\`${fn.tag}\` claims PFD ${formatProbability(value)} for an operator response; without a human-reliability analysis (hra-basis=) it is credited at ${formatProbability(HUMAN_RESPONSE_BEST_PFD)} at best`);
  }
  if (w.bpcs && w.hasPfd && !humanCapped && below(value, BPCS_LAYER_BEST_PFD)) {
    b.cap('bpcs-layer-cap', BPCS_LAYER_BEST_PFD, `BPCS layer \`${fn.tag}\` claims PFD ${formatProbability(value)}; a BPCS layer is credited at ${formatProbability(BPCS_LAYER_BEST_PFD)} at best (model it as a SIF if it is designed to IEC 61511)`);
  }
  if (w.bpcs && policy.sameControllerLayers === 'none' && causeIsBpcsFailure(ctx.model, ctx.scenario, ctx.facts)) {
    b.void('bpcs-layer-with-bpcs-cause', `a BPCS failure is the cause, and the policy (same-controller-layers=none) credits no BPCS layer: \`${fn.tag}\` earns no credit`);
  }
  if (fn.kind === 'alarm' && below(fn.minutes, policy.minResponseMinutes)) {
    b.void('alarm-response-time', `\`${fn.tag}\` allows ${fn.minutes} minutes for the response; the criteria ask for at least ${policy.minResponseMinutes}`);
  }
  const isCheckValve = fn.kind === 'device' && ctx.facts[fn.tag]?.deviceKind === 'check-valve';
  if (isCheckValve && fn.kind === 'device' && fn.creditBasis === undefined) {
    b.void('check-valve-no-credit', `\`${fn.tag}\` relies on check valve \`${fn.device}\`, which earns no credit unless credit-basis says why`);
  } else if (!w.hasPfd) {
    b.void('layer-no-pfd', `\`${fn.tag}\` has no PFD, and no default applies to a ${fn.kind} of this kind: give pfd= with its basis`);
  }
  return w;
}
