// "Did you mean" suggestions for misspelt tags, keywords and attribute names.

/** Levenshtein distance, with an early exit once it exceeds `limit`. */
export function editDistance(a: string, b: string, limit = Infinity): number {
  if (a === b) return 0;
  if (Math.abs(a.length - b.length) > limit) return limit + 1;
  let previous = Array.from({ length: b.length + 1 }, (_, i) => i);
  for (let i = 1; i <= a.length; i++) {
    const current = [i];
    let rowMin = i;
    for (let j = 1; j <= b.length; j++) {
      const cost = a[i - 1]!.toLowerCase() === b[j - 1]!.toLowerCase() ? 0 : 1;
      const value = Math.min(previous[j]! + 1, current[j - 1]! + 1, previous[j - 1]! + cost);
      current.push(value);
      rowMin = Math.min(rowMin, value);
    }
    if (rowMin > limit) return limit + 1;
    previous = current;
  }
  return previous[b.length]!;
}

/**
 * The closest candidate within a third of the word's length (at least 1, at most 3 edits); failing
 * that, the one candidate the word begins (`mounted` for `mounted-on`), if only one does.
 */
export function suggest(word: string, candidates: Iterable<string>): string | undefined {
  const limit = Math.max(1, Math.min(3, Math.floor(word.length / 3)));
  let best: string | undefined;
  let bestDistance = limit + 1;
  const extending: string[] = [];
  for (const candidate of candidates) {
    if (word.length >= 3 && candidate.length > word.length && candidate.toLowerCase().startsWith(word.toLowerCase())) extending.push(candidate);
    const d = editDistance(word, candidate, limit);
    if (d < bestDistance || (d === bestDistance && best !== undefined && candidate < best)) {
      best = candidate;
      bestDistance = d;
    }
  }
  if (bestDistance <= limit) return best;
  return extending.length === 1 ? extending[0] : undefined;
}

export function didYouMean(word: string, candidates: Iterable<string>): string | undefined {
  const s = suggest(word, candidates);
  return s === undefined ? undefined : `did you mean \`${s}\`?`;
}

/**
 * "Did you mean" over a large, fixed set of candidates (every tag of a site), for many misspellings.
 * Comparing each of 20,000 unknown references with 20,000 tags is 400 million edit distances, so
 * a work budget caps the total: past it, suggestions stop, the diagnostics themselves do not.
 */
export class Suggester {
  private readonly candidates: readonly string[];
  private comparisons = 0;

  constructor(
    candidates: Iterable<string>,
    private readonly budget = 2_000_000,
  ) {
    this.candidates = [...candidates];
  }

  didYouMean(word: string): string | undefined {
    if (this.comparisons >= this.budget) return undefined;
    this.comparisons += this.candidates.length;
    return didYouMean(word, this.candidates);
  }
}
