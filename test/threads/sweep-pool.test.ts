import { describe, expect, it } from 'vitest';
import { logSpaced } from '../../src/oscillator/grid.js';
import { type Peaks, sweepOscillators } from '../../src/oscillator/sweep.js';
import { synthesizeRecord } from '../../src/record/synth.js';
import { SweepPool, sweepOscillatorsParallel } from '../../src/threads/sweep-pool.js';

// The worker threads run the built library (dist/), as the CLI does; `npm test` (and `npm ci`,
// through `prepare`) builds it first.

// Threads only share out whole groups of oscillators, each oscillator's peaks depending on its
// own coefficients and the record alone: the split must change no bit (common practice for a
// deterministic parallel reduction without floating-point sums across threads).
function expectSameBits(a: Peaks, b: Peaks): void {
  for (const key of ['sdM', 'svMS', 'saMS2'] as const) {
    expect(a[key].length).toBe(b[key].length);
    for (let i = 0; i < a[key].length; i++) {
      if (!Object.is(a[key][i], b[key][i])) throw new Error(`${key}[${i}]: ${a[key][i]} ≠ ${b[key][i]}`);
    }
  }
  expect(a.oscillatorSteps).toBe(b.oscillatorSteps);
}

const record = synthesizeRecord({ seed: 21, dtS: 0.01, durationS: 40.13 });
const options = { periodsS: [0, ...logSpaced(0.02, 10, 37)], dampings: [0, 0.05, 0.2] };

describe('parallel sweep', () => {
  for (const kernel of ['wasm', 'js'] as const) {
    it(`gives the single-thread peaks bit for bit (${kernel} kernel, 2 and 3 threads)`, async () => {
      const one = sweepOscillators(record.accelMS2, record.dtS, { ...options, kernel });
      for (const threads of [2, 3]) {
        expectSameBits(
          one,
          await sweepOscillatorsParallel(record.accelMS2, record.dtS, { ...options, kernel, threads }),
        );
      }
    });
  }

  it('runs several records and methods through one pool, then closes it', async () => {
    const pool = new SweepPool(2);
    try {
      for (const [seed, method] of [
        [31, 'newmark-average'],
        [32, 'piecewise-exact'],
        [33, 'newmark-linear'],
      ] as const) {
        const r = synthesizeRecord({ seed, dtS: 0.02, durationS: 25 });
        const sweep = { ...options, method };
        expectSameBits(
          sweepOscillators(r.accelMS2, r.dtS, sweep),
          await pool.sweep(r.accelMS2, r.dtS, sweep),
        );
      }
    } finally {
      await pool.close();
    }
  });

  it('refuses a thread count that is not a whole number ≥ 1', async () => {
    await expect(
      sweepOscillatorsParallel(record.accelMS2, record.dtS, { ...options, threads: 0 }),
    ).rejects.toThrow(/thread count/);
    expect(() => new SweepPool(1.5)).toThrow(/thread count/);
  });
});

describe('parallel sweep with one thread', () => {
  it('is the single-thread sweep', async () => {
    expectSameBits(
      sweepOscillators(record.accelMS2, record.dtS, options),
      await sweepOscillatorsParallel(record.accelMS2, record.dtS, { ...options, threads: 1 }),
    );
  });
});
