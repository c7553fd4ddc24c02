// shared-process-connection: a nozzle, tapping or root valve that plugs or is left isolated blinds every
// instrument on it (CCPS, Layer of Protection Analysis (2001), ch. 6; IEC 61511-1:2016 9.4, from memory).
import { ruleTable, scenario } from './harness.ts';

const SOURCE = 'CCPS, Layer of Protection Analysis (2001), ch. 6; IEC 61511-1:2016 9.4 (from memory)';

ruleTable('shared-process-connection', {
  valid: [
    { name: 'each transmitter has its own nozzle' },
    {
      name: 'each has its own tapping',
      lines: {
        'TP-1': 'tapping TP-1 mounted-on=V-1',
        'TP-2': 'tapping TP-2 mounted-on=V-1',
        'T-1': 'transmitter T-1 make="Acme" model="A1" mounted-on=TP-1 signal-via=IO-1 supply=from-signal',
        'T-2': 'transmitter T-2 make="Brill" model="B2" mounted-on=TP-2 signal-via=IO-2 supply=from-signal',
      },
    },
  ],
  invalid: [
    {
      name: 'the SIF transmitter on the loop transmitter nozzle',
      source: SOURCE,
      lines: { 'T-2': 'transmitter T-2 make="Brill" model="B2" mounted-on=N-1 signal-via=IO-2 supply=from-signal' },
      findings: [
        {
          key: 'shared-process-connection:SC-1:LC-1+SF-1:N-1',
          messageId: 'shared-process-connection/shared',
          data: {
            a: { role: 'cause', tag: 'LC-1', functionKind: 'loop' },
            b: { role: 'layer', tag: 'SF-1' },
            element: 'N-1',
            kind: 'nozzle',
            severity: 'voids-credit',
            beneath: [],
          },
          at: '27:9',
          severity: 'voids-credit',
          element: 'N-1',
          parties: ['LC-1', 'SF-1'],
        },
      ],
    },
    {
      name: 'own root valves on one tapping: the tapping is shared, not the root valves',
      source: SOURCE,
      lines: {
        'TP-1': 'tapping TP-1 mounted-on=V-1',
        'RV-1': 'root-valve RV-1 mounted-on=TP-1',
        'RV-2': 'root-valve RV-2 mounted-on=TP-1',
        'T-1': 'transmitter T-1 make="Acme" model="A1" mounted-on=RV-1 signal-via=IO-1 supply=from-signal',
        'T-2': 'transmitter T-2 make="Brill" model="B2" mounted-on=RV-2 signal-via=IO-2 supply=from-signal',
      },
      findings: [
        {
          key: 'shared-process-connection:SC-1:LC-1+SF-1:TP-1',
          messageId: 'shared-process-connection/shared',
          severity: 'voids-credit',
          element: 'TP-1',
          parties: ['LC-1', 'SF-1'],
        },
      ],
    },
    {
      name: 'two layers on one nozzle, apart from the cause',
      source: SOURCE,
      lines: {
        'OP-1': 'operator OP-1',
        'C-2': 'controller C-2 system=bpcs powered-by=CK-B',
        'IO-5': 'io-card IO-5 signal-via=C-2',
        'T-3': 'transmitter T-3 mounted-on=N-2 signal-via=IO-5 supply=from-signal',
        'P-1': 'pump P-1',
        'MS-1': 'motor-starter MS-1 fails-to=off mounted-on=P-1 signal-via=IO-5',
        'AL-1': 'alarm AL-1 sensors=T-3 raised-in=C-2 operator=OP-1 finals=MS-1 minutes=20',
      },
      scenario: scenario('function=LC-1 frequency=0.1', 'SF-1', 'AL-1'),
      findings: [
        {
          key: 'shared-process-connection:SC-1:AL-1+SF-1:N-2',
          messageId: 'shared-process-connection/shared',
          severity: 'voids-credit',
          element: 'N-2',
          parties: ['AL-1', 'SF-1'],
        },
      ],
    },
  ],
});
