// Number formatting for text output: two significant figures, plain digits from 0.01 up to 100,000 and
// exponent form outside it, with units; ratios in plain digits; gap or margin; the edge convention in words.
import { describe, expect, it } from 'vitest';
import {
  edgeRelation,
  edgeText,
  formatFrequency,
  formatPerHour,
  formatProbability,
  formatRatio,
  gapText,
} from '../../../packages/core/src/assess/index.ts';

describe('formatting', () => {
  it.each([
    [2.5e-5, '2.5e-5 /yr'],
    [0.1, '0.1 /yr'],
    [0.1 * 0.1, '0.01 /yr'], // the product 0.010000000000000002 prints as written by hand
    [0.00999, '1.0e-2 /yr'], // just below the plain range: rounding never hides the switch of form
    [2, '2 /yr'],
    [99999, '100,000 /yr'],
    [100000, '1.0e5 /yr'],
    [1e-9, '1.0e-9 /yr'],
    [3.00475e-5, '3.0e-5 /yr'],
    [12, '12 /yr'],
  ])('frequency %d is %s', (x, text) => expect(formatFrequency(x)).toBe(text));

  it('writes PFH per hour and probabilities without a unit', () => {
    expect(formatPerHour(1.1415525e-8)).toBe('1.1e-8 /h');
    expect(formatProbability(0.005)).toBe('5.0e-3');
  });

  it.each([
    [57.2, '57'],
    [500, '500'],
    [57142.9, '57,000'],
    [0.25, '0.25'],
    [1000, '1,000'],
  ])('ratio %d is %s', (x, text) => expect(formatRatio(x)).toBe(text));

  it('calls a ratio above 1 a gap and one below 1 a margin', () => {
    expect(gapText(500)).toBe('gap 500 x tolerable');
    expect(gapText(0.4)).toBe('margin 0.4 x tolerable (2.5 times below it)');
    expect(gapText(1)).toBe('on target exactly the tolerable frequency');
  });

  it('states the edge convention', () => {
    expect(edgeText('below')).toBe('must be strictly below');
    expect(edgeText('at-most')).toBe('may equal');
    expect(edgeRelation('below')).toBe('<');
    expect(edgeRelation('at-most')).toBe('<=');
  });
});
