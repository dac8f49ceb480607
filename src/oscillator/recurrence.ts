import { usageError } from '../base/errors.js';
import { expm } from './expm.js';

/**
 * The base-excited linear oscillator u'' + 2ζωu' + ω²u = −a_g(t), started at rest, advanced over
 * one step h from state (u, v) with ground acceleration p_n at the start and p_{n+1} at the end:
 *
 *   u_{n+1} = uu·u_n + uv·v_n + up0·p_n + up1·p_{n+1}
 *   v_{n+1} = vu·u_n + vv·v_n + vp0·p_n + vp1·p_{n+1}
 *
 * Every method here is such a linear recurrence; its eight coefficients are computed once per
 * period, damping and step, and the sweep's inner loop only multiplies and adds.
 */
export interface StepCoefficients {
  uu: number;
  uv: number;
  up0: number;
  up1: number;
  vu: number;
  vv: number;
  vp0: number;
  vp1: number;
}

export type Method = 'newmark-average' | 'newmark-linear' | 'piecewise-exact';

export const METHODS: readonly Method[] = ['newmark-average', 'newmark-linear', 'piecewise-exact'];

export const METHOD_DESCRIPTIONS: Readonly<Record<Method, string>> = {
  'newmark-average': 'Newmark-β average acceleration (γ = 1/2, β = 1/4; Newmark 1959)',
  'newmark-linear': 'Newmark-β linear acceleration (γ = 1/2, β = 1/6; Newmark 1959)',
  'piecewise-exact':
    'piecewise-exact for linearly interpolated excitation (Nigam and Jennings 1969), via the matrix exponential',
};

export function parseMethod(text: string): Method {
  if ((METHODS as readonly string[]).includes(text)) return text as Method;
  throw usageError(`unknown method '${text}'; accepted: ${METHODS.join(', ')}`);
}

/** Step coefficients for `method` at circular frequency ω (rad/s), damping ratio ζ, step h (s). */
export function stepCoefficients(
  method: Method,
  omegaRadS: number,
  damping: number,
  stepS: number,
): StepCoefficients {
  switch (method) {
    case 'newmark-average':
      return newmarkCoefficients(omegaRadS, damping, stepS, 0.5, 0.25);
    case 'newmark-linear':
      return newmarkCoefficients(omegaRadS, damping, stepS, 0.5, 1 / 6);
    case 'piecewise-exact':
      return piecewiseExactCoefficients(omegaRadS, damping, stepS);
  }
}

/**
 * Newmark-β (Newmark 1959; Chopra, Dynamics of Structures, §5.4) with equilibrium enforced at
 * every step, so the relative acceleration a_n = −p_n − 2ζωv_n − ω²u_n is not carried as state.
 * The step is linear in (u_n, v_n, p_n, p_{n+1}); its coefficients are read off by stepping the
 * four unit vectors. The denominator 1 + γ·2ζωh + βω²h² is positive for every ζ ≥ 0.
 */
export function newmarkCoefficients(
  omegaRadS: number,
  damping: number,
  stepS: number,
  gamma: number,
  beta: number,
): StepCoefficients {
  const c = 2 * damping * omegaRadS;
  const k = omegaRadS * omegaRadS;
  const h = stepS;
  const denominator = 1 + c * gamma * h + k * beta * h * h;
  const step = (u: number, v: number, p0: number, p1: number): [number, number] => {
    const a0 = -p0 - c * v - k * u;
    const a1 =
      (-p1 - k * u - (c + k * h) * v - (c * h * (1 - gamma) + k * h * h * (0.5 - beta)) * a0) / denominator;
    const u1 = u + h * v + h * h * ((0.5 - beta) * a0 + beta * a1);
    const v1 = v + h * ((1 - gamma) * a0 + gamma * a1);
    return [u1, v1];
  };
  const [uu, vu] = step(1, 0, 0, 0);
  const [uv, vv] = step(0, 1, 0, 0);
  const [up0, vp0] = step(0, 0, 1, 0);
  const [up1, vp1] = step(0, 0, 0, 1);
  return { uu, uv, up0, up1, vu, vv, vp0, vp1 };
}

/**
 * The exact step for ground acceleration that varies linearly over the step: the recurrence of
 * Nigam and Jennings (1969), obtained here without case distinctions for ζ < 1, ζ = 1 and ζ > 1
 * as the exponential of the augmented matrix of the system z = (u, v, p, ṗ) with ṗ constant
 * (Van Loan, "Computing integrals involving the matrix exponential", IEEE TAC 23, 1978):
 * z(h) = exp(M h) z(0), M = [[0, 1, 0, 0], [−ω², −2ζω, −1, 0], [0, 0, 0, 1], [0, 0, 0, 0]].
 * With ṗ = (p_{n+1} − p_n)/h, the coefficient of p_n is E₁₃ − E₁₄/h and of p_{n+1} is E₁₄/h.
 */
export function piecewiseExactCoefficients(
  omegaRadS: number,
  damping: number,
  stepS: number,
): StepCoefficients {
  const h = stepS;
  const k = omegaRadS * omegaRadS;
  const c = 2 * damping * omegaRadS;
  const m = new Float64Array([0, h, 0, 0, -k * h, -c * h, -h, 0, 0, 0, 0, 1, 0, 0, 0, 0]);
  // The last column carries ṗ·h (the increment p_{n+1} − p_n) rather than ṗ, keeping M well scaled.
  const e = expm(m, 4);
  return {
    uu: e[0],
    uv: e[1],
    up0: e[2] - e[3],
    up1: e[3],
    vu: e[4],
    vv: e[5],
    vp0: e[6] - e[7],
    vp1: e[7],
  };
}

/**
 * The sub-step rule: how many steps per natural period each method takes so that every peak stays
 * within 0.3% of the exact peak response to the linearly interpolated record (the README promises
 * 0.5%). Calibrated on stochastic records against the exact method with 400 steps a period, over
 * T = 0.01–10 s, ζ = 0–0.5 and Δt = 0.005–0.02 s; test/oscillator/accuracy.test.ts checks it.
 *
 * - Piecewise-exact is exact at the steps; it needs 10 steps a period only so that the cubic
 *   Hermite refinement finds each peak between steps (its error there is below 0.05%).
 * - The Newmark methods, pre-warped (see prewarpedOscillator: the poles are exact, so there is no
 *   period error to accumulate), keep an amplitude error of about 9.5%·(10/N)² for average and
 *   3.3%·(10/N)² for linear acceleration, whatever the damping: N = 66 and 38 keep it near 0.25%.
 * - Without pre-warping (the textbook recurrences) the period error T̄/T − 1 ≈ (ωh)²/12 for
 *   average and (ωh)²/24 for linear acceleration (Newmark 1959; Chopra, Dynamics of Structures,
 *   §5.5) shifts the phase on every cycle the oscillator remembers (all of the record when ζ = 0,
 *   about 1/(2πζ) cycles otherwise), and a lightly damped peak is as sensitive to period as its
 *   spectrum is jagged; so N = √(K·C + N₀²), C the cycles remembered. This costs up to 40 times
 *   more steps on long undamped runs, which is why pre-warping is the default.
 */
export const MIN_STEPS_PER_PERIOD = 10;

export const PREWARPED_STEPS_PER_PERIOD: Readonly<Record<Method, number>> = {
  'newmark-average': 66,
  'newmark-linear': 38,
  'piecewise-exact': MIN_STEPS_PER_PERIOD,
};

export const TEXTBOOK_SUBSTEP_RULE: Readonly<Record<Method, { k: number; baseSteps: number }>> = {
  'newmark-average': { k: 2100, baseSteps: 71 },
  'newmark-linear': { k: 1050, baseSteps: 39 },
  'piecewise-exact': { k: 0, baseSteps: MIN_STEPS_PER_PERIOD },
};

export interface SubstepContext {
  /** Damping ratio of the oscillator. */
  damping: number;
  /** Duration of the record, s (an undamped oscillator remembers all of it). */
  durationS: number;
  /** Whether the Newmark recurrences are pre-warped (the default). */
  prewarp?: boolean;
  /** The record's roughness R = RMS(Δa)/RMS(a) (see recordRoughness in sweep.ts); default 0. */
  roughness?: number;
  /** Least steps per period asked for by the user (raises the rule's, never lowers it). */
  stepsPerPeriod?: number;
}

/**
 * Sub-steps per record step that a method needs whatever the oscillator's period, because of
 * how it takes in the excitation between samples. Average acceleration enters the excitation as
 * the mean of its ends, an error of order (Ωh)² for content at Ω; on sines near the record's
 * Nyquist frequency, with no sub-steps, its long-period peaks were 12–40% off the exact response
 * to the linearly interpolated record (Δt = 0.02 s). Calibrated on sines from 5 Hz to 24.5 Hz at
 * Δt = 0.02 s: ⌈5R²⌉ sub-steps keep them within 0.4% (R = 0.62 at 5 Hz takes 2; R = 2 takes 20).
 * Real records' content lies far below the Nyquist frequency (R of 0.1–0.5), so they rarely need
 * more than one. Linear acceleration (which assumes the linear variation the record has) and
 * piecewise-exact (exact for it) need none for this; piecewise-exact takes ⌈R²/2⌉ so that its
 * Hermite refinement between steps also follows content near the Nyquist frequency.
 */
export const RECORD_SUBSTEP_FACTOR: Readonly<Record<Method, number>> = {
  'newmark-average': 5,
  'newmark-linear': 0,
  'piecewise-exact': 0.5,
};

export function recordSubsteps(method: Method, roughness: number): number {
  return Math.max(1, Math.ceil(RECORD_SUBSTEP_FACTOR[method] * roughness * roughness - 1e-9));
}

/** Steps per natural period the rule asks of `method` for this oscillator. */
export function stepsPerPeriod(method: Method, periodS: number, context: SubstepContext): number {
  let rule: number;
  if (context.prewarp ?? true) {
    rule = PREWARPED_STEPS_PER_PERIOD[method];
  } else {
    const cyclesRemembered = Math.min(
      context.durationS / periodS,
      context.damping > 0 ? 1 / (2 * Math.PI * context.damping) : Number.POSITIVE_INFINITY,
    );
    const { k, baseSteps } = TEXTBOOK_SUBSTEP_RULE[method];
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
 * Frequency and damping at which a Newmark recurrence has exactly the poles of the continuous
 * oscillator (pre-warping: the step matrix's eigenvalues become exp(λh), so the method has no
 * period error and no spurious amplitude decay; the error that is left is in how the excitation
 * enters, and does not grow with the number of cycles). For average acceleration, which is the
 * trapezoidal rule (the bilinear transform s = (2/h)(z − 1)/(z + 1)), it is closed-form: with
 * τ = z₁ + z₂ = 2e^{−ζωh}cos(ω_D h) (cosh for ζ > 1) and δ = z₁z₂ = e^{−2ζωh},
 *   ω'² = (4/h²)(1 − τ + δ)/(1 + τ + δ),   2ζ'ω' = (4/h)(1 − δ)/(1 + τ + δ)
 * (pre-warping of the bilinear transform: Oppenheim and Schafer, Discrete-Time Signal Processing,
 * §7.2; Franklin, Powell and Workman, Digital Control of Dynamic Systems, §6.3). For linear
 * acceleration the same trace and determinant are matched by Newton's method.
 */
export function prewarpedOscillator(
  method: Method,
  omegaRadS: number,
  damping: number,
  stepS: number,
): { omegaRadS: number; damping: number } {
  if (method === 'piecewise-exact') return { omegaRadS, damping };
  const h = stepS;
  const decay = Math.exp(-damping * omegaRadS * h);
  const dampedSquared = omegaRadS * omegaRadS * (1 - damping * damping);
  const turn =
    dampedSquared >= 0 ? Math.cos(Math.sqrt(dampedSquared) * h) : Math.cosh(Math.sqrt(-dampedSquared) * h);
  const trace = 2 * decay * turn;
  const determinant = decay * decay;
  const denominator = 1 + trace + determinant;
  const omegaSquared = (4 / (h * h)) * ((1 - trace + determinant) / denominator);
  let omega = Math.sqrt(omegaSquared);
  let zeta = ((4 / h) * ((1 - determinant) / denominator)) / (2 * omega);
  if (method === 'newmark-average') return { omegaRadS: omega, damping: zeta };
  // Newmark linear acceleration: solve trace(A(ω', ζ')) = τ, det(A(ω', ζ')) = δ from the
  // average-acceleration values, with a finite-difference Jacobian.
  const residual = (w: number, z: number): [number, number] => {
    const c = newmarkCoefficients(w, z, h, 0.5, 1 / 6);
    return [c.uu + c.vv - trace, c.uu * c.vv - c.uv * c.vu - determinant];
  };
  for (let iteration = 0; iteration < 30; iteration++) {
    const [f1, f2] = residual(omega, zeta);
    if (Math.abs(f1) < 1e-15 && Math.abs(f2) < 1e-15) break;
    const dw = omega * 1e-7;
    const dz = Math.max(zeta, 1e-3) * 1e-7;
    const [a1, a2] = residual(omega + dw, zeta);
    const [b1, b2] = residual(omega, zeta + dz);
    const j11 = (a1 - f1) / dw;
    const j21 = (a2 - f2) / dw;
    const j12 = (b1 - f1) / dz;
    const j22 = (b2 - f2) / dz;
    const det = j11 * j22 - j12 * j21;
    if (det === 0) break;
    omega -= (j22 * f1 - j12 * f2) / det;
    zeta -= (-j21 * f1 + j11 * f2) / det;
  }
  return { omegaRadS: omega, damping: zeta };
}

/**
 * The map of `count` consecutive steps of `s` under an input that varies linearly from p0 to p1
 * over all of them (sub-step j runs from p0 + (p1 − p0)·j/count to p0 + (p1 − p0)·(j + 1)/count),
 * as one step in the same form. It is the sub-stepped recurrence itself, read off by stepping the
 * four unit vectors, so a composed step gives the numbers of the sub-steps (to rounding) for the
 * cost of one; only the values between its ends are not visited.
 */
export function composeSteps(s: StepCoefficients, count: number): StepCoefficients {
  if (count === 1) return s;
  const run = (u0: number, v0: number, p0: number, p1: number): [number, number] => {
    let u = u0;
    let v = v0;
    for (let j = 0; j < count; j++) {
      const pa = p0 + ((p1 - p0) * j) / count;
      const pb = p0 + ((p1 - p0) * (j + 1)) / count;
      const un = s.uu * u + s.uv * v + s.up0 * pa + s.up1 * pb;
      v = s.vu * u + s.vv * v + s.vp0 * pa + s.vp1 * pb;
      u = un;
    }
    return [u, v];
  };
  const [uu, vu] = run(1, 0, 0, 0);
  const [uv, vv] = run(0, 1, 0, 0);
  const [up0, vp0] = run(0, 0, 1, 0);
  const [up1, vp1] = run(0, 0, 0, 1);
  return { uu, uv, up0, up1, vu, vv, vp0, vp1 };
}

/**
 * The coefficients of one executed step of length `stepS` made of `composed` sub-steps of
 * `method` (composeSteps), each pre-warped to the oscillator's exact poles unless `prewarp` is false.
 */
export function executedStepCoefficients(
  method: Method,
  omegaRadS: number,
  damping: number,
  stepS: number,
  composed = 1,
  prewarp = true,
): StepCoefficients {
  const substepS = stepS / composed;
  const warped = prewarp ? prewarpedOscillator(method, omegaRadS, damping, substepS) : { omegaRadS, damping };
  return composeSteps(stepCoefficients(method, warped.omegaRadS, warped.damping, substepS), composed);
}

/**
 * How a sweep runs an oscillator that the rule gives `substeps` sub-steps per record step: as
 * `steps` executed steps per record step, each composing `composed` sub-steps (composeSteps), with
 * steps × composed ≥ substeps. Peaks between executed steps are refined by cubic Hermite
 * interpolation, which needs MIN_STEPS_PER_PERIOD of them a period and, for content near the
 * record's Nyquist frequency, ⌈R²⌉ a record step (R the roughness; real records, R < 1, need
 * one); only the sub-steps beyond that are composed. Measured against the exact method at 400
 * steps a period (stochastic records at 0.02 and 0.005 s, sines of 5–24.5 Hz at 0.02 s), the
 * worst errors were 0.24% (stochastic) and 0.41% (sines) for Newmark average, 0.26% and 0.24% for
 * Newmark linear; with ⌈R²/2⌉ a step the sines reached 0.48%. Steps per period asked for by the user (`stepsPerPeriod`) are
 * executed, not composed: they ask for a finer search of the peaks too.
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
