// A valve that fails in the cause cannot also be what a layer relies on: IEC 61511-1:2016 11.2.10.
import { ruleTable } from './cases.ts';

ruleTable('shared-final-element', {
  valid: [
    { name: 'separate valves' },
    { name: 'separate motor starters', lines: { 'P-1': 'pump P-1', 'MS-1': 'motor-starter MS-1 fails-to=off mounted-on=P-1 signal-via=IO-3', 'MS-2': 'motor-starter MS-2 fails-to=off mounted-on=P-1 signal-via=IO-4', 'LC-1': 'loop LC-1 sensors=T-1 solver=C-1 finals=MS-1', 'SF-1': 'sif SF-1 sensors=T-2 solver=S-1 finals=MS-2 trip=stop trip-mode=de-energise sil=2 pfd=0.01' } },
  ],
  invalid: [
    {
      name: 'SIF closes the control valve',
      lines: { 'SF-1': 'sif SF-1 sensors=T-2 solver=S-1 finals=CV-1 trip=close trip-mode=de-energise sil=2 pfd=0.01' },
      findings: [{ element: 'CV-1', parties: ['LC-1', 'SF-1'], severity: 'voids-credit' }],
    },
    {
      name: 'two relief devices claimed on one relief valve',
      lines: { 'N-3': 'nozzle N-3 mounted-on=V-1', 'PSV-1': 'relief-valve PSV-1 mounted-on=N-3', 'D-1': 'device D-1 device=PSV-1', 'D-2': 'device D-2 device=PSV-1' },
      scenario: ['scenario SC-1 category=c', '  cause external="Fire" frequency=0.01', '  layer D-1 pfd=0.01', '  layer D-2 pfd=0.01'],
      findings: [{ element: 'PSV-1', parties: ['D-1', 'D-2'], severity: 'voids-credit' }],
    },
  ],
});
