// Demand on the SIF and the mitigated frequency in each demand mode. Low demand: every credited layer multiplies
// the cause. High demand (demand above once a year): the SIF's own dangerous failures start the hazard, so the
// hazard frequency is its PFH x 8,760 h times what acts after it (and the modifiers).
import { HOURS_PER_YEAR, LOW_DEMAND_LIMIT_PER_YEAR } from './bands.ts';
import { acting, type OrderedLayer } from './order.ts';
import { above, product } from './numbers.ts';

export const HIGH_DEMAND_FORMULA =
  'hazard frequency = PFH x 8,760 h x PFDs of the layers acting after the SIF x conditional modifiers (never above the figure without the SIF)';
export const HIGH_DEMAND_SOURCE =
  'IEC 61511-1:2016 definitions of the demand modes (more than once a year is high demand) and Table 5 (PFH); the product with later layers is common practice, no source';
export const DEMAND_FORMULA = 'demand = cause x enablers x PFDs of the credited layers acting before the SIF';

export interface FigureInput {
  cause: number;
  enablers: number;
  modifiers: number;
  /** Every layer this figure credits, the SIF included. */
  credited: readonly OrderedLayer[];
  /** The scenario's SIF when this figure credits it, with its PFH (per hour) when one is known. */
  sif?: { tag: string; pfh?: number };
}

export interface FigureResult {
  mitigated: number;
  /** Demand on the SIF, per year (present when the figure credits a SIF). */
  demand?: number;
  highDemand: boolean;
}

/** Demand on a SIF, per year: the cause, the enablers and the PFDs of the credited layers acting before it. */
export function demandOn(cause: number, enablers: number, others: readonly OrderedLayer[]): number {
  return product([cause, enablers, ...acting(others, 'before').map((l) => l.pfd)]);
}

export function isHighDemand(demand: number): boolean {
  return above(demand, LOW_DEMAND_LIMIT_PER_YEAR);
}

export function mitigatedFigure(input: FigureInput): FigureResult {
  const all = product([input.cause, input.enablers, input.modifiers, ...input.credited.map((l) => l.pfd)]);
  if (input.sif === undefined) return { mitigated: all, highDemand: false };
  const sifTag = input.sif.tag;
  const others = input.credited.filter((l) => l.tag !== sifTag);
  const demand = demandOn(input.cause, input.enablers, others);
  if (!isHighDemand(demand)) return { mitigated: all, demand, highDemand: false };
  const withoutSif = product([input.cause, input.enablers, input.modifiers, ...others.map((l) => l.pfd)]);
  // With no PFH the SIF earns nothing at this demand (the caller records why).
  if (input.sif.pfh === undefined) return { mitigated: withoutSif, demand, highDemand: true };
  const hazard = product([
    input.sif.pfh * HOURS_PER_YEAR,
    ...acting(others, 'after').map((l) => l.pfd),
    input.modifiers,
  ]);
  return { mitigated: Math.min(hazard, withoutSif), demand, highDemand: true };
}
