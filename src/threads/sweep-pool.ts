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
  /** Threads, this one included: a number (1 sweeps here), or 'auto' (the default; see sweepThreads). */
  threads?: 'auto' | number;
}

/**
 * A job as the threads share it (SharedArrayBuffers): `order` of the groups to claim, `counter`
 * handing out the next one, and the calling thread's plan, so that no worker plans again.
 */
export interface SharedSweepJob {
  accelMS2: Float64Array;
  kernel: SweepKernel;
  order: Int32Array;
  counter: Int32Array;
  peaks: Pick<Peaks, 'sdM' | 'svMS' | 'saMS2'>;
  plan: SweepPlan;
}

/** Claim groups one at a time and write their peaks into the shared results (the same whichever thread). */
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

/** Worker threads that sweep records with the calling thread, one at a time; close it when done. */
export class SweepPool extends ThreadTeam {
  constructor(threads = availableParallelism()) {
    super(threads, workerScript('pool-worker.js'));
  }

  /** The peaks of sweepOscillators (with the same `plan`), bit for bit, on all the pool's threads. */
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

/** sweepOscillators, bit for bit, on a SweepPool of `options.threads` started for the call. */
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
