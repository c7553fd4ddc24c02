// Determinism: the demo models with their statements, each scenario's lines and every list whose order
// means nothing (links, sensors, final elements) shuffled by a seeded random source. Every report format
// must come out byte for byte the same apart from source positions, and every finding key unchanged
// (issue 10: a layer-layer finding once named its sides in list order, so a justification went stale).
import { describe, expect, it } from 'vitest';
import { renderReport, REPORT_FORMATS, type ReportInput } from '@bulkhead/core';
import { Random } from '../helpers/random.ts';
import { DEMO, DEMO_REV_B, demoInput, readDemo } from './demo.ts';

/** List attributes whose items are a set: the order they are written in carries no meaning. */
const SET_LISTS =
  /\b(sensors|finals|mounted-on|connected-through|signal-via|housed-in|powered-by|air-from|hydraulic-from)=([^\s"#]+)/g;

/** The model text with statements, scenario lines and set-like lists in a random order; comments dropped. */
export function shuffleModel(text: string, random: Random): string {
  const statements: string[][] = [];
  for (const line of text.split('\n')) {
    if (line.trim() === '' || line.trimStart().startsWith('#')) continue;
    const shuffled = line.replace(
      SET_LISTS,
      (_, key: string, list: string) => `${key}=${random.shuffle(list.split(',')).join(',')}`,
    );
    if (/^\s/.test(line)) statements[statements.length - 1]!.push(shuffled);
    else statements.push([shuffled]);
  }
  return `${random
    .shuffle(statements)
    .map(([head, ...lines]) => [head, ...random.shuffle(lines)].join('\n'))
    .join('\n')}\n`;
}

/** A report with every source position taken out: SARIF regions, and `file:line:column` references. */
function withoutPositions(format: string, text: string): string {
  if (format === 'sarif') return JSON.stringify(JSON.parse(text, (k, v) => (k === 'region' ? undefined : v)));
  return text.replace(/:\d+:\d+\b/g, ':L:C');
}

function rendered(input: ReportInput): Map<string, string> {
  return new Map(REPORT_FORMATS.map((format) => [format, withoutPositions(format, renderReport(input, format))]));
}

describe.each([DEMO, DEMO_REV_B])('%s under shuffled statements, scenario lines and lists', (file) => {
  const original = demoInput(file);
  const reports = rendered(original);
  // The analysis lists findings scenario by scenario, in model order; the reports put them in one order.
  const keysOf = (input: ReportInput) =>
    input.analysis.findings.map((f) => `${f.key} ${f.severity} ${f.accepted ? 'accepted' : 'open'}`).sort();
  const keys = keysOf(original);

  it('the shuffle really moves things (a canary for this test)', () => {
    const text = readDemo(file);
    const shuffled = shuffleModel(text, new Random(1));
    expect(shuffled).not.toBe(text);
    const layers = (t: string) =>
      t
        .split('\n')
        .filter((l) => /^\s+layer /.test(l))
        .join('\n');
    const moved = [1, 2, 3, 4, 5].some(
      (seed) => layers(shuffleModel(text, new Random(seed))) !== layers(shuffleModel(text, new Random(0))),
    );
    expect(moved).toBe(true);
  });

  it.each(Array.from({ length: 12 }, (_, i) => i + 1))(
    'seed %i: every format is identical apart from positions, every finding key unchanged',
    (seed) => {
      const input = demoInput(file, shuffleModel(readDemo(file), new Random(seed)), { sha: original.sha256 });
      expect(keysOf(input)).toEqual(keys);
      const actual = rendered(input);
      for (const format of REPORT_FORMATS) expect(actual.get(format), format).toBe(reports.get(format));
    },
  );
});

describe('revision B with the two layers of S-101 swapped (the case issue 10 reports)', () => {
  it('keeps its accepted diversity justification and every verdict', () => {
    const text = readDemo(DEMO_REV_B);
    const swapped = text.replace(/^( {2}layer SIF-101 .*)\n( {2}layer LAH-101 .*)$/m, '$2\n$1');
    expect(swapped).not.toBe(text);
    const before = demoInput(DEMO_REV_B);
    const after = demoInput(DEMO_REV_B, swapped, { sha: before.sha256 });
    const accepted = (input: ReportInput) => input.analysis.findings.filter((f) => f.accepted).map((f) => f.key);
    expect(accepted(after)).toEqual(accepted(before));
    expect(accepted(after)).toContain('same-make-model:S-101:LAH-101+SIF-101:LT-102:LT-103');
    expect(after.analysis.findings.some((f) => f.rule === 'stale-justification')).toBe(false);
    for (const format of REPORT_FORMATS)
      expect(withoutPositions(format, renderReport(after, format))).toBe(
        withoutPositions(format, renderReport(before, format)),
      );
  });
});
