import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  boltGroupAtDirection,
  boltGroupForces,
  boltGroupForcesExhaustive,
} from '../../src/anchorage/bolt-group.js';
import { FUZZ_SEED, runs } from '../helpers/fuzz-budget.js';

/*
 * Hand calculation (closed form; elastic bolt group about the centroid, common practice):
 * rectangle of anchors at (±a, ±b), a = 0.8 m, b = 0.5 m (a 1.6 m × 1.0 m pattern), n = 4.
 * F = 33.75 kN at h_cg = 1.1 m → M = 37.125 kN·m. Dead load (0.9 − 0.2·1.0)·45 = 31.5 kN, D/n = 7.875 kN.
 * I = Σ r rᵀ = diag(4a², 4b²) = diag(2.56, 1.00) m².
 *   θ = 0°  (force +x): d = 0.8 for the two anchors at x = −a; T = M·0.8/2.56 − 7.875 = 11.6016 − 7.875 = 3.7266 kN.
 *   θ = 90° (force +y): d = 0.5 for the anchors at y = −b; T = M·0.5/1.00 − 7.875 = 18.5625 − 7.875 = 10.6875 kN.
 *   Any θ, anchor (−a, −b): T(θ) = (M/4)(cos θ/a + sin θ/b) − D/4. dT/dθ = 0 ⇒ tan θ* = a/b,
 *   θ* = atan(0.8/0.5) = 57.9946°, T* = (M/4)·√(1/a² + 1/b²) − D/4 = 9.28125·2.358495 − 7.875 = 14.0148 kN.
 *   (√(1/0.64 + 1/0.25) = √5.5625 = 2.3584953.) The worst direction is not along an axis.
 */
const rectangle = {
  anchors: [
    [-0.8, -0.5],
    [0.8, -0.5],
    [0.8, 0.5],
    [-0.8, 0.5],
  ] as [number, number][],
  cgPlan: [0, 0] as [number, number],
  cgHeight: 1.1,
  horizontalForce: 33.75,
  deadLoad: 31.5,
  rule: 'biaxial' as const,
};
const M = 33.75 * 1.1;

describe('boltGroupForces, biaxial rule, 4-anchor 1.6 m × 1.0 m rectangle', () => {
  it('θ = 0°: trailing anchors T = M·a/(4a²) − D/4 = 3.7266 kN, leading ones 0', () => {
    const { tension } = boltGroupAtDirection(rectangle, 0);
    expect(tension[0]).toBeCloseTo((M * 0.8) / 2.56 - 7.875, 9);
    expect(tension[0]).toBeCloseTo(3.7266, 3);
    expect(tension[3]).toBeCloseTo(tension[0], 12);
    expect(tension[1]).toBe(0);
    expect(tension[2]).toBe(0);
  });

  it('θ = 90°: anchors at y = −b carry T = M·b/(4b²) − D/4 = 10.6875 kN', () => {
    const { tension } = boltGroupAtDirection(rectangle, 90);
    expect(tension[0]).toBeCloseTo(10.6875, 9);
    expect(tension[1]).toBeCloseTo(10.6875, 9);
    expect(tension[2]).toBe(0);
  });

  it('worst direction θ* = atan(a/b) = 57.99°, T* = (M/4)√(1/a² + 1/b²) − D/4 = 14.0148 kN', () => {
    const result = boltGroupForces(rectangle);
    const thetaStar = (Math.atan(0.8 / 0.5) * 180) / Math.PI;
    const tStar = (M / 4) * Math.sqrt(1 / 0.64 + 1 / 0.25) - 7.875;
    expect(tStar).toBeCloseTo(14.0148, 3);
    expect(result.maxTension).toBeCloseTo(tStar, 9);
    expect(result.perAnchor[0].tensionDirectionDeg).toBeCloseTo(thetaStar, 6);
    expect(result.governingAnchor).toBe(0);
    expect(result.maxTensionDirectionDeg).toBeCloseTo(57.9946, 3);
    // By symmetry each corner has the same worst value, at 180° − θ*, 180° + θ*, 360° − θ*.
    expect(result.perAnchor[1].tensionDirectionDeg).toBeCloseTo(180 - thetaStar, 6);
    expect(result.perAnchor[2].tensionDirectionDeg).toBeCloseTo(180 + thetaStar, 6);
    expect(result.perAnchor[3].tensionDirectionDeg).toBeCloseTo(360 - thetaStar, 6);
    for (const anchor of result.perAnchor) expect(anchor.tension).toBeCloseTo(tStar, 9);
    // The worst beats both axes.
    expect(tStar).toBeGreaterThan(10.6875);
  });

  it('shear F/n = 33.75/4 = 8.4375 kN per anchor with the centre of mass at the centroid', () => {
    const result = boltGroupForces(rectangle);
    for (const anchor of result.perAnchor) expect(anchor.shear).toBeCloseTo(8.4375, 10);
  });

  it('no tension when the dead load exceeds the overturning (clamped at zero)', () => {
    const result = boltGroupForces({ ...rectangle, horizontalForce: 1 });
    expect(result.maxTension).toBe(0);
  });
});

describe('boltGroupForces, eccentric centre of mass (elastic method, hand calculation)', () => {
  /*
   * Square of side 2 (anchors at (±1, ±1)), J = Σ|r|² = 8, I = diag(4, 4). Centre of mass at e = (0.5, 0).
   * Dead load D = 8 only (F = 0): compression C_i = D(1/4 + e·r_i/4) = 2 ± 1 → 3 at x = +1, 1 at x = −1.
   * Force F = 8 along +y at the centre of mass: torsion e × F = 0.5·8 = 4 (counter-clockwise);
   * torsional shear 4·|r|/J = 4·√2/8 = 0.7071 at each anchor, perpendicular to r; direct 8/4 = 2 along y.
   * Anchor (1, 1): ẑ × r = (−1, 1); reaction V = F(u/n + (e×u)_z/J · ẑ×r) = 8·((0, 0.25) + (0.5/8)(−1, 1)) = (−0.5, 2.5),
   * |V| = √(0.25 + 6.25) = 2.5495.
   */
  const square = {
    anchors: [
      [-1, -1],
      [1, -1],
      [1, 1],
      [-1, 1],
    ] as [number, number][],
    cgPlan: [0.5, 0] as [number, number],
    cgHeight: 0,
  };

  it('shares an eccentric dead load linearly: C = 2 ± 1', () => {
    // With h_cg = 0 there is no overturning; a tiny uplift-free check via negative dead load (net uplift of 8):
    const { tension } = boltGroupAtDirection({ ...square, horizontalForce: 0, deadLoad: -8 }, 0);
    expect(tension[0]).toBeCloseTo(1, 12);
    expect(tension[1]).toBeCloseTo(3, 12);
    expect(tension[2]).toBeCloseTo(3, 12);
    expect(tension[3]).toBeCloseTo(1, 12);
  });

  it('adds torsional shear: anchor (1, 1) under F = 8 along +y carries √(0.5² + 2.5²) = 2.5495', () => {
    const { shear } = boltGroupAtDirection({ ...square, horizontalForce: 8, deadLoad: 0 }, 90);
    expect(shear[2]).toBeCloseTo(Math.hypot(0.5, 2.5), 12);
    const worst = boltGroupForces({ ...square, horizontalForce: 8, deadLoad: 0 });
    expect(worst.maxShear).toBeGreaterThanOrEqual(shear[2] - 1e-12);
  });

  it('the worst found does not depend on the sweep step (exact directions are added)', () => {
    const fine = boltGroupForces({ ...square, cgHeight: 1.3, horizontalForce: 8, deadLoad: 5, stepDeg: 0.1 });
    const coarse = boltGroupForces({ ...square, cgHeight: 1.3, horizontalForce: 8, deadLoad: 5, stepDeg: 5 });
    expect(coarse.maxTension).toBeGreaterThanOrEqual(fine.maxTension - 1e-9);
    expect(coarse.maxShear).toBeGreaterThanOrEqual(fine.maxShear - 1e-9);
  });
});

describe('boltGroupForces reduces to M·d_i/Σd² − D/n along a principal axis (ASCE-style elastic formula, common practice)', () => {
  it('an unequal 3-anchor pattern symmetric about x, force along x', () => {
    // Anchors (0, −1), (0, 1), (3, 0): centroid (1, 0); r_x = −1, −1, 2; Σd² about the y-axis = 6.
    // Force along +x: d = −r_x → 1, 1, −2; T = M·1/6 − D/3 for the two anchors at x = 0.
    const input = {
      anchors: [
        [0, -1],
        [0, 1],
        [3, 0],
      ] as [number, number][],
      cgPlan: [1, 0] as [number, number],
      cgHeight: 2,
      horizontalForce: 10,
      deadLoad: 3,
    };
    const { tension } = boltGroupAtDirection(input, 0);
    expect(tension[0]).toBeCloseTo((20 * 1) / 6 - 1, 12);
    expect(tension[1]).toBeCloseTo((20 * 1) / 6 - 1, 12);
    expect(tension[2]).toBe(0);
  });
});

/*
 * The same rectangle under the projected rule (the rule written in the issue; common practice):
 * T_i = M·d_i/Σd_j² − D/n, d_i the distance from the neutral axis through the centroid
 * perpendicular to the direction of shaking u = (cos θ, sin θ). For the anchor (−a, −b):
 *   d = a cos θ + b sin θ,  Σd² = 4(a² cos²θ + b² sin²θ),
 *   T(θ) = (M/4)·g(θ) − D/4,  g(θ) = (a c + b s)/(a² c² + b² s²), c = cos θ, s = sin θ.
 * θ = 0°: g = 1/a → 3.7266 kN; θ = 90°: g = 1/b → 10.6875 kN (both as the biaxial rule: principal axes).
 * At θ = atan(a/b): a c + b s = 2ab/√(a²+b²), a²c² + b²s² = 2a²b²/(a²+b²), g = √(a²+b²)/(ab)
 * = √(1/a² + 1/b²): the same 14.0148 kN as the biaxial rule's maximum, but not the maximum here.
 * Worst direction: g'(θ) = 0 ⇔ (b c − a s)(a² c² + b² s²) = 2(b² − a²) s c (a c + b s); dividing by c³
 * with t = tan θ and collecting terms,
 *   −a b² t³ + (2a² b − b³) t² + (a³ − 2a b²) t + a² b = 0,
 * a cubic with one real root (a = 0.8, b = 0.5: t* = 2.94889, θ* = 71.2677°), solved below by
 * Cardano's formula. Then g* = (a + b t*)√(1 + t*²)/(a² + b² t*²) = 2.51680 and
 * T* = (M/4)·g* − D/4 = 15.4840 kN, 10.5% above the biaxial maximum. (Check on the square a = b:
 * the cubic is b³(1 − t)(1 + t²) = 0, θ* = 45°, where both rules agree.)
 */
function cardanoRealRoot(c3: number, c2: number, c1: number, c0: number): number {
  // x³ + p2 x² + p1 x + p0 = 0 → depressed y³ + p y + q = 0 with x = y − p2/3 (Cardano 1545).
  const [p2, p1, p0] = [c2 / c3, c1 / c3, c0 / c3];
  const p = p1 - (p2 * p2) / 3;
  const q = (2 * p2 ** 3) / 27 - (p2 * p1) / 3 + p0;
  const disc = (q / 2) ** 2 + (p / 3) ** 3;
  expect(disc).toBeGreaterThan(0); // one real root
  const y = Math.cbrt(-q / 2 + Math.sqrt(disc)) + Math.cbrt(-q / 2 - Math.sqrt(disc));
  return y - p2 / 3;
}

describe('boltGroupForces, projected rule (default), the same rectangle', () => {
  const projected = { ...rectangle, rule: 'projected' as const };
  const [a, b] = [0.8, 0.5];

  it('is the default rule', () => {
    const { rule: _rule, ...withoutRule } = rectangle;
    expect(boltGroupForces(withoutRule).rule).toBe('projected');
    expect(boltGroupForces(withoutRule).maxTension).toBeCloseTo(boltGroupForces(projected).maxTension, 12);
  });

  it('θ = 0° and 90°: M·d/Σd² − D/4 = 3.7266 and 10.6875 kN, as the biaxial rule on the principal axes', () => {
    expect(boltGroupAtDirection(projected, 0).tension[0]).toBeCloseTo((M * a) / (4 * a * a) - 7.875, 9);
    expect(boltGroupAtDirection(projected, 90).tension[0]).toBeCloseTo(10.6875, 9);
    expect(boltGroupAtDirection(projected, 90).tension[2]).toBe(0);
  });

  it('θ = atan(a/b): (M/4)√(1/a² + 1/b²) − D/4 = 14.0148 kN, equal to the biaxial maximum', () => {
    const theta = (Math.atan(a / b) * 180) / Math.PI;
    expect(boltGroupAtDirection(projected, theta).tension[0]).toBeCloseTo(14.0148, 3);
  });

  it('worst direction from the cubic (Cardano): θ* = 71.27°, T* = 15.4840 kN, above the biaxial 14.0148 kN', () => {
    const t = cardanoRealRoot(-a * b * b, 2 * a * a * b - b ** 3, a ** 3 - 2 * a * b * b, a * a * b);
    const thetaStar = (Math.atan(t) * 180) / Math.PI;
    const gStar = ((a + b * t) * Math.sqrt(1 + t * t)) / (a * a + b * b * t * t);
    const tStar = (M / 4) * gStar - 7.875;
    expect(thetaStar).toBeCloseTo(71.2677, 3);
    expect(tStar).toBeCloseTo(15.484, 3);
    const result = boltGroupForces(projected);
    expect(result.maxTension).toBeCloseTo(tStar, 8);
    expect(result.perAnchor[0].tensionDirectionDeg).toBeCloseTo(thetaStar, 4);
    expect(result.governingAnchor).toBe(0);
    // Symmetry: the other corners peak at 180° − θ*, 180° + θ*, 360° − θ*.
    expect(result.perAnchor[1].tensionDirectionDeg).toBeCloseTo(180 - thetaStar, 4);
    expect(result.perAnchor[2].tensionDirectionDeg).toBeCloseTo(180 + thetaStar, 4);
    expect(result.perAnchor[3].tensionDirectionDeg).toBeCloseTo(360 - thetaStar, 4);
    expect(result.maxTension).toBeGreaterThan(boltGroupForces(rectangle).maxTension);
  });

  it('the worst found does not depend on the sweep step (golden-section refinement)', () => {
    const coarse = boltGroupForces({ ...projected, stepDeg: 10 });
    const fine = boltGroupForces({ ...projected, stepDeg: 0.25 });
    expect(coarse.maxTension).toBeCloseTo(fine.maxTension, 8);
  });

  it('shear is the same under both rules (the rules differ in the overturning share only)', () => {
    expect(boltGroupForces(projected).maxShear).toBeCloseTo(boltGroupForces(rectangle).maxShear, 12);
  });
});

describe('boltGroupForces takes only the directions that can matter to each anchor', () => {
  // The oracle is the definition itself: every anchor at every direction of the sweep.
  const coordinate = fc.double({ min: -2, max: 2, noNaN: true });
  const group = fc.record({
    anchors: fc.array(fc.tuple(coordinate, coordinate), { minLength: 3, maxLength: 9 }),
    cgPlan: fc.tuple(
      fc.double({ min: -1, max: 1, noNaN: true }),
      fc.double({ min: -1, max: 1, noNaN: true }),
    ),
    cgHeight: fc.double({ min: 0, max: 3, noNaN: true }),
    horizontalForce: fc.double({ min: 0, max: 100, noNaN: true }),
    deadLoad: fc.double({ min: 0, max: 100, noNaN: true }),
    stepDeg: fc.constantFrom(0.5, 1, 5, 15),
    rule: fc.constantFrom('projected' as const, 'biaxial' as const),
  });
  /** Anchors spread out enough to make a group (a group on one line has no second moment across it). */
  const spread = (anchors: [number, number][]) => {
    const [x0, y0] = anchors[0];
    return anchors.some(
      ([x, y]) => Math.abs((x - x0) * (anchors[1][1] - y0) - (y - y0) * (anchors[1][0] - x0)) > 0.05,
    );
  };

  it("gives the exhaustive sweep's result on random small groups (property test)", () => {
    fc.assert(
      fc.property(group, (input) => {
        fc.pre(spread(input.anchors));
        expect(boltGroupForces(input)).toEqual(boltGroupForcesExhaustive(input));
      }),
      { seed: FUZZ_SEED, numRuns: runs(100) },
    );
  });

  it('gives it on a symmetric grid, where directions tie between anchors', () => {
    const anchors: [number, number][] = [];
    for (let i = 0; i < 6; i++) for (let j = 0; j < 5; j++) anchors.push([i * 0.2 - 0.5, j * 0.2 - 0.4]);
    for (const rule of ['projected', 'biaxial'] as const)
      for (const cgPlan of [
        [0, 0],
        [0.1, 0],
        [0.13, -0.07],
      ] as [number, number][]) {
        const input = { anchors, cgPlan, cgHeight: 1.2, horizontalForce: 30, deadLoad: 20, rule };
        expect(boltGroupForces(input)).toEqual(boltGroupForcesExhaustive(input));
      }
  });
});
