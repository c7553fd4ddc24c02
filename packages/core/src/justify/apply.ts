// Justifications applied to findings: a matching justification marks a finding accepted (never removes
// it), and a justification that matches no finding becomes a finding itself, so nothing goes unseen.
import type { Acceptance, Finding, RuleInForce } from '../vocabulary/types.ts';
import type { Span } from '../diagnostics/diagnostic.ts';
import type { SpanMap } from '../bulk/to-model.ts';
import type { Justification } from '../model/schema.ts';
import { spanAt } from '../loader/schema-issues.ts';
import { mirroredKeyOf } from '../rules/define.ts';

export const STALE_JUSTIFICATION = 'stale-justification';
export const DUPLICATE_JUSTIFICATION = 'duplicate-justification';

const COMMON_PRACTICE = 'common practice, no source';

/**
 * The two rules this module raises, in the same shape as the independence rules so that reports list
 * them in the rule set in force. Stale is `needs-justification`: an acceptance that no longer refers to
 * anything cannot void credit by itself, but someone must look at it (the finding it was written for may
 * have changed key while the problem remains), so `--fail-on needs-justification` catches it and SARIF
 * shows it as a warning. A note would let it pass review unseen; that is what this rule exists to stop.
 */
export const JUSTIFICATION_RULES = [
  {
    id: DUPLICATE_JUSTIFICATION,
    title: 'Finding accepted more than once',
    severity: 'note',
    defaultSeverity: 'note',
    source: COMMON_PRACTICE,
    rationale:
      'Two acceptances of one finding may disagree; the report shows the most recent one and lists this so a reviewer can remove the other.',
  },
  {
    id: STALE_JUSTIFICATION,
    title: 'Justification matches no finding',
    severity: 'needs-justification',
    defaultSeverity: 'needs-justification',
    source: COMMON_PRACTICE,
    rationale:
      'An acceptance is evidence only while it refers to a finding that exists. A justification left behind after a change of the model may mean the finding it was written for was fixed, or that it changed its key and now stands unaccepted: a reviewer must decide which and remove or rewrite the justification.',
  },
] as const satisfies readonly (RuleInForce & { rationale: string })[];

export interface JustifiedFindings {
  /** The input findings, in their order, each with `accepted` set when a justification names its key. */
  findings: Finding[];
  /** One finding per justification key that matches no finding, and one per key accepted twice. */
  stale: Finding[];
  /** Where each finding in `stale` points: the `accept` statement in the model file (when spans were given). */
  locations: Record<string, Span>;
}

/** The key a stale or duplicate finding is about: the justification's own `finding` text. */
export function justifiedKeyOf(finding: Pick<Finding, 'rule' | 'key'>): string | undefined {
  for (const rule of [STALE_JUSTIFICATION, DUPLICATE_JUSTIFICATION]) {
    if (finding.rule === rule && finding.key.startsWith(`${rule}:`)) return finding.key.slice(rule.length + 1);
  }
  return undefined;
}

function compareText(a: string, b: string): number {
  return a < b ? -1 : a > b ? 1 : 0;
}

/**
 * The acceptance kept when several justifications name one key: the most recent date, then `by`, then
 * `reason`, so the choice never depends on the order of statements in the file.
 */
function preferred(a: Justification, b: Justification): Justification {
  const order = compareText(b.date, a.date) || compareText(a.by, b.by) || compareText(a.reason, b.reason);
  return order <= 0 ? a : b;
}

function metaFinding(rule: (typeof JUSTIFICATION_RULES)[number], key: string, message: string): Finding {
  return {
    key: `${rule.id}:${key}`,
    rule: rule.id,
    title: rule.title,
    severity: rule.severity,
    parties: [],
    paths: [],
    message,
    rationale: rule.rationale,
    source: rule.source,
  };
}

interface Chosen {
  chosen: Justification;
  index: number;
  count: number;
}

/** The justifications by the finding key they name, each key with the acceptance kept and how many named it. */
export type Acceptances = ReadonlyMap<string, Chosen>;

export function acceptancesOf(justifications: readonly Justification[] | undefined): Acceptances {
  const byKey = new Map<string, Chosen>();
  (justifications ?? []).forEach((j, index) => {
    const seen = byKey.get(j.finding);
    if (!seen) byKey.set(j.finding, { chosen: j, index, count: 1 });
    else {
      const chosen = preferred(seen.chosen, j);
      byKey.set(j.finding, { chosen, index: chosen === j ? index : seen.index, count: seen.count + 1 });
    }
  });
  return byKey;
}

/**
 * The findings, in their order, each marked accepted when a justification names its key, and the mirrored key
 * of each finding that has one. Costs what the findings cost, whatever the number of justifications.
 */
export function acceptFindings(findings: readonly Finding[], byKey: Acceptances): { findings: Finding[]; mirrored: Map<string, string> } {
  // A justification written against a key with the two layers the other way round (keys once followed
  // list order) still accepts its finding; the finding keeps its own key.
  const mirrored = new Map<string, string>();
  for (const f of findings) {
    const mirror = mirroredKeyOf(f);
    if (mirror !== undefined && mirror !== f.key) mirrored.set(f.key, mirror);
  }
  const out = findings.map((f): Finding => {
    const mirror = mirrored.get(f.key);
    const j = byKey.get(f.key) ?? (mirror !== undefined ? byKey.get(mirror) : undefined);
    if (!j) return f;
    const accepted: Acceptance = { by: j.chosen.by, date: j.chosen.date, reason: j.chosen.reason };
    return { ...f, accepted };
  });
  return { findings: out, mirrored };
}

export function applyJustifications(
  findings: readonly Finding[],
  justifications: readonly Justification[] | undefined,
  spans?: SpanMap,
): JustifiedFindings {
  const byKey = acceptancesOf(justifications);
  const { findings: out, mirrored } = acceptFindings(findings, byKey);
  const known = new Set([...findings.map((f) => f.key), ...mirrored.values()]);
  const stale: Finding[] = [];
  const locations: Record<string, Span> = Object.create(null) as Record<string, Span>; // keyed by finding keys
  const [duplicateRule, staleRule] = JUSTIFICATION_RULES;
  for (const key of [...byKey.keys()].sort(compareText)) {
    const j = byKey.get(key)!;
    const raised: Finding[] = [];
    if (!known.has(key)) {
      raised.push(
        metaFinding(staleRule, key, `the justification for \`${key}\` (by ${j.chosen.by}, ${j.chosen.date}) matches no finding`),
      );
    }
    if (j.count > 1) {
      raised.push(
        metaFinding(duplicateRule, key, `\`${key}\` is accepted by ${j.count} justifications; the one by ${j.chosen.by} on ${j.chosen.date} is shown`),
      );
    }
    for (const f of raised) {
      stale.push(f);
      const span = spans ? spanAt(spans, ['justifications', j.index, 'finding']) : undefined;
      if (span) locations[f.key] = span;
    }
  }
  return { findings: out, stale, locations };
}
