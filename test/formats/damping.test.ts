import { describe, expect, it } from 'vitest';
import { dampingTable, dampingToCsv, dampingToJson } from '../../src/formats/damping.js';
import { formatJson } from '../../src/formats/spectrum-json.js';
import { compareDamping } from '../../src/spectrum/damping.js';
import { responseSpectrum } from '../../src/spectrum/spectrum.js';
import { block, decayingSine, expectAligned, expectCaution, readCsv } from '../helpers/outputs.js';

const G = 9.80665; // standard gravity, m/s² (CGPM 1901)
const spectrum = responseSpectrum(decayingSine(), {
  periodsS: [0, 0.2, 0.5, 1],
  dampings: [0.02, 0.05, 0.1],
});
const comparison = compareDamping(spectrum);
// A comparison with one undefined ratio (as where the reference PSA is 0).
const undefinedRatio = {
  ...comparison,
  curves: comparison.curves.map((curve) => ({ ...curve, ratio: Float64Array.of(1, Number.NaN, 1, 1) })),
};
// Newmark and Hall (1982) acceleration factor 3.21 − 0.68 ln ξ (ξ in %), from memory: at 2% over at 5%.
const nhAcceleration2 = (3.21 - 0.68 * Math.log(2)) / (3.21 - 0.68 * Math.log(5));
// EN 1998-1 Eq. 3.6: η = √(10/(5 + ξ)), so η(10%)/η(5%) = √(10/15).
const ec8Eta10 = Math.sqrt(10 / 15);

describe('dampingToJson', () => {
  it('has the contract keys, PSA in g, ratios to the 5% curve, and the published factors', () => {
    const json = dampingToJson(spectrum, comparison, false);
    expect(Object.keys(json)).toEqual([
      'caution',
      'record',
      'method',
      'method_description',
      'reference_damping',
      'reference_added',
      'published_sources',
      'periods_s',
      'frequencies_hz',
      'spectra',
    ]);
    expect(json.reference_damping).toBe(0.05);
    const [two, five, ten] = json.spectra;
    expect(five.ratio_to_reference).toEqual([1, 1, 1, 1]);
    expect(two.psa_g[2]).toBe(spectrum.curves[0].psaMS2[2] / G);
    expect(two.published.newmark_hall_1982_ratio.acceleration).toBeCloseTo(nhAcceleration2, 12);
    expect(ten.published.ec8_eta_ratio).toBeCloseTo(ec8Eta10, 12);
    expect(Object.keys(two.published.newmark_hall_1982_ratio)).toEqual([
      'acceleration',
      'velocity',
      'displacement',
    ]);
  });

  it('writes an undefined ratio as null, which the finite check lets through', () => {
    const json = dampingToJson(spectrum, undefinedRatio, true);
    expect(json.spectra[0].ratio_to_reference).toEqual([1, null, 1, 1]);
    expect(json.reference_added).toBe(true);
    expect(() => formatJson(json)).not.toThrow();
    const broken = { ...json, spectra: [{ ...json.spectra[0], psa_g: [0.1, Number.NaN] }] };
    expect(() => formatJson(broken)).toThrow(/\(spectra\[0\]\.psa_g\[1\] = NaN\)/);
  });
});

describe('dampingToCsv', () => {
  it('reads back to every PSA then every ratio, one column a damping, empty where undefined', () => {
    const csv = readCsv(dampingToCsv(spectrum, undefinedRatio));
    expect(csv.header).toEqual([
      'period_s',
      'frequency_hz',
      'psa_g@2%',
      'psa_g@5%',
      'psa_g@10%',
      'ratio@2%',
      'ratio@5%',
      'ratio@10%',
    ]);
    csv.rows.forEach((row, p) => {
      expect(row[0]).toBe(spectrum.periodsS[p]);
      for (let d = 0; d < 3; d++) expect(row[2 + d]).toBe(spectrum.curves[d].psaMS2[p] / G);
    });
    expect(csv.rows[1].slice(5)).toEqual([null, null, null]);
  });

  it('opens with the caution, the record, the reference damping and the published ratios', () => {
    const text = dampingToCsv(spectrum, comparison);
    expectCaution(text, '# ');
    const { notes } = readCsv(text);
    expect(notes).toContain(`record: test motion (invented); method: ${spectrum.method}`);
    expect(notes).toContain('reference damping: 5%');
    const two = notes.find((note) => note.startsWith('published ratio at 2%:'));
    // Four significant figures on a `#` line (src/base/numbers.ts); the JSON keeps every digit.
    expect(Number(two?.match(/Newmark-Hall acceleration (\S+)/)?.[1])).toBe(
      Number(nhAcceleration2.toPrecision(4)),
    );
  });
});

describe('dampingTable', () => {
  const text = dampingTable(spectrum, undefinedRatio, true);

  it('opens with the caution and says when 5% was added as the reference', () => {
    expectCaution(text, '! ');
    expect(text).toContain('ratios  PSA(ξ)/PSA(5%) (5% added as the reference)');
  });

  it('gives the published ratios per damping to three decimals, aligned', () => {
    const [heading, ...rows] = block(text, '      ξ');
    expectAligned(heading, rows);
    expect(rows.map((row) => row.trim().split(/ +/)[0])).toEqual(['2%', '5%', '10%']);
    expect(rows[0].trim().split(/ +/)[3]).toBe(nhAcceleration2.toFixed(3));
    expect(rows[2].trim().split(/ +/)[2]).toBe(ec8Eta10.toFixed(3));
  });

  it('gives PSA and ratio per period, aligned, "-" for an undefined ratio', () => {
    const [heading, ...rows] = block(text, '   T (s)');
    expect(heading.trim().split(/ {2,}/)).toEqual([
      'T (s)',
      'PSA g @2%',
      'ratio @2%',
      'PSA g @5%',
      'ratio @5%',
      'PSA g @10%',
      'ratio @10%',
    ]);
    expectAligned(heading, rows);
    expect(rows[1].trim().split(/ +/)[2]).toBe('-');
    expect(rows[0].trim().split(/ +/)[2]).toBe('1.000');
  });
});
