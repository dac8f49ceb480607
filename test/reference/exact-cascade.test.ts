// The exact cascade reference (exact-cascade.ts: mathjs's expm of the joint building–oscillator
// system, dense sampling, refined peaks) against an independent integrator: ODEX (Hairer and
// Wanner's Gragg–Bulirsch–Stoer extrapolation code, the `odex` package), interval by interval, to
// tight tolerance, its peaks sampled 200 times a step.
import { Solver } from 'odex';
import { describe, expect, it } from 'vitest';
import { testRecord } from '../helpers/records.js';
import { type ExactBuilding, exactCascadePeaks } from './exact-cascade.js';
import { sineRecord } from './families.js';

function odexCascadePeaks(accel: Float64Array, dtS: number, b: ExactBuilding, periodS: number, zeta: number) {
  const omega = (2 * Math.PI) / periodS;
  const wb = (2 * Math.PI) / b.periodS;
  const solver = new Solver(4);
  solver.absoluteTolerance = 1e-13;
  solver.relativeTolerance = 1e-13;
  solver.denseOutput = true;
  let y = [0, 0, 0, 0];
  const peaks = { sdM: 0, svMS: 0, saMS2: 0 };
  for (let n = 0; n < accel.length - 1; n++) {
    const a0 = accel[n];
    const slope = (accel[n + 1] - a0) / dtS;
    const t0 = n * dtS;
    const f = (t: number, s: number[]) => {
      const ag = a0 + slope * (t - t0);
      const qdd = -ag - 2 * b.damping * wb * s[1] - wb * wb * s[0];
      const floor = ag + b.modalFactor * qdd;
      return [s[1], qdd, s[3], -floor - 2 * zeta * omega * s[3] - omega * omega * s[2]];
    };
    const grid = solver.grid(dtS / 200, (_t: number, s: number[]) => {
      peaks.sdM = Math.max(peaks.sdM, Math.abs(s[2]));
      peaks.svMS = Math.max(peaks.svMS, Math.abs(s[3]));
      peaks.saMS2 = Math.max(peaks.saMS2, Math.abs(2 * zeta * omega * s[3] + omega * omega * s[2]));
    });
    y = solver.solve(f, t0, y, t0 + dtS, grid).y;
  }
  // The record's last instant (the dense grid of each interval starts at its beginning): an
  // undamped oscillator in resonance with the building peaks there.
  peaks.sdM = Math.max(peaks.sdM, Math.abs(y[2]));
  peaks.svMS = Math.max(peaks.svMS, Math.abs(y[3]));
  peaks.saMS2 = Math.max(peaks.saMS2, Math.abs(2 * zeta * omega * y[3] + omega * omega * y[2]));
  return peaks;
}

describe('the exact cascade reference against ODEX', () => {
  const broadband = testRecord(13, 0.02, 4).accelMS2;
  const rampedSine = sineRecord(3.5, 0.02, { rampS: 2, durationS: 4 }).accelMS2;
  const stiff = { periodS: 0.08, damping: 0.05, modalFactor: 1.4 };
  const flexible = { periodS: 1.2, damping: 0.02, modalFactor: 1.5 };
  it.each([
    { label: 'broadband', accel: broadband, building: stiff, periodS: 0.05, zeta: 0.05 },
    { label: 'broadband', accel: broadband, building: flexible, periodS: 1.2, zeta: 0 },
    { label: 'broadband', accel: broadband, building: stiff, periodS: 0.02, zeta: 0.5 },
    { label: 'broadband', accel: broadband, building: flexible, periodS: 0.3, zeta: 2 },
    { label: 'a ramped 3.5 Hz sine', accel: rampedSine, building: flexible, periodS: 0.29, zeta: 0.05 },
  ])(
    'on $label, T_b = $building.periodS s, T = $periodS s, ζ = $zeta: peaks within 1e-4',
    ({ accel, building, periodS, zeta }) => {
      const ours = exactCascadePeaks(accel, 0.02, building, periodS, zeta);
      const reference = odexCascadePeaks(accel, 0.02, building, periodS, zeta);
      for (const key of ['sdM', 'svMS', 'saMS2'] as const) {
        expect(Math.abs(ours[key] / reference[key] - 1), key).toBeLessThan(1e-4);
        expect(ours[key]).toBeGreaterThan(reference[key] * (1 - 1e-9));
      }
    },
  );
});
