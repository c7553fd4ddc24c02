// Shared I/O card, cable or network: ANSI/ISA-S84.01-1996 Annex B.1.3.
import { ruleTable } from './cases.ts';

ruleTable('shared-io', {
  valid: [
    { name: 'separate cards' },
    { name: 'separate cables', lines: { 'CB-1': 'cable CB-1 signal-via=IO-1', 'CB-2': 'cable CB-2 signal-via=IO-2', 'T-1': 'transmitter T-1 make="Acme" model="A1" mounted-on=N-1 signal-via=CB-1', 'T-2': 'transmitter T-2 make="Brill" model="B2" mounted-on=N-2 signal-via=CB-2' } },
  ],
  invalid: [
    {
      name: 'SIF transmitter wired to the BPCS input card',
      lines: { 'T-2': 'transmitter T-2 make="Brill" model="B2" mounted-on=N-2 signal-via=IO-1' },
      findings: [{ element: 'IO-1', parties: ['LC-1', 'SF-1'], severity: 'voids-credit' }],
    },
    {
      name: 'both transmitters through one cable',
      lines: {
        'CB-1': 'cable CB-1 signal-via=IO-1,IO-2',
        'T-1': 'transmitter T-1 make="Acme" model="A1" mounted-on=N-1 signal-via=CB-1',
        'T-2': 'transmitter T-2 make="Brill" model="B2" mounted-on=N-2 signal-via=CB-1',
      },
      findings: [{ element: 'CB-1', parties: ['LC-1', 'SF-1'], severity: 'voids-credit' }],
    },
  ],
});
