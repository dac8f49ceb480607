import { describe, expect, it } from 'vitest';
import { interpolateSpectrum } from '../../src/spectrum/interpolate.js';

describe('interpolateSpectrum (linear in log T and log S; common practice for tabulated spectra)', () => {
  it('reproduces a power law S = 2·T^(−0.7) exactly between rows (closed form)', () => {
    const periods = [0.1, 0.2, 0.5, 1];
    const values = periods.map((t) => 2 * t ** -0.7);
    const found = interpolateSpectrum(periods, values, 0.3);
    expect(found?.rule).toBe('log-log');
    expect(found?.value).toBeCloseTo(2 * 0.3 ** -0.7, 12);
    expect([found?.lo, found?.hi]).toEqual([1, 2]);
  });

  it('gives the geometric mean at the logarithmic midpoint (closed form)', () => {
    expect(interpolateSpectrum([1, 10], [0.5, 0.05], Math.sqrt(10))?.value).toBeCloseTo(Math.sqrt(0.025), 12);
  });

  it('is linear in T between a T = 0 row and the next, and next to a value that is not positive', () => {
    expect(interpolateSpectrum([0, 0.1, 1], [0.4, 1, 0.3], 0.05)).toMatchObject({
      rule: 'linear',
      lo: 0,
      hi: 1,
    });
    expect(interpolateSpectrum([0, 0.1, 1], [0.4, 1, 0.3], 0.05)?.value).toBeCloseTo(0.7, 12);
    expect(interpolateSpectrum([0.1, 1], [0, 1], 0.55)?.value).toBeCloseTo(0.5, 12);
  });

  it('takes rows as they are, within the tolerance asked for', () => {
    expect(interpolateSpectrum([0, 0.1, 1], [0.4, 1, 0.3], 0.1)).toEqual({
      value: 1,
      rule: 'point',
      lo: 1,
      hi: 1,
    });
    expect(interpolateSpectrum([0, 0.1, 1], [0.4, 1, 0.3], 1)?.value).toBe(0.3);
    expect(interpolateSpectrum([0, 0.1, 1], [0.4, 1, 0.3], 0.1 + 1e-14)?.rule).toBe('log-log');
    expect(interpolateSpectrum([0, 0.1, 1], [0.4, 1, 0.3], 0.1 + 1e-14, 1e-12)?.rule).toBe('point');
  });

  it('does not extrapolate: outside the table, or for no table, the result is undefined', () => {
    expect(interpolateSpectrum([0.1, 1], [1, 0.5], 0.05)).toBeUndefined();
    expect(interpolateSpectrum([0.1, 1], [1, 0.5], 2)).toBeUndefined();
    expect(interpolateSpectrum([0.1, 1], [1, 0.5], Number.NaN)).toBeUndefined();
    expect(interpolateSpectrum([], [], 1)).toBeUndefined();
  });
});
