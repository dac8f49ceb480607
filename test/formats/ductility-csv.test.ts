import { describe, expect, it } from 'vitest';
import { ductilityDemandToCsv, ductilityToCsv } from '../../src/formats/ductility-csv.js';
import { constantDuctilitySpectra, ductilityDemandSpectra } from '../../src/inelastic/ductility.js';
import { decayingSine, expectCaution, readCsv } from '../helpers/outputs.js';

const record = decayingSine();
const periodsS = [0, 0.2, 0.5];
const spectra = constantDuctilitySpectra(record, {
  periodsS,
  dampings: [0.02, 0.05],
  ductilities: [1, 4],
  model: { kind: 'elastoplastic' },
});

describe('ductilityToCsv', () => {
  const text = ductilityToCsv(spectra);
  const { notes, header, rows } = readCsv(text);

  it('opens with the caution, then the record, model, method, convention and tolerance', () => {
    expectCaution(text, '# ');
    expect(notes).toContain('record: test motion (invented); npts 301; dt 0.01 s');
    expect(notes).toContain('model: elastoplastic');
    expect(notes).toContain(`method: ${spectra.method}`);
    expect(notes.some((note) => note.startsWith('strength convention: largest strength'))).toBe(true);
    expect(notes).toContain('ductility tolerance: 0.005 of the target');
  });

  it('has one row per period and a column per quantity, damping and μ with its unit', () => {
    const quantities = ['ay_g', 'uy_m', 'um_m', 'ry', 'strength_ratio', 'achieved_ductility'];
    expect(header).toEqual([
      'period_s',
      'frequency_hz',
      'sd_m@2%',
      'psa_g@2%',
      'sd_m@5%',
      'psa_g@5%',
      ...['2%', '5%'].flatMap((d) =>
        ['mu=1', 'mu=4'].flatMap((mu) => quantities.map((q) => `${q}@${d}/${mu}`)),
      ),
    ]);
    expect(rows.map((row) => row[0])).toEqual(periodsS);
    // f = 1/T, empty at T = 0 (definition).
    expect(rows.map((row) => row[1])).toEqual([null, 5, 2]);
  });

  it('writes the numbers of the result in full precision', () => {
    const at = (name: string) => header.indexOf(name);
    const curve = spectra.curves[3]; // 5%, μ = 4
    rows.forEach((row, p) => {
      expect(row[at('ay_g@5%/mu=4')]).toBe(curve.ayG[p]);
      expect(row[at('ry@5%/mu=4')]).toBe(curve.ry[p]);
      expect(row[at('achieved_ductility@5%/mu=4')]).toBe(curve.achievedDuctility[p]);
      expect(row[at('psa_g@2%')]).toBe(spectra.elastic[0].psaG[p]);
    });
  });
});

describe('ductilityDemandToCsv', () => {
  const demand = ductilityDemandSpectra(record, {
    periodsS: [0.2, 0.5],
    dampings: [0.05],
    model: { kind: 'bilinear', alpha: 0.1 },
    ry: [2, 4],
  });
  const text = ductilityDemandToCsv(demand);
  const { notes, header, rows } = readCsv(text);

  it('carries the caution and the definition of the demand, a column group per strength', () => {
    expectCaution(text, '# ');
    expect(notes).toContain('model: bilinear:0.1');
    expect(notes.some((note) => note.startsWith('demand: ductility = um/uy'))).toBe(true);
    expect(header.slice(4, 10)).toEqual([
      'ductility@5%/ry=2',
      'ay_g@5%/ry=2',
      'uy_m@5%/ry=2',
      'um_m@5%/ry=2',
      'ry@5%/ry=2',
      'yield_events@5%/ry=2',
    ]);
    expect(header).toContain('ductility@5%/ry=4');
    expect(rows[1][header.indexOf('ductility@5%/ry=4')]).toBe(demand.curves[1].ductility[1]);
    expect(rows[0][header.indexOf('ry@5%/ry=2')]).toBeCloseTo(2, 12); // as given
  });

  it('names a strength given as A_y in g', () => {
    const byAy = ductilityDemandSpectra(record, {
      periodsS: [0.5],
      dampings: [0.05],
      model: { kind: 'elastoplastic' },
      ayG: [0.15],
    });
    expect(readCsv(ductilityDemandToCsv(byAy)).header).toContain('ductility@5%/ay=0.15g');
  });
});
