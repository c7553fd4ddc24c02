// undeclared-supply: supports are part of the trace. An active element that declares no supply route, and
// does not say with supply= why it needs none, hides any supply it may share: the layer is unverified
// (CCPS, Layer of Protection Analysis (2001), ch. 6: an IPL must be auditable; what the model does not say is
// never independence: this tool's conservative rule), unless its loss drives the layer to the trip position.
import { describe, expect, it } from 'vitest';
import { analyseCase, ruleTable, scenario } from './harness.ts';

const CCPS = 'CCPS, Layer of Protection Analysis (2001), ch. 6 (auditable); conservative default of this tool';
const FAIL_SAFE = 'de-energise to trip, valve failing to the trip position: common practice, no source';
// The reproduction: the SIS solver, its output card and the trip solenoid declare no power at all.
const bareOutputs = (mode: string) => ({
  'S-1': 'logic-solver S-1 system=sis',
  'IO-4': 'io-card IO-4 signal-via=S-1',
  'XY-2': 'solenoid XY-2 fails-to=closed signal-via=IO-4',
  'XV-1': 'shutdown-valve XV-1 fails-to=closed mounted-on=L-1 signal-via=XY-2 air-from=IA-B',
  'SF-1': `sif SF-1 sensors=T-2 solver=S-1 finals=XV-1 trip=close trip-mode=${mode} sil=2 pfd=0.01`,
});
const onLayer = (element: string, severity: 'note' | 'voids-credit') => ({
  key: `undeclared-supply:SC-1:SF-1:${element}`,
  // A note only where the element's loss drives the layer to its trip position.
  messageId:
    severity === 'note'
      ? ('undeclared-supply/layer-fails-safe' as const)
      : ('undeclared-supply/layer-unverified' as const),
  severity,
  element,
  parties: ['SF-1'],
});
const relief = {
  'N-3': 'nozzle N-3 mounted-on=V-1',
  'PSV-1': 'relief-valve PSV-1 mounted-on=N-3',
  'D-1': 'device D-1 device=PSV-1',
};
const bareLoopTransmitter = { 'T-1': 'transmitter T-1 make="Acme" model="A1" mounted-on=N-1 signal-via=IO-1' };

ruleTable('undeclared-supply', {
  valid: [
    { name: 'every active element declares a supply link or supply=from-signal' },
    {
      name: 'a trip solenoid fed by its output card says supply=from-signal',
      lines: {
        'XY-2': 'solenoid XY-2 fails-to=closed signal-via=IO-4 supply=from-signal',
        'XV-1': 'shutdown-valve XV-1 fails-to=closed mounted-on=L-1 signal-via=XY-2 air-from=IA-B',
      },
    },
    {
      name: 'a self-contained transmitter and a mechanical positioner need no supply link',
      lines: {
        'T-2': 'transmitter T-2 make="Brill" model="B2" mounted-on=N-2 signal-via=IO-2 supply=self-contained',
        'ZP-2': 'positioner ZP-2 fails-to=closed signal-via=IO-4 supply=mechanical',
        'XV-1': 'shutdown-valve XV-1 fails-to=closed mounted-on=L-1 signal-via=ZP-2 air-from=IA-B',
      },
    },
    {
      name: 'the cause transmitter declares no supply, but the only layer is a relief valve no supply can stop',
      lines: { ...bareLoopTransmitter, ...relief },
      scenario: scenario('function=LC-1 frequency=0.1', 'D-1 pfd=0.01'),
    },
  ],
  invalid: [
    {
      name: 'energise-to-trip SIF whose solver, output card and solenoid declare no power: unverified',
      source: `${CCPS}; an energise-to-trip function needs its supply to act (IEC 61511-1:2016 11.2.11, from memory)`,
      lines: bareOutputs('energise'),
      findings: [onLayer('IO-4', 'voids-credit'), onLayer('S-1', 'voids-credit'), onLayer('XY-2', 'voids-credit')],
    },
    {
      name: 'the same SIF de-energise-to-trip with fail-closed valve and solenoid: their loss trips it, notes',
      source: `${CCPS}; ${FAIL_SAFE}`,
      lines: bareOutputs('de-energise'),
      findings: [onLayer('IO-4', 'note'), onLayer('S-1', 'note'), onLayer('XY-2', 'note')],
    },
    {
      name: 'a fail-last (double-acting) valve with no air declared: it needs air to act, unverified',
      source: `${CCPS}; a fail-in-place valve holds its position on loss of air: common practice, no source`,
      lines: { 'XV-1': 'shutdown-valve XV-1 fails-to=in-place mounted-on=L-1 signal-via=IO-4' },
      findings: [onLayer('XV-1', 'voids-credit')],
    },
    {
      name: 'a fail-closed valve with no air declared on a de-energise-to-trip SIF: its loss closes it, a note',
      source: FAIL_SAFE,
      lines: { 'XV-1': 'shutdown-valve XV-1 fails-to=closed mounted-on=L-1 signal-via=IO-4' },
      findings: [onLayer('XV-1', 'note')],
    },
    {
      name: 'a SIF transmitter with no supply on a de-energise-to-trip SIF: it reads wrong, nothing trips, unverified',
      source: 'a sensor fault action the model does not state is not assumed: conservative default of this tool',
      lines: { 'T-2': 'transmitter T-2 make="Brill" model="B2" mounted-on=N-2 signal-via=IO-2' },
      findings: [onLayer('T-2', 'voids-credit')],
    },
    {
      name: 'supply=from-signal with no signal link to draw on is no route',
      source: CCPS,
      lines: {
        'T-2': 'transmitter T-2 make="Brill" model="B2" mounted-on=N-2 supply=from-signal',
        'SF-1': 'sif SF-1 sensors=T-2 solver=S-1 finals=XV-1 trip=close trip-mode=de-energise sil=2 pfd=0.01',
      },
      findings: [onLayer('T-2', 'voids-credit')],
    },
    {
      name: 'the cause transmitter declares no supply: a supply shared with the SIF cannot be ruled out, needs a justification',
      source:
        'CCPS, Layer of Protection Analysis (2001), ch. 6 (a layer that relies on the utility whose loss is the cause is not independent); conservative default of this tool',
      lines: bareLoopTransmitter,
      findings: [
        {
          key: 'undeclared-supply:SC-1:LC-1+SF-1:T-1',
          messageId: 'undeclared-supply/cause-unverified',
          data: {
            element: 'T-1',
            kind: 'transmitter',
            cause: { role: 'cause', tag: 'LC-1', functionKind: 'loop' },
            layer: { role: 'layer', tag: 'SF-1' },
            stoppable: 'IO-2',
          },
          at: '27:9',
          severity: 'needs-justification',
          element: 'T-1',
          parties: ['LC-1', 'SF-1'],
        },
      ],
    },
  ],
});

describe('a layer with an undeclared supply', () => {
  it("is unverified and earns no credit, not independent (the issue's energise-to-trip reproduction)", () => {
    const analysis = analyseCase({ name: 'energise', lines: bareOutputs('energise') });
    expect(analysis.assessments[0]!.layers[0]).toMatchObject({
      function: 'SF-1',
      verdict: 'unverified',
      credited: false,
    });
  });

  it('keeps its credit when the gap cannot defeat it (de-energise to trip, fail-closed outputs)', () => {
    const analysis = analyseCase({ name: 'de-energise', lines: bareOutputs('de-energise') });
    expect(analysis.assessments[0]!.layers[0]).toMatchObject({
      function: 'SF-1',
      verdict: 'independent',
      credited: true,
    });
  });

  it('is unverified while a cause-side gap is open, and credited once it is accepted', () => {
    const open = analyseCase({ name: 'cause gap', lines: bareLoopTransmitter });
    expect(open.assessments[0]!.layers[0]).toMatchObject({
      verdict: 'unverified',
      credited: false,
      creditedIfAccepted: true,
    });
    const accepted = analyseCase({
      name: 'cause gap accepted',
      lines: bareLoopTransmitter,
      extra: [
        'accept undeclared-supply:SC-1:LC-1+SF-1:T-1 by="A. Reviewer" date=2026-01-05 reason="T-1 is a 2-wire transmitter fed by IO-1"',
      ],
    });
    expect(accepted.assessments[0]!.layers[0]).toMatchObject({ verdict: 'accepted', credited: true });
  });
});
