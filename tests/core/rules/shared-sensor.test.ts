// shared-sensor: a device used for control whose failure causes a demand may not also be used by the
// protection against it (IEC 61511-1:2016 11.2.10, same number in 2003).
import { ruleTable, scenario } from './harness.ts';

const SOURCE = 'IEC 61511-1:2016 11.2.10';

ruleTable('shared-sensor', {
  valid: [
    { name: 'separate transmitters' },
    { name: 'a separate level switch for the SIF', lines: { 'T-2': 'switch T-2 mounted-on=N-2 signal-via=IO-2' } },
  ],
  invalid: [
    {
      name: 'the SIF uses the loop transmitter (its nozzle and card are listed under it)',
      source: SOURCE,
      lines: { 'SF-1': 'sif SF-1 sensors=T-1 solver=S-1 finals=XV-1 trip=close trip-mode=de-energise sil=2 pfd=0.01' },
      findings: [
        {
          key: 'shared-sensor:SC-1:LC-1+SF-1:T-1',
          messageId: 'shared-sensor/shared',
          data: {
            a: { role: 'cause', tag: 'LC-1', functionKind: 'loop' },
            b: { role: 'layer', tag: 'SF-1' },
            element: 'T-1',
            kind: 'transmitter',
            severity: 'voids-credit',
            beneath: ['IO-1', 'N-1', 'UPS-A'],
          },
          at: '27:9',
          severity: 'voids-credit',
          element: 'T-1',
          parties: ['LC-1', 'SF-1'],
        },
      ],
    },
    {
      name: 'an alarm on the loop transmitter',
      source: 'CCPS, Layer of Protection Analysis (2001), ch. 6',
      lines: {
        'OP-1': 'operator OP-1',
        'AL-1': 'alarm AL-1 sensors=T-1 raised-in=S-1 operator=OP-1 finals=XV-1 minutes=20',
      },
      scenario: scenario('function=LC-1 frequency=0.1', 'AL-1'),
      findings: [
        {
          key: 'shared-sensor:SC-1:LC-1+AL-1:T-1',
          messageId: 'shared-sensor/shared',
          severity: 'voids-credit',
          element: 'T-1',
          parties: ['LC-1', 'AL-1'],
        },
      ],
    },
  ],
});
