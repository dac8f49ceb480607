import { describe, expect, it } from 'vitest';
import { CAUTION } from '../../src/base/caution.js';
import { spectrumToCsv } from '../../src/formats/spectrum-csv.js';
import { createRecord } from '../../src/record/record.js';
import { responseSpectrum } from '../../src/spectrum/spectrum.js';

// An invented record named across two lines (a name from a file may hold anything).
const record = createRecord({
  name: 'yard\nnorth (invented)',
  dtS: 0.01,
  accelMS2: Float64Array.from({ length: 300 }, (_, i) => Math.exp(-i / 100) * Math.sin(i / 5)),
});
const periods = [0, 0.2, 0.5, 1];
const spectrum = responseSpectrum(record, { periodsS: periods, dampings: [0.02, 0.05] });

describe('spectrumToCsv', () => {
  const csv = spectrumToCsv(spectrum, { lengthUnit: 'mm' });
  const lines = csv.trimEnd().split('\n');
  const comments = lines.filter((line) => line.startsWith('#'));
  const table = lines.filter((line) => !line.startsWith('#'));

  it('opens with the caution, record and method on # lines, the name kept on one line', () => {
    expect(lines[0].startsWith('# Preliminary')).toBe(true);
    expect(comments.map((line) => line.slice(2)).join(' ')).toContain(CAUTION);
    expect(comments).toContain('# record: yard north (invented); npts 300; dt 0.01 s');
    expect(comments).toContain(`# method: ${spectrum.method}`);
    expect(csv.endsWith('\n')).toBe(true);
  });

  it('has a header with each quantity, unit and damping, then one row per period', () => {
    const header = table[0].split(',');
    expect(header).toEqual([
      'period_s',
      'frequency_hz',
      ...['2%', '5%'].flatMap((d) => [
        `sd_mm@${d}`,
        `psv_mm_s@${d}`,
        `psa_g@${d}`,
        `sv_mm_s@${d}`,
        `sa_g@${d}`,
      ]),
    ]);
    expect(table).toHaveLength(1 + periods.length);
    for (const [p, row] of table.slice(1).entries()) {
      const cells = row.split(',').map(Number);
      expect(cells).toHaveLength(header.length);
      expect(cells[0]).toBe(periods[p]);
      // f = 1/T by hand for T = 0, 0.2, 0.5, 1 s: none (empty cell), 5, 2, 1 Hz.
      expect(row.split(',')[1]).toBe(['', '5', '2', '1'][p]);
      // SD in mm is SD in m × 1000; PSA in g is PSA in m/s² over 9.80665 (definitions).
      expect(cells[7]).toBeCloseTo(spectrum.curves[1].sdM[p] * 1000, 9);
      expect(cells[9]).toBeCloseTo(spectrum.curves[1].psaMS2[p] / 9.80665, 12);
    }
  });

  it('writes metres by default, and refuses a curve holding NaN', () => {
    expect(spectrumToCsv(spectrum)).toContain('sd_m@2%,psv_m_s@2%');
    const broken = {
      ...spectrum,
      curves: [{ ...spectrum.curves[0], sdM: Float64Array.of(0, Number.NaN, 1, 2) }],
    };
    expect(() => spectrumToCsv(broken)).toThrow(/not a finite number \(sd_m@2% at 0.2 s = NaN\)/);
  });
});
