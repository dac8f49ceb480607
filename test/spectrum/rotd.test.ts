import { describe, expect, it } from 'vitest';
import type { Method } from '../../src/oscillator/recurrence.js';
import { createRecord, type GroundRecord } from '../../src/record/record.js';
import { rotDSpectra } from '../../src/spectrum/rotd.js';
import { responseSpectrum } from '../../src/spectrum/spectrum.js';

/** Invented test motions, m/s². */
function component(name: string, f1: number, f2: number, phase: number, count = 800): GroundRecord {
  const accelMS2 = Float64Array.from({ length: count }, (_, i) => {
    const t = i * 0.01;
    const envelope = Math.exp(-(((t - 3) / 1.5) ** 2));
    return envelope * (1.5 * Math.sin(2 * Math.PI * f1 * t + phase) + 0.5 * Math.sin(2 * Math.PI * f2 * t));
  });
  return createRecord({ name, dtS: 0.01, accelMS2 });
}

const one = component('one', 1.4, 4.6, 0);
const two = component('two', 0.8, 6.1, 0.7);
const zero = createRecord({ name: 'zero', dtS: 0.01, accelMS2: new Float64Array(one.accelMS2.length) });
const periodsS = [0, 0.1, 0.35, 1, 2.5];
const dampings = [0.05, 0.1];

/** Median over the angles k·1°, k = 0…179, of f(k°), with the mean of the two middle values. */
function medianOverAngles(f: (radians: number) => number): number {
  const values = Array.from({ length: 180 }, (_, k) => f((k * Math.PI) / 180)).sort((a, b) => a - b);
  return 0.5 * (values[89] + values[90]);
}

describe('RotD50, RotD100 and geometric mean (Boore 2010)', () => {
  for (const method of ['newmark-average', 'piecewise-exact'] as Method[]) {
    it(`a record paired with itself: RotD100 = √2 PSA (closed form: u(θ) = u₁(cos θ + sin θ)), ${method}`, () => {
      const own = responseSpectrum(one, { periodsS, dampings, method });
      const rotd = rotDSpectra(one, one, { periodsS, dampings, method });
      const rotd50 = medianOverAngles((t) => Math.abs(Math.cos(t) + Math.sin(t)));
      for (let d = 0; d < dampings.length; d++) {
        for (let p = 0; p < periodsS.length; p++) {
          const psa = own.curves[d].psaMS2[p];
          expect(rotd.curves[d].rotd100MS2[p] / psa).toBeCloseTo(Math.SQRT2, 9);
          expect(rotd.curves[d].rotd50MS2[p] / psa).toBeCloseTo(rotd50, 9);
          expect(rotd.curves[d].geomeanMS2[p] / psa).toBeCloseTo(1, 12); // √(PSA · PSA)
        }
      }
    });
  }

  it('with a zero second component: RotD50 = median |cos θ| · PSA, RotD100 = PSA (closed form)', () => {
    const own = responseSpectrum(one, { periodsS, dampings });
    const rotd = rotDSpectra(one, zero, { periodsS, dampings });
    const median = medianOverAngles((t) => Math.abs(Math.cos(t)));
    expect(median).toBeCloseTo(Math.SQRT1_2, 12); // |cos 45°| = |cos 135°| are the middle values
    for (let d = 0; d < dampings.length; d++) {
      for (let p = 0; p < periodsS.length; p++) {
        const psa = own.curves[d].psaMS2[p];
        expect(rotd.curves[d].rotd50MS2[p] / psa).toBeCloseTo(median, 9);
        expect(rotd.curves[d].rotd100MS2[p] / psa).toBeCloseTo(1, 12);
        expect(rotd.curves[d].geomeanMS2[p]).toBe(0);
      }
    }
  });

  it('does not depend on how the sensors were oriented (rotating the pair by 30° permutes the angles)', () => {
    const c = Math.cos(Math.PI / 6);
    const s = Math.sin(Math.PI / 6);
    const n = one.accelMS2.length;
    const r1 = createRecord({
      name: 'r1',
      dtS: 0.01,
      accelMS2: Float64Array.from({ length: n }, (_, i) => c * one.accelMS2[i] + s * two.accelMS2[i]),
    });
    const r2 = createRecord({
      name: 'r2',
      dtS: 0.01,
      accelMS2: Float64Array.from({ length: n }, (_, i) => -s * one.accelMS2[i] + c * two.accelMS2[i]),
    });
    const a = rotDSpectra(one, two, { periodsS, dampings: [0.05] });
    const b = rotDSpectra(r1, r2, { periodsS, dampings: [0.05] });
    for (let p = 0; p < periodsS.length; p++) {
      expect(b.curves[0].rotd50MS2[p] / a.curves[0].rotd50MS2[p]).toBeCloseTo(1, 9);
      expect(b.curves[0].rotd100MS2[p] / a.curves[0].rotd100MS2[p]).toBeCloseTo(1, 9);
    }
    // The geometric mean of the components as recorded is not orientation-independent (Boore 2010).
    const geo = a.curves[0].geomeanMS2;
    expect(geo[2]).toBeLessThanOrEqual(a.curves[0].rotd100MS2[2]);
  });

  it('RotD50 ≤ RotD100 and geometric mean ≤ RotD100 (definitions)', () => {
    const rotd = rotDSpectra(one, two, { periodsS, dampings, angleStepDeg: 0.5 });
    for (const curve of rotd.curves) {
      for (let p = 0; p < periodsS.length; p++) {
        expect(curve.rotd50MS2[p]).toBeLessThanOrEqual(curve.rotd100MS2[p]);
        expect(curve.geomeanMS2[p]).toBeLessThanOrEqual(curve.rotd100MS2[p] * (1 + 1e-12));
      }
    }
  });

  it('pads the shorter component with zeros, and refuses different steps', () => {
    const short = createRecord({ name: 'short', dtS: 0.01, accelMS2: two.accelMS2.slice(0, 500) });
    const padded = new Float64Array(two.accelMS2.length);
    padded.set(short.accelMS2);
    const long = createRecord({ name: 'padded', dtS: 0.01, accelMS2: padded });
    const a = rotDSpectra(one, short, { periodsS, dampings: [0.05] });
    const b = rotDSpectra(one, long, { periodsS, dampings: [0.05] });
    expect(a.paddedSamples).toBe(one.accelMS2.length - 500);
    expect(Array.from(a.curves[0].rotd50MS2)).toEqual(Array.from(b.curves[0].rotd50MS2));
    const coarse = createRecord({ name: 'coarse', dtS: 0.02, accelMS2: two.accelMS2 });
    expect(() => rotDSpectra(one, coarse, { periodsS, dampings: [0.05] })).toThrow(/different time steps/);
    expect(() => rotDSpectra(one, two, { periodsS, dampings: [0.05], angleStepDeg: 2 })).toThrow(
      /angle step/,
    );
    expect(() => rotDSpectra(one, two, { periodsS, dampings: [0.05], angleStepDeg: 0.7 })).toThrow(
      /angle step/,
    );
    // 1e-5° divides 180° but means 18 million angles (once minutes of work): refused below 0.01°.
    expect(() => rotDSpectra(one, two, { periodsS, dampings: [0.05], angleStepDeg: 1e-5 })).toThrow(
      /angle step 0\.00001°: use a divisor of 180° from 0\.01° to 1°/,
    );
  });
});

describe('RotD kernels', () => {
  // assembly/rotd.ts repeats the TypeScript loop's operations in the same order, two angles to a
  // vector, so the two kernels give the same bits (and the refinement the same peaks).
  it.each(['newmark-average', 'newmark-linear', 'piecewise-exact'] as const)(
    '%s: wasm and js agree bit for bit',
    (method) => {
      const grid = { periodsS: [0, 0.02, 0.1, 0.35, 1, 2.5], dampings: [0, 0.05], method };
      for (const angleStepDeg of [1, 180 / 181]) {
        const wasm = rotDSpectra(one, two, { ...grid, angleStepDeg, kernel: 'wasm' });
        const js = rotDSpectra(one, two, { ...grid, angleStepDeg, kernel: 'js' });
        wasm.curves.forEach((curve, d) => {
          expect(Array.from(curve.rotd50MS2)).toEqual(Array.from(js.curves[d].rotd50MS2));
          expect(Array.from(curve.rotd100MS2)).toEqual(Array.from(js.curves[d].rotd100MS2));
          expect(Array.from(curve.geomeanMS2)).toEqual(Array.from(js.curves[d].geomeanMS2));
        });
      }
    },
  );
});
