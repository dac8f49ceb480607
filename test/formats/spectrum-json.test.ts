import { describe, expect, it } from 'vitest';
import { CAUTION } from '../../src/base/caution.js';
import { spectrumToCsv } from '../../src/formats/spectrum-csv.js';
import { formatJson, spectrumToJson } from '../../src/formats/spectrum-json.js';
import { createRecord } from '../../src/record/record.js';
import { responseSpectrum } from '../../src/spectrum/spectrum.js';

// An invented record: 2 s of a 2 Hz sine of 0.2 g amplitude, sampled at 0.01 s.
const record = createRecord({
  name: 'invented',
  dtS: 0.01,
  accelMS2: Float64Array.from(
    { length: 201 },
    (_, i) => 0.2 * 9.80665 * Math.sin(2 * Math.PI * 2 * i * 0.01),
  ),
});
const spectrum = responseSpectrum(record, { periodsS: [0, 0.5], dampings: [0.05, 0.1] });

describe('spectrumToJson', () => {
  it('echoes a PGA read in g as it was given, not 0.42·g/g (0.41999999999999993)', () => {
    // Invented: a record read in g whose peak is 0.42 g, stored as 0.42 × 9.80665 m/s².
    const peaked = createRecord({
      name: 'invented',
      dtS: 0.01,
      accelMS2: Float64Array.of(0, 0.42 * 9.80665, 0),
    });
    const json = spectrumToJson(responseSpectrum(peaked, { periodsS: [0], dampings: [0.05] }));
    expect(json.record.pga_g).toBe(0.42);
    // PSA and SA at T = 0 are the PGA, and are written as it is (JSON and CSV alike).
    expect(json.spectra[0].psa_g[0]).toBe(0.42);
    expect(json.spectra[0].sa_g[0]).toBe(0.42);
    const csv = spectrumToCsv(responseSpectrum(peaked, { periodsS: [0, 1], dampings: [0.05] }));
    expect(csv).toMatch(/^0,,0,0,0\.42,0,0\.42$/m);
  });

  it('writes the contract: caution, record in g, method, periods and a curve per damping', () => {
    const json = spectrumToJson(spectrum);
    expect(Object.keys(json)).toEqual([
      'caution',
      'record',
      'method',
      'method_description',
      'periods_s',
      'frequencies_hz',
      'spectra',
    ]);
    expect(json.caution).toBe(CAUTION);
    expect(json.record).toMatchObject({ name: 'invented', source: 'invented', npts: 201, dt_s: 0.01 });
    // The sine peaks at 0.2 g between samples; the samples at 2 Hz and 100 Hz hit the crest at i = 12.5 ± 50k,
    // so the largest sample is 0.2·sin(2π·0.24) = 0.2·cos(0.02π) g (closed form).
    expect(json.record.pga_g).toBeCloseTo(0.2 * Math.cos(0.02 * Math.PI), 12);
    expect(json.periods_s).toEqual([0, 0.5]);
    // f = 1/T beside each period: none at T = 0, 1/0.5 = 2 Hz (by hand).
    expect(json.frequencies_hz).toEqual([null, 2]);
    expect(json.spectra.map((curve) => curve.damping)).toEqual([0.05, 0.1]);
    for (const curve of json.spectra) {
      // PSA in g is PSA in m/s² over standard gravity; at T = 0 it is the PGA (common practice).
      expect(curve.psa_g[1]).toBeCloseTo(
        spectrum.curves[json.spectra.indexOf(curve)].psaMS2[1] / 9.80665,
        14,
      );
      expect(curve.psa_g[0]).toBeCloseTo(json.record.pga_g, 12);
      expect(Array.isArray(curve.sd_m)).toBe(true);
    }
  });
});

describe('formatJson', () => {
  it('writes two-space indented JSON with a closing newline, null kept as null', () => {
    expect(formatJson({ a: null, b: [1, 2] })).toBe('{\n  "a": null,\n  "b": [\n    1,\n    2\n  ]\n}\n');
    expect(JSON.parse(formatJson(spectrumToJson(spectrum)))).toEqual(spectrumToJson(spectrum));
  });

  it('refuses NaN and Infinity instead of writing null', () => {
    expect(() => formatJson({ a: [1, Number.NaN] })).toThrow(/a\[1\] = NaN/);
    expect(() => formatJson({ b: { c: Number.POSITIVE_INFINITY } })).toThrow(/b\.c = Infinity/);
  });

  it('writes DEL and C1 controls of a name as \\u escapes: the same value, nothing a terminal acts on (found by the options fuzz test)', () => {
    const text = formatJson({ source: 'del\u007f c1\u009b31m.txt' });
    expect(text).toBe('{\n  "source": "del\\u007f c1\\u009b31m.txt"\n}\n');
    expect(JSON.parse(text).source).toBe('del\u007f c1\u009b31m.txt');
  });
});
