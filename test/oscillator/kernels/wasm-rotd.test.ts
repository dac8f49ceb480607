import { describe, expect, it } from 'vitest';
import { WasmRotD } from '../../../src/oscillator/kernels/wasm-rotd.js';
import { hermitePeak } from '../../../src/oscillator/peak.js';
import { type StepCoefficients, stepCoefficients } from '../../../src/oscillator/recurrence.js';
import { synthesizeRecord } from '../../../src/record/synth.js';

const STEP = ['uu', 'uv', 'up0', 'up1', 'vu', 'vv', 'vp0', 'vp1'] as const;
const a1 = synthesizeRecord({ seed: 61, dtS: 0.01, durationS: 12 }).accelMS2;
const a2 = synthesizeRecord({ seed: 62, dtS: 0.01, durationS: 12 }).accelMS2;
const degrees = [0, 17, 90, 133]; // and an odd count below, for the padding lane
const cosOf = (list: number[]) => Float64Array.from(list, (d) => Math.cos((d * Math.PI) / 180));
const sinOf = (list: number[]) => Float64Array.from(list, (d) => Math.sin((d * Math.PI) / 180));

/**
 * Peak |u(θ)| by rotating the two responses directly: u(θ) = u₁ cos θ + u₂ sin θ (the oscillator
 * is linear; Boore 2010), each component stepped with one step a sample, and the cubic Hermite
 * peak taken inside every step.
 */
function directPeaks(c: StepCoefficients, h: number, angles: number[]): number[] {
  let [u1, v1, u2, v2] = [0, 0, 0, 0];
  const peaks = angles.map(() => 0);
  for (let n = 0; n + 1 < a1.length; n++) {
    const next1 = [c.uu * u1 + c.uv * v1 + c.up0 * a1[n] + c.up1 * a1[n + 1], 0];
    next1[1] = c.vu * u1 + c.vv * v1 + c.vp0 * a1[n] + c.vp1 * a1[n + 1];
    const next2 = [c.uu * u2 + c.uv * v2 + c.up0 * a2[n] + c.up1 * a2[n + 1], 0];
    next2[1] = c.vu * u2 + c.vv * v2 + c.vp0 * a2[n] + c.vp1 * a2[n + 1];
    angles.forEach((d, k) => {
      const [cos, sin] = [Math.cos((d * Math.PI) / 180), Math.sin((d * Math.PI) / 180)];
      const peak = hermitePeak(
        cos * u1 + sin * u2,
        cos * next1[0] + sin * next2[0],
        cos * v1 + sin * v2,
        cos * next1[1] + sin * next2[1],
        h,
      );
      peaks[k] = Math.max(peaks[k], peak);
    });
    [u1, v1, u2, v2] = [next1[0], next1[1], next2[0], next2[1]];
  }
  return peaks;
}

describe('WasmRotD', () => {
  const h = 0.01;
  const c = stepCoefficients('piecewise-exact', (2 * Math.PI) / 0.8, 0.05, h);
  const coefficients = STEP.map((key) => c[key]);

  it('gives the peaks of the directly rotated response, refining every step (threshold 0)', () => {
    for (const angles of [degrees, degrees.slice(0, 3)]) {
      const loop = new WasmRotD(a1, a2, cosOf(angles), sinOf(angles));
      const out = new Float64Array(angles.length);
      // ratio 0 and offset 0: every step whose end is not 0 is refined.
      loop.run(coefficients, 1, h, 0, 0, out);
      const direct = directPeaks(c, h, angles);
      for (let k = 0; k < angles.length; k++) expect(out[k] / direct[k]).toBeCloseTo(1, 12);
      expect(Math.min(...out)).toBeGreaterThan(0);
    }
  });

  it('keeps each loop’s inputs apart when two share the thread’s instance', () => {
    const one = new WasmRotD(a1, a2, cosOf(degrees), sinOf(degrees));
    const swapped = new WasmRotD(a2, a1, cosOf(degrees), sinOf(degrees));
    const first = new Float64Array(4);
    const second = new Float64Array(4);
    const again = new Float64Array(4);
    one.run(coefficients, 1, h, 0, 0, first);
    swapped.run(coefficients, 1, h, 0, 0, second);
    one.run(coefficients, 1, h, 0, 0, again);
    expect(Array.from(again)).toEqual(Array.from(first));
    // Swapping the components turns θ = 0 into θ = 90° (u₁ and u₂ trade places).
    expect(second[0]).toBeCloseTo(first[2], 12);
    expect(second[2]).toBeCloseTo(first[0], 12);
  });
});
