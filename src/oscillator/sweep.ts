import { groupRunner } from './group-runner.js';
import { PEAK_STRIDE } from './layout.js';
import { type PlannedOscillator, plannedSteps, planSweep, type SweepPlan } from './plan.js';
import type { Method } from './recurrence.js';

export interface SweepOptions {
  /** Natural periods, s; T = 0 is a rigid oscillator. */
  periodsS: ArrayLike<number>;
  /** Damping ratios as fractions of critical (0.05 for 5%). */
  dampings: ArrayLike<number>;
  /** Step method; Newmark-β average acceleration by default. */
  method?: Method;
  /** Pre-warp the Newmark recurrences (prewarpedOscillator; default true); false sub-steps more. */
  prewarp?: boolean;
  /** Least steps per natural period (raises the rule of substeps.ts, never lowers it). */
  stepsPerPeriod?: number;
  kernel?: SweepKernel;
}

/** Peak responses of every oscillator of a sweep. Arrays are indexed [damping × nPeriods + period]. */
export interface Peaks {
  method: Method;
  periodsS: Float64Array;
  dampings: Float64Array;
  /** Peak |relative displacement|, m. */
  sdM: Float64Array;
  /** Peak |relative velocity|, m/s. */
  svMS: Float64Array;
  /** Peak |absolute acceleration|, m/s². */
  saMS2: Float64Array;
  /** Oscillator-steps actually executed (sub-steps included). */
  oscillatorSteps: number;
}

/** Which kernel steps the oscillators: the WebAssembly SIMD one, the TypeScript one, or the first where it runs. */
export type SweepKernel = 'auto' | 'wasm' | 'js';

/**
 * Run every oscillator of the grid periods × dampings over one ground-acceleration history (m/s²,
 * step dtS, linearly interpolated, from rest) and return their peaks; both kernels give the same
 * numbers. `plan`, when given, is planSweep's for the same record and options.
 */
export function sweepOscillators(
  accelMS2: Float64Array,
  dtS: number,
  options: SweepOptions,
  plan: SweepPlan = planSweep(accelMS2, dtS, options),
): Peaks {
  const peaks = emptyPeaks(plan);
  const runner = groupRunner(accelMS2, plan, options.kernel ?? 'auto');
  for (const group of plan.groups) storeGroup(peaks, group, runner(group));
  peaks.oscillatorSteps = plannedSteps(plan, accelMS2.length);
  return peaks;
}

/** Result arrays of a plan, with the rigid oscillators' SA (the PGA) filled in. */
export function emptyPeaks(plan: SweepPlan): Peaks {
  const count = plan.periodsS.length * plan.dampings.length;
  const peaks: Peaks = {
    method: plan.method,
    periodsS: plan.periodsS,
    dampings: plan.dampings,
    sdM: new Float64Array(count),
    svMS: new Float64Array(count),
    saMS2: new Float64Array(count),
    oscillatorSteps: 0,
  };
  for (let i = 0; i < count; i++) {
    if (plan.periodsS[i % plan.periodsS.length] === 0) peaks.saMS2[i] = plan.bounds.pgaMS2;
  }
  return peaks;
}

/** Copy one group's peaks (PEAK_STRIDE per oscillator) into the result arrays. */
export function storeGroup(
  peaks: Pick<Peaks, 'sdM' | 'svMS' | 'saMS2'>,
  group: PlannedOscillator[],
  values: Float64Array,
): void {
  for (let g = 0; g < group.length; g++) {
    const index = group[g].index;
    peaks.sdM[index] = values[g * PEAK_STRIDE];
    peaks.svMS[index] = values[g * PEAK_STRIDE + 1];
    peaks.saMS2[index] = values[g * PEAK_STRIDE + 2];
  }
}
