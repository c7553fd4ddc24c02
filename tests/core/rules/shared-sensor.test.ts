// A control device whose failure causes the demand, reused by the protection: IEC 61511-1:2016 11.2.10.
import { ruleTable } from './cases.ts';

ruleTable('shared-sensor', {
  valid: [
    { name: 'separate transmitters' },
    { name: 'separate switch', lines: { 'T-2': 'switch T-2 mounted-on=N-2 signal-via=IO-2' } },
  ],
  invalid: [
    {
      name: 'the SIF uses the loop transmitter',
      lines: { 'SF-1': 'sif SF-1 sensors=T-1 solver=S-1 finals=XV-1 trip=close trip-mode=de-energise sil=2 pfd=0.01' },
      findings: [{ element: 'T-1', parties: ['LC-1', 'SF-1'], severity: 'voids-credit' }],
    },
    {
      name: 'an alarm on the loop transmitter',
      lines: { 'OP-1': 'operator OP-1', 'AL-1': 'alarm AL-1 sensors=T-1 raised-in=S-1 operator=OP-1 finals=XV-1 minutes=20' },
      scenario: ['scenario SC-1 category=c', '  cause function=LC-1 frequency=0.1', '  layer AL-1'],
      findings: [{ element: 'T-1', parties: ['LC-1', 'AL-1'], severity: 'voids-credit' }],
    },
  ],
});
