import { describe, expect, it } from 'vitest';
import { createRecord, type GroundRecord } from '../../src/record/record.js';
import { type RotDSpectra, rotDSpectra } from '../../src/spectrum/rotd.js';
import { RotDPool, rotDSpectraParallel } from '../../src/threads/rotd-pool.js';

// Worker threads run the built library (dist/), which the global setup builds. Each (damping,
// period) cell is computed by one thread as rotDSpectra computes it, so dealing the cells out
// over threads must change no bit (common practice for a deterministic parallel computation
// without sums across threads).

/** Invented test motions, m/s². */
function component(name: string, f1: number, f2: number, phase: number): GroundRecord {
  const accelMS2 = Float64Array.from({ length: 800 }, (_, i) => {
    const t = i * 0.01;
    const envelope = Math.exp(-(((t - 3) / 1.5) ** 2));
    return envelope * (1.5 * Math.sin(2 * Math.PI * f1 * t + phase) + 0.5 * Math.sin(2 * Math.PI * f2 * t));
  });
  return createRecord({ name, dtS: 0.01, accelMS2 });
}

const one = component('one', 1.4, 4.6, 0);
const two = component('two', 0.8, 6.1, 0.7);
const periodsS = [0, 0.1, 0.35, 1, 2.5];
const dampings = [0.05, 0.1];

function expectSameBits(a: RotDSpectra, b: RotDSpectra): void {
  expect(Array.from(a.periodsS)).toEqual(Array.from(b.periodsS));
  expect(a.curves.map((curve) => curve.damping)).toEqual(b.curves.map((curve) => curve.damping));
  a.curves.forEach((curve, d) => {
    for (const key of ['rotd50MS2', 'rotd100MS2', 'geomeanMS2'] as const) {
      expect(Array.from(curve[key])).toEqual(Array.from(b.curves[d][key]));
      expect(curve[key].buffer).not.toBeInstanceOf(SharedArrayBuffer);
    }
  });
}

describe('RotDPool', () => {
  it('gives the single-thread bits from one pool for two pairs and both kernels, then closes', async () => {
    const grid = { periodsS, dampings, method: 'piecewise-exact' as const };
    const pool = new RotDPool(2);
    try {
      for (const [a, b, kernel] of [
        [one, two, 'wasm'],
        [two, one, 'js'],
      ] as const) {
        expectSameBits(await pool.rotd(a, b, { ...grid, kernel }), rotDSpectra(a, b, { ...grid, kernel }));
      }
      await expect(pool.rotd(one, two, { ...grid, angleStepDeg: 0.7 })).rejects.toThrow(/angle step/);
    } finally {
      await pool.close();
    }
  });
});

describe('rotDSpectraParallel', () => {
  it.each([1, 2, 3])('gives the same bits on %s threads as rotDSpectra', async (threads) => {
    const grid = { periodsS, dampings, method: 'newmark-average' as const };
    expectSameBits(await rotDSpectraParallel(one, two, { ...grid, threads }), rotDSpectra(one, two, grid));
  });
});
