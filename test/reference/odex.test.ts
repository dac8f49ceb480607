// Independent reference: ODEX (Hairer and Wanner's Gragg–Bulirsch–Stoer extrapolation code, the
// `odex` package from the registry) integrates u'' + 2ζωu' + ω²u = −a_g(t) with the record
// linearly interpolated, interval by interval, to tight tolerance.
import { Solver } from 'odex';
import { describe, expect, it } from 'vitest';
import { piecewiseExactCoefficients } from '../../src/oscillator/recurrence.js';
import { sweepOscillators } from '../../src/oscillator/sweep.js';
import { testRecord } from '../helpers/records.js';

/** u and v at every sample, and peaks of |u|, |v|, |ü + a_g| sampled 40 times per interval. */
function odexResponse(accel: Float64Array, dtS: number, periodS: number, zeta: number) {
  const omega = (2 * Math.PI) / periodS;
  const solver = new Solver(2);
  solver.absoluteTolerance = 1e-13;
  solver.relativeTolerance = 1e-13;
  solver.denseOutput = true;
  let y = [0, 0];
  const u = new Float64Array(accel.length);
  let pu = 0;
  let pv = 0;
  let ps = 0;
  for (let n = 0; n < accel.length - 1; n++) {
    const a0 = accel[n];
    const slope = (accel[n + 1] - a0) / dtS;
    const t0 = n * dtS;
    const f = (t: number, state: number[]) => [
      state[1],
      -(a0 + slope * (t - t0)) - 2 * zeta * omega * state[1] - omega * omega * state[0],
    ];
    const samples = 40;
    const result = solver.solve(
      f,
      t0,
      y,
      t0 + dtS,
      solver.grid(dtS / samples, (_t: number, state: number[]) => {
        pu = Math.max(pu, Math.abs(state[0]));
        pv = Math.max(pv, Math.abs(state[1]));
        ps = Math.max(ps, Math.abs(2 * zeta * omega * state[1] + omega * omega * state[0]));
      }),
    );
    y = result.y;
    u[n + 1] = y[0];
  }
  return { u, pu, pv, ps };
}

describe('against ODEX (Hairer and Wanner) for whole records', () => {
  const record = testRecord(11, 0.02, 6);

  it('piecewise-exact steps equal the ODE solution at every sample', () => {
    for (const [periodS, zeta] of [
      [0.15, 0.05],
      [1.1, 0],
      [0.4, 1],
      [2, 1.8],
    ]) {
      const reference = odexResponse(record.accelMS2, record.dtS, periodS, zeta);
      const c = piecewiseExactCoefficients((2 * Math.PI) / periodS, zeta, record.dtS);
      let u = 0;
      let v = 0;
      let worst = 0;
      const a = record.accelMS2;
      for (let n = 0; n < a.length - 1; n++) {
        const un = c.uu * u + c.uv * v + c.up0 * a[n] + c.up1 * a[n + 1];
        v = c.vu * u + c.vv * v + c.vp0 * a[n] + c.vp1 * a[n + 1];
        u = un;
        worst = Math.max(worst, Math.abs(u - reference.u[n + 1]));
      }
      expect(worst / reference.pu).toBeLessThan(1e-8);
    }
  });

  it('every method peaks within 0.5% of the ODE solution (the accuracy rule)', () => {
    const periods = [0.01, 0.03, 0.09, 0.3, 1, 3];
    const dampings = [0, 0.05, 0.5];
    const exact = dampings.map((zeta) =>
      periods.map((t) => odexResponse(record.accelMS2, record.dtS, t, zeta)),
    );
    for (const method of ['newmark-average', 'newmark-linear', 'piecewise-exact'] as const) {
      const peaks = sweepOscillators(record.accelMS2, record.dtS, { periodsS: periods, dampings, method });
      dampings.forEach((_zeta, d) => {
        periods.forEach((_t, p) => {
          const i = d * periods.length + p;
          const e = exact[d][p];
          // The reference's peaks are sampled 40 times a step, so they may sit a hair below.
          expect(Math.abs(peaks.sdM[i] / e.pu - 1)).toBeLessThan(0.005);
          expect(Math.abs(peaks.svMS[i] / e.pv - 1)).toBeLessThan(0.005);
          expect(Math.abs(peaks.saMS2[i] / e.ps - 1)).toBeLessThan(0.005);
        });
      });
    }
  });
});
