// Checks every report test applies, to invented inputs and to the demo alike: HTML parsed and its tables
// read as a screen reader would, CSV parsed back and compared with the JSON report, SARIF against its schema.
import { parse as parseCsv } from 'csv-parse/sync';
import { parse as parseHtml, type HTMLElement } from 'node-html-parser';
import { expect } from 'vitest';
import {
  CSV_COLUMNS,
  csvFigure,
  LIST_SEPARATOR,
  PATH_SEPARATOR,
  guardFormula,
  type ReportDocument,
} from '../../packages/core/src/report/index.ts';
import { sarifValidator } from './sarif-schema.ts';

const validateSarif = sarifValidator();

/** HTML: one section per scenario, headed tables with captions, no script, nothing fetched, model text escaped. */
export function checkHtml(html: string, doc: ReportDocument): HTMLElement {
  const root = parseHtml(html, { comment: true });
  expect(root.querySelectorAll('script')).toHaveLength(0);
  expect(html).not.toMatch(/<script/i);
  for (const el of root.querySelectorAll('[src], link[href], a[href]')) {
    const url = el.getAttribute('src') ?? el.getAttribute('href') ?? '';
    expect(url.startsWith('data:') || url.startsWith('#'), `external reference ${url}`).toBe(true);
  }
  expect(html).not.toMatch(/url\(\s*['"]?(https?:|\/\/)/i);
  expect(root.querySelector('style')?.text).toMatch(/@media print/);

  const ids = root.querySelectorAll('[id]').map((el) => el.id);
  expect(
    ids.filter((id, i) => ids.indexOf(id) !== i),
    'ids are unique',
  ).toEqual([]);
  const sections = root.querySelectorAll('section.scenario');
  expect(sections.map((s) => s.querySelector('h2')?.querySelector('code')?.text)).toEqual(
    doc.scenarios.map((s) => s.id),
  );

  for (const table of root.querySelectorAll('table')) {
    expect(table.querySelector('caption')?.text.trim(), 'every table says what it holds').toBeTruthy();
    const head = table.querySelectorAll('thead th');
    expect(head.length).toBeGreaterThan(0);
    for (const th of head) expect(th.getAttribute('scope')).toBe('col');
    for (const row of table.querySelectorAll('tbody tr')) {
      const cells = row.childNodes.filter(
        (n): n is HTMLElement =>
          n instanceof Object && 'tagName' in n && ['TH', 'TD'].includes((n as HTMLElement).tagName),
      );
      expect(cells).toHaveLength(head.length);
      expect(cells[0]!.tagName).toBe('TH');
      expect(cells[0]!.getAttribute('scope')).toBe('row');
    }
  }

  // Model text comes back as text: the parser decodes what the renderer escaped, and adds no elements.
  const title = root.querySelector('title')?.text;
  expect(title).toBe(`Independence evidence list: ${doc.site.name}`);
  for (const s of sections) {
    const scenario = doc.scenarios.find((x) => x.id === s.querySelector('h2 code')?.text)!;
    if (scenario.title) expect(s.querySelector('h2')!.text).toBe(`Scenario ${scenario.id}: ${scenario.title}`);
  }
  return root;
}

type Row = Record<(typeof CSV_COLUMNS)[number], string>;

/** CSV: RFC 4180 records that csv-parse reads back into exactly the JSON report's layers and elements. */
export function checkCsvAgainstJson(csv: string, doc: ReportDocument): Row[] {
  expect(csv.endsWith('\r\n')).toBe(true);
  expect(csv.replace(/\r\n/g, '')).not.toMatch(/\n/); // no bare LF: every record ends in CRLF
  const rows = parseCsv(csv, { columns: true, record_delimiter: '\r\n', relax_quotes: false }) as Row[];
  expect(Object.keys(rows[0] ?? {})).toEqual([...CSV_COLUMNS]);
  const yes = (b: boolean) => (b ? 'yes' : 'no');
  const expected: Row[] = [];
  for (const s of doc.scenarios) {
    for (const l of s.layers) {
      const elements = l.elements.length ? l.elements : [undefined];
      for (const e of elements) {
        expected.push({
          row_kind: e ? 'element' : 'layer',
          scenario: s.id,
          scenario_title: guardFormula(s.title ?? ''),
          category: s.category,
          tolerable_per_year: csvFigure(s.tolerable),
          cause: guardFormula(s.cause.label),
          cause_frequency_per_year: csvFigure(s.cause.frequency.value),
          layer: l.function,
          layer_kind: l.kind,
          layer_title: guardFormula(l.title ?? ''),
          claimed_pfd: csvFigure(l.claimedPfd.value),
          claimed_pfd_origin: l.claimedPfd.origin,
          allowed_pfd: csvFigure(l.allowedPfd),
          verdict: l.verdict,
          credited_after_independence: yes(l.credited),
          credited_if_accepted: yes(l.creditedIfAccepted),
          layer_missing: l.missing.join(LIST_SEPARATOR),
          layer_findings: l.findings.join(LIST_SEPARATOR),
          element: e?.tag ?? '',
          element_kind: e?.kind ?? '',
          element_group: e?.group ?? '',
          element_title: guardFormula(e?.title ?? ''),
          element_in_cause: e ? yes(e.inCause) : '',
          element_path: e?.path.join(PATH_SEPARATOR) ?? '',
          element_findings: e?.findings.join(LIST_SEPARATOR) ?? '',
          // The two derived columns are checked against the findings themselves below.
          element_worst_severity: '',
          element_findings_accepted: '',
          mitigated_after_per_year: csvFigure(s.lopa[1]!.mitigated),
          meets_after: yes(s.lopa[1]!.meets),
          required_sil: s.sif ? String(s.sif.sil) : '',
        });
      }
    }
  }
  const strip = (r: Row) => ({ ...r, element_worst_severity: '', element_findings_accepted: '' });
  const layerRows = rows.filter((r) => r.row_kind !== 'finding');
  expect(layerRows.map(strip)).toEqual(expected);
  // Every finding appears somewhere: on a layer row, or on a row of its own after them.
  const shown = new Set(layerRows.flatMap((r) => [...r.layer_findings.split(' '), ...r.element_findings.split(' ')]));
  const own = rows.slice(layerRows.length);
  expect(own.every((r) => r.row_kind === 'finding')).toBe(true);
  expect(own.map((r) => r.element_findings)).toEqual(doc.findings.filter((f) => !shown.has(f.key)).map((f) => f.key));
  for (const r of own) {
    const f = doc.findings.find((x) => x.key === r.element_findings)!;
    expect([r.scenario, r.element, r.element_worst_severity, r.element_findings_accepted]).toEqual([
      f.scenario ?? '',
      f.element ?? '',
      f.severity,
      f.accepted ? 'all' : 'none',
    ]);
  }
  const byKey = new Map(doc.findings.map((f) => [f.key, f]));
  for (const r of layerRows) {
    const fs = r.element_findings ? r.element_findings.split(LIST_SEPARATOR).map((k) => byKey.get(k)!) : [];
    const worst =
      ['voids-credit', 'needs-justification', 'note'].find((sev) => fs.some((f) => f.severity === sev)) ?? '';
    expect(r.element_worst_severity).toBe(worst);
    const accepted = fs.filter((f) => f.accepted).length;
    expect(r.element_findings_accepted).toBe(
      fs.length === 0 ? '' : accepted === fs.length ? 'all' : accepted === 0 ? 'none' : 'some',
    );
  }
  return rows;
}

export interface SarifLog {
  runs: {
    tool: {
      driver: {
        rules: {
          id: string;
          name: string;
          shortDescription: { text: string };
          fullDescription: { text: string };
          help: { text: string };
        }[];
      };
    };
    results: {
      ruleId: string;
      ruleIndex?: number;
      level: string;
      message: { text: string };
      locations: { physicalLocation: { region?: { startLine: number; startColumn: number } } }[];
      relatedLocations?: {
        message?: { text: string };
        physicalLocation: { region?: { startLine: number; startColumn: number } };
      }[];
      suppressions?: { status: string; justification: string }[];
      partialFingerprints: Record<string, string>;
    }[];
  }[];
}

/** SARIF: valid against the published 2.1.0 schema, one result per finding with its rule and level. */
export function checkSarif(text: string, doc: ReportDocument): SarifLog {
  const log = JSON.parse(text) as SarifLog;
  expect(validateSarif(log)).toEqual([]);
  const run = log.runs[0]!;
  const levels = { 'voids-credit': 'error', 'needs-justification': 'warning', note: 'note' } as const;
  expect(run.results.map((r) => [r.partialFingerprints['bulkheadFindingKey/v1'], r.ruleId, r.level])).toEqual(
    doc.findings.map((f) => [f.key, f.rule, levels[f.severity]]),
  );
  for (const r of run.results) expect(run.tool.driver.rules[r.ruleIndex!]!.id).toBe(r.ruleId);
  // Every rule in force is described: its title, why it exists, and the help text with its source.
  expect(run.tool.driver.rules.map((r) => r.id)).toEqual(doc.rules.map((r) => r.id));
  for (const rule of run.tool.driver.rules) {
    const inForce = doc.rules.find((r) => r.id === rule.id)!;
    expect(rule.name).toMatch(/^[A-Z][A-Za-z0-9]*$/);
    expect(rule.shortDescription.text).toBe(inForce.title);
    expect(rule.fullDescription.text).not.toBe(inForce.title);
    expect(rule.help.text).toContain(`Source: ${inForce.source}`);
  }
  run.results.forEach((r, i) => {
    const f = doc.findings[i]!;
    if (f.accepted)
      expect(r.suppressions).toEqual([
        expect.objectContaining({ status: 'accepted', justification: expect.stringContaining(f.accepted.reason) }),
      ]);
    else expect(r.suppressions).toBeUndefined();
  });
  return log;
}

const cellsOf = (table: HTMLElement) => table.querySelectorAll('tbody tr').map((tr) => tr.querySelectorAll('th, td'));
const tableCaptioned = (root: HTMLElement, start: string) =>
  root.querySelectorAll('table').filter((t) => t.querySelector('caption')?.text.startsWith(start));

/**
 * The site-wide section and each scenario's cut sets, read back from the HTML and compared with the JSON
 * report: the counts per scenario, every single point with its paths, every larger set exactly once in its
 * grouped table, and the ranking row by row in rank order (figures printed to two significant figures).
 */
export function checkSiteWideHtml(root: HTMLElement, doc: ReportDocument): void {
  const site = root.querySelector('section#site-wide');
  if (!doc.cutSets || !doc.commonCauses) {
    expect(site).toBeNull();
    return;
  }
  expect(site, 'the site-wide section').not.toBeNull();
  const counts = cellsOf(tableCaptioned(site!, 'Minimal cut sets per scenario')[0]!);
  expect(counts.map((row) => row.slice(0, 2 + doc.cutSets!.maxOrder).map((c) => c.text))).toEqual(
    doc.cutSets.scenarios.map((s) => [
      s.scenario,
      s.layers.length ? s.layers.join(', ') : 'none',
      ...Array.from({ length: s.maxOrder }, (_, i) =>
        s.noStartingElement ? '-' : String(s.cutSets.filter((c) => c.elements.length === i + 1).length),
      ),
    ]),
  );

  const ranking = cellsOf(tableCaptioned(site!, 'Common-cause ranking')[0]!);
  expect(ranking.map((row) => [row[0]!.text, row[1]!.text, row[3]!.text, row[4]!.text, row[5]!.text])).toEqual(
    doc.commonCauses.elements.map((r) => [
      String(r.rank),
      r.element,
      String(r.layers),
      r.scenarios.length ? r.scenarios.join(', ') : 'none',
      `${r.openFindings} of ${r.findings}`,
    ]),
  );
  const perYear = (text: string) => Number(/^([\d.e-]+) \/yr$/.exec(text)![1]);
  ranking.forEach((row, i) => {
    const r = doc.commonCauses!.elements[i]!;
    for (const [cell, full] of [
      [row[6]!, r.frequencyCost],
      [row[7]!, r.gapReduction],
      [row[8]!, r.frequencyAtStake],
    ] as const) {
      expect(Math.abs(perYear(cell.text) - full)).toBeLessThanOrEqual(Math.abs(full) * 0.05);
    }
  });
  expect(site!.text).toContain(doc.commonCauses.order);
  expect(site!.text).toContain(doc.cutSets.method);

  for (const s of doc.cutSets.scenarios) {
    const section = root.querySelector(`section#scenario-${s.scenario}`)!;
    const singles = section.querySelectorAll('li').filter((li) => li.text.startsWith('Single point of failure:'));
    expect(singles.map((li) => li.querySelector('code')!.text)).toEqual(
      s.cutSets.filter((c) => c.elements.length === 1).map((c) => c.elements[0]),
    );
    for (const c of s.cutSets.filter((x) => x.elements.length === 1)) {
      const items = singles
        .find((li) => li.querySelector('code')!.text === c.elements[0])!
        .parentNode!.querySelectorAll('li')
        .map((li) => li.text);
      for (const p of c.paths)
        expect(items).toContain(
          `${p.party === 'cause' ? 'From the cause' : `From layer ${p.party}`}: ${p.path.join(' -> ')}`,
        );
      if (c.findings.length) expect(items).toContain(`Findings about it: ${c.findings.join(', ')}`);
    }
    const grouped = tableCaptioned(section, `Cut sets of ${s.scenario} with more than one element`);
    const larger = s.cutSets.filter((c) => c.elements.length > 1).map((c) => c.elements.join(' + '));
    expect(grouped).toHaveLength(larger.length ? 1 : 0);
    const shown = grouped.flatMap((t) =>
      cellsOf(t).flatMap((row) => {
        const partners = row[2]!.text.split(', ');
        expect(row[3]!.text).toBe(String(partners.length));
        // The shared member's path from each side, as the JSON report gives them.
        const member = row[0]!.text;
        const paths = s.cutSets.find((c) => c.elements.includes(member))!.paths.filter((p) => p.element === member);
        expect(row[1]!.text).toBe(
          paths.map((p) => `${p.party === 'cause' ? 'cause' : 'layer'} ${p.path.join(' -> ')}`).join('; '),
        );
        return partners.map((p) => [row[0]!.text, ...p.split(' + ')].sort().join(' + '));
      }),
    );
    // Every set exactly once: nothing lost, nothing repeated, nothing invented.
    expect([...shown].sort()).toEqual([...larger].map((set) => set.split(' + ').sort().join(' + ')).sort());
  }
}
