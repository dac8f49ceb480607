import { describe, expect, it } from 'vitest';
import { hermitePeak, refinementThresholds } from '../../src/oscillator/peak.js';

/** max |q| over [0, h] by dense sampling. */
function sampledPeak(q: (t: number) => number, h: number): number {
  let peak = 0;
  for (let i = 0; i <= 100_000; i++) peak = Math.max(peak, Math.abs(q((i / 100_000) * h)));
  return peak;
}

describe('hermitePeak', () => {
  it('is exact for a cubic, whose peak lies inside the step (cubic Hermite interpolation reproduces cubics)', () => {
    const h = 0.02;
    const q = (t: number) => 3 + 40 * t - 2500 * t * t + 1e4 * t ** 3;
    const dq = (t: number) => 40 - 5000 * t + 3e4 * t * t;
    const peak = hermitePeak(q(0), q(h), dq(0), dq(h), h);
    expect(peak).toBeGreaterThan(Math.max(Math.abs(q(0)), Math.abs(q(h))));
    expect(peak).toBeCloseTo(sampledPeak(q, h), 9);
  });

  it('finds a negative peak by its absolute value, and a straight line peaks at an end', () => {
    const h = 0.1;
    const q = (t: number) => -Math.sin(Math.PI * (t / h)); // trough of −1 mid-step
    const dq = (t: number) => (-Math.PI / h) * Math.cos(Math.PI * (t / h));
    // Hermite error ≤ h⁴·max|q''''|/384 = π⁴/384 for this step (Burden and Faires §3.4).
    expect(Math.abs(hermitePeak(q(0), q(h), dq(0), dq(h), h) - 1)).toBeLessThan(Math.PI ** 4 / 384);
    expect(hermitePeak(1, -2, -30, -30, 0.1)).toBe(2);
    expect(hermitePeak(0, 0, 0, 0, 0.1)).toBe(0);
  });

  it('follows a sine through a fine step to the interpolation error bound', () => {
    const w = 2 * Math.PI;
    const h = 0.05;
    const t0 = 0.25 - 0.02; // the crest of sin(ωt) at 0.25 s lies inside [t0, t0 + h]
    const peak = hermitePeak(
      Math.sin(w * t0),
      Math.sin(w * (t0 + h)),
      w * Math.cos(w * t0),
      w * Math.cos(w * (t0 + h)),
      h,
    );
    expect(Math.abs(peak - 1)).toBeLessThanOrEqual((h ** 4 * w ** 4) / 384);
  });
});

describe('refinementThresholds', () => {
  it('follows its bounds: r = 1 − ½·1.1·(ωh)², offsets ½·1.1·h² times the ground terms', () => {
    const omega = 2 * Math.PI;
    const c = 2 * 0.05 * omega;
    const h = 0.01;
    const bounds = { pgaMS2: 3, jerkMS3: 200 } as Parameters<typeof refinementThresholds>[3];
    const half = 0.5 * 1.1 * h * h;
    expect(refinementThresholds(omega, c, h, bounds)).toEqual({
      ratio: 1 - half * omega * omega,
      displacementOffset: half * 3,
      velocityOffset: half * 200,
      accelerationOffset: half * (c * 200 + omega * omega * 3),
    });
  });
});
