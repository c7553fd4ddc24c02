// What decides a layer's verdict, in one place for `check`, the worksheet and the actions list: the
// standing reasons (open or voiding, never a note or an accepted one), the voiding ones first, each
// with the element it names (or the rule, when it names none).

interface Reason {
  key: string;
  rule: string;
  severity: 'voids-credit' | 'needs-justification' | 'note';
  effect: 'voids' | 'caps' | 'unverified' | 'conflict' | 'note';
  accepted?: boolean | undefined;
  element?: string | undefined;
  cap?: number | undefined;
}

export interface Deciding {
  /** The element (or "its claimed PFD" for a cap, or the rule) and the rules that name it. */
  what: string;
  rules: string[];
}

/**
 * The reasons that decide a layer's credit now. For a layer with a voiding reason only those: the open
 * ones would not restore its credit alone; `open` counts the rest.
 */
export function decidingReasons(reasons: readonly Reason[] | undefined): { deciding: Deciding[]; open: number } {
  const standing = (reasons ?? []).filter((r) => r.effect !== 'note' && !r.accepted);
  const voiding = standing.filter((r) => r.severity === 'voids-credit');
  const decisive = voiding.length ? voiding : standing;
  const by = new Map<string, string[]>();
  for (const r of decisive) {
    const what = r.element ?? (r.effect === 'caps' && r.cap !== undefined ? 'its claimed PFD' : r.rule);
    const rules = by.get(what) ?? by.set(what, []).get(what)!;
    if (!rules.includes(r.rule)) rules.push(r.rule);
  }
  return { deciding: [...by].map(([what, rules]) => ({ what, rules })), open: standing.length - decisive.length };
}

/** "BR-101 (shared-bridle), JB-101 (shared-housing)". */
export function decidingText(deciding: readonly Deciding[]): string {
  return deciding.map((d) => `${d.what} (${d.rules.join(', ')})`).join(', ');
}
