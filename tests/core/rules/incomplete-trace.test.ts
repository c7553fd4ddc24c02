// What the model does not say is never taken as independence (DESIGN section 1; CCPS LOPA (2001) ch. 6:
// an IPL must be auditable). The layer is unverified.
import { ruleTable } from './cases.ts';

ruleTable('incomplete-trace', {
  valid: [
    { name: 'a fully traced SIF' },
    {
      name: 'a relief valve on a nozzle',
      lines: { 'N-3': 'nozzle N-3 mounted-on=V-1', 'PSV-1': 'relief-valve PSV-1 mounted-on=N-3', 'D-1': 'device D-1 device=PSV-1' },
      scenario: ['scenario SC-1 category=c', '  cause function=LC-1 frequency=0.1', '  layer D-1 pfd=0.01'],
    },
  ],
  invalid: [
    {
      name: 'SIF transmitter with no process connection',
      lines: { 'T-2': 'transmitter T-2 make="Brill" model="B2" signal-via=IO-2' },
      findings: [{ parties: ['SF-1'], severity: 'voids-credit' }],
    },
    {
      name: 'relief valve mounted on nothing',
      lines: { 'PSV-1': 'relief-valve PSV-1', 'D-1': 'device D-1 device=PSV-1' },
      scenario: ['scenario SC-1 category=c', '  cause function=LC-1 frequency=0.1', '  layer D-1 pfd=0.01'],
      findings: [{ parties: ['D-1'], severity: 'voids-credit' }],
    },
  ],
});
