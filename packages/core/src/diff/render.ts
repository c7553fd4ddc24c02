// The revision diff as text (answer first: how many scenarios got worse or better) and as Markdown for a
// review comment. Both list the same facts in the same order as the JSON.
import { ASSESSMENT_CAUTION, formatFrequency, formatRatio } from '../assess/index.ts';
import { escapeMarkdown } from '../report/markdown.ts';
import type { FindingRef, ScenarioFigures } from './compare-analysis.ts';
import type { AttributeChange, ItemChanges } from './compare-model.ts';
import type { RevisionDiff } from './index.ts';

const plural = (n: number, word: string) => `${n} ${word}${n === 1 ? '' : 's'}`;

/** The first line: what the change did, in the reviewer's terms. */
export function diffHeadline(diff: RevisionDiff): string {
  const s = diff.summary;
  const parts = [`${plural(s.worse, 'scenario')} got worse, ${s.better} better`];
  if (s.addedScenarios)
    parts.push(`${s.addedScenarios} added${s.addedFallingShort ? ` (${s.addedFallingShort} falling short)` : ''}`);
  if (s.removedScenarios) parts.push(`${s.removedScenarios} removed`);
  parts.push(
    `${plural(s.findingsAppeared, 'finding')} appeared, ${s.findingsDisappeared} disappeared, ${s.severityChanged} changed severity`,
  );
  if (s.acceptanceChanged) parts.push(`${plural(s.acceptanceChanged, 'finding')} changed acceptance`);
  if (s.staleJustifications) parts.push(`${plural(s.staleJustifications, 'justification')} made stale`);
  return s.modelChanges === 0 &&
    s.findingsAppeared + s.findingsDisappeared + s.severityChanged + s.acceptanceChanged === 0
    ? 'No change to the model or its independence.'
    : `${parts.join('; ')}.`;
}

function figuresText(f: ScenarioFigures | undefined): string {
  if (!f) return '-';
  const sil = f.requiredSil === undefined ? '' : `, SIL ${f.requiredSil === 0 ? 'none' : f.requiredSil}`;
  return `${f.meets ? 'meets' : 'falls short'}, ${formatFrequency(f.mitigatedAfter)}, gap ${formatRatio(f.gap)}${sil}`;
}

const changeText = (c: AttributeChange) => `${c.attribute}: ${c.old ?? '(none)'} -> ${c.new ?? '(none)'}`;
const findingText = (f: FindingRef) => `${f.severity} ${f.key}${f.accepted ? ' (accepted)' : ''}`;

function itemLines(what: string, items: ItemChanges, out: string[]): void {
  for (const a of items.added) out.push(`+ ${what} ${a.id} (${a.kind})`);
  for (const r of items.removed) out.push(`- ${what} ${r.id} (${r.kind})`);
  for (const c of items.changed) for (const change of c.changes) out.push(`~ ${what} ${c.id} ${changeText(change)}`);
}

export function renderDiffText(diff: RevisionDiff): string {
  const out = [diffHeadline(diff), `from ${diff.old} to ${diff.new}`, ''];
  const changed = diff.verdicts.filter((v) => v.change !== 'same');
  if (changed.length) {
    out.push('Scenarios (after independence: verdict, mitigated frequency, gap, SIL required of the SIF):');
    for (const v of changed) {
      const name = v.oldId ? `${v.oldId} -> ${v.scenario}` : v.scenario;
      out.push(
        `  ${v.change.toUpperCase()} ${name}${v.why ? `: ${v.why}` : ''}`,
        `      before ${figuresText(v.before)}`,
        `      after  ${figuresText(v.after)}`,
      );
    }
    out.push('');
  }
  if (diff.appeared.length + diff.disappeared.length + diff.severityChanged.length + diff.acceptanceChanged.length) {
    out.push('Findings:');
    for (const f of diff.appeared) out.push(`  + ${findingText(f)}`, `      ${f.message}`);
    for (const f of diff.disappeared) out.push(`  - ${findingText(f)}`);
    for (const c of diff.severityChanged) out.push(`  ~ ${c.new.key}: ${c.old.severity} -> ${c.new.severity}`);
    for (const c of diff.acceptanceChanged)
      out.push(`  ~ ${c.new.key}: ${c.new.accepted ? 'now accepted' : 'no longer accepted'}`);
    out.push('');
  }
  if (diff.staleJustifications.length) {
    out.push('Justifications made stale:');
    for (const j of diff.staleJustifications) out.push(`  ! ${j.finding}: ${j.reason}`);
    out.push('');
  }
  const model = modelChangeLines(diff);
  if (model.length) out.push('Model changes:', ...model.map((l) => `  ${l}`), '');
  out.push(ASSESSMENT_CAUTION);
  return `${out.join('\n')}\n`;
}

/** One line per model change: `>` renamed, `+` added, `-` removed, `~` attribute changed. */
function modelChangeLines(diff: RevisionDiff): string[] {
  const out: string[] = [];
  for (const r of diff.renames) out.push(`> ${r.kind} ${r.old} renamed ${r.new}`);
  itemLines('element', diff.elements, out);
  itemLines('function', diff.functions, out);
  itemLines('scenario', diff.scenarios, out);
  for (const c of diff.settings) out.push(`~ ${changeText(c)}`);
  for (const k of diff.justifications.added) out.push(`+ justification ${k}`);
  for (const k of diff.justifications.removed) out.push(`- justification ${k}`);
  for (const j of diff.justifications.changed)
    for (const c of j.changes) out.push(`~ justification ${j.finding} ${changeText(c)}`);
  return out;
}

const code = (text: string) => `\`${text.replace(/`/g, "'")}\``;

export function renderDiffMarkdown(diff: RevisionDiff): string {
  const out = [
    `# Revision diff`,
    '',
    `**${escapeMarkdown(diffHeadline(diff))}**`,
    '',
    `From ${code(diff.old)} to ${code(diff.new)}.`,
    '',
  ];
  const changed = diff.verdicts.filter((v) => v.change !== 'same');
  if (changed.length) {
    out.push('## Scenarios', '', '| Scenario | Change | Before | After |', '| --- | --- | --- | --- |');
    for (const v of changed) {
      const name = v.oldId ? `${v.oldId} → ${v.scenario}` : v.scenario;
      out.push(
        `| ${escapeMarkdown(name)} | ${v.change}${v.why ? `: ${escapeMarkdown(v.why)}` : ''} | ${escapeMarkdown(figuresText(v.before))} | ${escapeMarkdown(figuresText(v.after))} |`,
      );
    }
    out.push('');
  }
  if (diff.appeared.length + diff.disappeared.length + diff.severityChanged.length + diff.acceptanceChanged.length) {
    out.push('## Findings', '');
    for (const f of diff.appeared)
      out.push(
        `- appeared: ${f.severity} ${code(f.key)}${f.accepted ? ' (accepted)' : ''}: ${escapeMarkdown(f.message)}`,
      );
    for (const f of diff.disappeared) out.push(`- disappeared: ${f.severity} ${code(f.key)}`);
    for (const c of diff.severityChanged)
      out.push(`- severity: ${code(c.new.key)} ${c.old.severity} → ${c.new.severity}`);
    for (const c of diff.acceptanceChanged)
      out.push(`- ${c.new.accepted ? 'now accepted' : 'no longer accepted'}: ${code(c.new.key)}`);
    out.push('');
  }
  if (diff.staleJustifications.length) {
    out.push('## Justifications made stale', '');
    for (const j of diff.staleJustifications) out.push(`- ${code(j.finding)}: ${escapeMarkdown(j.reason)}`);
    out.push('');
  }
  const model = modelChangeLines(diff);
  if (model.length) out.push('## Model changes', '', '```', ...model.map((l) => l.replace(/`{3,}/g, "'''")), '```', '');
  out.push(`> ${ASSESSMENT_CAUTION}`, '');
  return out.join('\n');
}
