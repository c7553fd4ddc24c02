// The LOPA worksheet, the actions list and the document control of the evidence list on the demo, read
// back by parsers (csv-parse, node-html-parser) and compared with the JSON report; the what-if figures of
// the actions are worked by hand from the demo's inputs.
import { parse as parseCsv } from 'csv-parse/sync';
import { parse as parseHtml } from 'node-html-parser';
import { describe, expect, it } from 'vitest';
import { buildReportDocument, renderReport } from '@bulkhead/core';
import { ACTION_COLUMNS } from '../../packages/core/src/report/actions.ts';
import { readCitation, sourceList, splitCitations } from '../../packages/core/src/report/sources.ts';
import { WORKSHEET_COLUMNS } from '../../packages/core/src/report/worksheet.ts';
import { DEMO, demoInput } from './demo.ts';

const input = demoInput(DEMO);
const doc = buildReportDocument(input);
const csv = (text: string) => parseCsv(text, { columns: true, record_delimiter: '\r\n' }) as Record<string, string>[];
/** A figure as printed (0.05 /yr, 2.5e-5, 3,000) back to a number. */
const figure = (text: string) => Number(/-?[\d,]*\.?\d+(e-?\d+)?/.exec(text)![0].replace(/,/g, ''));
/** Two significant figures: a printed figure is within 5 % of the full value. */
const near = (printed: number, full: number) =>
  expect(Math.abs(printed - full)).toBeLessThanOrEqual(Math.abs(full) * 0.05);
/** A CSV figure: at most six significant digits, and within half a unit of the sixth of the full value. */
const sixFigures = (printed: string, full: number) => {
  expect(
    printed
      .replace(/e.*$/, '')
      .replace(/^[-0.]+/, '')
      .replace('.', '').length,
    printed,
  ).toBeLessThanOrEqual(6);
  expect(Math.abs(Number(printed) - full)).toBeLessThanOrEqual(Math.abs(full) * 5e-6);
};

describe('LOPA worksheet', () => {
  it('CSV has one row per scenario and layer, with the JSON report figures to six significant figures', () => {
    const text = renderReport(input, 'csv', 'worksheet');
    const rows = csv(text);
    expect(Object.keys(rows[0]!)).toEqual([...WORKSHEET_COLUMNS]);
    const expected = doc.scenarios.flatMap((s) => s.layers.map((l) => ({ s, l })));
    expect(rows.map((r) => `${r.scenario}/${r.layer}`)).toEqual(expected.map(({ s, l }) => `${s.id}/${l.function}`));
    rows.forEach((r, i) => {
      const { s, l } = expected[i]!;
      sixFigures(r.tolerable_per_year!, s.tolerable);
      sixFigures(r.cause_frequency_per_year!, s.cause.frequency.value);
      sixFigures(r.pfd_claimed!, l.claimedPfd.value);
      sixFigures(r.pfd_allowed!, l.allowedPfd);
      expect(r.independence).toBe(l.verdict);
      sixFigures(r.mitigated_claimed_per_year!, s.lopa[0]!.mitigated);
      sixFigures(r.mitigated_after_per_year!, s.lopa[1]!.mitigated);
      sixFigures(r.ratio_to_tolerable!, s.gap);
      expect(r.required_sil).toBe(s.sif ? String(s.sif.sil) : '');
    });
    // The element that decides each lost layer is on its row.
    expect(rows.find((r) => r.layer === 'SIF-101')!.decided_by).toMatch(/^BR-101 \(shared-bridle\)/);
    // The hazard-study reference traces each scenario back (demo: invented study MF-100-HS-01).
    expect(rows.find((r) => r.scenario === 'S-103')!.study_reference).toBe(
      'study MF-100-HS-01 rev 2, node 6, deviation High temperature, recommendations R-21 R-22',
    );
  });

  it('HTML prints the same figures, read back from its table cells', () => {
    const root = parseHtml(renderReport(input, 'html', 'worksheet'));
    const table = root.querySelector('table.worksheet')!;
    const head = table.querySelectorAll('thead th').map((th) => th.text);
    const col = (name: string) => head.indexOf(name);
    const rows = table.querySelectorAll('tbody tr').map((tr) => tr.querySelectorAll('td').map((td) => td.text));
    expect(rows).toHaveLength(doc.scenarios.reduce((n, s) => n + s.layers.length, 0));
    let at = 0;
    for (const s of doc.scenarios) {
      const first = rows[at]!;
      expect(first[col('Scenario and hazard-study reference')]).toMatch(new RegExp(`^${s.id}: `));
      near(figure(first[col('Mitigated as claimed')]!), s.lopa[0]!.mitigated);
      near(figure(first[col('Mitigated after independence')]!), s.lopa[1]!.mitigated);
      near(figure(first[col('Category; tolerable')]!.split('; ')[1]!), s.tolerable);
      for (const l of s.layers) {
        const row = rows[at++]!;
        expect(row[col('Layer')]).toBe(`${l.function} (${l.kind})`);
        const [claimed, allowed] = row[col('PFD claimed / allowed')]!.split(' / ').map(figure);
        near(claimed!, l.claimedPfd.value);
        near(allowed!, l.allowedPfd);
        expect(row[col('Independence, decided by')]).toMatch(new RegExp(`^${l.verdict}`));
      }
    }
    // Printed landscape, with the file and hash at the foot of every page.
    expect(root.querySelector('style')!.text).toContain('size: A4 landscape');
    expect(root.querySelector('style')!.text).toContain(doc.model.sha256);
  });
});

describe('actions list', () => {
  const rows = csv(renderReport(input, 'csv', 'actions'));

  it('turns every open or voiding finding into exactly one action, with owner and due date to fill', () => {
    expect(Object.keys(rows[0]!)).toEqual([...ACTION_COLUMNS]);
    const open = doc.findings
      .filter((f) => !f.accepted && f.severity !== 'note')
      .map((f) => f.key)
      .sort();
    expect(rows.flatMap((r) => r.findings!.split(' ')).sort()).toEqual(open);
    for (const r of rows) expect([r.owner, r.due_date, r.status]).toEqual(['', '', '']);
    // Voided credit first: it is what the team must change.
    const severities = rows.map((r) => r.severity);
    expect(severities).toEqual([...severities].sort((a, b) => (a === b ? 0 : a === 'voids-credit' ? -1 : 1)));
  });

  it('says what closing it is worth: nothing alone while other findings void the layer, then the layer cleared', () => {
    const byElement = new Map(rows.map((r) => [r.element, r]));
    const bridle = byElement.get('BR-101')!;
    // Now: both S-101 layers voided, 0.1 /yr (CCPS 2001 Table 5.1 BPCS loop failure) x 0.5 ignition = 0.05 /yr.
    expect(bridle.after_independence_now_per_year).toBe('S-101=0.05');
    // Closing the bridle alone: SIF-101 is still open on JB-101 and LT-102, so still 0.05 /yr.
    expect(bridle.after_independence_if_closed_per_year).toBe('S-101=0.05');
    // SIF-101 cleared: 0.05 x 0.005 = 2.5e-4 /yr (by hand).
    near(Number(bridle.after_independence_if_layers_cleared_per_year!.split('=')[1]), 2.5e-4);
    // LAH-101 cleared (SIF-101 still voided): 0.05 x 0.1 = 5e-3 /yr (by hand).
    // Printed to six significant figures: 0.05 x 0.1 in binary is 0.005000000000000001, written 0.005.
    expect(byElement.get('BPCS-C1')!.after_independence_if_layers_cleared_per_year).toBe('S-101=0.005');
    // The same-make-model pair names both layers: both cleared, 0.05 x 0.005 x 0.1 = 2.5e-5 /yr (by hand).
    near(Number(byElement.get('LT-102')!.after_independence_if_layers_cleared_per_year!.split('=')[1]), 2.5e-5);
  });
});

describe('document control of the evidence list', () => {
  const root = parseHtml(renderReport(input, 'html'));

  it('gives number, revision and status from the model, and the command line replaces them', () => {
    const table = root.querySelectorAll('table').find((t) => t.querySelector('caption')?.text === 'Document control')!;
    const value = (item: string) =>
      table
        .querySelectorAll('tbody tr')
        .find((tr) => tr.querySelector('th')?.text === item)!
        .querySelector('td')!.text;
    expect([value('Document number'), value('Revision'), value('Status')]).toEqual([
      'MF-100-LOPA-001',
      'A',
      'for review',
    ]);
    expect(value('SHA-256 of the model file')).toBe(doc.model.sha256);
    const given = buildReportDocument({ ...input, control: { revision: 'B', status: 'issued' } });
    expect(given.control).toMatchObject({ document: 'MF-100-LOPA-001', revision: 'B', status: 'issued' });
  });

  it('has prepared, checked and approved lines, each with a date to fill', () => {
    const sign = root.querySelector('table.sign')!;
    expect(sign.querySelectorAll('thead th').map((th) => th.text)).toEqual([
      'Role',
      'Name',
      'Signature',
      'Date (required)',
    ]);
    expect(sign.querySelectorAll('tbody th').map((th) => th.text)).toEqual([
      'Prepared by',
      'Checked by',
      'Approved by',
    ]);
  });

  it('states its assumptions, and lists each source once with its edition and check', () => {
    expect(doc.assumptions!.some((a) => a.startsWith('An unstated fail action counts as unsafe'))).toBe(true);
    const works = doc.sources!.map((s) => `${s.work} ${s.edition ?? ''}`);
    expect(new Set(works).size).toBe(works.length);
    const appendix = root.querySelector('#appendix-sources')!;
    expect(appendix.querySelectorAll('tbody tr')).toHaveLength(doc.sources!.length);
    // Each rule's sources are cited by reference and the reference is in the appendix.
    for (const r of doc.rules)
      for (const s of sourceList([r]))
        expect(doc.sources!.some((x) => x.work === s.work && x.edition === s.edition)).toBe(true);
  });
});

describe('reading a rule source into citations', () => {
  it.each([
    [
      'IEC 61511-1:2016 9.4 and 11.2 (physical separation) [from memory for the clauses]',
      { work: 'IEC 61511-1', edition: '2016', clause: '9.4 and 11.2 (physical separation)', memory: true },
    ],
    [
      'CCPS, Layer of Protection Analysis (2001), ch. 6 (human response as an IPL; older allowance)',
      {
        work: 'CCPS, Layer of Protection Analysis',
        edition: '2001',
        clause: 'ch. 6 (human response as an IPL; older allowance)',
        memory: false,
      },
    ],
    [
      'CCPS LOPA (2001) ch. 6',
      { work: 'CCPS, Layer of Protection Analysis', edition: '2001', clause: 'ch. 6', memory: false },
    ],
    [
      'ANSI/ISA-S84.01-1996 Annex B.1.2',
      { work: 'ANSI/ISA-S84.01', edition: '1996', clause: 'Annex B.1.2', memory: false },
    ],
    [
      'CCPS, Layer of Protection Analysis (2001), Tables 6.3 to 6.5 (from memory)',
      { work: 'CCPS, Layer of Protection Analysis', edition: '2001', clause: 'Tables 6.3 to 6.5', memory: true },
    ],
  ])('%s', (text, expected) => expect(readCitation(text)).toMatchObject(expected));

  it('splits on semicolons outside parentheses only', () => {
    expect(splitCitations('CCPS, LOPA (2001), ch. 6 (a; b); IEC 61511-1:2016 9.4')).toEqual([
      'CCPS, LOPA (2001), ch. 6 (a; b)',
      'IEC 61511-1:2016 9.4',
    ]);
  });

  it('marks a work partly checked when only some of its clauses are from memory', () => {
    const [iec] = sourceList([
      { id: 'a', source: 'IEC 61511-1:2016 9.4' },
      { id: 'b', source: 'IEC 61511-1:2016 11.9 [from memory for the clause]' },
    ]);
    expect(iec).toMatchObject({
      id: 'R1',
      checked: 'partly',
      clauses: ['9.4', '11.9 [from memory]'],
      rules: ['a', 'b'],
    });
  });
});
