// The exact reference (exact-response.ts: mathjs's expm, dense sampling, refined peaks) against
// an independent integrator: ODEX (Hairer and Wanner's Gragg–Bulirsch–Stoer extrapolation code,
// the `odex` package), interval by interval, to tight tolerance, its peaks sampled 200 times a step.
import { Solver } from 'odex';
import { describe, expect, it } from 'vitest';
import { testRecord } from '../helpers/records.js';
import { exactPeaks } from './exact-response.js';
import { sineRecord } from './families.js';

function odexPeaks(accel: Float64Array, dtS: number, periodS: number, zeta: number) {
  const omega = (2 * Math.PI) / periodS;
  const solver = new Solver(2);
  solver.absoluteTolerance = 1e-13;
  solver.relativeTolerance = 1e-13;
  solver.denseOutput = true;
  let y = [0, 0];
  const peaks = { sdM: 0, svMS: 0, saMS2: 0 };
  for (let n = 0; n < accel.length - 1; n++) {
    const a0 = accel[n];
    const slope = (accel[n + 1] - a0) / dtS;
    const t0 = n * dtS;
    const f = (t: number, s: number[]) => [
      s[1],
      -(a0 + slope * (t - t0)) - 2 * zeta * omega * s[1] - omega * omega * s[0],
    ];
    const grid = solver.grid(dtS / 200, (_t: number, s: number[]) => {
      peaks.sdM = Math.max(peaks.sdM, Math.abs(s[0]));
      peaks.svMS = Math.max(peaks.svMS, Math.abs(s[1]));
      peaks.saMS2 = Math.max(peaks.saMS2, Math.abs(2 * zeta * omega * s[1] + omega * omega * s[0]));
    });
    y = solver.solve(f, t0, y, t0 + dtS, grid).y;
  }
  return peaks;
}

describe('the exact reference against ODEX', () => {
  const broadband = testRecord(11, 0.02, 4).accelMS2;
  const nearNyquist = sineRecord(24.5, 0.02, { durationS: 3 }).accelMS2;
  const rampedSine = sineRecord(3.5, 0.02, { rampS: 2, durationS: 4 }).accelMS2;
  it.each([
    ['broadband', broadband, 0.05, 0.05],
    ['broadband', broadband, 1.1, 0],
    ['broadband', broadband, 0.01, 0.5],
    ['broadband', broadband, 0.4, 1],
    ['broadband', broadband, 2, 2],
    ['a 24.5 Hz sine', nearNyquist, 0.03, 0.02],
    ['a ramped 3.5 Hz sine', rampedSine, 5, 0.05],
  ] as const)('on %s, T = %s s, ζ = %s: peaks within 1e-4', (_label, accel, periodS, zeta) => {
    const ours = exactPeaks(accel, 0.02, periodS, zeta);
    const reference = odexPeaks(accel, 0.02, periodS, zeta);
    for (const key of ['sdM', 'svMS', 'saMS2'] as const) {
      expect(Math.abs(ours[key] / reference[key] - 1)).toBeLessThan(1e-4);
      // A refined peak is never below a sampled one (to rounding).
      expect(ours[key]).toBeGreaterThan(reference[key] * (1 - 1e-9));
    }
  });
});
