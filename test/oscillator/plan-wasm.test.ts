import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { COEFFICIENT_STRIDE } from '../../src/oscillator/kernel.js';
import { packCoefficients, planSweep, recordStatistics, recordSums } from '../../src/oscillator/sweep.js';
import { PLAN_INPUT, wasmAverageRows, wasmRecordSums } from '../../src/oscillator/wasm/plan.js';
import { synthesizeRecord } from '../../src/record/synth.js';

// assembly/plan.ts is the WebAssembly twin of the plan's arithmetic in TypeScript (the pass of
// recordStatistics and packCoefficients for pre-warped Newmark average acceleration): the same
// operations in the same order, with the engine's own Math.exp, Math.cos and Math.cosh, so the
// two must give the same bits (Object.is on every value), not merely close numbers.

const finite = (min: number, max: number) => fc.double({ min, max, noNaN: true, noDefaultInfinity: true });

describe('the plan module (assembly/plan.ts)', () => {
  it('gives the bits of packCoefficients for pre-warped Newmark average acceleration', () => {
    fc.assert(
      fc.property(
        fc.array(
          fc.record({
            periodS: finite(0.005, 20),
            // Above 1 the pre-warp takes cosh (overdamped poles); 0 is the undamped oscillator.
            damping: fc.oneof(fc.constant(0), finite(0, 2)),
            dtS: finite(0.001, 0.05),
            substeps: fc.integer({ min: 1, max: 12 }),
            composed: fc.integer({ min: 1, max: 30 }),
          }),
          { minLength: 1, maxLength: 40 },
        ),
        finite(0, 50),
        finite(0, 1e5),
        (oscillators, pgaMS2, jerkMS3) => {
          const bounds = { pgaMS2, jerkMS3 };
          const inputs = new Float64Array(oscillators.length * PLAN_INPUT);
          oscillators.forEach((o, i) => {
            inputs.set([o.periodS, o.damping, o.dtS / o.substeps, o.composed], i * PLAN_INPUT);
          });
          const rows = new Float64Array(oscillators.length * COEFFICIENT_STRIDE);
          expect(wasmAverageRows(inputs, oscillators.length, bounds, rows)).toBe(true);
          const reference = new Float64Array(oscillators.length * COEFFICIENT_STRIDE);
          oscillators.forEach((o, i) => {
            packCoefficients(reference, i, o, 'newmark-average', o.dtS / o.substeps, bounds, true);
          });
          for (let i = 0; i < rows.length; i++) {
            if (!Object.is(rows[i], reference[i])) {
              throw new Error(
                `value ${i % COEFFICIENT_STRIDE} of oscillator ${Math.floor(i / 14)}: ${rows[i]} ≠ ${reference[i]}`,
              );
            }
          }
        },
      ),
      { numRuns: 300, seed: 20261202 },
    );
  });

  it("gives the bits of recordStatistics' pass over the record", () => {
    fc.assert(
      fc.property(fc.array(finite(-30, 30), { minLength: 2, maxLength: 3000 }), (values) => {
        const accelMS2 = Float64Array.from(values);
        expect(wasmRecordSums(accelMS2)).toEqual(recordSums(accelMS2));
      }),
      { numRuns: 200, seed: 20261203 },
    );
  });

  it('leaves the plan of a sweep as the TypeScript makes it, on a record and the default grid', () => {
    // A synthetic record with short periods (sub-steps composed up to 7 at 0.005 s) and long ones.
    const record = synthesizeRecord({ seed: 4242, dtS: 0.005, durationS: 30 });
    const plan = planSweep(record.accelMS2, record.dtS, {
      periodsS: [0, 0.01, 0.03, 0.05, 0.2, 1, 4, 10],
      dampings: [0, 0.05, 0.3],
    });
    const { bounds } = recordStatistics(record.accelMS2, record.dtS);
    const coefficients = plan.coefficients as Float64Array;
    expect(coefficients).toBeInstanceOf(Float64Array);
    const reference = new Float64Array(coefficients.length);
    for (const group of plan.groups) {
      for (const o of group) {
        packCoefficients(reference, o.slot, o, 'newmark-average', record.dtS / o.substeps, bounds, true);
      }
    }
    expect(plan.groups.flat().some((o) => o.composed > 1)).toBe(true);
    expect([...coefficients]).toEqual([...reference]);
  });

  it("leaves the other methods' coefficients to the threads that step their groups", () => {
    const record = synthesizeRecord({ seed: 4243, dtS: 0.01, durationS: 10 });
    for (const method of ['newmark-linear', 'piecewise-exact'] as const) {
      const plan = planSweep(record.accelMS2, record.dtS, { periodsS: [0.1, 1], dampings: [0.05], method });
      expect(plan.coefficients).toBeUndefined();
    }
  });
});
