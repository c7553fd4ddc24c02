// The sources the rules cite, listed once: each work with its edition, the clauses cited from it, and
// whether each clause was checked against the text or cited from memory (the rules mark the latter).
// The rules keep citing in their own words; this reads those words, so nothing is cited twice over.

export interface SourceEntry {
  id: string;
  work: string;
  edition?: string;
  clauses: string[];
  /** yes: no clause is marked from memory; partly: some are (marked on the clause); from-memory: all are. */
  checked: 'yes' | 'partly' | 'from-memory' | 'no-source';
  rules: string[];
}

/** Splits on `;` outside parentheses and brackets: "ch. 6 (a; b); IEC ..." is two citations, not three. */
export function splitCitations(source: string): string[] {
  const out: string[] = [];
  let depth = 0;
  let start = 0;
  for (let i = 0; i < source.length; i++) {
    const c = source[i];
    if (c === '(' || c === '[') depth++;
    else if ((c === ')' || c === ']') && depth > 0) depth--;
    else if (c === ';' && depth === 0) {
      out.push(source.slice(start, i).trim());
      start = i + 1;
    }
  }
  out.push(source.slice(start).trim());
  return out.filter((c) => c !== '');
}

const FROM_MEMORY = /\s*[[(][^\])]*from memory[^\])]*[\])]|,?\s*from memory\b/i;
const NO_SOURCE = /common practice, no source|owner's policy|conservative default of this tool/i;
/** Short names the rules use for a work, and the title the appendix lists it under. */
const ALIASES: Record<string, string> = { 'CCPS LOPA': 'CCPS, Layer of Protection Analysis' };

interface Citation {
  work: string;
  edition?: string | undefined;
  clause: string;
  memory: boolean;
  noSource: boolean;
}

/** One citation read as work, edition and clause: "IEC 61511-1:2016 9.4", "CCPS, Title (2001), ch. 6". */
export function readCitation(text: string): Citation {
  const memory = FROM_MEMORY.test(text);
  const bare = text.replace(FROM_MEMORY, '').trim();
  if (NO_SOURCE.test(bare))
    return {
      work: "Common practice or owner's policy (no published source)",
      clause: bare,
      memory: false,
      noSource: true,
    };
  const titled = /^(.*?)\s*\((\d{4})\),?\s*(.*)$/.exec(bare); // CCPS, Title (2001), ch. 6
  const coloned = /^([A-Z][\w/. -]*?\d[\w.-]*):(\d{4})\s*(.*)$/.exec(bare); // IEC 61511-1:2016 9.4
  const dashed = /^([A-Z][\w/]*-[A-Z]?[\d.]+)-(\d{4})\s*(.*)$/.exec(bare); // ANSI/ISA-S84.01-1996 Annex B
  const match = coloned ?? dashed ?? titled;
  if (!match) {
    const parts = /^([^\s(]+)\s*(.*)$/.exec(bare)!;
    return { work: parts[1]!, clause: parts[2] ?? '', memory, noSource: false };
  }
  const work = match[1]!.trim();
  return { work: ALIASES[work] ?? work, edition: match[2], clause: (match[3] ?? '').trim(), memory, noSource: false };
}

/** Every work cited by the rules given, once, numbered R1, R2, ... in order of first citation. */
export function sourceList(rules: readonly { id: string; source: string }[]): SourceEntry[] {
  const entries = new Map<string, SourceEntry & { memory: number; cited: number }>();
  for (const rule of rules) {
    for (const text of splitCitations(rule.source)) {
      const c = readCitation(text);
      const key = `${c.work}\u0000${c.edition ?? ''}`;
      let entry = entries.get(key);
      if (!entry)
        entries.set(
          key,
          (entry = {
            id: '',
            work: c.work,
            ...(c.edition ? { edition: c.edition } : {}),
            clauses: [],
            checked: 'yes',
            rules: [],
            memory: 0,
            cited: 0,
          }),
        );
      const clause = c.clause === '' ? '' : `${c.clause}${c.memory ? ' [from memory]' : ''}`;
      if (clause !== '' && !entry.clauses.includes(clause)) entry.clauses.push(clause);
      if (!entry.rules.includes(rule.id)) entry.rules.push(rule.id);
      entry.cited++;
      if (c.memory) entry.memory++;
      if (c.noSource) entry.checked = 'no-source';
    }
  }
  return [...entries.values()].map(({ memory, cited, ...e }, i) => ({
    ...e,
    id: `R${i + 1}`,
    checked:
      e.checked === 'no-source' ? 'no-source' : memory === 0 ? 'yes' : memory === cited ? 'from-memory' : 'partly',
  }));
}

/** The references a rule cites, as the ids of sourceList: "R1, R4". */
export function referencesOf(sources: readonly SourceEntry[], rule: string): string[] {
  return sources.filter((s) => s.rules.includes(rule)).map((s) => s.id);
}
