// The viewer's links (apps/viewer/src/lib/link.ts): what a URL fragment names, and back.
import { describe, expect, it } from 'vitest';
import { formatLink, parseLink } from '../../apps/viewer/src/lib/link.ts';

describe('parseLink and formatLink', () => {
  it('should read nothing from an empty or unrelated fragment', () => {
    expect(parseLink('')).toEqual({});
    expect(parseLink('#')).toEqual({});
    expect(parseLink('#zoom=3&view=graph')).toEqual({});
  });

  it('should give an empty fragment for nothing in view', () => {
    expect(formatLink({})).toBe('');
  });

  it.each([
    [{ scenario: 'S-101' }, '#scenario=S-101'],
    [
      { scenario: 'S-101', finding: 'shared-bridle:S-101:LIC-101+SIF-101:BR-101' },
      '#scenario=S-101&finding=shared-bridle%3AS-101%3ALIC-101%2BSIF-101%3ABR-101',
    ],
    [{ scenario: 'S-103', element: 'SIS-1' }, '#scenario=S-103&element=SIS-1'],
    [{ scenario: 'S-103', layer: 'SIF-301' }, '#scenario=S-103&layer=SIF-301'],
    [{ matrix: true }, '#view=matrix'],
  ])('should write %j as %s and read it back', (link, hash) => {
    expect(formatLink(link)).toBe(hash);
    expect(parseLink(hash)).toEqual(link);
  });

  it('should keep a tag with spaces, ampersands and non-ASCII letters whole', () => {
    const link = { scenario: 'S 1 & 2', element: 'PT-Ø1' };
    expect(parseLink(formatLink(link))).toEqual(link);
  });
});
