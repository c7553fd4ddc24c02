// shared-operator: two responses by one person, or a response by the person whose error is the cause, are
// not independent (CCPS, Layer of Protection Analysis (2001), ch. 6).
import { ruleTable, scenario } from './harness.ts';

const SOURCE = 'CCPS, Layer of Protection Analysis (2001), ch. 6';
const alarms = {
  'OP-1': 'operator OP-1',
  'OP-2': 'operator OP-2',
  'N-3': 'nozzle N-3 mounted-on=V-1',
  'T-3': 'transmitter T-3 mounted-on=N-3 signal-via=IO-2 supply=from-signal',
  'AL-1': 'alarm AL-1 sensors=T-2 raised-in=S-1 operator=OP-1 finals=XV-1 minutes=20',
  'AL-2': 'alarm AL-2 sensors=T-3 raised-in=S-1 operator=OP-2 finals=XV-1 minutes=20',
};
const twoAlarms = scenario('external="Feed surge" frequency=0.1', 'AL-1', 'AL-2');

ruleTable('shared-operator', {
  valid: [
    { name: 'two alarms answered by two operators', lines: alarms, scenario: twoAlarms },
    {
      name: 'operator error cause, the alarm answered by another operator',
      lines: alarms,
      scenario: scenario('element=OP-1 frequency=0.1', 'AL-2'),
    },
  ],
  invalid: [
    {
      name: 'two alarms answered by the same operator',
      source: SOURCE,
      lines: { ...alarms, 'AL-2': 'alarm AL-2 sensors=T-3 raised-in=S-1 operator=OP-1 finals=XV-1 minutes=20' },
      scenario: twoAlarms,
      findings: [
        {
          key: 'shared-operator:SC-1:AL-1+AL-2:OP-1',
          messageId: 'shared-operator/shared',
          data: {
            a: { role: 'layer', tag: 'AL-1' },
            b: { role: 'layer', tag: 'AL-2' },
            element: 'OP-1',
            kind: 'operator',
            severity: 'voids-credit',
            beneath: [],
          },
          at: '34:9',
          severity: 'voids-credit',
          element: 'OP-1',
          parties: ['AL-1', 'AL-2'],
        },
      ],
    },
    {
      name: 'the operator whose error is the cause answers the alarm',
      source: SOURCE,
      lines: alarms,
      scenario: scenario('element=OP-1 frequency=0.1', 'AL-1'),
      findings: [
        {
          key: 'shared-operator:SC-1:OP-1+AL-1:OP-1',
          messageId: 'shared-operator/shared',
          severity: 'voids-credit',
          element: 'OP-1',
          parties: ['OP-1', 'AL-1'],
        },
      ],
    },
  ],
});
