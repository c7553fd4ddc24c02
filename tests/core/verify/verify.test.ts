// SIF verification on whole models (issue 16): which traced elements each subsystem counts, an element the
// channels share in series with the voted group, the findings on inputs, and the target across scenarios.
// Figures are worked by hand from the IEC 61508-6:2010 Annex B equations (from memory; see
// tests/standards/annex-b.test.ts); the models are invented.
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { loadModelText, verifyModel, type Model, type SifVerification } from '@bulkhead/core';

function load(text: string, file = 'test.bulk'): Model {
  const result = loadModelText(file, text);
  if (!result.model)
    throw new Error(
      result.diagnostics.map((d) => `${d.span?.line}:${d.span?.column} ${d.code} ${d.message}`).join('\n'),
    );
  return result.model;
}

function demo(name: string): Model {
  return load(readFileSync(new URL(`../../../fixtures/demo/${name}`, import.meta.url), 'utf8'), name);
}

function only(model: Model, sif: string): SifVerification {
  return verifyModel(model, sif)[0]!;
}

const sub = (v: SifVerification, name: string) => v.subsystems.find((s) => s.subsystem === name)!;

describe('the demo, revision A: SIF-301 is a 1oo2 pair of TT-302A/B in one thermowell TW-302', () => {
  const v = only(demo('marrow-fen.bulk'), 'SIF-301');
  const sensors = sub(v, 'sensors');

  it('counts TW-302 once, in series with the pair, and names it as shared', () => {
    expect(sensors.architecture).toBe('1oo2');
    expect(sensors.shared.map((s) => s.tag)).toEqual(['TW-302']);
    expect(v.sharedInSeries).toEqual([{ subsystem: 'sensors', tags: ['TW-302'], withoutData: [] }]);
    // TW-302: lambdaDU 1e-7 x (8,760/2 + 8 h) = 4.388e-4.
    expect(sensors.shared[0]!.pfd).toBeCloseTo(4.388e-4, 10);
  });

  it('computes the pair by the 1oo2 equation: lambdaD 8e-7, DC 70%, T1 8,760 h, MTTR 24 h, beta 5%, betaD 2.5%', () => {
    // tCE = 0.3 x (4,380 + 24) + 0.7 x 24 = 1,338 h; tGE = 0.3 x (2,920 + 24) + 0.7 x 24 = 900 h.
    // 2 x (0.975 x 5.6e-7 + 0.95 x 2.4e-7)^2 x 1,338 x 900 = 1.4428e-6; + 0.025 x 5.6e-7 x 24 + 0.05 x 2.4e-7 x 4,404
    // = 1.4428e-6 + 3.36e-10 + 5.2848e-5 = 5.4627e-5.
    expect(sensors.groupPfd).toBeCloseTo(5.4627e-5, 8);
    expect(sensors.pfd).toBeCloseTo(5.4627e-5 + 4.388e-4, 8);
  });

  it('counts the I/O card both channels share in the logic solver, once, not as a sensor common cause', () => {
    const solver = sub(v, 'solver');
    expect(solver.inputs.map((i) => i.tag)).toEqual(['AI-S-02', 'DO-S-01', 'SIS-1']);
    expect(solver.notes.join('\n')).toContain('AI-S-02 serves TT-302A, TT-302B');
    expect(sensors.shared.map((s) => s.tag)).not.toContain('AI-S-02');
  });

  it('adds the subsystems into the total, with shares that sum to one', () => {
    expect(v.pfd).toBeCloseTo(
      v.subsystems.reduce((s, r) => s + r.pfd!, 0),
      15,
    );
    expect(v.shares!.reduce((s, x) => s + x, 0)).toBeCloseTo(1, 12);
  });

  it('meets the requirement of scenario S-103 with the thermowell in series', () => {
    expect(v.target.governingPfd?.scenarios).toEqual(['S-103']);
    expect(v.againstTarget?.meets).toBe(true);
  });
});

describe('the demo, revision B: each TT-302 element has its own thermowell', () => {
  it('shares nothing in the sensor group, and computes a lower sensor PFD than revision A', () => {
    const a = only(demo('marrow-fen.bulk'), 'SIF-301');
    const b = only(demo('marrow-fen-rev-b.bulk'), 'SIF-301');
    expect(b.sharedInSeries).toEqual([]);
    expect(sub(b, 'sensors').pfd!).toBeLessThan(sub(a, 'sensors').pfd!);
  });

  it('finds SIF-201 short of its high-demand requirement and its final elements short of HFT 1 for SIL 2', () => {
    const v = only(demo('marrow-fen-rev-b.bulk'), 'SIF-201');
    expect(v.againstTarget).toMatchObject({ mode: 'high-demand', meets: false });
    expect(v.findings.filter((f) => f.code === 'hft-short').map((f) => f.subject)).toEqual(['finals']);
  });
});

const BASE = `
site "Test works (invented)"
category people tolerable=1e-4 harm=people
vessel V-1
tapping TW-1 mounted-on=V-1
tapping TW-2 mounted-on=V-1
transmitter TT-1 supply=self-contained mounted-on=TW-1
transmitter TT-2 supply=self-contained mounted-on=TW-1
transmitter TT-3 supply=self-contained mounted-on=TW-2
logic-solver LS-1 system=sis supply=self-contained
line L-1
shutdown-valve XV-1 fails-to=closed mounted-on=L-1 signal-via=LS-1 supply=self-contained
failure-data FD-TT element=TT-1 lambda-du=1e-7 lambda-dd=0 proof-test-hours=8760 basis="vendor (invented)" test-basis="site (invented)"
failure-data FD-TT2 element=TT-2 lambda-du=1e-7 lambda-dd=0 proof-test-hours=8760 basis="vendor (invented)" test-basis="site (invented)"
failure-data FD-LS element=LS-1 lambda-du=1e-9 lambda-dd=0 proof-test-hours=8760 basis="vendor (invented)" test-basis="site (invented)"
failure-data FD-XV element=XV-1 lambda-du=1e-7 lambda-dd=0 proof-test-hours=8760 basis="vendor (invented)" test-basis="site (invented)"
`;

describe('a 1oo2D pair (IEC 61508-6:2010 B.3.2.2.4, from memory)', () => {
  it('is accepted as a vote and computed by the 1oo2D equation', () => {
    const text =
      BASE +
      'sif SIF-1 sensors=TT-1,TT-2 sensor-voting=1oo2D solver=LS-1 finals=XV-1\ncommon-cause SIF-1 group=sensors beta=0.05 basis="scoring (invented)"\n';
    const sensors = sub(only(load(text), 'SIF-1'), 'sensors');
    expect(sensors.equation?.architecture).toBe('1oo2D');
    expect(sensors.hft).toBe(1);
    // lambdaDU 1e-7, lambdaDD = lambdaSD = 0, T1 8,760 h, MTTR = MRT = 8 h, beta 5%: t'CE = 4,388 h, t'GE = 2,928 h;
    // 2 x 0.95e-7 x 0.95e-7 x 4,388 x 2,928 = 2.3191e-7; + 0.05 x 1e-7 x 4,388 = 2.194e-5; total 2.2172e-5.
    expect(sensors.groupPfd).toBeCloseTo(2.2172e-5, 8);
  });

  it('refuses a D suffix on any vote but 1oo2', () => {
    const result = loadModelText(
      't.bulk',
      BASE + 'sif SIF-1 sensors=TT-1,TT-2 sensor-voting=2oo2D solver=LS-1 finals=XV-1\n',
    );
    expect(result.diagnostics.map((d) => d.code)).toEqual(['BH306']);
  });
});

describe('findings on the inputs', () => {
  const pair = 'sif SIF-1 sensors=TT-1,TT-2 sensor-voting=1oo2 solver=LS-1 finals=XV-1 trip=close\n';

  it('takes beta 10% by default for a voted group with no common-cause line, and says so', () => {
    const v = only(load(BASE + pair), 'SIF-1');
    expect(sub(v, 'sensors').beta).toEqual({ beta: 0.1, betaD: 0.05, fromDefault: true });
    expect(v.findings.map((f) => f.code)).toContain('common-cause-default');
  });

  it('marks a shared element with no failure data as incomplete: the figure cannot be trusted', () => {
    const v = only(
      load(BASE + pair + 'common-cause SIF-1 group=sensors beta=0.05 basis="scoring (invented)"\n'),
      'SIF-1',
    );
    expect(v.sharedInSeries).toEqual([{ subsystem: 'sensors', tags: [], withoutData: ['TW-1'] }]);
    expect(v.findings.filter((f) => f.code === 'incomplete').map((f) => f.subject)).toEqual(['TW-1']);
  });

  it('reports a row with no basis, once per row', () => {
    const text = BASE.replace(
      'failure-data FD-XV element=XV-1 lambda-du=1e-7 lambda-dd=0 proof-test-hours=8760 basis="vendor (invented)"',
      'failure-data FD-XV element=XV-1 lambda-du=1e-7 lambda-dd=0 proof-test-hours=8760',
    );
    const v = only(load(text + 'sif SIF-1 sensors=TT-1 solver=LS-1 finals=XV-1\n'), 'SIF-1');
    expect(v.findings.filter((f) => f.code === 'no-basis').map((f) => f.subject)).toEqual(['FD-XV']);
  });

  it('does not compute a subsystem whose sensor has no failure data', () => {
    const v = only(load(BASE + 'sif SIF-1 sensors=TT-3 solver=LS-1 finals=XV-1\n'), 'SIF-1');
    expect(sub(v, 'sensors').pfd).toBeUndefined();
    expect(v.pfd).toBeUndefined();
    expect(v.findings.map((f) => [f.code, f.subject])).toContainEqual(['incomplete', 'TT-3']);
  });

  it('does not compute an element with a dangerous undetected rate and no proof-test interval', () => {
    const text = BASE.replace(
      'element=XV-1 lambda-du=1e-7 lambda-dd=0 proof-test-hours=8760',
      'element=XV-1 lambda-du=1e-7 lambda-dd=0',
    );
    const v = only(load(text + 'sif SIF-1 sensors=TT-1 solver=LS-1 finals=XV-1\n'), 'SIF-1');
    expect(sub(v, 'finals').missing).toEqual([
      { tag: 'XV-1', why: 'gives a dangerous undetected rate but no proof-test interval' },
    ]);
  });
});

describe('the SIF target across scenarios (CCPS LOPA 2001 practice, from memory)', () => {
  // The alarm has its own sensor, thermowell, controller and valve, so it keeps its credit beside the SIF.
  const sif =
    'sif SIF-1 sensors=TT-1 solver=LS-1 finals=XV-1 sil=2\noperator OP-1\ncontroller C-1 system=bpcs supply=self-contained\n' +
    'control-valve CV-2 fails-to=closed mounted-on=L-1 signal-via=C-1 supply=self-contained\nalarm TAH-1 sensors=TT-3 raised-in=C-1 operator=OP-1 finals=CV-2 minutes=30\n';
  const scenario = (id: string, frequency: number, outcome: string, layers: string[]) =>
    `scenario ${id} category=people${outcome ? ` outcome=${outcome}` : ''}\n  cause external="Upset ${id}" frequency=${frequency} basis="history (invented)"\n${layers.map((l) => `  layer ${l}\n`).join('')}`;

  it('takes the most demanding scenario when the scenarios lead to different consequences', () => {
    const m = load(
      BASE +
        sif +
        scenario('S-1', 0.1, '', ['SIF-1']) +
        scenario('S-2', 0.05, '', ['SIF-1', 'TAH-1 pfd=0.1 basis="30 min"']),
    );
    const t = only(m, 'SIF-1').target;
    // S-1: 1e-4 / 0.1 = 1e-3. S-2: 1e-4 / (0.05 x 0.1) = 2e-2.
    expect(t.candidates.map((c) => c.requiredPfd)).toEqual([expect.closeTo(1e-3, 15), expect.closeTo(2e-2, 15)]);
    expect(t.governingPfd?.scenarios).toEqual(['S-1']);
  });

  it('sums scenarios with the same outcome against one tolerable frequency', () => {
    const m = load(
      BASE +
        sif +
        scenario('S-1', 0.1, 'fire', ['SIF-1']) +
        scenario('S-2', 0.05, 'fire', ['SIF-1', 'TAH-1 pfd=0.1 basis="30 min"']),
    );
    const t = only(m, 'SIF-1').target;
    // 1e-4 / (0.1 + 0.05 x 0.1) = 1e-4 / 0.105 = 9.5238e-4: stricter than S-1 alone.
    expect(t.governingPfd).toMatchObject({ outcome: 'fire', scenarios: ['S-1', 'S-2'] });
    expect(t.governingPfd!.requiredPfd).toBeCloseTo(9.5238e-4, 8);
  });

  it("leaves to the SIF only what the outcome's other scenarios do not already use", () => {
    const m = load(
      BASE +
        sif +
        scenario('S-1', 0.1, 'fire', ['SIF-1']) +
        scenario('S-2', 0.5, 'fire', ['TAH-1 pfd=0.1 basis="30 min"']),
    );
    const t = only(m, 'SIF-1').target;
    // S-2 alone: 0.5 x 0.1 = 0.05 /yr, far above 1e-4: nothing is left for S-1, the requirement cannot be met.
    expect(t.governingPfd!.requiredPfd).toBeLessThan(0);
    expect(only(m, 'SIF-1').againstTarget?.meets).toBe(false);
  });
});

describe('common-cause factors for the logic solver', () => {
  it('are refused: the solver is one element, its redundancy is the hft= of its failure data (BH345)', () => {
    const result = loadModelText(
      't.bulk',
      BASE + 'sif SIF-1 sensors=TT-1 solver=LS-1 finals=XV-1\ncommon-cause SIF-1 group=solver beta=0.02 basis="x"\n',
    );
    expect(result.diagnostics.map((d) => [d.code, d.span?.line])).toEqual([['BH345', 18]]);
  });
});

describe('a SIF in low demand in one scenario and high demand in another (revision B, SIF-201)', () => {
  it('checks both: PFD against S-102 and PFH against S-104, and the high-demand shortfall decides', () => {
    const v = only(demo('marrow-fen-rev-b.bulk'), 'SIF-201');
    expect(v.againstTargets?.map((t) => [t.mode, t.scenarios, t.meets])).toEqual([
      ['low-demand', ['S-102'], true],
      ['high-demand', ['S-104'], false],
    ]);
    expect(v.againstTarget?.mode).toBe('high-demand');
  });
});
