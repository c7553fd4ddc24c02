// shared-final-element: a valve or starter that fails in the cause, or sticks, cannot also be what a layer
// relies on to act (IEC 61511-1:2016 11.2.10; ANSI/ISA-S84.01-1996 Annex B.1.3).
import { describe, expect, it } from 'vitest';
import { analyseCase, ruleTable, scenario, solenoidOnBpcsValve } from './harness.ts';

const SOURCE = 'IEC 61511-1:2016 11.2.10; ANSI/ISA-S84.01-1996 Annex B.1.3';
const reliefDevices = {
  'N-3': 'nozzle N-3 mounted-on=V-1',
  'N-4': 'nozzle N-4 mounted-on=V-1',
  'PSV-1': 'relief-valve PSV-1 mounted-on=N-3',
  'RD-1': 'rupture-disc RD-1 mounted-on=N-4',
  'D-1': 'device D-1 device=PSV-1',
  'D-2': 'device D-2 device=RD-1',
};
const twoDevices = scenario('external="Fire" frequency=0.01', 'D-1 pfd=0.01', 'D-2 pfd=0.01');

ruleTable('shared-final-element', {
  valid: [
    { name: 'separate valves' },
    {
      name: 'separate motor starters',
      lines: {
        'P-1': 'pump P-1',
        'MS-1': 'motor-starter MS-1 fails-to=off mounted-on=P-1 signal-via=IO-3',
        'MS-2': 'motor-starter MS-2 fails-to=off mounted-on=P-1 signal-via=IO-4',
        'LC-1': 'loop LC-1 sensors=T-1 solver=C-1 finals=MS-1',
        'SF-1': 'sif SF-1 sensors=T-2 solver=S-1 finals=MS-2 trip=stop trip-mode=de-energise sil=2 pfd=0.01',
      },
    },
    { name: 'a relief valve and a rupture disc on their own nozzles', lines: reliefDevices, scenario: twoDevices },
  ],
  invalid: [
    {
      name: 'a SIS solenoid on the BPCS control valve: the valve is shared',
      source: SOURCE,
      lines: solenoidOnBpcsValve,
      findings: [
        {
          key: 'shared-final-element:SC-1:LC-1+SF-1:CV-1',
          messageId: 'shared-final-element/shared',
          data: {
            a: { role: 'cause', tag: 'LC-1', functionKind: 'loop' },
            b: { role: 'layer', tag: 'SF-1' },
            element: 'CV-1',
            kind: 'control-valve',
            severity: 'voids-credit',
            beneath: ['IA-A'],
          },
          at: '29:9',
          severity: 'voids-credit',
          element: 'CV-1',
          parties: ['LC-1', 'SF-1'],
        },
      ],
    },
    {
      name: 'the SIF closes the control valve of the failing loop',
      source: SOURCE,
      lines: { 'SF-1': 'sif SF-1 sensors=T-2 solver=S-1 finals=CV-1 trip=close trip-mode=de-energise sil=2 pfd=0.01' },
      findings: [
        {
          key: 'shared-final-element:SC-1:LC-1+SF-1:CV-1',
          messageId: 'shared-final-element/shared',
          severity: 'voids-credit',
          element: 'CV-1',
          parties: ['LC-1', 'SF-1'],
        },
      ],
    },
    {
      name: 'two device layers claimed on one relief valve',
      source: 'CCPS, Layer of Protection Analysis (2001), ch. 6',
      lines: { ...reliefDevices, 'D-2': 'device D-2 device=PSV-1' },
      scenario: twoDevices,
      findings: [
        {
          key: 'shared-final-element:SC-1:D-1+D-2:PSV-1',
          messageId: 'shared-final-element/shared',
          severity: 'voids-credit',
          element: 'PSV-1',
          parties: ['D-1', 'D-2'],
        },
      ],
    },
  ],
});

describe('a function relies on an element for the role it uses', () => {
  it('a SIF acting through its own solenoid on a BPCS valve relies on the valve, not on the positioner, its card or controller', () => {
    const analysis = analyseCase({ name: 'solenoid on BPCS valve', lines: solenoidOnBpcsValve });
    // Common practice, no source: the SIS solenoid vents the actuator whatever the positioner does.
    expect(analysis.findings.map((f) => [f.key, f.severity])).toEqual([
      ['shared-final-element:SC-1:LC-1+SF-1:CV-1', 'voids-credit'],
    ]);
    const sif = analysis.traces.find((t) => t.function === 'SF-1')!;
    const relied = sif.elements.map((e) => e.tag);
    expect(relied).toEqual(expect.arrayContaining(['CV-1', 'XY-1', 'IO-4', 'S-1', 'IA-A']));
    expect(relied.filter((t) => ['ZP-1', 'IO-3', 'C-1'].includes(t))).toEqual([]);
    // The loop, in turn, moves the valve through its positioner, not through the SIS solenoid.
    const loop = analysis.traces.find((t) => t.function === 'LC-1')!.elements.map((e) => e.tag);
    expect(loop.filter((t) => ['XY-1', 'IO-4', 'S-1'].includes(t))).toEqual([]);
    expect(loop).toContain('ZP-1');
  });
});
