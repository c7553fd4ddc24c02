// A narrowed cause (issue 9, item 7): until the narrowing is accepted the whole loop is the cause, and the figure
// "if open findings are accepted" must be the very figure the tool gives once it is accepted.
import { describe, expect, it } from 'vitest';
import { analyze } from '@bulkhead/core';
import { load } from './kit.ts';

// The SIF reads the loop's own transmitter LT-1: shared with the whole loop, not with the valve LV-1 alone.
const MODEL = `
sif SIF-1 sensors=LT-1 solver=SIS-1 finals=XV-1 sil=2
scenario S-1 category=people
  cause function=LIC-1 only=LV-1 frequency=0.1 basis="valve sticks open, site records (invented)"
  layer SIF-1
`;
const ACCEPT = `accept "cause-narrowed:S-1:LIC-1:LV-1" by="A. Reviewer (invented)" date=2026-11-20 reason="only the valve can drive the level up (invented)"\n`;

function figures(text: string) {
  const a = analyze(load(text)).assessments[0]!;
  return {
    after: a.mitigatedAfter,
    ifAccepted: a.mitigatedIfAccepted,
    credited: a.layers.filter((l) => l.credited).map((l) => l.function),
  };
}

describe('a narrowed cause', () => {
  it('voids the SIF on the shared transmitter until the narrowing is accepted', () => {
    // Whole loop as the cause: LT-1 is shared, the SIF is voided, 0.1 /yr after independence.
    expect(figures(MODEL)).toMatchObject({ after: 0.1, credited: [] });
  });

  it('gives as "if accepted" the figure the tool gives once the narrowing is accepted', () => {
    const open = figures(MODEL);
    const accepted = figures(MODEL + ACCEPT);
    // Narrowed to LV-1, nothing is shared: the SIF at its SIL 2 edge, 0.1 x 0.01 = 1e-3 /yr.
    expect(accepted.after).toBeCloseTo(1e-3, 15);
    expect(accepted.credited).toEqual(['SIF-1']);
    expect(open.ifAccepted).toBe(accepted.after);
  });
});
