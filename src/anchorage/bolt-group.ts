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
  return sweepDirections(input, false);
}

/**
 * boltGroupForces by its plain definition: every anchor at every direction of the sweep, O(n²) in
 * anchors. The oracle of the tests; boltGroupForces gives the same result in O(n log n).
 */
export function boltGroupForcesExhaustive(input: BoltGroupInput): BoltGroupResult {
  return sweepDirections(input, true);
}

/**
 * The sweep's directions are the step's grid and three exact directions an anchor. Every anchor
 * meets the whole grid (a fixed number), its own three, and, of the other anchors' directions, only
 * those near one of its own peaks, where its value can come within the tolerance of its largest:
 * each of its values is a smooth function with one or two peaks (a cosine for biaxial tension, a
 * cosine of 2θ under the root for shear, a ratio of a cosine to a quadratic form for projected
 * tension), decreasing away from them, so the directions sorted once are searched by bisection and
 * walked outward while the value stays within the tolerance. A function flat to the tolerance needs
 * none of them: the grid's 0° wins every tie.
 */
function sweepDirections(input: BoltGroupInput, exhaustive: boolean): BoltGroupResult {
  const k = coefficients(input);
  const { n, rule, A, B, L } = k;
  const step = input.stepDeg ?? 1;
  const directions: number[] = [];
  for (let j = 0; j * step < 360 - 1e-9; j++) directions.push(j * step);
  const gridCount = directions.length;
  const tensionPeaks: number[][] = [];
  for (let i = 0; i < n; i++) {
    if (rule === 'biaxial') {
      const peak = A[i] !== 0 || B[i] !== 0 ? [normalizeDeg((Math.atan2(B[i], A[i]) * 180) / Math.PI)] : [];
      directions.push(...peak);
      tensionPeaks.push(peak);
    } else {
      const f = (deg: number) => k.tension(i, ...unitVector(deg));
      const peaks = projectedPeaksDeg(f, step);
      directions.push(peaks[0]);
      tensionPeaks.push(peaks);
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
  // The unit vectors once for all anchors (the same arithmetic as unitVector at every use).
  const cosines = directions.map((deg) => Math.cos((deg * Math.PI) / 180));
  const sines = directions.map((deg) => Math.sin((deg * Math.PI) / 180));
  const visit = (a: AnchorDemand, i: number, j: number, tension: boolean, shear: boolean) => {
    const deg = directions[j];
    const c = cosines[j];
    const s = sines[j];
    if (tension) {
      const value = k.tension(i, c, s);
      if (worse(value, a.tension, deg, a.tensionDirectionDeg))
        [a.tension, a.tensionDirectionDeg] = [value, deg];
    }
    if (shear) {
      const value = k.shear(i, c, s);
      if (worse(value, a.shear, deg, a.shearDirectionDeg)) [a.shear, a.shearDirectionDeg] = [value, deg];
    }
  };
  if (exhaustive) {
    for (let j = 0; j < directions.length; j++)
      perAnchor.forEach((a, i) => {
        visit(a, i, j, true, true);
      });
  } else {
    const near = new NearDirections(directions, 4 * tolerance);
    perAnchor.forEach((a, i) => {
      const tensionAt = (deg: number) => k.tension(i, ...unitVector(deg));
      const shearAt = (deg: number) => k.shear(i, ...unitVector(deg));
      const tensionIndices = new Set<number>();
      const shearIndices = new Set<number>();
      for (let j = 0; j < gridCount; j++) visit(a, i, j, true, true);
      if (tensionSpread(k, i) > tolerance)
        for (const peak of tensionPeaks[i]) near.around(peak, tensionAt, tensionIndices);
      if (shearSpread(L[i], input.horizontalForce) > tolerance) {
        const worst = worstShearDirectionDeg(L[i]);
        for (const peak of [worst, normalizeDeg(worst + 180)]) near.around(peak, shearAt, shearIndices);
      }
      const indices = [...new Set([...tensionIndices, ...shearIndices])].filter((j) => j >= gridCount);
      for (const j of indices.sort((x, y) => x - y))
        visit(a, i, j, tensionIndices.has(j), shearIndices.has(j));
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

/** The sweep's directions sorted once, for the walk outward from a peak. */
class NearDirections {
  private readonly order: number[];
  private readonly sortedDeg: number[];
  constructor(
    directions: readonly number[],
    private readonly margin: number,
  ) {
    this.order = directions.map((_, j) => j).sort((x, y) => directions[x] - directions[y] || x - y);
    this.sortedDeg = this.order.map((j) => directions[j]);
  }

  /** Add to `into` the indices of the directions next to `peakDeg` where f is within the margin of its largest there. */
  around(peakDeg: number, f: (deg: number) => number, into: Set<number>): void {
    const m = this.order.length;
    let lo = 0;
    let hi = m;
    while (lo < hi) {
      const mid = (lo + hi) >> 1;
      if (this.sortedDeg[mid] < peakDeg) lo = mid + 1;
      else hi = mid;
    }
    const best = Math.max(f(peakDeg), f(this.sortedDeg[lo % m]), f(this.sortedDeg[(lo + m - 1) % m]));
    // Walk up from the first direction at or after the peak, then down from the one before it.
    for (const [start, delta] of [
      [lo, 1],
      [lo + m - 1, -1],
    ]) {
      for (let t = 0; t < m; t++) {
        const position = (((start + delta * t) % m) + m) % m;
        const j = this.order[position];
        if (f(this.sortedDeg[position]) < best - this.margin) break;
        if (into.has(j) && t > 0) break;
        into.add(j);
      }
    }
  }
}

/** An upper bound of how much anchor i's tension varies with the direction. */
function tensionSpread(k: ReturnType<typeof coefficients>, i: number): number {
  if (k.rule === 'biaxial') return 2 * Math.hypot(k.A[i], k.B[i]);
  // |M r·u / uᵀIu| ≤ |M| |r| / λ_min(I).
  return (2 * Math.abs(k.moment) * Math.hypot(k.rx[i], k.ry[i])) / k.smallestMoment;
}

/** How much |F·L u| varies with u: |F| (σ_max − σ_min) of L. */
function shearSpread([a, b, c, d]: Matrix2, force: number): number {
  const p = a * a + c * c;
  const q = a * b + c * d;
  const r = b * b + d * d;
  const half = Math.hypot((p - r) / 2, q);
  const mean = (p + r) / 2;
  return Math.abs(force) * (Math.sqrt(mean + half) - Math.sqrt(Math.max(0, mean - half)));
}

/**
 * The peaks (degrees) of a smooth periodic function, the largest first: sampled every `step`
 * degrees (1 at most), then each local maximum of the samples refined by golden-section search
 * (Kiefer 1953) within one step of it.
 */
function projectedPeaksDeg(f: (deg: number) => number, step: number): number[] {
  const sampleDeg = Math.min(step, 1);
  const samples: [number, number][] = [];
  for (let deg = 0; deg < 360; deg += sampleDeg) samples.push([deg, f(deg)]);
  let best = 0;
  for (const [deg, value] of samples) if (value > f(best)) best = deg;
  const peaks = [goldenPeakDeg(f, best, sampleDeg)];
  const count = samples.length;
  samples.forEach(([deg, value], j) => {
    const before = samples[(j + count - 1) % count][1];
    const after = samples[(j + 1) % count][1];
    if (deg !== best && value >= before && value >= after) peaks.push(goldenPeakDeg(f, deg, sampleDeg));
  });
  return peaks;
}

/** The direction of the largest value of f within `halfWidth` degrees of `centreDeg`, by golden-section search. */
function goldenPeakDeg(f: (deg: number) => number, centreDeg: number, halfWidth: number): number {
  let lo = centreDeg - halfWidth;
  let hi = centreDeg + halfWidth;
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
  // The smallest principal second moment, which bounds how far projected tension varies.
  const smallestMoment = (ixx + iyy) / 2 - Math.hypot((ixx - iyy) / 2, ixy);
  return { n, rule, A, B, L, tension, shear, moment, rx, ry, smallestMoment };
}
