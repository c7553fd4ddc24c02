// Shared supplies judged by the direction of failure (DESIGN section 1; CCPS LOPA (2001) ch. 6): a
// de-energise-to-trip SIF whose valve fails to the trip position fails safe (common practice, no source).
import { ruleTable } from './cases.ts';

const xvOnAirA = (failsTo: string) => `shutdown-valve XV-1${failsTo ? ` fails-to=${failsTo}` : ''} mounted-on=L-1 signal-via=IO-4 air-from=IA-A`;

ruleTable('shared-support', {
  valid: [
    { name: 'separate UPS, circuits and air' },
    { name: 'separate air, same make of header', lines: { 'IA-B': 'air-header IA-B title="Second header"' } },
  ],
  invalid: [
    {
      name: 'shared air, valve fails closed, trip closes: fails safe, a note',
      lines: { 'XV-1': xvOnAirA('closed') },
      findings: [{ element: 'IA-A', parties: ['LC-1', 'SF-1'], severity: 'note' }],
    },
    {
      name: 'shared air, valve fails open while the trip must close: voids',
      lines: { 'XV-1': xvOnAirA('open') },
      findings: [{ element: 'IA-A', parties: ['LC-1', 'SF-1'], severity: 'voids-credit' }],
    },
    {
      name: 'shared air, fail action not stated: the worst case',
      lines: { 'XV-1': xvOnAirA('') },
      findings: [{ element: 'IA-A', parties: ['LC-1', 'SF-1'], severity: 'voids-credit' }],
    },
    {
      name: 'shared power circuit, energise-to-trip SIF: voids',
      lines: {
        'S-1': 'logic-solver S-1 system=sis powered-by=CK-A',
        'SF-1': 'sif SF-1 sensors=T-2 solver=S-1 finals=XV-1 trip=close trip-mode=energise sil=2 pfd=0.01',
      },
      findings: [{ element: 'CK-A', parties: ['LC-1', 'SF-1'], severity: 'voids-credit' }],
    },
    {
      name: 'shared power circuit, de-energise-to-trip SIF with fail-closed valve: a note',
      lines: { 'S-1': 'logic-solver S-1 system=sis powered-by=CK-A' },
      findings: [{ element: 'CK-A', parties: ['LC-1', 'SF-1'], severity: 'note' }],
    },
    {
      name: 'shared circuit feeding only the SIF transmitter: it reads low, nothing trips; voids',
      lines: { 'T-2': 'transmitter T-2 make="Brill" model="B2" mounted-on=N-2 signal-via=IO-2 powered-by=CK-A' },
      findings: [{ element: 'CK-A', parties: ['LC-1', 'SF-1'], severity: 'voids-credit' }],
    },
    {
      name: 'shared air moves only the valve it feeds: with 2oo2 valves the other one must close too; voids',
      lines: {
        'XV-1': xvOnAirA('closed'),
        'XV-2': 'shutdown-valve XV-2 fails-to=closed mounted-on=L-1 signal-via=IO-4 air-from=IA-B',
        'SF-1': 'sif SF-1 sensors=T-2 solver=S-1 finals=XV-1,XV-2 final-voting=2oo2 trip=close trip-mode=de-energise sil=2 pfd=0.01',
      },
      findings: [{ element: 'IA-A', parties: ['LC-1', 'SF-1'], severity: 'voids-credit' }],
    },
    {
      name: 'shared air moves only the valve it feeds: with 1oo2 valves that one is enough; a note',
      lines: {
        'XV-1': xvOnAirA('closed'),
        'XV-2': 'shutdown-valve XV-2 mounted-on=L-1 signal-via=IO-4 air-from=IA-B',
        'SF-1': 'sif SF-1 sensors=T-2 solver=S-1 finals=XV-1,XV-2 final-voting=1oo2 trip=close trip-mode=de-energise sil=2 pfd=0.01',
      },
      findings: [{ element: 'IA-A', parties: ['LC-1', 'SF-1'], severity: 'note' }],
    },
  ],
});
