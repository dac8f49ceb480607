import { usageError } from '../errors.js';
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
  const m = new Float64Array([0, h, 0, 0, -k * h, -c * h, -h, 0, 0, 0, 0, h, 0, 0, 0, 0]);
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
 * Steps per natural period that each method needs so that its peaks stay within the accuracy
 * rule stated in the README (0.5% of the exact peak response to the linearly interpolated
 * record). Piecewise-exact is exact at the steps, so it only needs enough points to find the peak
 * between them (with cubic Hermite refinement); the Newmark methods also need their period error
 * (T̄/T − 1 ≈ (πh/T)²/3 for average acceleration) kept small.
 */
export const STEPS_PER_PERIOD: Readonly<Record<Method, number>> = {
  'newmark-average': 100,
  'newmark-linear': 100,
  'piecewise-exact': 10,
};

/** How many equal sub-steps each record step is divided into for an oscillator of period T. */
export function substepCount(method: Method, periodS: number, dtS: number): number {
  if (periodS <= 0) return 1;
  return Math.max(1, Math.ceil((dtS * STEPS_PER_PERIOD[method]) / periodS - 1e-9));
}
