// Golden files: the demo's report in every format, pinned byte for byte (checked by hand once; see the
// README's Reports section). Set UPDATE_GOLDEN=1 to rewrite them after a deliberate change, then review the diff.
import { existsSync, readFileSync, writeFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { buildReportDocument, renderReport, REPORT_FORMATS, ReportDocument, type ReportFormat } from '@bulkhead/core';
import { checkCsvAgainstJson, checkHtml, checkSarif, checkSiteWideHtml } from './checks.ts';
import { DEMO, DEMO_REV_B, GOLDEN_DIR, demoInput, readDemo, reorderStatements } from './demo.ts';

const CASES: { name: string; file: string; formats: readonly ReportFormat[] }[] = [
  { name: 'marrow-fen', file: DEMO, formats: REPORT_FORMATS },
  { name: 'marrow-fen-rev-b', file: DEMO_REV_B, formats: ['md', 'sarif'] },
];

/** The pinned text; only an explicit UPDATE_GOLDEN=1 writes one, so a missing golden file fails. */
function golden(name: string, format: ReportFormat, actual: string): string {
  // name may carry the contents (`marrow-fen.worksheet`); the evidence list has none.
  const path = `${GOLDEN_DIR}${name}.${format}`;
  if (process.env.UPDATE_GOLDEN === '1') writeFileSync(path, actual);
  if (!existsSync(path))
    throw new Error(`golden file ${path} is missing: run with UPDATE_GOLDEN=1, then review it by hand`);
  return readFileSync(path, 'utf8');
}

describe.each(CASES)('golden report of $file', ({ name, file, formats }) => {
  const input = demoInput(file);
  it.each(formats)('%s matches the golden file', (format) => {
    const actual = renderReport(input, format);
    expect(actual).toBe(golden(name, format, actual));
  });
});

describe('golden worksheet and actions list of the demo', () => {
  const input = demoInput(DEMO);
  it.each([
    ['worksheet', 'md'],
    ['worksheet', 'html'],
    ['worksheet', 'csv'],
    ['actions', 'csv'],
  ] as const)('%s %s matches the golden file', (contents, format) => {
    const actual = renderReport(input, format, contents);
    expect(actual).toBe(golden(`marrow-fen.${contents}`, format, actual));
  });
});

describe('demo reports, checked as a reader would', () => {
  const input = demoInput(DEMO);
  const doc = buildReportDocument(input);

  it('JSON conforms to the report schema', () => {
    expect(ReportDocument.parse(JSON.parse(renderReport(input, 'json')))).toEqual(doc);
  });

  it('HTML has one section per scenario with headed tables', () => {
    const root = checkHtml(renderReport(input, 'html'), doc);
    expect(root.querySelectorAll('section.scenario').map((s) => s.id)).toEqual([
      'scenario-S-101',
      'scenario-S-102',
      'scenario-S-103',
      'scenario-S-104',
    ]);
  });

  it('HTML shows the minimal cut sets and the common-cause ranking of the JSON report', () => {
    const root = checkHtml(renderReport(input, 'html'), doc);
    checkSiteWideHtml(root, doc);
    // Worked by hand from the demo model and `bulkhead cut-sets`: S-101 has no single point and 83 pairs. What
    // the cause shares with SIF-101 (bridle BR-101, its nozzles N-101A and N-101B, junction box JB-101) pairs
    // with each of the 12 elements that defeat LAH-101; what it shares with LAH-101 (AI-1-03, BPCS-C1, CAB-1,
    // CKT-11, UPS-1) pairs with the 7 SIF-101 elements not already counted: 4 x 12 + 5 x 7 = 83.
    const rows = root
      .querySelectorAll('section#scenario-S-101 table')
      .find((t) => t.querySelector('caption')!.text.startsWith('Cut sets of S-101'))!
      .querySelectorAll('tbody tr');
    expect(rows.map((tr) => `${tr.querySelector('th')!.text}:${tr.querySelectorAll('td')[2]!.text}`)).toEqual([
      'BR-101:12',
      'JB-101:12',
      'N-101A:12',
      'N-101B:12',
      'AI-1-03:7',
      'BPCS-C1:7',
      'CAB-1:7',
      'CKT-11:7',
      'UPS-1:7',
    ]);
  });

  it('CSV parses back into the JSON report', () => {
    const rows = checkCsvAgainstJson(renderReport(input, 'csv'), doc).filter((r) => r.row_kind !== 'finding');
    expect(rows.length).toBe(
      doc.scenarios.reduce((n, s) => n + s.layers.reduce((m, l) => m + Math.max(l.elements.length, 1), 0), 0),
    );
  });

  it('SARIF validates against the SARIF 2.1.0 schema and points at the claimed layers', () => {
    const log = checkSarif(renderReport(input, 'sarif'), doc);
    const lines = readDemo(DEMO).split('\n');
    for (const result of log.runs[0]!.results) {
      const region = result.locations[0]!.physicalLocation.region!;
      // Each result sits on a `layer` line of its scenario (or, for a cause finding, the `cause` line).
      expect(lines[region.startLine - 1]).toMatch(/^\s+(layer|cause) /);
      for (const related of result.relatedLocations ?? []) {
        const line = lines[related.physicalLocation.region!.startLine - 1]!;
        if (related.message!.text.startsWith('shared element')) {
          const tag = /`([^`]+)`/.exec(related.message!.text)![1]!;
          expect(line.split(' ')[1]).toBe(tag); // the element's own definition statement
        }
      }
    }
  });

  it('the accepted finding of revision B stays visible, marked accepted and suppressed in SARIF', () => {
    const revB = demoInput(DEMO_REV_B);
    const accepted = revB.analysis.findings.filter((f) => f.accepted);
    expect(accepted.length).toBeGreaterThan(0);
    const md = renderReport(revB, 'md');
    for (const f of accepted) expect(md).toContain(`**Accepted** by ${f.accepted!.by} on ${f.accepted!.date}`);
    const log = checkSarif(renderReport(revB, 'sarif'), buildReportDocument(revB));
    expect(log.runs[0]!.results.filter((r) => r.suppressions?.[0]?.status === 'accepted')).toHaveLength(
      accepted.length,
    );
  });
});

describe('determinism on the demo', () => {
  it('gives byte-identical output across two runs', () => {
    for (const format of REPORT_FORMATS)
      expect(renderReport(demoInput(DEMO), format)).toBe(renderReport(demoInput(DEMO), format));
  });

  it('gives byte-identical output when the model statements come in another order', () => {
    const original = demoInput(DEMO);
    const reordered = demoInput(DEMO, reorderStatements(readDemo(DEMO)), { sha: original.sha256 });
    expect(reordered.model.elements[0]!.tag).not.toBe(original.model.elements[0]!.tag);
    for (const format of ['md', 'html', 'csv', 'json'] as const)
      expect(renderReport(reordered, format)).toBe(renderReport(original, format));
    const withoutRegions = (text: string) =>
      JSON.stringify(JSON.parse(text, (k, v) => (k === 'region' ? undefined : v)));
    expect(withoutRegions(renderReport(reordered, 'sarif'))).toBe(withoutRegions(renderReport(original, 'sarif')));
  });
});

describe('a stale justification on the demo', () => {
  const text = `${readDemo(DEMO)}accept shared-bridle:S-101:LIC-101+SIF-999:BR-101 by="C. Reviewer (invented)" date=2026-01-05 reason="written for a layer that was renamed"\n`;
  const input = demoInput(DEMO, text);
  const key = 'stale-justification:shared-bridle:S-101:LIC-101+SIF-999:BR-101';

  it('is reported as a finding in every format', () => {
    expect(input.analysis.findings.find((f) => f.key === key)?.severity).toBe('needs-justification');
    for (const format of REPORT_FORMATS) expect(renderReport(input, format)).toContain(key);
  });

  it('points SARIF at the accept statement', () => {
    const log = checkSarif(renderReport(input, 'sarif'), buildReportDocument(input));
    const result = log.runs[0]!.results.find((r) => r.partialFingerprints['bulkheadFindingKey/v1'] === key)!;
    expect(result.level).toBe('warning');
    expect(result.locations[0]!.physicalLocation.region).toMatchObject({
      startLine: text.split('\n').length - 1,
      startColumn: 8,
    });
  });
});
