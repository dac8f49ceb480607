import { describe, expect, it } from 'vitest';
import {
  composeSteps,
  newmarkCoefficients,
  piecewiseExactCoefficients,
  prewarpedOscillator,
  type StepCoefficients,
  stepCoefficients,
} from '../../src/oscillator/recurrence.js';
import { executionPlan, substepCount } from '../../src/oscillator/substeps.js';

/** Free vibration from (u0, v0): u at each of `steps` steps. */
function freeVibration(c: StepCoefficients, u0: number, v0: number, steps: number): Float64Array {
  const out = new Float64Array(steps + 1);
  let u = u0;
  let v = v0;
  out[0] = u;
  for (let n = 1; n <= steps; n++) {
    const un = c.uu * u + c.uv * v;
    v = c.vu * u + c.vv * v;
    u = un;
    out[n] = u;
  }
  return out;
}

/** Eigenvalues of the 2×2 step matrix as (modulus, angle). */
function eigen(c: StepCoefficients): { modulus: number; angle: number } {
  const trace = c.uu + c.vv;
  const det = c.uu * c.vv - c.uv * c.vu;
  const disc = trace * trace - 4 * det;
  if (disc >= 0) {
    const r = Math.max(Math.abs((trace + Math.sqrt(disc)) / 2), Math.abs((trace - Math.sqrt(disc)) / 2));
    return { modulus: r, angle: 0 };
  }
  return { modulus: Math.sqrt(det), angle: Math.atan2(Math.sqrt(-disc) / 2, trace / 2) };
}

describe('Newmark-β average acceleration', () => {
  // Newmark (1959); Chopra, Dynamics of Structures, §5.5: undamped free vibration keeps its
  // amplitude and has the numerical period T̄ = πΔt / arctan(πΔt/T).
  it.each([0.01, 0.05, 0.1, 0.3])('has the closed-form numerical period at Δt/T = %s', (ratio) => {
    const periodS = 1;
    const dtS = ratio * periodS;
    const c = newmarkCoefficients((2 * Math.PI) / periodS, 0, dtS, 0.5, 0.25);
    const { modulus, angle } = eigen(c);
    expect(modulus).toBeCloseTo(1, 14);
    const numericalPeriod = (2 * Math.PI * dtS) / angle;
    const closedForm = (Math.PI * dtS) / Math.atan((Math.PI * dtS) / periodS);
    expect(numericalPeriod / closedForm - 1).toBeLessThan(1e-12);
    expect(numericalPeriod).toBeGreaterThan(periodS); // period elongation
  });

  // Chopra, Dynamics of Structures, chapter 5 worked Newmark examples (numbering varies by edition):
  // m = 0.2533, k = 10, c = 0.1592, p = 10 sin(πt/0.6) for t ≤ 0.6 s, Δt = 0.1 s. Values from memory;
  // the book rounds as it goes, so agreement to 2e-4.
  const m = 0.2533;
  const k = 10;
  const cDamper = 0.1592;
  const omega = Math.sqrt(k / m);
  const zeta = cDamper / (2 * m * omega);
  const force = (t: number) => (t <= 0.6 + 1e-12 ? 10 * Math.sin((Math.PI * t) / 0.6) : 0);
  // The recurrence is for u'' + 2ζωu' + ω²u = −a_g; a force p is a_g = −p/m.
  function chopra(beta: number): number[] {
    const c = newmarkCoefficients(omega, zeta, 0.1, 0.5, beta);
    const out: number[] = [];
    let u = 0;
    let v = 0;
    for (let n = 0; n < 10; n++) {
      const p0 = -force(n * 0.1) / m;
      const p1 = -force((n + 1) * 0.1) / m;
      const un = c.uu * u + c.uv * v + c.up0 * p0 + c.up1 * p1;
      v = c.vu * u + c.vv * v + c.vp0 * p0 + c.vp1 * p1;
      u = un;
      out.push(u);
    }
    return out;
  }
  it('reproduces the average-acceleration worked example', () => {
    const book = [0.0437, 0.2326, 0.6121, 1.0825, 1.4309, 1.4231, 0.9622, 0.1908, -0.6044, -1.1442];
    for (const [i, u] of chopra(0.25).entries()) expect(Math.abs(u - book[i])).toBeLessThan(2e-4);
  });
  it('reproduces the linear-acceleration worked example', () => {
    const book = [0.03, 0.2193, 0.6166, 1.113, 1.4782, 1.4625, 0.9514, 0.1273, -0.6954, -1.2208];
    for (const [i, u] of chopra(1 / 6).entries()) expect(Math.abs(u - book[i])).toBeLessThan(2e-4);
  });
});

describe('Newmark-β linear acceleration', () => {
  // Newmark (1959): conditionally stable, for Δt/T ≤ √3/π ≈ 0.551 (undamped).
  it('is stable just below Δt/T = √3/π and unstable just above', () => {
    const limit = Math.sqrt(3) / Math.PI;
    const below = eigen(newmarkCoefficients(2 * Math.PI, 0, 0.995 * limit, 0.5, 1 / 6));
    const above = eigen(newmarkCoefficients(2 * Math.PI, 0, 1.005 * limit, 0.5, 1 / 6));
    expect(below.modulus).toBeLessThanOrEqual(1 + 1e-12);
    expect(above.modulus).toBeGreaterThan(1.001);
  });
  it('is kept far inside its stability limit by the sub-step rule', () => {
    for (const periodS of [0.001, 0.01, 0.0123, 0.05, 0.3, 2]) {
      for (const dtS of [0.005, 0.01, 0.02, 0.05]) {
        const m = substepCount('newmark-linear', periodS, dtS, { damping: 0, durationS: 30 });
        expect(dtS / m / periodS).toBeLessThan(Math.sqrt(3) / Math.PI);
        expect(dtS / m / periodS).toBeLessThanOrEqual(1 / 10 + 1e-12);
      }
    }
  });
});

describe('piecewise-exact step (Nigam and Jennings 1969)', () => {
  it('has the damped frequency ω_D = ω√(1 − ζ²) and decay e^{−ζωh} (common practice)', () => {
    const omega = 2 * Math.PI;
    for (const zeta of [0, 0.05, 0.2, 0.7]) {
      const h = 0.01;
      const { modulus, angle } = eigen(piecewiseExactCoefficients(omega, zeta, h));
      expect(angle / h).toBeCloseTo(omega * Math.sqrt(1 - zeta * zeta), 9);
      expect(modulus).toBeCloseTo(Math.exp(-zeta * omega * h), 12);
    }
  });

  // Closed forms for free vibration from u(0) = 1, u'(0) = 0 (any dynamics text, e.g. Chopra §2.2).
  it('matches the critically damped response (1 + ωt)e^{−ωt} at c = c_cr = 2√(km)', () => {
    const k = 40;
    const m = 2;
    const cCritical = 2 * Math.sqrt(k * m);
    const omega = Math.sqrt(k / m);
    const zeta = cCritical / (2 * m * omega);
    expect(zeta).toBeCloseTo(1, 14);
    const h = 0.013;
    const u = freeVibration(piecewiseExactCoefficients(omega, zeta, h), 1, 0, 300);
    u.forEach((value, n) => {
      const t = n * h;
      expect(value).toBeCloseTo((1 + omega * t) * Math.exp(-omega * t), 12);
    });
  });
  it('matches the overdamped response', () => {
    const omega = 3;
    for (const zeta of [1.000001, 1.5, 4]) {
      const wd = omega * Math.sqrt(zeta * zeta - 1);
      const h = 0.02;
      const u = freeVibration(piecewiseExactCoefficients(omega, zeta, h), 1, 0, 200);
      u.forEach((value, n) => {
        const t = n * h;
        const exact =
          Math.exp(-zeta * omega * t) * (Math.cosh(wd * t) + ((zeta * omega) / wd) * Math.sinh(wd * t));
        expect(value).toBeCloseTo(exact, 10);
      });
    }
  });
  it('matches the underdamped response including ζ = 0', () => {
    const omega = 5;
    for (const zeta of [0, 0.02, 0.5]) {
      const wd = omega * Math.sqrt(1 - zeta * zeta);
      const h = 0.017;
      const u = freeVibration(piecewiseExactCoefficients(omega, zeta, h), 1, 0, 400);
      u.forEach((value, n) => {
        const t = n * h;
        const exact =
          Math.exp(-zeta * omega * t) * (Math.cos(wd * t) + ((zeta * omega) / wd) * Math.sin(wd * t));
        expect(value).toBeCloseTo(exact, 11);
      });
    }
  });
  it('is exact for a ramp of ground acceleration (closed form u = −t/(hω²) + sin ωt/(hω³))', () => {
    const omega = (2 * Math.PI) / 0.3;
    const h = 0.02;
    const c = piecewiseExactCoefficients(omega, 0, h);
    const exact = -1 / (omega * omega) + Math.sin(omega * h) / (h * omega ** 3);
    expect(c.up1).toBeCloseTo(exact, 14);
    expect(c.up0 + c.up1).toBeCloseTo(-(1 - Math.cos(omega * h)) / (omega * omega), 14);
  });
  it('has no trouble at ζ = 0 and ζ = 1 exactly (no division by zero)', () => {
    for (const zeta of [0, 1]) {
      const c = stepCoefficients('piecewise-exact', 7, zeta, 0.01);
      for (const value of Object.values(c)) expect(Number.isFinite(value)).toBe(true);
      for (const method of ['newmark-average', 'newmark-linear'] as const) {
        for (const value of Object.values(stepCoefficients(method, 7, zeta, 0.01))) {
          expect(Number.isFinite(value)).toBe(true);
        }
      }
    }
  });
});

describe('pre-warped Newmark recurrences', () => {
  // The pre-warped recurrence's step matrix has the exact eigenvalues exp(λh) of the oscillator
  // (closed form: λ = −ζω ± iω√(1 − ζ²)).
  it.each(['newmark-average', 'newmark-linear'] as const)('%s has the exact poles', (method) => {
    for (const zeta of [0, 0.05, 0.5, 1, 2]) {
      const omega = 2 * Math.PI * 3;
      const h = 0.004;
      const w = prewarpedOscillator(method, omega, zeta, h);
      const c = stepCoefficients(method, w.omegaRadS, w.damping, h);
      const exact = piecewiseExactCoefficients(omega, zeta, h);
      expect(c.uu + c.vv).toBeCloseTo(exact.uu + exact.vv, 12);
      expect(c.uu * c.vv - c.uv * c.vu).toBeCloseTo(exact.uu * exact.vv - exact.uv * exact.vu, 12);
    }
  });
});

describe('composed sub-steps (composeSteps, executionPlan)', () => {
  // Piecewise-exact is exact for an input linear over the step (Nigam and Jennings 1969), so k
  // exact sub-steps over a linear input compose to the exact step over the whole interval.
  it('composes k exact steps into the exact step of k·h', () => {
    for (const zeta of [0, 0.05, 1, 3]) {
      const omega = 2 * Math.PI * 7;
      const whole = piecewiseExactCoefficients(omega, zeta, 0.01);
      const composed = composeSteps(piecewiseExactCoefficients(omega, zeta, 0.01 / 7), 7);
      for (const key of Object.keys(whole) as (keyof StepCoefficients)[]) {
        const scale = Math.abs(whole[key]) + 1e-6 * (key.startsWith('u') ? 1e-2 : 1);
        expect(Math.abs(composed[key] - whole[key]) / scale).toBeLessThan(1e-11);
      }
    }
  });

  // The composed map is the sub-stepped recurrence itself: stepping it once gives what stepping
  // the k sub-steps over the linearly interpolated input gives (to rounding).
  it.each(['newmark-average', 'newmark-linear'] as const)(
    'gives the sub-steps of %s to rounding',
    (method) => {
      const omega = (2 * Math.PI) / 0.05;
      const k = 9;
      const s = stepCoefficients(method, omega, 0.05, 0.01 / k);
      const c = composeSteps(s, k);
      const [u0, v0, p0, p1] = [3e-3, -0.2, 1.7, -2.4];
      let u = u0;
      let v = v0;
      for (let j = 0; j < k; j++) {
        const pa = p0 + ((p1 - p0) * j) / k;
        const pb = p0 + ((p1 - p0) * (j + 1)) / k;
        const un = s.uu * u + s.uv * v + s.up0 * pa + s.up1 * pb;
        v = s.vu * u + s.vv * v + s.vp0 * pa + s.vp1 * pb;
        u = un;
      }
      expect(c.uu * u0 + c.uv * v0 + c.up0 * p0 + c.up1 * p1).toBeCloseTo(u, 15);
      expect((c.vu * u0 + c.vv * v0 + c.vp0 * p0 + c.vp1 * p1) / v).toBeCloseTo(1, 13);
    },
  );

  it('keeps MIN_STEPS_PER_PERIOD executed steps a period and composes the rest', () => {
    // T = 0.05 s at Δt = 0.005 s: 10 steps a period already; 7 sub-steps of Newmark average composed.
    expect(executionPlan(7, 0.05, 0.005, 0.1)).toEqual({ steps: 1, composed: 7 });
    // T = 0.01 s at Δt = 0.005 s needs 5 executed steps a record step; 14 sub-steps become 5 × 3.
    expect(executionPlan(14, 0.01, 0.005, 0.1)).toEqual({ steps: 5, composed: 3 });
    // Fewer sub-steps than Hermite needs: nothing to compose.
    expect(executionPlan(3, 0.01, 0.005, 0.1)).toEqual({ steps: 3, composed: 1 });
    // Steps per period asked for are executed: 400 a period at T = 0.05 s, Δt = 0.005 s is 40 a sample.
    expect(executionPlan(40, 0.05, 0.005, 0.1, 400)).toEqual({ steps: 40, composed: 1 });
  });
});
