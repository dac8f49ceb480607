import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { createRecord } from '../../src/record/record.js';
import { broadenCurve } from '../../src/spectrum/broaden.js';
import { floorSpectrum } from '../../src/spectrum/floor.js';
import {
  combineSpectra,
  envelopeCurve,
  floorSpectrumSet,
  meanCurve,
  recordLabels,
} from '../../src/spectrum/floor-set.js';

/** An invented motion: one decaying sine at `hz` (not a real record). */
function sineRecord(name: string, hz: number, dtS = 0.01, seconds = 8) {
  const n = Math.round(seconds / dtS);
  const a = Float64Array.from({ length: n }, (_, i) => {
    const t = i * dtS;
    return 2 * Math.min(1, t) * Math.exp(-t / 4) * Math.sin(2 * Math.PI * hz * t);
  });
  return createRecord({ name, source: `${name}.txt`, dtS, accelMS2: a });
}

describe('meanCurve and envelopeCurve', () => {
  it('by hand on three small curves', () => {
    const curves = [
      [1, 4, 2],
      [3, 1, 2],
      [2, 1, 5],
    ];
    // Hand calculation: means (1+3+2)/3 = 2, (4+1+1)/3 = 2, (2+2+5)/3 = 3; largest 3, 4, 5.
    expect(Array.from(meanCurve(curves))).toEqual([2, 2, 3]);
    expect(Array.from(envelopeCurve(curves))).toEqual([3, 4, 5]);
  });

  it('one curve is its own mean and envelope', () => {
    expect(Array.from(meanCurve([[0.5, 0.25]]))).toEqual([0.5, 0.25]);
    expect(Array.from(envelopeCurve([[0.5, 0.25]]))).toEqual([0.5, 0.25]);
  });

  it('refuse no curves and curves of different lengths', () => {
    expect(() => meanCurve([])).toThrow(/at least one/);
    expect(() => envelopeCurve([[1, 2], [1]])).toThrow(/differ in length \(2, 1\)/);
  });

  it('property: the envelope is ≥ every curve and equals one of them; the mean lies between the least and the largest (definitions)', () => {
    const curves = fc.integer({ min: 1, max: 12 }).chain((length) =>
      fc.array(
        fc.array(fc.double({ min: 0, max: 50, noNaN: true }), { minLength: length, maxLength: length }),
        {
          minLength: 1,
          maxLength: 8,
        },
      ),
    );
    fc.assert(
      fc.property(curves, (set) => {
        const envelope = envelopeCurve(set);
        const mean = meanCurve(set);
        for (let p = 0; p < envelope.length; p++) {
          const column = set.map((c) => c[p]);
          const low = Math.min(...column);
          const high = Math.max(...column);
          expect(column.every((v) => envelope[p] >= v)).toBe(true);
          expect(column).toContain(envelope[p]);
          // Rounding of the sum: allow a few ulps of the largest value.
          const slack = 4 * Number.EPSILON * Math.max(1, high);
          expect(mean[p]).toBeGreaterThanOrEqual(low - slack);
          expect(mean[p]).toBeLessThanOrEqual(high + slack);
        }
      }),
    );
  });
});

describe('broadening before combining (constructed cases, hand calculation)', () => {
  const fraction = 0.15;

  it('the mean: taken after broadening it keeps both neighbouring peaks (4), taken before only their average (2.5)', () => {
    // Two floor spectra with narrow peaks 4 at neighbouring periods, A at 0.40 s and C at 0.48 s.
    const periods = [0.36, 0.4, 0.44, 0.48, 0.52];
    const a = [1, 4, 1, 1, 1];
    const c = [1, 1, 1, 4, 1];
    // At T = 0.44 s the window is [0.44·0.85, 0.44/0.85] = [0.374, 0.5176] s: it holds 0.40 s and
    // 0.48 s, so A and C broadened are both 4 there (their window ends interpolate below 4): mean 4.
    const after = meanCurve([broadenCurve(periods, a, fraction), broadenCurve(periods, c, fraction)]);
    expect(after[2]).toBe(4);
    // The mean first is (1, 2.5, 1, 2.5, 1); broadened, 2.5 at 0.44 s.
    const before = broadenCurve(periods, meanCurve([a, c]), fraction);
    expect(before[2]).toBe(2.5);
  });

  it("the envelope: taken after broadening it is one record's broadened value; broadening the envelope can interpolate between two records' points and come out higher", () => {
    // A is 4 at 0.3 s, B is 2 at 0.4 s; both are 1 elsewhere.
    const periods = [0.3, 0.4, 0.5, 0.6];
    const a = [4, 1, 1, 1];
    const b = [1, 2, 1, 1];
    // At T = 0.4 s the window is [0.34, 0.4706] s. Its low end lies between 0.3 and 0.4 s, at
    // w = ln(0.34/0.3)/ln(0.4/0.3) = 0.4351 of the way in log T; log–log interpolation there gives
    // v₀^(1−w)·v₁^w. A broadened: max(1, 4^(1−w)·1^w = 2.191) = 2.191; B broadened: its own 2.
    const w = Math.log((0.4 * (1 - fraction)) / 0.3) / Math.log(0.4 / 0.3);
    expect(w).toBeCloseTo(0.4351, 4);
    const after = envelopeCurve([broadenCurve(periods, a, fraction), broadenCurve(periods, b, fraction)]);
    expect(after[1]).toBeCloseTo(4 ** (1 - w), 12); // 2.191
    // The envelope first is (4, 2, 1, 1); broadened at 0.4 s it interpolates between A's 4 and
    // B's 2: 4^(1−w)·2^w = 2.964, a value that neither record's broadened spectrum has.
    const before = broadenCurve(periods, envelopeCurve([a, b]), fraction);
    expect(before[1]).toBeCloseTo(4 ** (1 - w) * 2 ** w, 12);
    expect(before[1] / after[1]).toBeGreaterThan(1.3);
  });

  it('floorSpectrumSet broadens each record first: its envelope is the envelope of the broadened members', () => {
    const grid = {
      periodsS: [0.1, 0.2, 0.3, 0.4, 0.5, 0.7],
      dampings: [0.05],
      method: 'newmark-average' as const,
    };
    const building = { periodS: 0.3, damping: 0.05, modalFactor: 1.3 };
    const set = floorSpectrumSet([sineRecord('one', 2.5), sineRecord('two', 4)], building, grid, 0.15);
    const broadened = set.members.map((m) => m.spectrum.curves[0].psaMS2);
    expect(Array.from(set.envelope.curves[0].psaMS2)).toEqual(Array.from(envelopeCurve(broadened)));
    // Each member is broadened on its own (never below its own unbroadened spectrum).
    for (const m of set.members)
      for (const [p, v] of m.spectrum.curves[0].psaMS2.entries())
        expect(v).toBeGreaterThanOrEqual(m.unbroadened.curves[0].psaMS2[p]);
  });
});

describe('combineSpectra and floorSpectrumSet', () => {
  const grid = {
    periodsS: [0, 0.1, 0.3, 0.6, 1],
    dampings: [0.02, 0.05],
    method: 'newmark-average' as const,
  };
  const building = { periodS: 0.3, damping: 0.05, modalFactor: 1.3 };
  // Different time steps and durations: the grid is what must be shared.
  const grounds = [
    sineRecord('one', 2),
    sineRecord('two', 3.5, 0.005, 6),
    sineRecord('three', 1.2, 0.02, 10),
  ];

  it('each member is floorSpectrum of its record, broadened first; mean and envelope per quantity', () => {
    const set = floorSpectrumSet(grounds, building, grid, 0.15);
    expect(set.members).toHaveLength(3);
    expect(set.broadening).toBe(0.15);
    const alone = floorSpectrum(grounds[1], building, grid, 0.15);
    expect(Array.from(set.members[1].spectrum.curves[1].psaMS2)).toEqual(
      Array.from(alone.spectrum.curves[1].psaMS2),
    );
    for (let d = 0; d < 2; d++) {
      for (const key of ['sdM', 'psvMS', 'psaMS2', 'svMS', 'saMS2'] as const) {
        const curves = set.members.map((m) => m.spectrum.curves[d][key]);
        for (let p = 0; p < grid.periodsS.length; p++) {
          const column = curves.map((c) => c[p]);
          expect(set.envelope.curves[d][key][p]).toBe(Math.max(...column));
          expect(set.mean.curves[d][key][p]).toBeCloseTo((column[0] + column[1] + column[2]) / 3, 12);
        }
      }
    }
    expect(set.envelope.pgaMS2).toBe(Math.max(...set.members.map((m) => m.spectrum.record.pgaMS2)));
    expect(set.grounds.map((g) => g.name)).toEqual(['one', 'two', 'three']);
    // PSA = ω²·SD is kept by the envelope (ω fixed at each period): at T = 0.6 s.
    const omega = (2 * Math.PI) / 0.6;
    const env = set.envelope.curves[1];
    expect(env.psaMS2[3] / (omega * omega * env.sdM[3])).toBeCloseTo(1, 12);
  });

  it('refuses spectra on different grids, naming the records', () => {
    const one = floorSpectrum(grounds[0], building, grid).spectrum;
    const other = floorSpectrum(grounds[1], building, { ...grid, periodsS: [0, 0.1, 0.3, 0.6, 2] }).spectrum;
    expect(() => combineSpectra([one, other])).toThrow(/one and two are not on the same grid/);
    expect(() => floorSpectrumSet([], building, grid)).toThrow(/at least one/);
  });
});

describe('recordLabels', () => {
  it('names, then sources where names repeat, then positions', () => {
    expect(
      recordLabels([
        { name: 'h1', source: 'a/h1.csv' },
        { name: 'h1', source: 'b/h1.csv' },
        { name: 'h2', source: 'h2.csv' },
        { name: 'x', source: 's' },
        { name: 'x', source: 's' },
      ]),
    ).toEqual(['a/h1.csv', 'b/h1.csv', 'h2', 'x (4)', 'x (5)']);
  });
});
