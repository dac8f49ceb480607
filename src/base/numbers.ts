/**
 * Numbers as people read them: every table, figure text, report line, CSV `#` note and processing
 * description writes its numbers through this file, by one rule.
 *
 * - Four significant figures unless a caller names another count (time steps take six, so that
 *   0.005 and 1/256 s read as given).
 * - `formatNumber` drops trailing zeros (0.2046, 0.42, 1.47, 2); `formatSignificant` keeps them,
 *   for columns of a table where every value shows the same precision (0.4200, 1.470).
 * - Plain decimals from 1e-4 up to 1e6; an exponent only outside (1.235e-5, 2.5e+6); 0 is "0".
 *
 * JSON never goes through here: it keeps each double's shortest round-trip form.
 */

/** The default count of significant figures. */
export const SIGNIFICANT_FIGURES = 4;

const PLAIN_FROM = 1e-4;
const PLAIN_BELOW = 1e6;

/** `value` to `digits` significant figures, trailing zeros dropped: 0.2046088… → "0.2046". */
export function formatNumber(value: number, digits = SIGNIFICANT_FIGURES): string {
  if (!Number.isFinite(value)) return String(value);
  if (value === 0) return '0';
  const rounded = Number(value.toPrecision(digits));
  const size = Math.abs(rounded);
  return size >= PLAIN_FROM && size < PLAIN_BELOW ? String(rounded) : rounded.toExponential();
}

/** `value` to `digits` significant figures, trailing zeros kept: 0.42 → "0.4200". */
export function formatSignificant(value: number, digits = SIGNIFICANT_FIGURES): string {
  if (!Number.isFinite(value)) return String(value);
  if (value === 0) return '0';
  const size = Math.abs(Number(value.toPrecision(digits)));
  if (size < PLAIN_FROM || size >= PLAIN_BELOW) return value.toExponential(digits - 1);
  // toPrecision turns to an exponent once the integer part has more digits than asked for.
  return size >= 10 ** (digits - 1) ? String(Number(value.toPrecision(digits))) : value.toPrecision(digits);
}

/** "a–b unit" with both ends by formatNumber: "0.205–1.47 s" at three figures. */
export function formatRange(from: number, to: number, unit: string, digits = SIGNIFICANT_FIGURES): string {
  return `${formatNumber(from, digits)}–${formatNumber(to, digits)}${unit === '' ? '' : ` ${unit}`}`;
}
