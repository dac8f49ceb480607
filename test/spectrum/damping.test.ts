import { describe, expect, it } from 'vitest';
import { createRecord } from '../../src/record/record.js';
import { compareDamping, newmarkHallFactors, publishedDampingRatios } from '../../src/spectrum/damping.js';
import { responseSpectrum } from '../../src/spectrum/spectrum.js';

describe('published damping factors', () => {
  it('Newmark–Hall (1982) median factors at 5% (hand calculation from the regressions, from memory)', () => {
    const f = newmarkHallFactors(0.05);
    expect(f.acceleration).toBeCloseTo(3.21 - 0.68 * Math.log(5), 12); // 2.1156
    expect(f.velocity).toBeCloseTo(2.31 - 0.41 * Math.log(5), 12); // 1.6501
    expect(f.displacement).toBeCloseTo(1.82 - 0.27 * Math.log(5), 12); // 1.3855
    expect(f.acceleration).toBeCloseTo(2.1156, 4);
    expect(newmarkHallFactors(0).acceleration).toBeNull(); // ln 0 is undefined
  });

  it('ratios to 5%: Eurocode 8 η (Eq. 3.6) and Newmark–Hall', () => {
    const r = publishedDampingRatios(0.2, 0.05);
    expect(r.ec8Eta).toBeCloseTo(Math.sqrt(10 / 25), 12); // EN 1998-1 Eq. 3.6, η(5%) = 1
    expect(r.newmarkHall.acceleration).toBeCloseTo(
      (3.21 - 0.68 * Math.log(20)) / (3.21 - 0.68 * Math.log(5)),
      12,
    );
    expect(r.newmarkHall.displacement).toBeCloseTo(
      (1.82 - 0.27 * Math.log(20)) / (1.82 - 0.27 * Math.log(5)),
      12,
    );
    const same = publishedDampingRatios(0.05, 0.05);
    expect(same.ec8Eta).toBe(1);
    expect(same.newmarkHall.velocity).toBe(1);
  });
});

describe('compareDamping', () => {
  // An invented test motion, m/s².
  const accel = Float64Array.from(
    { length: 1000 },
    (_, i) => Math.sin(0.07 * i) * Math.exp(-(((i - 400) / 200) ** 2)),
  );
  const record = createRecord({ name: 'invented', dtS: 0.01, accelMS2: accel });
  const spectrum = responseSpectrum(record, { periodsS: [0, 0.2, 1], dampings: [0.02, 0.05, 0.2] });

  it('the reference ratio is 1, and every ratio at T = 0 is 1 (PSA = PGA at any damping; closed form)', () => {
    const comparison = compareDamping(spectrum);
    const reference = comparison.curves.find((c) => c.damping === 0.05)!;
    expect(Array.from(reference.ratio)).toEqual([1, 1, 1]);
    for (const curve of comparison.curves) expect(curve.ratio[0]).toBe(1);
  });

  it('is PSA(ξ)/PSA(5%) period by period', () => {
    const comparison = compareDamping(spectrum);
    const low = comparison.curves[0];
    for (let p = 0; p < 3; p++)
      expect(low.ratio[p]).toBe(spectrum.curves[0].psaMS2[p] / spectrum.curves[1].psaMS2[p]);
    const expected = Math.exp((Math.log(low.ratio[1]) + Math.log(low.ratio[2])) / 2);
    expect(low.geometricMeanRatio).toBeCloseTo(expected, 12);
  });

  it('needs the reference damping', () => {
    const noFive = responseSpectrum(record, { periodsS: [0.2], dampings: [0.02] });
    expect(() => compareDamping(noFive)).toThrow(/5% curve/);
  });
});
