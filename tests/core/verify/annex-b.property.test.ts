// Properties every SIF verification must keep whatever the figures (issue 16). Common practice, no source:
// each follows from what a PFD is, and the equations of IEC 61508-6:2010 Annex B must not break them.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { groupPfd, groupPfh, type Architecture, type GroupFigures } from '@bulkhead/core';

const rate = fc.double({ min: 1e-9, max: 1e-5, noNaN: true });
const hours = fc.double({ min: 100, max: 100_000, noNaN: true });
const fraction = fc.double({ min: 0, max: 0.3, noNaN: true });

const figures = fc
  .record({
    lambdaDu: rate,
    lambdaDd: rate,
    lambdaSd: fc.constant(0),
    t1: hours,
    mttr: fc.double({ min: 1, max: 72, noNaN: true }),
    beta: fraction,
  })
  .map((f): GroupFigures => ({ ...f, mrt: f.mttr, betaD: f.beta / 2 }));

const VOTES: Architecture[] = [
  { m: 1, n: 1 },
  { m: 1, n: 2 },
  { m: 2, n: 2 },
  { m: 2, n: 3 },
  { m: 1, n: 3 },
  { m: 1, n: 2, diagnostic: true },
];
const vote = fc.constantFrom(...VOTES);

describe('SIF verification properties', () => {
  it('an element shared by the channels, in series with the group, never lowers the PFD or the PFH', () => {
    fc.assert(
      fc.property(vote, figures, rate, hours, (a, f, sharedRate, sharedT1) => {
        const shared: GroupFigures = {
          lambdaDu: sharedRate,
          lambdaDd: 0,
          lambdaSd: 0,
          t1: sharedT1,
          mttr: 8,
          mrt: 8,
          beta: 0,
          betaD: 0,
        };
        const one = { m: 1, n: 1 };
        expect(groupPfd(a, f)! + groupPfd(one, shared)!).toBeGreaterThan(groupPfd(a, f)!);
        expect(groupPfh(a, f)! + groupPfh(one, shared)!).toBeGreaterThan(groupPfh(a, f)!);
      }),
    );
  });

  it('a 1oo2 pair without common cause is never worse than one of its channels', () => {
    fc.assert(
      fc.property(figures, (f) => {
        const independent = { ...f, beta: 0, betaD: 0 };
        // Within the range where the simplified equations hold (PFD of one channel well below 1).
        fc.pre(groupPfd({ m: 1, n: 1 }, independent)! < 0.1);
        expect(groupPfd({ m: 1, n: 2 }, independent)!).toBeLessThanOrEqual(groupPfd({ m: 1, n: 1 }, independent)!);
        expect(groupPfh({ m: 1, n: 2 }, independent)!).toBeLessThanOrEqual(groupPfh({ m: 1, n: 1 }, independent)!);
      }),
    );
  });

  it('a longer proof-test interval never lowers the PFDavg', () => {
    fc.assert(
      fc.property(vote, figures, hours, (a, f, extra) => {
        expect(groupPfd(a, { ...f, t1: f.t1 + extra })!).toBeGreaterThanOrEqual(groupPfd(a, f)!);
      }),
    );
  });

  it('more common cause never lowers the PFDavg of a redundant group', () => {
    fc.assert(
      fc.property(fc.constantFrom(...VOTES.filter((v) => v.m < v.n)), figures, fraction, (a, f, more) => {
        fc.pre(groupPfd({ m: 1, n: 1 }, f)! < 0.1);
        const worse = { ...f, beta: Math.min(f.beta + more, 0.5), betaD: Math.min(f.beta + more, 0.5) / 2 };
        expect(groupPfd(a, worse)!).toBeGreaterThanOrEqual(groupPfd(a, f)! * (1 - 1e-12));
      }),
    );
  });
});
