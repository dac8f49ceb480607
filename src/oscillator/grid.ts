import { inputError, usageError } from '../base/errors.js';
import { formatNumber } from '../base/numbers.js';

/** Periods per decade of the default grid. */
export const DEFAULT_PERIODS_PER_DECADE = 40;

/**
 * The default period grid: T = 0 (rigid) and 121 periods from 0.01 s to 10 s, 40 a decade evenly
 * spaced in log T and anchored on the decades (T = 10^(k/40) s), where the point nearest to each
 * 1.5, 2, 3, 5 and 7.5 of a decade (10^(7/40) = 1.496…, 10^(12/40) = 1.995…, 10^(19/40) = 2.985…,
 * 10^(28/40) = 5.012…, 10^(35/40) = 7.499…) is replaced by it. So the round periods 0.01, 0.02,
 * 0.05, 0.1, 0.2, 0.5, 1, 2, 5 and 10 s (and 0.03, 0.3, 3, 0.075, 0.75, 7.5, 0.015, 0.15, 1.5 s,
 * which the terminal tables show too) are on the grid exactly, and no step differs from 10^(1/40)
 * (5.9%) by more than half a percent.
 */
export function defaultPeriodsS(): Float64Array {
  const periodsS = [0];
  for (let exponent = -2; exponent < 1; exponent++) {
    for (let k = 0; k < DEFAULT_PERIODS_PER_DECADE; k++) {
      const round = ROUND_STEPS.get(k);
      periodsS.push(
        round === undefined
          ? Number(`1e${exponent}`) * 10 ** (k / DEFAULT_PERIODS_PER_DECADE)
          : Number(`${round}e${exponent}`),
      );
    }
  }
  periodsS.push(10);
  return Float64Array.from(periodsS);
}

/** The steps of a decade (k of 10^(k/40)) that become its round periods (1 is k = 0 exactly). */
const ROUND_STEPS = new Map([
  [0, 1],
  [7, 1.5],
  [12, 2],
  [19, 3],
  [28, 5],
  [35, 7.5],
]);

/** `count` periods spaced evenly in log T from `fromS` to `toS`, both included. */
export function logSpaced(fromS: number, toS: number, count: number): number[] {
  if (count === 1) return [fromS];
  const ratio = Math.log(toS / fromS);
  return Array.from({ length: count }, (_, i) =>
    i === count - 1 ? toS : fromS * Math.exp((ratio * i) / (count - 1)),
  );
}

/**
 * Shortest period other than 0 in a grid, s (10 kHz): the work grows as 1/T, no record is sampled
 * finely enough for shorter periods to mean anything, and T = 0 (rigid) asks for the PGA.
 */
export const MIN_PERIOD_S = 1e-4;

/** Most oscillators a sweep runs without `--force`. */
export const MAX_OSCILLATORS = 1_000_000;

/** Parse a period grid, s: a comma list (`0,0.1,1`) or `a:b:n`, n log-spaced from a to b; sorted. */
export function parsePeriods(text: string): Float64Array {
  const spec = text.trim();
  let values: number[];
  if (spec.includes(':')) {
    const parts = spec.split(':');
    if (parts.length !== 3) throw usageError(`--periods '${text}': use a:b:n, e.g. 0.01:10:100`);
    const [from, to, count] = parts.map((part) => Number(part.trim()));
    if (from > 0 && from < MIN_PERIOD_S) throw usageError(tooShort(text, from));
    if (!(from > 0) || !(to > from) || !Number.isFinite(to)) {
      throw usageError(
        `--periods '${text}': need 0 < a < b (log spacing cannot start at 0; add 0 with a list)`,
      );
    }
    if (!Number.isInteger(count) || count < 2)
      throw usageError(`--periods '${text}': n must be an integer ≥ 2`);
    if (count > MAX_OSCILLATORS)
      throw usageError(`--periods '${text}': n = ${count} is more than ${MAX_OSCILLATORS}`);
    values = logSpaced(from, to, count);
  } else {
    values = spec.split(',').map((part) => {
      const value = Number(part.trim());
      if (part.trim() === '' || !Number.isFinite(value))
        throw usageError(`--periods: '${part}' is not a number`);
      if (value < 0) throw usageError(`--periods: ${value} is negative; periods are ≥ 0 s (0 means rigid)`);
      if (value > 0 && value < MIN_PERIOD_S) throw usageError(tooShort(text, value));
      return value;
    });
  }
  values.sort((a, b) => a - b);
  const twice = values.find((value, i) => i > 0 && value === values[i - 1]);
  if (twice !== undefined) throw usageError(`--periods: ${twice} s appears twice`);
  return Float64Array.from(values);
}

/** Highest frequency a grid may hold, Hz: that of MIN_PERIOD_S (10 kHz). */
export const MAX_FREQUENCY_HZ = 1 / MIN_PERIOD_S;

/**
 * Parse a frequency grid, Hz, into the period grid the sweep runs on (T = 1/f, ascending as every
 * period grid is, so the highest frequency comes first): a comma list (`1,2,5,10`) or `a:b:n`, n
 * frequencies log-spaced from a to b Hz (the same periods as n log-spaced from 1/b to 1/a s).
 * Frequencies must be finite, > 0 and at most MAX_FREQUENCY_HZ; duplicates are refused.
 */
export function parseFrequencies(text: string): Float64Array {
  const spec = text.trim();
  let values: number[];
  if (spec.includes(':')) {
    const parts = spec.split(':');
    if (parts.length !== 3) throw usageError(`--frequencies '${text}': use a:b:n, e.g. 0.1:100:100`);
    const [from, to, count] = parts.map((part) => Number(part.trim()));
    if (!(from > 0) || !(to > from) || !Number.isFinite(to))
      throw usageError(`--frequencies '${text}': need 0 < a < b, in Hz`);
    if (to > MAX_FREQUENCY_HZ) throw usageError(tooHigh(text, to));
    if (!Number.isInteger(count) || count < 2)
      throw usageError(`--frequencies '${text}': n must be an integer ≥ 2`);
    if (count > MAX_OSCILLATORS)
      throw usageError(`--frequencies '${text}': n = ${count} is more than ${MAX_OSCILLATORS}`);
    values = logSpaced(from, to, count);
  } else {
    values = spec.split(',').map((part) => {
      const value = Number(part.trim());
      if (part.trim() === '' || !Number.isFinite(value))
        throw usageError(`--frequencies: '${part}' is not a number`);
      if (!(value > 0))
        throw usageError(`--frequencies: ${value} Hz is not above 0; for T = 0 (rigid) use --periods`);
      if (value > MAX_FREQUENCY_HZ) throw usageError(tooHigh(text, value));
      return value;
    });
  }
  values.sort((a, b) => b - a);
  for (let i = 1; i < values.length; i++) {
    if (values[i] === values[i - 1]) throw usageError(`--frequencies: ${values[i]} Hz appears twice`);
  }
  const periodsS = Float64Array.from(values, (f) => 1 / f);
  // 1/f is monotone, so only frequencies a rounding apart could meet in one period.
  for (let i = 1; i < periodsS.length; i++) {
    if (!(periodsS[i] > periodsS[i - 1]))
      throw usageError(`--frequencies: ${values[i - 1]} and ${values[i]} Hz give the same period`);
  }
  return periodsS;
}

function tooHigh(text: string, frequencyHz: number): string {
  return `--frequencies '${text}': ${frequencyHz} Hz is above ${MAX_FREQUENCY_HZ} Hz (T < ${MIN_PERIOD_S} s)`;
}

function tooShort(text: string, periodS: number): string {
  return `--periods '${text}': ${periodS} s is shorter than ${MIN_PERIOD_S} s; use 0 for a rigid oscillator`;
}

/** Largest damping ratio accepted (10000%): the largest checked against the exact reference. */
export const MAX_DAMPING_RATIO = 100;

/**
 * Largest damping ratio of the full accuracy campaign (1000%, docs/methods-and-verification.md):
 * above it only a subset was checked, and every output warns.
 */
export const CAMPAIGN_DAMPING_RATIO = 10;

/** The warning for dampings above CAMPAIGN_DAMPING_RATIO, if any. */
export function dampingWarnings(dampings: ArrayLike<number>): string[] {
  const heavy = Array.from(dampings).filter((z) => z > CAMPAIGN_DAMPING_RATIO);
  if (heavy.length === 0) return [];
  const list = heavy.map((z) => `${Number((z * 100).toPrecision(6))}%`).join(', ');
  return [
    `damping ${list} is above ${CAMPAIGN_DAMPING_RATIO * 100}%: the 0.5% accuracy rule was measured on every method up to ${CAMPAIGN_DAMPING_RATIO * 100}% and only spot-checked beyond; check these values independently`,
  ];
}

/**
 * Longest period swept, in record lengths: beyond a thousand an oscillator has barely begun its
 * first cycle when the record ends (our limit, set far above any period of use).
 */
export const MAX_PERIOD_RECORD_LENGTHS = 1000;

/** Refuse a period longer than MAX_PERIOD_RECORD_LENGTHS times the record (duration in s). */
export function checkPeriodsForRecord(periodsS: ArrayLike<number>, durationS: number): void {
  let longest = 0;
  for (let i = 0; i < periodsS.length; i++) longest = Math.max(longest, periodsS[i]);
  const limit = MAX_PERIOD_RECORD_LENGTHS * durationS;
  // A part in a billion spared: a duration of n·Δt may fall an ulp short (0.003 s for 0.0003 × 10).
  if (longest > limit * (1 + 1e-9))
    throw inputError(
      `--periods: T = ${formatNumber(longest, 6)} s is more than ${MAX_PERIOD_RECORD_LENGTHS} times the record's length (${formatNumber(durationS)} s); use periods up to ${formatNumber(limit)} s for this record`,
    );
}

/**
 * The warning for periods longer than the record, if any: the sweep ends with the record, and so
 * slow an oscillator may reach its peak afterwards, in free vibration, which is not counted.
 */
export function periodWarnings(periodsS: ArrayLike<number>, durationS: number): string[] {
  const long = Array.from(periodsS).filter((t) => t > durationS);
  if (long.length === 0) return [];
  const from = formatNumber(Math.min(...long));
  const to = formatNumber(Math.max(...long));
  const which = long.length === 1 ? `T = ${from} s is` : `${long.length} periods, ${from}–${to} s, are`;
  return [
    `${which} longer than the record (${formatNumber(durationS)} s): the sweep ends with the record, and an oscillator that slow may reach its peak later, in free vibration, which is not counted; read these values as lower bounds`,
  ];
}

/**
 * Parse damping ratios, comma separated: fractions (`0.05`) or percentages (`5%`). A bare number
 * above 1 is refused (almost always a percentage without `%`); overdamped ones take a `%`.
 */
export function parseDampings(text: string): Float64Array {
  const values = text.split(',').map((raw) => {
    const part = raw.trim();
    const percent = part.endsWith('%');
    const number = percent ? part.slice(0, -1).trim() : part;
    const value = Number(number);
    if (number === '' || !Number.isFinite(value)) throw usageError(`--damping: '${raw}' is not a number`);
    if (value < 0) throw usageError(`--damping: ${part} is negative; damping ratios are ≥ 0`);
    if (!percent && value > 1) {
      throw usageError(
        `--damping: ${part} is above 1; write ${part}% for a percentage, or a fraction such as 0.05`,
      );
    }
    const ratio = percent ? value / 100 : value;
    if (ratio > MAX_DAMPING_RATIO)
      throw usageError(
        `--damping: ${part} is above ${MAX_DAMPING_RATIO * 100}%, the largest damping the accuracy rule was measured at`,
      );
    return ratio;
  });
  const twice = values.find((value, i) => values.indexOf(value) !== i);
  if (twice !== undefined) throw usageError(`--damping: ${twice} appears twice`);
  return Float64Array.from(values);
}
