import { describe, expect, it } from 'vitest';
import { INFO_METHODS, infoTable, infoToJson } from '../../src/formats/info.js';
import { formatJson } from '../../src/formats/spectrum-json.js';
import { groundMotionMeasures } from '../../src/record/measures.js';
import { applyProcessingPlan } from '../../src/record/process.js';
import { createRecord } from '../../src/record/record.js';
import { predominantPeriod } from '../../src/spectrum/predominant.js';
import { expectCaution } from '../helpers/outputs.js';

const G = 9.80665; // standard gravity, m/s² (CGPM 1901)
// An invented record: 2 s of a 2 Hz sine of amplitude 0.2 g at 0.005 s, whole cycles only.
const A = 0.2 * G;
const record = createRecord({
  name: 'sine (invented)',
  dtS: 0.005,
  accelMS2: Float64Array.from({ length: 401 }, (_, i) => A * Math.sin(2 * Math.PI * 2 * i * 0.005)),
});
const json = infoToJson(record, groundMotionMeasures(record), predominantPeriod(record));

describe('infoToJson', () => {
  it('gives the record, the processing and every measure under keys that carry their units', () => {
    expect(Object.keys(json).slice(0, 4)).toEqual(['caution', 'record', 'processing', 'pga_g']);
    expect(json.record).toMatchObject({ name: 'sine (invented)', npts: 401, dt_s: 0.005, duration_s: 2 });
    expect(json.processing).toEqual({ order: 'baseline → taper → filter → resample', steps: [] });
    expect(json.methods).toBe(INFO_METHODS);
  });

  it('measures the sine as by hand', () => {
    // Peak A at t = 1/(4f) = 0.125 s.
    expect(json.pga_g).toBeCloseTo(0.2, 12);
    expect(json.pga_time_s).toBeCloseTo(0.125, 12);
    // Arias 1970: I_a = π/(2g)∫a²dt = π/(2g)·A²·T/2 over whole cycles.
    expect(json.arias_m_s).toBeCloseTo((Math.PI / (2 * G)) * A * A, 6);
    // CAV = ∫|a|dt = A·(2/π)·T for a sine over whole half-cycles (EPRI 1988 definition).
    expect(json.cav_m_s).toBeCloseTo(((A * 2) / Math.PI) * 2, 2);
    // A steady 2 Hz drive: the 5%-damped PSA peaks at resonance, near T = 1/f = 0.5 s.
    expect(json.predominant_period_s).toBeGreaterThan(0.45);
    expect(json.predominant_period_s).toBeLessThan(0.55);
  });

  it('passes the finite check, which names a field that is not finite', () => {
    expect(() => formatJson(json)).not.toThrow();
    expect(() => formatJson({ ...json, cav_m_s: Number.NaN })).toThrow(/\(cav_m_s = NaN\)/);
  });
});

describe('infoTable', () => {
  const text = infoTable(json);
  const lines = text.split('\n');

  it('opens with the caution and the record, and says when nothing was processed', () => {
    expectCaution(text, '! ');
    expect(text).toContain('record  sine (invented) (sine (invented)), 401 samples at 0.005 s, 2.00 s long');
    expect(text).toContain('        processed: nothing (as read)');
    const processed = applyProcessingPlan(record, { baselineOrder: 0 });
    const steps = infoTable(
      infoToJson(processed, groundMotionMeasures(processed), predominantPeriod(processed)),
    );
    expect(steps).not.toContain('nothing (as read)');
    expect(steps).toContain(`        processed: ${processed.processing[0].description}`);
  });

  it('gives one measure a line, values right-aligned in one column, units after them', () => {
    const first = lines.findIndex((line) => line.startsWith('PGA '));
    const rows = lines.slice(first, first + 10);
    const end = (rows[0].match(/^PGA +\S+/) as RegExpMatchArray)[0].length;
    for (const row of rows) {
      expect(row[end - 1]).not.toBe(' ');
      expect(row[end]).toBe(' ');
      expect(row[end + 1]).not.toBe(' ');
    }
    expect(rows.map((row) => row.slice(0, 5))).toContain('CAV  ');
    expect(rows[0]).toBe(`${'PGA'.padEnd(end - 10 - 2)}  ${'0.2000'.padStart(10)} g    at t = 0.125 s`);
  });

  it('closes with how each measure is computed', () => {
    expect(lines).toContain(`arias: ${INFO_METHODS.arias}`);
    expect(lines).toContain(`significant duration: ${INFO_METHODS.significant_duration}`);
  });
});
