import { describe, expect, it } from 'vitest';
import { cumulativeTrapezoid, integrateRecord, trapezoid } from '../../src/record/integrate.js';

describe('cumulativeTrapezoid', () => {
  it('integrates a linear ramp exactly (closed form: ∫c·t dt = c·t²/2; the rule is exact for linear data)', () => {
    const dtS = 0.01;
    const c = 3.7;
    const ramp = Float64Array.from({ length: 501 }, (_, i) => c * i * dtS);
    const integral = cumulativeTrapezoid(ramp, dtS);
    for (let i = 0; i < ramp.length; i += 50) expect(integral[i]).toBeCloseTo((c * (i * dtS) ** 2) / 2, 12);
  });

  it('starts from rest unless told otherwise (common practice)', () => {
    const values = Float64Array.from([1, 1, 1]);
    expect(cumulativeTrapezoid(values, 0.5)[0]).toBe(0);
    expect(Array.from(cumulativeTrapezoid(values, 0.5, 2))).toEqual([2, 2.5, 3]);
  });

  it('the total equals the last running value', () => {
    const values = Float64Array.from([0, 2, -1, 4, 0.5]);
    expect(trapezoid(values, 0.1)).toBeCloseTo(cumulativeTrapezoid(values, 0.1)[4], 14);
  });
});

describe('integrateRecord', () => {
  it('a constant acceleration gives v = a·t exactly and d = a·t²/2 to O(Δt²) (closed form)', () => {
    const dtS = 0.001;
    const accelMS2 = new Float64Array(2001).fill(2);
    const { velocityMS, displacementM } = integrateRecord({ accelMS2, dtS });
    expect(velocityMS[2000]).toBeCloseTo(4, 12);
    // v is linear, so its trapezoidal integral is exact too.
    expect(displacementM[2000]).toBeCloseTo(4, 10);
  });
});
