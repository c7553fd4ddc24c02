// cause-narrowed: a BPCS loop-failure cause covers every part of the loop (and set points, calibration,
// manual mode); narrowing it to one element needs a justification, and until it is accepted the whole loop
// counts (CCPS, Guidelines for Initiating Events and Independent Protection Layers (2015), BPCS loop failure).
import { describe, expect, it } from 'vitest';
import { analyseCase, ruleTable, scenario } from './harness.ts';

const SOURCE = 'CCPS, Guidelines for Initiating Events and Independent Protection Layers (2015)';
const narrowed = scenario('function=LC-1 only=CV-1 frequency=0.1', 'SF-1');
const accept =
  'accept cause-narrowed:SC-1:LC-1:CV-1 by="T. Tester (invented)" date=2026-11-01 reason="Valve failure only (test)"';
const sifOnLoopTransmitter = {
  'SF-1': 'sif SF-1 sensors=T-1 solver=S-1 finals=XV-1 trip=close trip-mode=de-energise sil=2 pfd=0.01',
};
const toValve = {
  key: 'cause-narrowed:SC-1:LC-1:CV-1',
  messageId: 'cause-narrowed/narrowed' as const,
  element: 'CV-1',
  parties: ['LC-1'],
};

ruleTable('cause-narrowed', {
  valid: [
    { name: 'a whole-loop cause' },
    { name: 'an element cause', scenario: scenario('element=CV-1 frequency=0.1', 'SF-1') },
  ],
  invalid: [
    {
      name: 'narrowed to the control valve, not accepted',
      source: SOURCE,
      scenario: narrowed,
      findings: [{ ...toValve, severity: 'needs-justification' }],
    },
    {
      name: 'narrowed and accepted: still listed, marked accepted',
      source: SOURCE,
      scenario: narrowed,
      extra: [accept],
      findings: [{ ...toValve, severity: 'needs-justification', accepted: true }],
    },
    {
      name: 'narrowed to the transmitter',
      source: SOURCE,
      scenario: scenario('function=LC-1 only=T-1 frequency=0.1', 'SF-1'),
      findings: [
        {
          key: 'cause-narrowed:SC-1:LC-1:T-1',
          messageId: 'cause-narrowed/narrowed',
          data: { loop: 'LC-1', only: 'T-1' },
          at: '26:28',
          severity: 'needs-justification',
          element: 'T-1',
          parties: ['LC-1'],
        },
      ],
    },
  ],
});

describe('a narrowed cause', () => {
  const findings = (extra: string[]) =>
    analyseCase({ name: 'narrowed', scenario: narrowed, lines: sifOnLoopTransmitter, extra }).findings;

  it('counts as the whole loop until accepted, so a SIF on the loop transmitter is still voided', () => {
    expect(
      findings([])
        .filter((f) => f.rule === 'shared-sensor')
        .map((f) => [f.key, f.severity]),
    ).toEqual([['shared-sensor:SC-1:LC-1+SF-1:T-1', 'voids-credit']]);
  });

  it('narrows to the named element once accepted, so the loop transmitter is no longer shared', () => {
    const after = findings([accept]);
    expect(after.filter((f) => f.rule === 'shared-sensor')).toEqual([]);
    // What is left is what the valve itself relies on: its output card's controller and circuit, which the
    // SIF reaches through the loop transmitter's card. The cause's paths now start at the valve.
    expect(after.map((f) => [f.key, f.paths[0]])).toEqual([
      ['shared-logic-solver:SC-1:LC-1+SF-1:C-1', ['CV-1', 'IO-3', 'C-1']],
      ['shared-support:SC-1:LC-1+SF-1:CK-A', ['CV-1', 'IO-3', 'CK-A']],
      ['cause-narrowed:SC-1:LC-1:CV-1', ['CV-1']],
    ]);
  });
});
