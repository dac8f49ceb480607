import { describe, expect, it } from 'vitest';
import { CAUTION } from '../../src/base/caution.js';
import { designTable, designToCsv, designToJson } from '../../src/formats/design.js';
import { asce716Spectrum, designPsaG } from '../../src/spectrum/design.js';
import { readSpectrumTable } from '../../src/spectrum/design-table.js';

const spectrum = asce716Spectrum({ sdsG: 1, sd1G: 0.6, tlS: 8 });
const periods = Float64Array.of(0, 0.12, 1, 10);
const psa = designPsaG(spectrum, periods);

describe('design outputs', () => {
  it('JSON: the caution first, the code and its parameters, periods and PSA', () => {
    const json = designToJson(spectrum, periods, psa);
    expect(Object.keys(json)[0]).toBe('caution');
    expect(json.caution).toBe(CAUTION);
    expect(json.code).toBe(spectrum.code);
    expect(json.damping).toBe(0.05); // the ASCE 7-16 spectrum is for 5% damping (§11.4)
    expect(json.periods_s).toEqual([0, 0.12, 1, 10]);
    // f = 1/T: none at T = 0, 1/0.12 = 8.333… Hz, 1 Hz, 0.1 Hz (by hand).
    expect(json.frequencies_hz[0]).toBeNull();
    expect(json.frequencies_hz.slice(1).map((f) => Number(f?.toPrecision(6)))).toEqual([8.33333, 1, 0.1]);
    // ASCE 7-16 §11.4.6 by hand: 0.4 S_DS at 0; S_DS on the plateau; S_D1/T; S_D1·T_L/T².
    const expected = [0.4, 1, 0.6, 0.048];
    for (const [i, value] of json.psa_g.entries()) expect(value).toBeCloseTo(expected[i], 12);
  });

  it('CSV: the caution on # lines, a header and one row per period, readable again as a table', () => {
    const csv = designToCsv(spectrum, periods, psa);
    const lines = csv.trimEnd().split('\n');
    expect(
      lines
        .filter((line) => line.startsWith('# '))
        .map((line) => line.slice(2))
        .join(' '),
    ).toContain(CAUTION);
    expect(lines.filter((line) => !line.startsWith('#'))).toHaveLength(1 + periods.length);
    const back = readSpectrumTable(csv, 'design.csv');
    expect(Array.from(back.periodsS)).toEqual(Array.from(periods));
    expect(Array.from(back.psaG)).toEqual(Array.from(psa));
  });

  it('the terminal table starts with the caution and gives a row per period', () => {
    const lines = designTable(spectrum, periods, psa).trimEnd().split('\n');
    expect(lines[0].startsWith('! Preliminary')).toBe(true);
    expect(lines.at(-1)).toBe(`${'10'.padStart(10)} ${'0.04800'.padStart(12)}`);
    expect(lines.at(-4)).toBe(`${'0'.padStart(10)} ${'0.4000'.padStart(12)}`);
  });
});
