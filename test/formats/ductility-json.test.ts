import { describe, expect, it } from 'vitest';
import { CAUTION } from '../../src/base/caution.js';
import { ductilityDemandToJson, ductilityToJson } from '../../src/formats/ductility-json.js';
import { formatJson } from '../../src/formats/spectrum-json.js';
import {
  constantDuctilitySpectra,
  ductilityDemandSpectra,
  YIELDING_METHOD,
} from '../../src/inelastic/ductility.js';
import { decayingSine } from '../helpers/outputs.js';

const G = 9.80665; // standard gravity, m/s² (CGPM 1901)
const record = decayingSine();
const periodsS = [0, 0.2, 0.5];
const spectra = constantDuctilitySpectra(record, {
  periodsS,
  dampings: [0.05],
  ductilities: [1, 2, 4],
  model: { kind: 'bilinear', alpha: 0.05 },
});
const omega2 = (t: number) => ((2 * Math.PI) / t) ** 2;

describe('ductilityToJson', () => {
  const json = JSON.parse(formatJson(ductilityToJson(spectra)));

  it('carries the keys of the issue first, then the method, convention and tolerance', () => {
    expect(Object.keys(json)).toEqual([
      'caution',
      'record',
      'model',
      'method',
      'method_description',
      'convention',
      'ductility_tolerance',
      'periods_s',
      'frequencies_hz',
      'elastic',
      'spectra',
    ]);
    expect(json.caution).toBe(CAUTION);
    expect(json.record).toMatchObject({ name: record.name, npts: 301, dt_s: 0.01 });
    expect(json.model).toEqual({ name: 'bilinear:0.05', kind: 'bilinear', post_yield_ratio: 0.05 });
    expect(json.method).toBe('newmark-average');
    expect(json.method_description).toBe(YIELDING_METHOD);
    expect(json.convention).toContain('largest strength');
    expect(json.ductility_tolerance).toBe(spectra.tolerance);
    expect(json.periods_s).toEqual(periodsS);
    // f = 1/T; none at T = 0 (definition).
    expect(json.frequencies_hz).toEqual([null, 5, 2]);
  });

  it('writes one curve per damping and ductility with the issue keys and the reviewer keys', () => {
    expect(json.spectra.map((s: { ductility: number }) => s.ductility)).toEqual([1, 2, 4]);
    for (const curve of json.spectra) {
      expect(Object.keys(curve)).toEqual([
        'damping',
        'ductility',
        'ay_g',
        'uy_m',
        'um_m',
        'ry',
        'strength_ratio',
        'achieved_ductility',
      ]);
      expect(curve.damping).toBe(0.05);
      for (let p = 1; p < periodsS.length; p++) {
        // A_y = ω²·u_y and R_y = 1/f̄_y (definitions, Chopra §7.2–7.3, from memory).
        expect(curve.ay_g[p]).toBeCloseTo((omega2(periodsS[p]) * curve.uy_m[p]) / G, 12);
        expect(curve.ry[p] * curve.strength_ratio[p]).toBeCloseTo(1, 12);
        expect(curve.achieved_ductility[p]).toBeCloseTo(curve.um_m[p] / curve.uy_m[p], 9);
      }
    }
  });

  it('gives the elastic peaks per damping; μ = 1 is the elastic PSA and T = 0 the PGA', () => {
    const [elastic] = json.elastic;
    expect(Object.keys(elastic)).toEqual(['damping', 'sd_m', 'psa_g']);
    // PSA = ω²·SD (definition).
    expect(elastic.psa_g[1]).toBeCloseTo((omega2(0.2) * elastic.sd_m[1]) / G, 12);
    expect(json.spectra[0].ay_g[2]).toBeCloseTo(elastic.psa_g[2], 6);
    // A rigid oscillator follows the ground: A_y = PGA (RIGID_CONVENTION, closed form).
    for (const curve of json.spectra) expect(curve.ay_g[0]).toBeCloseTo(record.pgaMS2 / G, 12);
  });
});

describe('ductilityDemandToJson', () => {
  const demand = ductilityDemandSpectra(record, {
    periodsS: [0.2, 0.5],
    dampings: [0.05],
    model: { kind: 'elastoplastic' },
    ayG: [0.1, 0.2],
  });
  const json = JSON.parse(formatJson(ductilityDemandToJson(demand)));

  it('carries the caution, record, model and each given strength as {"ay_g"} or {"ry"}', () => {
    expect(json.caution).toBe(CAUTION);
    expect(json.model).toEqual({ name: 'elastoplastic', kind: 'elastoplastic', post_yield_ratio: 0 });
    expect(json.definition).toContain('below 1');
    expect(json.spectra.map((s: { strength: unknown }) => s.strength)).toEqual([
      { ay_g: 0.1 },
      { ay_g: 0.2 },
    ]);
    const byRy = ductilityDemandSpectra(record, {
      periodsS: [0.5],
      dampings: [0.05],
      model: { kind: 'elastoplastic' },
      ry: [3],
    });
    expect(ductilityDemandToJson(byRy).spectra[0].strength).toEqual({ ry: 3 });
  });

  it('writes the demand and the strength in both measures per period', () => {
    for (const curve of json.spectra) {
      expect(Object.keys(curve)).toEqual([
        'damping',
        'strength',
        'ductility',
        'ay_g',
        'uy_m',
        'um_m',
        'ry',
        'yield_events',
      ]);
      curve.ductility.forEach((mu: number, p: number) => {
        expect(curve.ay_g[p]).toBeCloseTo(curve.strength.ay_g, 12);
        // μ = u_m/u_y and R_y = u_o/u_y (definitions).
        expect(mu).toBeCloseTo(curve.um_m[p] / curve.uy_m[p], 9);
        expect(curve.ry[p]).toBeCloseTo(json.elastic[0].sd_m[p] / curve.uy_m[p], 9);
      });
    }
  });
});
