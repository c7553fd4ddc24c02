// shared-logic-solver: a controller that fails in the cause cannot act against it, and two BPCS layers in
// one controller earn at most one credit (IEC 61511-1:2016 9.3); the older CCPS (2001) allowance is the
// policy switch shared-solver=allow.
import { describe, expect, it } from 'vitest';
import { analyseCase, ruleTable, scenario, solenoidOnBpcsValve } from './harness.ts';

const IEC = 'IEC 61511-1:2016 9.3';
const CCPS_ALLOWANCE = 'CCPS, Layer of Protection Analysis (2001), ch. 6 (older allowance)';
const sifInBpcs = {
  'SF-1': 'sif SF-1 sensors=T-2 solver=C-1 finals=XV-1 trip=close trip-mode=de-energise sil=2 pfd=0.01',
};

// IEC 61511-1:2016 9.3: two BPCS layers in one controller earn at most one credit. The trace rule's note
// defers to the assessment's bpcs-same-controller, which must then apply.
const twoBpcsTrips = {
  'N-3': 'nozzle N-3 mounted-on=V-1',
  'T-3': 'transmitter T-3 mounted-on=N-3 signal-via=IO-5 supply=from-signal',
  'C-2': 'controller C-2 system=bpcs powered-by=CK-B',
  'IO-5': 'io-card IO-5 signal-via=C-2 supply=from-signal',
  'IO-6': 'io-card IO-6 signal-via=C-2 supply=from-signal',
  'N-4': 'nozzle N-4 mounted-on=V-1',
  'T-4': 'transmitter T-4 mounted-on=N-4 signal-via=IO-6 supply=from-signal',
  'P-1': 'pump P-1',
  'MS-1': 'motor-starter MS-1 fails-to=off mounted-on=P-1 signal-via=IO-5 supply=self-contained',
  'MS-2': 'motor-starter MS-2 fails-to=off mounted-on=P-1 signal-via=IO-6 supply=self-contained',
  'TR-1': 'trip TR-1 sensors=T-3 solver=C-2 finals=MS-1 trip=stop pfd=0.1',
  'TR-2': 'trip TR-2 sensors=T-4 solver=C-2 finals=MS-2 trip=stop pfd=0.1',
};
const twoTrips = scenario('function=LC-1 frequency=0.1', 'TR-1', 'TR-2');

ruleTable('shared-logic-solver', {
  valid: [
    { name: 'SIF in the SIS logic solver' },
    {
      name: 'SIF in a second SIS logic solver',
      lines: {
        'S-2': 'logic-solver S-2 system=sis powered-by=CK-B',
        'SF-1': 'sif SF-1 sensors=T-2 solver=S-2 finals=XV-1 trip=close trip-mode=de-energise sil=2 pfd=0.01',
      },
    },
    // A function relies on an element for the role it uses: the SIF's own solenoid, not the BPCS positioner.
    {
      name: 'a SIF acting through its own solenoid on the BPCS valve does not rely on the BPCS controller',
      lines: solenoidOnBpcsValve,
    },
    {
      name: 'two BPCS trips in two controllers',
      lines: {
        ...twoBpcsTrips,
        'C-3': 'controller C-3 system=bpcs powered-by=CK-B',
        'IO-6': 'io-card IO-6 signal-via=C-3 supply=from-signal',
        'TR-2': 'trip TR-2 sensors=T-4 solver=C-3 finals=MS-2 trip=stop pfd=0.1',
      },
      scenario: twoTrips,
    },
  ],
  invalid: [
    {
      name: 'SIF in the BPCS controller that fails (its power listed under it)',
      source: IEC,
      lines: sifInBpcs,
      findings: [
        {
          key: 'shared-logic-solver:SC-1:LC-1+SF-1:C-1',
          messageId: 'shared-logic-solver/shared',
          data: {
            a: { role: 'cause', tag: 'LC-1', functionKind: 'loop' },
            b: { role: 'layer', tag: 'SF-1' },
            element: 'C-1',
            kind: 'controller',
            severity: 'voids-credit',
            beneath: ['UPS-A'],
            bpcsLayers: 'no',
          },
          at: '27:9',
          severity: 'voids-credit',
          element: 'C-1',
          parties: ['LC-1', 'SF-1'],
        },
      ],
    },
    {
      name: 'policy shared-solver=allow makes it a note',
      source: CCPS_ALLOWANCE,
      lines: { ...sifInBpcs, policy: 'policy shared-solver=allow' },
      findings: [
        {
          key: 'shared-logic-solver:SC-1:LC-1+SF-1:C-1',
          messageId: 'shared-logic-solver/shared',
          severity: 'note',
          element: 'C-1',
          parties: ['LC-1', 'SF-1'],
        },
      ],
    },
    {
      name: 'shared-solver=allow does not cover a cause that is the controller failing',
      source: IEC,
      lines: { ...sifInBpcs, policy: 'policy shared-solver=allow' },
      scenario: scenario('element=C-1 frequency=0.1', 'SF-1'),
      findings: [
        {
          key: 'shared-logic-solver:SC-1:C-1+SF-1:C-1',
          messageId: 'shared-logic-solver/shared',
          severity: 'voids-credit',
          element: 'C-1',
          parties: ['C-1', 'SF-1'],
        },
      ],
    },
    {
      name: 'two BPCS layers in one controller: a note that defers to bpcs-same-controller',
      source: IEC,
      lines: twoBpcsTrips,
      scenario: twoTrips,
      findings: [
        {
          key: 'shared-logic-solver:SC-1:TR-1+TR-2:C-2',
          messageId: 'shared-logic-solver/shared',
          severity: 'note',
          element: 'C-2',
          parties: ['TR-1', 'TR-2'],
        },
      ],
    },
  ],
});

describe('two BPCS layers in one controller', () => {
  it('are a note of this rule, and the assessment credits only one of them (IEC 61511-1:2016 9.3)', () => {
    const analysis = analyseCase({ name: 'two trips', lines: twoBpcsTrips, scenario: twoTrips });
    expect(analysis.findings.map((f) => [f.key, f.severity])).toEqual([
      ['bpcs-same-controller:SC-1:TR-1:TR-2', 'voids-credit'],
      ['shared-logic-solver:SC-1:TR-1+TR-2:C-2', 'note'],
    ]);
    const [assessment] = analysis.assessments;
    expect(assessment!.layers.filter((l) => l.credited).map((l) => l.function)).toHaveLength(1);
    expect(assessment!.mitigatedAfter).toBeCloseTo(0.1 * 0.1, 12);
  });
});

// The controller with its power and cabinet is one unit: a policy that allows sharing it is not undone by
// the controller's own supply (CCPS, Layer of Protection Analysis (2001), ch. 6, the older allowance).
describe('the controller and what it alone relies on', () => {
  // The loop's own cards take their power through the controller here, so CK-A is reached only through C-1.
  const inOneCabinet = {
    'CAB-1': 'cabinet CAB-1',
    'C-1': 'controller C-1 system=bpcs powered-by=CK-A housed-in=CAB-1',
    'IO-1': 'io-card IO-1 signal-via=C-1 supply=from-signal',
    'IO-3': 'io-card IO-3 signal-via=C-1 supply=from-signal',
  };
  const tripInC1 = {
    ...inOneCabinet,
    'T-2': 'transmitter T-2 make="Brill" model="B2" mounted-on=N-2 signal-via=IO-5 supply=from-signal',
    'IO-5': 'io-card IO-5 signal-via=C-1 supply=from-signal',
    'P-1': 'pump P-1',
    'MS-1': 'motor-starter MS-1 fails-to=off mounted-on=P-1 signal-via=IO-6 supply=self-contained',
    'IO-6': 'io-card IO-6 signal-via=C-1 supply=from-signal',
    'TR-1': 'trip TR-1 sensors=T-2 solver=C-1 finals=MS-1 trip=stop pfd=0.1',
  };
  const tripScenario = scenario('function=LC-1 frequency=0.1', 'TR-1');
  const run = (lines: Record<string, string>, block: readonly string[]) =>
    analyseCase({ name: 'unit', lines, scenario: block });

  it('under shared-solver=allow a trip in the failing loop controller keeps its credit, with its power and cabinet listed under the note', () => {
    const analysis = run({ ...tripInC1, policy: 'policy shared-solver=allow' }, tripScenario);
    expect(analysis.findings.map((f) => [f.key, f.severity])).toEqual([
      ['shared-logic-solver:SC-1:LC-1+TR-1:C-1', 'note'],
    ]);
    expect(analysis.findings[0]!.message).toContain('(and through it `CAB-1`, `CK-A`, `UPS-A`)');
    expect(analysis.assessments[0]!.layers[0]).toMatchObject({ function: 'TR-1', credited: true });
  });

  it('by default the same trip is voided by the controller alone', () => {
    const analysis = run(tripInC1, tripScenario);
    expect(analysis.findings.map((f) => [f.key, f.severity])).toEqual([
      ['shared-logic-solver:SC-1:LC-1+TR-1:C-1', 'voids-credit'],
    ]);
    expect(analysis.assessments[0]!.layers[0]).toMatchObject({ function: 'TR-1', credited: false });
  });

  it('shared-solver=allow does not cover a cause that is the failure of the controller itself', () => {
    const analysis = run(
      { ...tripInC1, policy: 'policy shared-solver=allow' },
      scenario('element=C-1 frequency=0.1', 'TR-1'),
    );
    expect(analysis.findings.map((f) => [f.key, f.severity])).toEqual([
      ['shared-logic-solver:SC-1:C-1+TR-1:C-1', 'voids-credit'],
    ]);
  });

  it('under same-controller-layers=both two BPCS trips in one powered controller are both credited', () => {
    const lines = {
      ...twoBpcsTrips,
      'C-2': 'controller C-2 system=bpcs powered-by=CK-B housed-in=CAB-2',
      'CAB-2': 'cabinet CAB-2',
      policy: 'policy same-controller-layers=both',
    };
    const analysis = run(lines, twoTrips);
    expect(analysis.findings.map((f) => [f.key, f.severity])).toEqual([
      ['shared-logic-solver:SC-1:TR-1+TR-2:C-2', 'note'],
    ]);
    expect(analysis.findings[0]!.message).toContain('both may be credited under policy same-controller-layers=both');
    expect(analysis.assessments[0]!.layers.map((l) => l.credited)).toEqual([true, true]);
  });

  it('a supply one side also reaches by a route around the controller is still its own finding', () => {
    // TR-1's output card is fed from CK-A directly, not only through C-1.
    const lines = {
      ...tripInC1,
      'IO-6': 'io-card IO-6 signal-via=C-1 powered-by=CK-A',
      policy: 'policy shared-solver=allow',
    };
    const analysis = run(lines, tripScenario);
    expect(analysis.findings.map((f) => [f.key, f.severity, f.paths])).toEqual([
      [
        'shared-support:SC-1:LC-1+TR-1:CK-A',
        'voids-credit',
        [
          ['LC-1', 'C-1', 'CK-A'],
          ['TR-1', 'MS-1', 'IO-6', 'CK-A'],
        ],
      ],
      [
        'shared-logic-solver:SC-1:LC-1+TR-1:C-1',
        'note',
        [
          ['LC-1', 'C-1'],
          ['TR-1', 'C-1'],
        ],
      ],
    ]);
  });
});
