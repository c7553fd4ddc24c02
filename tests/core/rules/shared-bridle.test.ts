// shared-bridle: two level instruments on one bridle, chamber or manifold both read wrong when it plugs
// or is valved out (common practice, no source; CCPS, Layer of Protection Analysis (2001), ch. 6).
import { ruleTable } from './harness.ts';

const SOURCE = 'common practice, no source';
const onBoth = (connection: string) => ({
  'T-1': `transmitter T-1 make="Acme" model="A1" mounted-on=${connection} signal-via=IO-1`,
  'T-2': `transmitter T-2 make="Brill" model="B2" mounted-on=${connection} signal-via=IO-2`,
});

ruleTable('shared-bridle', {
  valid: [
    { name: 'no bridle' },
    {
      name: 'a bridle each',
      lines: {
        'BR-1': 'bridle BR-1 mounted-on=N-1',
        'BR-2': 'bridle BR-2 mounted-on=N-2',
        'T-1': 'transmitter T-1 make="Acme" model="A1" mounted-on=BR-1 signal-via=IO-1 supply=from-signal',
        'T-2': 'transmitter T-2 make="Brill" model="B2" mounted-on=BR-2 signal-via=IO-2 supply=from-signal',
      },
    },
  ],
  invalid: [
    {
      name: 'both transmitters on one bridle (its nozzles are listed under it, not again)',
      source: SOURCE,
      lines: { 'BR-1': 'bridle BR-1 mounted-on=N-1,N-2', ...onBoth('BR-1') },
      findings: [
        {
          key: 'shared-bridle:SC-1:LC-1+SF-1:BR-1',
          messageId: 'shared-bridle/shared',
          data: {
            a: { role: 'cause', tag: 'LC-1', functionKind: 'loop' },
            b: { role: 'layer', tag: 'SF-1' },
            element: 'BR-1',
            kind: 'bridle',
            severity: 'voids-credit',
            beneath: ['N-1', 'N-2'],
          },
          at: '28:9',
          severity: 'voids-credit',
          element: 'BR-1',
          parties: ['LC-1', 'SF-1'],
        },
      ],
    },
    {
      name: 'both on one manifold',
      source: SOURCE,
      lines: { 'MF-1': 'manifold MF-1 mounted-on=N-1', ...onBoth('MF-1') },
      findings: [
        {
          key: 'shared-bridle:SC-1:LC-1+SF-1:MF-1',
          messageId: 'shared-bridle/shared',
          severity: 'voids-credit',
          element: 'MF-1',
          parties: ['LC-1', 'SF-1'],
        },
      ],
    },
  ],
});
