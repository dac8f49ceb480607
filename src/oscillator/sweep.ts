import { inputError } from '../base/errors.js';
import {
  CHECKPOINT_STRIDE,
  COEFFICIENT_STRIDE,
  GROUP_WIDTH,
  PEAK_STRIDE,
  refineBlock,
  STATE_STRIDE,
  scanBlocks,
} from './kernel.js';
import { executedStepCoefficients, executionPlan, type Method, substepCount } from './recurrence.js';
import { WASM_WIDTH, WasmSweeper, wasmSimdSupported } from './wasm/kernel.js';
import { PLAN_INPUT, wasmAverageRows, wasmRecordSums } from './wasm/plan.js';

export interface SweepOptions {
  /** Natural periods, s; T = 0 is a rigid oscillator. */
  periodsS: ArrayLike<number>;
  /** Damping ratios as fractions of critical (0.05 for 5%). */
  dampings: ArrayLike<number>;
  /** Step method; Newmark-β average acceleration by default. */
  method?: Method;
  /**
   * Pre-warp the Newmark recurrences so that their poles are exact (default true; see
   * prewarpedOscillator in recurrence.ts). False runs the textbook recurrences, sub-stepped more.
   */
  prewarp?: boolean;
  /** Least steps per natural period (raises the rule of recurrence.ts, never lowers it). */
  stepsPerPeriod?: number;
  /** Kernel: 'auto' (WebAssembly SIMD where the engine has it, else TypeScript), 'wasm' or 'js'. */
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
 * One oscillator of a planned sweep: its index in the result arrays, the steps the kernel executes
 * per record step, and the method's sub-steps composed into each (see executionPlan in
 * recurrence.ts).
 */
export interface PlannedOscillator {
  index: number;
  periodS: number;
  damping: number;
  /** Steps executed per record step (the kernel's sub-steps). */
  substeps: number;
  /** Sub-steps of the method composed into each executed step (1: none). */
  composed: number;
  /** Its row of SweepPlan.coefficients; a group's rows follow one another. */
  slot: number;
}

/** What every kernel and thread of a sweep shares: the grid, the method and the record's bounds. */
export interface SweepPlan {
  method: Method;
  prewarp: boolean;
  /** Time step of the record, s. */
  dtS: number;
  periodsS: Float64Array;
  dampings: Float64Array;
  /** Peak |ground acceleration|, the SA of rigid oscillators. */
  pgaMS2: number;
  bounds: GroundBounds;
  /** Groups of at most GROUP_SIZE oscillators with the same sub-step count, in sub-step order. */
  groups: PlannedOscillator[][];
  /**
   * Every planned oscillator's executed-step coefficients and refinement thresholds, packed as
   * packCoefficients packs them (COEFFICIENT_STRIDE a row, row `slot`), when the plan's
   * WebAssembly twin computed them all at once (pre-warped Newmark average acceleration, the
   * default); otherwise undefined, and each group's are computed by the thread that steps it,
   * so that the matrix exponentials and Newton iterations of the other methods are shared out.
   */
  coefficients?: Float64Array;
}

/** Oscillators per planned group: one pass of the WebAssembly kernel, two of the TypeScript one. */
export const GROUP_SIZE = WASM_WIDTH;

/**
 * Run every oscillator of the grid periods × dampings over one ground-acceleration history
 * (m/s², step dtS, linearly interpolated between samples, from rest) and return their peaks.
 * Oscillators with the same sub-step count are stepped four at a time in one pass (two f64x2
 * vectors in the WebAssembly SIMD kernel, four locals in the TypeScript one; both give the same numbers); see
 * recurrence.ts for the methods and the sub-step rule. `plan`, when given, is planSweep's for
 * the same record and options (a caller that planned already need not plan again).
 */
export function sweepOscillators(
  accelMS2: Float64Array,
  dtS: number,
  options: SweepOptions,
  plan: SweepPlan = planSweep(accelMS2, dtS, options),
): Peaks {
  const peaks = emptyPeaks(plan);
  const runner = groupRunner(accelMS2, plan, options.kernel ?? 'auto');
  for (const group of plan.groups) storeGroup(peaks, group, runner(group), accelMS2.length);
  return peaks;
}

/** Check the sweep and group its oscillators by sub-step count (rigid ones are not stepped). */
export function planSweep(accelMS2: Float64Array, dtS: number, options: SweepOptions): SweepPlan {
  const method = options.method ?? 'newmark-average';
  const periodsS = Float64Array.from(options.periodsS);
  const dampings = Float64Array.from(options.dampings);
  checkSweep(accelMS2, dtS, periodsS, dampings);
  const durationS = (accelMS2.length - 1) * dtS;
  const { roughness, bounds } = recordStatistics(accelMS2, dtS);
  const prewarp = options.prewarp ?? true;
  const oscillators: PlannedOscillator[] = [];
  const runOf = (periodS: number, damping: number) => {
    const substeps = substepCount(method, periodS, dtS, {
      damping,
      durationS,
      prewarp,
      roughness,
      stepsPerPeriod: options.stepsPerPeriod,
    });
    return executionPlan(substeps, periodS, dtS, roughness, options.stepsPerPeriod);
  };
  // Pre-warped, the rule does not depend on the damping: once a period.
  const runs = prewarp
    ? Array.from(periodsS, (periodS) => (periodS === 0 ? undefined : runOf(periodS, 0)))
    : [];
  for (let d = 0; d < dampings.length; d++) {
    for (let p = 0; p < periodsS.length; p++) {
      const periodS = periodsS[p];
      if (periodS === 0) continue;
      const run = runs[p] ?? runOf(periodS, dampings[d]);
      oscillators.push({
        index: d * periodsS.length + p,
        periodS,
        damping: dampings[d],
        substeps: run.steps,
        composed: run.composed,
        slot: 0,
      });
    }
  }
  // In sub-step order, and in index order among equal counts (the order in which they were
  // made): by bucket, since a comparison sort's thousands of calls ran cold in a fresh process.
  const buckets = new Map<number, PlannedOscillator[]>();
  for (const o of oscillators) {
    const bucket = buckets.get(o.substeps);
    if (bucket === undefined) buckets.set(o.substeps, [o]);
    else bucket.push(o);
  }
  const ordered: PlannedOscillator[] = [];
  for (const substeps of [...buckets.keys()].sort((a, b) => a - b)) {
    for (const o of buckets.get(substeps) as PlannedOscillator[]) ordered.push(o);
  }
  const groups: PlannedOscillator[][] = [];
  for (let start = 0; start < ordered.length; ) {
    const group = [ordered[start++]];
    while (
      group.length < GROUP_SIZE &&
      start < ordered.length &&
      ordered[start].substeps === group[0].substeps
    ) {
      group.push(ordered[start++]);
    }
    groups.push(group);
  }
  for (let slot = 0; slot < ordered.length; slot++) ordered[slot].slot = slot;
  const coefficients = planCoefficients(ordered, method, dtS, bounds, prewarp);
  return { method, prewarp, dtS, periodsS, dampings, pgaMS2: bounds.pgaMS2, bounds, groups, coefficients };
}

/**
 * packCoefficients of every planned oscillator, row `slot` each, for pre-warped Newmark average
 * acceleration (the default), from the plan's WebAssembly twin (the same numbers; see
 * wasm/plan.ts); undefined for the other methods, or where WebAssembly does not run.
 */
function planCoefficients(
  oscillators: PlannedOscillator[],
  method: Method,
  dtS: number,
  bounds: GroundBounds,
  prewarp: boolean,
): Float64Array | undefined {
  if (method !== 'newmark-average' || !prewarp) return undefined;
  const rows = new Float64Array(oscillators.length * COEFFICIENT_STRIDE);
  const inputs = new Float64Array(oscillators.length * PLAN_INPUT);
  for (const o of oscillators) {
    const at = o.slot * PLAN_INPUT;
    inputs[at] = o.periodS;
    inputs[at + 1] = o.damping;
    inputs[at + 2] = dtS / o.substeps;
    inputs[at + 3] = o.composed;
  }
  return wasmAverageRows(inputs, oscillators.length, bounds, rows) ? rows : undefined;
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
  for (let d = 0; d < plan.dampings.length; d++) {
    for (let p = 0; p < plan.periodsS.length; p++) {
      if (plan.periodsS[p] === 0) peaks.saMS2[d * plan.periodsS.length + p] = plan.pgaMS2; // rigid: moves with the ground
    }
  }
  return peaks;
}

/**
 * Copy one group's peaks (PEAK_STRIDE per oscillator) into the result arrays and count the
 * oscillator-steps it executed over a record of `samples` values.
 */
export function storeGroup(
  peaks: Peaks,
  group: PlannedOscillator[],
  values: Float64Array,
  samples: number,
): void {
  for (let g = 0; g < group.length; g++) {
    const index = group[g].index;
    peaks.sdM[index] = values[g * PEAK_STRIDE];
    peaks.svMS[index] = values[g * PEAK_STRIDE + 1];
    peaks.saMS2[index] = values[g * PEAK_STRIDE + 2];
  }
  peaks.oscillatorSteps += groupSteps(group, samples);
}

/** Oscillator-steps a planned group executes over a record of `samples` values. */
export function groupSteps(group: PlannedOscillator[], samples: number): number {
  return group.length * group[0].substeps * (samples - 1);
}

/** Oscillator-steps the whole plan executes over a record of `samples` values. */
export function plannedSteps(plan: SweepPlan, samples: number): number {
  let steps = 0;
  for (const group of plan.groups) steps += groupSteps(group, samples);
  return steps;
}

/** The kernel a sweep uses: WebAssembly SIMD where the engine has it, unless told otherwise. */
export function resolveKernel(kernel: SweepKernel, simd = wasmSimdSupported()): 'wasm' | 'js' {
  if (kernel === 'js') return 'js';
  if (kernel === 'wasm') {
    if (!simd) throw inputError('the WebAssembly SIMD kernel does not run on this engine');
    return 'wasm';
  }
  return simd ? 'wasm' : 'js';
}

/**
 * A function that steps one planned group over the record from rest and returns its peaks
 * (PEAK_STRIDE per oscillator; the array is reused from call to call).
 */
export function groupRunner(
  accelMS2: Float64Array,
  plan: SweepPlan,
  kernel: SweepKernel,
): (group: PlannedOscillator[]) => Float64Array {
  const values = new Float64Array(GROUP_SIZE * PEAK_STRIDE);
  const dtS = plan.dtS;
  const planned = plan.coefficients;
  const packed = new Float64Array(GROUP_SIZE * COEFFICIENT_STRIDE);
  // The group's rows: the plan's, or packed here when the plan has none.
  const rows = (group: PlannedOscillator[]) => {
    if (planned !== undefined) {
      const first = group[0].slot * COEFFICIENT_STRIDE;
      return planned.subarray(first, first + group.length * COEFFICIENT_STRIDE);
    }
    const stepS = dtS / group[0].substeps;
    for (let g = 0; g < group.length; g++) {
      packCoefficients(packed, g, group[g], plan.method, stepS, plan.bounds, plan.prewarp);
    }
    return packed;
  };
  if (resolveKernel(kernel) === 'wasm') {
    const sweeper = new WasmSweeper(accelMS2, STRETCH_STEPS);
    // Newmark average acceleration has equal forcing coefficients (see assembly/sweep.ts),
    // unless sub-steps are composed.
    const average = plan.method === 'newmark-average';
    return (group) => {
      const substeps = group[0].substeps;
      let symmetric = average;
      for (let g = 0; g < group.length; g++) if (group[g].composed !== 1) symmetric = false;
      const blockSteps = checkpointBlockSteps((accelMS2.length - 1) * substeps);
      sweeper.run(rows(group), group.length, substeps, dtS / substeps, blockSteps, symmetric, values);
      return values;
    };
  }
  warmKernel();
  const coefficients = new Float64Array(GROUP_WIDTH * COEFFICIENT_STRIDE);
  const scratch = groupScratch();
  return (group) => {
    const substeps = group[0].substeps;
    const stepS = dtS / substeps;
    const packed = rows(group);
    for (let first = 0; first < group.length; first += GROUP_WIDTH) {
      const count = Math.min(GROUP_WIDTH, group.length - first);
      for (let g = 0; g < GROUP_WIDTH; g++) {
        const from = (first + Math.min(g, count - 1)) * COEFFICIENT_STRIDE;
        coefficients.set(packed.subarray(from, from + COEFFICIENT_STRIDE), g * COEFFICIENT_STRIDE);
      }
      runGroup(accelMS2, substeps, stepS, coefficients, scratch);
      values.set(scratch.peaks.subarray(0, count * PEAK_STRIDE), first * PEAK_STRIDE);
    }
    return values;
  };
}

let kernelWarm = false;

/**
 * Run the kernel once over a short invented chirp with oscillators that take every path of its
 * code (each lane refines u, v and the absolute acceleration, on both the quadratic and the
 * linear branch of the Hermite root). V8 optimizes the kernel on the type feedback it has seen;
 * a path first taken after that would throw the optimized code away ("insufficient type
 * feedback"), and recompiling this large function many times cost seconds on a cold start.
 */
function warmKernel(): void {
  if (kernelWarm) return;
  kernelWarm = true;
  const n = 400;
  const dtS = 0.01;
  const chirp = new Float64Array(n + 1);
  for (let i = 0; i <= n; i++) {
    const t = i * dtS;
    chirp[i] = Math.sin(2 * Math.PI * (0.5 + 3 * t) * t) * Math.exp(-((t - 2) ** 2));
  }
  const bounds = groundBounds(chirp, dtS);
  const coefficients = new Float64Array(GROUP_WIDTH * COEFFICIENT_STRIDE);
  const scratch = groupScratch();
  const lanes = [
    { periodS: 0.3, damping: 0 },
    { periodS: 1, damping: 0.05 },
    { periodS: 0.15, damping: 0.5 },
    { periodS: 3, damping: 0.02 },
  ];
  for (const method of ['newmark-average', 'piecewise-exact', 'newmark-linear'] as const) {
    for (let shift = 0; shift < GROUP_WIDTH; shift++) {
      for (let g = 0; g < GROUP_WIDTH; g++) {
        packCoefficients(coefficients, g, lanes[(g + shift) % lanes.length], method, dtS, bounds);
      }
      // Every step refined, so that each lane takes every path of refineBlock.
      runGroup(chirp, 1, dtS, coefficients, scratch, true);
    }
  }
}

/** Steps of pass 1 per call: the interpolated input of a sub-stepped group is built this many at a time. */
export const STRETCH_STEPS = 8192;

/** Checkpoint blocks a group's pass 1 keeps at most, unless its blocks would outgrow a stretch. */
const MAX_BLOCKS = 16384;

/**
 * Steps per checkpoint block for a group that takes `totalSteps` steps: a power of two from 64 (a
 * block's checkpoint costs a few stores; pass 2 steps whole blocks again) up to STRETCH_STEPS,
 * doubled while the blocks would be more than MAX_BLOCKS, so that their memory stays bounded.
 */
export function checkpointBlockSteps(totalSteps: number): number {
  let blockSteps = 64;
  while (blockSteps < STRETCH_STEPS && Math.ceil(totalSteps / blockSteps) > MAX_BLOCKS) blockSteps *= 2;
  return blockSteps;
}

/**
 * The inputs of global steps first..first + steps of a group with `substeps` steps per sample
 * interval: the record itself when there is one, otherwise its linear interpolation, written into
 * `buffer`. Both passes take their inputs from here, so they see the same bits (the WebAssembly
 * kernel's stepInputs is the same arithmetic).
 */
function stepInputs(
  accelMS2: Float64Array,
  substeps: number,
  first: number,
  steps: number,
  buffer: Float64Array,
): Float64Array {
  if (substeps === 1) return accelMS2.subarray(first, first + steps + 1);
  const fraction = 1 / substeps;
  let s = Math.floor(first / substeps);
  let w = first - s * substeps;
  for (let j = 0; j <= steps; j++) {
    buffer[j] = w === 0 ? accelMS2[s] : accelMS2[s] + (accelMS2[s + 1] - accelMS2[s]) * (w * fraction);
    if (++w === substeps) {
      w = 0;
      s++;
    }
  }
  return buffer;
}

/** Working arrays of the TypeScript kernel for one group; the checkpoints grow on demand. */
interface GroupScratch {
  state: Float64Array;
  peaks: Float64Array;
  thresholds: Float64Array;
  buffer: Float64Array;
  checkpoints: Float64Array;
}

function groupScratch(): GroupScratch {
  return {
    state: new Float64Array(GROUP_WIDTH * STATE_STRIDE),
    peaks: new Float64Array(GROUP_WIDTH * PEAK_STRIDE),
    thresholds: new Float64Array(GROUP_WIDTH * PEAK_STRIDE),
    buffer: new Float64Array(STRETCH_STEPS + 1),
    checkpoints: new Float64Array(0),
  };
}

/**
 * Step one packed group over the whole record from rest and leave its peaks in `scratch.peaks`
 * (the two passes of kernel.ts). `everyBlock` refines every step of every block, for the warm-up.
 */
function runGroup(
  accelMS2: Float64Array,
  substeps: number,
  stepS: number,
  coefficients: Float64Array,
  scratch: GroupScratch,
  everyBlock = false,
): void {
  const total = (accelMS2.length - 1) * substeps;
  const blockSteps = checkpointBlockSteps(total);
  const blocks = Math.ceil(total / blockSteps);
  const stride = GROUP_WIDTH * CHECKPOINT_STRIDE;
  if (scratch.checkpoints.length < blocks * stride) scratch.checkpoints = new Float64Array(blocks * stride);
  const { state, peaks, thresholds, buffer, checkpoints } = scratch;
  state.fill(0);
  for (let first = 0; first < total; first += STRETCH_STEPS) {
    const steps = Math.min(STRETCH_STEPS, total - first);
    const input = stepInputs(accelMS2, substeps, first, steps, buffer);
    scanBlocks(input, steps, blockSteps, coefficients, state, checkpoints, (first / blockSteps) * stride);
  }
  for (let g = 0; g < GROUP_WIDTH; g++) {
    for (let q = 0; q < PEAK_STRIDE; q++) {
      let peak = 0;
      for (let b = 0; b < blocks; b++)
        peak = Math.max(peak, checkpoints[b * stride + g * CHECKPOINT_STRIDE + 2 + q]);
      const o = g * COEFFICIENT_STRIDE;
      peaks[g * PEAK_STRIDE + q] = peak;
      thresholds[g * PEAK_STRIDE + q] = peak * coefficients[o + 10] - coefficients[o + 11 + q];
    }
  }
  if (everyBlock) thresholds.fill(-1);
  for (let b = 0; b < blocks; b++) {
    let passes = everyBlock;
    for (let g = 0; g < GROUP_WIDTH && !passes; g++) {
      for (let q = 0; q < PEAK_STRIDE; q++) {
        if (checkpoints[b * stride + g * CHECKPOINT_STRIDE + 2 + q] > thresholds[g * PEAK_STRIDE + q])
          passes = true;
      }
    }
    if (!passes) continue;
    const first = b * blockSteps;
    const steps = Math.min(blockSteps, total - first);
    const input = stepInputs(accelMS2, substeps, first, steps, buffer);
    refineBlock(input, steps, stepS, coefficients, checkpoints, b * stride, thresholds, peaks);
  }
}

/** Write one oscillator's step coefficients into slot `slot` of the packed array. */
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
  target[o] = s.uu;
  target[o + 1] = s.uv;
  target[o + 2] = s.up0;
  target[o + 3] = s.up1;
  target[o + 4] = s.vu;
  target[o + 5] = s.vv;
  target[o + 6] = s.vp0;
  target[o + 7] = s.vp1;
  target[o + 8] = 2 * oscillator.damping * omega;
  target[o + 9] = omega * omega;
  const t = refinementThresholds(omega, 2 * oscillator.damping * omega, stepS, bounds);
  target[o + 10] = t.ratio;
  target[o + 11] = t.displacementOffset;
  target[o + 12] = t.velocityOffset;
  target[o + 13] = t.accelerationOffset;
}

/**
 * How much of the record's content sits near its Nyquist frequency: R = RMS(Δa)/RMS(a), which is
 * 2 sin(Ωdt/2) for a sine of circular frequency Ω (0 for a constant, 2 at the Nyquist
 * frequency). The sub-step rule uses it (see recordSubsteps in recurrence.ts).
 */
export function recordRoughness(accelMS2: Float64Array): number {
  return recordStatistics(accelMS2, 1).roughness;
}

/** The record's roughness (recordRoughness) and bounds (groundBounds), in one pass over it. */
export function recordStatistics(
  accelMS2: Float64Array,
  dtS: number,
): { roughness: number; bounds: GroundBounds } {
  // The pass over the record in WebAssembly where it runs (the same sums; see wasm/plan.ts).
  const [sum, sumDifferences, pgaMS2, jump] = wasmRecordSums(accelMS2) ?? recordSums(accelMS2);
  const n = accelMS2.length;
  const roughness = sum === 0 ? 0 : Math.sqrt(sumDifferences / (n - 1) / (sum / n));
  return { roughness, bounds: { pgaMS2, jerkMS3: jump / dtS } };
}

/** Σa², Σ(Δa)², max |a| and max |Δa| over the record: recordStatistics' pass (assembly/plan.ts is its twin). */
export function recordSums(accelMS2: ArrayLike<number>): [number, number, number, number] {
  let sum = accelMS2[0] * accelMS2[0];
  let sumDifferences = 0;
  let pgaMS2 = Math.abs(accelMS2[0]);
  let jump = 0;
  for (let i = 1; i < accelMS2.length; i++) {
    const a = accelMS2[i];
    const difference = a - accelMS2[i - 1];
    sum += a * a;
    sumDifferences += difference * difference;
    pgaMS2 = Math.max(pgaMS2, Math.abs(a));
    jump = Math.max(jump, Math.abs(difference));
  }
  return [sum, sumDifferences, pgaMS2, jump];
}

/** Bounds on the ground motion that the refinement thresholds use. */
export interface GroundBounds {
  /** Peak |ground acceleration|, m/s². */
  pgaMS2: number;
  /** Peak |ground jerk| of the linearly interpolated record, max |Δa|/dt, m/s³. */
  jerkMS3: number;
}

export function groundBounds(accelMS2: Float64Array, dtS: number): GroundBounds {
  return recordStatistics(accelMS2, dtS).bounds;
}

/**
 * When to refine a peak between steps. Near its peak P* at t*, a quantity q falls off no faster
 * than ½|q''|(t − t*)² (Taylor's theorem), so both ends of the step holding P* are above
 * P* − ½h²·max|q''|. Bounding |q''| at the peak from the equation of motion (with a_rel = ü):
 *   u'' = a_rel = −a_g − ω²u           → |u''| ≤ PGA + ω²P
 *   v'' = ȧ_rel = −ȧ_g − 2ζωa_rel − ω²v → |v''| ≤ J + ω²P      (a_rel = 0 at a peak of v)
 *   s'' (s = absolute acceleration)     → |s''| ≤ 2ζωJ + ω²(P + PGA)
 * where J is the record's peak jerk. A step whose new end is below P·r − d (r = 1 − ½(ωh)²·m,
 * d = ½h²·m·(bound's ground term), m = 1.1 a margin for the variation of q'' over the step)
 * cannot hold a peak higher than the running one P, so only the others are examined.
 */
export function refinementThresholds(omegaRadS: number, cRadS: number, stepS: number, bounds: GroundBounds) {
  const margin = 1.1;
  const half = 0.5 * margin * stepS * stepS;
  return {
    ratio: 1 - half * omegaRadS * omegaRadS,
    displacementOffset: half * bounds.pgaMS2,
    velocityOffset: half * bounds.jerkMS3,
    accelerationOffset: half * (cRadS * bounds.jerkMS3 + omegaRadS * omegaRadS * bounds.pgaMS2),
  };
}

function checkSweep(
  accelMS2: Float64Array,
  dtS: number,
  periodsS: Float64Array,
  dampings: Float64Array,
): void {
  if (!(dtS > 0) || !Number.isFinite(dtS)) throw inputError(`the time step must be positive, got ${dtS}`);
  if (accelMS2.length < 2) throw inputError('a sweep needs a record of at least 2 samples');
  if (periodsS.length === 0) throw inputError('the period grid is empty');
  if (dampings.length === 0) throw inputError('the damping list is empty');
  for (const t of periodsS) {
    if (!(t >= 0) || !Number.isFinite(t)) throw inputError(`periods must be finite and ≥ 0 s, got ${t}`);
  }
  for (const z of dampings) {
    if (!(z >= 0) || !Number.isFinite(z)) throw inputError(`damping ratios must be finite and ≥ 0, got ${z}`);
  }
}
