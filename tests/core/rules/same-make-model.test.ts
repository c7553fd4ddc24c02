// Identical devices share systematic faults: ANSI/ISA-S84.01-1996 Annex B.1.2 (identical vs diverse separation).
import { ruleTable } from './cases.ts';

ruleTable('same-make-model', {
  valid: [
    { name: 'different makes' },
    { name: 'same make, different model', lines: { 'T-2': 'transmitter T-2 make="Acme" model="A9" mounted-on=N-2 signal-via=IO-2' } },
    { name: 'model not stated on one side', lines: { 'T-2': 'transmitter T-2 mounted-on=N-2 signal-via=IO-2' } },
  ],
  invalid: [
    {
      name: 'same make and model of transmitter',
      lines: { 'T-2': 'transmitter T-2 make="Acme" model="A1" mounted-on=N-2 signal-via=IO-2' },
      findings: [{ element: 'T-2', parties: ['LC-1', 'SF-1'], severity: 'needs-justification' }],
    },
    {
      name: 'same make and model of valve, compared without case',
      lines: {
        'CV-1': 'control-valve CV-1 make="Vexa" model="V-10" fails-to=closed mounted-on=L-1 signal-via=IO-3 air-from=IA-A',
        'XV-1': 'shutdown-valve XV-1 make="VEXA" model="v-10" fails-to=closed mounted-on=L-1 signal-via=IO-4 air-from=IA-B',
      },
      findings: [{ element: 'XV-1', parties: ['LC-1', 'SF-1'], severity: 'needs-justification' }],
    },
  ],
});
