import { describe, expect, it } from 'vitest';
import { formatNumber } from '../../src/base/numbers.js';
import { targetCsvNotes, targetTableLines, targetToJson } from '../../src/formats/target.js';
import { asce716Spectrum } from '../../src/spectrum/design.js';
import { responseSpectrum } from '../../src/spectrum/spectrum.js';
import { fitTarget } from '../../src/spectrum/target.js';
import { decayingSine } from '../helpers/outputs.js';

const target = asce716Spectrum({ sdsG: 1, sd1G: 0.6, tlS: 8 });
const spectrum = responseSpectrum(decayingSine(), { periodsS: [0, 0.2, 0.5, 1, 2], dampings: [0.05] });
const { fit } = fitTarget(spectrum, target, { rangeS: [0.2, 1] });
const applied = fitTarget(spectrum, target, { rangeS: [0.2, 1], apply: true }).fit;

describe('targetToJson', () => {
  it('adds the target and the scaling, with the target PSA in g at every period', () => {
    const json = targetToJson(fit);
    expect(Object.keys(json)).toEqual(['target', 'scaling']);
    expect(json.target).toMatchObject({ code: target.code, description: target.description, damping: 0.05 });
    // ASCE 7-16 §11.4.6 by hand: S_DS on the plateau T_0 = 0.12 s to T_S = 0.6 s, S_D1/T beyond.
    expect(json.target.psa_g[1]).toBeCloseTo(1, 12);
    expect(json.target.psa_g[3]).toBeCloseTo(0.6, 12);
    expect(json.scaling).toMatchObject({ range_s: [0.2, 1], period_count: 3, damping: 0.05, applied: false });
    expect(Object.keys(json.scaling)).toEqual([
      'factor',
      'range_s',
      'period_count',
      'mean_ratio',
      'min_ratio',
      'max_ratio',
      'criterion',
      'damping',
      'applied',
    ]);
  });
});

describe('targetCsvNotes', () => {
  it('gives the target, the factor over its range and whether it was applied, to four figures', () => {
    const notes = targetCsvNotes(fit);
    expect(notes[0]).toBe(`target: ${target.description}`);
    // 1.79963… to four significant figures, trailing zeros dropped (src/base/numbers.ts)
    expect(notes[1]).toContain('factor 1.8 over 0.2–1 s (3 periods)');
    expect(notes[1].endsWith('; not applied')).toBe(true);
    expect(targetCsvNotes(applied)[1].endsWith('; applied')).toBe(true);
    expect(notes[2]).toBe(`scaling criterion: ${fit.criterion}`);
  });
});

describe('targetTableLines', () => {
  it('gives the factor and the ratios to four significant digits, and the damping in percent', () => {
    const lines = targetTableLines(fit);
    expect(lines[0]).toBe(`target  ${target.description}`);
    expect(lines[1]).toContain('× 1.8 to match it at 5% over 0.2–1 s (3 periods)');
    expect(lines[1]).toContain('not applied (--apply-scale)');
    expect(targetTableLines(applied)[1]).toContain('applied to every number above');
    expect(lines[2]).toContain(`mean ${formatNumber(fit.meanRatio)}`);
  });
});
