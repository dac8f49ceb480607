import { describe, expect, it } from 'vitest';
import { asce722MultiPeriodSpectrum, asce722TwoPeriodSpectrum } from '../../src/spectrum/asce722.js';
import { asce716Spectrum } from '../../src/spectrum/design.js';
import { readSpectrumTable } from '../../src/spectrum/design-table.js';

describe('ASCE/SEI 7-22 §11.4.5.2 two-period design spectrum', () => {
  // Hand calculation from the shape of Figure 11.4-1 with S_DS = 1.2 g, S_D1 = 0.48 g, T_L = 6 s:
  // T0 = 0.2 · 0.48 / 1.2 = 0.08 s, TS = 0.48 / 1.2 = 0.4 s.
  const spectrum = asce722TwoPeriodSpectrum({ sdsG: 1.2, sd1G: 0.48, tlS: 6 });

  it('is the 7-22 code, two-period form, 5% damping, with T0 and TS', () => {
    expect(spectrum.code).toBe('asce7-22');
    expect(spectrum.parameters.form).toBe('two-period');
    expect(spectrum.parameters.t0_s).toBeCloseTo(0.08, 12); // 0.2 S_D1/S_DS
    expect(spectrum.parameters.ts_s).toBeCloseTo(0.4, 12); // S_D1/S_DS
    expect(spectrum.damping).toBe(0.05); // §11.4.5: 5% damped
    expect(spectrum.description).toMatch(/^ASCE\/SEI 7-22 §11\.4\.5\.2 two-period/);
  });

  it.each([
    [0, 0.48], // T < T0: S_DS (0.4 + 0.6 T/T0) = 1.2 · 0.4 at T = 0
    [0.04, 0.84], // T < T0: 1.2 (0.4 + 0.6 · 0.04/0.08) = 1.2 · 0.7
    [0.08, 1.2], // T0: S_DS
    [0.2, 1.2], // T0 ≤ T ≤ TS: S_DS
    [0.4, 1.2], // TS: S_DS = S_D1/TS
    [1, 0.48], // TS < T ≤ TL: S_D1/T = 0.48/1
    [3, 0.16], // S_D1/T = 0.48/3
    [6, 0.08], // TL: 0.48/6
    [12, 0.02], // T > TL: S_D1 TL/T² = 0.48 · 6/144
  ])('S_a(%f s) = %f g (hand calculation, §11.4.5.2)', (periodS, expected) => {
    expect(spectrum.psaG(periodS)).toBeCloseTo(expected, 12);
  });

  it('equals the ASCE 7-16 §11.4.6 spectrum at the same parameters (the shape is unchanged, from memory)', () => {
    for (const parameters of [
      { sdsG: 1.2, sd1G: 0.48, tlS: 6 },
      { sdsG: 1.0, sd1G: 0.6, tlS: 8 },
      { sdsG: 0.3, sd1G: 0.25, tlS: 4 },
    ]) {
      const old = asce716Spectrum(parameters);
      const current = asce722TwoPeriodSpectrum(parameters);
      for (const t of [0, 0.01, 0.05, 0.1, 0.17, 0.3, 0.6, 0.9, 1, 2.5, 4, 6, 8, 9, 15, 30]) {
        expect(current.psaG(t)).toBe(old.psaG(t));
      }
    }
  });

  it('refuses parameters that do not describe a spectrum, naming the edition', () => {
    expect(() => asce722TwoPeriodSpectrum({ sdsG: 0, sd1G: 0.6, tlS: 8 })).toThrow(/S_DS/);
    expect(() => asce722TwoPeriodSpectrum({ sdsG: 0.2, sd1G: 1, tlS: 4 })).toThrow(/^ASCE 7-22: T_L/); // TS = 5 s
    expect(() => spectrum.psaG(-1)).toThrow('T = -1 s is outside the asce7-22 spectrum, defined from 0 s');
  });
});

describe('ASCE/SEI 7-22 §11.4.5.1 multi-period design spectrum (the site’s table)', () => {
  // An invented site table, not from any hazard data.
  const TEXT = `# invented
period_s,sa_g
0,0.4
0.1,0.8
0.2,1.0
1,0.8
4,0.2
10,0.05
`;
  const spectrum = asce722MultiPeriodSpectrum(readSpectrumTable(TEXT, 'site.csv'), 'site.csv');

  it('is the 7-22 code, multi-period form, from its file, at 5% damping', () => {
    expect(spectrum.code).toBe('asce7-22');
    expect(spectrum.parameters).toEqual({ form: 'multi-period', source: 'site.csv', rows: 6 });
    expect(spectrum.damping).toBe(0.05); // §11.4.5.1: 5% damped
    expect(Array.from(spectrum.tabulatedPeriodsS ?? [])).toEqual([0, 0.1, 0.2, 1, 4, 10]);
    expect(spectrum.description).toMatch(/^ASCE\/SEI 7-22 §11\.4\.5\.1 multi-period/);
  });

  it('gives its own rows at their periods', () => {
    expect(spectrum.psaG(0.2)).toBe(1.0);
    expect(spectrum.psaG(4)).toBe(0.2);
    expect(spectrum.psaG(10)).toBe(0.05);
  });

  it('interpolates log–log between rows (hand calculation)', () => {
    // Between (1 s, 0.8 g) and (4 s, 0.2 g), T = 2 s is halfway in log T (ln 2 / ln 4 = 1/2), so
    // ln S_a = (ln 0.8 + ln 0.2)/2: S_a = √(0.8 · 0.2) = √0.16 = 0.4 g (linear in T would give 0.6667 g).
    expect(spectrum.psaG(2)).toBeCloseTo(0.4, 12);
    // T = 1.5 s: fraction ln 1.5 / ln 4 = 0.292481; S_a = 0.8 · (0.2/0.8)^0.292481 = 0.8 · 0.25^0.292481
    // = 0.8 · 0.666667 = 0.533333 g (0.25^(log₄ 1.5) = 1/1.5 exactly).
    expect(spectrum.psaG(1.5)).toBeCloseTo(0.8 / 1.5, 12);
  });

  it('is linear in T between the T = 0 row and the next (the table rule, common practice)', () => {
    expect(spectrum.psaG(0.05)).toBeCloseTo(0.6, 12); // (0.4 + 0.8)/2
  });

  it('is refused outside its range with one line naming the file and the range', () => {
    expect(() => spectrum.psaG(12)).toThrow(
      'T = 12 s is outside the asce7-22 multi-period spectrum of site.csv, defined from 0 s to 10 s',
    );
    const late = asce722MultiPeriodSpectrum(readSpectrumTable('0.1,0.8\n3,0.2\n', 'late.csv'), 'late.csv');
    expect(() => late.psaG(0.05)).toThrow(
      'outside the asce7-22 multi-period spectrum of late.csv, defined from 0.1 s to 3 s',
    );
    expect(() => late.psaG(Number.NaN)).toThrow(/outside/);
  });
});
