import { describe, expect, it } from 'vitest';
import { readSpectrumTable, tableSpectrum } from '../../src/spectrum/design-table.js';

const TEXT = `# an invented site spectrum
period_s,psa_g
0, 0.4
0.2, 1.0
1.0, 0.5
10, 0.05
`;

describe('tabulated spectrum', () => {
  const spectrum = tableSpectrum(readSpectrumTable(TEXT, 'site.csv'), 'site.csv');

  it('round-trips: the table read back gives its own rows', () => {
    const table = readSpectrumTable(TEXT, 'site.csv');
    expect(Array.from(table.periodsS)).toEqual([0, 0.2, 1.0, 10]);
    expect(Array.from(table.psaG)).toEqual([0.4, 1.0, 0.5, 0.05]);
    for (let i = 0; i < table.periodsS.length; i++)
      expect(spectrum.psaG(table.periodsS[i])).toBe(table.psaG[i]);
  });

  it('reads the CSV of `quakesweep design` back, passing over its frequency_hz column (empty at T = 0)', () => {
    const csv = '# caution\nperiod_s,frequency_hz,psa_g\n0,,0.4\n0.2,5,1\n1,1,0.5\n';
    const table = readSpectrumTable(csv, 'design.csv');
    expect(Array.from(table.periodsS)).toEqual([0, 0.2, 1]);
    expect(Array.from(table.psaG)).toEqual([0.4, 1, 0.5]);
    expect(() => readSpectrumTable(`${csv}2,0.5\n`, 'design.csv')).toThrow(
      'expected 2 columns (period in s, PSA in g), found 1',
    );
  });

  it('interpolates in log–log between rows (closed form: geometric means at the log midpoint)', () => {
    // Between (1, 0.5) and (10, 0.05): at T = √10, PSA = √(0.5 · 0.05).
    expect(spectrum.psaG(Math.sqrt(10))).toBeCloseTo(Math.sqrt(0.5 * 0.05), 12);
    // A power law PSA = 0.5 T⁻¹ is reproduced exactly by log–log interpolation.
    expect(spectrum.psaG(3)).toBeCloseTo(0.5 / 3, 12);
  });

  it('interpolates linearly in T between a T = 0 row and the next', () => {
    expect(spectrum.psaG(0.1)).toBeCloseTo(0.7, 12); // (0.4 + 1.0)/2
  });

  it('does not extrapolate', () => {
    expect(() => spectrum.psaG(10.5)).toThrow(/outside the table site.csv/);
    const positive = tableSpectrum(readSpectrumTable('0.1 1\n1 0.5\n', 'b.txt'), 'b.txt');
    expect(() => positive.psaG(0.05)).toThrow(/outside/);
    expect(() => positive.psaG(0)).toThrow(/outside/);
  });

  it('names the file and line of a bad row', () => {
    expect(() => readSpectrumTable('0.1,1\n0.1,2\n', 'x.csv')).toThrow(/increase/);
    try {
      readSpectrumTable('T,PSA\n0.1,1\n0.5,abc\n', 'x.csv');
      expect.unreachable();
    } catch (error) {
      expect((error as { describe(): string }).describe()).toMatch(/^x\.csv:3: 'abc' is not a number/);
    }
    expect(() => readSpectrumTable('0.1,1\n0.5,0\n', 'x.csv')).toThrow(/positive/);
    expect(() => readSpectrumTable('0.1,1,3\n', 'x.csv')).toThrow(/2 columns/);
    expect(() => readSpectrumTable('0.1,1\n', 'x.csv')).toThrow(/at least 2 rows/);
  });
});
