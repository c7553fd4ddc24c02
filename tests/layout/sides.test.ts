// Side styles: colour-blind-safe colours AND distinct line styles AND letters, so colour is never
// the only cue; the letter on each mark is legible on its colour.
import { describe, expect, it } from 'vitest';
import { SIDE_STYLES, sideLetter, sideStyle } from '@bulkhead/layout';

// Okabe, M. and Ito, K. (2008), "Color Universal Design (CUD): how to make figures and presentations
// that are friendly to colorblind people", the eight-colour palette (hex values as commonly
// reproduced from it; from memory).
const OKABE_ITO = ['#000000', '#E69F00', '#56B4E9', '#009E73', '#F0E442', '#0072B2', '#D55E00', '#CC79A7'];

/** WCAG 2.1, definitions "relative luminance" and "contrast ratio" (W3C Recommendation, 2018). */
function luminance(hex: string): number {
  const [r, g, b] = [1, 3, 5]
    .map((i) => parseInt(hex.slice(i, i + 2), 16) / 255)
    .map((c) => (c <= 0.03928 ? c / 12.92 : ((c + 0.055) / 1.055) ** 2.4));
  return 0.2126 * r! + 0.7152 * g! + 0.0722 * b!;
}
function contrast(a: string, b: string): number {
  const [hi, lo] = [luminance(a), luminance(b)].sort((x, y) => y - x);
  return (hi! + 0.05) / (lo! + 0.05);
}

describe('side styles', () => {
  it('should take every colour from the Okabe-Ito palette', () => {
    for (const s of SIDE_STYLES) expect(OKABE_ITO).toContain(s.colour.toUpperCase());
  });

  it('should give each side its own colour and its own dash pattern and line name', () => {
    expect(new Set(SIDE_STYLES.map((s) => s.colour)).size).toBe(SIDE_STYLES.length);
    expect(new Set(SIDE_STYLES.map((s) => s.dash)).size).toBe(SIDE_STYLES.length);
    expect(new Set(SIDE_STYLES.map((s) => s.lineName)).size).toBe(SIDE_STYLES.length);
  });

  it('should keep the letter on a mark at WCAG 2.1 AA contrast (4.5:1) against its colour', () => {
    for (const s of SIDE_STYLES) expect(contrast(s.colour, s.ink), s.colour).toBeGreaterThanOrEqual(4.5);
  });

  it('should letter the cause C and the layers 1, 2, ... even when colours repeat', () => {
    expect([0, 1, 2, 10].map(sideLetter)).toEqual(['C', '1', '2', '10']);
    expect(sideStyle(SIDE_STYLES.length + 1)).toEqual(sideStyle(1));
  });
});
