/**
 * What parseNumber reads: a sign, digits with at most one point, an exponent of e, E, d or D.
 * Written so that each character has one way to match (no `\d+\.?\d*`, whose two runs of digits
 * meet anywhere): a field of a million digits that is no number is refused in linear time.
 */
export const NUMBER = /^[+-]?(?:\d+(?:\.\d*)?|\.\d+)(?:[eEdD][+-]?\d+)?$/;
const FORTRAN_EXPONENT = /[dD]/;
/** A decimal comma, read only in files separated by semicolons, where it cannot split fields. */
export const DECIMAL_COMMA = /^[+-]?(\d+,\d*|,\d+)([eEdD][+-]?\d+)?$/;

/**
 * NUMBER's finite numbers (1.5D-03 too) valued as Number() does, and as assembly/rows.ts does the
 * short decimals it reads; NaN for anything else.
 */
export function parseNumber(text: string): number {
  if (!NUMBER.test(text)) return Number.NaN;
  // Number() refuses a D exponent, and reads every other form NUMBER allows.
  let value = Number(text);
  if (Number.isNaN(value)) value = Number(text.replace(FORTRAN_EXPONENT, 'e'));
  return Number.isFinite(value) ? value : Number.NaN;
}

/** The place value of the last printed digit: 0.001 for `0.005`, 1e-5 for `1.5e-4`. */
export function printedResolution(text: string): number {
  const match = /^[+-]?\d*(?:[.,](\d*))?(?:[eEdD]([+-]?\d+))?$/.exec(text);
  if (match === null) return 0;
  return 10 ** (Number(match[2] ?? 0) - (match[1]?.length ?? 0));
}
