// A layer that needs the utility whose loss is the cause: CCPS LOPA (2001) ch. 6; CCPS IEs and IPLs (2015).
import { ruleTable } from './cases.ts';

const airLoss = ['scenario SC-1 category=c', '  cause element=IA-A frequency=0.1', '  layer SF-1'];

ruleTable('utility-loss-cause', {
  valid: [
    { name: 'loss of air A, SIF on air B', scenario: airLoss },
    { name: 'loss of UPS A, SIF on UPS B', scenario: ['scenario SC-1 category=c', '  cause element=UPS-A frequency=0.1', '  layer SF-1'] },
  ],
  invalid: [
    {
      name: 'loss of air, SIF valve on that air fails closed as the trip needs: a note',
      scenario: airLoss,
      lines: { 'XV-1': 'shutdown-valve XV-1 fails-to=closed mounted-on=L-1 signal-via=IO-4 air-from=IA-A' },
      findings: [{ element: 'IA-A', parties: ['IA-A', 'SF-1'], severity: 'note' }],
    },
    {
      name: 'loss of air, SIF valve on that air fails open: voids',
      scenario: airLoss,
      lines: { 'XV-1': 'shutdown-valve XV-1 fails-to=open mounted-on=L-1 signal-via=IO-4 air-from=IA-A' },
      findings: [{ element: 'IA-A', parties: ['IA-A', 'SF-1'], severity: 'voids-credit' }],
    },
  ],
});
