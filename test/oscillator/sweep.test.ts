import { describe, expect, it } from 'vitest';
import { checkpointBlockSteps } from '../../src/oscillator/kernels/wasm.js';
import { hermitePeak } from '../../src/oscillator/peak.js';
import { recordRoughness } from '../../src/oscillator/record-statistics.js';
import {
  composeSteps,
  type Method,
  prewarpedOscillator,
  stepCoefficients,
} from '../../src/oscillator/recurrence.js';
import { executionPlan, substepCount } from '../../src/oscillator/substeps.js';
import { sweepOscillators } from '../../src/oscillator/sweep.js';
import { sineRecord, testRecord } from '../helpers/records.js';

/**
 * The sweep's peaks without its threshold test: Hermite refinement on every executed step (the
 * method's sub-steps composed as executionPlan says).
 */
function bruteForcePeaks(accel: Float64Array, dtS: number, periodS: number, zeta: number, method: Method) {
  const roughness = recordRoughness(accel);
  const substeps = substepCount(method, periodS, dtS, {
    damping: zeta,
    durationS: (accel.length - 1) * dtS,
    roughness,
  });
  const { steps: m, composed } = executionPlan(substeps, periodS, dtS, roughness);
  const h = dtS / m;
  const omega = (2 * Math.PI) / periodS;
  const w = prewarpedOscillator(method, omega, zeta, h / composed);
  const co = composeSteps(stepCoefficients(method, w.omegaRadS, w.damping, h / composed), composed);
  const c = 2 * zeta * omega;
  const k = omega * omega;
  let u = 0;
  let v = 0;
  let pu = 0;
  let pv = 0;
  let ps = 0;
  for (let n = 0; n < accel.length - 1; n++) {
    for (let j = 0; j < m; j++) {
      const pa = accel[n] + ((accel[n + 1] - accel[n]) * j) / m;
      const pb = j + 1 === m ? accel[n + 1] : accel[n] + ((accel[n + 1] - accel[n]) * (j + 1)) / m;
      const un = co.uu * u + co.uv * v + co.up0 * pa + co.up1 * pb;
      const vn = co.vu * u + co.vv * v + co.vp0 * pa + co.vp1 * pb;
      const so = -(c * v + k * u);
      const sn = -(c * vn + k * un);
      pu = Math.max(pu, hermitePeak(u, un, v, vn, h));
      pv = Math.max(pv, hermitePeak(v, vn, so - pa, sn - pb, h));
      ps = Math.max(ps, hermitePeak(so, sn, -c * (so - pa) - k * v, -c * (sn - pb) - k * vn, h));
      u = un;
      v = vn;
    }
  }
  return [pu, pv, ps];
}

describe('sweepOscillators', () => {
  it('skips no peak that refinement on every step would find (threshold rule of sweep.ts)', () => {
    const record = testRecord(5, 0.02, 12);
    const periods = [0.01, 0.037, 0.12, 0.5, 2.2, 9];
    const dampings = [0, 0.05, 0.5];
    for (const [method, kernel] of [
      ['newmark-average', 'wasm'],
      ['newmark-linear', 'wasm'],
      ['piecewise-exact', 'wasm'],
      ['newmark-average', 'js'],
      ['piecewise-exact', 'js'],
    ] as const) {
      const options = { periodsS: periods, dampings, method, kernel };
      const peaks = sweepOscillators(record.accelMS2, record.dtS, options);
      dampings.forEach((zeta, d) => {
        periods.forEach((t, p) => {
          const i = d * periods.length + p;
          const [u, v, s] = bruteForcePeaks(record.accelMS2, record.dtS, t, zeta, method);
          expect(peaks.sdM[i] / u).toBeCloseTo(1, 12);
          expect(peaks.svMS[i] / v).toBeCloseTo(1, 12);
          expect(peaks.saMS2[i] / s).toBeCloseTo(1, 12);
        });
      });
    }
  });

  it('skips no peak that refinement on every step would find when the blocks are longer', () => {
    // T = 0.01 s on a 0.02 s record executes 20 steps a sample: 1.2 million steps in all, so the
    // checkpoints are kept every 128 steps rather than 64.
    const record = testRecord(9, 0.02, 1200);
    const total = (record.accelMS2.length - 1) * 20;
    expect(checkpointBlockSteps(total)).toBe(128);
    const [u, v, s] = bruteForcePeaks(record.accelMS2, record.dtS, 0.01, 0.05, 'piecewise-exact');
    for (const kernel of ['wasm', 'js'] as const) {
      const options = { periodsS: [0.01], dampings: [0.05], method: 'piecewise-exact', kernel } as const;
      const peaks = sweepOscillators(record.accelMS2, record.dtS, options);
      expect(peaks.oscillatorSteps).toBe(total);
      expect(peaks.sdM[0] / u).toBeCloseTo(1, 12);
      expect(peaks.svMS[0] / v).toBeCloseTo(1, 12);
      expect(peaks.saMS2[0] / s).toBeCloseTo(1, 12);
    }
  });

  it('treats T = 0 as rigid: SD = SV = 0 and SA = PGA (common practice)', () => {
    const record = testRecord(2);
    const peaks = sweepOscillators(record.accelMS2, record.dtS, { periodsS: [0, 0.5], dampings: [0.05] });
    let pga = 0;
    for (const a of record.accelMS2) pga = Math.max(pga, Math.abs(a));
    expect(peaks.sdM[0]).toBe(0);
    expect(peaks.svMS[0]).toBe(0);
    expect(peaks.saMS2[0]).toBe(pga);
  });

  it('gives the same peaks whatever the grouping of oscillators', () => {
    const record = testRecord(3, 0.01, 8);
    const periods = [0.02, 0.1, 0.33, 1, 3];
    const all = sweepOscillators(record.accelMS2, record.dtS, { periodsS: periods, dampings: [0.02, 0.1] });
    periods.forEach((t, p) => {
      const one = sweepOscillators(record.accelMS2, record.dtS, { periodsS: [t], dampings: [0.1] });
      expect(one.sdM[0]).toBe(all.sdM[periods.length + p]);
      expect(one.saMS2[0]).toBe(all.saMS2[periods.length + p]);
    });
  });

  it('refuses negative periods, negative damping and empty grids', () => {
    const record = testRecord(1, 0.02, 2);
    expect(() => sweepOscillators(record.accelMS2, 0.02, { periodsS: [-1], dampings: [0.05] })).toThrow(
      /periods/,
    );
    expect(() => sweepOscillators(record.accelMS2, 0.02, { periodsS: [1], dampings: [-0.1] })).toThrow(
      /damping/,
    );
    expect(() => sweepOscillators(record.accelMS2, 0.02, { periodsS: [], dampings: [0.05] })).toThrow(
      /empty/,
    );
  });

  // Steady-state base excitation a_g = a0 sin Ωt (Chopra, Dynamics of Structures, §3.2 and §3.6):
  // |u| = (a0/ω²) / √((1 − r²)² + (2ζr)²), r = Ω/ω. The sine is brought in by a
  // half-cosine ramp over 40 cycles so that the start-up transient is negligible and the peak is the steady state.
  it.each([
    [0.5, 0.05],
    [1, 0.2],
    [2, 0.2],
    [1, 0.5],
    [1.3, 0.05],
  ])('matches steady-state harmonic response at r = %s, ζ = %s', (r, zeta) => {
    const forcingPeriodS = 1;
    const perCycle = 200;
    const dtS = forcingPeriodS / perCycle;
    const rampS = 40 * forcingPeriodS;
    const n = 100 * perCycle + 1;
    const accelMS2 = new Float64Array(n);
    for (let i = 0; i < n; i++) {
      const t = i * dtS;
      const ramp = t < rampS ? 0.5 - 0.5 * Math.cos((Math.PI * t) / rampS) : 1;
      accelMS2[i] = 2 * ramp * Math.sin((2 * Math.PI * t) / forcingPeriodS);
    }
    const periodS = forcingPeriodS * r; // ω = Ω / r
    for (const method of ['piecewise-exact', 'newmark-average'] as const) {
      const peaks = sweepOscillators(accelMS2, dtS, { periodsS: [periodS], dampings: [zeta], method });
      const omega = (2 * Math.PI) / periodS;
      const steady = 2 / (omega * omega) / Math.sqrt((1 - r * r) ** 2 + (2 * zeta * r) ** 2);
      expect(peaks.sdM[0] / steady).toBeCloseTo(1, 2);
    }
  });

  // Undamped resonance (Chopra §3.1): u(t) = (a0/2ω²)(ωt cos ωt − sin ωt), whose envelope grows as
  // a0·t/(2ω); after N cycles the peak is a0·N·T/(2ω) to within the last half cycle.
  it('grows with the envelope a0·t/(2ω) at undamped resonance', () => {
    const cycles = 40;
    const { accelMS2, dtS } = sineRecord(1, 0.5, cycles, 100);
    for (const method of ['newmark-average', 'newmark-linear', 'piecewise-exact'] as const) {
      const peaks = sweepOscillators(accelMS2, dtS, { periodsS: [0.5], dampings: [0], method });
      const omega = (2 * Math.PI) / 0.5;
      const duration = cycles * 0.5;
      const envelope = duration / (2 * omega);
      expect(peaks.sdM[0] / envelope).toBeGreaterThan(0.98);
      expect(peaks.sdM[0] / envelope).toBeLessThan(1.005);
    }
  });

  it('approaches PGA as T → 0 (common practice)', () => {
    const record = testRecord(4, 0.01, 10);
    let pga = 0;
    for (const a of record.accelMS2) pga = Math.max(pga, Math.abs(a));
    const peaks = sweepOscillators(record.accelMS2, record.dtS, { periodsS: [0.001], dampings: [0.05] });
    const omega = 2 * Math.PI * 1000;
    expect((omega * omega * peaks.sdM[0]) / pga).toBeCloseTo(1, 2);
    expect(peaks.saMS2[0] / pga).toBeCloseTo(1, 2);
  });

  it('approaches the peak ground displacement at long periods (common practice)', () => {
    const record = testRecord(6, 0.01, 30);
    // Ground displacement by the trapezoidal rule from rest, twice.
    let v = 0;
    let d = 0;
    let pgd = 0;
    const a = record.accelMS2;
    for (let i = 1; i < a.length; i++) {
      const vNew = v + 0.5 * (a[i - 1] + a[i]) * record.dtS;
      d += 0.5 * (v + vNew) * record.dtS;
      v = vNew;
      pgd = Math.max(pgd, Math.abs(d));
    }
    // T = 5000 s over a 30 s record: ωt < 0.04, so the spring barely acts and u = −u_g.
    const peaks = sweepOscillators(a, record.dtS, {
      periodsS: [5000],
      dampings: [0],
      method: 'piecewise-exact',
    });
    expect(peaks.sdM[0] / pgd).toBeCloseTo(1, 3);
  });
});
