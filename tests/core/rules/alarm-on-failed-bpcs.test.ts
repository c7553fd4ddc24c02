// alarm-on-failed-bpcs: an operator response that relies only on the BPCS controller or display that
// fails in the cause is not independent of it (CCPS, Layer of Protection Analysis (2001), ch. 6).
import { describe, expect, it } from 'vitest';
import { analyseCase, ruleTable, scenario } from './harness.ts';

const CCPS = 'CCPS, Layer of Protection Analysis (2001), ch. 6, human response as an IPL';
const people = { 'OP-1': 'operator OP-1' };
const onAlarm = scenario('function=LC-1 frequency=0.1', 'AL-1');
// An alarm with its own nozzle, transmitter, cards and starter, raised in the loop's controller C-1. The
// loop's cards draw power through C-1 here, so CK-A is shared only as part of the controller (a supply one
// side reaches around the controller is its own finding: see shared-logic-solver.test.ts).
const ownIoInC1 = {
  'IO-1': 'io-card IO-1 signal-via=C-1 supply=from-signal',
  'IO-3': 'io-card IO-3 signal-via=C-1 supply=from-signal',
  'N-3': 'nozzle N-3 mounted-on=V-1',
  'IO-5': 'io-card IO-5 signal-via=C-1 powered-by=CK-B',
  'IO-6': 'io-card IO-6 signal-via=C-1 powered-by=CK-B',
  'T-3': 'transmitter T-3 mounted-on=N-3 signal-via=IO-5 supply=from-signal',
  'P-1': 'pump P-1',
  'MS-1': 'motor-starter MS-1 fails-to=off mounted-on=P-1 signal-via=IO-6 powered-by=CK-B',
  'AL-1': 'alarm AL-1 sensors=T-3 raised-in=C-1 operator=OP-1 finals=MS-1 minutes=20',
};

ruleTable('alarm-on-failed-bpcs', {
  valid: [
    {
      name: 'alarm raised in the SIS solver',
      lines: { ...people, 'AL-1': 'alarm AL-1 sensors=T-2 raised-in=S-1 operator=OP-1 finals=XV-1 minutes=20' },
      scenario: onAlarm,
    },
    {
      name: 'alarm raised in a second, separate BPCS controller',
      lines: {
        ...people,
        'C-2': 'controller C-2 system=bpcs powered-by=CK-B',
        'IO-5': 'io-card IO-5 signal-via=C-2 powered-by=CK-B',
        'T-2': 'transmitter T-2 make="Brill" model="B2" mounted-on=N-2 signal-via=IO-5 supply=from-signal',
        'AL-1': 'alarm AL-1 sensors=T-2 raised-in=C-2 operator=OP-1 finals=XV-1 minutes=20',
      },
      scenario: onAlarm,
    },
    {
      // The cause is the controller failing, not a loop: shared-logic-solver reports the alarm.
      name: 'the cause is the controller itself, not a loop of it',
      lines: { ...people, 'AL-1': 'alarm AL-1 sensors=T-2 raised-in=C-1 operator=OP-1 finals=XV-1 minutes=20' },
      scenario: scenario('element=C-1 frequency=0.1', 'AL-1'),
    },
  ],
  invalid: [
    {
      name: 'alarm raised in the controller of the failing loop (its power listed under it)',
      source: CCPS,
      lines: { ...people, 'AL-1': 'alarm AL-1 sensors=T-2 raised-in=C-1 operator=OP-1 finals=XV-1 minutes=20' },
      scenario: onAlarm,
      findings: [
        {
          key: 'alarm-on-failed-bpcs:SC-1:LC-1+AL-1:C-1',
          messageId: 'alarm-on-failed-bpcs/raised',
          data: {
            alarm: 'AL-1',
            element: 'C-1',
            kind: 'controller',
            cause: { role: 'cause', tag: 'LC-1', functionKind: 'loop' },
            allowedByPolicy: false,
            beneath: ['UPS-A'],
          },
          at: '29:9',
          severity: 'voids-credit',
          element: 'C-1',
          parties: ['LC-1', 'AL-1'],
        },
      ],
    },
    {
      name: 'alarm raised in the SIS but shown only on a console driven by the failing controller',
      source: CCPS,
      lines: {
        ...people,
        'CON-1': 'console CON-1 signal-via=C-1',
        'AL-1': 'alarm AL-1 sensors=T-2 raised-in=S-1 console=CON-1 operator=OP-1 finals=XV-1 minutes=20',
      },
      scenario: onAlarm,
      findings: [
        {
          key: 'alarm-on-failed-bpcs:SC-1:LC-1+AL-1:C-1',
          messageId: 'alarm-on-failed-bpcs/raised',
          severity: 'voids-credit',
          element: 'C-1',
          parties: ['LC-1', 'AL-1'],
        },
      ],
    },
    {
      name: 'policy shared-solver=allow: an alarm with its own transmitter and I/O in the failing loop controller, a note',
      source: 'CCPS, Layer of Protection Analysis (2001), ch. 6 (older allowance for a shared BPCS controller)',
      lines: { ...people, ...ownIoInC1, policy: 'policy shared-solver=allow' },
      scenario: onAlarm,
      findings: [
        {
          key: 'alarm-on-failed-bpcs:SC-1:LC-1+AL-1:C-1',
          messageId: 'alarm-on-failed-bpcs/raised',
          severity: 'note',
          element: 'C-1',
          parties: ['LC-1', 'AL-1'],
        },
      ],
    },
    {
      name: 'the same alarm without the policy switch: voids',
      source: CCPS,
      lines: { ...people, ...ownIoInC1 },
      scenario: onAlarm,
      findings: [
        {
          key: 'alarm-on-failed-bpcs:SC-1:LC-1+AL-1:C-1',
          messageId: 'alarm-on-failed-bpcs/raised',
          severity: 'voids-credit',
          element: 'C-1',
          parties: ['LC-1', 'AL-1'],
        },
      ],
    },
  ],
});

describe('an alarm in the failing loop controller under shared-solver=allow', () => {
  it("keeps its credit when its own transmitter and I/O are separate (the help text's older practice)", () => {
    const analysis = analyseCase({
      name: 'allowed',
      lines: { ...people, ...ownIoInC1, policy: 'policy shared-solver=allow' },
      scenario: onAlarm,
    });
    expect(analysis.assessments[0]!.layers[0]).toMatchObject({
      function: 'AL-1',
      verdict: 'independent',
      credited: true,
    });
    expect(analysis.findings[0]!.message).toContain('allowed under policy shared-solver=allow');
  });

  it("is still voided when it shares the loop's input card (shared-io is not covered by the switch)", () => {
    const sharedCard = {
      ...people,
      ...ownIoInC1,
      'T-3': 'transmitter T-3 mounted-on=N-3 signal-via=IO-1 supply=from-signal',
      policy: 'policy shared-solver=allow',
    };
    const analysis = analyseCase({ name: 'shared card', lines: sharedCard, scenario: onAlarm });
    expect(analysis.findings.map((f) => [f.rule, f.severity])).toContainEqual(['shared-io', 'voids-credit']);
    expect(analysis.assessments[0]!.layers[0]).toMatchObject({ function: 'AL-1', credited: false });
  });
});
