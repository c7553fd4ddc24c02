// Issue 16, item 3: a voted-group common cause becomes a number. With complete failure data the shared element is
// in series with the group in the computed PFDavg, so the finding no longer withholds credit: the layer is credited
// at the larger of its claimed and computed PFD. Figures are worked by hand from the IEC 61508-6:2010 Annex B
// equations (from memory; checked against its tables in tests/standards/annex-b.test.ts), SIF-1's in
// credit-model.ts; the models are invented.
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import {
  analyze,
  loadModelText,
  renderVerificationText,
  verifyModel,
  type Analysis,
  type Finding,
  type Model,
} from '@bulkhead/core';
import { BETA, COMPUTED, PLANT, ROWS, row, scenario } from './credit-model.ts';

function load(text: string, file = 'test.bulk'): Model {
  const result = loadModelText(file, text);
  if (!result.model)
    throw new Error(
      result.diagnostics.map((d) => `${d.span?.line}:${d.span?.column} ${d.code} ${d.message}`).join('\n'),
    );
  return result.model;
}

const KEY = (scenario: string, sif: string, element: string) =>
  `voted-group-common-cause:${scenario}:${sif}:${element}`;
const findingOf = (a: Analysis, key: string): Finding => a.findings.find((f) => f.key === key)!;
const layerOf = (a: Analysis, scenario: string, tag: string) =>
  a.assessments.find((s) => s.scenario === scenario)!.layers.find((l) => l.function === tag)!;

describe('the rule table: a voted-group common cause on a SIF with failure data', () => {
  const complete = PLANT + BETA + ROWS + row('TW-1', 1e-7);

  it('complete data, computed within the claim: a note, credited at the claim', () => {
    const a = analyze(load(complete + scenario(0.01)));
    const f = findingOf(a, KEY('S-1', 'SIF-1', 'TW-1'));
    expect(f.severity).toBe('note');
    expect(f.messageId).toBe('voted-group-common-cause/counted-within-claim');
    if (f.messageId === 'voted-group-common-cause/counted-within-claim')
      expect(f.data.computed).toBeCloseTo(COMPUTED, 8);
    expect(f.message).toContain(
      'counted in the calculation: PFDavg 9.0e-4 with the shared element in series (bulkhead verify)',
    );
    expect(layerOf(a, 'S-1', 'SIF-1')).toMatchObject({ credited: true, allowedPfd: 0.01 });
    expect(layerOf(a, 'S-1', 'SIF-1').reasons!.find((r) => r.rule === 'voted-group-common-cause')).toEqual({
      key: f.key,
      rule: f.rule,
      severity: 'note',
      effect: 'note',
      element: 'TW-1',
    });
    // 0.1 /yr x 0.01 = 1e-3 /yr.
    expect(a.assessments[0]!.mitigatedAfter).toBeCloseTo(1e-3, 12);
  });

  it('complete data, computed above the claim: credited at the computed figure, and the finding says by how much', () => {
    const a = analyze(load(complete + scenario(5e-4)));
    const f = findingOf(a, KEY('S-1', 'SIF-1', 'TW-1'));
    expect(f.severity).toBe('needs-justification');
    expect(f.messageId).toBe('voted-group-common-cause/counted-claim-missed');
    // 9.0416e-4 / 5e-4 = 1.81.
    expect(f.message).toContain('above the claimed PFD 5.0e-4 by a factor of 1.8: credited at the computed figure');
    const layer = layerOf(a, 'S-1', 'SIF-1');
    expect(layer.credited).toBe(true);
    expect(layer.allowedPfd).toBeCloseTo(COMPUTED, 8);
    expect(layer.allowedPfdIfAccepted).toBe(5e-4);
    expect(layer.reasons!.find((r) => r.rule === 'voted-group-common-cause')).toMatchObject({
      effect: 'caps',
      cap: layer.allowedPfd,
    });
    expect(a.assessments[0]!.mitigatedAfter).toBeCloseTo(0.1 * COMPUTED, 10);
  });

  const withheld: [string, string][] = [
    ['the shared thermowell has no failure data', PLANT + BETA + ROWS],
    [
      'the shared thermowell takes MTTR 8 h by default',
      PLANT + BETA + ROWS + row('TW-1', 1e-7, 'proof-test-coverage=1'),
    ],
    [
      'the shared thermowell takes a full proof-test coverage by default',
      PLANT + BETA + ROWS + row('TW-1', 1e-7, 'mttr-hours=8'),
    ],
    ['the group has no common-cause factors (beta by default)', PLANT + ROWS + row('TW-1', 1e-7)],
    [
      'the common-cause factors give no basis',
      PLANT + BETA.replace(' basis="scoring (invented)"', '') + ROWS + row('TW-1', 1e-7),
    ],
  ];
  it.each(withheld)('incomplete data (%s): the finding stands and the credit is withheld, as before', (_why, text) => {
    const a = analyze(load(text + scenario(0.01)));
    const f = findingOf(a, KEY('S-1', 'SIF-1', 'TW-1'));
    expect(f.messageId).toBe('voted-group-common-cause/shared-in-group');
    expect(f.severity).toBe('needs-justification');
    expect(layerOf(a, 'S-1', 'SIF-1')).toMatchObject({ credited: false, verdict: 'open' });
    expect(verifyModel(load(text + scenario(0.01)))[0]!.complete).toBe(false);
  });

  it('says in verify which of the two check does', () => {
    const [v] = verifyModel(load(complete + scenario(0.01)));
    expect(v!.complete).toBe(true);
    expect(renderVerificationText(v!)).toContain(
      '`check` credits the layer at the larger of its claimed and computed PFD',
    );
    const [short] = verifyModel(load(PLANT + ROWS + row('TW-1', 1e-7) + scenario(0.01)));
    expect(renderVerificationText(short!)).toContain('`check` withholds the credit until a justification accepts it');
  });
});

describe('the demo, S-103: SIF-301 is a 1oo2 pair of TT-302A/B in one thermowell TW-302', () => {
  const model = load(
    readFileSync(new URL('../../../fixtures/demo/marrow-fen.bulk', import.meta.url), 'utf8'),
    'marrow-fen.bulk',
  );
  const a = analyze(model);
  const f = findingOf(a, KEY('S-103', 'SIF-301', 'TW-302'));

  it('counts TW-302 in the calculation: PFDavg 3.9e-3 within the claimed 0.05, a note', () => {
    // Sensors (tests/core/verify/verify.test.ts): pair 5.4627e-5 + TW-302 4.388e-4 = 4.9343e-4.
    // Logic solver, 1oo1 each: SIS-1 5e-9 x (43,800 + 8) + 1e-6 x 8 = 2.2704e-4; AI-S-02 2e-9 x 43,808 + 2e-7 x 8
    // = 8.9216e-5; DO-S-01 3e-9 x 43,808 + 2e-7 x 8 = 1.33024e-4; sum 4.4928e-4.
    // Final elements: XV-301, T1 used 0.95 x 8,760 + 0.05 x 175,200 = 17,082 h: 3e-7 x (8,541 + 8) = 2.5647e-3;
    // XY-301 1e-7 x 4,388 = 4.388e-4; sum 3.0035e-3. Total 4.9343e-4 + 4.4928e-4 + 3.0035e-3 = 3.9462e-3.
    expect(f.severity).toBe('note');
    if (f.messageId !== 'voted-group-common-cause/counted-within-claim')
      throw new Error(`unexpected message ${f.messageId}`);
    expect(f.data.computed).toBeCloseTo(3.9462e-3, 7);
    expect(f.data.claimed).toBe(0.05);
  });

  it('credits SIF-301 again: only its claim without a basis still caps it, at the SIL 1 edge 0.1', () => {
    const layer = layerOf(a, 'S-103', 'SIF-301');
    expect(layer).toMatchObject({ credited: true, allowedPfd: 0.1 });
    // Cause 0.1 /yr x TAH-304 0.1 x SIF-301 0.1 = 1e-3 /yr: on the tolerable 1e-3 /yr, which must be strictly
    // below it, so S-103 still falls short, by the claim's missing basis alone (it was 0.01 /yr without SIF-301).
    expect(a.assessments.find((s) => s.scenario === 'S-103')!.mitigatedAfter).toBeCloseTo(1e-3, 12);
  });
});
