import { CAUTION } from '../base/caution.js';
import { gFromMS2, STANDARD_GRAVITY_MS2 } from '../base/units.js';
import { METHOD_DESCRIPTIONS } from '../oscillator/recurrence.js';
import type { Spectrum, SpectrumCurve } from '../spectrum/spectrum.js';
import { assertFiniteResult } from './finite.js';
import { frequenciesHz } from './frequency.js';

/**
 * Accelerations, m/s², in g. With the periods, a value at T = 0 (the PGA itself) is written as
 * pga_g is, the shortest decimal that converts back (0.42, not 0.41999999999999993); the others
 * keep the plain quotient (the search costs too much for every value of a large suite).
 */
export const toG = (values: Float64Array, periodsS?: ArrayLike<number>): number[] =>
  Array.from(values, (value, i) => spectralG(value, periodsS?.[i]));

/** One acceleration, m/s², in g at period `periodS` (see toG). */
export const spectralG = (valueMS2: number, periodS?: number): number =>
  periodS === 0 ? gFromMS2(valueMS2) : valueMS2 / STANDARD_GRAVITY_MS2;

/** The `record` object of the JSON outputs: name, source, npts, dt_s, pga_g and processing. */
export function recordToJson(record: Spectrum['record']) {
  return {
    name: record.name,
    source: record.source,
    npts: record.npts,
    dt_s: record.dtS,
    pga_g: gFromMS2(record.pgaMS2),
    processing: record.processing.map((step) => ({ ...step })),
  };
}

/** The JSON contract of `quakesweep spectrum` (keys and units are relied on by scripts). */
export function spectrumToJson(spectrum: Spectrum) {
  return {
    caution: CAUTION,
    record: recordToJson(spectrum.record),
    method: spectrum.method,
    method_description: METHOD_DESCRIPTIONS[spectrum.method],
    periods_s: Array.from(spectrum.periodsS),
    frequencies_hz: frequenciesHz(spectrum.periodsS),
    spectra: curvesToJson(spectrum.curves, spectrum.periodsS),
  };
}

/** The curves of a spectrum as JSON: SD and PSV as computed, PSA and SA in g. */
export function curvesToJson(curves: readonly SpectrumCurve[], periodsS?: ArrayLike<number>) {
  return curves.map((curve) => ({
    damping: curve.damping,
    sd_m: Array.from(curve.sdM),
    psv_m_s: Array.from(curve.psvMS),
    psa_g: toG(curve.psaMS2, periodsS),
    sv_m_s: Array.from(curve.svMS),
    sa_g: toG(curve.saMS2, periodsS),
  }));
}

export type SpectrumJson = ReturnType<typeof spectrumToJson>;

/**
 * JSON text with two-space indentation and numbers in full precision (same input, same bytes).
 * Refuses NaN and ±Infinity, which JSON.stringify would silently turn into null. DEL and the C1
 * controls (a file name may hold them; some terminals act on U+009B as on ESC [) are written as
 * \u escapes, which JSON.stringify leaves raw: the same JSON value, nothing a terminal acts on.
 */
export function formatJson(value: unknown): string {
  assertFiniteResult(value);
  const text = JSON.stringify(value, null, 2).replace(
    /[\u007f-\u009f]/g,
    (c) => `\\u${c.charCodeAt(0).toString(16).padStart(4, '0')}`,
  );
  return `${text}\n`;
}
