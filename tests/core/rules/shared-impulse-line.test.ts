// Shared impulse line or capillary. Source: CCPS, Layer of Protection Analysis (2001), ch. 6.
import { ruleTable } from './cases.ts';

ruleTable('shared-impulse-line', {
  valid: [
    { name: 'no impulse lines' },
    {
      name: 'an impulse line each',
      lines: {
        'IL-1': 'impulse-line IL-1 mounted-on=N-1', 'IL-2': 'impulse-line IL-2 mounted-on=N-2',
        'T-1': 'transmitter T-1 make="Acme" model="A1" mounted-on=IL-1 signal-via=IO-1',
        'T-2': 'transmitter T-2 make="Brill" model="B2" mounted-on=IL-2 signal-via=IO-2',
      },
    },
  ],
  invalid: [
    {
      name: 'both transmitters on one impulse line',
      lines: {
        'IL-1': 'impulse-line IL-1 mounted-on=N-1',
        'T-1': 'transmitter T-1 make="Acme" model="A1" mounted-on=IL-1 signal-via=IO-1',
        'T-2': 'transmitter T-2 make="Brill" model="B2" mounted-on=IL-1 signal-via=IO-2',
      },
      findings: [{ element: 'IL-1', parties: ['LC-1', 'SF-1'], severity: 'voids-credit' }],
    },
    {
      name: 'both on one capillary',
      lines: {
        'CP-1': 'capillary CP-1 mounted-on=N-2',
        'T-1': 'transmitter T-1 make="Acme" model="A1" mounted-on=CP-1 signal-via=IO-1',
        'T-2': 'transmitter T-2 make="Brill" model="B2" mounted-on=CP-1 signal-via=IO-2',
      },
      findings: [{ element: 'CP-1', parties: ['LC-1', 'SF-1'], severity: 'voids-credit' }],
    },
  ],
});
