// Invented test data for the report tests: a tiny model in .bulk (loaded for real, so spans are real)
// and a hand-built Analysis for it. Not a real site, and not the output of the analysis pipeline.
import { loadModelText, say, type LoadResult, type Model } from '@bulkhead/core';
import type { Analysis, Finding } from '../../packages/core/src/vocabulary/types.ts';
import { applyJustifications } from '../../packages/core/src/justify/index.ts';

export const INVENTED_FILE = 'tests/invented/tiny.bulk';
export const INVENTED_SHA = 'a'.repeat(64);

export const INVENTED_TEXT = `# Invented test data for report tests.
site "Tiny <Test> & Co | \`Unit\` *1*" description="Invented site: one drum"
category people tolerable=1e-4 harm=people
vessel V-1 title="Drum <b>1</b>"
nozzle N-1 mounted-on=V-1
transmitter LT-1 variable=level mounted-on=N-1 make="Acme" model="L1"
transmitter LT-2 variable=level mounted-on=N-1 make="Acme" model="L1" title="=HYPERLINK(1)"
controller C-1 system=bpcs
logic-solver S-1 system=sis
control-valve LV-1 fails-to=closed
shutdown-valve XV-1 fails-to=closed
relief-valve PSV-1
loop LIC-1 sensors=LT-1 solver=C-1 finals=LV-1
sif SIF-1 sensors=LT-2 solver=S-1 finals=XV-1 sil=2 pfd=0.01
device IPL-PSV-1 device=PSV-1 title="Relief | valve"
scenario S-1 title="Drum overfills <script>alert(1)</script>" category=people
  cause function=LIC-1 frequency=0.1 basis="invented"
  layer SIF-1 pfd=0.01
  layer IPL-PSV-1 pfd=0.01 basis="invented sizing"
accept "same-make-model:S-1:LIC-1:SIF-1:LT-2" by="A. Reviewer" date=2024-05-01 reason="Diverse \\"firmware\\" <checked>"
accept "no-such-finding:S-9" by="B. Reviewer" date=2024-06-01 reason="left over"
`;

export function loadInvented(text = INVENTED_TEXT): LoadResult & { model: Model } {
  const r = loadModelText(INVENTED_FILE, text);
  if (!r.model) throw new Error(`invented model does not load: ${JSON.stringify(r.diagnostics)}`);
  return r as LoadResult & { model: Model };
}

const trace = (fn: string, kind: 'loop' | 'sif' | 'device', rows: [string, string, string, string[]][]) => ({
  function: fn,
  kind,
  elements: rows.map(([tag, k, group, path]) => ({
    tag,
    kind: k,
    group,
    path,
    links: path.slice(1).map(() => 'mountedOn'),
  })),
  channels: [],
  missing: [],
});

const sharedNozzle: Finding = {
  key: 'shared-connection:S-1:LIC-1:SIF-1:N-1',
  rule: 'shared-connection',
  title: 'shared process connection',
  severity: 'voids-credit',
  scenario: 'S-1',
  parties: [
    { role: 'cause', tag: 'LIC-1' },
    { role: 'layer', tag: 'SIF-1' },
  ],
  element: 'N-1',
  paths: [
    ['LIC-1', 'LT-1', 'N-1'],
    ['SIF-1', 'LT-2', 'N-1'],
  ],
  ...say('shared-process-connection/shared', {
    a: { role: 'cause', tag: 'LIC-1', functionKind: 'loop' },
    b: { role: 'layer', tag: 'SIF-1' },
    element: 'N-1',
    kind: 'nozzle',
    severity: 'voids-credit',
    beneath: [],
  }),
  // Invented words, not the catalogue's: the report shows whatever `message` holds.
  message: '`SIF-1` and the cause `LIC-1` both rely on `N-1`',
  rationale: 'A plugged nozzle blinds both transmitters.',
  source: 'invented source for a test',
};

const sameMake: Finding = {
  key: 'same-make-model:S-1:LIC-1:SIF-1:LT-2',
  rule: 'same-make-model',
  title: 'same make and model',
  severity: 'needs-justification',
  scenario: 'S-1',
  parties: [
    { role: 'cause', tag: 'LIC-1' },
    { role: 'layer', tag: 'SIF-1' },
  ],
  element: 'LT-2',
  paths: [
    ['LIC-1', 'LT-1'],
    ['SIF-1', 'LT-2'],
  ],
  ...say('same-make-model/same-device', {
    element: 'LT-2',
    other: 'LT-1',
    a: { role: 'cause', tag: 'LIC-1', functionKind: 'loop' },
    b: { role: 'layer', tag: 'SIF-1' },
    make: 'Acme',
    model: 'L1',
  }),
  message: '`LT-1` and `LT-2` are both Acme L1',
  rationale: 'Systematic common cause.',
  source: 'invented source for a test',
};

/** Invented analysis: what the pipeline might say about the invented model (not pipeline output). */
export function inventedAnalysis(findings: Finding[] = [sharedNozzle, sameMake]): Analysis {
  return {
    traces: [
      trace('SIF-1', 'sif', [
        ['LT-2', 'transmitter', 'sensor', ['SIF-1', 'LT-2']],
        ['N-1', 'nozzle', 'connection', ['SIF-1', 'LT-2', 'N-1']],
        ['S-1', 'logic-solver', 'solver', ['SIF-1', 'S-1']],
        ['XV-1', 'shutdown-valve', 'final', ['SIF-1', 'XV-1']],
      ]),
      trace('LIC-1', 'loop', [
        ['C-1', 'controller', 'solver', ['LIC-1', 'C-1']],
        ['LT-1', 'transmitter', 'sensor', ['LIC-1', 'LT-1']],
        ['LV-1', 'control-valve', 'final', ['LIC-1', 'LV-1']],
        ['N-1', 'nozzle', 'connection', ['LIC-1', 'LT-1', 'N-1']],
      ]),
      trace('IPL-PSV-1', 'device', [['PSV-1', 'relief-valve', 'mechanical', ['IPL-PSV-1', 'PSV-1']]]),
    ] as Analysis['traces'],
    findings,
    rules: [
      {
        id: 'shared-connection',
        title: 'shared process connection',
        severity: 'voids-credit',
        defaultSeverity: 'voids-credit',
        source: 'invented source for a test',
      },
      {
        id: 'same-make-model',
        title: 'same make and model',
        severity: 'needs-justification',
        defaultSeverity: 'note',
        source: 'invented source for a test',
        reason: 'owner wants diversity reviewed',
      },
    ],
    assessments: [
      {
        scenario: 'S-1',
        title: 'Drum overfills <script>alert(1)</script>',
        category: 'people',
        harm: 'people',
        tolerable: 1e-4,
        edge: 'below',
        cause: { label: 'LIC-1 fails', frequency: { value: 0.1, origin: 'model', basis: 'invented' } },
        enablers: [],
        modifiers: [],
        layers: [
          {
            function: 'SIF-1',
            kind: 'sif',
            claimedPfd: { value: 0.01, origin: 'model' },
            allowedPfd: 0.01,
            verdict: 'voided',
            credited: false,
            creditedIfAccepted: false,
            findings: [sharedNozzle.key, sameMake.key],
          },
          {
            function: 'IPL-PSV-1',
            kind: 'device',
            title: 'Relief | valve',
            claimedPfd: { value: 0.01, origin: 'model', basis: 'invented sizing' },
            allowedPfd: 0.01,
            verdict: 'independent',
            credited: true,
            creditedIfAccepted: true,
            findings: [],
          },
        ],
        mitigatedClaimed: 1e-5,
        mitigatedAfter: 1e-3,
        mitigatedIfAccepted: 1e-3,
        gap: 10,
        meetsClaimed: true,
        meetsAfter: false,
        sif: {
          function: 'SIF-1',
          requiredPfd: 0.01,
          requiredRrf: 100,
          sil: 2,
          demandRate: 0.001,
          mode: 'low-demand',
          note: 'invented note',
        },
        alternatives: [],
        findings: [sharedNozzle.key, sameMake.key],
      },
    ],
  };
}

export const INVENTED_FINDINGS = { sharedNozzle, sameMake };

/** The invented model and analysis as `bulkhead report` would pass them, justifications applied. */
export function inventedInput(text = INVENTED_TEXT, analysis = inventedAnalysis()) {
  const loaded = loadInvented(text);
  const justified = applyJustifications(analysis.findings, loaded.model.justifications, loaded.spans);
  return {
    model: loaded.model,
    analysis: { ...analysis, findings: [...justified.findings, ...justified.stale] },
    file: INVENTED_FILE,
    sha256: INVENTED_SHA,
    toolVersion: '0.0.0-test',
    spans: loaded.spans,
  };
}
