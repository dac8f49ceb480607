import { usageError } from '../base/errors.js';
import { recordRoughness } from '../oscillator/record-statistics.js';
import { executedStepCoefficients } from '../oscillator/recurrence.js';
import { checkHysteresis, type Hysteresis, postYieldRatio } from './hysteresis.js';

/**
 * The sub-step rule of the yielding oscillator: each record step is cut into
 * n = max(1, ⌈N(ζ)·Δt/T⌉, ⌈F·R²⌉) equal sub-steps, N(ζ) steps per elastic period (yieldingStepsPerPeriod)
 * and F = YIELDING_RECORD_FACTOR (R the record's roughness, recordRoughness). F is the elastic
 * Newmark-average rule's (substeps.ts): the step takes in the excitation as the mean of its ends.
 * The textbook recurrence's period error (ωh)²/12 builds up over every cycle the oscillator
 * remembers, so N grows as damping falls: N(ζ) = min(800, max(120, 120·√(0.025/ζ))), 120 from
 * ζ = 2.5% up. Calibrated on three stochastic records of 30 s (Δt = 0.005, 0.01, 0.02 s; T =
 * 0.03–3 s; R_y = 1.5, 2, 4, 8 of the exact elastic peak; elastoplastic and bilinear 5%: 216
 * oscillators a damping ratio), against N = 3840: worst peak-ductility error 0.19% (ζ = 5%, N = 120),
 * 0.34% (2%, 120), 0.53% and 0.26% (1%, N = 170 and 240), 0.38% (0.5%, 240), 0.42% (0, 720);
 * with N = 120 at ζ = 0 it was 13%. The error falls as 1/N², the method's order.
 * test/inelastic/convergence.test.ts checks that halving the step changes it by less than 0.5%.
 */
export const YIELDING_STEPS_PER_PERIOD = 120;
export const YIELDING_MAX_STEPS_PER_PERIOD = 800;
export const YIELDING_RECORD_FACTOR = 5;

/** Steps per elastic period N(ζ) of the rule above. */
export function yieldingStepsPerPeriod(damping: number): number {
  const grown =
    damping > 0 ? YIELDING_STEPS_PER_PERIOD * Math.sqrt(0.025 / damping) : Number.POSITIVE_INFINITY;
  return Math.min(YIELDING_MAX_STEPS_PER_PERIOD, Math.max(YIELDING_STEPS_PER_PERIOD, grown));
}

/** Most times one sub-step is split at a yield or unloading event. */
const MAX_SPLITS = 4;
/** Events closer than this fraction to either end of a piece are not split off. */
const MIN_FRACTION = 1e-6;
/** Newton–Raphson iterations per piece: the spring is piecewise linear, so 2 or 3 suffice. */
const MAX_ITERATIONS = 12;

export interface YieldingOptions {
  /** Elastic natural period T = 2π/ω, s (> 0). */
  periodS: number;
  /** Viscous damping ratio ζ at the elastic frequency (mass-proportional, c = 2ζωm), ≥ 0. */
  damping: number;
  model: Hysteresis;
  /** Yield displacement u_y = f_y/k, m (> 0; Infinity for an oscillator that never yields). */
  yieldDisplacementM: number;
  /** Sub-steps per record step; default the rule above (substepsFor). */
  substeps?: number;
  /** The record's roughness for the rule (recordRoughness), if already known; default computed. */
  roughness?: number;
  /** Stop as soon as |u| exceeds this, m (the result says `stopped`); default never. */
  stopAboveM?: number;
  /** false: step every sub-step on its own, never a whole elastic record step (for checks). */
  wholeSteps?: boolean;
}

export interface YieldingPeak {
  /** Peak |relative displacement| u_m, m (up to the stop, if `stopped`). */
  peakDisplacementM: number;
  /** Peak ductility μ = u_m/u_y (0 for an oscillator that never yields). */
  ductility: number;
  /** Yield excursions: how many times the spring went from elastic to yielding. */
  yieldEvents: number;
  /** Whether the run stopped early at `stopAboveM` (the peak is then a lower bound). */
  stopped: boolean;
  /** Sub-steps per record step used. */
  substeps: number;
}

/** Sub-steps per record step for an oscillator of period T and damping ζ by the rule above (R: recordRoughness). */
export function substepsFor(periodS: number, damping: number, dtS: number, roughness: number): number {
  return Math.max(
    1,
    Math.ceil((yieldingStepsPerPeriod(damping) * dtS) / periodS - 1e-9),
    Math.ceil(YIELDING_RECORD_FACTOR * roughness * roughness - 1e-9),
  );
}

/**
 * Peak response of a yielding SDOF oscillator, u'' + 2ζωu' + f_s(u)/m = −a_g(t), from rest, to the
 * ground acceleration `accelMS2` (m/s², step dtS, linear between samples). Newmark's average
 * acceleration method (γ = 1/2, β = 1/4) with Newton–Raphson iterations on the tangent stiffness
 * within each step (Newmark 1959; Chopra, Dynamics of Structures, §5.7, from memory). The spring
 * is elastoplastic or bilinear with kinematic hardening: f_s/k = clip(s + Δu, αu − (1 − α)u_y,
 * αu + (1 − α)u_y). A step in which the spring starts to yield, or a yielding spring's velocity
 * turns, is split at the event (the time the step's own quadratic motion reaches the yield band, or
 * its velocity reaches zero) and the rest of it is stepped on the new branch, so the result
 * converges with the step. The peak between steps is taken from the step's quadratic motion.
 * An elastic record step that no sub-step of can yield or pass the peak so far (an energy bound)
 * is taken whole, its n sub-steps composed into one (executedStepCoefficients, not pre-warped): the same numbers, five
 * times faster on the default grid, since most steps of a search run are such steps.
 * The recurrence is the textbook one, not pre-warped as the elastic engine's: a warped stiffness
 * moves the yield force or the yield displacement by as much as the period error it removes, and
 * the peak ductility is as sensitive to either (measured: pre-warping doubled the error).
 */
export function yieldingPeak(accelMS2: Float64Array, dtS: number, options: YieldingOptions): YieldingPeak {
  const { periodS, damping } = checkYieldingOptions(options);
  const n =
    options.substeps ?? substepsFor(periodS, damping, dtS, options.roughness ?? recordRoughness(accelMS2));
  if (!Number.isInteger(n) || n < 1) throw usageError(`substeps must be a positive integer, got ${n}`);
  const stepS = dtS / n;
  const omega = (2 * Math.PI) / periodS;
  const stiffness = omega * omega;
  const viscous = 2 * damping * omega;
  const alpha = postYieldRatio(options.model);
  const uy = options.yieldDisplacementM;
  const band = (1 - alpha) * uy;
  const stop = options.stopAboveM ?? Number.POSITIVE_INFINITY;

  const state = new Float64Array(STATE_SIZE);
  const piece: PieceModel = { stepS, stiffness, viscous, alpha, band };
  // Coefficients of a whole sub-step: equilibrium at its end is A·du + B + ω²·s(du) = 0.
  const A = 4 / (stepS * stepS) + (2 * viscous) / stepS;
  const elasticPivot = 1 / (A + stiffness);
  const yieldingPivot = 1 / (A + stiffness * alpha);
  const fourOverH = 4 / stepS;
  const twoOverH = 2 / stepS;
  const fourOverH2 = 4 / (stepS * stepS);
  // Committed state: displacement, velocity, acceleration (relative), spring f_s/k (m), and on
  // which side of the yield band the spring sits (+1 upper, −1 lower, 0 inside).
  let u = 0;
  let v = 0;
  let a = -accelMS2[0];
  let s = 0;
  let side = 0;
  let peak = 0;
  let events = 0;
  const last = accelMS2.length - 1;
  // n elastic sub-steps composed into one record step (the same map the elastic engine composes):
  // s and v at its end from s, v and the ground acceleration at its ends.
  const whole =
    n > 1 && options.wholeSteps !== false
      ? executedStepCoefficients('newmark-average', omega, damping, dtS, n, false)
      : undefined;
  const centre = alpha / (1 - alpha);
  for (let i = 0; i < last; i++) {
    const ag0 = accelMS2[i];
    const ag1 = accelMS2[i + 1];
    if (whole !== undefined && side === 0) {
      // An elastic record step that can neither yield nor pass the peak so far is stepped whole
      // (executedStepCoefficients): the same n sub-steps, composed. The spring's motion is the ramp's
      // quasi-static response q(t) = Q + Q'·t plus a free motion whose energy norm
      // √(d² + (d'/ω)²) the average-acceleration recurrence never increases, so every sub-step's
      // spring lies within r of the ramp's ends.
      const rampSlope = -(ag1 - ag0) / (dtS * stiffness);
      const rampStart = (-ag0 - viscous * rampSlope) / stiffness;
      const rampEnd = rampStart + rampSlope * dtS;
      const free = s - rampStart;
      const freeRate = v - rampSlope;
      const r = Math.sqrt(free * free + (freeRate * freeRate) / stiffness);
      const offset = u - s;
      const c = centre * offset;
      const reach = Math.max(Math.abs(rampStart - c), Math.abs(rampEnd - c)) + r;
      const far = Math.abs(offset) + Math.max(Math.abs(rampStart), Math.abs(rampEnd)) + r;
      if (reach < uy * ELASTIC_MARGIN && far * PEAK_MARGIN < peak) {
        const sNew = whole.uu * s + whole.uv * v + whole.up0 * ag0 + whole.up1 * ag1;
        v = whole.vu * s + whole.vv * v + whole.vp0 * ag0 + whole.vp1 * ag1;
        s = sNew;
        u = offset + sNew;
        a = -ag1 - viscous * v - stiffness * sNew;
        continue;
      }
    }
    const slope = (ag1 - ag0) / n;
    for (let j = 0; j < n; j++) {
      // Newton–Raphson from du = 0 on the tangent of the committed branch; the spring is linear
      // on each branch, so an iterate that stays on the branch it was computed for is the root.
      const B = agEnd(ag0, slope, j + 1) - fourOverH * v - a - viscous * v;
      let branch = side !== 0 && v * side > 0 ? side : 0;
      let du = -(B + stiffness * s) * (branch === 0 ? elasticPivot : yieldingPivot);
      let sNew = s;
      let sideNew = 0;
      for (let iteration = 0; iteration < MAX_ITERATIONS; iteration++) {
        const uNew = u + du;
        const trial = s + du;
        const upper = alpha * uNew + band;
        const lower = alpha * uNew - band;
        if (trial > upper) {
          sNew = upper;
          sideNew = 1;
        } else if (trial < lower) {
          sNew = lower;
          sideNew = -1;
        } else {
          sNew = trial;
          sideNew = 0;
        }
        if (sideNew === branch) break;
        branch = sideNew;
        du -= (A * du + B + stiffness * sNew) * (branch === 0 ? elasticPivot : yieldingPivot);
      }
      const vNew = twoOverH * du - v;
      const aNew = fourOverH2 * (du - stepS * v) - a;
      const yields = side === 0 && sideNew !== 0;
      if (yields || (side !== 0 && v * side > 0 && vNew * side < 0)) {
        // An event inside the sub-step: step it again in pieces (eventStep), from the committed state.
        state[U] = u;
        state[V] = v;
        state[ACCEL] = a;
        state[S] = s;
        state[SIDE] = side;
        state[PEAK] = peak;
        state[EVENTS] = events;
        eventStep(state, piece, ag0 + slope * j, slope);
        u = state[U];
        v = state[V];
        a = state[ACCEL];
        s = state[S];
        side = state[SIDE];
        peak = state[PEAK];
        events = state[EVENTS];
      } else {
        if (v * vNew < 0) {
          // The turning point of the step's motion, u + v·t + ā·t²/2 with ā = (a + aNew)/2.
          const turn = Math.abs(u - (v * v * stepS) / (vNew - v) / 2);
          if (turn > peak) peak = turn;
        }
        u += du;
        v = vNew;
        a = aNew;
        s = sNew;
        side = sideNew;
        if (Math.abs(u) > peak) peak = Math.abs(u);
      }
    }
    if (peak > stop) return result(peak, uy, events, true, n);
  }
  return result(peak, uy, events, false, n);
}

/** A whole-step elastic spring stays this fraction inside the yield band (room for rounding). */
const ELASTIC_MARGIN = 1 - 1e-9;
/** A whole step's bound on |u| is raised by this before it is compared with the peak so far. */
const PEAK_MARGIN = 1.01;

/** The ground acceleration `substeps` sub-steps into a record step. */
function agEnd(ag0: number, slope: number, substeps: number): number {
  return ag0 + slope * substeps;
}

/** What eventStep needs of the oscillator. */
interface PieceModel {
  stepS: number;
  stiffness: number;
  viscous: number;
  alpha: number;
  band: number;
}

/** Slots of eventStep's state array. */
const U = 0;
const V = 1;
const ACCEL = 2;
const S = 3;
const SIDE = 4;
const PEAK = 5;
const EVENTS = 6;
const STATE_SIZE = 7;

/**
 * One sub-step (ground acceleration ag0 at its start, rising by `slope` over it) in pieces: each
 * piece is solved by Newton–Raphson to its end; if the spring starts to yield in it, or a yielding
 * spring turns, it is cut at that event and solved again, then the rest follows from there.
 */
function eventStep(state: Float64Array, model: PieceModel, ag0: number, slope: number): void {
  const { stepS, stiffness, viscous, alpha, band } = model;
  let u = state[U];
  let v = state[V];
  let a = state[ACCEL];
  let s = state[S];
  let side = state[SIDE];
  let peak = state[PEAK];
  let events = state[EVENTS];
  let done = 0;
  let splits = 0;
  while (done < 1) {
    let piece = 1 - done;
    for (let pass = 0; ; pass++) {
      const h = piece * stepS;
      const A = 4 / (h * h) + (2 * viscous) / h;
      const B = agEnd(ag0, slope, done + piece) - (4 / h) * v - a - viscous * v;
      let branch = side !== 0 && v * side > 0 ? side : 0;
      let du = -(B + stiffness * s) / (A + stiffness * (branch === 0 ? 1 : alpha));
      let sNew = s;
      let sideNew = 0;
      for (let iteration = 0; iteration < MAX_ITERATIONS; iteration++) {
        const uNew = u + du;
        const trial = s + du;
        const upper = alpha * uNew + band;
        const lower = alpha * uNew - band;
        sideNew = trial > upper ? 1 : trial < lower ? -1 : 0;
        sNew = sideNew === 1 ? upper : sideNew === -1 ? lower : trial;
        if (sideNew === branch) break;
        branch = sideNew;
        du -= (A * du + B + stiffness * sNew) / (A + stiffness * (branch === 0 ? 1 : alpha));
      }
      const vNew = (2 / h) * du - v;
      const aNew = (4 / (h * h)) * (du - h * v) - a;
      if (pass === 0 && splits < MAX_SPLITS) {
        let fraction = 1;
        if (side === 0 && sideNew !== 0) {
          // Yield: the trial meets the band after the displacement x (its gap closes at 1 − α).
          const gap = sideNew > 0 ? alpha * u + band - s : s - alpha * u + band;
          const x = (sideNew * gap) / (1 - alpha);
          fraction = crossingFraction(x, du, v, (a + aNew) / 2, h);
        } else if (side !== 0 && v * side > 0 && vNew * side < 0) {
          fraction = v / (v - vNew); // a yielding spring turns: its velocity reaches zero
        }
        if (fraction > MIN_FRACTION && fraction < 1 - MIN_FRACTION) {
          piece *= fraction;
          splits++;
          continue;
        }
      }
      if (v * vNew < 0) {
        const turn = Math.abs(u - (v * v * h) / (vNew - v) / 2);
        if (turn > peak) peak = turn;
      }
      u += du;
      v = vNew;
      a = aNew;
      s = sNew;
      if (side === 0 && sideNew !== 0) events++;
      side = sideNew;
      if (Math.abs(u) > peak) peak = Math.abs(u);
      done += piece;
      break;
    }
  }
  state[U] = u;
  state[V] = v;
  state[ACCEL] = a;
  state[S] = s;
  state[SIDE] = side;
  state[PEAK] = peak;
  state[EVENTS] = events;
}

/**
 * The fraction of a piece of length h at which its motion u(t) − u = v·t + ā·t²/2 first reaches x
 * (same sign as du); the displacement fraction x/du where the quadratic has no such root.
 */
function crossingFraction(x: number, du: number, v: number, meanAccel: number, h: number): number {
  const discriminant = v * v + 2 * meanAccel * x;
  if (v * x > 0 && discriminant >= 0) {
    const t = (2 * x) / (v + Math.sign(v) * Math.sqrt(discriminant));
    if (t > 0 && t < h) return t / h;
  }
  return x / du;
}

function result(peak: number, uy: number, events: number, stopped: boolean, substeps: number): YieldingPeak {
  return { peakDisplacementM: peak, ductility: peak / uy, yieldEvents: events, stopped, substeps };
}

/** Refuse options that do not describe a yielding oscillator, in one line each. */
export function checkYieldingOptions(options: YieldingOptions): YieldingOptions {
  const { periodS, damping, yieldDisplacementM } = options;
  if (!(periodS > 0) || !Number.isFinite(periodS))
    throw usageError(`a yielding oscillator needs a period > 0 s, got ${periodS}`);
  if (!(damping >= 0) || !Number.isFinite(damping))
    throw usageError(`the damping ratio must be ≥ 0, got ${damping}`);
  if (!(yieldDisplacementM > 0))
    throw usageError(`the yield displacement must be > 0 m, got ${yieldDisplacementM}`);
  checkHysteresis(options.model);
  return options;
}
