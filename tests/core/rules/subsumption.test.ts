// What a shared element relies on is listed under it, not again, unless a side reaches it by a route
// that avoids the shared element: then it is a common cause of its own (CCPS, Layer of Protection
// Analysis (2001), ch. 6: no single element may defeat both sides). Case models are invented.
import { describe, expect, it } from 'vitest';
import { analyze, loadModelText } from '@bulkhead/core';
import { modelText } from './harness.ts';

// An alarm raised in the failing loop's controller C-1 (fed from CK-A); its transmitter's card IO-5 hangs
// on a second controller but is fed from CK-A as well, by a longer route than the one through C-1.
const lines = {
  'OP-1': 'operator OP-1',
  'C-2': 'controller C-2 system=bpcs powered-by=CK-B',
  'IO-1': 'io-card IO-1 signal-via=C-1 supply=from-signal',
  'IO-3': 'io-card IO-3 signal-via=C-1 supply=from-signal',
  'IO-5': 'io-card IO-5 signal-via=C-2 powered-by=CK-A',
  'T-2': 'transmitter T-2 make="Brill" model="B2" mounted-on=N-2 signal-via=IO-5 supply=from-signal',
  'AL-1': 'alarm AL-1 sensors=T-2 raised-in=C-1 operator=OP-1 finals=XV-1 minutes=20',
};
const scenario = [
  'scenario SC-1 category=c',
  '  cause function=LC-1 frequency=0.1 basis="rule table"',
  '  layer AL-1 pfd=0.1',
];
const acceptController =
  'accept alarm-on-failed-bpcs:SC-1:LC-1+AL-1:C-1 by="T. Tester (invented)" date=2026-11-01 reason="test"';

function run(extra: string[] = [], overrides: Record<string, string> = {}) {
  const loaded = loadModelText(
    'case.bulk',
    modelText({ name: 'routes', lines: { ...lines, ...overrides }, scenario, extra }),
  );
  if (!loaded.model) throw new Error(loaded.diagnostics.map((d) => d.message).join('; '));
  return analyze(loaded.model);
}

describe('elements beneath a shared element', () => {
  it('are listed on their own when one side reaches them around it, with the path that shows the route', () => {
    const analysis = run();
    expect(analysis.findings.map((f) => [f.key, f.severity, f.paths])).toEqual([
      [
        'alarm-on-failed-bpcs:SC-1:LC-1+AL-1:C-1',
        'voids-credit',
        [
          ['LC-1', 'C-1'],
          ['AL-1', 'C-1'],
        ],
      ],
      [
        'shared-support:SC-1:LC-1+AL-1:CK-A',
        'voids-credit',
        [
          ['LC-1', 'C-1', 'CK-A'],
          ['AL-1', 'T-2', 'IO-5', 'CK-A'],
        ],
      ],
    ]);
  });

  it('so accepting the controller finding does not hide the shared supply: the alarm stays voided', () => {
    const analysis = run([acceptController]);
    expect(analysis.findings.find((f) => f.rule === 'alarm-on-failed-bpcs')?.accepted).toBeDefined();
    expect(analysis.findings.find((f) => f.key === 'shared-support:SC-1:LC-1+AL-1:CK-A')?.accepted).toBeUndefined();
    expect(analysis.assessments[0]!.layers[0]).toMatchObject({ function: 'AL-1', credited: false });
  });

  it('are listed under it when every route of both sides passes through it', () => {
    const analysis = run([], { 'IO-5': 'io-card IO-5 signal-via=C-2 supply=from-signal' });
    expect(analysis.findings.map((f) => f.key)).toEqual(['alarm-on-failed-bpcs:SC-1:LC-1+AL-1:C-1']);
    expect(analysis.findings[0]!.message).toContain('(and through it `CK-A`, `UPS-A`)');
  });
});
