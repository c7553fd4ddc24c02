// Finds where bytes stop being well-formed UTF-8, so a file that is not text gets an error with a
// line and column instead of a bare "not UTF-8". Follows the well-formed byte table of RFC 3629 section 4.

/** Offset of the first byte that does not start or continue a well-formed UTF-8 sequence, or -1. */
export function firstInvalidUtf8(bytes: Uint8Array): number {
  let i = 0;
  while (i < bytes.length) {
    const b = bytes[i]!;
    if (b < 0x80) {
      i++;
      continue;
    }
    // Length of the sequence and the allowed range of its second byte (narrower for E0, ED, F0, F4).
    let length: number;
    let low = 0x80;
    let high = 0xbf;
    if (b >= 0xc2 && b <= 0xdf) length = 2;
    else if (b >= 0xe0 && b <= 0xef) {
      length = 3;
      if (b === 0xe0) low = 0xa0;
      if (b === 0xed) high = 0x9f; // no UTF-16 surrogates
    } else if (b >= 0xf0 && b <= 0xf4) {
      length = 4;
      if (b === 0xf0) low = 0x90;
      if (b === 0xf4) high = 0x8f; // nothing above U+10FFFF
    } else return i;
    for (let k = 1; k < length; k++) {
      const c = bytes[i + k];
      if (c === undefined) return i;
      if (k === 1 ? c < low || c > high : c < 0x80 || c > 0xbf) return i;
    }
    i += length;
  }
  return -1;
}

/** 1-based line and column (in UTF-16 units) of a byte offset whose prefix is well-formed UTF-8. */
export function positionOfByte(bytes: Uint8Array, offset: number): { line: number; column: number } {
  const before = new TextDecoder('utf-8').decode(bytes.subarray(0, offset));
  const lines = before.split(/\r\n|\n|\r/);
  return { line: lines.length, column: lines[lines.length - 1]!.length + 1 };
}
