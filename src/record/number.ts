/** A number, with Fortran exponents (1.5D-03) accepted; NaN for anything else, NaN and ±Infinity included. */
export function parseNumber(text: string): number {
  const short = shortDecimal(text);
  if (!Number.isNaN(short)) return short;
  if (!NUMBER.test(text)) return Number.NaN;
  // Number() refuses a D exponent, and reads every other form NUMBER allows.
  let value = Number(text);
  if (Number.isNaN(value)) value = Number(text.replace(FORTRAN_EXPONENT, 'e'));
  return Number.isFinite(value) ? value : Number.NaN;
}

/** What parseNumber reads: a sign, digits with at most one point, an exponent of e, E, d or D. */
export const NUMBER = /^[+-]?(?:\d+\.?\d*|\.\d+)(?:[eEdD][+-]?\d+)?$/;
const FORTRAN_EXPONENT = /[dD]/;
/** A decimal comma, read only in files separated by semicolons, where it cannot split fields. */
export const DECIMAL_COMMA = /^[+-]?(\d+,\d*|,\d+)([eEdD][+-]?\d+)?$/;

/** 10⁰ to 10²², every one exact in binary64 (5²² < 2⁵³). */
const POWERS_OF_TEN = Array.from({ length: 23 }, (_, k) => Number(`1e${k}`));

/**
 * A number in the commonest form (sign, digits with at most one point, an `e` or `E` exponent)
 * with at most 15 significant digits and a scale within 10^±22, read in one step; NaN for any
 * other text, which parseNumber reads the long way. The value is Number()'s exactly (closed
 * form): the digits make an integer below 2⁵³ and the power of ten is exact, so the one
 * multiplication or division rounds once, to the nearest double, as Number() rounds. The row
 * scanner (assembly/rows.ts) reads the same numbers the same way.
 */
function shortDecimal(text: string): number {
  const to = text.length;
  if (to === 0) return Number.NaN;
  let i = 0;
  let c = text.charCodeAt(0);
  const negative = c === 45;
  if (negative || c === 43) i++;
  let mantissa = 0;
  let digits = 0;
  let significant = 0;
  let decimals = 0;
  let point = false;
  for (; i < to; i++) {
    c = text.charCodeAt(i);
    if (c >= 48 && c <= 57) {
      digits++;
      if (point) decimals++;
      if (significant > 0 || c !== 48) significant++;
      mantissa = mantissa * 10 + (c - 48);
    } else if (c === 46 && !point) {
      point = true;
    } else {
      break;
    }
  }
  if (digits === 0 || significant > 15) return Number.NaN;
  let exponent = 0;
  if (i < to) {
    if (c !== 101 && c !== 69) return Number.NaN; // not e or E (a D exponent goes the long way)
    if (++i === to) return Number.NaN;
    c = text.charCodeAt(i);
    const negativeExponent = c === 45;
    if (negativeExponent || c === 43) i++;
    if (i === to || to - i > 3) return Number.NaN; // no digits, or far outside 10^±22
    for (; i < to; i++) {
      c = text.charCodeAt(i);
      if (c < 48 || c > 57) return Number.NaN;
      exponent = exponent * 10 + (c - 48);
    }
    if (negativeExponent) exponent = -exponent;
  }
  const scale = exponent - decimals;
  if (scale < -22 || scale > 22) return Number.NaN;
  const magnitude = scale >= 0 ? mantissa * POWERS_OF_TEN[scale] : mantissa / POWERS_OF_TEN[-scale];
  return negative ? -magnitude : magnitude;
}

/** The place value of the last printed digit: 0.001 for `0.005`, 1e-5 for `1.5e-4`. */
export function printedResolution(text: string): number {
  const match = /^[+-]?\d*(?:[.,](\d*))?(?:[eEdD]([+-]?\d+))?$/.exec(text);
  if (match === null) return 0;
  return 10 ** (Number(match[2] ?? 0) - (match[1]?.length ?? 0));
}
