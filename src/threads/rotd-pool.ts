import { availableParallelism } from 'node:os';
import type { GroundRecord } from '../record/record.js';
import {
  finishRotD,
  prepareRotD,
  type RotDJob,
  type RotDOptions,
  type RotDSpectra,
  rotDSpectra,
  runRotDCells,
} from '../spectrum/rotd.js';
import { shared, ThreadTeam, workerScript } from './team.js';

export interface ParallelRotDOptions extends RotDOptions {
  /** Threads, this one included; default all cores. 1 computes here alone. */
  threads?: number;
}

/** rotDSpectra, bit for bit, on a RotDPool of `threads` started for the call and closed after. */
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
 * Worker threads that compute RotD spectra with the calling thread, claiming (damping, period)
 * cells; keep one for a suite (a worker is costly to start) and close it when done.
 */
export class RotDPool extends ThreadTeam {
  constructor(threads = availableParallelism()) {
    super(threads, workerScript('pool-worker.js'));
  }

  /** rotDSpectra of the pair, bit for bit, computed by all the pool's threads. */
  async rotd(first: GroundRecord, second: GroundRecord, options: RotDOptions): Promise<RotDSpectra> {
    const alone = prepareRotD(first, second, options);
    const job: RotDJob = {
      ...alone,
      a1: shared(alone.a1),
      a2: shared(alone.a2),
      counter: new Int32Array(new SharedArrayBuffer(4)),
      results: shared(alone.results),
    };
    await this.run(job, () => runRotDCells(job));
    return finishRotD(first, second, job);
  }
}
