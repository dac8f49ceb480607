import { inputError } from '../base/errors.js';
import { checkPeriodsForRecord } from './grid.js';
import { COEFFICIENT as C, COEFFICIENT_STRIDE, GROUP_WIDTH, STEP_KEYS } from './layout.js';
import { refinementThresholds } from './peak.js';
import { type GroundBounds, recordStatistics } from './record-statistics.js';
import { executedStepCoefficients, type Method } from './recurrence.js';
import { executionPlan, substepCount } from './substeps.js';
import type { SweepOptions } from './sweep.js';

/** One oscillator of a planned sweep (see executionPlan in substeps.ts). */
export interface PlannedOscillator {
  /** Index in the result arrays. */
  index: number;
  periodS: number;
  damping: number;
  /** Steps executed per record step (the kernel's sub-steps). */
  substeps: number;
  /** Sub-steps of the method composed into each executed step (1: none). */
  composed: number;
}

/** What every kernel and thread of a sweep shares: the grid, the method and the record's bounds. */
export interface SweepPlan {
  method: Method;
  prewarp: boolean;
  /** Time step of the record, s. */
  dtS: number;
  periodsS: Float64Array;
  dampings: Float64Array;
  bounds: GroundBounds;
  /** Groups of at most GROUP_WIDTH oscillators of one sub-step count, in sub-step order. */
  groups: PlannedOscillator[][];
}

/** Check the sweep and group its oscillators by sub-step count (rigid ones are not stepped). */
export function planSweep(accelMS2: Float64Array, dtS: number, options: SweepOptions): SweepPlan {
  const method = options.method ?? 'newmark-average';
  const periodsS = Float64Array.from(options.periodsS);
  const dampings = Float64Array.from(options.dampings);
  checkSweep(accelMS2, dtS, periodsS, dampings);
  const durationS = (accelMS2.length - 1) * dtS;
  checkPeriodsForRecord(periodsS, durationS);
  const { roughness, bounds } = recordStatistics(accelMS2, dtS);
  const prewarp = options.prewarp ?? true;
  const context = { durationS, prewarp, roughness, stepsPerPeriod: options.stepsPerPeriod };
  const runOf = (periodS: number, damping: number) => {
    const substeps = substepCount(method, periodS, dtS, { ...context, damping });
    return executionPlan(substeps, periodS, dtS, roughness, options.stepsPerPeriod, damping);
  };
  // Pre-warped, the rule depends on the damping only through linear acceleration's record rule
  // and the fastest pole, both above ζ = 1/2 (substeps.ts): once a period for the others.
  const dampingFree = (damping: number) => damping <= 0.5;
  const runs = prewarp
    ? Array.from(periodsS, (periodS) => (periodS === 0 ? undefined : runOf(periodS, 0)))
    : [];
  // In index order within a sub-step count.
  const buckets = new Map<number, PlannedOscillator[]>();
  for (let d = 0; d < dampings.length; d++) {
    for (let p = 0; p < periodsS.length; p++) {
      const periodS = periodsS[p];
      if (periodS === 0) continue;
      const run = (dampingFree(dampings[d]) ? runs[p] : undefined) ?? runOf(periodS, dampings[d]);
      const index = d * periodsS.length + p;
      const planned = { index, periodS, damping: dampings[d], substeps: run.steps, composed: run.composed };
      const bucket = buckets.get(run.steps);
      if (bucket === undefined) buckets.set(run.steps, [planned]);
      else bucket.push(planned);
    }
  }
  const groups: PlannedOscillator[][] = [];
  for (const [, bucket] of [...buckets].sort(([a], [b]) => a - b)) {
    for (let start = 0; start < bucket.length; start += GROUP_WIDTH) {
      groups.push(bucket.slice(start, start + GROUP_WIDTH));
    }
  }
  const plan = { method, prewarp, dtS, periodsS, dampings, bounds, groups };
  checkCoefficients(plan);
  return plan;
}

/**
 * Longest natural period over executed step the coefficients keep their precision for: the
 * pre-warped recurrences lose digits as T/h grows (measured: all of them past about 6e8, where the
 * WebAssembly kernel's f64x2 max would turn the NaN that follows into 0); a factor of 6 kept.
 */
export const MAX_PERIOD_STEPS = 1e8;

/** Largest damping ratio a sweep runs: the largest measured against the exact reference (ζ = 100). */
export const MAX_DAMPING = 100;

/**
 * Refuse, before any kernel runs, a plan whose coefficients are not finite or have lost precision:
 * both kernels then step only rows that are numbers (the SIMD kernel's max discards NaN).
 */
function checkCoefficients(plan: SweepPlan): void {
  const row = new Float64Array(COEFFICIENT_STRIDE);
  for (const group of plan.groups) {
    for (const oscillator of group) {
      const stepS = plan.dtS / oscillator.substeps;
      const at = `T = ${oscillator.periodS} s, ζ = ${oscillator.damping}`;
      if (oscillator.periodS / stepS > MAX_PERIOD_STEPS)
        throw inputError(
          `${at}: the period is ${(oscillator.periodS / stepS).toExponential(1)} steps of ${stepS} s, more than ${MAX_PERIOD_STEPS.toExponential(0)}, beyond which the step coefficients lose their precision; use periods up to ${Number((MAX_PERIOD_STEPS * stepS).toPrecision(3))} s for this record`,
        );
      packCoefficients(row, 0, oscillator, plan.method, stepS, plan.bounds, plan.prewarp);
      if (!row.every(Number.isFinite))
        throw inputError(
          `${at}: the step coefficients are not finite numbers (the sweep would give no peaks)`,
        );
    }
  }
}

/** Oscillator-steps the whole plan executes over a record of `samples` values. */
export function plannedSteps(plan: SweepPlan, samples: number): number {
  let steps = 0;
  for (const group of plan.groups) steps += group.length * group[0].substeps * (samples - 1);
  return steps;
}

/** Write one oscillator's row of coefficients (layout.ts) into slot `slot` of the packed array. */
export function packCoefficients(
  target: Float64Array,
  slot: number,
  oscillator: { periodS: number; damping: number; composed?: number },
  method: Method,
  stepS: number,
  bounds: GroundBounds,
  prewarp = true,
): void {
  const omega = (2 * Math.PI) / oscillator.periodS;
  const s = executedStepCoefficients(method, omega, oscillator.damping, stepS, oscillator.composed, prewarp);
  const o = slot * COEFFICIENT_STRIDE;
  for (const key of STEP_KEYS) target[o + C[key]] = s[key];
  target[o + C.c] = 2 * oscillator.damping * omega;
  target[o + C.k] = omega * omega;
  const t = refinementThresholds(omega, 2 * oscillator.damping * omega, stepS, bounds);
  target[o + C.ratio] = t.ratio;
  target[o + C.du] = t.displacementOffset;
  target[o + C.dv] = t.velocityOffset;
  target[o + C.ds] = t.accelerationOffset;
}

/** Refuse a sweep that cannot run: a bad step, a record too short, an empty or invalid grid. */
export function checkSweep(
  accelMS2: Float64Array,
  dtS: number,
  periodsS: Float64Array,
  dampings: Float64Array,
): void {
  if (!(dtS > 0) || !Number.isFinite(dtS)) throw inputError(`the time step must be positive, got ${dtS}`);
  if (accelMS2.length < 2) throw inputError('a sweep needs a record of at least 2 samples');
  if (periodsS.length === 0) throw inputError('the period grid is empty');
  if (dampings.length === 0) throw inputError('the damping list is empty');
  const period = periodsS.find((t) => !(t >= 0) || !Number.isFinite(t));
  if (period !== undefined) throw inputError(`periods must be finite and ≥ 0 s, got ${period}`);
  const damping = dampings.find((z) => !(z >= 0) || !Number.isFinite(z));
  if (damping !== undefined) throw inputError(`damping ratios must be finite and ≥ 0, got ${damping}`);
  const heavy = dampings.find((z) => z > MAX_DAMPING);
  if (heavy !== undefined)
    throw inputError(
      `damping ratio ${heavy} (${heavy * 100}%) is above ${MAX_DAMPING} (${MAX_DAMPING * 100}%), the largest the accuracy rule was measured at`,
    );
}

/**
 * Oscillator-steps (sub-steps included) from which `threads: 'auto'` splits a sweep over all cores:
 * below it, starting the workers costs more than the second core saves (measured; see the history).
 */
export const PARALLEL_MIN_OSCILLATOR_STEPS = 20_000_000;

/** The threads a sweep runs on: `threads` (at most one a group of work), or for 'auto' (and unset) the rule above. */
export function sweepThreads(
  plan: SweepPlan,
  samples: number,
  threads: 'auto' | number | undefined,
  cores: number,
): number {
  // No more threads than groups of work: each thread takes whole groups (256 threads for three
  // periods took 2 GB and 8 s to start).
  // A count that is no whole number ≥ 1 goes on as given, for the thread team to refuse.
  if (typeof threads === 'number')
    return Number.isInteger(threads) && threads >= 1
      ? Math.min(threads, Math.max(1, plan.groups.length))
      : threads;
  return plannedSteps(plan, samples) >= PARALLEL_MIN_OSCILLATOR_STEPS ? cores : 1;
}
