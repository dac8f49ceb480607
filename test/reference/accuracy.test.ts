// The accuracy rule of the README: every SD, PSV, PSA, SV and SA within 0.5% of the exact
// continuous-time peak response to the linearly interpolated record, for T ≥ 0.01 s and
// 0 ≤ ζ ≤ 0.5, on records as coarse as 0.02 s, for all three methods. The exact peaks come from
// the piecewise-exact step (checked against ODEX in test/reference/odex.test.ts) with 400 steps
// per period and Hermite refinement. Both kernels (WebAssembly SIMD and the TypeScript reference)
// are held to the rule.
import { describe, expect, it } from 'vitest';
import { logSpaced } from '../../src/oscillator/grid.js';
import { sweepOscillators } from '../../src/oscillator/sweep.js';
import { testRecord } from '../helpers/records.js';

const periods = logSpaced(0.01, 10, 31);
/** Every method on both kernels. */
const METHODS_AND_KERNELS = (['wasm', 'js'] as const).flatMap((kernel) =>
  (['newmark-average', 'newmark-linear', 'piecewise-exact'] as const).map(
    (method) => [method, kernel] as const,
  ),
);
const dampings = [0, 0.02, 0.05, 0.2, 0.5];

describe.each([
  [0.02, 21],
  [0.005, 22],
])('on a record at Δt = %s s', (dtS, seed) => {
  const record = testRecord(seed, dtS, 12);
  const exact = sweepOscillators(record.accelMS2, dtS, {
    periodsS: periods,
    dampings,
    method: 'piecewise-exact',
    stepsPerPeriod: 400,
  });
  it.each(METHODS_AND_KERNELS)('%s keeps every peak within 0.5% (%s kernel)', (method, kernel) => {
    const peaks = sweepOscillators(record.accelMS2, dtS, { periodsS: periods, dampings, method, kernel });
    for (const key of ['sdM', 'svMS', 'saMS2'] as const) {
      for (let i = 0; i < exact[key].length; i++) {
        expect(Math.abs(peaks[key][i] / exact[key][i] - 1)).toBeLessThan(0.005);
      }
    }
  });
  it('the textbook (not pre-warped) Newmark recurrences also keep it, with more sub-steps', () => {
    const peaks = sweepOscillators(record.accelMS2, dtS, {
      periodsS: periods,
      dampings,
      method: 'newmark-average',
      prewarp: false,
    });
    for (let i = 0; i < exact.sdM.length; i++)
      expect(Math.abs(peaks.sdM[i] / exact.sdM[i] - 1)).toBeLessThan(0.005);
  });
});

// Sines up to the Nyquist frequency of a 0.02 s record (25 Hz), where the record's own content,
// not the oscillator's period, decides how finely the excitation must be stepped (see
// recordSubsteps in substeps.ts). The exact peaks are again the exact method at 400 steps a period.
describe('on sines up to the Nyquist frequency of a 0.02 s record', () => {
  const dtS = 0.02;
  const sinePeriods = logSpaced(0.01, 10, 21);
  it.each([5, 11, 17, 23, 24.5])('every method keeps every peak within 0.5%% at %s Hz', (frequencyHz) => {
    const accel = Float64Array.from({ length: 600 }, (_, i) => Math.sin(2 * Math.PI * frequencyHz * i * dtS));
    const exact = sweepOscillators(accel, dtS, {
      periodsS: sinePeriods,
      dampings,
      method: 'piecewise-exact',
      stepsPerPeriod: 400,
    });
    for (const [method, kernel] of METHODS_AND_KERNELS) {
      const peaks = sweepOscillators(accel, dtS, { periodsS: sinePeriods, dampings, method, kernel });
      for (const key of ['sdM', 'svMS', 'saMS2'] as const) {
        for (let i = 0; i < exact[key].length; i++) {
          expect(Math.abs(peaks[key][i] / exact[key][i] - 1)).toBeLessThan(0.005);
        }
      }
    }
  });
});
