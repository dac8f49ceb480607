import type { Method } from './recurrence.js';

/**
 * The sub-step rule: how many steps per natural period each method takes so that every peak stays
 * within 0.3% of the exact peak response to the linearly interpolated record (the README promises
 * 0.5%). Calibrated on stochastic records against the exact method with 400 steps a period, over
 * T = 0.01–10 s, ζ = 0–0.5 and Δt = 0.005–0.02 s; test/reference/accuracy.test.ts checks it.
 *
 * - Piecewise-exact is exact at the steps; it needs 10 steps a period only so that the cubic
 *   Hermite refinement finds each peak between steps (its error there is below 0.05%).
 * - The Newmark methods, pre-warped (see prewarpedOscillator in recurrence.ts: the poles are
 *   exact, so there is no period error to accumulate), keep an amplitude error of about
 *   9.5%·(10/N)² for average and 3.3%·(10/N)² for linear acceleration, whatever the damping:
 *   N = 66 and 38 keep it near 0.25%.
 * - Without pre-warping (the textbook recurrences) the period error T̄/T − 1 ≈ (ωh)²/12 for
 *   average and (ωh)²/24 for linear acceleration (Newmark 1959; Chopra, Dynamics of Structures,
 *   §5.5) shifts the phase on every cycle the oscillator remembers (all of the record when ζ = 0,
 *   about 1/(2πζ) cycles otherwise), and a lightly damped peak is as sensitive to period as its
 *   spectrum is jagged; so N = √(K·C + N₀²), C the cycles remembered. This costs up to 40 times
 *   more steps on long undamped runs, which is why pre-warping is the default.
 */
export const MIN_STEPS_PER_PERIOD = 10;

/**
 * Each method's rule: `prewarped` steps per period; the textbook rule's K and N₀ (`k`,
 * `baseSteps`); and `recordFactor` F, for the ⌈F·R²⌉ sub-steps per record step (R the record's
 * roughness) that a method needs whatever the period. Average acceleration takes in the
 * excitation as the mean of its ends, an error of order (Ωh)² for content at Ω: on sines of
 * 5–24.5 Hz at Δt = 0.02 s its long-period peaks were 12–40% off with no sub-steps, within 0.4%
 * with ⌈5R²⌉ (real records, R of 0.1–0.5, rarely need more than one). Linear acceleration and
 * piecewise-exact take in the linear interpolation exactly; piecewise-exact takes ⌈R²/2⌉ so that
 * its Hermite refinement follows content near the Nyquist frequency.
 */
export const SUBSTEP_RULE: Readonly<
  Record<Method, { prewarped: number; k: number; baseSteps: number; recordFactor: number }>
> = {
  'newmark-average': { prewarped: 66, k: 2100, baseSteps: 71, recordFactor: 5 },
  'newmark-linear': { prewarped: 38, k: 1050, baseSteps: 39, recordFactor: 0 },
  'piecewise-exact': {
    prewarped: MIN_STEPS_PER_PERIOD,
    k: 0,
    baseSteps: MIN_STEPS_PER_PERIOD,
    recordFactor: 0.5,
  },
};

export interface SubstepContext {
  /** Damping ratio of the oscillator. */
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

/** Sub-steps per record step that `method` needs whatever the period (see SUBSTEP_RULE). */
export function recordSubsteps(method: Method, roughness: number): number {
  return Math.max(1, Math.ceil(SUBSTEP_RULE[method].recordFactor * roughness * roughness - 1e-9));
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
  return Math.max(rule, context.stepsPerPeriod ?? 0);
}

/** How many equal sub-steps each record step is divided into for an oscillator of period T. */
export function substepCount(method: Method, periodS: number, dtS: number, context: SubstepContext): number {
  if (periodS <= 0) return 1;
  const perPeriod = stepsPerPeriod(method, periodS, context);
  return Math.max(
    recordSubsteps(method, context.roughness ?? 0),
    Math.ceil((dtS * perPeriod) / periodS - 1e-9),
  );
}

/**
 * How a sweep runs an oscillator that the rule gives `substeps` sub-steps per record step: as
 * `steps` executed steps per record step, each composing `composed` sub-steps (composeSteps), with
 * steps × composed ≥ substeps. Peaks between executed steps are refined by cubic Hermite
 * interpolation, which needs MIN_STEPS_PER_PERIOD of them a period and, for content near the
 * record's Nyquist frequency, ⌈R²⌉ a record step (R the roughness; real records, R < 1, need
 * one); only the sub-steps beyond that are composed. Against the exact method at 400 steps a
 * period (stochastic records at 0.02 and 0.005 s, sines of 5–24.5 Hz at 0.02 s), the worst errors
 * were 0.24% (stochastic) and 0.41% (sines) for Newmark average, 0.26% and 0.24% for Newmark
 * linear; with ⌈R²/2⌉ a step the sines reached 0.48%. Steps per period asked for by the user
 * (`stepsPerPeriod`) are executed, not composed: they ask for a finer search of the peaks too.
 */
export function executionPlan(
  substeps: number,
  periodS: number,
  dtS: number,
  roughness: number,
  stepsPerPeriod = 0,
): { steps: number; composed: number } {
  const hermite = Math.max(
    Math.max(1, Math.ceil(roughness * roughness - 1e-9)),
    Math.ceil((dtS * Math.max(MIN_STEPS_PER_PERIOD, stepsPerPeriod)) / periodS - 1e-9),
  );
  const steps = Math.min(substeps, hermite);
  return { steps, composed: Math.ceil(substeps / steps) };
}
