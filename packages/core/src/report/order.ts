// The one sort order every report uses, so the same input gives byte-identical output whatever order
// the model's statements came in. No locale is consulted: the order is the same on every machine.
import type { SeverityLevel } from '../model/schema.ts';

const CHUNK = /(\d+|\D+)/g;

/**
 * Natural order on tags: digit runs compare by value, so S-2 comes before S-10. Ties (S-01 and S-1) fall
 * back to code-point order, so the order is total and never depends on input order.
 */
export function compareTags(a: string, b: string): number {
  if (a === b) return 0;
  const left = a.match(CHUNK) ?? [];
  const right = b.match(CHUNK) ?? [];
  for (let i = 0; i < Math.min(left.length, right.length); i++) {
    const x = left[i]!;
    const y = right[i]!;
    if (x === y) continue;
    const xDigits = /^\d/.test(x);
    const yDigits = /^\d/.test(y);
    if (xDigits && yDigits) {
      const xValue = x.replace(/^0+/, '');
      const yValue = y.replace(/^0+/, '');
      if (xValue.length !== yValue.length) return xValue.length - yValue.length;
      if (xValue !== yValue) return xValue < yValue ? -1 : 1;
      continue;
    }
    return x < y ? -1 : 1;
  }
  if (left.length !== right.length) return left.length - right.length;
  return a < b ? -1 : 1;
}

export const SEVERITY_RANK: Record<SeverityLevel, number> = { 'voids-credit': 0, 'needs-justification': 1, note: 2 };

export function byTag<T>(tagOf: (item: T) => string): (a: T, b: T) => number {
  return (a, b) => compareTags(tagOf(a), tagOf(b));
}

/** Findings: by scenario (model-wide ones last), then the most severe first, then by key. */
export function compareFindings(
  a: { scenario?: string; severity: SeverityLevel; key: string },
  b: { scenario?: string; severity: SeverityLevel; key: string },
): number {
  if (a.scenario !== b.scenario) {
    if (a.scenario === undefined) return 1;
    if (b.scenario === undefined) return -1;
    return compareTags(a.scenario, b.scenario);
  }
  return SEVERITY_RANK[a.severity] - SEVERITY_RANK[b.severity] || compareTags(a.key, b.key);
}
