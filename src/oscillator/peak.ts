import type { GroundBounds } from './record-statistics.js';

/**
 * Peak of |q(t)| over one step of `stepS`, from the values q0, q1 and time derivatives dq0, dq1 at
 * its ends, by cubic Hermite interpolation (common practice; error h⁴·max|q''''|/384, e.g. Burden
 * and Faires §3.4). For RotD (assembly/rotd.ts repeats it); H' is taken as linear where its t²
 * term is below 1e-12 of the sum of its terms.
 */
export function hermitePeak(q0: number, q1: number, dq0: number, dq1: number, stepS: number): number {
  const m0 = dq0 * stepS;
  const m1 = dq1 * stepS;
  const a = 6 * q0 + 3 * m0 - 6 * q1 + 3 * m1;
  const b = -6 * q0 - 4 * m0 + 6 * q1 - 2 * m1;
  const linear = !(Math.abs(a) > 1e-12 * (Math.abs(a) + Math.abs(b) + Math.abs(m0)));
  return turningPeak(Math.max(Math.abs(q0), Math.abs(q1)), q0, q1, m0, m1, a, b, linear);
}

/**
 * `peak`, or the larger hermitePeak, for the sweep's kernels (scripts/wasm-kernel-loops.mjs finds
 * the roots the same way): H' is linear where its t² term is below 1e-9 of the others, since that
 * term vanishes for Newmark average acceleration (its velocity update is the trapezoidal rule).
 */
export function hermiteFold(peak: number, q0: number, q1: number, dq0: number, dq1: number, stepS: number) {
  const m0 = dq0 * stepS;
  const m1 = dq1 * stepS;
  const a = 6 * q0 + 3 * m0 - 6 * q1 + 3 * m1;
  const b = -6 * q0 - 4 * m0 + 6 * q1 - 2 * m1;
  return turningPeak(peak, q0, q1, m0, m1, a, b, !(Math.abs(a) > 1e-9 * (Math.abs(b) + Math.abs(m0))));
}

/** `peak`, or |H| where H'(t) = a·t² + b·t + m0 vanishes inside the step (0 < t < 1) if larger. */
function turningPeak(
  peak: number,
  q0: number,
  q1: number,
  m0: number,
  m1: number,
  a: number,
  b: number,
  linear: boolean,
): number {
  if (linear) return b === 0 ? peak : hermiteAt(peak, q0, q1, m0, m1, -m0 / b);
  const discriminant = b * b - 4 * a * m0;
  if (!(discriminant >= 0)) return peak;
  // Numerically stable pair of roots.
  const qq = -0.5 * (b + (b >= 0 ? 1 : -1) * Math.sqrt(discriminant));
  const first = hermiteAt(peak, q0, q1, m0, m1, qq / a);
  return qq === 0 ? first : hermiteAt(first, q0, q1, m0, m1, m0 / qq);
}

/** `peak`, or |H(t)| if larger, for t inside the step (0 < t < 1). */
function hermiteAt(peak: number, q0: number, q1: number, m0: number, m1: number, t: number): number {
  if (!(t > 0 && t < 1)) return peak;
  const t2 = t * t;
  const t3 = t2 * t;
  const value =
    (2 * t3 - 3 * t2 + 1) * q0 + (t3 - 2 * t2 + t) * m0 + (-2 * t3 + 3 * t2) * q1 + (t3 - t2) * m1;
  return Math.max(peak, Math.abs(value));
}

/**
 * When to refine a peak between steps. Near its peak P* a quantity q falls off no faster than
 * ½|q''|(t − t*)² (Taylor), so both ends of the step holding P* are above P* − ½h²·max|q''|, with
 * |q''| at the peak bounded from the equation of motion (a_rel = ü):
 *   u'' = a_rel = −a_g − ω²u           → |u''| ≤ PGA + ω²P
 *   v'' = ȧ_rel = −ȧ_g − 2ζωa_rel − ω²v → |v''| ≤ J + ω²P      (a_rel = 0 at a peak of v)
 *   s'' (s = absolute acceleration)     → |s''| ≤ 2ζωJ + ω²(P + PGA)
 * where J is the record's peak jerk. A step whose new end is below P·r − d (r = 1 − ½(ωh)²·m,
 * d = ½h²·m·(bound's ground term), m = 1.1 a margin for the variation of q'' over the step)
 * cannot hold a peak above the running one P, and is not examined.
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
