import { describe, expect, it } from 'vitest';
import { fitPolynomial, removePolynomialBaseline } from '../../src/record/baseline.js';
import { cumulativeTrapezoid } from '../../src/record/integrate.js';

const dtS = 0.01;
const n = 2001;
const time = (i: number) => i * dtS;

describe('removePolynomialBaseline (least squares, common practice)', () => {
  for (const order of [0, 1, 2, 3]) {
    it(`removes a polynomial offset of order ${order} exactly (closed form: the fit of a polynomial is itself)`, () => {
      const coefficients = [0.3, -0.05, 0.004, -0.0002].slice(0, order + 1);
      const offset = Float64Array.from({ length: n }, (_, i) =>
        coefficients.reduce((sum, c, k) => sum + c * time(i) ** k, 0),
      );
      const residual = removePolynomialBaseline(offset, order);
      for (const value of residual) expect(Math.abs(value)).toBeLessThan(1e-11);
      // Zero drift: the velocity of the corrected record stays at zero.
      const velocity = cumulativeTrapezoid(residual, dtS);
      expect(Math.abs(velocity[n - 1])).toBeLessThan(1e-10);
    });
  }

  it('leaves a whole number of sine cycles on a linear offset with no velocity drift (closed form)', () => {
    const omega = 2 * Math.PI * 0.5; // 10 whole cycles over 20 s
    const signal = Float64Array.from({ length: n }, (_, i) => Math.sin(omega * time(i)));
    const drifting = signal.map((v, i) => v + 0.2 + 0.01 * time(i));
    const corrected = removePolynomialBaseline(drifting, 1);
    const velocity = cumulativeTrapezoid(corrected, dtS);
    // Exact sine velocity ends at 0 after whole cycles; the linear fit of the sine itself is small.
    expect(Math.abs(velocity[n - 1])).toBeLessThan(0.01);
    const uncorrected = cumulativeTrapezoid(drifting, dtS);
    expect(Math.abs(uncorrected[n - 1])).toBeGreaterThan(5);
  });

  it('a lower order than the offset leaves a residual (the test can fail)', () => {
    const quadratic = Float64Array.from({ length: n }, (_, i) => time(i) ** 2);
    const residual = removePolynomialBaseline(quadratic, 1);
    expect(Math.max(...residual.map(Math.abs))).toBeGreaterThan(1);
  });

  it('order 0 is the mean', () => {
    const values = Float64Array.from([1, 2, 3, 10]);
    expect(fitPolynomial(values, 0)[0]).toBeCloseTo(4, 14);
  });

  it('refuses an order outside 0–3', () => {
    expect(() => removePolynomialBaseline(new Float64Array(10), 4)).toThrow(/baseline order/);
  });
});
