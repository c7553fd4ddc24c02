// The byte-level checks the loader makes before parsing (UTF-8 well-formedness, with the position of
// the first bad byte) and the budgeted "did you mean" that keeps a file of many misspellings fast.
import { describe, expect, it } from 'vitest';
import { loadModelText } from '@bulkhead/core';
import { firstInvalidUtf8, positionOfByte } from '../../../packages/core/src/util/utf8.ts';
import { Suggester, suggest } from '../../../packages/core/src/util/suggest.ts';

const bytes = (...b: number[]) => new Uint8Array(b);

describe('firstInvalidUtf8 (RFC 3629 section 4, well-formed byte sequences)', () => {
  it.each([
    ['ASCII', bytes(0x61, 0x62), -1],
    ['two bytes: U+00E9', bytes(0xc3, 0xa9), -1],
    ['three bytes: U+20AC', bytes(0xe2, 0x82, 0xac), -1],
    ['four bytes: U+1F6A7', bytes(0xf0, 0x9f, 0x9a, 0xa7), -1],
    ['highest code point U+10FFFF', bytes(0xf4, 0x8f, 0xbf, 0xbf), -1],
    ['a lone continuation byte', bytes(0x61, 0x80), 1],
    ['overlong C0 80', bytes(0xc0, 0x80), 0],
    ['overlong E0 80 80', bytes(0xe0, 0x80, 0x80), 0],
    ['overlong F0 80 80 80', bytes(0xf0, 0x80, 0x80, 0x80), 0],
    ['a UTF-16 surrogate ED A0 80', bytes(0xed, 0xa0, 0x80), 0],
    ['above U+10FFFF: F4 90 80 80', bytes(0xf4, 0x90, 0x80, 0x80), 0],
    ['F5 is never valid', bytes(0xf5, 0x80, 0x80, 0x80), 0],
    ['a sequence cut short at the end', bytes(0x61, 0xe2, 0x82), 1],
    ['Latin-1 e acute after text', bytes(0x63, 0x61, 0x66, 0xe9), 3],
  ])('%s', (_, input, expected) => {
    expect(firstInvalidUtf8(input)).toBe(expected);
    // Cross-check against the platform's own strict decoder.
    let platformValid = true;
    try {
      new TextDecoder('utf-8', { fatal: true }).decode(input);
    } catch {
      platformValid = false;
    }
    expect(platformValid).toBe(expected === -1);
  });

  it('gives line and column in characters, after multi-byte characters and CRLF', () => {
    const encoded = new TextEncoder().encode('ab\r\n日本x');
    expect(positionOfByte(encoded, encoded.length - 1)).toEqual({ line: 2, column: 3 });
  });

  it('the loader reports the first bad byte, not a NUL further on', () => {
    const file = new Uint8Array([...new TextEncoder().encode('site "x"\n# caf'), 0xe9, 0x0a, 0x00]);
    const [d] = loadModelText('x.bulk', file).diagnostics;
    expect(d).toMatchObject({ code: 'BH102', span: { line: 2, column: 6 } });
  });
});

describe('suggestions', () => {
  it('suggests the nearest candidate, or the one a truncated word begins', () => {
    expect(suggest('LT-1O1', ['LT-101', 'LT-102', 'PT-201'])).toBe('LT-101');
    expect(suggest('mounted', ['mounted-on', 'signal-via'])).toBe('mounted-on');
    expect(suggest('zzzzzz', ['LT-101'])).toBeUndefined();
  });

  it('stops suggesting once its work budget is spent, so many misspellings stay cheap', () => {
    const tags = Array.from({ length: 100 }, (_, i) => `LT-${100 + i}`);
    // The budget counts characters: each call costs the tags' 600 characters plus 100 x (6 + 1) = 1300.
    const suggester = new Suggester(tags, 3000);
    const answers = Array.from({ length: 5 }, () => suggester.didYouMean('LT-1O1'));
    expect(answers).toEqual([
      'did you mean `LT-101`?',
      'did you mean `LT-101`?',
      'did you mean `LT-101`?',
      undefined,
      undefined,
    ]);
  });

  it('every unknown reference is still counted when suggestions run out, the first 20 shown', () => {
    const lines = ['site "Many"'];
    for (let i = 0; i < 3000; i++) lines.push(`nozzle N-${i} mounted-on=VX-${i}`);
    const result = loadModelText('many.bulk', lines.join('\n'));
    expect(result.diagnostics).toHaveLength(20);
    expect(result.diagnostics.every((d) => d.code === 'BH300' && d.help !== undefined)).toBe(true);
    expect(result.diagnostics.map((d) => d.span?.line)).toEqual(Array.from({ length: 20 }, (_, i) => i + 2));
    expect(result.diagnostics[19]!.more).toBe(2980);
  });
});
