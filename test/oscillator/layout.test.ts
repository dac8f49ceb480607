import { describe, expect, it } from 'vitest';
// @ts-expect-error: a build script in JavaScript, without type declarations.
import * as loops from '../../scripts/wasm-kernel-loops.mjs';
import {
  CHECKPOINT_MAXIMA,
  CHECKPOINT_STRIDE,
  COEFFICIENT,
  COEFFICIENT_STRIDE,
  GROUP_WIDTH,
  PEAK_STRIDE,
  STATE_STRIDE,
  STEP_KEYS,
} from '../../src/oscillator/layout.js';
import { packCoefficients } from '../../src/oscillator/plan.js';
import { stepCoefficients } from '../../src/oscillator/recurrence.js';

describe('the kernels’ memory layout', () => {
  it('gives every value of a row its own place, 0 to COEFFICIENT_STRIDE − 1, the step first', () => {
    const places = Object.values(COEFFICIENT).sort((a, b) => a - b);
    expect(places).toEqual(Array.from({ length: COEFFICIENT_STRIDE }, (_, i) => i));
    expect(STEP_KEYS.map((key) => COEFFICIENT[key])).toEqual([0, 1, 2, 3, 4, 5, 6, 7]);
    // The step's keys are those of the recurrence (recurrence.ts).
    expect(Object.keys(stepCoefficients('newmark-average', 3, 0.05, 0.01)).sort()).toEqual(
      [...STEP_KEYS].sort(),
    );
  });

  it('is packed as it says: the step, c = 2ζω, k = ω², then the threshold', () => {
    const omega = (2 * Math.PI) / 0.7;
    const row = new Float64Array(2 * COEFFICIENT_STRIDE).fill(Number.NaN);
    const bounds = { pgaMS2: 2, jerkMS3: 90 };
    packCoefficients(row, 1, { periodS: 0.7, damping: 0.1 }, 'piecewise-exact', 0.005, bounds);
    const slot = row.subarray(COEFFICIENT_STRIDE);
    const exact = stepCoefficients('piecewise-exact', omega, 0.1, 0.005); // not pre-warped: exact already
    for (const key of STEP_KEYS) expect(slot[COEFFICIENT[key]]).toBe(exact[key]);
    expect(slot[COEFFICIENT.c]).toBeCloseTo(2 * 0.1 * omega, 12);
    expect(slot[COEFFICIENT.k]).toBeCloseTo(omega * omega, 12);
    // r = 1 − ½·1.1·(ωh)², d_u = ½·1.1·h²·PGA (refinementThresholds in peak.ts).
    expect(slot[COEFFICIENT.ratio]).toBeCloseTo(1 - 0.55 * (omega * 0.005) ** 2, 14);
    expect(slot[COEFFICIENT.du]).toBeCloseTo(0.55 * 0.005 ** 2 * 2, 14);
    expect(Array.from(row.subarray(0, COEFFICIENT_STRIDE)).every(Number.isNaN)).toBe(true); // slot 0 untouched
  });

  it('has the strides the kernel generator lays its vectors out with (scripts/wasm-kernel-loops.mjs)', () => {
    // Two oscillators per f64x2 vector: every value of a vector takes 16 bytes.
    expect(loops.VECTORS * 2).toBe(GROUP_WIDTH);
    expect(loops.CHECKPOINT_BYTES).toBe(CHECKPOINT_STRIDE * 16);
    expect(loops.PEAK_BYTES).toBe(PEAK_STRIDE * 16);
    // A checkpoint holds u and v, then one largest value per peak; the state u and v, then one
    // threshold per peak.
    expect(CHECKPOINT_MAXIMA).toBe(2);
    expect(CHECKPOINT_STRIDE).toBe(CHECKPOINT_MAXIMA + PEAK_STRIDE);
    expect(STATE_STRIDE).toBe(2 + PEAK_STRIDE);
    expect(loops.STATE_BYTES).toBe(2 * 16);
    expect(loops.maximum(0)).toBe(CHECKPOINT_MAXIMA * 16);
  });
});
