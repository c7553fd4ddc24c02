// Floating-point care for LOPA arithmetic: products such as 0.1 * 0.1 miss exact decades by an ulp,
// so comparisons and band look-ups here use log10 with a relative tolerance instead of `<` on raw doubles.

/** Two figures within this relative difference are the same figure (0.1 * 0.1 is 0.01). */
export const RELATIVE_TOLERANCE = 1e-9;

/** The same tolerance on a log10 scale: |log10(a) - log10(b)| below this means a and b agree. */
const LOG_TOLERANCE = RELATIVE_TOLERANCE / Math.LN10;

export type Edge = 'below' | 'at-most';

export function sameFigure(a: number, b: number): boolean {
  if (a === b) return true;
  if (a <= 0 || b <= 0) return false;
  return Math.abs(Math.log10(a) - Math.log10(b)) <= LOG_TOLERANCE;
}

/** log10 of a positive number, snapped to the nearest whole decade when within the tolerance. */
export function decadeLog10(x: number): number {
  const log = Math.log10(x);
  const nearest = Math.round(log);
  return Math.abs(log - nearest) <= LOG_TOLERANCE ? nearest : log;
}

/** Whether a mitigated frequency meets a tolerable one under the criterion's edge convention. */
export function meetsCriterion(mitigated: number, tolerable: number, edge: Edge): boolean {
  if (sameFigure(mitigated, tolerable)) return edge === 'at-most';
  return mitigated < tolerable;
}

/** Whether a figure lies above a limit by more than the tolerance (a figure on the limit is not above it). */
export function above(value: number, limit: number): boolean {
  return value > limit && !sameFigure(value, limit);
}

export function below(value: number, limit: number): boolean {
  return value < limit && !sameFigure(value, limit);
}

/**
 * Product of factors, multiplied smallest first whatever order they come in: floating-point products
 * depend on the order (0.1 * 0.004 * 0.01 and 0.1 * 0.01 * 0.004 differ in the last digit), and the
 * order of a scenario's layers has no meaning, so listing them another way must not change a figure.
 */
export function product(factors: readonly number[]): number {
  let p = 1;
  for (const f of [...factors].sort((a, b) => a - b)) p *= f;
  return p;
}
