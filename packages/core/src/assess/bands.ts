// The SIL bands of IEC 61511-1:2016 Table 4 (low demand, PFDavg) and Table 5 (high demand, PFH), and the
// look-ups that turn a required PFD or PFH into the SIL a practitioner expects, edges included.
import { decadeLog10, type Edge } from './numbers.ts';

export interface SilBand {
  sil: 1 | 2 | 3 | 4;
  /** The band is low <= value < high (IEC 61511-1:2016 Tables 4 and 5). */
  low: number;
  high: number;
}

/** IEC 61511-1:2016 Table 4 (same as IEC 61508-1 Table 2): PFDavg in low-demand mode. */
export const LOW_DEMAND_BANDS: readonly SilBand[] = [
  { sil: 1, low: 1e-2, high: 1e-1 },
  { sil: 2, low: 1e-3, high: 1e-2 },
  { sil: 3, low: 1e-4, high: 1e-3 },
  { sil: 4, low: 1e-5, high: 1e-4 },
];

/** IEC 61511-1:2016 Table 5 (same as IEC 61508-1 Table 3): PFH, per hour, in high-demand or continuous mode. */
export const HIGH_DEMAND_BANDS: readonly SilBand[] = [
  { sil: 1, low: 1e-6, high: 1e-5 },
  { sil: 2, low: 1e-7, high: 1e-6 },
  { sil: 3, low: 1e-8, high: 1e-7 },
  { sil: 4, low: 1e-9, high: 1e-8 },
];

/** Demanded more often than this (per year), a SIF is in high-demand mode (IEC 61511-1:2016, as docs/rule-basis.md section 1 quotes it). */
export const LOW_DEMAND_LIMIT_PER_YEAR = 1;
export const HOURS_PER_YEAR = 8760;

/** Returned by the look-ups when the requirement is beyond SIL 4: not achievable by one SIF. */
export const BEYOND_SIL_4 = 5;

/**
 * The SIL a SIF needs to reach a required PFD. The band holding the requirement decides, except on an exact
 * decade: with "below" the SIF must reach PFD < required, which only the next band up guarantees (0.01 needs
 * SIL 2); with "at-most" the RRF rows (> 10 to <= 100 is SIL 1) decide, so 0.01 is SIL 1. RRF up to 10
 * (PFD 0.1 or more) needs no SIL under "at-most"; under "below" an RRF of exactly 10 needs SIL 1.
 */
export function requiredSil(requiredPfd: number, edge: Edge): number {
  if (!(requiredPfd > 0)) return BEYOND_SIL_4;
  const decades = -decadeLog10(requiredPfd);
  const whole = Number.isInteger(decades);
  const sil = edge === 'below' ? Math.floor(decades) : whole ? decades - 1 : Math.floor(decades);
  return Math.min(Math.max(sil, 0), BEYOND_SIL_4);
}

/** The SIL a SIF needs to reach a required PFH (per hour): Table 5 sits four decades below Table 4. */
export function requiredSilForPfh(requiredPfh: number, edge: Edge): number {
  return requiredSil(requiredPfh * 1e4, edge);
}

/** Which low-demand band an achieved PFD lies in: 0 when 0.1 or more, 5 when below 1e-5. */
export function silOfPfd(pfd: number): number {
  if (!(pfd > 0)) return BEYOND_SIL_4;
  const decades = -decadeLog10(pfd);
  const sil = Number.isInteger(decades) ? decades - 1 : Math.floor(decades);
  return Math.min(Math.max(sil, 0), BEYOND_SIL_4);
}

export function lowDemandBand(sil: number): SilBand | undefined {
  return LOW_DEMAND_BANDS.find((b) => b.sil === sil);
}

export function highDemandBand(sil: number): SilBand | undefined {
  return HIGH_DEMAND_BANDS.find((b) => b.sil === sil);
}

/** The conservative (upper) edge of a SIL band, the PFD credited when only the SIL is claimed. */
export function conservativePfd(sil: number): number | undefined {
  return lowDemandBand(sil)?.high;
}
