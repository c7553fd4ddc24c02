// shared-console: a console shared by two responses can mislead or blind both; whether that voids credit
// depends on the alarm design, so it needs a justification (common practice, no source).
import { ruleTable, scenario } from './harness.ts';

const SOURCE = 'common practice, no source';
const base = {
  'OP-1': 'operator OP-1',
  'OP-2': 'operator OP-2',
  'CON-1': 'console CON-1 signal-via=S-1',
  'CON-2': 'console CON-2 signal-via=S-1',
  'N-3': 'nozzle N-3 mounted-on=V-1',
  'T-3': 'transmitter T-3 mounted-on=N-3 signal-via=IO-2 supply=from-signal',
  'AL-1': 'alarm AL-1 sensors=T-2 raised-in=S-1 console=CON-1 operator=OP-1 finals=XV-1 minutes=20',
  'AL-2': 'alarm AL-2 sensors=T-3 raised-in=S-1 console=CON-2 operator=OP-2 finals=XV-1 minutes=20',
};
const bothOnCon1 = {
  ...base,
  'AL-2': 'alarm AL-2 sensors=T-3 raised-in=S-1 console=CON-1 operator=OP-2 finals=XV-1 minutes=20',
};
const twoAlarms = scenario('external="Feed surge" frequency=0.1', 'AL-1', 'AL-2');

ruleTable('shared-console', {
  valid: [
    { name: 'each alarm on its own console', lines: base, scenario: twoAlarms },
    {
      name: 'one alarm with no console',
      lines: { ...base, 'AL-2': 'alarm AL-2 sensors=T-3 raised-in=S-1 operator=OP-2 finals=XV-1 minutes=20' },
      scenario: twoAlarms,
    },
  ],
  invalid: [
    {
      name: 'both alarms on one console',
      source: SOURCE,
      lines: bothOnCon1,
      scenario: twoAlarms,
      findings: [
        {
          key: 'shared-console:SC-1:AL-1+AL-2:CON-1',
          messageId: 'shared-console/shared',
          data: {
            a: { role: 'layer', tag: 'AL-1' },
            b: { role: 'layer', tag: 'AL-2' },
            element: 'CON-1',
            kind: 'console',
            severity: 'needs-justification',
            beneath: ['CK-B', 'UPS-B'],
          },
          at: '36:9',
          severity: 'needs-justification',
          element: 'CON-1',
          parties: ['AL-1', 'AL-2'],
        },
      ],
    },
    {
      name: 'the same, layers listed the other way: the same key, as the layers of a pair are named by tag, not by list order (issue 10)',
      source: 'common practice, no source',
      lines: bothOnCon1,
      scenario: scenario('external="Feed surge" frequency=0.1', 'AL-2', 'AL-1'),
      findings: [
        {
          key: 'shared-console:SC-1:AL-1+AL-2:CON-1',
          messageId: 'shared-console/shared',
          severity: 'needs-justification',
          element: 'CON-1',
          parties: ['AL-1', 'AL-2'],
        },
      ],
    },
    {
      name: 'two screens mounted on one console desk',
      source: SOURCE,
      lines: {
        ...base,
        'DESK-1': 'console DESK-1',
        'CON-1': 'console CON-1 signal-via=S-1 mounted-on=DESK-1',
        'CON-2': 'console CON-2 signal-via=S-1 mounted-on=DESK-1',
      },
      scenario: twoAlarms,
      findings: [
        {
          key: 'shared-console:SC-1:AL-1+AL-2:DESK-1',
          messageId: 'shared-console/shared',
          severity: 'needs-justification',
          element: 'DESK-1',
          parties: ['AL-1', 'AL-2'],
        },
      ],
    },
  ],
});
