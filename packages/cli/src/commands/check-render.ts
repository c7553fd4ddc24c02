// Text output of `bulkhead check`, answer first: one screen with every scenario's verdict, then per
// scenario its LOPA block and its findings grouped by the layer they concern, each rule's rationale
// printed once in a legend at the end. Notes are counted; `--verbose` lists them.
import {
  ASSESSMENT_CAUTION,
  findingNotice,
  ModelLocator,
  renderNotice,
  renderAssessmentText,
  type Analysis,
  type Finding,
  type LoadResult,
  type Model,
  type ScenarioAssessment,
} from '@bulkhead/core';
import { PLAIN, type Paint } from '../colour.ts';
import { scenarioSummary } from './check-summary.ts';

export interface CheckTextOptions {
  /** List notes (findings that change no credit) as well as count them. */
  verbose?: boolean;
  paint?: Paint;
}

/** The layer a finding is listed under: the claim it points at (the last layer party), else none. */
function layerOf(f: Finding): string | undefined {
  return [...f.parties].reverse().find((p) => p.role === 'layer')?.tag;
}

function plural(n: number, one: string, many = `${one}s`): string {
  return `${n} ${n === 1 ? one : many}`;
}

function findingText(f: Finding, result: LoadResult, locate: ModelLocator): string {
  const notice = findingNotice(f, locate);
  // The rationale is printed once per rule in the legend at the end, not under every finding.
  const facts = notice.facts.filter((fact) => fact.label !== 'why');
  return renderNotice(
    { ...notice, facts, reference: { label: 'key', text: `${f.key} (rule ${f.rule}, see the rules at the end)` } },
    result.source,
  );
}

interface Group {
  title: string;
  shown: Finding[];
  notes: number;
}

function groupByLayer(a: ScenarioAssessment | undefined, findings: readonly Finding[], verbose: boolean): Group[] {
  const order = a ? a.layers.map((l) => l.function) : [];
  const groups = new Map<string | undefined, Group>();
  const groupOf = (layer: string | undefined): Group => {
    const key = layer !== undefined && order.includes(layer) ? layer : undefined;
    let g = groups.get(key);
    if (!g)
      groups.set(
        key,
        (g = {
          title:
            key !== undefined
              ? `findings on layer ${key}`
              : a
                ? `findings on ${a.scenario} itself (cause, enablers, modifiers)`
                : 'model-wide findings',
          shown: [],
          notes: 0,
        }),
      );
    return g;
  };
  for (const f of findings) {
    const g = groupOf(layerOf(f));
    if (f.severity === 'note' && !verbose) g.notes++;
    else g.shown.push(f);
  }
  const rank = (key: string | undefined) => (key === undefined ? order.length : order.indexOf(key));
  return [...groups].sort(([x], [y]) => rank(x) - rank(y)).map(([, g]) => g);
}

function groupLines(groups: readonly Group[], result: LoadResult, locate: ModelLocator, paint: Paint): string[] {
  const out: string[] = [];
  for (const g of groups) {
    const notes = g.notes ? ` (${plural(g.notes, 'note')} among them, not listed: --verbose lists them)` : '';
    out.push(paint.strong(`-- ${g.title}: ${plural(g.shown.length + g.notes, 'finding')}${notes}`), '');
    for (const f of g.shown) out.push(findingText(f, result, locate), '');
  }
  return out;
}

function legend(findings: readonly Finding[], paint: Paint): string[] {
  const rules = new Map<string, Finding>();
  for (const f of findings) if (!rules.has(f.rule)) rules.set(f.rule, f);
  if (rules.size === 0) return [];
  const out = [paint.strong('== rules =='), ''];
  for (const [id, f] of [...rules].sort(([x], [y]) => (x < y ? -1 : x > y ? 1 : 0))) {
    out.push(`${id}: ${f.title}`, `  why      ${f.rationale}`, `  source   ${f.source}`, '');
  }
  return out;
}

export function renderCheck(
  result: LoadResult & { model: Model },
  analysis: Analysis,
  options: CheckTextOptions = {},
): string {
  const parts: string[] = [];
  writeCheck(result, analysis, options, (text) => parts.push(text));
  return parts.join('');
}

/**
 * The same text as renderCheck, handed to `write` a scenario at a time, so a large site's report (tens of
 * megabytes) is never held whole, once as lines and again as one string, at the peak of a run.
 */
export function writeCheck(
  result: LoadResult & { model: Model },
  analysis: Analysis,
  options: CheckTextOptions,
  write: (text: string) => void,
): void {
  const paint = options.paint ?? PLAIN;
  const verbose = options.verbose ?? false;
  const locate = new ModelLocator(result.model, result.spans);
  // Grouped once: filtering every finding for each scenario would grow with scenarios times findings.
  const byScenario = new Map<string | undefined, Finding[]>();
  for (const f of analysis.findings)
    (byScenario.get(f.scenario) ?? byScenario.set(f.scenario, []).get(f.scenario)!).push(f);
  const counts = { 'voids-credit': 0, 'needs-justification': 0, note: 0, accepted: 0 };
  for (const f of analysis.findings) counts[f.accepted ? 'accepted' : f.severity]++;
  const meeting = analysis.assessments.filter((a) => a.meetsAfter).length;
  const total = analysis.assessments.length;

  const out = new LineWriter(write);
  out.push(
    paint.strong(
      `${result.source.file}: ${plural(total, 'scenario')}, ${meeting} meeting ${meeting === 1 ? 'its' : 'their'} criterion after independence, ${total - meeting} falling short`,
    ),
    '',
  );
  for (const a of analysis.assessments) out.push(...scenarioSummary(a, paint), '');
  out.push(
    `findings: ${counts['voids-credit']} void credit, ${counts['needs-justification']} need a justification, ${plural(counts.note, 'note')}${counts.note && !verbose ? ' (--verbose lists them)' : ''}, ${counts.accepted} accepted; detail below`,
    `Caution: ${ASSESSMENT_CAUTION}`,
    '',
  );
  for (const a of analysis.assessments) {
    out.push(
      paint.strong(`== ${a.scenario}${a.title ? `: ${a.title}` : ''} ==`),
      '',
      ...renderAssessmentText(a).slice(1),
      '',
    );
    out.push(...groupLines(groupByLayer(a, byScenario.get(a.scenario) ?? [], verbose), result, locate, paint));
  }
  const loose = byScenario.get(undefined) ?? [];
  if (loose.length)
    out.push(
      paint.strong('== model =='),
      '',
      ...groupLines(groupByLayer(undefined, loose, verbose), result, locate, paint),
    );
  out.push(...legend(verbose ? analysis.findings : analysis.findings.filter((f) => f.severity !== 'note'), paint));
  out.end();
}

/** Lines joined by newlines, passed on in pieces; the run of newlines at the very end becomes one. */
export class LineWriter {
  private buffer = '';
  private started = false;

  /** `flushAt`: how much text is held before it is passed on (small in tests, to cross many boundaries). */
  constructor(
    private readonly write: (text: string) => void,
    private readonly flushAt = 1 << 16,
  ) {}

  push(...lines: string[]): void {
    for (const line of lines) {
      this.buffer += this.started ? `\n${line}` : line;
      this.started = true;
    }
    if (this.buffer.length > this.flushAt) {
      // Trailing newlines stay behind: only at the end is it known whether they are the last ones.
      const kept = this.buffer.length - /\n*$/.exec(this.buffer)![0].length;
      this.write(this.buffer.slice(0, kept));
      this.buffer = this.buffer.slice(kept);
    }
  }

  end(): void {
    this.write(`${this.buffer.replace(/\n+$/, '')}\n`);
    this.buffer = '';
  }
}
