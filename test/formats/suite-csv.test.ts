import { describe, expect, it } from 'vitest';
import { CAUTION } from '../../src/base/caution.js';
import { analyseSuite } from '../../src/batch/suite.js';
import { suiteToCsv } from '../../src/formats/suite-csv.js';
import { asce716Spectrum } from '../../src/spectrum/design.js';

// Two invented records at 0.5 and 2 times an ASCE 7-16 target (S_DS = 1 g, S_D1 = 0.6 g, T_L = 8 s).
const target = asce716Spectrum({ sdsG: 1, sd1G: 0.6, tlS: 8 });
const periodsS = [0, 0.2, 1, 2];
const records = [0.5, 2].map((k, i) => ({
  name: `rec${i + 1}`,
  file: `in/rec${i + 1}.csv`,
  psaG: [periodsS.map((t) => k * target.psaG(t))],
}));
const settings = { periodsS, dampings: [0.05] };

/** The CSV's table as rows of cells by header name (comment lines left out). */
function table(csv: string) {
  const lines = csv
    .trim()
    .split('\n')
    .filter((line) => !line.startsWith('#'));
  const header = lines[0].split(',');
  return lines
    .slice(1)
    .map((line) => Object.fromEntries(line.split(',').map((cell, i) => [header[i], cell])));
}

describe('suiteToCsv', () => {
  it('without a target: per period the mean, median, σ ln, the ±1σ band and every record', () => {
    const csv = suiteToCsv(analyseSuite(records, settings), periodsS);
    expect(csv.startsWith(`# ${CAUTION.slice(0, 40)}`)).toBe(true);
    const rows = table(csv);
    expect(Object.keys(rows[0])).toEqual([
      'period_s',
      'frequency_hz',
      'mean_psa_g@5%',
      'median_psa_g@5%',
      'sigma_ln_psa@5%',
      'minus_1_sigma_psa_g@5%',
      'plus_1_sigma_psa_g@5%',
      'rec1_psa_g@5%',
      'rec2_psa_g@5%',
    ]);
    expect(rows).toHaveLength(4);
    // At 1 s the target is S_D1/T = 0.6 g: records 0.3 and 1.2 g, mean 0.75, median √(0.36) = 0.6,
    // σ = ln 4/√2 (sample deviation of two values), by hand.
    const at1 = rows[2];
    expect(Number(at1['mean_psa_g@5%'])).toBeCloseTo(0.75, 14);
    expect(Number(at1['median_psa_g@5%'])).toBeCloseTo(0.6, 14);
    expect(Number(at1['sigma_ln_psa@5%'])).toBeCloseTo(Math.log(4) / Math.SQRT2, 14);
    expect(Number(at1['plus_1_sigma_psa_g@5%'])).toBeCloseTo(0.6 * Math.exp(Math.log(4) / Math.SQRT2), 13);
    expect(Number(at1['rec2_psa_g@5%'])).toBeCloseTo(1.2, 14);
  });

  it('with scaling and a check: the target, the ratio, the range flag, and the factors and result in the notes', () => {
    const analysis = analyseSuite(records, settings, {
      target,
      scaleEach: true,
      check: { fraction: 0.9, rangeS: [0.2, 1], rangeSource: 'test range' },
    });
    const csv = suiteToCsv(analysis, periodsS);
    const rows = table(csv);
    expect(rows.map((r) => r.in_check_range)).toEqual(['0', '1', '1', '0']);
    expect(Number(rows[2]['target_psa_g@5%'])).toBeCloseTo(0.6, 14);
    expect(Number(rows[2]['ratio_mean_to_target@5%'])).toBeCloseTo(1, 13);
    expect(Number(rows[2]['rec1_psa_g@5%'])).toBeCloseTo(0.6, 13); // scaled by 2
    expect(csv).toContain('# scale factor rec1: 2 over 0.2-2 s (3 periods)');
    expect(csv).toContain('# scale factor rec2: 0.5 over 0.2-2 s (3 periods)');
    expect(csv).toMatch(
      /# suite check: PASS; least mean\/target 1 at T = [\d.]+ s against 0\.9; range 0\.2-1 s \(test range\), 2 grid periods/,
    );
    expect(csv).toContain('# Preliminary: a screening of the suite mean');
    expect(csv).toContain('# warning: only 2 grid periods in the check range');
  });
});
