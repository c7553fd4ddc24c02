// Justifications applied to findings: a matching justification marks a finding accepted (never removes
// it), and a justification that matches no finding becomes a finding itself, so nothing goes unseen.
import type { Acceptance, Finding, RuleInForce } from '../vocabulary/types.ts';
import type { Span } from '../diagnostics/diagnostic.ts';
import type { SpanMap } from '../bulk/to-model.ts';
import type { Justification } from '../model/schema.ts';
import { spanAt } from '../loader/schema-issues.ts';
import { mirroredKeyOf } from '../rules/define.ts';
import {
  catalogueEntry,
  JUSTIFICATION_ENTRIES,
  renderMessage,
  ruleIdOf,
  say,
  type FindingMessage,
  type JustificationRuleId,
} from '../catalogue/catalogue.ts';

export const STALE_JUSTIFICATION = 'stale-justification';
export const DUPLICATE_JUSTIFICATION = 'duplicate-justification';

/**
 * The two rules this module raises (catalogue/justification/), as the rule set in force lists them: at
 * their default severity, which is the severity their findings take.
 */
export const JUSTIFICATION_RULES: readonly (RuleInForce & { rationale: string })[] = JUSTIFICATION_ENTRIES.map((e) => ({
  id: e.id,
  title: e.title,
  severity: e.defaultSeverity,
  defaultSeverity: e.defaultSeverity,
  source: e.source,
  rationale: e.rationale,
}));

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

type JustificationMessage = Extract<FindingMessage, { messageId: `${JustificationRuleId}/${string}` }>;

function metaFinding(key: string, says: JustificationMessage): Finding {
  const rule = catalogueEntry(ruleIdOf(says))!;
  return {
    key: `${rule.id}:${key}`,
    rule: rule.id,
    title: rule.title,
    severity: rule.defaultSeverity,
    parties: [],
    paths: [],
    ...says,
    message: renderMessage(says),
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
export function acceptFindings(
  findings: readonly Finding[],
  byKey: Acceptances,
): { findings: Finding[]; mirrored: Map<string, string> } {
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
  for (const key of [...byKey.keys()].sort(compareText)) {
    const j = byKey.get(key)!;
    const raised: Finding[] = [];
    if (!known.has(key)) {
      raised.push(
        metaFinding(key, say('stale-justification/matches-nothing', { key, by: j.chosen.by, date: j.chosen.date })),
      );
    }
    if (j.count > 1) {
      raised.push(
        metaFinding(
          key,
          say('duplicate-justification/accepted-again', { key, count: j.count, by: j.chosen.by, date: j.chosen.date }),
        ),
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
