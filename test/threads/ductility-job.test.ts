import { describe, expect, it } from 'vitest';
import { type DuctilityPlan, ductilityCellLength } from '../../src/inelastic/cells.js';
import { planDuctilitySpectra } from '../../src/inelastic/ductility.js';
import { synthesizeRecord } from '../../src/record/synth.js';
import { type DuctilityJob, runDuctilityCells } from '../../src/threads/ductility-job.js';

// An invented motion of 400 samples (the seeded generator of the demo data). μ = 1500 is not
// reached above f̄y = 1e-3 at T = 2 and 3 s on it (at ζ = 2% and 5%), and is at 1 s and below:
// test/threads/ductility-pool.test.ts checks that a single thread stops at T = 2 s.
const record = synthesizeRecord({ seed: 18, dtS: 0.01, durationS: 3.99 });
const model = { kind: 'bilinear', alpha: 0.05 } as const;
const failing = { periodsS: [0.1, 0.3, 1, 2, 3], dampings: [0.02, 0.05], model, ductilities: [2, 1500] };

describe('runDuctilityCells', () => {
  it('ends at the lowest failing cell, whatever the order, and skips the cells above it', () => {
    // On this thread alone, claiming the failing cells from the top: cells 4 and 3 (T = 3 and 2 s)
    // fail, in that order, then cell 2 (T = 1 s) succeeds; cells 8 and 9 (ζ = 5%) are skipped.
    const plan: DuctilityPlan = planDuctilitySpectra(record, failing);
    const length = ductilityCellLength(plan);
    const cells = 10;
    const order = Int32Array.from([4, 9, 3, 8, 2]);
    const job: DuctilityJob = {
      kind: 'ductility',
      plan,
      accelMS2: record.accelMS2,
      dtS: record.dtS,
      order,
      counter: new Int32Array(1),
      failed: Int32Array.from([cells]),
      results: new Float64Array(cells * length),
    };
    runDuctilityCells(job);
    expect(job.failed[0]).toBe(3);
    expect(job.counter[0]).toBeGreaterThanOrEqual(order.length);
    expect(job.results[2 * length]).toBeGreaterThan(0); // cell 2's elastic peak
    for (const skipped of [8, 9]) expect(job.results[skipped * length]).toBe(0);
  });
});
