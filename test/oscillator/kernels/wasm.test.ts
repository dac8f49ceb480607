import { describe, expect, it } from 'vitest';
import { logSpaced } from '../../../src/oscillator/grid.js';
import { groupRunner, resolveKernel } from '../../../src/oscillator/group-runner.js';
import { checkpointBlockSteps, wasmSimdSupported } from '../../../src/oscillator/kernels/wasm.js';
import { planSweep } from '../../../src/oscillator/plan.js';
import { METHODS } from '../../../src/oscillator/recurrence.js';
import { type Peaks, sweepOscillators } from '../../../src/oscillator/sweep.js';
import { synthesizeRecord } from '../../../src/record/synth.js';
import { rotDSpectra } from '../../../src/spectrum/rotd.js';

// The TypeScript kernel (src/oscillator/kernels/reference.ts) is the reference: the WebAssembly SIMD kernel
// implements the same recurrence, threshold test and Hermite refinement, so the two must agree
// to rounding (1e-12 relative, the tolerance the project sets for the two kernels).
function worstRelative(a: Peaks, b: Peaks): number {
  let worst = 0;
  for (const key of ['sdM', 'svMS', 'saMS2'] as const) {
    for (let i = 0; i < a[key].length; i++) {
      const x = a[key][i];
      const y = b[key][i];
      const scale = Math.max(Math.abs(x), Math.abs(y));
      if (scale > 0) worst = Math.max(worst, Math.abs(x - y) / scale);
      else if (x !== y) worst = Number.POSITIVE_INFINITY;
    }
  }
  return worst;
}

// Records of lengths that are multiples of nothing in particular (not of the 8-wide pass, nor
// of the 8192-step block), at three time steps; the short periods are sub-stepped up to 66
// times, so sub-stepped groups run over several blocks.
const records = [
  synthesizeRecord({ seed: 11, dtS: 0.01, durationS: 20.46 }),
  synthesizeRecord({ seed: 12, dtS: 0.005, durationS: 17.33 }),
  synthesizeRecord({ seed: 13, dtS: 0.02, durationS: 41.98, pgaG: 0.6 }),
];
// 0, then 19 periods from 0.01 to 10 s: with five dampings, 95 stepped oscillators, so the last
// group of each sub-step count is partly filled.
const periodsS = [0, ...logSpaced(0.01, 10, 19)];
const dampings = [0, 0.02, 0.05, 0.2, 0.5];

describe('WebAssembly SIMD kernel', () => {
  it('is detected on this engine (Node 20 has WebAssembly SIMD)', () => {
    expect(wasmSimdSupported()).toBe(true);
  });

  it('keeps checkpoint blocks of 64 steps up to 16,384 blocks, then doubles them up to 8,192 steps', () => {
    expect(checkpointBlockSteps(40_000)).toBe(64);
    expect(checkpointBlockSteps(64 * 16_384)).toBe(64);
    expect(checkpointBlockSteps(64 * 16_384 + 1)).toBe(128);
    expect(checkpointBlockSteps(2e9)).toBe(8192);
  });

  it('falls back to the TypeScript kernel where SIMD is missing, and refuses a forced wasm there', () => {
    expect(resolveKernel('auto', false)).toBe('js');
    expect(resolveKernel('auto', true)).toBe('wasm');
    expect(resolveKernel('js', true)).toBe('js');
    expect(() => resolveKernel('wasm', false)).toThrow(/SIMD/);
  });

  for (const method of METHODS) {
    it(`agrees with the TypeScript kernel to 1e-12 for ${method} on every test record`, () => {
      for (const record of records) {
        const options = { periodsS, dampings, method };
        const js = sweepOscillators(record.accelMS2, record.dtS, { ...options, kernel: 'js' });
        const wasm = sweepOscillators(record.accelMS2, record.dtS, { ...options, kernel: 'wasm' });
        expect(worstRelative(js, wasm)).toBeLessThan(1e-12);
        expect(wasm.oscillatorSteps).toBe(js.oscillatorSteps);
        // The test has teeth: the peaks are not all zero, and sub-stepping did happen.
        expect(Math.min(...wasm.sdM.filter((_, i) => periodsS[i % periodsS.length] > 0))).toBeGreaterThan(0);
        expect(wasm.oscillatorSteps).toBeGreaterThan(95 * (record.accelMS2.length - 1));
      }
    });
  }

  it('agrees on a record far longer than one block without sub-steps', () => {
    const record = synthesizeRecord({ seed: 14, dtS: 0.01, durationS: 300.07 });
    const options = { periodsS: [0.4, 0.9, 2.5, 7], dampings: [0, 0.05] };
    const js = sweepOscillators(record.accelMS2, record.dtS, { ...options, kernel: 'js' });
    const wasm = sweepOscillators(record.accelMS2, record.dtS, { ...options, kernel: 'wasm' });
    expect(worstRelative(js, wasm)).toBeLessThan(1e-12);
  });

  it('keeps two records apart when their sweeps take turns on the one instance of the kernel', () => {
    // The WebAssembly kernel has one instance (and memory) per thread, shared by all sweeps; a
    // sweep whose record another has replaced there must load its own again.
    const [first, second] = [records[0], records[2]];
    const options = { periodsS: [0.2, 1.3], dampings: [0.05], kernel: 'wasm' as const };
    const planA = planSweep(first.accelMS2, first.dtS, options);
    const planB = planSweep(second.accelMS2, second.dtS, options);
    const runA = groupRunner(first.accelMS2, planA, 'wasm');
    const runB = groupRunner(second.accelMS2, planB, 'wasm');
    const alone = (record: typeof first) => sweepOscillators(record.accelMS2, record.dtS, options).sdM;
    const a1 = Array.from(runA(planA.groups[0]));
    const b1 = Array.from(runB(planB.groups[0]));
    const a2 = Array.from(runA(planA.groups[0]));
    expect(a2).toEqual(a1);
    expect([a1[0], a1[3]]).toEqual(Array.from(alone(first)));
    expect([b1[0], b1[3]]).toEqual(Array.from(alone(second)));
    expect(b1[0]).not.toBe(a1[0]);
  });

  it('gives the same peaks before and after RotD has used the instance, and RotD the same bits', () => {
    // RotD's loop (assembly/rotd.ts) lays its components out in the same memory.
    const options = { periodsS: [0.15, 2], dampings: [0.05], kernel: 'wasm' as const };
    const [a, b] = [records[0], records[1]];
    const second = synthesizeRecord({ seed: 16, dtS: a.dtS, durationS: 9.5 });
    const before = sweepOscillators(a.accelMS2, a.dtS, options);
    const rotd = rotDSpectra(a, second, options);
    const after = sweepOscillators(a.accelMS2, a.dtS, options);
    sweepOscillators(b.accelMS2, b.dtS, options);
    const again = rotDSpectra(a, second, options);
    expect(Array.from(after.sdM)).toEqual(Array.from(before.sdM));
    expect(Array.from(again.curves[0].rotd50MS2)).toEqual(Array.from(rotd.curves[0].rotd50MS2));
  });

  it('finds the closed-form peak of an undamped oscillator under a step of ground acceleration', () => {
    // From rest under a constant ground acceleration a₀, u(t) = −(a₀/ω²)(1 − cos ωt), so
    // SD = 2a₀/ω² (Chopra, Dynamics of Structures, §4.3, the step force; from memory). The
    // piecewise-exact recurrence is exact for this input and the Hermite refinement finds the peak
    // between steps.
    const a0 = 1.7;
    const accel = new Float64Array(1237).fill(a0);
    const periods = [0.37, 1.1, 2.9];
    const peaks = sweepOscillators(accel, 0.01, {
      periodsS: periods,
      dampings: [0],
      method: 'piecewise-exact',
      kernel: 'wasm',
    });
    periods.forEach((periodS, i) => {
      const omega = (2 * Math.PI) / periodS;
      expect(peaks.sdM[i]).toBeCloseTo((2 * a0) / omega ** 2, 7);
      // SV = a₀/ω (the peak of (a₀/ω) sin ωt) and SA = 2a₀ (the absolute acceleration −ω²u = a₀(1 − cos ωt)).
      expect(peaks.svMS[i] / (a0 / omega)).toBeCloseTo(1, 5);
      expect(peaks.saMS2[i] / (2 * a0)).toBeCloseTo(1, 5);
    });
  });
});
