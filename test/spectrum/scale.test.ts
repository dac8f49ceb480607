import { describe, expect, it } from 'vitest';
import { createRecord } from '../../src/record/record.js';
import { readSpectrumTable, tableSpectrum } from '../../src/spectrum/design-table.js';
import {
  parseScaleRange,
  scaleOverlays,
  scaleRecord,
  scaleSpectrum,
  scaleStep,
  scaleToTarget,
} from '../../src/spectrum/scale.js';
import { psaG, responseSpectrum } from '../../src/spectrum/spectrum.js';

/** An invented test motion: two enveloped sines, m/s². */
function motion(dtS = 0.01, count = 1500): Float64Array {
  return Float64Array.from({ length: count }, (_, i) => {
    const t = i * dtS;
    const envelope = Math.exp(-(((t - 5) / 2.5) ** 2));
    return envelope * (2 * Math.sin(2 * Math.PI * 1.3 * t) + 0.6 * Math.sin(2 * Math.PI * 5.2 * t));
  });
}

const record = createRecord({ name: 'invented', dtS: 0.01, accelMS2: motion() });
const periodsS = [0, 0.1, 0.2, 0.3, 0.5, 0.75, 1, 1.5, 2, 3];
const spectrum = responseSpectrum(record, { periodsS, dampings: [0.05] });
const ownG = psaG(spectrum.curves[0]);

/** A table target equal to the record's own PSA times c, at the grid's periods. */
function ownTimes(c: number) {
  const rows = periodsS.map((t, i) => `${t},${c * ownG[i]}`).join('\n');
  return tableSpectrum(readSpectrumTable(rows, 'own.csv'), 'own.csv');
}

describe('scaling to a target (least squares in ln PSA)', () => {
  it('the factor against the record’s own spectrum times c is c (closed form: the factor that makes it match)', () => {
    for (const c of [0.5, 1, 2.75]) {
      const result = scaleToTarget(periodsS, ownG, ownTimes(c));
      expect(result.factor).toBeCloseTo(c, 12);
      expect(result.meanRatio).toBeCloseTo(1, 12);
      expect(result.minRatio).toBeCloseTo(1, 12);
      expect(result.maxRatio).toBeCloseTo(1, 12);
      expect(result.rangeS).toEqual([0.1, 3]); // default: every grid period above 0
      expect(result.periodCount).toBe(9);
    }
  });

  it('is the exponential of the mean log ratio (closed form of the least-squares problem)', () => {
    const target = ownTimes(1);
    const record = [1, 1, 1].map((v, i) => v * [0.5, 2, 4][i]);
    const grid = [0.2, 0.3, 0.5];
    const tg = grid.map((t) => target.psaG(t));
    const expected = Math.exp(grid.reduce((s, _, i) => s + Math.log(tg[i] / record[i]), 0) / 3);
    const result = scaleToTarget(grid, record, target);
    expect(result.factor).toBeCloseTo(expected, 12);
    const ratios = grid.map((_, i) => (expected * record[i]) / tg[i]);
    expect(result.minRatio).toBeCloseTo(Math.min(...ratios), 12);
    expect(result.maxRatio).toBeCloseTo(Math.max(...ratios), 12);
    expect(result.meanRatio).toBeCloseTo(ratios.reduce((a, b) => a + b) / 3, 12);
  });

  it('uses only the periods in --scale-range', () => {
    const result = scaleToTarget(periodsS, ownG, ownTimes(3), { rangeS: parseScaleRange('0.2:1') });
    expect(result.rangeS).toEqual([0.2, 1]);
    expect(result.periodCount).toBe(5);
    expect(() => scaleToTarget(periodsS, ownG, ownTimes(3), { rangeS: [4, 5] })).toThrow(/no period/);
    expect(() => parseScaleRange('1:0.2')).toThrow(/a < b/);
    expect(() => parseScaleRange('0.2')).toThrow(/a:b/);
  });

  it('refuses a range that leaves the target', () => {
    const short = tableSpectrum(readSpectrumTable('0.1,1\n1,1\n', 't.csv'), 't.csv');
    expect(() => scaleToTarget(periodsS, ownG, short, { rangeS: [0.1, 2] })).toThrow(/outside the target/);
    expect(scaleToTarget(periodsS, ownG, short).rangeS).toEqual([0.1, 1]); // default stays inside
  });

  it('the scaled spectrum equals the spectrum of the scaled record (linearity of the oscillator)', () => {
    const target = ownTimes(1.7);
    const result = scaleToTarget(periodsS, ownG, target);
    const step = scaleStep(result, target);
    const scaled = scaleSpectrum(spectrum, result.factor, step);
    const again = responseSpectrum(scaleRecord(record, result.factor, step), { periodsS, dampings: [0.05] });
    for (let p = 0; p < periodsS.length; p++) {
      expect(scaled.curves[0].psaMS2[p]).toBeCloseTo(again.curves[0].psaMS2[p], 10);
      expect(scaled.curves[0].sdM[p]).toBeCloseTo(again.curves[0].sdM[p], 12);
    }
    expect(scaled.record.pgaMS2).toBeCloseTo(again.record.pgaMS2, 12);
    expect(scaled.record.processing.map((s) => s.operation)).toEqual(['scale']);
    expect(again.record.processing[0].parameters.factor).toBe(result.factor);
  });
});

describe('scaleOverlays', () => {
  // An invented fit: factor 2 over 0.2–1 s; the target is not defined at 3 s.
  const fit = {
    factor: 2,
    rangeS: [0.2, 1] as [number, number],
    periodCount: 2,
    meanRatio: 1,
    minRatio: 1,
    maxRatio: 1,
    criterion: '',
    psaG: [0.4, 1, 0.6, null],
    // Invented: 0.4 g at T = 0 rising to 1 g at 0.2 s, then 0.2/T g, defined to 1.5 s.
    target: {
      code: 'table' as const,
      description: 'invented target',
      parameters: {},
      damping: undefined,
      minPeriodS: 0,
      maxPeriodS: 1.5,
      psaG: (t: number) => (t <= 0.2 ? 0.4 + 3 * t : 0.2 / t),
    },
    description: 'invented target: its parameters',
    applied: false,
    damping: 0.05,
  };
  const periods = [0, 0.2, 1, 3];

  it('gives the target over the periods it covers, with the fitting range, and the record times the factor', () => {
    const [target, scaled] = scaleOverlays(periods, [0.1, 0.5, 0.3, 0.05], fit);
    expect(target.label).toBe('target: invented target');
    expect(target.rangeS).toEqual([0.2, 1]);
    // Drawn at the grid periods it covers and densely to its own end (1.5 s), not only at 0, 0.2, 1.
    const at = Array.from(target.periodsS);
    expect(at[0]).toBe(0);
    expect(at.at(-1)).toBe(1.5);
    expect(at).toEqual(expect.arrayContaining([0.2, 1]));
    expect(at.length).toBeGreaterThan(50);
    expect(Array.from(target.psaG)).toEqual(at.map((t) => fit.target.psaG(t)));
    expect(scaled.label).toBe('record × 2 (ζ = 5%, not applied)');
    expect(scaled.psaG).toEqual([0.2, 1, 0.6, 0.1]);
    expect(scaled.rangeS).toBeUndefined();
  });

  it('leaves the scaled curve out when the factor was applied (the record is drawn scaled)', () => {
    expect(scaleOverlays(periods, [0.1, 0.5, 0.3, 0.05], { ...fit, applied: true })).toHaveLength(1);
  });
});
