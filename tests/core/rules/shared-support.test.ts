// shared-support: a shared power, air or hydraulic supply, judged by the direction of failure. Its loss is
// harmless to a layer that it drives to the trip position (a note), otherwise it voids credit (CCPS, Layer of
// Protection Analysis (2001), ch. 6). An unstated fail action counts as the worst case (this tool's rule).
import { ruleTable, scenario } from './harness.ts';

const CCPS = 'CCPS, Layer of Protection Analysis (2001), ch. 6';
const FAIL_SAFE = 'de-energise to trip, valve failing to the trip position: common practice, no source';
const xvOnAirA = (failsTo: string) =>
  `shutdown-valve XV-1${failsTo ? ` fails-to=${failsTo}` : ''} mounted-on=L-1 signal-via=IO-4 air-from=IA-A`;
const sisOnCircuitA = { 'S-1': 'logic-solver S-1 system=sis powered-by=CK-A' };
const sif = (mode: string, finals = 'XV-1', voting = '') =>
  `sif SF-1 sensors=T-2 solver=S-1 finals=${finals}${voting ? ` final-voting=${voting}` : ''} trip=close trip-mode=${mode} sil=2 pfd=0.01`;
const onAir = (element: string, severity: 'note' | 'voids-credit') => ({
  key: `shared-support:SC-1:LC-1+SF-1:${element}`,
  messageId: 'shared-support/support' as const,
  severity,
  element,
  parties: ['LC-1', 'SF-1'],
});

ruleTable('shared-support', {
  valid: [
    { name: 'separate UPS, circuits and air' },
    {
      name: 'separate hydraulic supplies',
      lines: {
        'HY-1': 'hydraulic-supply HY-1',
        'HY-2': 'hydraulic-supply HY-2',
        'CV-1': 'control-valve CV-1 fails-to=closed mounted-on=L-1 signal-via=IO-3 hydraulic-from=HY-1',
        'XV-1': 'shutdown-valve XV-1 fails-to=closed mounted-on=L-1 signal-via=IO-4 hydraulic-from=HY-2',
      },
    },
  ],
  invalid: [
    {
      name: 'shared air, the valve fails closed and the trip closes: fails safe, a note',
      source: `${CCPS}; ${FAIL_SAFE}`,
      lines: { 'XV-1': xvOnAirA('closed') },
      findings: [onAir('IA-A', 'note')],
    },
    {
      name: 'shared air, the valve fails open while the trip must close: voids',
      source: CCPS,
      lines: { 'XV-1': xvOnAirA('open') },
      findings: [onAir('IA-A', 'voids-credit')],
    },
    {
      name: 'shared air, fail action not stated: the worst case, voids',
      source: 'conservative default of this tool (what the model does not say is not independence)',
      lines: { 'XV-1': xvOnAirA('') },
      findings: [onAir('IA-A', 'voids-credit')],
    },
    {
      name: 'shared circuit, energise-to-trip SIF: it cannot act without power, voids',
      source: CCPS,
      lines: { ...sisOnCircuitA, 'SF-1': sif('energise') },
      findings: [onAir('CK-A', 'voids-credit')],
    },
    {
      name: 'shared circuit, de-energise-to-trip SIF with fail-closed valve: it trips, a note',
      source: `${CCPS}; ${FAIL_SAFE}`,
      lines: sisOnCircuitA,
      findings: [onAir('CK-A', 'note')],
    },
    {
      name: 'shared circuit feeding only the SIF transmitter: it reads low, nothing trips; voids',
      source: 'conservative default of this tool (a sensor fault action the model does not state is not assumed)',
      lines: {
        'T-2':
          'transmitter T-2 make="Brill" model="B2" mounted-on=N-2 signal-via=IO-2 powered-by=CK-A supply=from-signal',
      },
      findings: [onAir('CK-A', 'voids-credit')],
    },
    {
      name: 'shared air moves only the valve it feeds: with 1oo2 valves that one is enough, a note',
      source: FAIL_SAFE,
      lines: {
        'XV-1': xvOnAirA('closed'),
        'XV-2': 'shutdown-valve XV-2 mounted-on=L-1 signal-via=IO-4 air-from=IA-B',
        'SF-1': sif('de-energise', 'XV-1,XV-2', '1oo2'),
      },
      findings: [onAir('IA-A', 'note')],
    },
    {
      name: 'shared air moves only the valve it feeds: with 2oo2 valves the other must close too, voids',
      source: 'MooN voting, M of the N channels must act: common practice, no source',
      lines: {
        'XV-1': xvOnAirA('closed'),
        'XV-2': 'shutdown-valve XV-2 fails-to=closed mounted-on=L-1 signal-via=IO-4 air-from=IA-B',
        'SF-1': sif('de-energise', 'XV-1,XV-2', '2oo2'),
      },
      findings: [onAir('IA-A', 'voids-credit')],
    },
    // Cause failure direction: the loss must also be able to drive the cause the dangerous way it states.
    {
      name: "shared air, the layer valve fails open, but the loss closes the loop valve, away from the cause's dangerous open: a note",
      source: `${CCPS} (the loss must contribute to the scenario); ${FAIL_SAFE}`,
      lines: { 'XV-1': xvOnAirA('open') },
      scenario: scenario('function=LC-1 frequency=0.1 drives-to=open', 'SF-1'),
      findings: [onAir('IA-A', 'note')],
    },
    {
      name: 'shared air, the loss closes the loop valve and the cause is dangerous closed: voids',
      source: CCPS,
      lines: { 'XV-1': xvOnAirA('open') },
      scenario: scenario('function=LC-1 frequency=0.1 drives-to=closed', 'SF-1'),
      findings: [onAir('IA-A', 'voids-credit')],
    },
    {
      name: 'shared air, direction stated but the loop valve states no fail position: the worst case, voids',
      source: 'conservative default of this tool (what the model does not say is not independence)',
      lines: { 'XV-1': xvOnAirA('open'), 'CV-1': 'control-valve CV-1 mounted-on=L-1 signal-via=IO-3 air-from=IA-A' },
      scenario: scenario('function=LC-1 frequency=0.1 drives-to=open', 'SF-1'),
      findings: [onAir('IA-A', 'voids-credit')],
    },
    {
      name: 'shared air, the loop valve fails in place (double-acting): it may stay where it drifts, voids',
      source: 'fail-last valves hold their position on loss of air: common practice, no source',
      lines: {
        'XV-1': xvOnAirA('open'),
        'CV-1': 'control-valve CV-1 fails-to=in-place mounted-on=L-1 signal-via=IO-3 air-from=IA-A',
      },
      scenario: scenario('function=LC-1 frequency=0.1 drives-to=open', 'SF-1'),
      findings: [onAir('IA-A', 'voids-credit')],
    },
    {
      name: 'shared circuit feeding the loop transmitter and an energise-to-trip SIF: the reading may go either way, voids',
      source:
        'a transmitter that loses power reads wrong in a direction the model does not state: conservative default of this tool',
      lines: {
        'SF-1': sif('energise'),
        'T-1':
          'transmitter T-1 make="Acme" model="A1" mounted-on=N-1 signal-via=IO-1 powered-by=CK-B supply=from-signal',
      },
      scenario: scenario('function=LC-1 frequency=0.1 drives-to=open', 'SF-1'),
      findings: [onAir('CK-B', 'voids-credit')],
    },
    {
      name: 'shared circuit of the loop controller and an energise-to-trip SIF: the dead controller closes the loop valve, a note',
      source: `${CCPS}; a controller that loses power de-energises its outputs: common practice, no source`,
      lines: { ...sisOnCircuitA, 'SF-1': sif('energise') },
      scenario: scenario('function=LC-1 frequency=0.1 drives-to=open', 'SF-1'),
      findings: [onAir('CK-A', 'note')],
    },
    {
      name: 'a high or low output cannot be judged from fail positions: voids',
      source: 'conservative default of this tool',
      lines: { 'XV-1': xvOnAirA('open') },
      scenario: scenario('function=LC-1 frequency=0.1 drives-to=high', 'SF-1'),
      findings: [onAir('IA-A', 'voids-credit')],
    },
    {
      name: 'an element cause: the valve that fails closed on loss of air while its failure is dangerous open, a note',
      source: `${CCPS} (the loss must contribute to the scenario)`,
      lines: { 'XV-1': xvOnAirA('open') },
      scenario: scenario('element=CV-1 frequency=0.1 drives-to=open', 'SF-1'),
      findings: [
        {
          ...onAir('IA-A', 'note'),
          key: 'shared-support:SC-1:CV-1+SF-1:IA-A',
          // The cause side, judged as data: losing IA-A drives CV-1 closed, away from its dangerous direction (open).
          data: {
            a: { role: 'cause', tag: 'CV-1' },
            b: { role: 'layer', tag: 'SF-1' },
            element: 'IA-A',
            kind: 'air-header',
            beneath: [],
            cause: {
              dangerous: false,
              why: { reason: 'moves-away', heads: ['CV-1'], positions: ['closed'], cause: 'CV-1', direction: 'open' },
            },
          },
          at: '27:9',
          parties: ['CV-1', 'SF-1'],
        },
      ],
    },
  ],
});
