import { describe, expect, it } from 'vitest';
import { rotdTable, rotdToCsv, rotdToJson } from '../../src/formats/rotd.js';
import { formatJson } from '../../src/formats/spectrum-json.js';
import { createRecord } from '../../src/record/record.js';
import { rotDSpectra } from '../../src/spectrum/rotd.js';
import { responseSpectrum } from '../../src/spectrum/spectrum.js';
import { block, decayingSine, expectAligned, expectCaution, readCsv } from '../helpers/outputs.js';

const G = 9.80665; // standard gravity, m/s² (CGPM 1901)
const first = decayingSine('north (invented)');
// A second component at rest, shorter by 100 samples: the first is padded to it.
const still = createRecord({ name: 'east (invented)', dtS: 0.01, accelMS2: new Float64Array(201) });
const grid = { periodsS: [0, 0.2, 0.5, 1], dampings: [0.05] };
const spectra = rotDSpectra(first, still, { ...grid, angleStepDeg: 0.5 });
// With the second component at rest, PSA(θ) = |cos θ|·PSA₁, so RotD100 is PSA₁ (θ = 0) and the
// geometric mean √(PSA₁·0) is 0 (from the definitions, Boore 2010).
const psa1G = Array.from(responseSpectrum(first, grid).curves[0].psaMS2, (v) => v / G);

describe('rotdToJson', () => {
  it('has the keys of the contract, both records, the notes, and RotD in g', () => {
    const json = rotdToJson(spectra);
    expect(Object.keys(json)).toEqual([
      'caution',
      'records',
      'method',
      'method_description',
      'angle_step_deg',
      'padded_samples',
      'notes',
      'periods_s',
      'frequencies_hz',
      'spectra',
    ]);
    expect(json.records.map((r) => r.name)).toEqual(['north (invented)', 'east (invented)']);
    expect(json.angle_step_deg).toBe(0.5);
    expect(json.padded_samples).toBe(100);
    expect(json.notes[0]).toContain('over 360 angles 0 ≤ θ < 180° in steps of 0.5°'); // 180 / 0.5
    expect(json.notes[1]).toContain('padded with 100 zero samples');
    expect(Object.keys(json.spectra[0])).toEqual(['damping', 'rotd50_g', 'rotd100_g', 'geomean_g']);
    for (const [p, value] of json.spectra[0].rotd100_g.entries()) expect(value).toBeCloseTo(psa1G[p], 10);
    expect(json.spectra[0].geomean_g).toEqual([0, 0, 0, 0]);
    expect(formatJson(json).startsWith('{\n  "caution": "Preliminary')).toBe(true);
  });
});

describe('rotdToCsv', () => {
  const text = rotdToCsv(spectra);

  it('reads back to the same numbers under headers naming quantity, unit and damping', () => {
    const csv = readCsv(text);
    expect(csv.header).toEqual(['period_s', 'frequency_hz', 'rotd50_g@5%', 'rotd100_g@5%', 'geomean_g@5%']);
    expect(csv.rows.map((row) => row[0])).toEqual(grid.periodsS);
    const curve = spectra.curves[0];
    csv.rows.forEach((row, p) => {
      expect(row[2]).toBe(curve.rotd50MS2[p] / G);
      expect(row[3]).toBeCloseTo(psa1G[p], 10);
      expect(row[4]).toBe(0);
    });
  });

  it('opens with the caution, each record, the method and the notes', () => {
    expectCaution(text, '# ');
    const { notes } = readCsv(text);
    expect(notes).toContain('record: north (invented); npts 301; dt 0.01 s');
    expect(notes).toContain('record: east (invented); npts 201; dt 0.01 s');
    expect(notes).toContain(`method: ${spectra.method}`);
    expect(notes.some((note) => note.startsWith('PSA(θ) = ω² max|u₁ cos θ + u₂ sin θ|'))).toBe(true);
  });

  it('refuses a RotD that is not finite, naming its column', () => {
    const curve = { ...spectra.curves[0], rotd50MS2: Float64Array.of(1, Number.NaN, 1, 1) };
    expect(() => rotdToCsv({ ...spectra, curves: [curve] })).toThrow(/\(rotd50_g@5% at 0.2 s = NaN\)/);
  });
});

describe('rotdTable', () => {
  it('opens with the caution and both records, then aligned columns of RotD50, RotD100 and geomean', () => {
    const text = rotdTable(spectra);
    expectCaution(text, '! ');
    expect(text).toContain(`record  north (invented) (north (invented)), 301 samples at 0.01 s, PGA`);
    expect(text).toContain('note    the shorter component was padded with 100 zero samples');
    const [heading, ...rows] = block(text, '   T (s)');
    expect(heading.trim().split(/ {2,}/)).toEqual([
      'T (s)',
      'RotD50 g @5%',
      'RotD100 g @5%',
      'geomean g @5%',
    ]);
    expectAligned(heading, rows);
    expect(rows.map((row) => Number(row.trim().split(/ +/)[2]))).toEqual(
      psa1G.map((value) => Number(value.toPrecision(4))),
    );
    expect(text).toContain('(4 periods; --format json or csv for all of them)');
  });
});
