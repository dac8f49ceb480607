import { usageError } from '../base/errors.js';
import { secondMoments } from './equipment.js';

/** How overturning is shared among the anchors: 'projected' or 'biaxial' (both set out at boltGroupForces). */
export type AnchorRule = 'projected' | 'biaxial';

export function parseAnchorRule(text: string): AnchorRule {
  if (text === 'projected' || text === 'biaxial') return text;
  throw usageError(`--anchor-rule '${text}': use projected or biaxial`);
}

export interface BoltGroupInput {
  /** Plan positions of the anchors (any length unit, the same for every length here). */
  anchors: readonly (readonly [number, number])[];
  /** Plan position of the centre of mass. */
  cgPlan: readonly [number, number];
  /** Height of the centre of mass above the anchor plane. */
  cgHeight: number;
  /** Horizontal force at the centre of mass (any force unit; Ω₀ already applied if wanted). */
  horizontalForce: number;
  /** Counteracting dead load, (0.9 − 0.2 S_DS)·W_p, in the same force unit (acts downward at the centre of mass). */
  deadLoad: number;
  /** Step of the direction sweep, degrees (default 1). */
  stepDeg?: number;
  /** How overturning is shared (default 'projected'). */
  rule?: AnchorRule;
}

export interface AnchorDemand {
  x: number;
  y: number;
  /** Worst tension over all directions (0 when the anchor never goes into tension). */
  tension: number;
  /** Direction of the horizontal force that gives it, degrees counter-clockwise from +x. */
  tensionDirectionDeg: number;
  /** Worst shear over all directions. */
  shear: number;
  shearDirectionDeg: number;
}

export interface BoltGroupResult {
  perAnchor: AnchorDemand[];
  /** 0-based index of the anchor with the largest tension (the first, on a tie). */
  governingAnchor: number;
  maxTension: number;
  maxTensionDirectionDeg: number;
  maxShear: number;
  maxShearDirectionDeg: number;
  rule: AnchorRule;
}

/**
 * Tension (≥ 0) and shear of every anchor for the horizontal force in one direction, degrees
 * counter-clockwise from +x (same method as boltGroupForces).
 */
export function boltGroupAtDirection(
  input: BoltGroupInput,
  directionDeg: number,
): { tension: number[]; shear: number[] } {
  const k = coefficients(input);
  const [c, s] = unitVector(directionDeg);
  return {
    tension: Array.from({ length: k.n }, (_, i) => Math.max(0, k.tension(i, c, s))),
    shear: Array.from({ length: k.n }, (_, i) => k.shear(i, c, s)),
  };
}

/**
 * Anchor tension and shear of a rigid base on an elastic anchor group (the elastic method for
 * eccentrically loaded fastener groups, e.g. Salmon and Johnson, Steel Structures, §4.12 for shear
 * and the analogous linear-strain rule for axial load; common practice for equipment anchorage).
 *
 * Axial, rule 'projected' (the default): for the force F in the unit direction u at height h_cg,
 * M = F·h_cg turns the base about the neutral axis through the centroid perpendicular to u, and
 * T_i = M d_i/Σd_j² − D_i with d_i = −r_i·u (positive on the side that lifts) and Σd_j² = uᵀIu.
 * D_i is the anchor's share of the dead load, D/n when the centre of mass is over the centroid
 * (the eccentric share below otherwise, the same for both rules).
 *
 * Axial, rule 'biaxial': the base turns rigidly about a neutral axis through the centroid, so
 * P_i = N/n + (I⁻¹m)·r_i with I = Σ r_i r_iᵀ; tension T_i = −F h_cg (I⁻¹u)·r_i, and the dead load D
 * at the plan offset e of the centre of mass gives compression D (1/n + (I⁻¹e)·r_i). Along a
 * principal axis of the pattern both rules agree; off them moment equilibrium about both plan axes
 * turns the neutral axis away from the perpendicular to u. Tension below zero is reported as zero.
 *
 * Shear: direct share F/n plus the torsion F·(e × u) of an eccentric centre of mass, shared in
 * proportion to distance from the centroid (polar moment J = Σ|r_i|²), added as vectors.
 *
 * The sweep evaluates every `stepDeg` degrees from 0 to 360 and each anchor's worst direction:
 * under 'biaxial' the forces are linear in (cos θ, sin θ), so it is found in closed form; under
 * 'projected' the sampled maximum is refined by golden-section search (Kiefer 1953) over the
 * step on either side. The maxima therefore do not depend on the step.
 */
export function boltGroupForces(input: BoltGroupInput): BoltGroupResult {
  const k = coefficients(input);
  const { n, rule, A, B, L } = k;
  const step = input.stepDeg ?? 1;
  const directions: number[] = [];
  for (let j = 0; j * step < 360 - 1e-9; j++) directions.push(j * step);
  for (let i = 0; i < n; i++) {
    if (rule === 'biaxial') {
      if (A[i] !== 0 || B[i] !== 0) directions.push(normalizeDeg((Math.atan2(B[i], A[i]) * 180) / Math.PI));
    } else {
      directions.push(worstProjectedDirectionDeg((deg) => k.tension(i, ...unitVector(deg)), step));
    }
    const worst = worstShearDirectionDeg(L[i]);
    directions.push(worst, normalizeDeg(worst + 180));
  }

  const unset = { tension: -Infinity, tensionDirectionDeg: 0, shear: -Infinity, shearDirectionDeg: 0 };
  const perAnchor: AnchorDemand[] = input.anchors.map(([x, y]) => ({ x, y, ...unset }));
  const tolerance =
    1e-12 * (Math.abs(input.horizontalForce) * (input.cgHeight + 1) + Math.abs(input.deadLoad) + 1);
  // Larger by more than the tolerance, or as large in a smaller direction (so ties resolve alike everywhere).
  const worse = (value: number, worst: number, deg: number, worstDeg: number) =>
    value > worst + tolerance || (Math.abs(value - worst) <= tolerance && deg < worstDeg);
  for (const deg of directions) {
    const [c, s] = unitVector(deg);
    perAnchor.forEach((a, i) => {
      const tension = k.tension(i, c, s);
      const shear = k.shear(i, c, s);
      if (worse(tension, a.tension, deg, a.tensionDirectionDeg))
        [a.tension, a.tensionDirectionDeg] = [tension, deg];
      if (worse(shear, a.shear, deg, a.shearDirectionDeg)) [a.shear, a.shearDirectionDeg] = [shear, deg];
    });
  }
  let governingAnchor = 0;
  let shearAnchor = 0;
  for (let i = 0; i < n; i++) {
    perAnchor[i].tension = Math.max(0, perAnchor[i].tension);
    if (perAnchor[i].tension > perAnchor[governingAnchor].tension + tolerance) governingAnchor = i;
    if (perAnchor[i].shear > perAnchor[shearAnchor].shear + tolerance) shearAnchor = i;
  }
  return {
    perAnchor,
    governingAnchor,
    maxTension: perAnchor[governingAnchor].tension,
    maxTensionDirectionDeg: perAnchor[governingAnchor].tensionDirectionDeg,
    maxShear: perAnchor[shearAnchor].shear,
    maxShearDirectionDeg: perAnchor[shearAnchor].shearDirectionDeg,
    rule,
  };
}

/**
 * The direction (degrees) of the largest value of a smooth periodic function: sampled every `step`
 * degrees, then refined by golden-section search (Kiefer 1953) within one step of the best sample.
 */
function worstProjectedDirectionDeg(f: (deg: number) => number, step: number): number {
  const sampleDeg = Math.min(step, 1);
  let best = 0;
  for (let deg = 0; deg < 360; deg += sampleDeg) if (f(deg) > f(best)) best = deg;
  let lo = best - sampleDeg;
  let hi = best + sampleDeg;
  const ratio = (Math.sqrt(5) - 1) / 2;
  let x1 = hi - ratio * (hi - lo);
  let x2 = lo + ratio * (hi - lo);
  let f1 = f(x1);
  let f2 = f(x2);
  for (let iteration = 0; iteration < 80 && hi - lo > 1e-10; iteration++) {
    if (f1 < f2) {
      [lo, x1, f1] = [x1, x2, f2];
      x2 = lo + ratio * (hi - lo);
      f2 = f(x2);
    } else {
      [hi, x2, f2] = [x2, x1, f1];
      x1 = hi - ratio * (hi - lo);
      f1 = f(x1);
    }
  }
  return normalizeDeg((lo + hi) / 2);
}

/** The direction of u maximising |L u| (the leading right singular vector of the 2×2 matrix L). */
function worstShearDirectionDeg([a, b, c, d]: Matrix2): number {
  // LᵀL = [[p, q], [q, r]]; its leading eigenvector's angle is ½·atan2(2q, p − r).
  const p = a * a + c * c;
  const q = a * b + c * d;
  const r = b * b + d * d;
  if (Math.abs(q) < 1e-15 * (p + r) && Math.abs(p - r) < 1e-15 * (p + r)) return 0;
  return normalizeDeg((0.5 * Math.atan2(2 * q, p - r) * 180) / Math.PI);
}

/** The unit vector (cos θ, sin θ) of a direction θ in degrees. */
function unitVector(deg: number): [number, number] {
  return [Math.cos((deg * Math.PI) / 180), Math.sin((deg * Math.PI) / 180)];
}

function normalizeDeg(deg: number): number {
  const value = ((deg % 360) + 360) % 360;
  return value >= 360 - 1e-12 ? 0 : value;
}

/** A 2×2 matrix [m11, m12, m21, m22]. */
type Matrix2 = [number, number, number, number];

function coefficients(input: BoltGroupInput) {
  const n = input.anchors.length;
  const rule = input.rule ?? 'projected';
  const { cx, cy, rx, ry, ixx, iyy, ixy, polar } = secondMoments(input.anchors);
  const det = ixx * iyy - ixy * ixy;
  // I⁻¹ = [[iyy, −ixy], [−ixy, ixx]] / det
  const inv = (vx: number, vy: number): [number, number] => [
    (iyy * vx - ixy * vy) / det,
    (ixx * vy - ixy * vx) / det,
  ];
  const ex = input.cgPlan[0] - cx;
  const ey = input.cgPlan[1] - cy;
  const [gx, gy] = inv(ex, ey);
  const F = input.horizontalForce;
  const moment = F * input.cgHeight;
  const q = rx.map((x, i) => inv(x, ry[i]));
  // Tension T_i(θ) = A_i cos θ + B_i sin θ − C_i (rule 'biaxial'); C_i is the dead load's share.
  const A = q.map(([qx]) => -moment * qx);
  const B = q.map(([, qy]) => -moment * qy);
  const C = rx.map((x, i) => input.deadLoad * (1 / n + gx * x + gy * ry[i]));
  // Shear vector V_i(θ) = F·L_i·u, L_i = 𝟙/n + w_i tᵀ with w_i = ẑ × r_i = (−r_y, r_x) and t = (−e_y, e_x)/J.
  const tx = -ey / polar;
  const ty = ex / polar;
  const L = rx.map((x, i): Matrix2 => [1 / n - ry[i] * tx, -ry[i] * ty, x * tx, 1 / n + x * ty]);

  /** Tension of anchor i (may be negative: compression) for the force along (c, s). */
  const tension =
    rule === 'biaxial'
      ? (i: number, c: number, s: number) => A[i] * c + B[i] * s - C[i]
      : (i: number, c: number, s: number) => {
          const sumD2 = ixx * c * c + 2 * ixy * c * s + iyy * s * s;
          return (moment * -(rx[i] * c + ry[i] * s)) / sumD2 - C[i];
        };
  /** Shear of anchor i for the force along (c, s): |F·L_i·u|. */
  const shear = (i: number, c: number, s: number) => {
    const [l11, l12, l21, l22] = L[i];
    return Math.abs(F) * Math.hypot(l11 * c + l12 * s, l21 * c + l22 * s);
  };
  return { n, rule, A, B, L, tension, shear };
}
