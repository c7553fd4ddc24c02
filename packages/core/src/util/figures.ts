// How every output writes a figure: two significant figures in exponent form with the unit, or a ratio in
// plain digits. At the bottom of the flow so that rule messages (catalogue/) and the assessment read alike.
export const SIGNIFICANT_FIGURES = 2;

/** 2.5e-5, 1.0e-1, 3.0e0: the same shape for every magnitude, so columns of figures line up and compare. */
export function formatScientific(x: number, digits = SIGNIFICANT_FIGURES): string {
  if (x === 0) return '0';
  if (!Number.isFinite(x)) return x > 0 ? 'infinite' : '-infinite';
  return x.toExponential(Math.max(digits - 1, 0)).replace('e+', 'e');
}

export function formatFrequency(perYear: number, digits = SIGNIFICANT_FIGURES): string {
  return `${formatScientific(perYear, digits)} /yr`;
}

export function formatPerHour(perHour: number, digits = SIGNIFICANT_FIGURES): string {
  return `${formatScientific(perHour, digits)} /h`;
}

export function formatProbability(p: number, digits = SIGNIFICANT_FIGURES): string {
  return formatScientific(p, digits);
}

// Made once: `toLocaleString` with a locale builds a new formatter on every call, which costs as much
// as the rest of a scenario's assessment.
const PLAIN_DIGITS = new Intl.NumberFormat('en-US', { maximumFractionDigits: 20 });

/** A ratio such as an RRF or a gap, to two significant figures in plain digits: 57, 500, 12,000, 0.25. */
export function formatRatio(x: number, digits = SIGNIFICANT_FIGURES): string {
  if (!Number.isFinite(x) || x <= 0) return formatScientific(x, digits);
  if (x >= 1e7 || x < 1e-3) return formatScientific(x, digits);
  const rounded = Number(x.toPrecision(digits));
  return PLAIN_DIGITS.format(rounded);
}
