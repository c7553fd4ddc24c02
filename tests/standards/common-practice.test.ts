// Facts of the LOPA trade the assessment must reproduce (docs/design.md section 6), the demand-mode switch of
// IEC 61511-1, and the edge cases of the arithmetic: tiny frequencies, no layers, 25 conflicting layers, ties.
import { describe, expect, it } from 'vitest';
import type { Finding } from '../../packages/core/src/vocabulary/types.ts';
import { assess, cause, independenceFinding, layer } from '../core/assess/kit.ts';

// A BPCS loop failure as the cause, one independent safeguard (an alarm in another controller) and a SIF.
const LEVEL = (category = 'people', sif = true) => `
alarm LAH-2 sensors=LT-2 raised-in=C2 operator=OP-1 minutes=20 pfd=0.1
sif SIF-1 sensors=LT-3 solver=SIS-1 finals=XV-1 sil=2 pfd=0.005
scenario S-1 category=${category}
  cause function=LIC-1 frequency=0.1
  layer LAH-2
${sif ? '  layer SIF-1\n' : ''}`;

describe('common practice, no source', () => {
  it('a BPCS loop failure at 0.1/yr, no modifier, one safeguard at PFD 0.1, tolerable 1e-4/yr strictly below: SIF PFD below 0.01, SIL 2', () => {
    // Common practice, no source (docs/design.md section 6): a BPCS loop fails about once in ten years (0.1/yr); a
    // safeguard that is 90% reliable has PFD 0.1; a layer that must be at least 99% reliable needs SIL 2.
    const sif = assess(LEVEL()).assessment.sif!;
    expect(sif.function).toBe('SIF-1');
    expect(sif.requiredPfd).toBeCloseTo(0.01, 15);
    expect(sif.requiredRrf).toBeCloseTo(100, 9);
    expect(sif.sil).toBe(2);
  });

  it('the same with the criterion "at most": PFD at most 0.01, SIL 1 verified at 0.01', () => {
    // docs/rule-basis.md section 1: with "at most", RRF 100 falls in the SIL 1 row (> 10 to <= 100).
    expect(assess(LEVEL('people-at-most')).assessment.sif!.sil).toBe(1);
  });

  it('asks for a new SIF of the same SIL when none is claimed', () => {
    const a = assess(LEVEL('people', false)).assessment;
    expect(a.meetsAfter).toBe(false);
    expect(a.sif).toMatchObject({ sil: 2, mode: 'low-demand' });
    expect(a.sif!.function).toBeUndefined();
    expect(a.sif!.requiredPfd).toBeCloseTo(0.01, 15);
  });

  it('voiding a layer that shares a bridle with the cause raises the required SIL from 2 to 3', () => {
    // Common practice, no source (docs/design.md section 6): two transmitters on one level bridle share a common cause.
    const bridle = independenceFinding('S-1', 'shared-connection', [cause('LIC-1'), layer('LAH-2')], {
      element: 'BR-1',
    });
    const before = assess(LEVEL()).assessment;
    const after = assess(LEVEL(), [bridle]).assessment;
    expect(after.layers.find((l) => l.function === 'LAH-2')).toMatchObject({ verdict: 'voided', credited: false });
    expect(after.sif!.requiredPfd).toBeCloseTo(1e-3, 15);
    expect(after.sif!.sil).toBe(3);
    expect(after.sif!.sil).toBeGreaterThan(before.sif!.sil);
    expect(after.mitigatedAfter).toBeGreaterThan(before.mitigatedAfter);
  });

  it('credit for presence needs presence under about 10%', () => {
    // Common practice, no source (docs/design.md section 6; docs/rule-basis.md section 3: owner's policy, default 0.1).
    const at = (p: number) =>
      assess(
        `scenario S-1 category=people\n  cause function=LIC-1 frequency=0.1\n  modifier presence probability=${p} basis="time at the site (invented)"\n`,
      ).assessment.mitigatedAfter;
    expect(at(0.1)).toBeCloseTo(0.01, 15);
    expect(at(0.5)).toBe(0.1);
  });
});

describe('demand mode, IEC 61511-1', () => {
  // IEC 61511-1:2016 (as quoted in docs/rule-basis.md section 1): low demand means the function is demanded at most once a
  // year; above that, the PFH bands of Table 5 apply instead of the PFDavg bands of Table 4.
  const DEMAND = (frequency: number, extra = '') => `
sif SIF-1 sensors=LT-3 solver=SIS-1 finals=XV-1 sil=3
device PSV-IPL device=PSV-1 pfd=0.01
scenario S-1 category=people
  cause external="Feed surge" frequency=${frequency}
${extra}  layer SIF-1
`;

  it('is low demand at exactly once a year', () => {
    expect(assess(DEMAND(1)).assessment.sif).toMatchObject({ demandRate: 1, mode: 'low-demand' });
  });

  it('is high demand above once a year, and gives the PFH band instead', () => {
    const sif = assess(DEMAND(5)).assessment.sif!;
    expect(sif.mode).toBe('high-demand');
    expect(sif.demandRate).toBe(5);
    // Required PFH = 1e-4 /yr / 8,760 h = 1.14e-8 /h (this tool's conservative high-demand model: the SIF's own
    // dangerous failures start the release; no outside source), SIL 3 by IEC 61511-1:2016 Table 5 (>= 1e-8 to < 1e-7).
    expect(sif.requiredPfh!.toPrecision(3)).toBe('1.14e-8');
    expect(sif.sil).toBe(3);
    expect(sif.pfhBand).toEqual({ sil: 3, low: 1e-8, high: 1e-7 });
    // The low-demand table would have said SIL 4 (PFD 2e-5), which does not apply.
    expect(sif.lowDemandSil).toBe(4);
    expect(sif.note).toMatch(/high demand/);
  });

  it('takes a relief valve as acting after the SIF: it does not lower the demand (issue 9, item 2)', () => {
    // The issue's check: cause 5 /yr, a relief valve (PFD 0.01, set above the trip) and a SIF. The relief valve acts
    // after the SIF, so the demand on the SIF is the cause itself, 5 /yr: high demand (common practice, no source,
    // for the default order by kind; IEC 61511-1:2016 for the mode).
    const sif = assess(DEMAND(5, '  layer PSV-IPL\n')).assessment.sif!;
    expect(sif.demandRate).toBe(5);
    expect(sif.mode).toBe('high-demand');
    expect(sif.order).toBe('acting before SIF-1: none; after it: PSV-IPL');
    // Required PFH = 1e-4 / (8,760 h x 0.01) = 1.14e-6 /h: SIL 1 by Table 5 (>= 1e-6 to < 1e-5), worked by hand.
    expect(sif.requiredPfh!.toExponential(2)).toBe('1.14e-6');
    expect(sif.sil).toBe(1);
  });

  it('lets the layer line say the relief device acts before the SIF (acts=before)', () => {
    // Stated before, the relief valve lowers the demand to 5 x 0.01 = 0.05 /yr: low demand.
    const sif = assess(DEMAND(5, '  layer PSV-IPL acts=before\n')).assessment.sif!;
    expect(sif.demandRate).toBeCloseTo(0.05, 15);
    expect(sif.mode).toBe('low-demand');
    expect(sif.order).toBe('acting before SIF-1: PSV-IPL (stated); after it: none');
  });
});

// Edge cases of this tool's own arithmetic (no outside source): they check robustness, not a published value.
describe('edge cases of the arithmetic', () => {
  it('handles a cause of 1e-9 per year: no SIF needed', () => {
    const a = assess(`scenario S-1 category=people\n  cause external="Meteorite" frequency=1e-9\n`).assessment;
    expect(a.mitigatedAfter).toBe(1e-9);
    expect(a.gap).toBeCloseTo(1e-5, 15);
    expect(a.meetsAfter).toBe(true);
    expect(a.sif).toBeUndefined();
  });

  it('handles a scenario with no layers: mitigated equals the cause, the new SIF carries the whole gap', () => {
    const a = assess(`scenario S-1 category=people\n  cause function=LIC-1 frequency=0.1\n`).assessment;
    expect(a.layers).toEqual([]);
    expect(a.mitigatedClaimed).toBe(0.1);
    expect(a.mitigatedAfter).toBe(0.1);
    expect(a.alternatives).toEqual([]);
    expect(a.sif).toMatchObject({ requiredRrf: 1000, sil: 3 });
  });

  it('reports beyond SIL 4 when one SIF cannot close the gap', () => {
    const a = assess(
      `category tiny tolerable=1e-7 harm=people\nscenario S-1 category=tiny\n  cause external="Surge" frequency=1\n`,
    ).assessment;
    expect(a.sif!.sil).toBe(5);
  });

  it('assesses 25 claimed layers with many layer-layer conflicts and returns a conflict-free best set', () => {
    const tags = Array.from({ length: 25 }, (_, i) => `PSV-IPL-${String(i).padStart(2, '0')}`);
    const devices = tags.map((t, i) => `device ${t} device=PSV-1 pfd=${[0.1, 0.01, 0.05][i % 3]}`).join('\n');
    const claims = tags.map((t) => `  layer ${t}`).join('\n');
    const conflicts: Finding[] = [];
    for (let i = 0; i < 25; i++) {
      for (let j = i + 1; j < 25; j++) {
        if ((i * 7 + j * 3) % 4 === 0 || j === i + 1) {
          conflicts.push(
            independenceFinding('S-1', 'shared-element', [layer(tags[i]!), layer(tags[j]!)], { element: 'PSV-1' }),
          );
        }
      }
    }
    const a = assess(
      `${devices}\nscenario S-1 category=people\n  cause external="Surge" frequency=1\n${claims}\n`,
      conflicts,
    ).assessment;
    const credited = new Set(a.layers.filter((l) => l.credited).map((l) => l.function));
    expect(credited.size).toBeGreaterThan(1);
    for (const f of conflicts) expect(credited.has(f.parties[0]!.tag!) && credited.has(f.parties[1]!.tag!)).toBe(false);
    expect(a.alternatives.length).toBeGreaterThan(0);
    for (const alt of a.alternatives) expect(alt.mitigated!).toBeGreaterThanOrEqual(a.mitigatedAfter * (1 - 1e-9));
    expect(a.layers.filter((l) => !l.credited).every((l) => l.verdict === 'not-selected')).toBe(true);
  });

  it('breaks a tie between two equal conflicting layers by tag, whatever the claim order', () => {
    const model = (order: string[]) => `
alarm LAH-2 sensors=LT-2 raised-in=SIS-1 operator=OP-1 minutes=20 pfd=0.1
alarm LAH-3 sensors=LT-3 raised-in=SIS-1 operator=OP-1 minutes=20 pfd=0.1
scenario S-1 category=people
  cause external="Surge" frequency=1
${order.map((t) => `  layer ${t}`).join('\n')}
`;
    const conflict = [
      independenceFinding('S-1', 'shared-operator', [layer('LAH-3'), layer('LAH-2')], { element: 'OP-1' }),
    ];
    for (const order of [
      ['LAH-2', 'LAH-3'],
      ['LAH-3', 'LAH-2'],
    ]) {
      const a = assess(model(order), conflict).assessment;
      expect(a.layers.filter((l) => l.credited).map((l) => l.function)).toEqual(['LAH-2']);
      expect(a.alternatives.map((x) => x.layers)).toEqual([['LAH-3']]);
    }
  });
});
