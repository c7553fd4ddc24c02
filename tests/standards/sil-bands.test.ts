// The SIL bands and the SIL a requirement lands in, edges included, checked against IEC 61511-1:2016 Tables 4
// and 5 (the same bands as IEC 61508-1 Tables 2 and 3), as quoted in docs/rule-basis.md section 1.
import { describe, expect, it } from 'vitest';
import {
  HIGH_DEMAND_BANDS,
  LOW_DEMAND_BANDS,
  requiredSil,
  requiredSilForPfh,
  silOfPfd,
  conservativePfd,
  LOW_DEMAND_LIMIT_PER_YEAR,
} from '../../packages/core/src/assess/index.ts';

describe('IEC 61511-1:2016 Table 4, low demand', () => {
  // IEC 61511-1:2016 Table 4 (as quoted in docs/rule-basis.md section 1): SIL n is PFDavg >= 10^-(n+1) to < 10^-n.
  it.each([
    [1, 1e-2, 1e-1],
    [2, 1e-3, 1e-2],
    [3, 1e-4, 1e-3],
    [4, 1e-5, 1e-4],
  ])('SIL %i is PFDavg from %d up to (not including) %d', (sil, low, high) => {
    expect(LOW_DEMAND_BANDS.find((b) => b.sil === sil)).toEqual({ sil, low, high });
  });

  it('is not printed upside down: the higher SIL has the lower PFD', () => {
    // docs/rule-basis.md section 1 warns of secondary copies that invert the table.
    expect(LOW_DEMAND_BANDS.find((b) => b.sil === 4)!.high).toBeLessThan(
      LOW_DEMAND_BANDS.find((b) => b.sil === 1)!.low,
    );
  });

  // IEC 61511-1:2016 Table 4 RRF column (as quoted in docs/rule-basis.md section 1): SIL 1 > 10 to <= 100, SIL 2 > 100
  // to <= 1,000, SIL 3 > 1,000 to <= 10,000, SIL 4 > 10,000 to <= 100,000.
  it.each([
    // [required RRF, SIL with "at most" (the RRF rows), SIL with "strictly below"]
    [10, 0, 1],
    [100, 1, 2],
    [1000, 2, 3],
    [10000, 3, 4],
    [100000, 4, 5],
  ])('a required RRF of exactly %d is SIL %i at most, SIL %i strictly below', (rrf, atMost, strictlyBelow) => {
    expect(requiredSil(1 / rrf, 'at-most')).toBe(atMost);
    expect(requiredSil(1 / rrf, 'below')).toBe(strictlyBelow);
  });

  it.each([
    // Inside a band both conventions agree. IEC 61511-1:2016 Table 4 (as quoted in docs/rule-basis.md section 1).
    [5, 0],
    [11, 1],
    [57, 1],
    [99, 1],
    [101, 2],
    [500, 2],
    [5000, 3],
    [50000, 4],
    [100001, 5],
  ])('a required RRF of %d is SIL %i under either convention', (rrf, sil) => {
    expect(requiredSil(1 / rrf, 'at-most')).toBe(sil);
    expect(requiredSil(1 / rrf, 'below')).toBe(sil);
  });

  it('counts 0.1 x 0.1 as exactly 0.01, although the double is 0.010000000000000002', () => {
    // docs/rule-basis.md section 1: 0.1 * 0.1 = 0.010000000000000002 in doubles.
    expect(0.1 * 0.1).not.toBe(0.01);
    expect(requiredSil(0.1 * 0.1, 'below')).toBe(2);
    expect(requiredSil(0.1 * 0.1, 'at-most')).toBe(1);
    expect(requiredSil(1e-3 / (0.1 * 0.1), 'below')).toBe(1);
    expect(requiredSil(1e-4 / (0.1 * 0.1), 'below')).toBe(2);
    expect(requiredSil(1e-6 / (0.1 * 0.1 * 0.1), 'below')).toBe(3);
  });

  it('needs no SIL when no risk reduction is asked of the SIF', () => {
    // docs/rule-basis.md section 1: RRF <= 10 (PFD >= 0.1) is below SIL 1.
    expect(requiredSil(0.5, 'below')).toBe(0);
    expect(requiredSil(1, 'below')).toBe(0);
    expect(requiredSil(30, 'at-most')).toBe(0);
  });

  it('places an achieved PFD in its band, edges on the band that holds them (>= low, < high)', () => {
    // IEC 61511-1:2016 Table 4: ">= 1e-2 to < 1e-1" is SIL 1, so 0.01 is SIL 1 and 0.0099 is SIL 2.
    expect(silOfPfd(0.1)).toBe(0);
    expect(silOfPfd(0.0999)).toBe(1);
    expect(silOfPfd(0.01)).toBe(1);
    expect(silOfPfd(0.0099)).toBe(2);
    expect(silOfPfd(1e-5)).toBe(4);
    expect(silOfPfd(9.9e-6)).toBe(5);
  });

  it('credits a SIL claim at the conservative edge of its band', () => {
    // docs/rule-basis.md section 3 (CCPS 2001 Tables 6.3 to 6.5, from memory): SIF by SIL band, 0.1, 0.01, 0.001.
    expect([1, 2, 3, 4].map(conservativePfd)).toEqual([0.1, 0.01, 0.001, 1e-4]);
    expect(conservativePfd(0)).toBeUndefined();
  });

  it('is the low-demand table up to one demand a year', () => {
    // docs/rule-basis.md section 1: low demand means demanded at most once per year.
    expect(LOW_DEMAND_LIMIT_PER_YEAR).toBe(1);
  });
});

describe('IEC 61511-1:2016 Table 5, high demand or continuous mode', () => {
  // IEC 61511-1:2016 Table 5 (as quoted in docs/rule-basis.md section 1): PFH per hour, SIL n >= 10^-(n+5) to < 10^-(n+4).
  it.each([
    [1, 1e-6, 1e-5],
    [2, 1e-7, 1e-6],
    [3, 1e-8, 1e-7],
    [4, 1e-9, 1e-8],
  ])('SIL %i is PFH from %d up to (not including) %d per hour', (sil, low, high) => {
    expect(HIGH_DEMAND_BANDS.find((b) => b.sil === sil)).toEqual({ sil, low, high });
  });

  it.each([
    // [required PFH per hour, SIL at most, SIL strictly below]
    [5e-6, 1, 1],
    [1e-6, 1, 2],
    [3e-7, 2, 2],
    [1e-8, 3, 4],
    [2e-9, 4, 4],
    [1e-9, 4, 5],
    [5e-10, 5, 5],
    [2e-5, 0, 0],
  ])('a required PFH of %d /h is SIL %i at most, SIL %i strictly below', (pfh, atMost, strictlyBelow) => {
    expect(requiredSilForPfh(pfh, 'at-most')).toBe(atMost);
    expect(requiredSilForPfh(pfh, 'below')).toBe(strictlyBelow);
  });
});
