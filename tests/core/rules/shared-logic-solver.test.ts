// A controller that fails in the cause cannot act against it: IEC 61511-1:2016 9.3; the older CCPS (2001)
// allowance is the policy switch shared-solver=allow.
import { ruleTable } from './cases.ts';

const sifInBpcs = { 'SF-1': 'sif SF-1 sensors=T-2 solver=C-1 finals=XV-1 trip=close trip-mode=de-energise sil=2 pfd=0.01' };

ruleTable('shared-logic-solver', {
  valid: [
    { name: 'SIF in the SIS logic solver' },
    { name: 'SIF in a second SIS logic solver', lines: { 'S-2': 'logic-solver S-2 system=sis powered-by=CK-B', 'SF-1': 'sif SF-1 sensors=T-2 solver=S-2 finals=XV-1 trip=close trip-mode=de-energise sil=2 pfd=0.01' } },
  ],
  invalid: [
    { name: 'SIF in the BPCS controller that fails', lines: sifInBpcs, findings: [{ element: 'C-1', parties: ['LC-1', 'SF-1'], severity: 'voids-credit' }] },
    {
      name: 'policy shared-solver=allow makes it a note',
      lines: { ...sifInBpcs, policy: 'policy shared-solver=allow' },
      findings: [{ element: 'C-1', parties: ['LC-1', 'SF-1'], severity: 'note' }],
    },
  ],
});
