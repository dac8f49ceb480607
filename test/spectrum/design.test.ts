import { describe, expect, it } from 'vitest';
import { asce716Spectrum, designPsaG, ec8DampingCorrection, ec8Spectrum } from '../../src/spectrum/design.js';

describe('ASCE/SEI 7-16 §11.4.6 design spectrum', () => {
  // Hand calculation from Eqs. 11.4-5 to 11.4-7 with S_DS = 1.0 g, S_D1 = 0.6 g, T_L = 8 s:
  // T0 = 0.2 · 0.6 / 1.0 = 0.12 s, TS = 0.6 / 1.0 = 0.6 s.
  const spectrum = asce716Spectrum({ sdsG: 1.0, sd1G: 0.6, tlS: 8 });

  it('states T0 and TS', () => {
    expect(spectrum.parameters.t0_s).toBeCloseTo(0.12, 12); // 0.2 S_D1/S_DS
    expect(spectrum.parameters.ts_s).toBeCloseTo(0.6, 12); // S_D1/S_DS
    expect(spectrum.damping).toBe(0.05); // §11.4.6: 5% damped
  });

  it.each([
    [0, 0.4], // Eq. 11.4-5 at T = 0: 0.4 S_DS
    [0.06, 0.7], // Eq. 11.4-5: 1.0 (0.4 + 0.6 · 0.06/0.12)
    [0.12, 1.0], // T0: S_DS
    [0.3, 1.0], // plateau
    [0.6, 1.0], // TS: S_DS = S_D1/TS
    [1.0, 0.6], // Eq. 11.4-6: 0.6/1
    [4.0, 0.15], // Eq. 11.4-6: 0.6/4
    [8.0, 0.075], // TL: 0.6/8 = 0.6 · 8/64
    [10.0, 0.048], // Eq. 11.4-7: 0.6 · 8/100
  ])('S_a(%f s) = %f g (hand calculation)', (periodS, expected) => {
    expect(spectrum.psaG(periodS)).toBeCloseTo(expected, 12);
  });

  it('a second parameter set (hand calculation: S_DS 0.8, S_D1 0.4, T_L 6 → T0 0.1 s, TS 0.5 s)', () => {
    const s = asce716Spectrum({ sdsG: 0.8, sd1G: 0.4, tlS: 6 });
    expect(s.psaG(0.05)).toBeCloseTo(0.8 * (0.4 + 0.6 * 0.5), 12);
    expect(s.psaG(0.1)).toBeCloseTo(0.8, 12);
    expect(s.psaG(0.5)).toBeCloseTo(0.8, 12);
    expect(s.psaG(2)).toBeCloseTo(0.2, 12);
    expect(s.psaG(12)).toBeCloseTo((0.4 * 6) / 144, 12);
  });

  it('is continuous at T0, TS and TL (the branches meet; closed form)', () => {
    for (const t of [0.12, 0.6, 8]) {
      expect(spectrum.psaG(t * (1 - 1e-9))).toBeCloseTo(spectrum.psaG(t * (1 + 1e-9)), 6);
    }
  });

  it('refuses parameters that do not describe a spectrum', () => {
    expect(() => asce716Spectrum({ sdsG: 0, sd1G: 0.6, tlS: 8 })).toThrow(/S_DS/);
    expect(() => asce716Spectrum({ sdsG: 1, sd1G: -1, tlS: 8 })).toThrow(/S_D1/);
    expect(() => asce716Spectrum({ sdsG: 0.2, sd1G: 1, tlS: 4 })).toThrow(/T_L/); // TS = 5 s > TL
    expect(() => spectrum.psaG(-1)).toThrow(/outside/);
  });
});

describe('Eurocode 8 horizontal elastic spectrum (EN 1998-1 §3.2.2.2)', () => {
  // EN 1998-1:2004, recommended values. Table 3.2 (Type 1) and Table 3.3 (Type 2): S, T_B, T_C, T_D.
  const TABLE_3_2 = {
    A: [1.0, 0.15, 0.4, 2.0],
    B: [1.2, 0.15, 0.5, 2.0],
    C: [1.15, 0.2, 0.6, 2.0],
    D: [1.35, 0.2, 0.8, 2.0],
    E: [1.4, 0.15, 0.5, 2.0],
  } as const;
  const TABLE_3_3 = {
    A: [1.0, 0.05, 0.25, 1.2],
    B: [1.35, 0.05, 0.25, 1.2],
    C: [1.5, 0.1, 0.25, 1.2],
    D: [1.8, 0.1, 0.3, 1.2],
    E: [1.6, 0.05, 0.25, 1.2],
  } as const;
  const agG = 0.25;
  const cases = [
    ...Object.entries(TABLE_3_2).map(([ground, row]) => [1, ground, row] as const),
    ...Object.entries(TABLE_3_3).map(([ground, row]) => [2, ground, row] as const),
  ];

  it.each(cases)('Type %i, ground %s: Eqs. 3.2–3.5 at 0, T_B, T_C, T_D and 4 s', (type, ground, row) => {
    const [s, tb, tc, td] = row;
    const spectrum = ec8Spectrum({ type, ground: ground as 'A', agG });
    const plateau = 2.5 * agG * s; // η = 1 at 5%
    expect(spectrum.psaG(0)).toBeCloseTo(agG * s, 12); // Eq. 3.2 at T = 0: a_g S
    expect(spectrum.psaG(tb / 2)).toBeCloseTo(agG * s * (1 + 0.5 * (2.5 - 1)), 12); // Eq. 3.2
    expect(spectrum.psaG(tb)).toBeCloseTo(plateau, 12); // Eq. 3.2 = 3.3 at T_B
    expect(spectrum.psaG(tc)).toBeCloseTo(plateau, 12); // Eq. 3.3 at T_C
    expect(spectrum.psaG(td)).toBeCloseTo((plateau * tc) / td, 12); // Eq. 3.4 at T_D
    expect(spectrum.psaG(4)).toBeCloseTo((plateau * tc * td) / 16, 12); // Eq. 3.5 at 4 s
    expect(() => spectrum.psaG(4.5)).toThrow(/outside/);
  });

  it.each([
    [0.02, Math.sqrt(10 / 7)], // Eq. 3.6 at ξ = 2%: √(10/7) = 1.1952
    [0.05, 1], // 5%: 1
    [0.1, Math.sqrt(10 / 15)], // 10%: 0.8165
    [0.2, Math.sqrt(10 / 25)], // 20%: 0.6325
    [0.3, 0.55], // 30%: √(10/35) = 0.5345 < 0.55, so the floor of Eq. 3.6
  ])('η at ξ = %f is %f (Eq. 3.6)', (damping, expected) => {
    expect(ec8DampingCorrection(damping)).toBeCloseTo(expected, 12);
  });

  it('scales the plateau by η (Eq. 3.3)', () => {
    const spectrum = ec8Spectrum({ type: 1, ground: 'C', agG, damping: 0.1 });
    expect(spectrum.psaG(0.4)).toBeCloseTo(2.5 * agG * 1.15 * Math.sqrt(10 / 15), 12);
    expect(spectrum.psaG(0)).toBeCloseTo(agG * 1.15, 12); // η does not touch T = 0
  });

  it('refuses ground types without a table and bad types', () => {
    expect(() => ec8Spectrum({ type: 1, ground: 'S1' as 'A', agG })).toThrow(/special studies/);
    expect(() => ec8Spectrum({ type: 3 as 1, ground: 'A', agG })).toThrow(/type/);
    expect(() => ec8Spectrum({ type: 1, ground: 'A', agG: 0 })).toThrow(/a_g/);
  });

  it('evaluates a grid', () => {
    const spectrum = ec8Spectrum({ type: 2, ground: 'A', agG: 0.1 });
    expect(Array.from(designPsaG(spectrum, [0, 0.1]))).toEqual([spectrum.psaG(0), spectrum.psaG(0.1)]);
  });
});
