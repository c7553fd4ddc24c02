// The minimal cut sets and the common-cause ranking in the Markdown and HTML evidence lists, on an invented
// drum whose two level transmitters share one nozzle: the nozzle alone starts the scenario (the control
// loop's transmitter is blind) and defeats the only layer (the SIF's transmitter is blind too), so it is a
// single point of failure. Basis: a layer must be independent of the cause (CCPS, Layer of Protection
// Analysis, 2001, ch. 6; IEC 61511-1:2016 9.4, common cause between layers, clause from memory), and a plugged
// or isolated nozzle blinds every instrument on it (common practice, no source).
import { parse as parseHtml } from 'node-html-parser';
import { describe, expect, it } from 'vitest';
import { analyze, buildReportDocument, loadModelText, renderReport, type ReportFormat } from '@bulkhead/core';
import { checkHtml, checkSiteWideHtml } from './checks.ts';

const TEXT = `# Invented test data: one drum, two transmitters on one nozzle.
site "Shared-nozzle drum (invented)"
category people tolerable=1e-4 harm=people
vessel V-1
nozzle N-1 mounted-on=V-1
transmitter LT-1 variable=level mounted-on=N-1
transmitter LT-2 variable=level mounted-on=N-1
controller C-1 system=bpcs
logic-solver S-1 system=sis
control-valve LV-1 fails-to=closed
shutdown-valve XV-1 fails-to=closed
loop LIC-1 sensors=LT-1 solver=C-1 finals=LV-1
sif SIF-1 sensors=LT-2 solver=S-1 finals=XV-1 sil=2 pfd=0.01
scenario S-1 title="Drum overfills" category=people
  cause function=LIC-1 frequency=0.1 basis="invented"
  layer SIF-1 pfd=0.01 basis="invented"
`;

const model = loadModelText('tests/invented/shared-nozzle.bulk', TEXT).model!;
const input = {
  model,
  analysis: analyze(model),
  file: 'tests/invented/shared-nozzle.bulk',
  sha256: 'b'.repeat(64),
  toolVersion: '0.0.0-test',
};
const doc = buildReportDocument(input);

describe('cut sets and common causes in the evidence list (invented shared nozzle)', () => {
  it('finds the shared nozzle as the one single point of failure', () => {
    const sets = doc.cutSets!.scenarios[0]!.cutSets;
    expect(sets.filter((c) => c.elements.length === 1).map((c) => c.elements)).toEqual([['N-1']]);
    expect(sets.length).toBeGreaterThan(1); // pairs too: any cause element with any SIF element
  });

  it('HTML: the site-wide section and the scenario cut sets read back into the JSON report', () => {
    const html = renderReport(input, 'html');
    const root = checkHtml(html, doc);
    checkSiteWideHtml(root, doc);
    // Answer first: the scenario a single element leaves unprotected is named before anything else.
    const site = root.querySelector('section#site-wide')!;
    expect(site.querySelector('h3 + p')!.text).toBe(
      '1 scenario of 1 can be started and left unprotected by one element: S-1.',
    );
    // The site-wide section stands between the front matter and the first scenario.
    expect(
      root
        .querySelectorAll('main > section')
        .map((s) => s.id)
        .slice(0, 3),
    ).toEqual(['front', 'site-wide', 'scenario-S-1']);
  });

  it('Markdown: the single point in full with the path from each side, and its finding', () => {
    const md = renderReport(input, 'md');
    expect(md).toContain(
      '- **Single point of failure:** `N-1` alone starts the scenario and defeats every claimed layer.',
    );
    expect(md).toContain('- From the cause: `LIC-1` -> `LT-1` -> `N-1`');
    expect(md).toContain('- From layer `SIF-1`: `SIF-1` -> `LT-2` -> `N-1`');
    expect(md).toContain('- Findings about it: `shared-process-connection:S-1:LIC-1+SIF-1:N-1`');
    expect(md).toContain('**1 scenario of 1 can be started and left unprotected by one element:** `S-1`.');
  });

  it('checkSiteWideHtml fails when a cut set is missing from the HTML', () => {
    const html = renderReport(input, 'html');
    const broken = parseHtml(html.replace(/<li><strong>Single point of failure:<\/strong> <code>N-1<\/code>/, '<li>'));
    expect(() => checkSiteWideHtml(broken, doc)).toThrow();
  });

  it.each(['csv', 'sarif'] as ReportFormat[])('%s and the worksheet do not compute them', (format) => {
    expect(renderReport(input, format)).not.toMatch(/cut set|Common-cause ranking/i);
    expect(renderReport(input, 'md', 'worksheet')).not.toMatch(/Minimal cut sets/);
  });
});
