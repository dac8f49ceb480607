import { availableParallelism } from 'node:os';
import type { GroundRecord } from '../record/record.js';
import {
  finishRotD,
  prepareRotD,
  type RotDOptions,
  type RotDSpectra,
  type RotDWork,
  rotDCellRunner,
  rotDSpectra,
} from '../spectrum/rotd.js';
import { shared, ThreadTeam, workerScript } from './team.js';

export interface ParallelRotDOptions extends RotDOptions {
  /** Threads, this one included; default all cores. 1 computes here alone. */
  threads?: number;
}

/**
 * rotDSpectra on worker threads (a RotDPool of `threads`, started for the call and closed after):
 * the threads claim (damping, period) cells from a shared counter, and each cell is computed as
 * on one thread, so the numbers are the same bits.
 */
export async function rotDSpectraParallel(
  first: GroundRecord,
  second: GroundRecord,
  options: ParallelRotDOptions,
): Promise<RotDSpectra> {
  const threads = Math.max(1, Math.min(options.threads ?? availableParallelism(), options.periodsS.length));
  if (threads === 1) return rotDSpectra(first, second, options);
  const pool = new RotDPool(threads);
  try {
    return await pool.rotd(first, second, options);
  } finally {
    await pool.close();
  }
}

/**
 * RotD work as the threads of a RotDPool share it: the components in shared memory, a counter
 * handing out cells (damping-major: cell c is damping ⌊c / periods⌋, period c mod periods), and
 * for each damping in turn its RotD50, RotD100 and geometric-mean curves, one after the other.
 */
export interface SharedRotDJob {
  work: RotDWork;
  counter: Int32Array;
  results: Float64Array;
}

/** Claim cells of the job one at a time and compute them on this thread (see SharedRotDJob). */
export function runClaimedRotD(job: SharedRotDJob): void {
  const { work } = job;
  const cell = rotDCellRunner(work);
  const out = new Float64Array(3);
  const periods = work.periodsS.length;
  for (;;) {
    const next = Atomics.add(job.counter, 0, 1);
    if (next >= work.dampings.length * periods) return;
    const d = Math.floor(next / periods);
    const p = next - d * periods;
    cell(d, p, out);
    for (let q = 0; q < 3; q++) job.results[(3 * d + q) * periods + p] = out[q];
  }
}

/**
 * Worker threads that compute RotD spectra together with the calling thread, for many pairs or
 * large grids (starting a worker is costly next to a small job: keep a pool for a suite). Close it
 * when done so that the process can exit.
 */
export class RotDPool extends ThreadTeam {
  constructor(threads = availableParallelism()) {
    super(threads, workerScript(import.meta.url, 'threads', 'rotd-worker.js'));
  }

  /** rotDSpectra of the pair, bit for bit, computed by all the pool's threads. */
  async rotd(first: GroundRecord, second: GroundRecord, options: RotDOptions): Promise<RotDSpectra> {
    const work = prepareRotD(first, second, options);
    const periods = work.periodsS.length;
    const job: SharedRotDJob = {
      work: { ...work, a1: shared(work.a1), a2: shared(work.a2) },
      counter: new Int32Array(new SharedArrayBuffer(4)),
      results: new Float64Array(new SharedArrayBuffer(8 * 3 * work.dampings.length * periods)),
    };
    await this.run(job, () => runClaimedRotD(job));
    const curve = (d: number, q: number) =>
      job.results.slice((3 * d + q) * periods, (3 * d + q + 1) * periods);
    const curves = Array.from(work.dampings, (damping, d) => ({
      damping,
      rotd50MS2: curve(d, 0),
      rotd100MS2: curve(d, 1),
      geomeanMS2: curve(d, 2),
    }));
    return finishRotD(first, second, work, curves);
  }
}
