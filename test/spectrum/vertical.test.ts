import { describe, expect, it } from 'vitest';
import { QuakesweepError } from '../../src/base/errors.js';
import { designPsaG } from '../../src/spectrum/design.js';
import { verticalCoefficient, verticalSiteClass, verticalSpectrum } from '../../src/spectrum/vertical.js';

// Source: ASCE/SEI 7-16 §11.9.2 and Table 11.9-1 (from memory), the same taken for 7-22 §11.9
// (from memory, 7-22's BC, CD and DE read the columns of B, C and D). S_av = 2/3 S_aMv, written
// with S_DS = 2/3 S_MS. Every expected value is a hand calculation written out beside it.

describe('verticalCoefficient (Table 11.9-1, from memory)', () => {
  it.each([
    // the table's own rows: S_S, A/B, C, D
    [0.2, 0.7, 0.7, 0.7],
    [0.3, 0.8, 0.8, 0.9],
    [0.6, 0.9, 1.0, 1.1],
    [1.0, 0.9, 1.1, 1.3],
    [2.0, 0.9, 1.3, 1.5],
    // beyond the end rows the end values hold (S_S ≤ 0.2, S_S ≥ 2.0)
    [0.05, 0.7, 0.7, 0.7],
    [3.0, 0.9, 1.3, 1.5],
  ])('S_S = %f g: B %f, C %f, D %f', (ss, b, c, d) => {
    expect(verticalCoefficient('asce7-16', ss, 'B')).toBeCloseTo(b, 12);
    expect(verticalCoefficient('asce7-16', ss, 'C')).toBeCloseTo(c, 12);
    expect(verticalCoefficient('asce7-16', ss, 'D')).toBeCloseTo(d, 12);
  });

  it('interpolates linearly in S_S (hand calculations)', () => {
    // C at 1.8: 1.1 + (1.8 − 1.0)/(2.0 − 1.0)·(1.3 − 1.1) = 1.26
    expect(verticalCoefficient('asce7-16', 1.8, 'C')).toBeCloseTo(1.26, 12);
    // A at 0.45: 0.8 + (0.15/0.3)·0.1 = 0.85
    expect(verticalCoefficient('asce7-16', 0.45, 'A')).toBeCloseTo(0.85, 12);
    // D at 0.8: 1.1 + (0.2/0.4)·0.2 = 1.2
    expect(verticalCoefficient('asce7-16', 0.8, 'D')).toBeCloseTo(1.2, 12);
    // E at 0.25: 0.7 + (0.05/0.1)·0.2 = 0.8 (E and F read D's column)
    expect(verticalCoefficient('asce7-16', 0.25, 'E')).toBeCloseTo(0.8, 12);
    expect(verticalCoefficient('asce7-16', 0.25, 'F')).toBeCloseTo(0.8, 12);
  });

  it('7-22 classes: BC reads B, CD reads C, DE reads D (from memory); 7-16 refuses them', () => {
    expect(verticalCoefficient('asce7-22', 1.8, 'CD')).toBeCloseTo(1.26, 12);
    expect(verticalCoefficient('asce7-22', 1.0, 'BC')).toBeCloseTo(0.9, 12);
    expect(verticalCoefficient('asce7-22', 1.0, 'de')).toBeCloseTo(1.3, 12);
    expect(() => verticalSiteClass('asce7-16', 'CD')).toThrow(
      /'CD' is not one of asce7-16: A, B, C, D, E, F/,
    );
    expect(() => verticalCoefficient('asce7-16', 1, 'G')).toThrow(QuakesweepError);
  });
});

describe('verticalSpectrum (§11.9.2)', () => {
  // S_DS = 1.0 g, S_S = 1.0 g, site class D → C_v = 1.3: 0.3 C_v S_DS = 0.39, 0.8 C_v S_DS = 1.04.
  const spectrum = verticalSpectrum({ edition: 'asce7-16', sdsG: 1.0, ssG: 1.0, siteClass: 'D' });

  it.each([
    [0, 0.39], // T_v ≤ 0.025: 0.3 C_v S_DS
    [0.02, 0.39],
    [0.025, 0.39],
    [0.03, 0.52], // 20·1.3·1.0·(0.03 − 0.025) + 0.39 = 0.13 + 0.39
    [0.04, 0.78], // 20·1.3·0.015 + 0.39 = 0.39 + 0.39
    [0.05, 1.04], // 20·1.3·0.025 + 0.39 = 0.65 + 0.39 = 0.8 C_v S_DS
    [0.1, 1.04], // 0.05 < T_v ≤ 0.15: 0.8 C_v S_DS
    [0.15, 1.04],
    [0.3, 0.618387699801415], // 1.04·(0.15/0.3)^0.75 = 1.04·0.5946036
    [1.0, 0.2506696667107313], // 1.04·0.15^0.75 = 1.04·0.2410285
    [2.0, 0.14904907558388122], // 1.04·0.075^0.75 = 1.04·0.1433164
  ])('S_av(%f s) = %f g (hand calculation)', (periodS, expected) => {
    expect(spectrum.psaG(periodS)).toBeCloseTo(expected, 12);
  });

  it('is continuous at 0.025, 0.05 and 0.15 s (the branches meet; closed form)', () => {
    for (const t of [0.025, 0.05, 0.15]) {
      expect(spectrum.psaG(t * (1 - 1e-9))).toBeCloseTo(spectrum.psaG(t * (1 + 1e-9)), 6);
    }
  });

  it('is not defined beyond 2.0 s: refused like any period outside a design spectrum', () => {
    expect(() => spectrum.psaG(2.01)).toThrow(
      /outside the asce7-16 vertical spectrum, defined from 0 s to 2 s/,
    );
    expect(() => designPsaG(spectrum, [0.1, 3])).toThrow(QuakesweepError);
  });

  it('is a DesignSpectrum of its edition, vertical, naming §11.9, 5% damping', () => {
    const s22 = verticalSpectrum({ edition: 'asce7-22', sdsG: 1.2, ssG: 1.8, siteClass: 'CD' });
    expect(s22.code).toBe('asce7-22');
    expect(s22.vertical).toBe(true);
    expect(s22.description).toMatch(/ASCE\/SEI 7-22 §11\.9 design vertical spectrum/);
    expect(s22.parameters).toMatchObject({ direction: 'vertical', site_class: 'CD' });
    expect(s22.damping).toBe(0.05);
    // 0.04 s: 20·1.26·1.2·0.015 + 0.3·1.26·1.2 = 0.4536 + 0.4536 = 0.9072
    expect(s22.psaG(0.04)).toBeCloseTo(0.9072, 12);
  });

  it('refuses S_DS ≤ 0 and S_S < 0', () => {
    expect(() => verticalSpectrum({ edition: 'asce7-16', sdsG: 0, ssG: 1, siteClass: 'D' })).toThrow(/S_DS/);
    expect(() => verticalSpectrum({ edition: 'asce7-16', sdsG: 1, ssG: -1, siteClass: 'D' })).toThrow(/S_S/);
  });
});
