// shared-io: one failed card, cable or network segment cuts the signal of every function wired through
// it (ANSI/ISA-S84.01-1996 Annex B.1.3: separation covers the communication between the parts).
import { ruleTable, solenoidOnBpcsValve } from './harness.ts';

const SOURCE = 'ANSI/ISA-S84.01-1996 Annex B.1.3';

ruleTable('shared-io', {
  valid: [
    { name: 'separate cards' },
    // The SIF moves the BPCS valve through its own solenoid and card IO-4, not the positioner's card IO-3.
    {
      name: "a SIS solenoid on the BPCS valve: the positioner's output card is not the SIF's",
      lines: solenoidOnBpcsValve,
    },
    {
      name: 'separate cables',
      lines: {
        'CB-1': 'cable CB-1 signal-via=IO-1',
        'CB-2': 'cable CB-2 signal-via=IO-2',
        'T-1': 'transmitter T-1 make="Acme" model="A1" mounted-on=N-1 signal-via=CB-1 supply=from-signal',
        'T-2': 'transmitter T-2 make="Brill" model="B2" mounted-on=N-2 signal-via=CB-2 supply=from-signal',
      },
    },
  ],
  invalid: [
    {
      name: 'the SIF transmitter wired to the BPCS input card',
      source: SOURCE,
      lines: { 'T-2': 'transmitter T-2 make="Brill" model="B2" mounted-on=N-2 signal-via=IO-1 supply=from-signal' },
      findings: [
        {
          key: 'shared-io:SC-1:LC-1+SF-1:IO-1',
          messageId: 'shared-io/shared',
          data: {
            a: { role: 'cause', tag: 'LC-1', functionKind: 'loop' },
            b: { role: 'layer', tag: 'SF-1' },
            element: 'IO-1',
            kind: 'io-card',
            severity: 'voids-credit',
            beneath: ['UPS-A'],
          },
          at: '27:9',
          severity: 'voids-credit',
          element: 'IO-1',
          parties: ['LC-1', 'SF-1'],
        },
      ],
    },
    {
      name: 'both transmitters through one cable (the cards behind it are listed under it)',
      source: SOURCE,
      lines: {
        'CB-1': 'cable CB-1 signal-via=IO-1,IO-2',
        'T-1': 'transmitter T-1 make="Acme" model="A1" mounted-on=N-1 signal-via=CB-1 supply=from-signal',
        'T-2': 'transmitter T-2 make="Brill" model="B2" mounted-on=N-2 signal-via=CB-1 supply=from-signal',
      },
      findings: [
        {
          key: 'shared-io:SC-1:LC-1+SF-1:CB-1',
          messageId: 'shared-io/shared',
          severity: 'voids-credit',
          element: 'CB-1',
          parties: ['LC-1', 'SF-1'],
        },
      ],
    },
    {
      name: 'both output cards on one network',
      source: SOURCE,
      lines: {
        'NET-1': 'network NET-1',
        'IO-3': 'io-card IO-3 signal-via=C-1,NET-1 powered-by=CK-A',
        'IO-4': 'io-card IO-4 signal-via=S-1,NET-1 powered-by=CK-B',
      },
      findings: [
        {
          key: 'shared-io:SC-1:LC-1+SF-1:NET-1',
          messageId: 'shared-io/shared',
          severity: 'voids-credit',
          element: 'NET-1',
          parties: ['LC-1', 'SF-1'],
        },
      ],
    },
  ],
});
