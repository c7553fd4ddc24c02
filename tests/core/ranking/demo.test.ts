// The common-cause ranking on demo revision A, its order and figures checked by hand. S-101: cause 0.1/yr
// (bpcs-loop-failure default) x ignition 0.5 = 0.05/yr with no layer credited; SIF-101 PFD 0.005, LAH-101
// PFD 0.1. S-103: cause 0.1/yr, TAH-304 0.1 credited, SIF-301 voided (credited at its SIL 1 band edge, 0.1,
// once its findings and the missing basis are resolved).
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { analyze, loadModelText, rankCommonCauses, RANKING_ORDER, renderCommonCausesCsv } from '../../../packages/core/src/index.ts';

const model = loadModelText('marrow-fen.bulk', readFileSync(new URL('../../../fixtures/demo/marrow-fen.bulk', import.meta.url))).model!;
const ranking = rankCommonCauses(model, analyze(model));

describe('common-cause ranking of demo revision A', () => {
  it('ranks by frequency at stake when no element alone restores a layer, then by layers, then by tag', () => {
    expect(ranking.map((r) => r.element)).toEqual(['TW-302', 'LT-102', 'BR-101', 'JB-101', 'AI-1-03', 'BPCS-C1', 'CAB-1', 'CKT-11', 'AI-S-02', 'IA-1', 'UPS-1']);
    // TW-302 is the only open independence finding on SIF-301 (the shared SIS input card AI-S-02 is a note:
    // it belongs to the logic-solver subsystem). Without it SIF-301 is credited at its SIL 1 band edge, 0.1,
    // so it alone costs 0.1 x 0.1 - 0.1 x 0.1 x 0.1 = 0.009 /yr. Every layer in S-101 is voided by more than
    // one element, so none of those costs anything on its own.
    expect(ranking[0]!.frequencyCost).toBeCloseTo(0.009, 12);
    expect(ranking.slice(1).every((r) => r.frequencyCost === 0)).toBe(true);
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
    // TW-302 touches SIF-301 in S-103: 0.1 x 0.1 - 0.1 x 0.1 x 0.1 = 0.009.
    expect(at('TW-302').frequencyAtStake).toBeCloseTo(0.009, 12);
    // UPS-1 and IA-1 take part only in notes (they fail safe for SIF-101): nothing open, nothing at stake.
    expect(at('UPS-1')).toMatchObject({ layers: 0, openFindings: 0, frequencyAtStake: 0, findings: 4 });
  });

  it('states its order and writes one CSV row per element', () => {
    expect(RANKING_ORDER).toMatch(/^Ranked by the mitigated frequency the element alone costs/);
    const rows = renderCommonCausesCsv(ranking).trimEnd().split('\r\n');
    expect(rows).toHaveLength(ranking.length + 1);
    // Figures to six significant figures (csvFigure): 0.1 x 0.1 - 0.1 x 0.1 x 0.1 = 0.009 by hand, with no binary noise.
    expect(rows[1]).toBe('1,TW-302,tapping,"Thermowell, SIS",1,1,S-103,1,1,0.009,0.009,0.009,');
    // 0.05 - 0.05 x 0.005 x 0.1 = 0.049975 by hand.
    expect(rows[2]).toBe('2,LT-102,transmitter,,2,1,S-101,1,1,0,0.049975,0,');
  });
});
