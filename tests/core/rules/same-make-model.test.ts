// same-make-model: identical devices on both sides share systematic faults; identical separation is generally
// accepted at SIL 1, diverse separation matters most at SIL 3 (ANSI/ISA-S84.01-1996 Annex B.1.2).
import { ruleTable } from './harness.ts';

const SOURCE = 'ANSI/ISA-S84.01-1996 Annex B.1.2';

ruleTable('same-make-model', {
  valid: [
    { name: 'different makes' },
    {
      name: 'same make, different model',
      lines: { 'T-2': 'transmitter T-2 make="Acme" model="A9" mounted-on=N-2 signal-via=IO-2 supply=from-signal' },
    },
    {
      name: 'make and model not stated on one side',
      lines: { 'T-2': 'transmitter T-2 mounted-on=N-2 signal-via=IO-2 supply=from-signal' },
    },
    {
      name: 'same make and model, but a transmitter and a valve',
      lines: {
        'XV-1':
          'shutdown-valve XV-1 make="Acme" model="A1" fails-to=closed mounted-on=L-1 signal-via=IO-4 air-from=IA-B',
      },
    },
  ],
  invalid: [
    {
      name: 'same make and model of transmitter',
      source: SOURCE,
      lines: { 'T-2': 'transmitter T-2 make="Acme" model="A1" mounted-on=N-2 signal-via=IO-2 supply=from-signal' },
      findings: [
        {
          key: 'same-make-model:SC-1:LC-1+SF-1:T-2:T-1',
          messageId: 'same-make-model/same-device',
          data: {
            element: 'T-2',
            other: 'T-1',
            a: { role: 'cause', tag: 'LC-1', functionKind: 'loop' },
            b: { role: 'layer', tag: 'SF-1' },
            make: 'Acme',
            model: 'A1',
          },
          at: '27:9',
          severity: 'needs-justification',
          element: 'T-2',
          parties: ['LC-1', 'SF-1'],
        },
      ],
    },
    {
      name: 'same make and model of valve, compared without case or outer spaces',
      source: SOURCE,
      lines: {
        'CV-1':
          'control-valve CV-1 make="Vexa" model="V-10" fails-to=closed mounted-on=L-1 signal-via=IO-3 air-from=IA-A',
        'XV-1':
          'shutdown-valve XV-1 make="VEXA " model="v-10" fails-to=closed mounted-on=L-1 signal-via=IO-4 air-from=IA-B',
      },
      findings: [
        {
          key: 'same-make-model:SC-1:LC-1+SF-1:XV-1:CV-1',
          messageId: 'same-make-model/same-device',
          severity: 'needs-justification',
          element: 'XV-1',
          parties: ['LC-1', 'SF-1'],
        },
      ],
    },
  ],
});
