// How the independence findings of the trace rules act on credit, as a table of cases: each hand-built finding
// set with the verdicts, the credit in both figures, and the figures themselves.
import { describe, expect, it } from 'vitest';
import type { Finding } from '../../../packages/core/src/vocabulary/types.ts';
import { assess, cause, independenceFinding, layer } from './kit.ts';

// A SIF and an alarm against a loop failure at 0.1/yr; tolerable 1e-3/yr on a containment criterion.
const MODEL = `
alarm LAH-2 sensors=LT-2 raised-in=C2 operator=OP-1 minutes=20 pfd=0.1
sif SIF-1 sensors=LT-3 solver=SIS-1 finals=XV-1 sil=2 pfd=0.005 pfd-basis="SV-1 (invented)"
scenario S-1 category=loc
  cause function=LIC-1 frequency=0.1
  layer SIF-1
  layer LAH-2
`;

const onAlarm = (rule: string, severity: Finding['severity'], accepted = false) =>
  independenceFinding('S-1', rule, [cause('LIC-1'), layer('LAH-2')], { severity, accepted, element: 'X-1' });

interface Case {
  name: string;
  findings: Finding[];
  verdicts: Record<string, string>;
  credited: string[];
  creditedIfAccepted: string[];
}

const CASES: Case[] = [
  {
    name: 'no findings: both independent',
    findings: [],
    verdicts: { 'SIF-1': 'independent', 'LAH-2': 'independent' },
    credited: ['SIF-1', 'LAH-2'],
    creditedIfAccepted: ['SIF-1', 'LAH-2'],
  },
  {
    name: 'voids-credit against the cause: voided',
    findings: [onAlarm('shared-connection', 'voids-credit')],
    verdicts: { 'LAH-2': 'voided' },
    credited: ['SIF-1'],
    creditedIfAccepted: ['SIF-1'],
  },
  {
    name: 'voids-credit accepted by a justification: credited, and the verdict says so',
    findings: [onAlarm('shared-connection', 'voids-credit', true)],
    verdicts: { 'LAH-2': 'accepted' },
    credited: ['SIF-1', 'LAH-2'],
    creditedIfAccepted: ['SIF-1', 'LAH-2'],
  },
  {
    name: 'needs-justification, not accepted: open',
    findings: [onAlarm('shared-cabinet', 'needs-justification')],
    verdicts: { 'LAH-2': 'open' },
    credited: ['SIF-1'],
    creditedIfAccepted: ['SIF-1', 'LAH-2'],
  },
  {
    name: 'needs-justification, accepted: credited',
    findings: [onAlarm('shared-cabinet', 'needs-justification', true)],
    verdicts: { 'LAH-2': 'accepted' },
    credited: ['SIF-1', 'LAH-2'],
    creditedIfAccepted: ['SIF-1', 'LAH-2'],
  },
  {
    name: 'a note changes nothing',
    findings: [onAlarm('shared-air-fails-safe', 'note')],
    verdicts: { 'LAH-2': 'independent' },
    credited: ['SIF-1', 'LAH-2'],
    creditedIfAccepted: ['SIF-1', 'LAH-2'],
  },
  {
    name: 'incomplete trace: unverified, credited only if accepted',
    findings: [independenceFinding('S-1', 'incomplete-trace', [layer('SIF-1')], { severity: 'needs-justification' })],
    verdicts: { 'SIF-1': 'unverified' },
    credited: ['LAH-2'],
    creditedIfAccepted: ['SIF-1', 'LAH-2'],
  },
  {
    name: 'incomplete trace accepted: credited',
    findings: [
      independenceFinding('S-1', 'incomplete-trace', [layer('SIF-1')], {
        severity: 'needs-justification',
        accepted: true,
      }),
    ],
    verdicts: { 'SIF-1': 'accepted' },
    credited: ['SIF-1', 'LAH-2'],
    creditedIfAccepted: ['SIF-1', 'LAH-2'],
  },
  {
    name: 'incomplete trace accepted at voids-credit (its default): credited',
    findings: [
      independenceFinding('S-1', 'incomplete-trace', [layer('SIF-1')], { severity: 'voids-credit', accepted: true }),
    ],
    verdicts: { 'SIF-1': 'accepted' },
    credited: ['SIF-1', 'LAH-2'],
    creditedIfAccepted: ['SIF-1', 'LAH-2'],
  },
  {
    name: 'incomplete trace at voids-credit: unverified in both figures',
    findings: [independenceFinding('S-1', 'incomplete-trace', [layer('SIF-1')], { severity: 'voids-credit' })],
    verdicts: { 'SIF-1': 'unverified' },
    credited: ['LAH-2'],
    creditedIfAccepted: ['LAH-2'],
  },
  {
    name: 'voided beats unverified',
    findings: [
      independenceFinding('S-1', 'incomplete-trace', [layer('LAH-2')], { severity: 'needs-justification' }),
      onAlarm('shared-connection', 'voids-credit'),
    ],
    verdicts: { 'LAH-2': 'voided' },
    credited: ['SIF-1'],
    creditedIfAccepted: ['SIF-1'],
  },
  {
    name: 'a finding about one layer alone (voted group) acts like one against the cause',
    findings: [
      independenceFinding('S-1', 'voted-group-common-cause', [layer('SIF-1')], {
        severity: 'voids-credit',
        element: 'TW-1',
      }),
    ],
    verdicts: { 'SIF-1': 'voided' },
    credited: ['LAH-2'],
    creditedIfAccepted: ['LAH-2'],
  },
  {
    name: 'two layers that may not both be credited: the stronger is chosen',
    findings: [independenceFinding('S-1', 'shared-element', [layer('SIF-1'), layer('LAH-2')], { element: 'OP-1' })],
    verdicts: { 'SIF-1': 'independent', 'LAH-2': 'not-selected' },
    credited: ['SIF-1'],
    creditedIfAccepted: ['SIF-1'],
  },
  {
    name: 'a layer-layer conflict that needs a justification binds only the headline figure',
    findings: [
      independenceFinding('S-1', 'shared-console', [layer('SIF-1'), layer('LAH-2')], {
        severity: 'needs-justification',
      }),
    ],
    verdicts: { 'LAH-2': 'not-selected' },
    credited: ['SIF-1'],
    creditedIfAccepted: ['SIF-1', 'LAH-2'],
  },
  {
    name: "another scenario's findings are ignored",
    findings: [independenceFinding('S-2', 'shared-connection', [cause('LIC-1'), layer('LAH-2')])],
    verdicts: { 'LAH-2': 'independent' },
    credited: ['SIF-1', 'LAH-2'],
    creditedIfAccepted: ['SIF-1', 'LAH-2'],
  },
];

describe('independence findings acting on credit', () => {
  it.each(CASES.map((c) => [c.name, c] as const))('%s', (_, c) => {
    const a = assess(MODEL, c.findings).assessment;
    expect(Object.fromEntries(a.layers.map((l) => [l.function, l.verdict]))).toMatchObject(c.verdicts);
    expect(a.layers.filter((l) => l.credited).map((l) => l.function)).toEqual(c.credited);
    expect(a.layers.filter((l) => l.creditedIfAccepted).map((l) => l.function)).toEqual(c.creditedIfAccepted);
    for (const f of c.findings.filter((f) => f.scenario === 'S-1')) expect(a.findings).toContain(f.key);
  });

  it('shows what an open finding is worth: the headline drops the layer, the "if accepted" figure keeps it', () => {
    const a = assess(MODEL, [onAlarm('shared-cabinet', 'needs-justification')]).assessment;
    expect(a.mitigatedClaimed).toBeCloseTo(5e-5, 15);
    expect(a.mitigatedAfter).toBeCloseTo(5e-4, 15);
    expect(a.mitigatedIfAccepted).toBeCloseTo(5e-5, 15);
    expect(a.layers.find((l) => l.function === 'LAH-2')!.reasons).toEqual([
      {
        key: 'shared-cabinet:S-1:LIC-1:LAH-2',
        rule: 'shared-cabinet',
        severity: 'needs-justification',
        effect: 'voids',
        element: 'X-1',
        with: 'cause',
      },
    ]);
  });

  it('sizes the SIF on the layers still credited when the SIF itself is voided', () => {
    const voidSif = independenceFinding('S-1', 'shared-connection', [cause('LIC-1'), layer('SIF-1')], {
      element: 'BR-1',
    });
    const a = assess(MODEL, [voidSif]).assessment;
    expect(a.mitigatedAfter).toBeCloseTo(0.01, 15);
    // Required PFD = 1e-3 / (0.1 x 0.1) = 0.1: strictly below 0.1 needs SIL 1.
    expect(a.sif).toMatchObject({ function: 'SIF-1', sil: 1 });
    expect(a.sif!.requiredPfd).toBeCloseTo(0.1, 15);
  });
});
