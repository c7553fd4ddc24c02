// voted-group-common-cause: channels of a MooN group that share an element are not covered by the beta
// factor; the shared element is a single point of failure in series with the group (IEC 61508-6:2010
// Annexes B and D; ISA-TR84.00.02). The solver and its supplies are a subsystem of their own, not a channel.
import { ruleTable } from './harness.ts';

const SOURCE = 'IEC 61508-6:2010 Annex B and D; ISA-TR84.00.02';
const pair = (t3: string) => ({
  'N-3': 'nozzle N-3 mounted-on=V-1',
  'IO-5': 'io-card IO-5 signal-via=S-1 powered-by=CK-B',
  'T-3': t3,
  'SF-1':
    'sif SF-1 sensors=T-2,T-3 sensor-voting=1oo2 solver=S-1 finals=XV-1 trip=close trip-mode=de-energise sil=2 pfd=0.01',
});
const valves = (xv2: string) => ({
  'XV-1': 'shutdown-valve XV-1 fails-to=closed mounted-on=L-1 signal-via=IO-4 air-from=IA-B',
  'IO-6': 'io-card IO-6 signal-via=S-1 powered-by=CK-B',
  'XV-2': xv2,
  'SF-1':
    'sif SF-1 sensors=T-2 solver=S-1 finals=XV-1,XV-2 final-voting=1oo2 trip=close trip-mode=de-energise sil=2 pfd=0.01',
});

ruleTable('voted-group-common-cause', {
  valid: [
    {
      name: '1oo2 transmitters on separate nozzles and cards',
      lines: pair('transmitter T-3 make="Brill" model="B2" mounted-on=N-3 signal-via=IO-5 supply=from-signal'),
    },
    {
      name: 'a single channel',
      lines: { 'SF-1': 'sif SF-1 sensors=T-2 solver=S-1 finals=XV-1 trip=close trip-mode=de-energise sil=2 pfd=0.01' },
    },
    {
      name: '1oo2 valves on one air header that closes both on its loss: fails safe, not reported',
      lines: valves('shutdown-valve XV-2 fails-to=closed mounted-on=L-1 signal-via=IO-6 air-from=IA-B'),
    },
  ],
  invalid: [
    {
      name: '1oo2 transmitters on one nozzle',
      source: SOURCE,
      lines: pair('transmitter T-3 make="Brill" model="B2" mounted-on=N-2 signal-via=IO-5 supply=from-signal'),
      findings: [
        {
          key: 'voted-group-common-cause:SC-1:SF-1:N-2',
          messageId: 'voted-group-common-cause/shared-in-group',
          data: { role: 'sensor', channels: ['T-2', 'T-3'], function: 'SF-1', element: 'N-2', kind: 'nozzle' },
          at: '30:9',
          severity: 'needs-justification',
          element: 'N-2',
          parties: ['SF-1'],
        },
      ],
    },
    {
      // Issue 16, item 6: a card of the function's own solver is part of the logic-solver subsystem (a note).
      name: '1oo2 transmitters on one input card of their own solver: a note, counted in the logic-solver subsystem',
      source: SOURCE,
      lines: pair('transmitter T-3 make="Brill" model="B2" mounted-on=N-3 signal-via=IO-2 supply=from-signal'),
      findings: [
        {
          key: 'voted-group-common-cause:SC-1:SF-1:IO-2',
          messageId: 'voted-group-common-cause/own-solver-card',
          severity: 'note',
          element: 'IO-2',
          parties: ['SF-1'],
        },
      ],
    },
    {
      name: '1oo2 valves on one air header, the second valve fail action not stated',
      source: SOURCE,
      lines: valves('shutdown-valve XV-2 mounted-on=L-1 signal-via=IO-6 air-from=IA-B'),
      findings: [
        {
          key: 'voted-group-common-cause:SC-1:SF-1:IA-B',
          messageId: 'voted-group-common-cause/shared-in-group',
          severity: 'needs-justification',
          element: 'IA-B',
          parties: ['SF-1'],
        },
      ],
    },
  ],
});
