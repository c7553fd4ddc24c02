// Shared nozzle, tapping or root valve. Source: CCPS, Layer of Protection Analysis (2001), ch. 6.
import { ruleTable } from './cases.ts';

ruleTable('shared-process-connection', {
  valid: [
    { name: 'each transmitter has its own nozzle' },
    { name: 'own tappings', lines: { 'TP-1': 'tapping TP-1 mounted-on=V-1', 'TP-2': 'tapping TP-2 mounted-on=V-1', 'T-1': 'transmitter T-1 make="Acme" model="A1" mounted-on=TP-1 signal-via=IO-1', 'T-2': 'transmitter T-2 make="Brill" model="B2" mounted-on=TP-2 signal-via=IO-2' } },
  ],
  invalid: [
    {
      name: 'SIF transmitter on the loop transmitter nozzle',
      lines: { 'T-2': 'transmitter T-2 make="Brill" model="B2" mounted-on=N-1 signal-via=IO-2' },
      findings: [{ element: 'N-1', parties: ['LC-1', 'SF-1'], severity: 'voids-credit' }],
    },
    {
      name: 'both on one tapping through their root valves',
      lines: {
        'TP-1': 'tapping TP-1 mounted-on=V-1',
        'RV-1': 'root-valve RV-1 mounted-on=TP-1',
        'RV-2': 'root-valve RV-2 mounted-on=TP-1',
        'T-1': 'transmitter T-1 make="Acme" model="A1" mounted-on=RV-1 signal-via=IO-1',
        'T-2': 'transmitter T-2 make="Brill" model="B2" mounted-on=RV-2 signal-via=IO-2',
      },
      findings: [{ element: 'TP-1', parties: ['LC-1', 'SF-1'], severity: 'voids-credit' }],
    },
  ],
});
