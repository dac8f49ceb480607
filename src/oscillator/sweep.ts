import { inputError } from '../errors.js';
import { COEFFICIENT_STRIDE, GROUP_WIDTH, PEAK_STRIDE, sweepGroup } from './kernel.js';
import { type Method, stepCoefficients, substepCount } from './recurrence.js';

export interface SweepOptions {
  /** Natural periods, s; T = 0 is a rigid oscillator. */
  periodsS: ArrayLike<number>;
  /** Damping ratios as fractions of critical (0.05 for 5%). */
  dampings: ArrayLike<number>;
  /** Step method; Newmark-β average acceleration by default. */
  method?: Method;
}

/** Peak responses of every oscillator of a sweep. Arrays are indexed [damping × nPeriods + period]. */
export interface Peaks {
  method: Method;
  periodsS: Float64Array;
  dampings: Float64Array;
  /** Peak |relative displacement|, m. */
  sdM: Float64Array;
  /** Peak |relative velocity|, m/s. */
  svMS: Float64Array;
  /** Peak |absolute acceleration|, m/s². */
  saMS2: Float64Array;
  /** Oscillator-steps actually executed (sub-steps included). */
  oscillatorSteps: number;
}

interface Oscillator {
  index: number;
  periodS: number;
  damping: number;
  substeps: number;
}

/**
 * Run every oscillator of the grid periods × dampings over one ground-acceleration history
 * (m/s², step dtS, linearly interpolated between samples, from rest) and return their peaks.
 * Oscillators with the same sub-step count are stepped four at a time in one pass; see
 * recurrence.ts for the methods and the sub-step rule.
 */
export function sweepOscillators(accelMS2: Float64Array, dtS: number, options: SweepOptions): Peaks {
  const method = options.method ?? 'newmark-average';
  const periodsS = Float64Array.from(options.periodsS);
  const dampings = Float64Array.from(options.dampings);
  checkSweep(accelMS2, dtS, periodsS, dampings);

  const count = periodsS.length * dampings.length;
  const sdM = new Float64Array(count);
  const svMS = new Float64Array(count);
  const saMS2 = new Float64Array(count);
  let pga = 0;
  for (let i = 0; i < accelMS2.length; i++) pga = Math.max(pga, Math.abs(accelMS2[i]));

  const oscillators: Oscillator[] = [];
  for (let d = 0; d < dampings.length; d++) {
    for (let p = 0; p < periodsS.length; p++) {
      const index = d * periodsS.length + p;
      const periodS = periodsS[p];
      if (periodS === 0) {
        saMS2[index] = pga; // rigid: moves with the ground
        continue;
      }
      oscillators.push({
        index,
        periodS,
        damping: dampings[d],
        substeps: substepCount(method, periodS, dtS),
      });
    }
  }
  oscillators.sort((a, b) => a.substeps - b.substeps || a.index - b.index);

  let oscillatorSteps = 0;
  const coefficients = new Float64Array(GROUP_WIDTH * COEFFICIENT_STRIDE);
  const peaks = new Float64Array(GROUP_WIDTH * PEAK_STRIDE);
  for (let start = 0; start < oscillators.length; ) {
    const substeps = oscillators[start].substeps;
    const group: Oscillator[] = [];
    while (
      group.length < GROUP_WIDTH &&
      start < oscillators.length &&
      oscillators[start].substeps === substeps
    ) {
      group.push(oscillators[start++]);
    }
    const stepS = dtS / substeps;
    for (let g = 0; g < GROUP_WIDTH; g++) {
      packCoefficients(coefficients, g, group[Math.min(g, group.length - 1)], method, stepS);
    }
    sweepGroup(accelMS2, substeps, stepS, coefficients, 0, peaks);
    for (let g = 0; g < group.length; g++) {
      const index = group[g].index;
      sdM[index] = peaks[g * PEAK_STRIDE];
      svMS[index] = peaks[g * PEAK_STRIDE + 1];
      saMS2[index] = peaks[g * PEAK_STRIDE + 2];
    }
    oscillatorSteps += group.length * substeps * (accelMS2.length - 1);
  }
  return { method, periodsS, dampings, sdM, svMS, saMS2, oscillatorSteps };
}

/** Write one oscillator's step coefficients into slot `slot` of the packed array. */
export function packCoefficients(
  target: Float64Array,
  slot: number,
  oscillator: { periodS: number; damping: number },
  method: Method,
  stepS: number,
): void {
  const omega = (2 * Math.PI) / oscillator.periodS;
  const s = stepCoefficients(method, omega, oscillator.damping, stepS);
  const o = slot * COEFFICIENT_STRIDE;
  target[o] = s.uu;
  target[o + 1] = s.uv;
  target[o + 2] = s.up0;
  target[o + 3] = s.up1;
  target[o + 4] = s.vu;
  target[o + 5] = s.vv;
  target[o + 6] = s.vp0;
  target[o + 7] = s.vp1;
  target[o + 8] = 2 * oscillator.damping * omega;
  target[o + 9] = omega * omega;
}

function checkSweep(
  accelMS2: Float64Array,
  dtS: number,
  periodsS: Float64Array,
  dampings: Float64Array,
): void {
  if (!(dtS > 0) || !Number.isFinite(dtS)) throw inputError(`the time step must be positive, got ${dtS}`);
  if (accelMS2.length < 2) throw inputError('a sweep needs a record of at least 2 samples');
  if (periodsS.length === 0) throw inputError('the period grid is empty');
  if (dampings.length === 0) throw inputError('the damping list is empty');
  for (const t of periodsS) {
    if (!(t >= 0) || !Number.isFinite(t)) throw inputError(`periods must be finite and ≥ 0 s, got ${t}`);
  }
  for (const z of dampings) {
    if (!(z >= 0) || !Number.isFinite(z)) throw inputError(`damping ratios must be finite and ≥ 0, got ${z}`);
  }
}
