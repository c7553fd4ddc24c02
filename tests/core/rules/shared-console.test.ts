// A console shared by two responses: common practice, no source (needs a reasoned acceptance).
import { ruleTable } from './cases.ts';

const base = {
  'OP-1': 'operator OP-1',
  'OP-2': 'operator OP-2',
  'CON-1': 'console CON-1 signal-via=S-1',
  'CON-2': 'console CON-2 signal-via=S-1',
  'N-3': 'nozzle N-3 mounted-on=V-1',
  'T-3': 'transmitter T-3 mounted-on=N-3 signal-via=IO-2',
  'AL-1': 'alarm AL-1 sensors=T-2 raised-in=S-1 console=CON-1 operator=OP-1 finals=XV-1 minutes=20',
  'AL-2': 'alarm AL-2 sensors=T-3 raised-in=S-1 console=CON-2 operator=OP-2 finals=XV-1 minutes=20',
};
const scenario = ['scenario SC-1 category=c', '  cause external="Feed surge" frequency=0.1', '  layer AL-1', '  layer AL-2'];

ruleTable('shared-console', {
  valid: [
    { name: 'each alarm on its own console', lines: base, scenario },
    { name: 'one alarm with no console', lines: { ...base, 'AL-2': 'alarm AL-2 sensors=T-3 raised-in=S-1 operator=OP-2 finals=XV-1 minutes=20' }, scenario },
  ],
  invalid: [
    {
      name: 'both alarms on one console',
      lines: { ...base, 'AL-2': 'alarm AL-2 sensors=T-3 raised-in=S-1 console=CON-1 operator=OP-2 finals=XV-1 minutes=20' },
      scenario,
      findings: [{ element: 'CON-1', parties: ['AL-1', 'AL-2'], severity: 'needs-justification' }],
    },
    {
      name: 'the console also relied on by the SIF (an operator reset through it)',
      lines: { ...base, 'XV-1': 'shutdown-valve XV-1 fails-to=closed mounted-on=L-1 signal-via=IO-4 air-from=IA-B', 'AL-1': 'alarm AL-1 sensors=T-2 raised-in=S-1 console=CON-1 operator=OP-1 finals=XV-1 minutes=20', 'AL-2': 'alarm AL-2 sensors=T-3 raised-in=S-1 console=CON-1 operator=OP-2 minutes=20 finals=XV-1' },
      scenario: ['scenario SC-1 category=c', '  cause external="Feed surge" frequency=0.1', '  layer AL-2', '  layer AL-1'],
      findings: [{ element: 'CON-1', parties: ['AL-2', 'AL-1'], severity: 'needs-justification' }],
    },
  ],
});
