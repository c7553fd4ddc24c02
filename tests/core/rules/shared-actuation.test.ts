// A failed solenoid or stuck actuator stops the valve whichever function commands it: CCPS LOPA (2001) ch. 6.
import { ruleTable } from './cases.ts';

ruleTable('shared-actuation', {
  valid: [
    { name: 'no solenoids' },
    { name: 'a solenoid each', lines: { 'XY-1': 'solenoid XY-1 fails-to=closed signal-via=IO-3', 'XY-2': 'solenoid XY-2 fails-to=closed signal-via=IO-4', 'CV-1': 'control-valve CV-1 fails-to=closed mounted-on=L-1 signal-via=XY-1 air-from=IA-A', 'XV-1': 'shutdown-valve XV-1 fails-to=closed mounted-on=L-1 signal-via=XY-2 air-from=IA-B' } },
  ],
  invalid: [
    {
      name: 'both valves through one solenoid',
      lines: { 'XY-1': 'solenoid XY-1 fails-to=closed signal-via=IO-4', 'CV-1': 'control-valve CV-1 fails-to=closed mounted-on=L-1 signal-via=XY-1 air-from=IA-A', 'XV-1': 'shutdown-valve XV-1 fails-to=closed mounted-on=L-1 signal-via=XY-1 air-from=IA-B' },
      findings: [{ element: 'XY-1', parties: ['LC-1', 'SF-1'], severity: 'voids-credit' }],
    },
    {
      name: 'both valves through one positioner',
      lines: { 'ZP-1': 'positioner ZP-1 fails-to=closed signal-via=IO-3', 'CV-1': 'control-valve CV-1 fails-to=closed mounted-on=L-1 signal-via=ZP-1 air-from=IA-A', 'XV-1': 'shutdown-valve XV-1 fails-to=closed mounted-on=L-1 signal-via=ZP-1,IO-4 air-from=IA-B' },
      findings: [{ element: 'ZP-1', parties: ['LC-1', 'SF-1'], severity: 'voids-credit' }],
    },
  ],
});
