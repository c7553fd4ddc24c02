// The limits IEC 61511-1 puts on the BPCS, as cause and as protection layer, checked on small models:
// the cap at RRF 10, at most two BPCS layers, one credit per controller, and the bound on a BPCS cause.
import { describe, expect, it } from 'vitest';
import {
  BPCS_CAUSE_LOWEST_FREQUENCY,
  BPCS_LAYER_BEST_PFD,
  BPCS_LAYERS_PER_SCENARIO,
  HOURS_PER_YEAR,
} from '../../packages/core/src/assess/index.ts';
import { assess } from '../core/assess/kit.ts';

const ALARM = (tag: string, controller: string, pfd: number, sensor = 'LT-2') =>
  `alarm ${tag} sensors=${sensor} raised-in=${controller} operator=OP-1 minutes=20 pfd=${pfd}`;

describe('a BPCS protection layer', () => {
  // IEC 61511-1:2016 9.3 (2003: 9.4) [clause from memory, substance confirmed], as quoted in docs/rule-basis.md section 2:
  // a BPCS protection layer may claim at most RRF 10, PFD not below 0.1.
  it('may claim no better than PFD 0.1 (RRF 10)', () => {
    expect(BPCS_LAYER_BEST_PFD).toBe(0.1);
    const out = assess(`trip LSHH-2 sensors=LT-2 solver=C2 finals=MS-1 pfd=0.001
scenario S-1 category=loc
  cause external="Tanker overfill" frequency=1 basis="site history (invented)"
  layer LSHH-2
`);
    expect(out.assessment.layers[0]).toMatchObject({ claimedPfd: { value: 0.001 }, allowedPfd: 0.1, credited: true });
    expect(out.assessment.mitigatedClaimed).toBeCloseTo(1e-3, 15);
    expect(out.assessment.mitigatedAfter).toBeCloseTo(0.1, 15);
    expect(out.findings.map((f) => f.key)).toEqual(['bpcs-layer-cap:S-1:LSHH-2']);
  });

  it('is not capped by the BPCS limit when it runs in the SIS', () => {
    const out = assess(`trip LSHH-2 sensors=LT-2 solver=SIS-1 finals=MS-1 pfd=0.01
scenario S-1 category=loc
  cause external="Tanker overfill" frequency=1 basis="site history (invented)"
  layer LSHH-2
`);
    expect(out.assessment.layers[0]!.allowedPfd).toBe(0.01);
  });
});

describe('an operator response, wherever the alarm is raised (issue 9, item 5)', () => {
  // CCPS, Layer of Protection Analysis (2001), Table 6.5; CCPS, Guidelines for Initiating Events and Independent
  // Protection Layers (2015): a human response is credited at PFD 0.1 at best without a human-reliability analysis.
  it('holds an alarm raised in the SIS at PFD 0.01 to 0.1', () => {
    const out = assess(`${ALARM('LAH-2', 'SIS-1', 0.01)}
scenario S-1 category=loc
  cause external="Tanker overfill" frequency=1 basis="site history (invented)"
  layer LAH-2
`);
    expect(out.assessment.layers[0]!.allowedPfd).toBe(0.1);
    expect(out.assessment.mitigatedAfter).toBeCloseTo(0.1, 15);
    expect(out.findings.map((f) => f.key)).toEqual(['human-response-floor:S-1:LAH-2']);
  });

  it('credits the claimed figure when a human-reliability analysis is given (hra-basis=)', () => {
    const out = assess(`${ALARM('LAH-2', 'SIS-1', 0.01)} hra-basis="HRA study MF-HRA-4 (invented)"
scenario S-1 category=loc
  cause external="Tanker overfill" frequency=1 basis="site history (invented)"
  layer LAH-2
`);
    expect(out.assessment.layers[0]!.allowedPfd).toBe(0.01);
    expect(out.findings).toEqual([]);
  });
});

describe('BPCS layers in one scenario', () => {
  // IEC 61511-1:2016 9.3, as quoted in docs/rule-basis.md section 2: total BPCS reliance at most two orders of magnitude.
  it('credits at most two BPCS layers: two orders of magnitude', () => {
    expect(BPCS_LAYERS_PER_SCENARIO).toBe(2);
    const out = assess(`${ALARM('LAH-2', 'C1', 0.1, 'LT-2')}
${ALARM('LAH-3', 'C2', 0.1, 'LT-3')}
${ALARM('LAH-4', 'C3', 0.1, 'LT-4')}
scenario S-1 category=loc
  cause external="Tanker overfill" frequency=1 basis="site history (invented)"
  layer LAH-2
  layer LAH-3
  layer LAH-4
`);
    expect(out.assessment.layers.filter((l) => l.credited)).toHaveLength(2);
    expect(out.assessment.mitigatedAfter).toBeCloseTo(1e-2, 15);
    expect(out.assessment.mitigatedClaimed).toBeCloseTo(1e-3, 15);
  });

  // IEC 61511-1:2016 9.3, as quoted in docs/rule-basis.md section 2: two BPCS layers in the same controller earn at most one
  // credit of 10. Older CCPS practice (CCPS, Layer of Protection Analysis, 2001) allowed both under conditions.
  const SAME_CONTROLLER = (policy: string) => `${policy}
${ALARM('LAH-2', 'C2', 0.1, 'LT-2')}
trip LSHH-3 sensors=LT-3 solver=C2 finals=MS-1 pfd=0.1
scenario S-1 category=loc
  cause external="Tanker overfill" frequency=1 basis="site history (invented)"
  layer LAH-2
  layer LSHH-3
`;

  it('credits one of two BPCS layers in the same controller (IEC 61511 reading, the default)', () => {
    expect(assess(SAME_CONTROLLER('')).assessment.mitigatedAfter).toBeCloseTo(0.1, 15);
    expect(assess(SAME_CONTROLLER('policy same-controller-layers=one-credit')).assessment.mitigatedAfter).toBeCloseTo(
      0.1,
      15,
    );
  });

  it('credits both under the older CCPS practice (policy both)', () => {
    expect(assess(SAME_CONTROLLER('policy same-controller-layers=both')).assessment.mitigatedAfter).toBeCloseTo(
      0.01,
      15,
    );
  });

  it('credits no BPCS layer when a BPCS failure is the cause under the strict owner policy (policy none)', () => {
    // Common practice, no source (docs/rule-basis.md section 2: "stricter owners allow no BPCS layer when a BPCS failure is the cause").
    const out = assess(`policy same-controller-layers=none
${ALARM('LAH-2', 'C2', 0.1)}
scenario S-1 category=loc
  cause function=LIC-1 frequency=0.1
  layer LAH-2
`);
    expect(out.assessment.layers[0]).toMatchObject({ verdict: 'voided', credited: false });
    expect(out.assessment.mitigatedAfter).toBe(0.1);
  });
});

describe('a BPCS loop failure as the cause', () => {
  // IEC 61511-1:2003 8.2.2 (kept in 2016), as quoted in docs/rule-basis.md section 2: a BPCS not designed to IEC 61511 may
  // not be assumed to fail dangerously less often than 1e-5 per hour, about 0.0876 per year, conventionally 0.1.
  it('is bounded at 1e-5 per hour, about 0.0876 per year, conventionally 0.1 per year', () => {
    expect(1e-5 * HOURS_PER_YEAR).toBeCloseTo(0.0876, 4);
    expect(BPCS_CAUSE_LOWEST_FREQUENCY).toBe(0.1);
  });

  it('needs a justification below 0.1 per year, and 0.1 is used until it is accepted', () => {
    const out = assess(`scenario S-1 category=loc
  cause function=LIC-1 frequency=0.02 basis="plant records (invented)"
`);
    expect(out.findings).toHaveLength(1);
    expect(out.findings[0]).toMatchObject({
      key: 'bpcs-cause-frequency-low:S-1:LIC-1',
      severity: 'needs-justification',
      source: expect.stringContaining('8.2.2'),
    });
    expect(out.assessment.mitigatedAfter).toBe(0.1);
    expect(out.assessment.mitigatedIfAccepted).toBe(0.02);
  });
});
