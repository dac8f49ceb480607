import { describe, expect, it } from 'vitest';
import { lanczos, resampleHistory } from '../../src/record/resample.js';

const sine = (fHz: number, dtS: number, n: number) =>
  Float64Array.from({ length: n }, (_, i) => Math.sin(2 * Math.PI * fHz * i * dtS + 0.4));

describe('resampleHistory (Lanczos-windowed sinc, Duchon 1979; anti-alias low-pass)', () => {
  it('a finer step reproduces a band-limited sine between the samples (Shannon 1949 sampling theorem)', () => {
    const { values, antiAliasHz } = resampleHistory(sine(2, 0.01, 2001), 0.01, 0.0025);
    expect(antiAliasHz).toBeNull();
    expect(values.length).toBe(8001);
    const expected = sine(2, 0.0025, 8001);
    for (let j = 400; j < 7600; j++) expect(Math.abs(values[j] - expected[j])).toBeLessThan(2e-3);
  });

  it('a coarser step keeps content well below the new Nyquist frequency', () => {
    const { values, antiAliasHz } = resampleHistory(sine(2, 0.005, 8001), 0.005, 0.02);
    expect(antiAliasHz).toBeCloseTo(20, 12); // 0.8 × 25 Hz
    const expected = sine(2, 0.02, values.length);
    for (let j = 200; j < values.length - 200; j++)
      expect(Math.abs(values[j] - expected[j])).toBeLessThan(1e-3);
  });

  it('a coarser step removes content above the new Nyquist frequency instead of folding it back (aliasing)', () => {
    // 40 Hz sampled every 0.02 s would alias to 10 Hz at full amplitude without the filter.
    const { values } = resampleHistory(sine(40, 0.005, 8001), 0.005, 0.02);
    for (let j = 400; j < values.length - 400; j++) expect(Math.abs(values[j])).toBeLessThan(0.01);
  });

  it('the kernel is 1 at 0 and 0 at the other whole samples (interpolating)', () => {
    expect(lanczos(0, 8)).toBe(1);
    for (const k of [1, 2, 5, 7]) expect(Math.abs(lanczos(k, 8))).toBeLessThan(1e-15);
  });

  it('refuses a step ≤ 0', () => {
    expect(() => resampleHistory(new Float64Array(10), 0.01, 0)).toThrow(/positive/);
    expect(() => resampleHistory(new Float64Array(10), 0.01, -0.01)).toThrow(/positive/);
  });
});
