import { inputError } from '../base/errors.js';
import { formatNumber } from '../base/numbers.js';
import { STANDARD_GRAVITY_MS2 } from '../base/units.js';
import type { Method } from '../oscillator/recurrence.js';
import type { GroundRecord } from '../record/record.js';
import { interpolateSpectrum } from '../spectrum/interpolate.js';
import { responseSpectrum } from '../spectrum/spectrum.js';

/** A PSA value read for the component and how it was found (stated in every output). */
export interface SpectralValue {
  psaG: number;
  how: string;
}

/**
 * PSA at period T read from a tabulated spectrum (periods in s, PSA in g, same length) by
 * interpolateSpectrum: a grid point (to 1e-12) as is, log–log between positive periods, linear in
 * T after T = 0. Periods outside the grid are refused rather than extrapolated.
 */
export function psaAtPeriod(
  periodsS: ArrayLike<number>,
  psaG: ArrayLike<number>,
  periodS: number,
  source = 'the spectrum',
): SpectralValue {
  const found = interpolateSpectrum(periodsS, psaG, periodS, 1e-12);
  if (!found) {
    throw inputError(
      `the component period ${periodS} s is outside ${source}'s periods (${periodsS[0]} to ${periodsS[periodsS.length - 1]} s); ` +
        'extend the grid rather than extrapolate',
    );
  }
  const between = `between ${formatNumber(periodsS[found.lo])} s and ${formatNumber(periodsS[found.hi])} s`;
  const how = {
    point: 'a point of the grid',
    linear: `interpolated linearly ${between}`,
    'log-log': `interpolated log–log ${between}`,
  }[found.rule];
  return { psaG: found.value, how: `PSA at T = ${formatNumber(periodS)} s, ${how}` };
}

/**
 * The component's PSA, g, on a curve of floor PSA (m/s²) by period: at its period, or for a rigid
 * component the curve's value at T = 0 or else `pgaMS2`. `curve` and `pga` name them in the note.
 */
export function componentPsaOnCurve(
  periodS: number | 'rigid',
  periodsS: ArrayLike<number>,
  psaMS2: ArrayLike<number>,
  pgaMS2: number,
  names: { curve: string; pga: string },
): SpectralValue {
  const psaG = Array.from(psaMS2, (v) => v / STANDARD_GRAVITY_MS2);
  if (periodS !== 'rigid') return psaAtPeriod(periodsS, psaG, periodS, `the ${names.curve}`);
  const zero = Array.from(periodsS).indexOf(0);
  return zero >= 0
    ? { psaG: psaG[zero], how: `PSA at T = 0 of the ${names.curve} (${names.pga}), rigid component` }
    : { psaG: pgaMS2 / STANDARD_GRAVITY_MS2, how: `${names.pga}, rigid component` };
}

/**
 * The PSA of one record for the component itself: the response spectrum at the component's period
 * and damping alone (no interpolation); the record's PGA for a rigid component.
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
  const spectrum = responseSpectrum(record, { periodsS: [periodS], dampings: [damping], method });
  return {
    psaG: spectrum.curves[0].psaMS2[0] / STANDARD_GRAVITY_MS2,
    how: `PSA = ω²·SD of ${record.name} at T = ${formatNumber(periodS)} s, ζ = ${damping}, computed for the component`,
  };
}
