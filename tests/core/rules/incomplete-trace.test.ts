// incomplete-trace: what the model does not say is never taken as independence; an instrumented layer with
// no sensor process connection, solver or final element is unverified (CCPS, Layer of Protection Analysis
// (2001), ch. 6: an IPL must be auditable; the conservative default of this tool).
import { ruleTable, scenario } from './harness.ts';

const SOURCE = 'CCPS, Layer of Protection Analysis (2001), ch. 6 (auditable); conservative default of this tool';
const relief = (psv: string) => ({
  'N-3': 'nozzle N-3 mounted-on=V-1',
  'PSV-1': psv,
  'D-1': 'device D-1 device=PSV-1',
});
const onDevice = scenario('function=LC-1 frequency=0.1', 'D-1 pfd=0.01');
const alarm = (finals: string) => ({
  'OP-1': 'operator OP-1',
  'AL-1': `alarm AL-1 sensors=T-2 raised-in=S-1 operator=OP-1${finals} minutes=20`,
});
const onAlarm = scenario('function=LC-1 frequency=0.1', 'AL-1 pfd=0.1');

ruleTable('incomplete-trace', {
  valid: [
    { name: 'a fully traced SIF' },
    { name: 'a relief valve on a nozzle', lines: relief('relief-valve PSV-1 mounted-on=N-3'), scenario: onDevice },
    { name: 'an alarm whose operator acts on a valve', lines: alarm(' finals=XV-1'), scenario: onAlarm },
    {
      name: 'a SIF transmitter on an impulse line',
      lines: {
        'IL-2': 'impulse-line IL-2 mounted-on=N-2',
        'T-2': 'transmitter T-2 make="Brill" model="B2" mounted-on=IL-2 signal-via=IO-2 supply=from-signal',
      },
    },
  ],
  invalid: [
    {
      name: 'a SIF transmitter with no process connection',
      source: SOURCE,
      lines: { 'T-2': 'transmitter T-2 make="Brill" model="B2" signal-via=IO-2 supply=from-signal' },
      findings: [
        {
          key: 'incomplete-trace:SC-1:SF-1:process-connection',
          messageId: 'incomplete-trace/untraced',
          data: { function: 'SF-1', missing: ['process-connection'] },
          at: '27:9',
          severity: 'voids-credit',
          parties: ['SF-1'],
        },
      ],
    },
    {
      name: 'a relief valve mounted on nothing',
      source: SOURCE,
      lines: relief('relief-valve PSV-1'),
      scenario: onDevice,
      findings: [
        {
          key: 'incomplete-trace:SC-1:D-1:process-connection',
          messageId: 'incomplete-trace/untraced',
          severity: 'voids-credit',
          parties: ['D-1'],
        },
      ],
    },
    {
      name: 'an alarm with no final element for the operator to act on',
      source: SOURCE,
      lines: alarm(''),
      scenario: onAlarm,
      findings: [
        {
          key: 'incomplete-trace:SC-1:AL-1:final-element',
          messageId: 'incomplete-trace/untraced',
          severity: 'voids-credit',
          parties: ['AL-1'],
        },
      ],
    },
  ],
});
