import { describe, expect, it } from 'vitest';
import {
  floorSetAssumptions,
  floorSetTable,
  floorSetToCsv,
  floorSetToJson,
  peakOf,
} from '../../src/formats/floor-set.js';
import { createRecord } from '../../src/record/record.js';
import { floorSpectrumSet } from '../../src/spectrum/floor-set.js';
import { decayingSine, expectCaution, readCsv } from '../helpers/outputs.js';

const G = 9.80665; // standard gravity, m/s² (CGPM 1901)
const grid = { periodsS: [0, 0.1, 0.3, 1], dampings: [0.02, 0.05] };
const building = { periodS: 0.3, damping: 0.05, modalFactor: 1.3 };
const one = decayingSine('east, "yard" (invented)');
// A second invented record at another time step: the sine of `one`, resampled to 0.02 s and halved.
const two = createRecord({
  name: 'north (invented)',
  dtS: 0.02,
  accelMS2: Float64Array.from({ length: 151 }, (_, i) => 0.5 * one.accelMS2[2 * i]),
});
const set = floorSpectrumSet([one, two], building, grid, 0.15);
const assumptions = floorSetAssumptions(set);

describe('floorSetAssumptions', () => {
  it("are one floor spectrum's, then the order: broadened first, then mean and envelope", () => {
    expect(assumptions[0]).toMatch(/^Building idealised by its fundamental mode/);
    expect(assumptions.at(-1)).toMatch(
      /^Mean and envelope of 2 floor spectra taken after broadening: each record's floor spectrum broadened on its own first/,
    );
    const plain = floorSpectrumSet([one, two], building, grid);
    expect(floorSetAssumptions(plain).at(-1)).toContain('none broadened');
  });
});

describe('floorSetToJson', () => {
  const json = floorSetToJson(set, building, assumptions);

  it('labels each record, and holds "mean" and "envelope" with the same curves; the caution first', () => {
    expect(Object.keys(json)[0]).toBe('caution');
    expect(json.records.map((r) => r.label)).toEqual(['east, "yard" (invented)', 'north (invented)']);
    expect(json.records[1].record.dt_s).toBe(0.02);
    expect(json.records[0].ground_pga_g).toBeCloseTo(one.pgaMS2 / G, 12);
    expect(json.mean.records).toBe(2);
    // f = 1/T beside the periods, null at T = 0 (JSON has no infinity)
    expect(json.frequencies_hz).toEqual([null, 10, 1 / 0.3, 1]);
    expect(json.envelope.spectra.map((c) => c.damping)).toEqual([0.02, 0.05]);
    expect(json.broadening?.applied).toBe('to each record before the mean and the envelope');
    expect(json.assumptions).toEqual(assumptions);
  });

  it('the envelope is the larger of the two, the mean their average, and names its record period by period (hand check)', () => {
    for (let d = 0; d < 2; d++) {
      for (let p = 0; p < grid.periodsS.length; p++) {
        const a = json.records[0].spectra[d].psa_g[p];
        const b = json.records[1].spectra[d].psa_g[p];
        expect(json.envelope.spectra[d].psa_g[p]).toBe(Math.max(a, b));
        expect(json.mean.spectra[d].psa_g[p]).toBeCloseTo((a + b) / 2, 12);
        expect(json.envelope.spectra[d].psa_governed_by[p]).toBe(json.records[a >= b ? 0 : 1].label);
      }
    }
    expect(json.envelope.pga_g).toBe(Math.max(...set.members.map((m) => m.spectrum.record.pgaMS2)) / G);
  });
});

describe('floorSetToCsv', () => {
  const csv = floorSetToCsv(set, assumptions);
  const { notes, header, rows } = readCsv(csv);

  it('the caution, then one row per period with a PSA column per record, the mean and the envelope, per damping', () => {
    expectCaution(csv, '# ');
    expect(header).toEqual([
      'period_s',
      'frequency_hz',
      'psa_g@2%:east, "yard" (invented)',
      'psa_g@2%:north (invented)',
      'psa_g@2%:mean',
      'psa_g@2%:envelope',
      'psa_g@5%:east, "yard" (invented)',
      'psa_g@5%:north (invented)',
      'psa_g@5%:mean',
      'psa_g@5%:envelope',
    ]);
    expect(rows.map((r) => r[0])).toEqual(grid.periodsS);
    for (const row of rows) {
      const [t, f, a, b, mean, envelope] = row as number[];
      if (t > 0) expect(f).toBeCloseTo(1 / t, 12); // f = 1/T, empty at T = 0
      expect(envelope).toBe(Math.max(a, b));
      expect(mean).toBeCloseTo((a + b) / 2, 12);
    }
    expect(notes.some((n) => n.includes('taken after broadening'))).toBe(true);
  });
});

describe('floorSetTable', () => {
  const table = floorSetTable(set, building, assumptions);

  it('the caution, the records, and the peak of each record, of the mean and of the envelope with its period', () => {
    expectCaution(table, '! ');
    const lines = table.split('\n');
    const envelope = lines.find((l) => l.startsWith('envelope'));
    const peak = peakOf(set.periodsS, set.envelope.curves[0].psaMS2);
    expect(envelope).toContain((peak.value / G).toPrecision(4));
    expect(envelope).toMatch(/\(from (east|north)/);
    expect(lines.some((l) => l.startsWith('mean '))).toBe(true);
    expect(table).toContain('records   2 ground records through the same building');
    expect(table).toContain('method and assumptions');
  });

  it('peakOf: the largest value and the first period where it is reached (hand check)', () => {
    expect(peakOf(Float64Array.from([0, 0.1, 0.2, 0.3]), Float64Array.from([1, 3, 3, 2]))).toEqual({
      value: 3,
      periodS: 0.1,
      index: 1,
    });
  });
});
