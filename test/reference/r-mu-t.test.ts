import { describe, expect, it } from 'vitest';
import { STANDARD_GRAVITY_MS2 } from '../../src/base/units.js';
import {
  cornerPeriodFromSpectrum,
  nassarKrawinklerCoefficients,
  nassarKrawinklerReduction,
  newmarkHallCorners,
  newmarkHallReduction,
} from '../../src/inelastic/r-mu-t.js';

describe('Newmark–Hall R_μ (Newmark and Hall 1982; Chopra, Dynamics of Structures, §7.11, from memory)', () => {
  const tcS = 0.5;
  it('is 1 below T_a = 1/33 s: no reduction for a rigid system', () => {
    expect(newmarkHallReduction(0.02, 4, tcS)).toBe(1);
    expect(newmarkHallReduction(1 / 33, 8, tcS)).toBe(1);
  });
  it('is √(2μ − 1) on the equal-energy plateau T_b ≤ T ≤ T_c′ (closed form: equal energy)', () => {
    // T_c' = 0.5·√7/4 = 0.33072 s (hand arithmetic).
    expect(newmarkHallCorners(4, tcS).tcPrimeS).toBeCloseTo(0.33072, 5);
    for (const t of [0.125, 0.2, 0.33]) expect(newmarkHallReduction(t, 4, tcS)).toBeCloseTo(Math.sqrt(7), 12);
  });
  it('is μ·T/T_c between T_c′ and T_c and μ beyond T_c (closed form: equal displacement)', () => {
    expect(newmarkHallReduction(0.4, 4, tcS)).toBeCloseTo((4 * 0.4) / 0.5, 12);
    for (const t of [0.5, 1, 10]) expect(newmarkHallReduction(t, 4, tcS)).toBeCloseTo(4, 12);
  });
  it('rises log–log from T_a to T_b: (2μ − 1)^(1/4) at √(T_a·T_b) (hand arithmetic: 7^0.25 = 1.62658)', () => {
    expect(newmarkHallReduction(Math.sqrt(0.125 / 33), 4, tcS)).toBeCloseTo(1.62658, 5);
  });
  it('is 1 everywhere for μ = 1 (closed form: an elastic system is not reduced)', () => {
    for (const t of [0.01, 0.1, 0.3, 3]) expect(newmarkHallReduction(t, 1, tcS)).toBeCloseTo(1, 12);
  });
  it('stays continuous where T_c′ < T_b (μ = 8, T_c = 0.2 s): √15 at T_b, 8 at T_c', () => {
    expect(newmarkHallReduction(0.125, 8, 0.2)).toBeCloseTo(Math.sqrt(15), 12);
    expect(newmarkHallReduction(0.125 * 1.000001, 8, 0.2)).toBeCloseTo(Math.sqrt(15), 4);
    expect(newmarkHallReduction(0.2, 8, 0.2)).toBeCloseTo(8, 12);
  });
  it('refuses T_c at or below T_b and ductilities below 1', () => {
    expect(() => newmarkHallReduction(1, 2, 0.1)).toThrow(/T_b/);
    expect(() => newmarkHallReduction(1, 0.5, 0.5)).toThrow(/≥ 1/);
  });
});

describe('Nassar–Krawinkler R_μ (Nassar and Krawinkler 1991, Blume Center report 95; a, b from memory)', () => {
  it('takes (a, b) = (1, 0.42), (1, 0.37), (0.8, 0.29) at α = 0, 0.02, 0.10, linear between, clamped above', () => {
    expect(nassarKrawinklerCoefficients(0)).toEqual({ a: 1, b: 0.42, clamped: false });
    const mid = nassarKrawinklerCoefficients(0.01);
    expect(mid.a).toBeCloseTo(1, 12);
    expect(mid.b).toBeCloseTo(0.395, 12);
    const upper = nassarKrawinklerCoefficients(0.06);
    expect(upper.a).toBeCloseTo(0.9, 12);
    expect(upper.b).toBeCloseTo(0.33, 12);
    expect(nassarKrawinklerCoefficients(0.2)).toEqual({ a: 0.8, b: 0.29, clamped: true });
  });
  it('at T = 1 s, α = 0, μ = 4: c = 0.92, R = 3.76^(1/0.92) = 4.2189 (hand arithmetic)', () => {
    expect(nassarKrawinklerReduction(1, 4, 0)).toBeCloseTo(4.2189, 4);
  });
  it('at T = 0.5 s, α = 0.06 (a = 0.9, b = 0.33), μ = 2: R = 1.99657 (hand arithmetic)', () => {
    expect(nassarKrawinklerReduction(0.5, 2, 0.06)).toBeCloseTo(1.99657, 5);
  });
  it('tends to μ at long periods (c → 1: equal displacement) and to 1 at T → 0 (c → ∞)', () => {
    expect(nassarKrawinklerReduction(100, 6, 0)).toBeCloseTo(6.033, 3);
    expect(nassarKrawinklerReduction(1e5, 6, 0)).toBeCloseTo(6, 3);
    expect(nassarKrawinklerReduction(1e-4, 8, 0)).toBeCloseTo(1, 2);
    expect(nassarKrawinklerReduction(0, 8, 0.02)).toBe(1);
  });
  it('is 1 for μ = 1 at every period (closed form)', () => {
    for (const t of [0.01, 0.3, 3]) expect(nassarKrawinklerReduction(t, 1, 0.02)).toBeCloseTo(1, 12);
  });
});

describe('T_c from an elastic spectrum (common practice: 2π·PSV_max/PSA_max)', () => {
  // A spectrum flat at PSA = 1 g below the corner and flat at PSV = 1 m/s above: T_c = 2π·1/g.
  const periodsS = [0, 0.05, 0.1, 0.2, 0.4, 0.6, 0.8, 1, 2, 4];
  const sdM = periodsS.map((t) => {
    const omega = (2 * Math.PI) / t;
    return t === 0 ? 0 : Math.min(STANDARD_GRAVITY_MS2 / omega ** 2, 1 / omega);
  });
  it('is 2π·V/A = 0.6407 s for the two flat regions (closed form)', () => {
    expect(cornerPeriodFromSpectrum(periodsS, sdM)).toBeCloseTo((2 * Math.PI) / STANDARD_GRAVITY_MS2, 12);
  });
});
