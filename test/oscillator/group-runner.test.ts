import { describe, expect, it } from 'vitest';
import { groupRunner, resolveKernel } from '../../src/oscillator/group-runner.js';
import { PEAK_STRIDE } from '../../src/oscillator/layout.js';
import { planSweep } from '../../src/oscillator/plan.js';
import { synthesizeRecord } from '../../src/record/synth.js';

// From rest under a constant ground acceleration a₀ an undamped oscillator moves as
// u(t) = −(a₀/ω²)(1 − cos ωt): |u|max = 2a₀/ω², |v|max = a₀/ω and the absolute acceleration
// peaks at 2a₀ (Chopra, Dynamics of Structures, §4.3, the step force; from memory).
const a0 = 1.3;
const step = new Float64Array(2001).fill(a0);
const periodsS = [0.23, 0.61, 1.37, 2.9];

describe('groupRunner', () => {
  for (const kernel of ['js', 'wasm'] as const) {
    it(`steps a group to the closed-form peaks of a step of ground acceleration (${kernel})`, () => {
      const plan = planSweep(step, 0.01, { periodsS, dampings: [0], method: 'piecewise-exact' });
      const run = groupRunner(step, plan, kernel);
      for (const group of plan.groups) {
        const values = run(group);
        group.forEach((oscillator, g) => {
          const omega = (2 * Math.PI) / oscillator.periodS;
          // The peaks lie between steps; cubic Hermite interpolation of a cosine misses its crest
          // by at most (ωh)⁴/384 of the amplitude (Burden and Faires §3.4), h the executed step.
          const bound = (omega * (0.01 / oscillator.substeps)) ** 4 / 384;
          expect(bound).toBeLessThan(1e-3);
          const exact = [(2 * a0) / omega ** 2, a0 / omega, 2 * a0];
          for (let q = 0; q < PEAK_STRIDE; q++) {
            expect(Math.abs(values[g * PEAK_STRIDE + q] / exact[q] - 1)).toBeLessThanOrEqual(bound);
          }
        });
      }
    });
  }

  it('gives each oscillator the same peaks alone as in a group of four, on both kernels', () => {
    // A group of one fills one vector of the SIMD kernel, a group of three repeats its last
    // oscillator in the spare lane: neither may change an oscillator's peaks (property).
    const record = synthesizeRecord({ seed: 77, dtS: 0.01, durationS: 15 });
    const plan = planSweep(record.accelMS2, record.dtS, {
      periodsS: [0.5, 0.51, 0.52, 0.53],
      dampings: [0.05],
    });
    const [group] = plan.groups;
    expect(group).toHaveLength(4);
    for (const kernel of ['js', 'wasm'] as const) {
      const run = groupRunner(record.accelMS2, plan, kernel);
      const together = Array.from(run(group));
      const three = Array.from(run(group.slice(0, 3))).slice(0, 3 * PEAK_STRIDE);
      expect(three).toEqual(together.slice(0, 3 * PEAK_STRIDE));
      group.forEach((oscillator, g) => {
        const alone = Array.from(run([oscillator])).slice(0, PEAK_STRIDE);
        expect(alone).toEqual(together.slice(g * PEAK_STRIDE, (g + 1) * PEAK_STRIDE));
      });
    }
  });

  it('reuses one array for its results', () => {
    const plan = planSweep(step, 0.01, { periodsS, dampings: [0.05] });
    const run = groupRunner(step, plan, 'js');
    expect(run(plan.groups[0])).toBe(run(plan.groups[plan.groups.length - 1]));
  });
});

describe('resolveKernel', () => {
  it('takes the SIMD kernel where it runs, the TypeScript one where asked or where SIMD is missing', () => {
    expect(resolveKernel('auto', true)).toBe('wasm');
    expect(resolveKernel('auto', false)).toBe('js');
    expect(resolveKernel('js', true)).toBe('js');
    expect(resolveKernel('wasm', true)).toBe('wasm');
    expect(() => resolveKernel('wasm', false)).toThrow(/SIMD/);
  });
});
