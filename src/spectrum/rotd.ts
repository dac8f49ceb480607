import { inputError, usageError } from '../base/errors.js';
import { resolveKernel } from '../oscillator/group-runner.js';
import { WasmRotD } from '../oscillator/kernels/wasm-rotd.js';
import { hermitePeak, refinementThresholds } from '../oscillator/peak.js';
import { checkSweep } from '../oscillator/plan.js';
import { recordRoughness } from '../oscillator/record-statistics.js';
import { executedStepCoefficients, type Method } from '../oscillator/recurrence.js';
import { executionPlan, substepCount } from '../oscillator/substeps.js';
import type { SweepKernel, SweepOptions } from '../oscillator/sweep.js';
import type { GroundRecord } from '../record/record.js';
import { recordInfo, type SpectrumRecordInfo } from './spectrum.js';

/** Finest rotation step, degrees: 18,000 angles, already far past any change in RotD50 or RotD100. */
export const MIN_ANGLE_STEP_DEG = 0.01;

/** Two-component spectra of a pair of horizontal records at one damping ratio, m/s², by period. */
export interface RotDCurve {
  damping: number;
  /** Median over rotation angles of PSA(θ) (Boore 2010, RotD50). */
  rotd50MS2: Float64Array;
  /** Largest over rotation angles of PSA(θ) (Boore 2010, RotD100). */
  rotd100MS2: Float64Array;
  /** √(PSA₁ · PSA₂) of the two components as recorded. */
  geomeanMS2: Float64Array;
}

export interface RotDSpectra {
  records: [SpectrumRecordInfo, SpectrumRecordInfo];
  method: Method;
  periodsS: Float64Array;
  /** Angle between successive rotations, degrees; the angles are 0 ≤ θ < 180°. */
  angleStepDeg: number;
  /** Zero samples appended to the shorter record so both have the same length. */
  paddedSamples: number;
  curves: RotDCurve[];
}

/** The grid, the method and the kernel (both kernels give the same bits) as for a sweep. */
export interface RotDOptions extends Pick<SweepOptions, 'periodsS' | 'dampings' | 'method' | 'kernel'> {
  /** Rotation step, degrees, dividing 180 into a whole number of steps; default 1. */
  angleStepDeg?: number;
}

/**
 * RotD50 and RotD100 (Boore, BSSA 100(4), 2010) and the geometric mean of two horizontal
 * components with the same time step. The oscillator is linear, so under the motion rotated by θ
 * u(θ, t) = u₁(t) cos θ + u₂(t) sin θ: each oscillator runs once per component with the sweep's
 * sub-steps and coefficients, and each angle's peak is kept with the sweep's Hermite refinement;
 * PSA(θ) = ω² max|u(θ, t)|. An even number of angles takes the mean of the two middle values as
 * the median. A shorter record is padded with zeros (ground at rest).
 */
export function rotDSpectra(first: GroundRecord, second: GroundRecord, options: RotDOptions): RotDSpectra {
  const job = prepareRotD(first, second, options);
  runRotDCells(job);
  return finishRotD(first, second, job);
}

/**
 * RotD work as the threads of a RotDPool (or this thread alone) share it: a counter hands out
 * (damping, period) cells, damping-major; the results hold, for each damping in turn, its RotD50,
 * RotD100 and geometric-mean curves (m/s²).
 */
export interface RotDJob {
  a1: Float64Array;
  a2: Float64Array;
  dtS: number;
  /** max(R₁, R₂) of recordRoughness, for the sub-step rule. */
  roughness: number;
  /** Peak |(a₁, a₂)|, m/s², which no rotated component exceeds. */
  resultantMS2: number;
  cos: Float64Array;
  sin: Float64Array;
  angleStepDeg: number;
  periodsS: Float64Array;
  dampings: Float64Array;
  method: Method;
  /** The loop over angles: WebAssembly SIMD (assembly/rotd.ts) or TypeScript; 'auto' by default. */
  kernel?: SweepKernel;
  counter: Int32Array;
  results: Float64Array;
}

/** Check the pair and the grid, pad the shorter component, and lay out the job for one thread. */
export function prepareRotD(first: GroundRecord, second: GroundRecord, options: RotDOptions): RotDJob {
  const periodsS = Float64Array.from(options.periodsS);
  const dampings = Float64Array.from(options.dampings);
  const angleStepDeg = options.angleStepDeg ?? 1;
  // 0.01° makes 18,000 angles, each a sweep of the pair; finer changes RotD50 by less than rounding.
  const angles = Math.round(180 / angleStepDeg);
  if (
    !(angleStepDeg >= MIN_ANGLE_STEP_DEG) ||
    angleStepDeg > 1 ||
    Math.abs(angles * angleStepDeg - 180) > 1e-9
  ) {
    throw usageError(
      `angle step ${angleStepDeg}°: use a divisor of 180° from ${MIN_ANGLE_STEP_DEG}° to 1° (1, 0.5, 0.25, …)`,
    );
  }
  if (Math.abs(first.dtS - second.dtS) > 1e-9 * first.dtS) {
    throw inputError(
      `the two components have different time steps (${first.dtS} s and ${second.dtS} s); resample one first`,
      { file: second.source },
    );
  }
  const length = Math.max(first.accelMS2.length, second.accelMS2.length);
  const a1 = padded(first.accelMS2, length);
  const a2 = padded(second.accelMS2, length);
  checkSweep(a1, first.dtS, periodsS, dampings);
  let resultantMS2 = 0;
  for (let n = 0; n < length; n++) resultantMS2 = Math.max(resultantMS2, Math.hypot(a1[n], a2[n]));
  const cos = new Float64Array(angles);
  const sin = new Float64Array(angles);
  for (let k = 0; k < angles; k++) {
    const degrees = k * angleStepDeg;
    cos[k] = degrees === 90 ? 0 : Math.cos((degrees * Math.PI) / 180);
    sin[k] = degrees === 0 ? 0 : degrees === 90 ? 1 : Math.sin((degrees * Math.PI) / 180);
  }
  return {
    a1,
    a2,
    dtS: first.dtS,
    roughness: Math.max(recordRoughness(a1), recordRoughness(a2)),
    resultantMS2,
    cos,
    sin,
    angleStepDeg,
    periodsS,
    dampings,
    method: options.method ?? 'newmark-average',
    kernel: options.kernel,
    counter: new Int32Array(1),
    results: new Float64Array(3 * dampings.length * periodsS.length),
  };
}

/** The spectra of the pair from the job's results. */
export function finishRotD(first: GroundRecord, second: GroundRecord, job: RotDJob): RotDSpectra {
  const periods = job.periodsS.length;
  const curve = (d: number, q: number) => job.results.slice((3 * d + q) * periods, (3 * d + q + 1) * periods);
  return {
    records: [recordInfo(first, job.dampings, job.periodsS), recordInfo(second, job.dampings, job.periodsS)],
    method: job.method,
    periodsS: job.periodsS,
    angleStepDeg: job.angleStepDeg,
    paddedSamples: Math.abs(first.accelMS2.length - second.accelMS2.length),
    curves: Array.from(job.dampings, (damping, d) => ({
      damping,
      rotd50MS2: curve(d, 0),
      rotd100MS2: curve(d, 1),
      geomeanMS2: curve(d, 2),
    })),
  };
}

/** Claim cells from the job's counter until none is left, and compute each on this thread. */
export function runRotDCells(job: RotDJob): void {
  const { a1, a2, cos, sin, periodsS, dampings } = job;
  const angles = cos.length;
  const quarter = Math.round(90 / job.angleStepDeg);
  const peaks = new Float64Array(angles);
  const thresholds = new Float64Array(angles);
  const wasm = resolveKernel(job.kernel ?? 'auto') === 'wasm' ? new WasmRotD(a1, a2, cos, sin) : undefined;
  const periods = periodsS.length;
  for (;;) {
    const cell = Atomics.add(job.counter, 0, 1);
    if (cell >= dampings.length * periods) return;
    const d = Math.floor(cell / periods);
    const p = cell - d * periods;
    let scale = 1;
    if (periodsS[p] === 0) {
      groundPeaks(a1, a2, cos, sin, peaks); // rigid: PSA(θ) is the peak rotated ground acceleration
    } else {
      const omega = (2 * Math.PI) / periodsS[p];
      scale = omega * omega;
      oscillatorPeaks(job, periodsS[p], dampings[d], peaks, thresholds, wasm);
    }
    const at = 3 * d * periods + p;
    job.results[at + 2 * periods] = scale * Math.sqrt(peaks[0] * peaks[quarter]);
    peaks.sort();
    job.results[at + periods] = scale * peaks[angles - 1];
    const middle = angles >> 1;
    job.results[at] = scale * (angles % 2 === 1 ? peaks[middle] : 0.5 * (peaks[middle - 1] + peaks[middle]));
  }
}

function padded(samples: Float64Array, length: number): Float64Array {
  if (samples.length === length) return samples;
  const out = new Float64Array(length);
  out.set(samples);
  return out;
}

/** Peak over the samples of |a₁ cos θ + a₂ sin θ| (exact for linear interpolation between samples). */
function groundPeaks(
  a1: Float64Array,
  a2: Float64Array,
  cos: Float64Array,
  sin: Float64Array,
  peaks: Float64Array,
): void {
  peaks.fill(0);
  for (let n = 0; n < a1.length; n++) {
    const x = a1[n];
    const y = a2[n];
    for (let k = 0; k < peaks.length; k++) {
      const value = Math.abs(cos[k] * x + sin[k] * y);
      if (value > peaks[k]) peaks[k] = value;
    }
  }
}

/** Peak |u(θ, t)| for every angle of one oscillator, m, into `peaks`; nothing is allocated in the loops. */
function oscillatorPeaks(
  job: RotDJob,
  periodS: number,
  damping: number,
  peaks: Float64Array,
  thresholds: Float64Array,
  wasm: WasmRotD | undefined,
): void {
  const { a1, a2, dtS, roughness, method, cos, sin } = job;
  const durationS = (a1.length - 1) * dtS;
  // The sweep's execution plan (substeps.ts), so PSA here is the sweep's PSA.
  const run = executionPlan(
    substepCount(method, periodS, dtS, { damping, durationS, roughness }),
    periodS,
    dtS,
    roughness,
    0,
    damping,
  );
  const substeps = run.steps;
  const h = dtS / substeps;
  const omega = (2 * Math.PI) / periodS;
  const c = executedStepCoefficients(method, omega, damping, h, run.composed);
  const { uu, uv, up0, up1, vu, vv, vp0, vp1 } = c;
  const angles = peaks.length;
  const inverse = 1 / substeps;
  // The sweep's refinement rule (see refinementThresholds), with the ground's peak over all directions.
  const rule = refinementThresholds(omega, 2 * damping * omega, h, { pgaMS2: job.resultantMS2, jerkMS3: 0 });
  const R = rule.ratio;
  const offset = rule.displacementOffset;
  if (wasm !== undefined) {
    wasm.run([uu, uv, up0, up1, vu, vv, vp0, vp1], substeps, h, R, offset, peaks);
    return;
  }
  peaks.fill(0);
  thresholds.fill(0);
  let u1 = 0;
  let v1 = 0;
  let u2 = 0;
  let v2 = 0;
  const last = a1.length - 1;
  for (let n = 0; n < last; n++) {
    const start1 = a1[n];
    const end1 = a1[n + 1];
    const increment1 = (end1 - start1) * inverse;
    const start2 = a2[n];
    const end2 = a2[n + 1];
    const increment2 = (end2 - start2) * inverse;
    let pa1 = start1;
    let pa2 = start2;
    for (let j = 1; j <= substeps; j++) {
      const pb1 = j === substeps ? end1 : start1 + j * increment1;
      const pb2 = j === substeps ? end2 : start2 + j * increment2;
      const uo1 = u1;
      const vo1 = v1;
      const uo2 = u2;
      const vo2 = v2;
      u1 = uu * uo1 + uv * vo1 + up0 * pa1 + up1 * pb1;
      v1 = vu * uo1 + vv * vo1 + vp0 * pa1 + vp1 * pb1;
      u2 = uu * uo2 + uv * vo2 + up0 * pa2 + up1 * pb2;
      v2 = vu * uo2 + vv * vo2 + vp0 * pa2 + vp1 * pb2;
      for (let k = 0; k < angles; k++) {
        const ck = cos[k];
        const sk = sin[k];
        const u = ck * u1 + sk * u2;
        if (Math.abs(u) > thresholds[k]) {
          const peak = hermitePeak(ck * uo1 + sk * uo2, u, ck * vo1 + sk * vo2, ck * v1 + sk * v2, h);
          if (peak > peaks[k]) {
            peaks[k] = peak;
            thresholds[k] = peak * R - offset;
          }
        }
      }
      pa1 = pb1;
      pa2 = pb2;
    }
  }
}
