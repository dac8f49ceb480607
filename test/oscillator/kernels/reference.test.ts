import { describe, expect, it } from 'vitest';
import { referencePeaks } from '../../../src/oscillator/kernels/reference.js';
import { COEFFICIENT_STRIDE, PEAK_STRIDE } from '../../../src/oscillator/layout.js';
import { packCoefficients } from '../../../src/oscillator/plan.js';
import { recordStatistics } from '../../../src/oscillator/record-statistics.js';

/** Peaks |u|, |v|, |s| of one oscillator from rest, by the reference kernel with one step a sample. */
function peaksOf(accelMS2: Float64Array, dtS: number, periodS: number, method: 'piecewise-exact') {
  const row = new Float64Array(COEFFICIENT_STRIDE);
  packCoefficients(row, 0, { periodS, damping: 0 }, method, dtS, recordStatistics(accelMS2, dtS).bounds);
  const peaks = new Float64Array(PEAK_STRIDE);
  referencePeaks(accelMS2, 1, dtS, row, peaks, 0);
  return peaks;
}

describe('the reference kernel', () => {
  // From rest under a constant ground acceleration a₀, u(t) = −(a₀/ω²)(1 − cos ωt), v = −(a₀/ω)
  // sin ωt and the absolute acceleration a₀(1 − cos ωt) (Chopra, Dynamics of Structures, §4.3, the
  // step force; from memory). Piecewise-exact steps are exact for this input, so what is left is
  // the peak between steps: the periods put the peaks between samples, where the largest sample
  // misses by up to (1 − cos(π/37))/2 ≈ 0.2%, and the Hermite refinement must find them.
  it('finds the closed-form peaks of an undamped oscillator under a step of ground acceleration', () => {
    const a0 = 1.7;
    const dtS = 0.01;
    const accel = new Float64Array(1237).fill(a0);
    for (const periodS of [0.37, 1.13, 2.93]) {
      const omega = (2 * Math.PI) / periodS;
      const [u, v, s] = peaksOf(accel, dtS, periodS, 'piecewise-exact');
      expect(u / ((2 * a0) / omega ** 2)).toBeCloseTo(1, 5);
      expect(v / (a0 / omega)).toBeCloseTo(1, 5);
      expect(s / (2 * a0)).toBeCloseTo(1, 5);
    }
  });

  it('finds nothing in a record at rest', () => {
    expect(Array.from(peaksOf(new Float64Array(100), 0.01, 0.5, 'piecewise-exact'))).toEqual([0, 0, 0]);
  });
});
