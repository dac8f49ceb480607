import { inputError } from '../base/errors.js';
import { STANDARD_GRAVITY_MS2 } from '../base/units.js';
import type { Method } from '../oscillator/recurrence.js';
import { sweepOscillators } from '../oscillator/sweep.js';
import type { GroundRecord } from '../record/record.js';

/** A PSA value read for the component and how it was found (stated in every output). */
export interface SpectralValue {
  psaG: number;
  how: string;
}

const short = (value: number) => Number(value.toPrecision(5)).toString();

/**
 * PSA at period T read from a tabulated spectrum (periods in s, PSA in g, same length).
 * On a grid point the value is taken as is; between two positive periods it is interpolated
 * linearly in log T and log PSA (straight lines on the usual log–log plot; common practice);
 * between T = 0 (PGA) and the first positive period, linearly in T, since log 0 is not defined.
 * Periods outside the grid are refused rather than extrapolated.
 */
export function psaAtPeriod(
  periodsS: ArrayLike<number>,
  psaG: ArrayLike<number>,
  periodS: number,
  source = 'the spectrum',
): SpectralValue {
  const n = periodsS.length;
  for (let i = 0; i < n; i++) {
    if (Math.abs(periodsS[i] - periodS) <= 1e-12 * Math.max(1, periodS)) {
      return { psaG: psaG[i], how: `PSA at T = ${periodS} s, a point of the grid` };
    }
  }
  if (n === 0 || periodS < periodsS[0] || periodS > periodsS[n - 1]) {
    throw inputError(
      `the component period ${periodS} s is outside ${source}'s periods (${periodsS[0]} to ${periodsS[n - 1]} s); ` +
        'extend the grid rather than extrapolate',
    );
  }
  let i = 1;
  while (periodsS[i] < periodS) i++;
  const t0 = periodsS[i - 1];
  const t1 = periodsS[i];
  const p0 = psaG[i - 1];
  const p1 = psaG[i];
  if (t0 === 0 || !(p0 > 0) || !(p1 > 0)) {
    const value = p0 + ((p1 - p0) * (periodS - t0)) / (t1 - t0);
    return {
      psaG: value,
      how: `PSA at T = ${periodS} s, interpolated linearly between ${short(t0)} s and ${short(t1)} s`,
    };
  }
  const fraction = Math.log(periodS / t0) / Math.log(t1 / t0);
  const value = Math.exp(Math.log(p0) + fraction * Math.log(p1 / p0));
  return {
    psaG: value,
    how: `PSA at T = ${periodS} s, interpolated log–log between ${short(t0)} s and ${short(t1)} s`,
  };
}

/**
 * The PSA of one record for the component itself: the oscillator at the component's period and
 * damping is run over the record (no interpolation); PGA for a rigid component.
 */
export function recordPsaForComponent(
  record: GroundRecord,
  periodS: number | 'rigid',
  damping: number,
  method: Method,
): SpectralValue {
  if (periodS === 'rigid') {
    return {
      psaG: record.pgaMS2 / STANDARD_GRAVITY_MS2,
      how: `PGA of ${record.name} (rigid component)`,
    };
  }
  const peaks = sweepOscillators(record.accelMS2, record.dtS, {
    periodsS: [periodS],
    dampings: [damping],
    method,
  });
  const omega = (2 * Math.PI) / periodS;
  return {
    psaG: (omega * omega * peaks.sdM[0]) / STANDARD_GRAVITY_MS2,
    how: `PSA = ω²·SD of ${record.name} at T = ${periodS} s, ζ = ${damping}, computed for the component`,
  };
}
