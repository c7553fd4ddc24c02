// An operator response relying only on the BPCS that failed is not independent of a BPCS cause:
// CCPS, Layer of Protection Analysis (2001), ch. 6.
import { ruleTable } from './cases.ts';

const people = { 'OP-1': 'operator OP-1' };
const scenario = ['scenario SC-1 category=c', '  cause function=LC-1 frequency=0.1', '  layer AL-1'];

ruleTable('alarm-on-failed-bpcs', {
  valid: [
    { name: 'alarm raised in the SIS solver', lines: { ...people, 'AL-1': 'alarm AL-1 sensors=T-2 raised-in=S-1 operator=OP-1 finals=XV-1 minutes=20' }, scenario },
    {
      name: 'alarm raised in a second, separate BPCS controller',
      lines: { ...people, 'C-2': 'controller C-2 system=bpcs powered-by=CK-B', 'IO-5': 'io-card IO-5 signal-via=C-2 powered-by=CK-B', 'T-2': 'transmitter T-2 make="Brill" model="B2" mounted-on=N-2 signal-via=IO-5', 'AL-1': 'alarm AL-1 sensors=T-2 raised-in=C-2 operator=OP-1 finals=XV-1 minutes=20' },
      scenario,
    },
  ],
  invalid: [
    {
      name: 'alarm raised in the controller of the failing loop',
      lines: { ...people, 'AL-1': 'alarm AL-1 sensors=T-2 raised-in=C-1 operator=OP-1 finals=XV-1 minutes=20' },
      scenario,
      findings: [{ element: 'C-1', parties: ['LC-1', 'AL-1'], severity: 'voids-credit' }],
    },
    {
      name: 'alarm shown only on a console driven by the failing controller',
      lines: { ...people, 'CON-1': 'console CON-1 signal-via=C-1', 'AL-1': 'alarm AL-1 sensors=T-2 raised-in=S-1 console=CON-1 operator=OP-1 finals=XV-1 minutes=20' },
      scenario,
      findings: [{ element: 'C-1', parties: ['LC-1', 'AL-1'], severity: 'voids-credit' }],
    },
  ],
});
