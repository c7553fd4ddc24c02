// The common-cause ranking on demo revision A, its order and figures checked by hand. S-101: cause 0.1/yr
// (bpcs-loop-failure default) x ignition 0.5 = 0.05/yr with no layer credited; SIF-101 PFD 0.005, LAH-101
// PFD 0.1. S-103: cause 0.1/yr, TAH-304 0.1 credited, SIF-301 credited at its SIL 1 band edge, 0.1: the thermowell
// its channels share is counted in its computed PFD (issue 16, item 3), so that finding is a note.
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import {
  analyze,
  loadModelText,
  rankCommonCauses,
  RANKING_ORDER,
  renderCommonCausesCsv,
} from '../../../packages/core/src/index.ts';

const model = loadModelText(
  'marrow-fen.bulk',
  readFileSync(new URL('../../../fixtures/demo/marrow-fen.bulk', import.meta.url)),
).model!;
const ranking = rankCommonCauses(model, analyze(model));

describe('common-cause ranking of demo revision A', () => {
  it('ranks by frequency at stake when no element alone restores a layer, then by layers, then by tag', () => {
    expect(ranking.map((r) => r.element)).toEqual([
      'LT-102',
      'BR-101',
      'JB-101',
      'AI-1-03',
      'BPCS-C1',
      'CAB-1',
      'CKT-11',
      'AI-S-02',
      'IA-1',
      'TW-302',
      'UPS-1',
    ]);
    // Every layer in S-101 is voided by more than one element, so none of those costs anything on its own; TW-302
    // no longer withholds SIF-301's credit (counted in its computed PFD), so it costs nothing either.
    expect(ranking.every((r) => r.frequencyCost === 0)).toBe(true);
  });

  it('gives the figures at stake worked by hand', () => {
    const at = (tag: string) => ranking.find((r) => r.element === tag)!;
    // LT-102 (same make and model as LT-103) touches both S-101 layers: 0.05 - 0.05 x 0.005 x 0.1 = 0.049975.
    expect(at('LT-102')).toMatchObject({ layers: 2, scenarios: ['S-101'] });
    expect(at('LT-102').frequencyAtStake).toBeCloseTo(0.049975, 12);
    // BR-101 touches SIF-101 only: 0.05 - 0.05 x 0.005 = 0.04975.
    expect(at('BR-101').frequencyAtStake).toBeCloseTo(0.04975, 12);
    // AI-1-03 touches LAH-101 only: 0.05 - 0.05 x 0.1 = 0.045.
    expect(at('AI-1-03').frequencyAtStake).toBeCloseTo(0.045, 12);
    // TW-302 takes part only in a note on SIF-301 (counted in its computed PFD, within the claim): nothing at stake.
    expect(at('TW-302')).toMatchObject({ layers: 0, openFindings: 0, frequencyAtStake: 0 });
    // UPS-1 and IA-1 take part only in notes (they fail safe for SIF-101): nothing open, nothing at stake.
    expect(at('UPS-1')).toMatchObject({ layers: 0, openFindings: 0, frequencyAtStake: 0, findings: 4 });
  });

  it('states its order and writes one CSV row per element', () => {
    expect(RANKING_ORDER).toMatch(/^Ranked by the mitigated frequency the element alone costs/);
    const rows = renderCommonCausesCsv(ranking).trimEnd().split('\r\n');
    expect(rows).toHaveLength(ranking.length + 1);
    // Figures to six significant figures (csvFigure): 0.05 - 0.05 x 0.005 x 0.1 = 0.049975 by hand, with no binary noise.
    expect(rows[1]).toBe('1,LT-102,transmitter,,2,1,S-101,1,1,0,0.049975,0,');
  });
});
