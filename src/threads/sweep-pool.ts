import { availableParallelism } from 'node:os';
import { groupRunner } from '../oscillator/group-runner.js';
import { plannedSteps, planSweep, type SweepPlan, sweepThreads } from '../oscillator/plan.js';
import {
  emptyPeaks,
  type Peaks,
  type SweepKernel,
  type SweepOptions,
  storeGroup,
  sweepOscillators,
} from '../oscillator/sweep.js';
import { shared, ThreadTeam, workerScript } from './team.js';

export interface ParallelSweepOptions extends SweepOptions {
  /**
   * Threads stepping oscillators, this one included: a number (1 sweeps here alone), or 'auto'
   * (the default): all cores from PARALLEL_MIN_OSCILLATOR_STEPS oscillator-steps, one below.
   */
  threads?: 'auto' | number;
}

/**
 * A job as the threads share it: the record, the kernel, the order in which groups are claimed, a
 * counter that hands out the next group (Atomics.add, so every group runs exactly once), and the
 * result arrays. All buffers are SharedArrayBuffers.
 */
export interface SharedSweepJob {
  accelMS2: Float64Array;
  kernel: SweepKernel;
  order: Int32Array;
  counter: Int32Array;
  peaks: Pick<Peaks, 'sdM' | 'svMS' | 'saMS2'>;
  /** The calling thread's plan, sent along so that no worker plans the sweep again. */
  plan: SweepPlan;
}

/**
 * Claim groups of the plan one at a time from the shared counter, step them with this thread's
 * kernel and write their peaks into the shared results. Each oscillator's peaks depend only on
 * its own coefficients and the record, so which thread steps a group changes no bit.
 */
export function runClaimedGroups(job: SharedSweepJob): void {
  let runner: ReturnType<typeof groupRunner> | undefined;
  for (;;) {
    const next = Atomics.add(job.counter, 0, 1);
    if (next >= job.order.length) return;
    runner ??= groupRunner(job.accelMS2, job.plan, job.kernel);
    const group = job.plan.groups[job.order[next]];
    storeGroup(job.peaks, group, runner(group));
  }
}

/**
 * Records as the threads of a SweepPool share them for sweepRecords: each thread claims whole
 * records from the counter and sweeps them alone (same options for all), writing their peaks
 * (sdM, svMS, saMS2, count each) and executed steps into the shared results.
 */
export interface SharedRecordsJob {
  kind: 'records';
  records: { accelMS2: Float64Array; dtS: number }[];
  options: SweepOptions;
  counter: Int32Array;
  results: Float64Array;
  steps: Float64Array;
}

/** Claim records of the job one at a time and sweep each on this thread (see SharedRecordsJob). */
export function runClaimedRecords(job: SharedRecordsJob): void {
  const count = job.options.periodsS.length * job.options.dampings.length;
  for (;;) {
    const next = Atomics.add(job.counter, 0, 1);
    if (next >= job.records.length) return;
    const record = job.records[next];
    const peaks = sweepOscillators(record.accelMS2, record.dtS, job.options);
    const at = next * 3 * count;
    job.results.set(peaks.sdM, at);
    job.results.set(peaks.svMS, at + count);
    job.results.set(peaks.saMS2, at + 2 * count);
    job.steps[next] = peaks.oscillatorSteps;
  }
}

/**
 * Worker threads that sweep together with the calling thread. A pool can run many sweeps (one
 * record after another, each split over all its threads, or many records at once, each on one
 * thread); close it when done so that the process can exit.
 */
export class SweepPool extends ThreadTeam {
  constructor(threads = availableParallelism()) {
    super(threads, workerScript(import.meta.url, 'threads', 'sweep-worker.js'));
  }

  /**
   * The peaks of sweepOscillators, bit for bit, computed by all the pool's threads (`plan`, when
   * given, is planSweep's for the same record and options).
   */
  async sweep(
    accelMS2: Float64Array,
    dtS: number,
    options: SweepOptions,
    plan: SweepPlan = planSweep(accelMS2, dtS, options),
  ): Promise<Peaks> {
    const peaks = emptyPeaks(plan);
    // Costliest groups first, so that the last groups claimed are short ones.
    const costs = plan.groups.map((group) => group.length * group[0].substeps);
    const order = new Int32Array(new SharedArrayBuffer(4 * plan.groups.length));
    order.set(Array.from(plan.groups, (_, i) => i).sort((a, b) => costs[b] - costs[a] || a - b));
    const job: SharedSweepJob = {
      accelMS2: shared(accelMS2),
      kernel: options.kernel ?? 'auto',
      order,
      counter: new Int32Array(new SharedArrayBuffer(4)),
      peaks: { sdM: shared(peaks.sdM), svMS: shared(peaks.svMS), saMS2: shared(peaks.saMS2) },
      plan,
    };
    await this.run(job, () => runClaimedGroups(job));
    peaks.sdM.set(job.peaks.sdM);
    peaks.svMS.set(job.peaks.svMS);
    peaks.saMS2.set(job.peaks.saMS2);
    peaks.oscillatorSteps = plannedSteps(plan, accelMS2.length);
    return peaks;
  }

  /**
   * sweepOscillators of each record with the same options, the records dealt out whole to the
   * pool's threads (for many small records, where splitting each one would cost more in
   * messages than it saves). The peaks are those of sweepOscillators, bit for bit, in the order
   * of the records. Records not already in shared memory are copied there for the call: give a
   * suite of long records a slice at a time.
   */
  async sweepRecords(
    records: readonly { accelMS2: Float64Array; dtS: number }[],
    options: SweepOptions,
  ): Promise<Peaks[]> {
    if (records.length === 0) return [];
    // Plan the first one here: it checks the options, so that a bad grid fails on this thread.
    const first = planSweep(records[0].accelMS2, records[0].dtS, options);
    const grid = { ...options, periodsS: first.periodsS, dampings: first.dampings };
    const count = first.periodsS.length * first.dampings.length;
    const job: SharedRecordsJob = {
      kind: 'records',
      records: records.map((r) => ({ accelMS2: shared(r.accelMS2), dtS: r.dtS })),
      options: grid,
      counter: new Int32Array(new SharedArrayBuffer(4)),
      results: new Float64Array(new SharedArrayBuffer(8 * 3 * count * records.length)),
      steps: new Float64Array(new SharedArrayBuffer(8 * records.length)),
    };
    await this.run(job, () => runClaimedRecords(job));
    return records.map((_, i) => {
      const at = i * 3 * count;
      return {
        method: first.method,
        periodsS: first.periodsS,
        dampings: first.dampings,
        sdM: job.results.slice(at, at + count),
        svMS: job.results.slice(at + count, at + 2 * count),
        saMS2: job.results.slice(at + 2 * count, at + 3 * count),
        oscillatorSteps: job.steps[i],
      };
    });
  }
}

/**
 * sweepOscillators on a SweepPool of `threads` (default: all cores), started for the call and
 * closed after: the same peaks, bit for bit. Starting workers costs more than a small sweep: use
 * it for large sweeps only.
 */
export async function sweepOscillatorsParallel(
  accelMS2: Float64Array,
  dtS: number,
  options: ParallelSweepOptions,
): Promise<Peaks> {
  const plan = planSweep(accelMS2, dtS, options);
  const threads = sweepThreads(plan, accelMS2.length, options.threads, availableParallelism());
  if (threads === 1) return sweepOscillators(accelMS2, dtS, options, plan);
  const pool = new SweepPool(threads);
  try {
    return await pool.sweep(accelMS2, dtS, options, plan);
  } finally {
    await pool.close();
  }
}
