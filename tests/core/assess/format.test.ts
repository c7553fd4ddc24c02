// Number formatting for text output: two significant figures in exponent form with units, ratios in plain
// digits, and the edge convention in words.
import { describe, expect, it } from 'vitest';
import { edgeRelation, edgeText, formatFrequency, formatPerHour, formatProbability, formatRatio } from '../../../packages/core/src/assess/index.ts';

describe('formatting', () => {
  it.each([
    [2.5e-5, '2.5e-5 /yr'],
    [0.1, '1.0e-1 /yr'],
    [0.1 * 0.1, '1.0e-2 /yr'],
    [1e-9, '1.0e-9 /yr'],
    [3.00475e-5, '3.0e-5 /yr'],
    [12, '1.2e1 /yr'],
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

  it('states the edge convention', () => {
    expect(edgeText('below')).toBe('must be strictly below');
    expect(edgeText('at-most')).toBe('may equal');
    expect(edgeRelation('below')).toBe('<');
    expect(edgeRelation('at-most')).toBe('<=');
  });
});
