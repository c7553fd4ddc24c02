// Number and word formatting for the viewer: the core's number formats (the same figures as `check`
// and the reports), and the words for verdicts and severities.
import { formatFigure as coreFigure, formatFrequency, formatRatio } from '@bulkhead/core';

/** Frequencies and probabilities as every Bulkhead output writes them: 2.5e-5, 0.1, 3 (core's one formatter). */
export function formatFigure(n: number): string {
  return coreFigure(n);
}

/** Ratios (gap, RRF) in plain digits: 500, 0.4. */
export function formatTimes(n: number): string {
  return formatRatio(n);
}

export function perYear(n: number): string {
  return formatFrequency(n);
}

export const VERDICT_WORDS: Record<string, string> = {
  independent: 'credited: independent',
  voided: 'no credit: not independent',
  unverified: 'no credit: unverified (model incomplete)',
  open: 'no credit until justified',
  accepted: 'credited: finding accepted',
  'not-selected': 'no credit: conflicts with a better layer',
};

export const SEVERITY_WORDS: Record<string, string> = {
  'voids-credit': 'voids credit',
  'needs-justification': 'needs justification',
  note: 'note',
};

export function plural(n: number, word: string): string {
  return `${n} ${word}${n === 1 ? '' : 's'}`;
}

/** A reason as a sentence: a capital first letter and a full stop ("the file is gone" -> "The file is gone."). */
export function asSentence(text: string): string {
  const trimmed = text.trim();
  if (trimmed === '') return '';
  const capital = trimmed.charAt(0).toUpperCase() + trimmed.slice(1);
  return /[.!?]$/.test(capital) ? capital : `${capital}.`;
}
