// alarm-on-failed-bpcs: an operator response that relies only on the BPCS controller or display that
// fails in the cause is not independent of it (CCPS, Layer of Protection Analysis (2001), ch. 6).
import { ruleTable, scenario } from './harness.ts';

const CCPS = 'CCPS, Layer of Protection Analysis (2001), ch. 6, human response as an IPL';
const people = { 'OP-1': 'operator OP-1' };
const onAlarm = scenario('function=LC-1 frequency=0.1', 'AL-1');

ruleTable('alarm-on-failed-bpcs', {
  valid: [
    { name: 'alarm raised in the SIS solver', lines: { ...people, 'AL-1': 'alarm AL-1 sensors=T-2 raised-in=S-1 operator=OP-1 finals=XV-1 minutes=20' }, scenario: onAlarm },
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
      findings: [{ key: 'alarm-on-failed-bpcs:SC-1:LC-1+AL-1:C-1', severity: 'voids-credit', element: 'C-1', parties: ['LC-1', 'AL-1'] }],
    },
    {
      name: 'alarm raised in the SIS but shown only on a console driven by the failing controller',
      source: CCPS,
      lines: { ...people, 'CON-1': 'console CON-1 signal-via=C-1', 'AL-1': 'alarm AL-1 sensors=T-2 raised-in=S-1 console=CON-1 operator=OP-1 finals=XV-1 minutes=20' },
      scenario: onAlarm,
      findings: [{ key: 'alarm-on-failed-bpcs:SC-1:LC-1+AL-1:C-1', severity: 'voids-credit', element: 'C-1', parties: ['LC-1', 'AL-1'] }],
    },
  ],
});
