import { execFileSync } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { QuakesweepError } from '../../src/base/errors.js';
import { constantDuctilitySpectra, ductilityDemandSpectra } from '../../src/inelastic/ductility.js';
import { synthesizeRecord } from '../../src/record/synth.js';
import {
  DUCTILITY_PARALLEL_MIN_STEPS,
  DuctilityPool,
  ductilityDemandOnThreads,
  ductilitySpectraOnThreads,
  ductilityThreads,
} from '../../src/threads/ductility-pool.js';

// Worker threads run the built library (dist/), which the global setup builds. Each (damping,
// period) cell is computed whole by one thread, with the arithmetic of the single-thread
// functions, and assembled on the calling thread: dealing the cells out must change no bit
// (common practice for a deterministic parallel computation without sums across threads).

/** Every number the same bits (Object.is: −0 and NaN too), every array a copy of its own. */
function expectSameBits(a: unknown, b: unknown, path = 'result'): void {
  if (ArrayBuffer.isView(a) && ArrayBuffer.isView(b)) {
    const [x, y] = [a as Float64Array, b as Float64Array];
    expect(x.constructor, path).toBe(y.constructor);
    expect(x.length, path).toBe(y.length);
    expect(x.buffer, path).not.toBeInstanceOf(SharedArrayBuffer);
    for (let i = 0; i < x.length; i++)
      if (!Object.is(x[i], y[i])) throw new Error(`${path}[${i}]: ${x[i]} ≠ ${y[i]}`);
  } else if (typeof a === 'object' && a !== null && typeof b === 'object' && b !== null) {
    expect(Object.keys(a).sort(), path).toEqual(Object.keys(b).sort());
    for (const [key, value] of Object.entries(a))
      expectSameBits(value, (b as Record<string, unknown>)[key], `${path}.${key}`);
  } else if (!Object.is(a, b)) throw new Error(`${path}: ${String(a)} ≠ ${String(b)}`);
}

// An invented motion of 400 samples (the seeded generator of the demo data).
const record = synthesizeRecord({ seed: 18, dtS: 0.01, durationS: 3.99 });
const model = { kind: 'bilinear', alpha: 0.05 } as const;
const grid = { periodsS: [0, 0.04, 0.15, 0.5, 1.2, 3], dampings: [0.02, 0.05], model };
const spectraOptions = { ...grid, ductilities: [1, 1.5, 2, 4, 6, 8] };
const demandOptions = { ...grid, periodsS: grid.periodsS.slice(1), ry: [1.5, 4] };
// μ = 1500 is not reached above f̄y = 1e-3 at T = 2 and 3 s on this record, at both dampings
// (measured on it: μ(f̄y = 1e-3) ≈ 1,000–1,250 there and ≥ 1,800 at 1.5 s and below).
const failing = { ...grid, periodsS: [0.1, 0.3, 1, 2, 3], ductilities: [2, 1500] };

function thrownBy(run: () => unknown): QuakesweepError {
  try {
    run();
  } catch (error) {
    if (error instanceof QuakesweepError) return error;
    throw error;
  }
  throw new Error('expected the single-thread function to throw');
}

describe('ductilitySpectraOnThreads and ductilityDemandOnThreads', () => {
  const spectra = constantDuctilitySpectra(record, spectraOptions);
  const demand = ductilityDemandSpectra(record, demandOptions);

  it.each([1, 2, 3])('give the single-thread bits on %s threads', async (threads) => {
    expectSameBits(await ductilitySpectraOnThreads(record, spectraOptions, threads), spectra);
    expectSameBits(await ductilityDemandOnThreads(record, demandOptions, threads), demand);
  });

  it.each([2, 3])(
    'throw the single-thread error on %s threads: the same kind, the same period',
    async (threads) => {
      const alone = thrownBy(() => constantDuctilitySpectra(record, failing));
      expect(alone.kind).toBe('input');
      expect(alone.message).toMatch(/^ductility 1500 is not reached at T = 2 s, ζ = 0.02/);
      const error = await ductilitySpectraOnThreads(record, failing, threads).catch((e: unknown) => e);
      expect(error).toBeInstanceOf(QuakesweepError);
      expect((error as QuakesweepError).kind).toBe(alone.kind);
      expect((error as QuakesweepError).message).toBe(alone.message);
    },
  );

  it('refuse bad options before any thread starts, and a bad thread count', async () => {
    await expect(
      ductilitySpectraOnThreads(record, { ...spectraOptions, ductilities: [0.5] }, 2),
    ).rejects.toThrow(/ductility ratios are finite and ≥ 1/);
    await expect(ductilityDemandOnThreads(record, { ...demandOptions, periodsS: [0, 1] }, 2)).rejects.toThrow(
      /T = 0/,
    );
    await expect(ductilitySpectraOnThreads(record, spectraOptions, 1.5)).rejects.toThrow(/thread count/);
  });
});

describe('DuctilityPool', () => {
  it('serves both directions and an error from one pool, then closes', async () => {
    const pool = new DuctilityPool(2);
    try {
      expectSameBits(
        await pool.spectra(record, spectraOptions),
        constantDuctilitySpectra(record, spectraOptions),
      );
      await expect(pool.spectra(record, failing)).rejects.toThrow(/ductility 1500 is not reached at T = 2 s/);
      expectSameBits(await pool.demand(record, demandOptions), ductilityDemandSpectra(record, demandOptions));
    } finally {
      await pool.close();
    }
  });

  it('leaves nothing running: a process that used it exits by itself', () => {
    // If a worker outlived the call, the child would not exit and the timeout would fail the test.
    const dist = new URL('../../dist/', import.meta.url).href;
    const script = `
      import { synthesizeRecord } from '${dist}record/synth.js';
      import { ductilitySpectraOnThreads } from '${dist}threads/ductility-pool.js';
      const record = synthesizeRecord({ seed: 18, dtS: 0.01, durationS: 3.99 });
      const grid = { dampings: [0.05], model: { kind: 'elastoplastic' } };
      const ok = await ductilitySpectraOnThreads(record, { ...grid, periodsS: [0.2, 1], ductilities: [2] }, 2);
      const failed = await ductilitySpectraOnThreads(record, { ...grid, periodsS: [0.2, 3], ductilities: [1500] }, 2)
        .then(() => 'no error', (error) => error.kind);
      console.log(ok.curves.length, failed);
    `;
    const folder = mkdtempSync(join(tmpdir(), 'quakesweep-ductility-pool-'));
    let output: string;
    try {
      const file = join(folder, 'pool.mjs');
      writeFileSync(file, script);
      output = execFileSync(process.execPath, [file], { encoding: 'utf8', timeout: 20_000 });
    } finally {
      rmSync(folder, { recursive: true, force: true });
    }
    expect(output.trim()).toBe('1 input');
  });
});

describe('ductilityThreads', () => {
  const plan = (periodsS: number[], dampings = [0.05]) => ({
    model,
    periodsS: Float64Array.from(periodsS),
    dampings: Float64Array.from(dampings),
    roughness: 0.3,
  });
  const samples = (n: number) => ({ dtS: 0.01, accelMS2: new Float64Array(n) });

  it("takes a number as given, at most one thread a cell with work, and 'auto' by the job's size", () => {
    const grid = plan([0, 0.05, 0.5, 5]);
    const search = { ...grid, ductilities: [2] };
    expect(ductilityThreads(search, samples(400), 2, 8)).toBe(2);
    expect(ductilityThreads(search, samples(400), 16, 8)).toBe(3); // T = 0 has no work
    expect(ductilityThreads(search, samples(400), 'auto', 8)).toBe(1);
    // The limit in oscillator sub-steps: runs × Σ sub-steps per record step × samples.
    // Sub-steps at Δt = 0.01 s, R = 0.3, ζ = 5% (N = 120): max(1, ⌈N·Δt/T⌉, ⌈5·R²⌉) = 24, 3, 1
    // (substepsFor).
    const perSample = 33 * (24 + 3 + 1);
    const enough = Math.ceil(DUCTILITY_PARALLEL_MIN_STEPS / perSample);
    expect(ductilityThreads(search, samples(enough), 'auto', 8)).toBe(3);
    expect(ductilityThreads(search, samples(enough - 1), 'auto', 8)).toBe(1);
    // A demand cell is one run and one a strength, a small fraction of a search.
    const demand = { ...plan([0.05, 0.5, 5], [0.02, 0.05]), strengths: [{ ry: 2 }] };
    expect(ductilityThreads(demand, samples(enough), 'auto', 8)).toBe(1);
    expect(ductilityThreads(demand, samples(40 * enough), 'auto', 8)).toBe(6);
  });

  it('refuses a thread count that is not a whole number ≥ 1', () => {
    for (const threads of [0, 1.5, Number.NaN])
      expect(() => ductilityThreads(plan([1]) as never, samples(10), threads)).toThrow(/thread count/);
  });
});
