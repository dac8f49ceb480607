import { describe, expect, it } from 'vitest';
import { analyseSuite, targetDampingIndex } from '../../src/batch/suite.js';
import { asce716Spectrum, ec8Spectrum } from '../../src/spectrum/design.js';

// Invented records whose PSA is an exact multiple of the target: least squares in ln PSA must
// give back the reciprocal of the multiple (closed form: ln c = mean(ln target − ln PSA) = −ln k).
const target = asce716Spectrum({ sdsG: 1, sd1G: 0.6, tlS: 8 });
const periodsS = [0, 0.1, 0.2, 0.5, 1, 2];
const dampings = [0.02, 0.05];
const multiple = (k: number) => [
  periodsS.map((t) => 1.3 * k * target.psaG(t)), // 2%: a little above 5%, same shape
  periodsS.map((t) => k * target.psaG(t)),
];
const records = [
  { name: 'b', file: 'in/b.csv', psaG: multiple(2), pgaG: 0.8 },
  { name: 'a', file: 'in/a.csv', psaG: multiple(0.5), pgaG: 0.2 },
];

describe('analyseSuite', () => {
  it('without a target: the statistics of the records as read, sorted by name, factors 1', () => {
    const analysis = analyseSuite(records, { periodsS, dampings });
    expect(analysis.members.map((m) => m.name)).toEqual(['a', 'b']);
    expect(analysis.factors).toEqual([1, 1]);
    expect(analysis.target).toBeUndefined();
    // Mean of 0.5 and 2 times the target: 1.25 times it (by hand).
    expect(analysis.statistics[1].mean_psa_g[3]).toBeCloseTo(1.25 * target.psaG(0.5), 14);
  });

  it('scales each record to the target at its damping (closed form: factor 1/k), every damping alike', () => {
    const analysis = analyseSuite(records, { periodsS, dampings }, { target, scaleEach: true });
    expect(analysis.target?.damping).toBe(0.05);
    expect(analysis.factors[0]).toBeCloseTo(2, 13); // a: 0.5 × target
    expect(analysis.factors[1]).toBeCloseTo(0.5, 13); // b: 2 × target
    expect(analysis.scaling?.records.map((r) => r.name)).toEqual(['a', 'b']);
    // Scaled, both records are the target at 5% and 1.3 × target at 2%; so are the mean and median.
    for (const [p, t] of periodsS.entries()) {
      expect(analysis.statistics[1].mean_psa_g[p]).toBeCloseTo(target.psaG(t), 13);
      expect(analysis.statistics[0].median_psa_g[p]).toBeCloseTo(1.3 * target.psaG(t), 13);
      expect(analysis.statistics[1].sigma_ln_psa[p]).toBeCloseTo(0, 13);
    }
    expect(analysis.scaling?.records[0].rangeS).toEqual([0.1, 2]); // periods above 0 by default
  });

  it('checks the (scaled) mean against the fraction of the target over the range', () => {
    const scaled = analyseSuite(
      records,
      { periodsS, dampings },
      { target, scaleEach: true, check: { fraction: 0.9, rangeS: [0.2, 2], rangeSource: 'test' } },
    );
    expect(scaled.check?.pass).toBe(true);
    expect(scaled.check?.worstRatio).toBeCloseTo(1, 13);
    // Unscaled, a third record at 0.1 × target pulls the mean down to (0.5 + 2 + 0.1)/3 = 0.8667 (by hand).
    const low = { name: 'c', file: 'in/c.csv', psaG: multiple(0.1) };
    const unscaled = analyseSuite(
      [...records, low],
      { periodsS, dampings },
      { target, check: { fraction: 0.9, rangeS: [0.2, 2], rangeSource: 'test' } },
    );
    expect(unscaled.check?.pass).toBe(false);
    expect(unscaled.check?.worstRatio).toBeCloseTo(2.6 / 3, 13);
  });

  it('names the record whose scaling fails, and refuses scaling or a check without a target', () => {
    const zero = { name: 'z', file: 'in/z.csv', psaG: [periodsS.map(() => 0), periodsS.map(() => 0)] };
    expect(() => analyseSuite([zero], { periodsS, dampings }, { target, scaleEach: true })).toThrow(
      /^in\/z\.csv: the record's PSA is 0 at T = 0\.1 s/,
    );
    expect(() => analyseSuite(records, { periodsS, dampings }, { scaleEach: true })).toThrow('need a target');
  });
});

describe('targetDampingIndex', () => {
  it("takes the target's own damping, and asks for it when it is not swept", () => {
    expect(targetDampingIndex([0.02, 0.05], target)).toBe(1);
    const ec8 = ec8Spectrum({ type: 1, ground: 'C', agG: 0.25, damping: 0.02 });
    expect(targetDampingIndex([0.02, 0.05], ec8)).toBe(0);
    expect(() => targetDampingIndex([0.1], target)).toThrow(
      'the target is for 5% damping: include it in --damping',
    );
  });
});
