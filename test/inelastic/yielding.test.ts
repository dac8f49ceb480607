import { describe, expect, it } from 'vitest';
import {
  substepsFor,
  YIELDING_STEPS_PER_PERIOD,
  yieldingPeak,
  yieldingStepsPerPeriod,
} from '../../src/inelastic/yielding.js';
import { recordRoughness } from '../../src/oscillator/record-statistics.js';
import { responseSpectrum } from '../../src/spectrum/spectrum.js';
import { testRecord } from '../helpers/records.js';

const elastoplastic = { kind: 'elastoplastic' } as const;

describe('the yielding oscillator', () => {
  const record = testRecord(31, 0.01, 12);
  const periods = [0.05, 0.1, 0.3, 0.7, 1.5, 4];

  it.each([0.02, 0.05])(
    'never yielding, it gives the elastic engine’s SD within 0.5% (ζ = %s)',
    (damping) => {
      // The elastic engine (newmark-average, pre-warped, checked against the exact method in
      // test/reference/accuracy.test.ts) is the outside reference here.
      const spectrum = responseSpectrum(record, {
        periodsS: periods,
        dampings: [damping],
        method: 'newmark-average',
      });
      periods.forEach((periodS, p) => {
        for (const model of [elastoplastic, { kind: 'bilinear', alpha: 0.1 } as const]) {
          const peak = yieldingPeak(record.accelMS2, record.dtS, {
            periodS,
            damping,
            model,
            yieldDisplacementM: 1e6,
          });
          expect(Math.abs(peak.peakDisplacementM / spectrum.curves[0].sdM[p] - 1)).toBeLessThan(0.005);
          expect(peak.yieldEvents).toBe(0);
          expect(peak.ductility).toBeLessThan(1e-3);
        }
      });
    },
  );

  it('a weaker spring yields more often and deforms more than its yield displacement', () => {
    const elastic = yieldingPeak(record.accelMS2, record.dtS, {
      periodS: 0.5,
      damping: 0.05,
      model: elastoplastic,
      yieldDisplacementM: Number.POSITIVE_INFINITY,
    });
    const strong = yieldingPeak(record.accelMS2, record.dtS, {
      periodS: 0.5,
      damping: 0.05,
      model: elastoplastic,
      yieldDisplacementM: elastic.peakDisplacementM / 2,
    });
    const weak = yieldingPeak(record.accelMS2, record.dtS, {
      periodS: 0.5,
      damping: 0.05,
      model: elastoplastic,
      yieldDisplacementM: elastic.peakDisplacementM / 8,
    });
    expect(strong.yieldEvents).toBeGreaterThan(0);
    expect(weak.yieldEvents).toBeGreaterThan(strong.yieldEvents);
    expect(strong.ductility).toBeGreaterThan(1);
    expect(weak.ductility).toBeGreaterThan(strong.ductility);
  });

  it('stops early past stopAboveM, with the peak as a lower bound', () => {
    const options = { periodS: 0.5, damping: 0.05, model: elastoplastic, yieldDisplacementM: 0.002 };
    const full = yieldingPeak(record.accelMS2, record.dtS, options);
    const stopped = yieldingPeak(record.accelMS2, record.dtS, {
      ...options,
      stopAboveM: full.peakDisplacementM / 2,
    });
    expect(stopped.stopped).toBe(true);
    expect(full.stopped).toBe(false);
    expect(stopped.peakDisplacementM).toBeGreaterThan(full.peakDisplacementM / 2);
    expect(stopped.peakDisplacementM).toBeLessThanOrEqual(full.peakDisplacementM);
  });

  it('sub-steps by the rule: N(ζ) per period, ⌈5R²⌉ per record step, at least 1', () => {
    expect(substepsFor(10, 0.05, 0.01, 0)).toBe(1);
    expect(substepsFor(0.1, 0.05, 0.01, 0)).toBe(Math.ceil((YIELDING_STEPS_PER_PERIOD * 0.01) / 0.1));
    expect(substepsFor(10, 0.05, 0.01, 1)).toBe(5);
    // N(ζ) = min(800, max(120, 120·√(0.025/ζ))): 120 from 2.5% up, 240 at 0.625%, 800 undamped.
    expect(yieldingStepsPerPeriod(0.05)).toBe(120);
    expect(yieldingStepsPerPeriod(0.025)).toBe(120);
    expect(yieldingStepsPerPeriod(0.00625)).toBeCloseTo(240, 9);
    expect(yieldingStepsPerPeriod(0)).toBe(800);
    expect(substepsFor(0.1, 0, 0.01, 0)).toBe(80);
    const peak = yieldingPeak(record.accelMS2, record.dtS, {
      periodS: 0.1,
      damping: 0.05,
      model: elastoplastic,
      yieldDisplacementM: 1,
    });
    expect(peak.substeps).toBe(substepsFor(0.1, 0.05, 0.01, recordRoughness(record.accelMS2)));
  });

  it.each([
    [{ periodS: 0 }, 'a yielding oscillator needs a period > 0 s, got 0'],
    [{ damping: -0.1 }, 'the damping ratio must be ≥ 0, got -0.1'],
    [{ yieldDisplacementM: 0 }, 'the yield displacement must be > 0 m, got 0'],
    [
      { model: { kind: 'bilinear', alpha: 1 } },
      "--model 'bilinear:1': use elastoplastic or bilinear:α with 0 ≤ α < 1",
    ],
    [{ substeps: 0.5 }, 'substeps must be a positive integer, got 0.5'],
  ])('refuses %o in one line', (change, message) => {
    const options = { periodS: 1, damping: 0.05, model: elastoplastic, yieldDisplacementM: 0.01, ...change };
    expect(() => yieldingPeak(record.accelMS2, record.dtS, options as never)).toThrow(message);
  });
});

describe('whole elastic record steps', () => {
  // The whole step is the same n sub-steps composed (closed form of a linear recurrence), taken only
  // where an energy bound shows no sub-step can yield or pass the peak; so the results must equal
  // stepping every sub-step, to rounding, yield excursions included.
  const record = testRecord(47, 0.01, 10);
  const roughness = recordRoughness(record.accelMS2);
  it.each([
    [0.01, 0.02, { kind: 'elastoplastic' } as const],
    [0.04, 0.05, { kind: 'elastoplastic' } as const],
    [0.12, 0, { kind: 'bilinear', alpha: 0.05 } as const],
    [0.3, 0.05, { kind: 'bilinear', alpha: 0.3 } as const],
    [0.9, 0.1, { kind: 'elastoplastic' } as const],
  ])('T = %s s, ζ = %s: the same peaks as every sub-step on its own', (periodS, damping, model) => {
    const base = { periodS, damping, model, roughness, yieldDisplacementM: Number.POSITIVE_INFINITY };
    const uo = yieldingPeak(record.accelMS2, record.dtS, base).peakDisplacementM;
    for (const ry of [1, 1.3, 2, 4, 8]) {
      const options = { ...base, yieldDisplacementM: uo / ry };
      const whole = yieldingPeak(record.accelMS2, record.dtS, options);
      const each = yieldingPeak(record.accelMS2, record.dtS, { ...options, wholeSteps: false });
      expect(whole.substeps).toBeGreaterThan(1);
      expect(whole.yieldEvents).toBe(each.yieldEvents);
      expect(Math.abs(whole.peakDisplacementM / each.peakDisplacementM - 1)).toBeLessThan(1e-9);
    }
  });
});
