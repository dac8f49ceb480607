import { describe, expect, it } from 'vitest';
import { infoToJson } from '../../src/formats/info.js';
import { infoToCsv } from '../../src/formats/info-csv.js';
import { groundMotionMeasures } from '../../src/record/measures.js';
import { applyProcessingPlan } from '../../src/record/process.js';
import { createRecord } from '../../src/record/record.js';
import { predominantPeriod } from '../../src/spectrum/predominant.js';
import { expectCaution } from '../helpers/outputs.js';

const G = 9.80665; // standard gravity, m/s² (CGPM 1901)
// An invented record: 2 s of a 2 Hz sine of amplitude 0.2 g at 0.005 s.
const record = createRecord({
  name: 'sine (invented)',
  dtS: 0.005,
  accelMS2: Float64Array.from({ length: 401 }, (_, i) => 0.2 * G * Math.sin(2 * Math.PI * 2 * i * 0.005)),
});

describe('infoToCsv', () => {
  const json = infoToJson(record, groundMotionMeasures(record), predominantPeriod(record));
  const csv = infoToCsv(json);
  const rows = csv.split('\n').filter((line) => line !== '' && !line.startsWith('#'));

  it('opens with the caution, then the record and each method on # lines', () => {
    expectCaution(csv, '# ');
    expect(csv).toMatch(/^# record: sine \(invented\); source sine \(invented\); npts 401; dt 0.005 s/m);
    expect(csv).toMatch(/^# method arias: Arias intensity/m);
  });

  it('one measure a row with its JSON value and unit; null as an empty cell', () => {
    expect(rows[0]).toBe('measure,value,unit');
    const byKey = new Map(rows.slice(1).map((row) => [row.split(',')[0], row.split(',')]));
    expect(byKey.get('pga_g')).toEqual(['pga_g', String(json.pga_g), 'g']);
    // The peak of a sampled 0.2 g sine (closed form: 0.2 g at the crest sample t = 0.125 s).
    expect(Number(byKey.get('pga_g')?.[1])).toBeCloseTo(0.2, 12);
    expect(byKey.get('cav_m_s')?.[2]).toBe('m/s');
    expect(byKey.size).toBe(20);
    const quiet = infoToCsv({ ...json, bracket_start_s: null });
    expect(quiet).toMatch(/^bracket_start_s,,s$/m);
  });

  it('states the processing', () => {
    const processed = applyProcessingPlan(record, { taperFraction: 0.05 });
    const text = infoToCsv(
      infoToJson(processed, groundMotionMeasures(processed), predominantPeriod(processed)),
    );
    expect(text).toMatch(/^# processing: cosine \(Tukey\) taper of 5%/m);
  });
});
