// shared-impulse-line: a blocked, leaking or frozen impulse line gives the same wrong reading to every
// instrument on it (CCPS, Layer of Protection Analysis (2001), ch. 6; IEC 61511-1:2016 9.4, from memory).
import { ruleTable } from './harness.ts';

const SOURCE = 'CCPS, Layer of Protection Analysis (2001), ch. 6';
const onBoth = (line: string) => ({
  'T-1': `transmitter T-1 make="Acme" model="A1" mounted-on=${line} signal-via=IO-1`,
  'T-2': `transmitter T-2 make="Brill" model="B2" mounted-on=${line} signal-via=IO-2`,
});

ruleTable('shared-impulse-line', {
  valid: [
    { name: 'no impulse lines' },
    {
      name: 'an impulse line each',
      lines: {
        'IL-1': 'impulse-line IL-1 mounted-on=N-1',
        'IL-2': 'impulse-line IL-2 mounted-on=N-2',
        'T-1': 'transmitter T-1 make="Acme" model="A1" mounted-on=IL-1 signal-via=IO-1 supply=from-signal',
        'T-2': 'transmitter T-2 make="Brill" model="B2" mounted-on=IL-2 signal-via=IO-2 supply=from-signal',
      },
    },
  ],
  invalid: [
    {
      name: 'both transmitters on one impulse line',
      source: SOURCE,
      lines: { 'IL-1': 'impulse-line IL-1 mounted-on=N-1', ...onBoth('IL-1') },
      findings: [
        {
          key: 'shared-impulse-line:SC-1:LC-1+SF-1:IL-1',
          messageId: 'shared-impulse-line/shared',
          data: {
            a: { role: 'cause', tag: 'LC-1', functionKind: 'loop' },
            b: { role: 'layer', tag: 'SF-1' },
            element: 'IL-1',
            kind: 'impulse-line',
            severity: 'voids-credit',
            beneath: ['N-1'],
          },
          at: '28:9',
          severity: 'voids-credit',
          element: 'IL-1',
          parties: ['LC-1', 'SF-1'],
        },
      ],
    },
    {
      name: 'both on one capillary',
      source: SOURCE,
      lines: { 'CP-1': 'capillary CP-1 mounted-on=N-2', ...onBoth('CP-1') },
      findings: [
        {
          key: 'shared-impulse-line:SC-1:LC-1+SF-1:CP-1',
          messageId: 'shared-impulse-line/shared',
          severity: 'voids-credit',
          element: 'CP-1',
          parties: ['LC-1', 'SF-1'],
        },
      ],
    },
    {
      name: 'own impulse lines joined into one upstream line',
      source: SOURCE,
      lines: {
        'IL-0': 'impulse-line IL-0 mounted-on=N-1',
        'IL-1': 'impulse-line IL-1 connected-through=IL-0',
        'IL-2': 'impulse-line IL-2 connected-through=IL-0',
        'T-1': 'transmitter T-1 make="Acme" model="A1" mounted-on=IL-1 signal-via=IO-1 supply=from-signal',
        'T-2': 'transmitter T-2 make="Brill" model="B2" mounted-on=IL-2 signal-via=IO-2 supply=from-signal',
      },
      findings: [
        {
          key: 'shared-impulse-line:SC-1:LC-1+SF-1:IL-0',
          messageId: 'shared-impulse-line/shared',
          severity: 'voids-credit',
          element: 'IL-0',
          parties: ['LC-1', 'SF-1'],
        },
      ],
    },
  ],
});
