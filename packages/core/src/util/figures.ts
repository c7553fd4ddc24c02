// How every output writes a figure: two significant figures, in plain digits where they read better and in
// exponent form where a row of zeros would hide the magnitude. At the bottom of the flow so that rule messages
// (catalogue/) and the assessment read alike.
export const SIGNIFICANT_FIGURES = 2;

/** 2.5e-5, 1.0e-1, 3.0e0: the same shape for every magnitude, so columns of figures line up and compare. */
export function formatScientific(x: number, digits = SIGNIFICANT_FIGURES): string {
  if (x === 0) return '0';
  if (!Number.isFinite(x)) return x > 0 ? 'infinite' : '-infinite';
  return x.toExponential(Math.max(digits - 1, 0)).replace('e+', 'e');
}

// Made once: `toLocaleString` with a locale builds a new formatter on every call, which costs as much
// as the rest of a scenario's assessment.
const PLAIN_DIGITS = new Intl.NumberFormat('en-US', { maximumFractionDigits: 20 });

/** Where a figure reads better in plain digits than in exponent form: 0.05, 0.1, 3, 500, 12,000. */
const PLAIN_FROM = 0.01;
const PLAIN_BELOW = 1e5;

function plain(x: number, digits: number): string {
  return PLAIN_DIGITS.format(Number(x.toPrecision(Math.max(digits, 1))));
}

/**
 * The one number format of every output (check, reports, viewer): two significant figures, in plain digits
 * from 0.01 up to 100,000 (0.05, 3, 12,000) and in exponent form outside it (2.5e-5, 1.0e-4), where
 * a row of zeros would hide the magnitude.
 */
export function formatFigure(x: number, digits = SIGNIFICANT_FIGURES): string {
  if (!Number.isFinite(x) || x <= 0) return formatScientific(x, digits);
  if (x >= PLAIN_FROM && x < PLAIN_BELOW) return plain(x, digits);
  return formatScientific(x, digits);
}

export function formatFrequency(perYear: number, digits = SIGNIFICANT_FIGURES): string {
  return `${formatFigure(perYear, digits)} /yr`;
}

export function formatPerHour(perHour: number, digits = SIGNIFICANT_FIGURES): string {
  return `${formatFigure(perHour, digits)} /h`;
}

export function formatProbability(p: number, digits = SIGNIFICANT_FIGURES): string {
  return formatFigure(p, digits);
}

/** A ratio such as an RRF or a gap, to two significant figures in plain digits: 57, 500, 12,000, 0.25. */
export function formatRatio(x: number, digits = SIGNIFICANT_FIGURES): string {
  if (!Number.isFinite(x) || x <= 0) return formatScientific(x, digits);
  if (x >= 1e7 || x < 1e-3) return formatScientific(x, digits);
  return plain(x, digits);
}

/**
 * The mitigated frequency over the tolerable one, in words: above 1 a gap to close, below 1 a margin
 * (how many times below the target it lies), at 1 exactly on it.
 */
export function gapParts(ratio: number): { word: 'gap' | 'margin' | 'on target'; figure: string } {
  if (ratio > 1) return { word: 'gap', figure: `${formatRatio(ratio)} x tolerable` };
  if (ratio === 1) return { word: 'on target', figure: 'exactly the tolerable frequency' };
  if (ratio <= 0) return { word: 'margin', figure: 'nothing reaches the scenario' };
  return { word: 'margin', figure: `${formatRatio(ratio)} x tolerable (${formatRatio(1 / ratio)} times below it)` };
}

export function gapText(ratio: number): string {
  const { word, figure } = gapParts(ratio);
  return `${word} ${figure}`;
}
