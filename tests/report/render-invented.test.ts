// The renderers on invented inputs (tests/report/invented.ts: a tiny hand-written model and a hand-built
// analysis, not pipeline output): content, escaping, determinism, reorder invariance, schema validity.
import Ajv2020 from 'ajv/dist/2020.js';
import { describe, expect, it } from 'vitest';
import {
  buildReportDocument,
  compareTags,
  renderReport,
  REPORT_FORMATS,
  ReportDocument,
  reportJsonSchema,
} from '../../packages/core/src/report/index.ts';
import { checkCsvAgainstJson, checkHtml, checkSarif } from './checks.ts';
import { INVENTED_FINDINGS, INVENTED_TEXT, inventedAnalysis, inventedInput } from './invented.ts';

const input = inventedInput();
const doc = buildReportDocument(input);

describe('report document (invented data)', () => {
  it('should carry the header the auditor needs', () => {
    expect(doc.formatVersion).toBe(2);
    expect(doc.model).toEqual({ file: 'tests/invented/tiny.bulk', sha256: 'a'.repeat(64) });
    expect(doc.date).toBeUndefined();
    expect(doc.cautions.join(' ')).toMatch(/Decision support only/);
    expect(doc.cautions.join(' ')).toMatch(/IEC 61511, local codes and licensed engineering practice/);
    expect(doc.policy.map((p) => `${p.name}=${p.value}:${p.origin}`)).toEqual([
      'same-controller-layers=one-credit:default',
      'shared-solver=void:default',
      'min-response-minutes=10:default',
      'presence-limit=0.1:default',
      'condition-credit-limit=100:default',
    ]);
    expect(doc.rules.map((r) => r.id)).toEqual(['same-make-model', 'shared-connection', 'stale-justification']);
  });

  it('should include the date only when one is given', () => {
    expect(buildReportDocument({ ...input, date: '2025-01-31' }).date).toBe('2025-01-31');
    expect(renderReport(input, 'md')).not.toMatch(/\| Date \|/);
    expect(renderReport({ ...input, date: '2025-01-31' }, 'md')).toMatch(/\| Date \| 2025-01-31 \|/);
  });

  it('should join each layer with its traced elements, marking those in the cause and the findings about them', () => {
    const sif = doc.scenarios[0]!.layers.find((l) => l.function === 'SIF-1')!;
    expect(sif.verdict).toBe('voided');
    expect(sif.elements.map((e) => [e.tag, e.inCause, e.findings])).toEqual([
      ['LT-2', false, [INVENTED_FINDINGS.sameMake.key]],
      ['N-1', true, [INVENTED_FINDINGS.sharedNozzle.key]],
      ['S-1', false, []],
      ['XV-1', false, []],
    ]);
    expect(doc.scenarios[0]!.cause.elements).toEqual(['C-1', 'LT-1', 'LV-1', 'N-1']);
  });

  it('should keep accepted findings, marked accepted, and add the stale justification as a finding', () => {
    const accepted = doc.findings.find((f) => f.key === INVENTED_FINDINGS.sameMake.key)!;
    expect(accepted.accepted).toEqual({
      by: 'A. Reviewer',
      date: '2024-05-01',
      reason: 'Diverse "firmware" <checked>',
    });
    const stale = doc.findings.find((f) => f.rule === 'stale-justification')!;
    expect(stale.key).toBe('stale-justification:no-such-finding:S-9');
    expect(doc.summary).toMatchObject({
      accepted: 1,
      findings: { 'voids-credit': 1, 'needs-justification': 2, note: 0 },
    });
  });

  it('should conform to its own zod schema and to the JSON Schema exported from it', () => {
    const json = JSON.parse(renderReport(input, 'json'));
    expect(ReportDocument.safeParse(json).success).toBe(true);
    const schema = reportJsonSchema();
    expect(schema.$schema).toBe('https://json-schema.org/draft/2020-12/schema');
    const validate = new Ajv2020({ allErrors: true, strict: false }).compile(schema);
    expect(validate(json), JSON.stringify(validate.errors)).toBe(true);
    expect(validate({ ...json, formatVersion: 1 })).toBe(false);
  });
});

describe('determinism (invented data)', () => {
  it('should give byte-identical output across two runs in every format', () => {
    for (const format of REPORT_FORMATS)
      expect(renderReport(inventedInput(), format)).toBe(renderReport(inventedInput(), format));
  });

  it('should not depend on the order of statements in the model or of items in the analysis', () => {
    const lines = INVENTED_TEXT.split('\n');
    const scenario = lines.findIndex((l) => l.startsWith('scenario '));
    const statements = [...lines.slice(1, scenario), ...lines.slice(scenario + 4)].filter((l) => l.trim() !== '');
    const reordered = [lines[0], ...statements.reverse(), ...lines.slice(scenario, scenario + 4), ''].join('\n');
    const analysis = inventedAnalysis();
    const shuffled = {
      ...analysis,
      traces: [...analysis.traces].reverse(),
      findings: [...analysis.findings].reverse(),
      rules: [...analysis.rules].reverse(),
      assessments: analysis.assessments.map((a) => ({ ...a, layers: [...a.layers].reverse() })),
    };
    const other = inventedInput(reordered, shuffled);
    expect(other.model.elements.map((e) => e.tag)).not.toEqual(input.model.elements.map((e) => e.tag));
    for (const format of ['md', 'html', 'csv', 'json'] as const)
      expect(renderReport(other, format)).toBe(renderReport(input, format));
    // SARIF differs only in where things are in the file: the regions.
    const withoutRegions = (text: string) =>
      JSON.stringify(JSON.parse(text, (k, v) => (k === 'region' ? undefined : v)));
    expect(withoutRegions(renderReport(other, 'sarif'))).toBe(withoutRegions(renderReport(input, 'sarif')));
    expect(renderReport(other, 'sarif')).not.toBe(renderReport(input, 'sarif'));
  });

  it('should sort tags naturally and totally', () => {
    expect(['S-10', 'S-2', 'S-1', 'S-01', 'A'].sort(compareTags)).toEqual(['A', 'S-01', 'S-1', 'S-2', 'S-10']);
  });
});

describe('formats (invented data)', () => {
  it('Markdown: escapes model text so it cannot become markup or break a table', () => {
    const md = renderReport(input, 'md');
    expect(md).toContain('| Site | Tiny &lt;Test> & Co \\| \\`Unit\\` \\*1\\* |');
    expect(md).toContain('Drum overfills &lt;script>alert(1)&lt;/script>');
    expect(md).not.toMatch(/<script/);
    for (const line of md.split('\n').filter((l) => l.startsWith('| Site'))) {
      expect(line.split(/(?<!\\)\|/).length - 2).toBe(2); // two cells, the escaped pipe not counted
    }
    expect(md).toMatch(/## Scenario `S-1`/);
    expect(md).toMatch(/\*\*Accepted\*\* by A\. Reviewer on 2024-05-01/);
    expect(md).toMatch(/## Appendix A/);
    expect(md).toMatch(/## Appendix B/);
  });

  it('HTML: self-contained, headed tables, one section per scenario, text escaped', () => {
    const html = renderReport(input, 'html');
    const root = checkHtml(html, doc);
    expect(html).toContain('Drum overfills &lt;script&gt;alert(1)&lt;/script&gt;');
    expect(root.querySelectorAll('section.scenario')).toHaveLength(1);
    expect(root.querySelector('td span.verdict-voided')?.text).toBe('voided');
    expect(root.querySelector('aside.caution')?.text).toMatch(/Decision support only/);
  });

  it('CSV: parses back into the JSON report, guarding formula-like text', () => {
    const rows = checkCsvAgainstJson(renderReport(input, 'csv'), doc);
    // IPL-PSV-1: 1 element, SIF-1: 4 elements, then the stale justification on a row of its own.
    expect(rows.map((r) => r.row_kind)).toEqual(['element', 'element', 'element', 'element', 'element', 'finding']);
    expect(rows[5]!.element_findings).toBe('stale-justification:no-such-finding:S-9');
    expect(rows.find((r) => r.element === 'LT-2')!.element_title).toBe("'=HYPERLINK(1)");
  });

  it('SARIF: valid 2.1.0, located at the claimed layer with the shared element related', () => {
    const log = checkSarif(renderReport(input, 'sarif'), doc);
    const results = log.runs[0]!.results;
    const nozzle = results.find((r) => r.ruleId === 'shared-connection')!;
    // `  layer SIF-1 pfd=0.01` is line 18 of the invented model; `nozzle N-1` is line 5.
    expect(nozzle.locations[0]!.physicalLocation.region).toMatchObject({ startLine: 18, startColumn: 9 });
    expect(nozzle.relatedLocations![0]!.physicalLocation.region).toMatchObject({ startLine: 5, startColumn: 8 });
    expect(nozzle.relatedLocations![1]!.message!.text).toMatch(/initiating cause/);
    expect(nozzle.relatedLocations![1]!.physicalLocation.region).toMatchObject({ startLine: 17 });
    const stale = results.find((r) => r.ruleId === 'stale-justification')!;
    expect(stale.level).toBe('warning');
    expect(stale.locations[0]!.physicalLocation.region).toMatchObject({ startLine: 21, startColumn: 8 });
    const accepted = results.find((r) => r.ruleId === 'same-make-model')!;
    expect(accepted.suppressions![0]).toMatchObject({ status: 'accepted' });
  });

  it('SARIF: the schema check can fail (a broken log is rejected)', () => {
    const log = JSON.parse(renderReport(input, 'sarif'));
    log.runs[0].results[0].level = 'fatal';
    expect(() => checkSarif(JSON.stringify(log), doc)).toThrow();
  });
});
