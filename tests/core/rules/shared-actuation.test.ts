// shared-actuation: a stuck actuator or a failed solenoid or positioner stops the valve whichever function
// commands it (CCPS, Layer of Protection Analysis (2001), ch. 6; IEC 61511-1:2016 9.4, from memory).
import { ruleTable } from './harness.ts';

const SOURCE = 'CCPS, Layer of Protection Analysis (2001), ch. 6';

ruleTable('shared-actuation', {
  valid: [
    { name: 'no solenoids' },
    {
      name: 'a solenoid each',
      lines: {
        'XY-1': 'solenoid XY-1 fails-to=closed signal-via=IO-3',
        'XY-2': 'solenoid XY-2 fails-to=closed signal-via=IO-4',
        'CV-1': 'control-valve CV-1 fails-to=closed mounted-on=L-1 signal-via=XY-1 air-from=IA-A',
        'XV-1': 'shutdown-valve XV-1 fails-to=closed mounted-on=L-1 signal-via=XY-2 air-from=IA-B',
      },
    },
  ],
  invalid: [
    {
      name: 'both valves through one solenoid',
      source: SOURCE,
      lines: {
        'XY-1': 'solenoid XY-1 fails-to=closed signal-via=IO-4',
        'CV-1': 'control-valve CV-1 fails-to=closed mounted-on=L-1 signal-via=XY-1 air-from=IA-A',
        'XV-1': 'shutdown-valve XV-1 fails-to=closed mounted-on=L-1 signal-via=XY-1 air-from=IA-B',
      },
      findings: [
        {
          key: 'shared-actuation:SC-1:LC-1+SF-1:XY-1',
          messageId: 'shared-actuation/shared',
          data: {
            a: { role: 'cause', tag: 'LC-1', functionKind: 'loop' },
            b: { role: 'layer', tag: 'SF-1' },
            element: 'XY-1',
            kind: 'solenoid',
            severity: 'voids-credit',
            beneath: ['IO-4', 'UPS-B'],
          },
          at: '28:9',
          severity: 'voids-credit',
          element: 'XY-1',
          parties: ['LC-1', 'SF-1'],
        },
      ],
    },
    {
      name: 'both valves through one positioner',
      source: SOURCE,
      lines: {
        // The positioner takes both the BPCS and the SIS signal: each function relies on it in its role.
        'ZP-1': 'positioner ZP-1 fails-to=closed signal-via=IO-3,IO-4',
        'CV-1': 'control-valve CV-1 fails-to=closed mounted-on=L-1 signal-via=ZP-1 air-from=IA-A',
        'XV-1': 'shutdown-valve XV-1 fails-to=closed mounted-on=L-1 signal-via=ZP-1 air-from=IA-B',
      },
      findings: [
        {
          key: 'shared-actuation:SC-1:LC-1+SF-1:ZP-1',
          messageId: 'shared-actuation/shared',
          severity: 'voids-credit',
          element: 'ZP-1',
          parties: ['LC-1', 'SF-1'],
        },
      ],
    },
  ],
});
