// utility-loss-cause: a layer that needs the utility whose loss starts the scenario is defeated by it,
// unless that loss drives the layer to its trip position (CCPS, Layer of Protection Analysis (2001), ch. 6).
import { ruleTable, scenario } from './harness.ts';

const CCPS = 'CCPS, Layer of Protection Analysis (2001), ch. 6';
const FAIL_SAFE = 'de-energise or fail to trip on loss: common practice, no source';
const airLoss = scenario('element=IA-A frequency=0.1', 'SF-1');
const sisFeedLoss = scenario('element=CK-B frequency=0.1', 'SF-1');
const xvOnAirA = (failsTo: string) =>
  `shutdown-valve XV-1 fails-to=${failsTo} mounted-on=L-1 signal-via=IO-4 air-from=IA-A`;

ruleTable('utility-loss-cause', {
  valid: [
    { name: 'loss of air A, the SIF valve on air B', scenario: airLoss },
    { name: 'loss of UPS A, the SIF fed from UPS B', scenario: scenario('element=UPS-A frequency=0.1', 'SF-1') },
  ],
  invalid: [
    {
      name: 'loss of air, the SIF valve on that air fails closed as the trip needs: a note',
      source: `${CCPS}; ${FAIL_SAFE}`,
      scenario: airLoss,
      lines: { 'XV-1': xvOnAirA('closed') },
      findings: [
        {
          key: 'utility-loss-cause:SC-1:IA-A+SF-1:IA-A',
          messageId: 'utility-loss-cause/support',
          data: {
            a: { role: 'cause', tag: 'IA-A' },
            b: { role: 'layer', tag: 'SF-1' },
            element: 'IA-A',
            kind: 'air-header',
            beneath: [],
            safeLayer: 'SF-1',
          },
          at: '27:9',
          severity: 'note',
          element: 'IA-A',
          parties: ['IA-A', 'SF-1'],
        },
      ],
    },
    {
      name: 'loss of air, the SIF valve on that air fails open while the trip must close: voids',
      source: CCPS,
      scenario: airLoss,
      lines: { 'XV-1': xvOnAirA('open') },
      findings: [
        {
          key: 'utility-loss-cause:SC-1:IA-A+SF-1:IA-A',
          messageId: 'utility-loss-cause/support',
          severity: 'voids-credit',
          element: 'IA-A',
          parties: ['IA-A', 'SF-1'],
        },
      ],
    },
    {
      name: 'loss of the SIS feed, de-energise-to-trip SIF: it trips, a note (its UPS is listed under it)',
      source: `${CCPS}; ${FAIL_SAFE}`,
      scenario: sisFeedLoss,
      findings: [
        {
          key: 'utility-loss-cause:SC-1:CK-B+SF-1:CK-B',
          messageId: 'utility-loss-cause/support',
          severity: 'note',
          element: 'CK-B',
          parties: ['CK-B', 'SF-1'],
        },
      ],
    },
    {
      name: 'loss of the SIS feed, energise-to-trip SIF: it cannot act, voids',
      source: CCPS,
      scenario: sisFeedLoss,
      lines: { 'SF-1': 'sif SF-1 sensors=T-2 solver=S-1 finals=XV-1 trip=close trip-mode=energise sil=2 pfd=0.01' },
      findings: [
        {
          key: 'utility-loss-cause:SC-1:CK-B+SF-1:CK-B',
          messageId: 'utility-loss-cause/support',
          severity: 'voids-credit',
          element: 'CK-B',
          parties: ['CK-B', 'SF-1'],
        },
      ],
    },
  ],
});
