import { describe, expect, it } from 'vitest';
import { cosineTaper } from '../../src/record/taper.js';

describe('cosineTaper (Tukey 1967; Harris 1978 §V.B)', () => {
  const n = 1001;
  const ones = new Float64Array(n).fill(1);

  it('starts and ends at zero, is 1/2 half-way up the ramp and leaves the middle untouched', () => {
    const tapered = cosineTaper(ones, 0.1); // 100 samples at each end
    expect(tapered[0]).toBe(0);
    expect(tapered[n - 1]).toBe(0);
    expect(tapered[50]).toBeCloseTo(0.5, 14);
    expect(tapered[n - 1 - 50]).toBeCloseTo(0.5, 14);
    for (let i = 100; i <= n - 1 - 100; i++) expect(tapered[i]).toBe(1);
  });

  it('is symmetric and monotone on each ramp', () => {
    const tapered = cosineTaper(ones, 0.05);
    for (let i = 0; i < n; i++) expect(tapered[i]).toBeCloseTo(tapered[n - 1 - i], 14);
    for (let i = 1; i < 50; i++) expect(tapered[i]).toBeGreaterThan(tapered[i - 1]);
  });

  it('refuses more than half the record at each end', () => {
    expect(() => cosineTaper(ones, 0.6)).toThrow(/50%/);
  });
});
