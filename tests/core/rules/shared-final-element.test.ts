// shared-final-element: a valve or starter that fails in the cause, or sticks, cannot also be what a layer
// relies on to act (IEC 61511-1:2016 11.2.10; ANSI/ISA-S84.01-1996 Annex B.1.3).
import { ruleTable, scenario } from './harness.ts';

const SOURCE = 'IEC 61511-1:2016 11.2.10; ANSI/ISA-S84.01-1996 Annex B.1.3';
const reliefDevices = {
  'N-3': 'nozzle N-3 mounted-on=V-1',
  'N-4': 'nozzle N-4 mounted-on=V-1',
  'PSV-1': 'relief-valve PSV-1 mounted-on=N-3',
  'RD-1': 'rupture-disc RD-1 mounted-on=N-4',
  'D-1': 'device D-1 device=PSV-1',
  'D-2': 'device D-2 device=RD-1',
};
const twoDevices = scenario('external="Fire" frequency=0.01', 'D-1 pfd=0.01', 'D-2 pfd=0.01');

ruleTable('shared-final-element', {
  valid: [
    { name: 'separate valves' },
    {
      name: 'separate motor starters',
      lines: {
        'P-1': 'pump P-1',
        'MS-1': 'motor-starter MS-1 fails-to=off mounted-on=P-1 signal-via=IO-3',
        'MS-2': 'motor-starter MS-2 fails-to=off mounted-on=P-1 signal-via=IO-4',
        'LC-1': 'loop LC-1 sensors=T-1 solver=C-1 finals=MS-1',
        'SF-1': 'sif SF-1 sensors=T-2 solver=S-1 finals=MS-2 trip=stop trip-mode=de-energise sil=2 pfd=0.01',
      },
    },
    { name: 'a relief valve and a rupture disc on their own nozzles', lines: reliefDevices, scenario: twoDevices },
  ],
  invalid: [
    {
      name: 'the SIF closes the control valve of the failing loop',
      source: SOURCE,
      lines: { 'SF-1': 'sif SF-1 sensors=T-2 solver=S-1 finals=CV-1 trip=close trip-mode=de-energise sil=2 pfd=0.01' },
      findings: [{ key: 'shared-final-element:SC-1:LC-1+SF-1:CV-1', severity: 'voids-credit', element: 'CV-1', parties: ['LC-1', 'SF-1'] }],
    },
    {
      name: 'two device layers claimed on one relief valve',
      source: 'CCPS, Layer of Protection Analysis (2001), ch. 6',
      lines: { ...reliefDevices, 'D-2': 'device D-2 device=PSV-1' },
      scenario: twoDevices,
      findings: [{ key: 'shared-final-element:SC-1:D-1+D-2:PSV-1', severity: 'voids-credit', element: 'PSV-1', parties: ['D-1', 'D-2'] }],
    },
  ],
});
