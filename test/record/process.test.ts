import { describe, expect, it } from 'vitest';
import { applyProcessingPlan } from '../../src/record/process.js';
import { createRecord } from '../../src/record/record.js';

const dtS = 0.01;
const accelMS2 = Float64Array.from({ length: 3001 }, (_, i) => Math.sin(2 * Math.PI * 1.5 * i * dtS) + 0.3);
const record = createRecord({ name: 'invented', dtS, accelMS2 });

describe('applyProcessingPlan (order baseline → taper → filter → resample; common practice)', () => {
  it('does nothing unless asked', () => {
    const out = applyProcessingPlan(record, {});
    expect(out).toBe(record);
    expect(out.processing).toEqual([]);
  });

  it('records every step, in the fixed order, whatever the order of the plan fields', () => {
    const out = applyProcessingPlan(record, {
      resampleDtS: 0.02,
      filter: { kind: 'highpass', order: 4, lowCornerHz: 0.1 },
      taperFraction: 0.05,
      baselineOrder: 0,
    });
    expect(out.processing.map((step) => step.operation)).toEqual(['baseline', 'taper', 'filter', 'resample']);
    expect(out.dtS).toBe(0.02);
    expect(out.accelMS2.length).toBe(1501);
    for (const step of out.processing) expect(step.description.length).toBeGreaterThan(10);
    expect(out.processing[2].parameters['low_corner_hz']).toBe(0.1);
    expect(record.processing).toEqual([]); // the input is not changed
  });

  it('the mean removal takes the offset away (closed form: mean of whole sine cycles is 0)', () => {
    const out = applyProcessingPlan(record, { baselineOrder: 0 });
    let sum = 0;
    for (const v of out.accelMS2) sum += v;
    expect(Math.abs(sum / out.accelMS2.length)).toBeLessThan(1e-3);
  });

  it('refuses a corner at or above Nyquist with a clear message', () => {
    expect(() =>
      applyProcessingPlan(record, { filter: { kind: 'lowpass', order: 4, highCornerHz: 50 } }),
    ).toThrow(/at or above the Nyquist frequency 50 Hz/);
  });
});
