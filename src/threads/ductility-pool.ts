import { availableParallelism } from 'node:os';
import { inputError, QuakesweepError } from '../base/errors.js';
import {
  type DemandPlan,
  type DuctilityPlan,
  demandCellLength,
  ductilityCellLength,
} from '../inelastic/cells.js';
import {
  assembleDemandSpectra,
  assembleDuctilitySpectra,
  constantDuctilitySpectra,
  type DemandSpectraOptions,
  type DuctilityDemandSpectra,
  type DuctilitySpectra,
  type DuctilitySpectraOptions,
  ductilityDemandSpectra,
  planDemandSpectra,
  planDuctilitySpectra,
} from '../inelastic/ductility.js';
import { substepsFor } from '../inelastic/yielding.js';
import type { GroundRecord } from '../record/record.js';
import { type CellWork, type DuctilityJob, runCell, runDuctilityCells } from './ductility-job.js';
import { shared, ThreadTeam, workerScript } from './team.js';

/**
 * Worker threads that compute constant-ductility and ductility demand spectra with the calling
 * thread, claiming (damping, period) cells; keep one for a suite (a worker is costly to start)
 * and close it when done.
 */
export class DuctilityPool extends ThreadTeam {
  constructor(threads = availableParallelism()) {
    super(threads, workerScript('ductility-worker.js'));
  }

  /** constantDuctilitySpectra, bit for bit (and its errors), computed by all the pool's threads. */
  async spectra(record: GroundRecord, options: DuctilitySpectraOptions): Promise<DuctilitySpectra> {
    return spectraOnTeam(this, record, planDuctilitySpectra(record, options));
  }

  /** ductilityDemandSpectra, bit for bit (and its errors), computed by all the pool's threads. */
  async demand(record: GroundRecord, options: DemandSpectraOptions): Promise<DuctilityDemandSpectra> {
    return demandOnTeam(this, record, planDemandSpectra(record, options));
  }
}

async function spectraOnTeam(team: ThreadTeam, record: GroundRecord, plan: DuctilityPlan) {
  const results = await cellsOnTeam(team, record, { kind: 'ductility', plan }, ductilityCellLength(plan));
  return assembleDuctilitySpectra(record, plan, results);
}

async function demandOnTeam(team: ThreadTeam, record: GroundRecord, plan: DemandPlan) {
  const results = await cellsOnTeam(team, record, { kind: 'demand', plan }, demandCellLength(plan));
  return assembleDemandSpectra(record, plan, results);
}

/**
 * Every cell of `work` on the team's threads. Costliest first: a cell's cost is about its sub-step
 * count (substepsFor: max(1, N(ζ)·Δt/T, …)), so the last cells claimed are short ones; rigid cells
 * (T = 0) have no work and are not dealt out.
 */
async function cellsOnTeam(
  team: ThreadTeam,
  record: GroundRecord,
  work: CellWork,
  length: number,
): Promise<Float64Array> {
  const costs = cellCosts(work.plan, record.dtS);
  const count = costs.length;
  const cells = costs.flatMap((cost, cell) => (cost > 0 ? [cell] : []));
  const order = new Int32Array(new SharedArrayBuffer(4 * cells.length));
  order.set(cells.sort((a, b) => costs[b] - costs[a] || a - b));
  const failed = new Int32Array(new SharedArrayBuffer(4));
  failed[0] = count;
  const job: DuctilityJob = {
    ...work,
    accelMS2: shared(record.accelMS2),
    dtS: record.dtS,
    order,
    counter: new Int32Array(new SharedArrayBuffer(4)),
    failed,
    results: shared(new Float64Array(count * length)),
  };
  await team.run(job, () => runDuctilityCells(job));
  if (failed[0] < count) {
    // The failing cell again, here: its error reaches the caller as it was thrown (a worker's
    // would come back as text), and it is the one a single thread stops at.
    runCell(job, failed[0], new Float64Array(count * length));
    throw new QuakesweepError('internal', `cell ${failed[0]} failed on a worker thread but not on this one`);
  }
  return job.results;
}

/** What the cost of a job's cells depends on: its grid, the record's roughness and its kind. */
export type CellCostPlan = Pick<DuctilityPlan, 'periodsS' | 'dampings' | 'roughness'> &
  (Pick<DuctilityPlan, 'ductilities'> | Pick<DemandPlan, 'strengths'>);

/** Each cell's sub-steps per record step (substepsFor), its cost; 0 for a rigid cell (T = 0). */
function cellCosts(plan: CellCostPlan, dtS: number): number[] {
  const { periodsS, dampings, roughness } = plan;
  return Array.from({ length: periodsS.length * dampings.length }, (_, cell) => {
    const periodS = periodsS[cell % periodsS.length];
    const damping = dampings[Math.floor(cell / periodsS.length)];
    return periodS === 0 ? 0 : substepsFor(periodS, damping, dtS, roughness);
  });
}

/** Oscillator runs of one cell's strength search, about: 32 to 34 a cell on the bench's records. */
const SEARCH_RUNS_PER_CELL = 33;

/**
 * Oscillator sub-steps (over the cells, runs × sub-steps per record step × samples; a search
 * counted as SEARCH_RUNS_PER_CELL runs) from which `'auto'` deals a job out over all cores.
 * Measured on the default grid (5%, 6 ductilities) of the bench's kind of record, 2 cores: about
 * 1 ns a sub-step (runs stop early; 550 ms on one thread for 8,000 samples), a worker answering
 * its first job in about 45 ms; two threads were no faster at 1,000 samples (7·10⁷ sub-steps,
 * 100 ms) and faster from 2,000 (1.4·10⁸) on. Raise it if the engine gets faster again.
 */
export const DUCTILITY_PARALLEL_MIN_STEPS = 150_000_000;

/**
 * Threads for a job: `threads` if a number (a whole number ≥ 1), else (`'auto'`) all `cores` from
 * DUCTILITY_PARALLEL_MIN_STEPS oscillator sub-steps and one below; at most one a cell with work.
 */
export function ductilityThreads(
  plan: CellCostPlan,
  record: Pick<GroundRecord, 'dtS' | 'accelMS2'>,
  threads: number | 'auto',
  cores = availableParallelism(),
): number {
  if (threads !== 'auto' && (!Number.isInteger(threads) || threads < 1)) {
    throw inputError(`the thread count must be a whole number ≥ 1, got ${threads}`);
  }
  const costs = cellCosts(plan, record.dtS);
  const cells = costs.filter((cost) => cost > 0).length;
  const runs = 'ductilities' in plan ? SEARCH_RUNS_PER_CELL : 1 + plan.strengths.length;
  const steps = runs * costs.reduce((sum, cost) => sum + cost, 0) * record.accelMS2.length;
  const wanted = threads !== 'auto' ? threads : steps >= DUCTILITY_PARALLEL_MIN_STEPS ? cores : 1;
  return Math.max(1, Math.min(wanted, cells));
}

/**
 * constantDuctilitySpectra, bit for bit (and its errors), on `threads` threads (this one
 * included; 'auto': ductilityThreads) started for the call and closed after; 1 computes here alone.
 */
export async function ductilitySpectraOnThreads(
  record: GroundRecord,
  options: DuctilitySpectraOptions,
  threads: number | 'auto',
): Promise<DuctilitySpectra> {
  const plan = planDuctilitySpectra(record, options);
  const size = ductilityThreads(plan, record, threads);
  if (size === 1) return constantDuctilitySpectra(record, options);
  const team = new DuctilityPool(size);
  try {
    return await spectraOnTeam(team, record, plan);
  } finally {
    await team.close();
  }
}

/**
 * ductilityDemandSpectra, bit for bit (and its errors), on `threads` threads (this one included;
 * 'auto': ductilityThreads) started for the call and closed after; 1 computes here alone.
 */
export async function ductilityDemandOnThreads(
  record: GroundRecord,
  options: DemandSpectraOptions,
  threads: number | 'auto',
): Promise<DuctilityDemandSpectra> {
  const plan = planDemandSpectra(record, options);
  const size = ductilityThreads(plan, record, threads);
  if (size === 1) return ductilityDemandSpectra(record, options);
  const team = new DuctilityPool(size);
  try {
    return await demandOnTeam(team, record, plan);
  } finally {
    await team.close();
  }
}
