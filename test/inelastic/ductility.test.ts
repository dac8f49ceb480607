import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { STANDARD_GRAVITY_MS2 } from '../../src/base/units.js';
import { constantDuctilitySpectra, ductilityDemandSpectra } from '../../src/inelastic/ductility.js';
import { readRecordText } from '../../src/record/read.js';
import { responseSpectrum } from '../../src/spectrum/spectrum.js';

const record = readRecordText(
  readFileSync(new URL('../../records/marrowby-h1.csv', import.meta.url), 'utf8'),
  {
    units: 'g',
    source: 'records/marrowby-h1.csv',
  },
);
const periodsS = [0, 0.07, 0.2, 0.5, 1, 2.5];
const ductilities = [1, 2, 4, 8];
const spectra = constantDuctilitySpectra(record, {
  periodsS,
  dampings: [0.05],
  ductilities,
  model: { kind: 'bilinear', alpha: 0.03 },
});

describe('constant-ductility spectra', () => {
  it('achieve every target ductility within the tolerance (or report a jump below it)', () => {
    for (const curve of spectra.curves) {
      for (let p = 1; p < periodsS.length; p++) {
        const error = curve.achievedDuctility[p] / curve.ductility - 1;
        expect(error).toBeLessThanOrEqual(spectra.tolerance);
        // Below the target only where the search ended at a jump; none on this record.
        expect(error).toBeGreaterThanOrEqual(-spectra.tolerance);
        expect(curve.umM[p] / curve.uyM[p]).toBeCloseTo(curve.achievedDuctility[p], 10);
      }
    }
  });

  it('μ = 1 is the elastic PSA: the elastic engine’s within 0.5% (responseSpectrum, newmark-average)', () => {
    const elastic = responseSpectrum(record, { periodsS, dampings: [0.05], method: 'newmark-average' });
    const psaG = elastic.curves[0].psaMS2.map((psa) => psa / STANDARD_GRAVITY_MS2);
    const unit = spectra.curves[0];
    expect(unit.ductility).toBe(1);
    for (let p = 0; p < periodsS.length; p++) {
      expect(Math.abs(unit.ayG[p] / psaG[p] - 1)).toBeLessThan(0.005);
      expect(unit.ry[p]).toBe(1);
      expect(spectra.elastic[0].psaG[p]).toBe(unit.ayG[p]);
    }
  });

  it('R_y ≥ 1 and does not fall as μ rises; A_y = ω²·u_y', () => {
    for (let p = 1; p < periodsS.length; p++) {
      const omega2 = ((2 * Math.PI) / periodsS[p]) ** 2;
      let previous = 1;
      for (const curve of spectra.curves) {
        expect(curve.ry[p]).toBeGreaterThanOrEqual(1);
        expect(curve.ry[p]).toBeGreaterThanOrEqual(previous * (1 - 1e-9));
        previous = curve.ry[p];
        expect(curve.ayG[p]).toBeCloseTo((omega2 * curve.uyM[p]) / STANDARD_GRAVITY_MS2, 12);
        expect(curve.ry[p] * curve.strengthRatio[p]).toBeCloseTo(1, 12);
      }
    }
  });

  it('T = 0 is rigid: A_y = PGA, R_y = 1, no deformation (stated in the convention)', () => {
    for (const curve of spectra.curves) {
      expect(curve.ayG[0]).toBeCloseTo(record.pgaMS2 / STANDARD_GRAVITY_MS2, 12);
      expect(curve.ry[0]).toBe(1);
      expect(curve.uyM[0]).toBe(0);
      expect(curve.umM[0]).toBe(0);
    }
    expect(spectra.convention).toMatch(/largest strength/);
    expect(spectra.convention).toMatch(/T = 0/);
    expect(spectra.model).toEqual({ kind: 'bilinear', alpha: 0.03 });
  });

  it('the demand spectra run the other way: at the strengths found, the demand is the target', () => {
    const p = 3; // T = 0.5 s
    const curves = spectra.curves.slice(1);
    const demand = ductilityDemandSpectra(record, {
      periodsS: [periodsS[p]],
      dampings: [0.05],
      model: { kind: 'bilinear', alpha: 0.03 },
      ry: curves.map((curve) => curve.ry[p]),
    });
    curves.forEach((curve, i) => {
      expect(demand.curves[i].ductility[0]).toBeCloseTo(curve.achievedDuctility[p], 6);
    });
    const byAy = ductilityDemandSpectra(record, {
      periodsS: [periodsS[p]],
      dampings: [0.05],
      model: { kind: 'bilinear', alpha: 0.03 },
      ayG: [curves[1].ayG[p]],
    });
    expect(byAy.curves[0].ductility[0]).toBeCloseTo(curves[1].achievedDuctility[p], 6);
    expect(byAy.curves[0].ry[0]).toBeCloseTo(curves[1].ry[p], 6);
    expect(byAy.curves[0].yieldEvents[0]).toBeGreaterThan(0);
  });

  it('a strength above the elastic one gives a demand below 1', () => {
    const demand = ductilityDemandSpectra(record, {
      periodsS: [1],
      dampings: [0.05],
      model: { kind: 'elastoplastic' },
      ry: [0.5],
    });
    // u_y = 2·u_o with u_o the elastic engine's peak: the spring never yields, and the demand is
    // the yielding oscillator's own elastic peak over 2·u_o, 0.5 to both engines' 0.5% rules.
    expect(Math.abs(demand.curves[0].ductility[0] / 0.5 - 1)).toBeLessThan(0.005);
    expect(demand.curves[0].yieldEvents[0]).toBe(0);
  });
});

describe('refusals, one line each', () => {
  const base = { periodsS: [0.5], dampings: [0.05], model: { kind: 'elastoplastic' } as const };
  it.each([
    [0.9, '--ductility 0.9: ductility ratios are finite and ≥ 1'],
    [0, '--ductility 0: ductility ratios are finite and ≥ 1'],
    [Number.NaN, '--ductility NaN: ductility ratios are finite and ≥ 1'],
  ])('ductility %s', (mu, message) => {
    expect(() => constantDuctilitySpectra(record, { ...base, ductilities: [2, mu] })).toThrow(message);
  });
  it('no ductility, a bad model, a bad period or damping', () => {
    expect(() => constantDuctilitySpectra(record, { ...base, ductilities: [] })).toThrow(
      /at least one ductility/,
    );
    expect(() =>
      constantDuctilitySpectra(record, { ...base, model: { kind: 'bilinear', alpha: -1 }, ductilities: [2] }),
    ).toThrow("--model 'bilinear:-1': use elastoplastic or bilinear:α with 0 ≤ α < 1");
    expect(() => constantDuctilitySpectra(record, { ...base, periodsS: [-1], ductilities: [2] })).toThrow(
      '--periods: -1 is not a period ≥ 0 s',
    );
    expect(() => constantDuctilitySpectra(record, { ...base, dampings: [-0.1], ductilities: [2] })).toThrow(
      '--damping: -0.1 is not a damping ratio ≥ 0',
    );
  });
  it.each([
    [{ ry: [0] }, 'strength 0: R_y must be finite and > 0'],
    [{ ayG: [-0.2] }, 'strength -0.2: A_y must be finite and > 0'],
    [{ ry: [2], ayG: [0.2] }, 'ductility demand: give the strength as R_y or as A_y, not both nor neither'],
    [{}, 'ductility demand: give the strength as R_y or as A_y, not both nor neither'],
    [
      { ry: [2], periodsS: [0, 1] },
      'ductility demand: T = 0 (rigid) has no finite demand below the PGA; use periods > 0',
    ],
  ])('demand %o', (change, message) => {
    expect(() => ductilityDemandSpectra(record, { ...base, ...change })).toThrow(message);
  });
});
