// Number and word formatting for the viewer's tables. Three significant figures, exponent form for
// small frequencies, so a figure on screen can be read back and compared with the JSON report.

export function formatFigure(n: number): string {
  if (!Number.isFinite(n)) return String(n);
  if (n === 0) return '0';
  const abs = Math.abs(n);
  if (abs < 1e-3 || abs >= 1e6) return n.toExponential(2).replace(/\.?0+e/, 'e');
  return String(Number(n.toPrecision(3)));
}

export function perYear(n: number): string {
  return `${formatFigure(n)} /yr`;
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
