import { describe, expect, it } from 'vitest';
import { broadenByEvaluation, denseSpacing } from '../../src/spectrum/broaden.js';
import type { Spectrum } from '../../src/spectrum/spectrum.js';

// A constructed spectrum (not a record's): two sharp resonance-like peaks, one of them between
// the coarse grid's points, on a smooth floor. The true maximum over any window is known in
// closed form: the larger of the peaks inside it and the curve at the window's ends.
const peaks = [
  { t: 0.337, height: 3, width: 0.004 },
  { t: 1.21, height: 2, width: 0.02 },
];
function curve(t: number): number {
  let value = 1 / (1 + t);
  for (const p of peaks) value += p.height / (1 + (Math.log(t / p.t) / p.width) ** 2);
  return value;
}
const evaluate = (t: number) => {
  const omega = (2 * Math.PI) / t;
  const psa = curve(t);
  return { sdM: psa / (omega * omega), svMS: 2 * curve(t), saMS2: 3 * curve(t) };
};
function trueWindowMaximum(low: number, high: number): number {
  let best = Math.max(curve(low), curve(high));
  for (const p of peaks) if (p.t >= low && p.t <= high) best = Math.max(best, curve(p.t));
  // The smooth part only falls with T: a peak's top is the curve's largest value near it.
  for (let i = 0; i <= 20000; i++) best = Math.max(best, curve(low * (high / low) ** (i / 20000)));
  return best;
}

function coarseSpectrum(periods: number[]): Spectrum {
  const n = periods.length;
  const psa = Float64Array.from(periods, (t) => (t === 0 ? 1 : curve(t)));
  return {
    record: { name: 'constructed', source: 'test', npts: 0, dtS: 0.01, pgaMS2: 1, processing: [] },
    method: 'piecewise-exact',
    periodsS: Float64Array.from(periods),
    curves: [
      {
        damping: 0.002,
        sdM: new Float64Array(n),
        psvMS: new Float64Array(n),
        psaMS2: psa,
        svMS: psa.map((v) => 2 * v),
        saMS2: psa.map((v) => 3 * v),
      },
    ],
    oscillatorSteps: 0,
  };
}

describe('broadenByEvaluation (the window maximum on a dense internal grid, constructed case)', () => {
  const periods = [0, 0.1, 0.2, 0.3, 0.45, 0.7, 1, 1.5, 2];
  const b = 0.15;
  const { spectrum, dense } = broadenByEvaluation(coarseSpectrum(periods), b, evaluate, [], () =>
    denseSpacing(0.002),
  );

  it('finds peaks the user grid does not hold, within 1e-4 of the true window maximum', () => {
    periods.forEach((t, p) => {
      if (t === 0) return;
      const truth = trueWindowMaximum(t * (1 - b), t / (1 - b));
      expect(Math.abs(spectrum.curves[0].psaMS2[p] / truth - 1), `T = ${t}`).toBeLessThan(1e-4);
      expect(Math.abs(spectrum.curves[0].svMS[p] / (2 * truth) - 1)).toBeLessThan(1e-4);
    });
    // T = 0.3 s: its window [0.255, 0.353] holds the sharp peak at 0.337 s, which lies off the grid.
    expect(spectrum.curves[0].psaMS2[3]).toBeGreaterThan(3.7);
    expect(dense.densePeriods).toBeGreaterThan(1000);
  });

  it('keeps SD and PSV consistent with the broadened PSA and leaves T = 0 as it was', () => {
    const c = spectrum.curves[0];
    const omega = (2 * Math.PI) / 0.3;
    expect(c.sdM[3] * omega * omega).toBeCloseTo(c.psaMS2[3], 12);
    expect(c.psvMS[3] * omega).toBeCloseTo(c.psaMS2[3], 12);
    expect(c.psaMS2[0]).toBe(1);
  });

  it('a broadening of 0 changes nothing', () => {
    const none = broadenByEvaluation(coarseSpectrum(periods), 0, evaluate, [], () => 0.01).spectrum;
    expect(Array.from(none.curves[0].psaMS2)).toEqual(Array.from(coarseSpectrum(periods).curves[0].psaMS2));
  });

  it('spacing follows the lightest damping, between 0.002 and 0.01 in ln T', () => {
    expect(denseSpacing(0.05)).toBe(0.01);
    expect(denseSpacing(0.005)).toBe(0.005);
    expect(denseSpacing(0)).toBe(0.002);
  });
});
