// The yielding oscillator under a rectangular pulse of force of unlimited duration (a step load),
// undamped, from rest: the closed form by energy balance (Chopra, Dynamics of Structures, §7.x, the
// elastoplastic system under a step force; derived here, from memory).
//
// A constant ground acceleration −a0 from t = 0 is a step force p0 = m·a0. Elastically the peak is
// twice the static displacement, u_m = 2p0/k, so a spring of strength f_y = R·p0 yields when R < 2.
// At the first peak the velocity is zero, so the work of p0 equals the energy stored and dissipated
// by the spring, the area under its force–deformation curve loaded from 0 to u_m:
//   p0·u_m = ½·f_y·u_y + f_y·(u_m − u_y) + ½·α·k·(u_m − u_y)²    (bilinear, kinematic; α = 0 EP)
// With x = μ = u_m/u_y and f_y = k·u_y, dividing by f_y·u_y:
//   x/R = x − ½ + ½α(x − 1)²,   i.e.   ½α(x − 1)² + (1 − 1/R)·x − ½ = 0.
// Elastoplastic (α = 0): x = 1/(2(1 − 1/R)) = R/(2(R − 1)), finite for R > 1 (f_y > p0), e.g.
// R = 1.25 → μ = 2.5, R = 1.5 → μ = 1.5. After the peak the spring unloads and oscillates
// elastically about the new offset (its force stays within [2p0 − f_y, f_y], never −f_y), so the
// first peak is the peak of the whole run and the spring yields once.
import { describe, expect, it } from 'vitest';
import type { Hysteresis } from '../../src/inelastic/hysteresis.js';
import { yieldingPeak } from '../../src/inelastic/yielding.js';

/** μ from the energy balance above: the root x > 1 of ½α(x − 1)² + (1 − 1/R)x − ½ = 0. */
function stepLoadDuctility(r: number, alpha: number): number {
  const b = 1 - 1 / r;
  if (alpha === 0) return 1 / (2 * b);
  // ½α(x−1)² + b·x − ½ = 0 → ½α·y² + b·y + (b − ½) = 0 with y = x − 1 ≥ 0.
  const y = (-b + Math.sqrt(b * b - 2 * alpha * (b - 0.5))) / alpha;
  return 1 + y;
}

describe('a step load on an undamped yielding oscillator (closed form)', () => {
  const periodS = 1;
  const omega2 = (2 * Math.PI) ** 2;
  const a0 = 2; // m/s²
  const dtS = 0.01;
  const accelMS2 = new Float64Array(601).fill(a0); // 6 s, the first peak comes within 2 s
  const staticM = a0 / omega2;

  it('stays elastic when R ≥ 2 with the elastic peak 2·p0/k', () => {
    const peak = yieldingPeak(accelMS2, dtS, {
      periodS,
      damping: 0,
      model: { kind: 'elastoplastic' },
      yieldDisplacementM: 2.2 * staticM,
    });
    expect(peak.yieldEvents).toBe(0);
    expect(peak.peakDisplacementM / (2 * staticM)).toBeCloseTo(1, 4);
  });

  it.each([
    [1.1, 0],
    [1.25, 0],
    [1.5, 0],
    [1.8, 0],
    [1.25, 0.1],
    [1.1, 0.3],
  ])('R = f_y/p0 = %s, α = %s: μ from the energy balance within 0.2%', (r, alpha) => {
    const model: Hysteresis = alpha === 0 ? { kind: 'elastoplastic' } : { kind: 'bilinear', alpha };
    const peak = yieldingPeak(accelMS2, dtS, { periodS, damping: 0, model, yieldDisplacementM: r * staticM });
    expect(Math.abs(peak.ductility / stepLoadDuctility(r, alpha) - 1)).toBeLessThan(0.002);
    expect(peak.yieldEvents).toBe(1);
  });

  it('the closed form itself: R = 1.25 gives μ = 2.5, R = 1.5 gives 1.5 (elastoplastic)', () => {
    expect(stepLoadDuctility(1.25, 0)).toBeCloseTo(2.5, 12);
    expect(stepLoadDuctility(1.5, 0)).toBeCloseTo(1.5, 12);
    // The bilinear root satisfies its equation.
    const x = stepLoadDuctility(1.25, 0.1);
    expect(0.05 * (x - 1) ** 2 + (1 - 1 / 1.25) * x - 0.5).toBeCloseTo(0, 12);
  });
});
