// shared-housing: a fire, flood or impact in one cabinet, junction box or cable route can take out all
// inside it; whether that voids credit is a judgement, so it needs a justification (physical separation:
// IEC 61511-1:2016 9.4 and 11.2, from memory; ANSI/ISA-S84.01-1996 Annex B.1.2).
import { ruleTable } from './harness.ts';

const SOURCE = 'IEC 61511-1:2016 9.4 (from memory); ANSI/ISA-S84.01-1996 Annex B.1.2';
const oneJunctionBox = {
  'JB-1': 'junction-box JB-1',
  'T-1': 'transmitter T-1 make="Acme" model="A1" mounted-on=N-1 signal-via=IO-1 housed-in=JB-1 supply=from-signal',
  'T-2': 'transmitter T-2 make="Brill" model="B2" mounted-on=N-2 signal-via=IO-2 housed-in=JB-1 supply=from-signal',
};
const inJb1 = {
  key: 'shared-housing:SC-1:LC-1+SF-1:JB-1',
  messageId: 'shared-housing/shared' as const,
  element: 'JB-1',
  parties: ['LC-1', 'SF-1'],
};

ruleTable('shared-housing', {
  valid: [
    { name: 'no housings modelled' },
    {
      name: 'separate cabinets',
      lines: {
        'CAB-1': 'cabinet CAB-1',
        'CAB-2': 'cabinet CAB-2',
        'C-1': 'controller C-1 system=bpcs housed-in=CAB-1 powered-by=CK-A',
        'S-1': 'logic-solver S-1 system=sis housed-in=CAB-2 powered-by=CK-B',
      },
    },
  ],
  invalid: [
    {
      name: 'BPCS controller and SIS logic solver in one cabinet',
      source: SOURCE,
      lines: {
        'CAB-1': 'cabinet CAB-1',
        'C-1': 'controller C-1 system=bpcs housed-in=CAB-1 powered-by=CK-A',
        'S-1': 'logic-solver S-1 system=sis housed-in=CAB-1 powered-by=CK-B',
      },
      findings: [
        {
          key: 'shared-housing:SC-1:LC-1+SF-1:CAB-1',
          messageId: 'shared-housing/shared',
          data: {
            a: { role: 'cause', tag: 'LC-1', functionKind: 'loop' },
            b: { role: 'layer', tag: 'SF-1' },
            element: 'CAB-1',
            kind: 'cabinet',
            severity: 'needs-justification',
            beneath: [],
          },
          at: '28:9',
          severity: 'needs-justification',
          element: 'CAB-1',
          parties: ['LC-1', 'SF-1'],
        },
      ],
    },
    {
      name: 'both transmitters in one junction box',
      source: SOURCE,
      lines: oneJunctionBox,
      findings: [{ ...inJb1, severity: 'needs-justification' }],
    },
    {
      name: 'both cables along one route',
      source: SOURCE,
      lines: {
        'RT-1': 'cable-route RT-1',
        'CB-1': 'cable CB-1 signal-via=IO-1 housed-in=RT-1',
        'CB-2': 'cable CB-2 signal-via=IO-2 housed-in=RT-1',
        'T-1': 'transmitter T-1 make="Acme" model="A1" mounted-on=N-1 signal-via=CB-1 supply=from-signal',
        'T-2': 'transmitter T-2 make="Brill" model="B2" mounted-on=N-2 signal-via=CB-2 supply=from-signal',
      },
      findings: [
        {
          key: 'shared-housing:SC-1:LC-1+SF-1:RT-1',
          messageId: 'shared-housing/shared',
          severity: 'needs-justification',
          element: 'RT-1',
          parties: ['LC-1', 'SF-1'],
        },
      ],
    },
    {
      name: 'a model rule setting raises it to voids-credit',
      lines: oneJunctionBox,
      extra: ['rule shared-housing severity=voids-credit reason="Owner standard MF-S-4 (invented)"'],
      findings: [{ ...inJb1, severity: 'voids-credit' }],
    },
    {
      name: 'accepted by a justification: still listed, marked accepted',
      lines: oneJunctionBox,
      extra: [
        'accept shared-housing:SC-1:LC-1+SF-1:JB-1 by="T. Tester (invented)" date=2026-11-01 reason="Fire-rated box (test)"',
      ],
      findings: [{ ...inJb1, severity: 'needs-justification', accepted: true }],
    },
  ],
});
