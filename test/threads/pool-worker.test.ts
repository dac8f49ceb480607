import { describe, expect, it } from 'vitest';
import { planSweep } from '../../src/oscillator/plan.js';
import { emptyPeaks, sweepOscillators } from '../../src/oscillator/sweep.js';
import { synthesizeRecord } from '../../src/record/synth.js';
import { finishRotD, prepareRotD, type RotDJob, rotDSpectra } from '../../src/spectrum/rotd.js';
import type { SharedSweepJob } from '../../src/threads/sweep-pool.js';
import { shared, ThreadTeam, workerScript } from '../../src/threads/team.js';

// The worker script of SweepPool and RotDPool (dist/, built by the global setup), sent both kinds
// of job by a team whose own thread takes no share: the worker alone must compute every group and
// every cell, as one thread computes them (the same bits; common practice for a deterministic
// parallel computation without sums across threads).
const record = synthesizeRecord({ seed: 81, dtS: 0.01, durationS: 20 });
const other = synthesizeRecord({ seed: 82, dtS: 0.01, durationS: 17 });
const grid = { periodsS: [0, 0.05, 0.3, 1, 4], dampings: [0.02, 0.05] };
const counter = () => new Int32Array(new SharedArrayBuffer(4));

describe('the pool worker', () => {
  it('answers a sweep job and a RotD job alike, alone, with the single-thread bits', async () => {
    const team = new ThreadTeam(2, workerScript('pool-worker.js'));
    try {
      const plan = planSweep(record.accelMS2, record.dtS, grid);
      const peaks = emptyPeaks(plan);
      const sweep: SharedSweepJob = {
        accelMS2: shared(record.accelMS2),
        kernel: 'auto',
        order: Int32Array.from(plan.groups, (_, i) => i),
        counter: counter(),
        peaks: { sdM: shared(peaks.sdM), svMS: shared(peaks.svMS), saMS2: shared(peaks.saMS2) },
        plan,
      };
      await team.run(sweep, () => {});
      const alone = sweepOscillators(record.accelMS2, record.dtS, grid);
      for (const key of ['sdM', 'svMS', 'saMS2'] as const) {
        expect(Array.from(sweep.peaks[key])).toEqual(Array.from(alone[key]));
      }
      const local = prepareRotD(record, other, grid);
      const rotd: RotDJob = {
        ...local,
        a1: shared(local.a1),
        a2: shared(local.a2),
        counter: counter(),
        results: shared(local.results),
      };
      await team.run(rotd, () => {});
      const expected = rotDSpectra(record, other, grid);
      finishRotD(record, other, rotd).curves.forEach((curve, d) => {
        expect(Array.from(curve.rotd50MS2)).toEqual(Array.from(expected.curves[d].rotd50MS2));
        expect(Array.from(curve.rotd100MS2)).toEqual(Array.from(expected.curves[d].rotd100MS2));
        expect(Array.from(curve.geomeanMS2)).toEqual(Array.from(expected.curves[d].geomeanMS2));
      });
      expect(rotd.counter[0]).toBeGreaterThanOrEqual(grid.periodsS.length * grid.dampings.length);
    } finally {
      await team.close();
    }
  });
});
