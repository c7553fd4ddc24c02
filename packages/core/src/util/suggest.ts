// "Did you mean" suggestions for misspelt tags, keywords and attribute names.

/** Two rows of the distance table, reused between calls: a file of many misspellings allocates nothing. */
let previousRow = new Int32Array(64);
let currentRow = new Int32Array(64);

/** Levenshtein distance (case-insensitive), with an early exit once it exceeds `limit`. */
export function editDistance(a: string, b: string, limit = Infinity): number {
  if (a === b) return 0;
  if (Math.abs(a.length - b.length) > limit) return limit + 1;
  const x = a.toLowerCase();
  const y = b.toLowerCase();
  if (previousRow.length <= y.length) {
    previousRow = new Int32Array(y.length + 1);
    currentRow = new Int32Array(y.length + 1);
  }
  let previous = previousRow;
  let current = currentRow;
  for (let j = 0; j <= y.length; j++) previous[j] = j;
  for (let i = 1; i <= x.length; i++) {
    current[0] = i;
    let rowMin = i;
    const ch = x.charCodeAt(i - 1);
    for (let j = 1; j <= y.length; j++) {
      const cost = ch === y.charCodeAt(j - 1) ? 0 : 1;
      const value = Math.min(previous[j]! + 1, current[j - 1]! + 1, previous[j - 1]! + cost);
      current[j] = value;
      if (value < rowMin) rowMin = value;
    }
    if (rowMin > limit) return limit + 1;
    [previous, current] = [current, previous];
  }
  return previous[y.length]!;
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
    if (word.length >= 3 && candidate.length > word.length && candidate.toLowerCase().startsWith(word.toLowerCase()))
      extending.push(candidate);
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
 * a work budget caps the total (in characters compared, so long words cost their share): past it,
 * suggestions stop, the diagnostics themselves do not.
 */
export class Suggester {
  private readonly candidates: readonly string[];
  private comparisons = 0;

  constructor(
    candidates: Iterable<string>,
    private readonly budget = 4_000_000,
  ) {
    this.candidates = [...candidates];
    for (const c of this.candidates) this.totalLength += c.length;
  }

  private readonly totalLength: number = 0;

  didYouMean(word: string): string | undefined {
    if (this.comparisons >= this.budget) return undefined;
    this.comparisons += this.totalLength + this.candidates.length * (word.length + 1);
    return didYouMean(word, this.candidates);
  }
}
