// Two transmitters on one level bridle: common practice, no source; CCPS LOPA (2001) ch. 6.
import { ruleTable } from './cases.ts';

ruleTable('shared-bridle', {
  valid: [
    { name: 'no bridle' },
    {
      name: 'a bridle each',
      lines: {
        'BR-1': 'bridle BR-1 mounted-on=N-1', 'BR-2': 'bridle BR-2 mounted-on=N-2',
        'T-1': 'transmitter T-1 make="Acme" model="A1" mounted-on=BR-1 signal-via=IO-1',
        'T-2': 'transmitter T-2 make="Brill" model="B2" mounted-on=BR-2 signal-via=IO-2',
      },
    },
  ],
  invalid: [
    {
      name: 'both transmitters on one bridle (its nozzles are listed under it, not again)',
      lines: {
        'BR-1': 'bridle BR-1 mounted-on=N-1,N-2',
        'T-1': 'transmitter T-1 make="Acme" model="A1" mounted-on=BR-1 signal-via=IO-1',
        'T-2': 'transmitter T-2 make="Brill" model="B2" mounted-on=BR-1 signal-via=IO-2',
      },
      findings: [{ element: 'BR-1', parties: ['LC-1', 'SF-1'], severity: 'voids-credit' }],
    },
    {
      name: 'both on one manifold',
      lines: {
        'MF-1': 'manifold MF-1 mounted-on=N-1',
        'T-1': 'transmitter T-1 make="Acme" model="A1" mounted-on=MF-1 signal-via=IO-1',
        'T-2': 'transmitter T-2 make="Brill" model="B2" mounted-on=MF-1 signal-via=IO-2',
      },
      findings: [{ element: 'MF-1', parties: ['LC-1', 'SF-1'], severity: 'voids-credit' }],
    },
  ],
});
