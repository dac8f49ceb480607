import { usageError } from '../base/errors.js';
import { expm } from './expm.js';

/**
 * The base-excited linear oscillator u'' + 2ζωu' + ω²u = −a_g(t), started at rest, advanced over
 * one step h from state (u, v) with ground acceleration p_n at the start and p_{n+1} at the end;
 * every method here is this linear recurrence, its coefficients computed once per oscillator:
 *   u_{n+1} = uu·u_n + uv·v_n + up0·p_n + up1·p_{n+1}
 *   v_{n+1} = vu·u_n + vv·v_n + vp0·p_n + vp1·p_{n+1}
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
  if (method === 'piecewise-exact') return piecewiseExactCoefficients(omegaRadS, damping, stepS);
  return newmarkCoefficients(omegaRadS, damping, stepS, 0.5, method === 'newmark-average' ? 0.25 : 1 / 6);
}

/**
 * Newmark-β (Newmark 1959; Chopra, Dynamics of Structures, §5.4) with equilibrium enforced at
 * every step, so the relative acceleration a_n = −p_n − 2ζωv_n − ω²u_n is not carried as state.
 * The denominator 1 + γ·2ζωh + βω²h² is positive for every ζ ≥ 0.
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
  return readOff((u, v, p0, p1) => {
    const a0 = -p0 - c * v - k * u;
    const a1 =
      (-p1 - k * u - (c + k * h) * v - (c * h * (1 - gamma) + k * h * h * (0.5 - beta)) * a0) / denominator;
    const u1 = u + h * v + h * h * ((0.5 - beta) * a0 + beta * a1);
    const v1 = v + h * ((1 - gamma) * a0 + gamma * a1);
    return [u1, v1];
  });
}

/** The coefficients of a step that is linear in (u, v, p0, p1), read off by stepping the four unit vectors. */
function readOff(step: (u: number, v: number, p0: number, p1: number) => [number, number]): StepCoefficients {
  const [uu, vu] = step(1, 0, 0, 0);
  const [uv, vv] = step(0, 1, 0, 0);
  const [up0, vp0] = step(0, 0, 1, 0);
  const [up1, vp1] = step(0, 0, 0, 1);
  return { uu, uv, up0, up1, vu, vv, vp0, vp1 };
}

/**
 * The exact step for ground acceleration linear over the step (Nigam and Jennings 1969), without
 * cases for ζ < 1, = 1, > 1, as the exponential of the augmented matrix of z = (u, v, p, ṗ), ṗ
 * constant (Van Loan, "Computing integrals involving the matrix exponential", IEEE TAC 23, 1978):
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
  const [uu, uv, e13, e14, vu, vv, e23, e24] = expm(m, 4);
  return { uu, uv, up0: e13 - e14, up1: e14, vu, vv, vp0: e23 - e24, vp1: e24 };
}

/**
 * Frequency and damping at which a Newmark recurrence has exactly the poles exp(λh) of the
 * continuous oscillator (pre-warping: no period error, no spurious decay; the error left, in how
 * the excitation enters, does not grow with the cycles). For average acceleration (trapezoidal
 * rule, bilinear transform s = (2/h)(z − 1)/(z + 1); Oppenheim and Schafer, Discrete-Time Signal
 * Processing, §7.2; Franklin, Powell and Workman, Digital Control of Dynamic Systems, §6.3), with
 * τ = z₁ + z₂ = 2e^{−ζωh}cos(ω_D h) (cosh for ζ > 1) and δ = z₁z₂ = e^{−2ζωh}:
 *   ω'² = (4/h²)(1 − τ + δ)/(1 + τ + δ),   2ζ'ω' = (4/h)(1 − δ)/(1 + τ + δ).
 * For linear acceleration Newton's method matches the same trace and determinant.
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
  // From the average-acceleration values, with a finite-difference Jacobian.
  const residual = (w: number, z: number): [number, number] => {
    const c = newmarkCoefficients(w, z, h, 0.5, 1 / 6);
    return [c.uu + c.vv - trace, c.uu * c.vv - c.uv * c.vu - determinant];
  };
  // Stopped where a step no longer lowers the residual: for very small ωh the finite differences
  // sink into rounding, and a Newton step on them would throw the pair away from the start.
  let [f1, f2] = residual(omega, zeta);
  for (let iteration = 0; iteration < 30; iteration++) {
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
    const nextOmega = omega - (j22 * f1 - j12 * f2) / det;
    const nextZeta = zeta - (-j21 * f1 + j11 * f2) / det;
    const [g1, g2] = residual(nextOmega, nextZeta);
    if (!(Math.abs(g1) + Math.abs(g2) < Math.abs(f1) + Math.abs(f2))) break;
    omega = nextOmega;
    zeta = nextZeta;
    f1 = g1;
    f2 = g2;
  }
  return { omegaRadS: omega, damping: zeta };
}

/**
 * `count` steps of `s` under an input linear from p0 to p1 over all of them, as one step in the
 * same form: the sub-stepped recurrence read off, so its ends are the sub-steps' (to rounding).
 */
export function composeSteps(s: StepCoefficients, count: number): StepCoefficients {
  if (count === 1) return s;
  return readOff((u0, v0, p0, p1) => {
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
  });
}

/** One executed step of `stepS`: `composed` sub-steps of `method` (composeSteps), pre-warped by default. */
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
