import type { Method } from './recurrence.js';

/**
 * The sub-step rule: steps per natural period N for every peak to stay within 0.3% of the exact
 * peak response to the linearly interpolated record (the README promises 0.5%). Calibrated on
 * stochastic records against the exact method at 400 steps a period, T = 0.01–10 s, ζ = 0–0.5,
 * Δt = 0.005–0.02 s; test/reference/accuracy.test.ts checks it.
 * - Piecewise-exact is exact at the steps; 10 a period let the Hermite refinement find the peaks.
 * - Pre-warped Newmark (prewarpedOscillator in recurrence.ts) keeps an amplitude error of about
 *   9.5%·(10/N)² (average) and 3.3%·(10/N)² (linear acceleration): N = 66 and 38 keep it near 0.25%.
 * - The textbook recurrences' period error T̄/T − 1 ≈ (ωh)²/12 (average) and (ωh)²/24 (linear)
 *   (Newmark 1959; Chopra, Dynamics of Structures, §5.5) shifts the phase on every cycle the
 *   oscillator remembers (C: all of the record when ζ = 0, about 1/(2πζ) otherwise), so
 *   N = √(K·C + N₀²): up to 40 times more steps on long undamped runs, hence pre-warping by default.
 */
export const MIN_STEPS_PER_PERIOD = 10;

/**
 * Each method's rule: `prewarped` N; the textbook rule's K and N₀ (`k`, `baseSteps`); `recordFactor`
 * F, for ⌈F·R²⌉ sub-steps per record step whatever the period (R the roughness). Average
 * acceleration takes in the excitation as the mean of its ends, an error of order (Ωh)²: on sines
 * of 5–24.5 Hz at Δt = 0.02 s its long-period peaks were 12–40% off with no sub-steps, within 0.4%
 * with ⌈5R²⌉. The others take in the linear interpolation exactly; piecewise-exact takes ⌈R²/2⌉
 * so that its Hermite refinement follows content near the Nyquist frequency.
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
  return Math.max(
    recordSubsteps(method, context.roughness ?? 0),
    Math.ceil((dtS * stepsPerPeriod(method, periodS, context)) / periodS - 1e-9),
  );
}

/**
 * How a sweep runs `substeps` sub-steps per record step: as `steps` executed steps, each composing
 * `composed` sub-steps (composeSteps), steps × composed ≥ substeps. The Hermite refinement between
 * executed steps needs MIN_STEPS_PER_PERIOD a period and ⌈R²⌉ a record step (R the roughness);
 * only the sub-steps beyond that are composed. Against the exact method at 400 steps a period
 * (stochastic records at 0.02 and 0.005 s, sines of 5–24.5 Hz at 0.02 s) the worst errors were
 * 0.24% and 0.41% for Newmark average, 0.26% and 0.24% for linear; ⌈R²/2⌉ took the sines to 0.48%.
 * The user's `stepsPerPeriod` are executed, not composed: they ask for a finer peak search too.
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
