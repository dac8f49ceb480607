import { describe, expect, it } from 'vitest';
import { seededNormal, seededUniform, synthesizeRecord } from '../../src/record/synth.js';

describe('seeded generators', () => {
  it('the same seed gives the same sequence, another seed another, uniform in [0, 1)', () => {
    const a = seededUniform(42);
    const b = seededUniform(42);
    const c = seededUniform(43);
    const first = Array.from({ length: 1000 }, () => a());
    expect(Array.from({ length: 1000 }, () => b())).toEqual(first);
    expect(c()).not.toBe(first[0]);
    expect(first.every((u) => u >= 0 && u < 1)).toBe(true);
    // Mean of n uniforms: 1/2 with standard error 1/√(12n) ≈ 0.009 for n = 1000 (5 of them here).
    expect(Math.abs(first.reduce((s, u) => s + u, 0) / 1000 - 0.5)).toBeLessThan(0.045);
  });

  it('normal variates have mean 0 and variance 1 (Box–Muller), to sampling error', () => {
    const normal = seededNormal(7);
    const n = 20_000;
    const values = Array.from({ length: n }, () => normal());
    const mean = values.reduce((s, v) => s + v, 0) / n;
    const variance = values.reduce((s, v) => s + (v - mean) ** 2, 0) / (n - 1);
    // Standard errors: 1/√n = 0.007 for the mean, √(2/n) = 0.01 for the variance; 5 of them allowed.
    expect(Math.abs(mean)).toBeLessThan(0.035);
    expect(Math.abs(variance - 1)).toBeLessThan(0.05);
  });
});

describe('synthesizeRecord', () => {
  const options = { seed: 11, dtS: 0.02, durationS: 10, pgaG: 0.25 };

  it('is the same bit for bit for the same seed, with n = duration/dt + 1 samples', () => {
    const one = synthesizeRecord(options);
    const two = synthesizeRecord(options);
    expect(one.accelMS2).toEqual(two.accelMS2);
    expect(one.accelMS2).toHaveLength(501);
    expect(synthesizeRecord({ ...options, seed: 12 }).accelMS2).not.toEqual(one.accelMS2);
    expect(one.name).toBe('synthetic-11');
    expect(one.source).toBe('quakesweep synth --seed 11');
  });

  it('is scaled to its PGA exactly and starts at rest under the envelope', () => {
    const record = synthesizeRecord(options);
    expect(record.pgaMS2).toBeCloseTo(0.25 * 9.80665, 12);
    expect(record.accelMS2[0]).toBe(0); // the envelope (t/t1)² is 0 at t = 0
  });

  it('refuses options that make no record, in words', () => {
    expect(() => synthesizeRecord({ seed: 1, dtS: 0 })).toThrow('synth: dtS must be positive, got 0');
    expect(() => synthesizeRecord({ seed: 1, pgaG: Number.NaN })).toThrow(/pgaG must be positive/);
    expect(() => synthesizeRecord({ seed: 1, dtS: 0.1, groundFrequencyHz: 5 })).toThrow(
      /above the Nyquist frequency/,
    );
  });
});
