import { describe, expect, it } from 'vitest';
import { createRecord } from '../../src/record/record.js';
import { predominantPeriod } from '../../src/spectrum/predominant.js';

describe('predominantPeriod (peak of the 5%-damped PSA; Rathje et al. 1998)', () => {
  it('of a long 1 Hz sine is near 1 s (closed form: steady-state PSA peaks at T = √(1 − 2ζ²) s)', () => {
    const dtS = 0.01;
    const accelMS2 = Float64Array.from({ length: 6001 }, (_, i) => Math.sin(2 * Math.PI * i * dtS));
    const result = predominantPeriod(createRecord({ name: 'sine', dtS, accelMS2 }));
    const expected = Math.sqrt(1 - 2 * 0.05 ** 2);
    // The grid steps by a ratio of 500^(1/199) ≈ 1.032.
    expect(Math.abs(result.periodS / expected - 1)).toBeLessThan(0.02);
    expect(result.damping).toBe(0.05);
  });
});
