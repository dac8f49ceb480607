import { inputError } from '../base/errors.js';
import { formatNumber } from '../base/numbers.js';
import type { Method } from './recurrence.js';

/**
 * The sub-step rule: steps per natural period N for every peak to stay within 0.3% of the exact
 * peak response to the linearly interpolated record (the README promises 0.5%). Calibrated on
 * stochastic records against the exact method at 400 steps a period, T = 0.01–10 s, ζ = 0–0.5,
 * Δt = 0.005–0.02 s; with the record rule (recordSubsteps) and the high-damping factor
 * (fastestPoleRatio), test/reference/accuracy-campaign.test.ts checks it against an independent
 * exact reference on narrow-band and broadband records, T = 0.01–20 s, ζ = 0–10.
 * - Piecewise-exact is exact at the steps; 10 a period let the Hermite refinement find the peaks.
 * - Pre-warped Newmark (prewarpedOscillator in recurrence.ts) keeps an amplitude error of about
 *   9.5%·(10/N)² (average) and 3.3%·(10/N)² (linear acceleration): N = 66 and 38 keep it near 0.25%.
 * - The textbook recurrences' period error T̄/T − 1 ≈ (ωh)²/12 (average) and (ωh)²/24 (linear)
 *   (Newmark 1959; Chopra, Dynamics of Structures, §5.5) shifts the phase on every cycle the
 *   oscillator remembers (C: all of the record when ζ = 0, about 1/(2πζ) otherwise), so
 *   N = √(K·C + N₀²): up to 40 times more steps on long undamped runs, hence pre-warping by default.
 */
export const MIN_STEPS_PER_PERIOD = 10;

/** The share of the 0.5% that the record rule leaves to how a Newmark method takes in the excitation. */
export const RECORD_ERROR = 0.001;

/**
 * Each method's rule: `prewarped` N; the textbook rule's K and N₀ (`k`, `baseSteps`); `recordFactor`
 * F, for ⌈F·ρ⌉ sub-steps per record step whatever the period, ρ = inputFrequency(R) (R the
 * roughness; see recordSubsteps for the derivation of each F).
 */
export const SUBSTEP_RULE: Readonly<
  Record<Method, { prewarped: number; k: number; baseSteps: number; recordFactor: number }>
> = {
  'newmark-average': { prewarped: 66, k: 2100, baseSteps: 71, recordFactor: newmarkRecordFactor() },
  'newmark-linear': { prewarped: 38, k: 1050, baseSteps: 39, recordFactor: newmarkRecordFactor() },
  'piecewise-exact': {
    prewarped: MIN_STEPS_PER_PERIOD,
    k: 0,
    baseSteps: MIN_STEPS_PER_PERIOD,
    recordFactor: 1 / 1.25,
  },
};

/** F = 1/√(12·RECORD_ERROR) ≈ 9.13: (Ωh)²/12 ≤ RECORD_ERROR when h ≤ dt/(F·Ωdt) (see recordSubsteps). */
function newmarkRecordFactor(): number {
  return 1 / Math.sqrt(12 * RECORD_ERROR);
}

/**
 * ρ = R·√(1 + R²/2), a bound on Ω·dt for the fastest content a record of roughness R carries
 * (recordRoughness in record-statistics.ts). For a sine at Ω, R = 2 sin(Ωdt/2), so
 * Ωdt = 2 arcsin(R/2) ≤ ρ (equal to first order, π against ρ = √12 at R = 2). The bound is
 * taken larger than 2 arcsin(R/2) near R = 2 because there the linearly interpolated record is a
 * zigzag whose kinks carry content above Ω: for a zigzag of amplitude A the displacement it drives
 * in a long-period oscillator peaks at A·dt²/12 and its acceleration at A, so its (Ωdt)² in the
 * error below is effectively dt²·A/(A·dt²/12) = 12 = ρ².
 */
export function inputFrequency(roughness: number): number {
  const r = Math.min(roughness, 2);
  return r * Math.sqrt(1 + (r * r) / 2);
}

/**
 * A bound on |λ_max|/ω, the oscillator's fastest pole over its natural frequency: 1 up to ζ = 1/2,
 * 2ζ above (≥ ζ + √(ζ² − 1), the overdamped oscillator's fast mode, which decays in
 * 1/(ω(ζ + √(ζ² − 1))) and must be stepped as finely as a natural period is at light damping; the
 * steps-per-period rule is multiplied by it). Taken as 2ζ from ζ = 1/2 rather than from critical
 * damping: with the bare rule the worst errors were at ζ = 1 (0.36–0.48% in SV).
 */
export function fastestPoleRatio(damping: number): number {
  return Math.max(1, 2 * damping);
}

/** √max(1, 2ζ) for linear acceleration, whose error in the damping force grows as 2ζ (see recordSubsteps); 1 otherwise. */
export function dampingScale(method: Method, damping: number): number {
  return method === 'newmark-linear' ? Math.sqrt(Math.max(1, 2 * damping)) : 1;
}

export interface SubstepContext {
  damping: number;
  /** Duration of the record, s (an undamped oscillator remembers all of it). */
  durationS: number;
  /** Whether the Newmark recurrences are pre-warped (the default). */
  prewarp?: boolean;
  /** The record's roughness R = RMS(Δa)/RMS(a) (see recordRoughness in record-statistics.ts); default 0. */
  roughness?: number;
  /** Least steps per period asked for by the user (raises the rule's, never lowers it). */
  stepsPerPeriod?: number;
}

/**
 * Sub-steps per record step that `method` needs whatever the period, for a record of roughness R
 * (ρ = inputFrequency(R) bounds Ωdt, Ω the fastest content of the record), derived from each
 * method's error for the forced response:
 * - Newmark average acceleration takes in the excitation as the mean of each sub-step's ends. For
 *   content well above the natural frequency (the forced, mass-like part u'' ≈ −a_g), one sub-step
 *   h gives u_{n+1} = u_n + h·v_n + h²(a_n + a_{n+1})/4 where the exact value for a linear
 *   acceleration is u_n + h·v_n + h²(2a_n + a_{n+1})/6, v being exact (the trapezoidal rule): an error
 *   of h²(a_{n+1} − a_n)/12 per sub-step, which telescopes to h²·a(t)/12. On a forced response
 *   u = a_g/Ω² that is a relative error −(Ωh)²/12 (−1.6% measured on a ramped 3.5 Hz sine at 0.02 s with
 *   h = dt). Keeping it below RECORD_ERROR = 0.1% asks h ≤ dt/(F·ρ), F = 1/√(12·0.001) ≈ 9.13:
 *   k = ⌈F·ρ⌉ (5 for the 3.5 Hz sine at 0.02 s, R = 0.44; 32 for content at the Nyquist frequency).
 *   The earlier ⌈5R²⌉, calibrated on broadband records, gave k = 1 there, and is below ⌈F·ρ⌉ for
 *   every R. These sub-steps are composed (executionPlan), so they cost almost nothing.
 * - Newmark linear acceleration takes in a linear excitation exactly for the mass-like part, but
 *   not the damping force 2ζωu', whose forced part is of relative size 2ζω/Ω and varies over the
 *   sub-step as the excitation does: an error about 2ζ(ω/Ω)(Ωh)²/12, at most (Ωh)²/12 for ζ ≤ 0.5
 *   (ω ≤ Ω; above, the period rule holds the step), and 2ζ times that above: k = ⌈F·ρ·√max(1, 2ζ)⌉.
 * - Piecewise-exact is exact at the steps, so only the Hermite search between them needs the
 *   record's fastest content resolved; its error on sines up to the Nyquist frequency at 0.02 s was
 *   0.9%, 0.2% and 0.1% of the peak with Ωh = π, π/2 and π/3 (measured against the exact
 *   reference, test/reference/exact-response.ts), so Ωh ≤ 1.25: k = ⌈ρ/1.25⌉ (3 at the Nyquist frequency).
 */
export function recordSubsteps(method: Method, roughness: number, damping = 0): number {
  const needed =
    SUBSTEP_RULE[method].recordFactor * inputFrequency(roughness) * dampingScale(method, damping);
  return Math.max(1, Math.ceil(needed - 1e-9));
}

/** Steps per natural period the rule asks of `method` for this oscillator. */
export function stepsPerPeriod(method: Method, periodS: number, context: SubstepContext): number {
  const { prewarped, k, baseSteps } = SUBSTEP_RULE[method];
  let rule = prewarped;
  if (context.prewarp === false) {
    const cyclesRemembered = Math.min(
      context.durationS / periodS,
      context.damping > 0 ? 1 / (2 * Math.PI * context.damping) : Number.POSITIVE_INFINITY,
    );
    rule = Math.max(MIN_STEPS_PER_PERIOD, Math.sqrt(k * cyclesRemembered + baseSteps * baseSteps));
  }
  const scale = fastestPoleRatio(context.damping) * dampingScale(method, context.damping);
  return Math.max(rule * scale, context.stepsPerPeriod ?? 0);
}

/** How many equal sub-steps each record step is divided into for an oscillator of period T. */
export function substepCount(method: Method, periodS: number, dtS: number, context: SubstepContext): number {
  if (periodS <= 0) return 1;
  return checkedSubsteps(
    Math.max(
      recordSubsteps(method, context.roughness ?? 0, context.damping),
      Math.ceil((dtS * stepsPerPeriod(method, periodS, context)) / periodS - 1e-9),
    ),
    dtS,
    periodS,
  );
}

/**
 * Most sub-steps a record step is divided into (a million): beyond it the record's time step is
 * implausibly long for the period (a time column in the wrong unit, a corrupt step), and the sweep
 * would run for days or run out of memory.
 */
export const MAX_SUBSTEPS = 1e6;

/** `substeps`, or a one-line refusal when it is not a count below MAX_SUBSTEPS. */
export function checkedSubsteps(substeps: number, dtS: number, periodS: number): number {
  if (!(substeps <= MAX_SUBSTEPS))
    throw inputError(
      `the record's time step Δt = ${formatNumber(dtS, 6)} s would need ${Number.isFinite(substeps) ? formatNumber(substeps) : 'endless'} sub-steps for T = ${formatNumber(periodS, 6)} s, more than a million: is the time step right? If it is, resample the record finer or leave out the shortest periods`,
    );
  return substeps;
}

/**
 * How a sweep runs `substeps` sub-steps per record step: as `steps` executed steps, each composing
 * `composed` sub-steps (composeSteps), steps × composed ≥ substeps. The Hermite refinement between
 * executed steps needs MIN_STEPS_PER_PERIOD a period (times fastestPoleRatio(ζ) above ζ = 1/2
 * damping) and, a record step, ⌈R²⌉ and piecewise-exact's ⌈ρ/1.25⌉ (recordSubsteps; R the
 * roughness); only the sub-steps beyond that are composed. The user's `stepsPerPeriod` are
 * executed, not composed: they ask for a finer peak search too.
 */
export function executionPlan(
  substeps: number,
  periodS: number,
  dtS: number,
  roughness: number,
  stepsPerPeriod = 0,
  damping = 0,
): { steps: number; composed: number } {
  const perPeriod = Math.max(MIN_STEPS_PER_PERIOD * fastestPoleRatio(damping), stepsPerPeriod);
  const hermite = Math.max(
    Math.ceil(roughness * roughness - 1e-9),
    recordSubsteps('piecewise-exact', roughness),
    Math.ceil((dtS * perPeriod) / periodS - 1e-9),
  );
  const steps = Math.min(substeps, hermite);
  return { steps, composed: Math.ceil(substeps / steps) };
}
