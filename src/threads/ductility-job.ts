// A ductility job as the threads share it, and the loop each thread runs on it: all a worker of
// DuctilityPool loads (with the cells of inelastic/cells.ts), so that it starts sooner.
import { type DemandPlan, type DuctilityPlan, demandCell, ductilityCell } from '../inelastic/cells.js';

/** The cells of one job: a constant-ductility search or a demand run per (damping, period). */
export type CellWork = { kind: 'ductility'; plan: DuctilityPlan } | { kind: 'demand'; plan: DemandPlan };

/**
 * A job as the threads share it (SharedArrayBuffers): `order` of the cells to claim, costliest
 * first, `counter` handing out the next one, `results` written cell by cell (ductilityCell,
 * demandCell) and `failed`, the lowest cell that threw (the cell count while none has).
 */
export type DuctilityJob = CellWork & {
  accelMS2: Float64Array;
  dtS: number;
  order: Int32Array;
  counter: Int32Array;
  failed: Int32Array;
  results: Float64Array;
};

/**
 * Claim cells one at a time and write their results (the same whichever thread). A cell that
 * throws lowers `failed` to itself, and cells above `failed` are skipped: those below are still
 * computed, so `failed` ends at the lowest failing cell, the one a single thread stops at.
 */
export function runDuctilityCells(job: DuctilityJob): void {
  for (;;) {
    const next = Atomics.add(job.counter, 0, 1);
    if (next >= job.order.length) return;
    const cell = job.order[next];
    if (cell > Atomics.load(job.failed, 0)) continue;
    try {
      runCell(job, cell, job.results);
    } catch {
      for (let seen = Atomics.load(job.failed, 0); cell < seen; ) {
        const was = Atomics.compareExchange(job.failed, 0, seen, cell);
        if (was === seen) break;
        seen = was;
      }
    }
  }
}

export function runCell(
  job: CellWork & Pick<DuctilityJob, 'accelMS2' | 'dtS'>,
  cell: number,
  into: Float64Array,
) {
  if (job.kind === 'ductility') ductilityCell(job.accelMS2, job.dtS, job.plan, cell, into);
  else demandCell(job.accelMS2, job.dtS, job.plan, cell, into);
}
