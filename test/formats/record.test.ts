import { describe, expect, it } from 'vitest';
import { CAUTION, cautionLines } from '../../src/base/caution.js';
import { STANDARD_GRAVITY_MS2 } from '../../src/base/units.js';
import { recordHeader, recordToCsv, recordToJson, recordToText } from '../../src/formats/record.js';
import { applyProcessingPlan } from '../../src/record/process.js';
import { readRecordText } from '../../src/record/read.js';
import { createRecord } from '../../src/record/record.js';
import { testRecord } from '../helpers/records.js';

const asRead = { accelUnit: 'g', lengthUnit: 'm', velocity: false, displacement: false } as const;

/** An invented record of five samples at 0.02 s, read in g. */
const small = createRecord({
  name: 'tiny',
  source: 'tiny.txt',
  dtS: 0.02,
  accelMS2: Float64Array.from([0, 0.1, -0.25, 0.05, 0], (g) => g * STANDARD_GRAVITY_MS2),
  unitsRead: 'g',
});

describe('recordToCsv', () => {
  it('states time step, points and unit first, then source, each step, columns, how to read it back and the caution', () => {
    const processed = applyProcessingPlan(small, { baselineOrder: 0, taperFraction: 0.1 });
    const lines = recordHeader(processed, asRead, ['time_s', 'accel_g']);
    expect(lines.slice(1, 4)).toEqual(['dt: 0.02 s', 'npts: 5', 'units: g (acceleration)']);
    expect(lines[4]).toBe('source: tiny.txt (read in g)');
    expect(lines[5]).toMatch(/: 2 steps$/);
    expect(lines[6]).toMatch(/^step 1: baseline correction: mean removed/);
    expect(lines[7]).toMatch(/^step 2: cosine \(Tukey\) taper of 10%/);
    expect(lines).toContain('read back: quakesweep spectrum FILE --units g');
    expect(lines.slice(-cautionLines().length).join(' ')).toBe(CAUTION);
    expect(recordHeader(small, asRead, ['time_s', 'accel_g'])[5]).toMatch(/none, the record as read$/);
  });

  it('writes one row a sample, each value the shortest text of the double (ECMA-262 Number::toString)', () => {
    const csv = recordToCsv(small, asRead);
    const rows = csv.split('\n').filter((line) => line !== '' && !line.startsWith('#'));
    expect(rows).toEqual(['time_s,accel_g', '0,0', '0.02,0.1', '0.04,-0.25', '0.06,0.05', '0.08,0']);
  });

  it('adds velocity and displacement in the length unit asked, by the trapezoidal rule from rest', () => {
    const csv = recordToCsv(small, { ...asRead, lengthUnit: 'cm', velocity: true, displacement: true });
    const rows = csv.split('\n').filter((line) => line !== '' && !line.startsWith('#'));
    expect(rows[0]).toBe('time_s,accel_g,velocity_cm_s,displacement_cm');
    // Trapezoidal rule (closed form): v1 = dt/2·(a0 + a1) = 0.01 s × 0.1 g = 0.980665 cm/s.
    const [, , v1, d1] = rows[2].split(',').map(Number);
    expect(v1).toBeCloseTo(0.980665, 12);
    expect(d1).toBeCloseTo(0.01 * (0 + 0.980665), 12); // d1 = dt/2·(v0 + v1)
    expect(csv).toContain('--column 2');
    expect(csv).toMatch(/^# velocity and displacement: running trapezoidal integrals/m);
  });

  it('reads back as the same record: bit for bit in m/s², as read in g, within one rounding when processed in g', () => {
    const record = testRecord(7, 0.01, 6);
    const processed = applyProcessingPlan(record, {
      baselineOrder: 1,
      filter: { kind: 'highpass', order: 4, lowCornerHz: 0.2 },
    });
    const read = (text: string, units: 'g' | 'm/s2') =>
      readRecordText(text, { source: 'back.csv', units, column: 2 });
    const exact = read(recordToCsv(processed, { ...asRead, accelUnit: 'm/s2', velocity: true }), 'm/s2');
    expect(exact.accelMS2).toEqual(processed.accelMS2);
    expect(exact.accelMS2.length).toBe(processed.accelMS2.length);
    expect(Math.abs(exact.dtS - processed.dtS)).toBeLessThan(1e-12 * processed.dtS);
    const inG = read(recordToCsv(processed, asRead), 'g');
    processed.accelMS2.forEach((a, i) => {
      expect(Math.abs(inG.accelMS2[i] - a)).toBeLessThanOrEqual(2 * Number.EPSILON * Math.abs(a));
    });
    // Values as read in g come back bit for bit.
    const gRecord = readRecordText(recordToCsv(small, asRead), { source: 'x', units: 'g' });
    expect(gRecord.accelMS2).toEqual(small.accelMS2);
  });
});

describe('recordToText and recordToJson', () => {
  it('text: the same header, columns aligned by spaces, readable as a record', () => {
    const text = recordToText(small, { ...asRead, velocity: true });
    expect(text.startsWith('# processed ground-acceleration record tiny')).toBe(true);
    const back = readRecordText(text, { source: 'x', units: 'g', column: 2 });
    expect(back.accelMS2).toEqual(small.accelMS2);
  });

  it('JSON: caution first, the record, its processing, one array a column', () => {
    const json = recordToJson(small, { ...asRead, displacement: true });
    expect(Object.keys(json)[0]).toBe('caution');
    expect(json.record).toEqual({ name: 'tiny', source: 'tiny.txt', units_read: 'g', npts: 5, dt_s: 0.02 });
    expect((json as Record<string, unknown>).accel_g).toEqual([0, 0.1, -0.25, 0.05, 0]);
    expect((json as Record<string, unknown>).displacement_m).toHaveLength(5);
  });
});
