// Channels of a voted group that share an element are not covered by beta: IEC 61508-6:2010 Annex B and D.
import { ruleTable } from './cases.ts';

const pair = (t3: string) => ({
  'N-3': 'nozzle N-3 mounted-on=V-1',
  'IO-5': 'io-card IO-5 signal-via=S-1 powered-by=CK-B',
  'T-3': t3,
  'SF-1': 'sif SF-1 sensors=T-2,T-3 sensor-voting=1oo2 solver=S-1 finals=XV-1 trip=close trip-mode=de-energise sil=2 pfd=0.01',
});

ruleTable('voted-group-common-cause', {
  valid: [
    { name: '1oo2 on separate nozzles and cards', lines: pair('transmitter T-3 make="Brill" model="B2" mounted-on=N-3 signal-via=IO-5') },
    { name: 'single channel', lines: { 'SF-1': 'sif SF-1 sensors=T-2 solver=S-1 finals=XV-1 trip=close trip-mode=de-energise sil=2 pfd=0.01' } },
  ],
  invalid: [
    {
      name: '1oo2 pair on one nozzle',
      lines: pair('transmitter T-3 make="Brill" model="B2" mounted-on=N-2 signal-via=IO-5'),
      findings: [{ element: 'N-2', parties: ['SF-1'], severity: 'needs-justification' }],
    },
    {
      name: '1oo2 pair on one input card',
      lines: pair('transmitter T-3 make="Brill" model="B2" mounted-on=N-3 signal-via=IO-2'),
      findings: [{ element: 'IO-2', parties: ['SF-1'], severity: 'needs-justification' }],
    },
  ],
});
