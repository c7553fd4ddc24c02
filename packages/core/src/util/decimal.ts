// Whether a decimal number as the user wrote it is the number a double holds, digit for digit. A literal
// with more significant digits than a double keeps would be read, printed and reported as another value.
import { error, type Diagnostic, type Span } from '../diagnostics/diagnostic.ts';

/** Significant digits (no leading or trailing zeros) and the power of ten of the last one. */
function digitsOf(literal: string): { digits: string; exponent: number } | undefined {
  const m = /^[+-]?(\d*)(?:\.(\d*))?(?:[eE]([+-]?\d+))?$/.exec(literal);
  if (!m) return undefined;
  const whole = m[1] ?? '';
  const fraction = m[2] ?? '';
  let digits = (whole + fraction).replace(/^0+/, '');
  let exponent = Number(m[3] ?? 0) - fraction.length;
  const trimmed = digits.replace(/0+$/, '');
  exponent += digits.length - trimmed.length;
  digits = trimmed;
  return { digits, exponent: digits === '' ? 0 : exponent };
}

/**
 * True when `Number(literal)` is exactly the decimal written, in the sense that matters to a user: the
 * shortest text that reads back as the same double has the same significant digits. `0.1` and `1.50e-3`
 * are held; `0.00500000000000000000001` (read as 0.005) and `1e-400` (read as 0) are not. Infinite values
 * are left to the range checks, which say so in their own words.
 */
export function heldExactly(literal: string): boolean {
  const value = Number(literal);
  if (!Number.isFinite(value)) return true;
  const written = digitsOf(literal);
  const held = digitsOf(String(Math.abs(value)));
  if (!written || !held) return true;
  return written.digits === held.digits && written.exponent === held.exponent;
}

/** A number the user wrote with more digits than a double holds: refused, so nothing is silently rewritten. */
export function tooPrecise(literal: string, span: Span): Diagnostic {
  return error(
    'BH121',
    `\`${literal}\` has more significant digits than a number can hold; it would be read as ${String(Number(literal))}`,
    span,
    {
      help: 'write it with at most 15 significant digits; the value it would be read as is shown above',
    },
  );
}
