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
 * A job as the threads share it (SharedArrayBuffers): the record, the kernel, the order in which
 * groups are claimed, the counter that hands out the next group (Atomics.add, so every group runs
 * exactly once), the result arrays, and the calling thread's plan, so that no worker plans again.
 */
export interface SharedSweepJob {
  accelMS2: Float64Array;
  kernel: SweepKernel;
  order: Int32Array;
  counter: Int32Array;
  peaks: Pick<Peaks, 'sdM' | 'svMS' | 'saMS2'>;
  plan: SweepPlan;
}

/**
 * Claim groups of the plan one at a time, step them with this thread's kernel and write their
 * peaks into the shared results. Each oscillator's peaks depend only on its own coefficients and
 * the record, so which thread steps a group changes no bit.
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
 * Worker threads that sweep together with the calling thread, one record after another, each
 * split over all the threads; close the pool when done so that the process can exit.
 */
export class SweepPool extends ThreadTeam {
  constructor(threads = availableParallelism()) {
    super(threads, workerScript('pool-worker.js'));
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
    for (const key of ['sdM', 'svMS', 'saMS2'] as const) peaks[key].set(job.peaks[key]);
    peaks.oscillatorSteps = plannedSteps(plan, accelMS2.length);
    return peaks;
  }
}

/**
 * sweepOscillators on the threads that `options.threads` asks for, on a SweepPool started for the
 * call and closed after: the same peaks, bit for bit.
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
