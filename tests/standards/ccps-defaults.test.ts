// The defaults shipped for causes and layers, each row against the value docs/rule-basis.md section 3 quotes from the
// CCPS LOPA guidelines (2001), and their use: a value taken from the table is always marked as a default.
import { describe, expect, it } from 'vitest';
import { TYPICAL_CAUSES } from '@bulkhead/core';
import {
  OPERATOR_ERROR_PER_OPPORTUNITY,
  TYPICAL_CAUSE_FREQUENCIES,
  TYPICAL_LAYER_PFDS,
} from '../../packages/core/src/assess/index.ts';
import { assess } from '../core/assess/kit.ts';

describe('typical initiating-event frequencies', () => {
  // CCPS, Layer of Protection Analysis (2001), Table 5.1, "value chosen by a company" column, as quoted in
  // docs/rule-basis.md section 3 (ranges confirmed in a CCPS-derived table; row labels from memory).
  it.each([
    ['bpcs-loop-failure', 0.1],
    ['regulator-failure', 0.1],
    ['pump-seal-failure', 0.1],
    ['cooling-water-failure', 0.1],
    ['hose-failure', 0.1],
    ['relief-spurious-open', 0.01],
    ['external-fire', 0.01],
    ['third-party-impact', 0.01],
    ['lightning', 0.001],
    ['atmospheric-tank-failure', 0.001],
    ['piping-leak', 0.001],
    ['piping-breach', 1e-5],
    ['vessel-failure', 1e-6],
  ] as const)('%s: %d per year', (row, frequency) => {
    expect(TYPICAL_CAUSE_FREQUENCIES[row].frequency).toBe(frequency);
    expect(TYPICAL_CAUSE_FREQUENCIES[row].source).toMatch(/CCPS.*2001.*Table 5\.1/);
  });

  it('has a row for every typical cause the schema accepts, and no other', () => {
    expect(Object.keys(TYPICAL_CAUSE_FREQUENCIES).sort()).toEqual([...TYPICAL_CAUSES].sort());
  });

  it('gives operator failure of a routine procedure per opportunity, not per year', () => {
    // CCPS 2001 Table 5.1 as quoted in docs/rule-basis.md section 3: 0.01 per opportunity.
    expect(OPERATOR_ERROR_PER_OPPORTUNITY.probability).toBe(0.01);
  });

  it('marks a typical cause frequency as a default with its source', () => {
    const out = assess(`
scenario S-1 category=loc
  cause function=LIC-1 typical=bpcs-loop-failure
`);
    expect(out.assessment.cause.frequency).toEqual({
      value: 0.1,
      origin: 'default',
      basis: expect.stringContaining('Table 5.1'),
    });
  });
});

describe('per-100 m piping rows', () => {
  // CCPS, Layer of Protection Analysis (2001), Table 5.1 gives piping leak 1e-3 and full breach 1e-5 per year per
  // 100 m of pipe (as docs/rule-basis.md section 3 quotes it): the figure scales with the length of pipe the scenario covers.
  it.each([
    ['piping-leak', 250, 2.5e-3],
    ['piping-leak', 50, 5e-4],
    ['piping-breach', 300, 3e-5],
  ] as const)('%s over %d m: %d per year', (row, metres, frequency) => {
    const out = assess(`
scenario S-1 category=loc
  cause external="Leak from the transfer line" typical=${row} pipe-metres=${metres}
`);
    expect(out.assessment.cause.frequency.value).toBeCloseTo(frequency, 12);
    expect(out.assessment.cause.frequency.origin).toBe('default');
    expect(out.assessment.cause.frequency.basis).toContain(`x ${metres} m / 100 m`);
  });

  it('refuses a piping row without a length, and a length on any other row (the loader test pins the spans)', () => {
    expect(() =>
      assess(`
scenario S-1 category=loc
  cause external="Leak from the transfer line" typical=piping-leak
`),
    ).toThrow(/BH330/);
    expect(() =>
      assess(`
scenario S-1 category=loc
  cause external="Fire" typical=external-fire pipe-metres=100
`),
    ).toThrow(/BH331/);
  });
});

describe('typical IPL PFDs', () => {
  // CCPS, Layer of Protection Analysis (2001), Tables 6.3 to 6.5 (from memory, as docs/rule-basis.md section 3 lists them).
  it.each([
    ['relief-valve', 0.01],
    ['rupture-disc', 0.01],
    ['bpcs-layer', 0.1],
    ['human-response', 0.1],
  ] as const)('%s: PFD %d', (row, pfd) => {
    expect(TYPICAL_LAYER_PFDS[row].pfd).toBe(pfd);
    expect(TYPICAL_LAYER_PFDS[row].source).toMatch(/CCPS.*2001/);
  });

  it('offers no default credit for a single check valve', () => {
    // docs/rule-basis.md section 3 (from memory): a single check valve, little or no credit.
    expect(TYPICAL_LAYER_PFDS['check-valve'].pfd).toBeUndefined();
  });

  it('uses and marks the defaults when a layer gives no PFD', () => {
    const out = assess(`
device PSV-IPL device=PSV-1
device RD-IPL device=RD-1
alarm LAH-2 sensors=LT-2 raised-in=C2 operator=OP-1 finals=MS-1 minutes=15
trip LSHH-3 sensors=LT-3 solver=C3 finals=MS-1
sif SIF-4 sensors=LT-4 solver=SIS-1 finals=XV-1 sil=2
scenario S-1 category=loc
  cause function=LIC-1 frequency=0.1
  layer PSV-IPL
  layer RD-IPL
  layer LAH-2
  layer LSHH-3
  layer SIF-4
`);
    const claimed = Object.fromEntries(
      out.assessment.layers.map((l) => [l.function, [l.claimedPfd.value, l.claimedPfd.origin]]),
    );
    expect(claimed).toEqual({
      'PSV-IPL': [0.01, 'default'],
      'RD-IPL': [0.01, 'default'],
      'LAH-2': [0.1, 'default'],
      'LSHH-3': [0.1, 'default'],
      // IEC 61511-1:2016 Table 4: the conservative edge of SIL 2 is 0.01 (as quoted in docs/rule-basis.md section 1).
      'SIF-4': [0.01, 'sil-band'],
    });
  });

  it("lets the user's value and basis override the default", () => {
    const out = assess(`
device PSV-IPL device=PSV-1
scenario S-1 category=loc
  cause function=LIC-1 frequency=0.1
  layer PSV-IPL pfd=0.001 basis="Two relief valves, each sized for the full case (invented)"
`);
    expect(out.assessment.layers[0]!.claimedPfd).toEqual({
      value: 0.001,
      origin: 'model',
      basis: 'Two relief valves, each sized for the full case (invented)',
    });
  });
});
