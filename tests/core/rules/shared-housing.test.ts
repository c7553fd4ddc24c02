// Physical separation: IEC 61511-1:2016 9.4 and 11.2 [from memory for the clauses]; a reasoned acceptance is needed.
import { ruleTable } from './cases.ts';

ruleTable('shared-housing', {
  valid: [
    { name: 'no housings modelled' },
    { name: 'separate cabinets', lines: { 'CAB-1': 'cabinet CAB-1', 'CAB-2': 'cabinet CAB-2', 'C-1': 'controller C-1 system=bpcs housed-in=CAB-1 powered-by=CK-A', 'S-1': 'logic-solver S-1 system=sis housed-in=CAB-2 powered-by=CK-B' } },
  ],
  invalid: [
    {
      name: 'BPCS controller and SIS logic solver in one cabinet',
      lines: { 'CAB-1': 'cabinet CAB-1', 'C-1': 'controller C-1 system=bpcs housed-in=CAB-1 powered-by=CK-A', 'S-1': 'logic-solver S-1 system=sis housed-in=CAB-1 powered-by=CK-B' },
      findings: [{ element: 'CAB-1', parties: ['LC-1', 'SF-1'], severity: 'needs-justification' }],
    },
    {
      name: 'both transmitters in one junction box',
      lines: { 'JB-1': 'junction-box JB-1', 'T-1': 'transmitter T-1 make="Acme" model="A1" mounted-on=N-1 signal-via=IO-1 housed-in=JB-1', 'T-2': 'transmitter T-2 make="Brill" model="B2" mounted-on=N-2 signal-via=IO-2 housed-in=JB-1' },
      findings: [{ element: 'JB-1', parties: ['LC-1', 'SF-1'], severity: 'needs-justification' }],
    },
    {
      name: 'a model setting raises it to voids-credit',
      lines: { 'JB-1': 'junction-box JB-1', 'T-1': 'transmitter T-1 make="Acme" model="A1" mounted-on=N-1 signal-via=IO-1 housed-in=JB-1', 'T-2': 'transmitter T-2 make="Brill" model="B2" mounted-on=N-2 signal-via=IO-2 housed-in=JB-1' },
      extra: ['rule shared-housing severity=voids-credit reason="Owner standard (invented)"'],
      findings: [{ element: 'JB-1', parties: ['LC-1', 'SF-1'], severity: 'voids-credit' }],
    },
  ],
});
