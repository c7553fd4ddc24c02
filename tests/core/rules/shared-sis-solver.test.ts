// shared-sis-solver: two layers in one SIS logic solver. Not the BPCS case: IEC 61511 lets several SIFs
// share a safety solver, but the solver is then a common element of both, to be counted once when their
// combined PFD is verified (IEC 61511-1:2016 9.4 and 11.9, from memory for the clauses). Needs a justification.
import { describe, expect, it } from 'vitest';
import { analyseCase, ruleTable, scenario } from './harness.ts';

const SOURCE = 'IEC 61511-1:2016 9.4, 11.9 (from memory for the clauses); IEC 61508-6:2010 Annex D';
const secondSif = (solver: string) => ({
  'N-3': 'nozzle N-3 mounted-on=V-1',
  'IO-5': `io-card IO-5 signal-via=${solver} powered-by=CK-B`,
  'IO-6': `io-card IO-6 signal-via=${solver} powered-by=CK-B`,
  'T-3': 'transmitter T-3 make="Corr" model="C3" supply=from-signal mounted-on=N-3 signal-via=IO-5',
  'L-2': 'line L-2',
  'XV-2': 'shutdown-valve XV-2 fails-to=closed mounted-on=L-2 signal-via=IO-6 air-from=IA-B',
  'SF-2': `sif SF-2 sensors=T-3 solver=${solver} finals=XV-2 trip=close trip-mode=de-energise sil=1 pfd=0.1`,
});
const twoSifs = scenario('function=LC-1 frequency=0.1', 'SF-1', 'SF-2');
const finding = (a: string, b: string) => ({
  key: `shared-sis-solver:SC-1:${a}+${b}:S-1`,
  messageId: 'shared-sis-solver/both-layers' as const,
  severity: 'needs-justification' as const,
  element: 'S-1',
  parties: [a, b],
});

ruleTable('shared-sis-solver', {
  valid: [
    { name: 'one SIF in the SIS logic solver' },
    {
      name: 'two SIFs in two SIS logic solvers',
      lines: { 'S-2': 'logic-solver S-2 system=sis powered-by=CK-B', ...secondSif('S-2') },
      scenario: twoSifs,
    },
    {
      // A SIF in the failing BPCS controller is shared-logic-solver's case, not this one.
      name: 'a SIF in the BPCS controller of the failing loop',
      lines: { 'SF-1': 'sif SF-1 sensors=T-2 solver=C-1 finals=XV-1 trip=close trip-mode=de-energise sil=2 pfd=0.01' },
    },
  ],
  invalid: [
    {
      name: 'two SIFs in one SIS logic solver',
      source: SOURCE,
      lines: secondSif('S-1'),
      scenario: twoSifs,
      // Points at the second layer's claim (the scenario's last line); the solver's power supply is spoken for.
      findings: [
        {
          ...finding('SF-1', 'SF-2'),
          data: { layers: ['SF-1', 'SF-2'], element: 'S-1', beneath: ['UPS-B'] },
          at: '35:9',
        },
      ],
    },
    {
      name: 'an alarm raised in the SIS logic solver that also runs the SIF',
      source: SOURCE,
      lines: {
        'OP-1': 'operator OP-1',
        'P-1': 'pump P-1',
        'MS-1': 'motor-starter MS-1 fails-to=off mounted-on=P-1 signal-via=IO-4 powered-by=CK-B',
        'AL-1': 'alarm AL-1 sensors=T-2 raised-in=S-1 operator=OP-1 finals=MS-1 minutes=20',
      },
      scenario: scenario('function=LC-1 frequency=0.1', 'SF-1', 'AL-1'),
      findings: [finding('AL-1', 'SF-1')], // a pair of layers is named in tag order
    },
  ],
});

describe('two SIFs in one SIS logic solver', () => {
  const analysis = analyseCase({ name: 'two SIFs', lines: secondSif('S-1'), scenario: twoSifs });

  it('are not reported with the BPCS rule, its rationale or its clause', () => {
    expect(analysis.findings.filter((f) => f.rule === 'shared-logic-solver')).toEqual([]);
    const f = analysis.findings.find((x) => x.rule === 'shared-sis-solver')!;
    expect(f.message).toContain('verify the combined PFD with the solver counted once');
    expect(f.rationale).not.toContain('BPCS');
    expect(f.source).not.toContain('9.3');
  });

  it('credit one of the two until the finding is accepted, then both', () => {
    const [a] = analysis.assessments;
    expect(a!.layers.filter((l) => l.credited)).toHaveLength(1);
    expect(a!.layers.every((l) => l.creditedIfAccepted)).toBe(true);
    expect(a!.mitigatedIfAccepted).toBeCloseTo(0.1 * 0.01 * 0.1, 12);
  });
});
