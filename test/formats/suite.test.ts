import { describe, expect, it } from 'vitest';
import { CAUTION } from '../../src/base/caution.js';
import { STATISTICS_METHOD } from '../../src/batch/statistics.js';
import { analyseSuite } from '../../src/batch/suite.js';
import { SHARD_FORMAT, shardFileName, shardJson, suiteJson, suiteOutcomes } from '../../src/formats/suite.js';
import { suiteToCsv } from '../../src/formats/suite-csv.js';

const settings = {
  read: { units: 'g' as const },
  plan: {},
  periodsS: [0, 1],
  dampings: [0.05],
  method: 'newmark-average' as const,
};
const records = [
  { name: 'b (invented)', file: 'in/b.csv', psaG: [[0.4, 0.1]] },
  { name: 'a (invented)', file: 'in/a.csv', psaG: [[0.1, 0.4]] },
];
const failed = [
  { file: 'in/z.csv', error: 'in/z.csv: no values' },
  { file: 'in/c.csv', error: 'in/c.csv: no values' },
];

describe('suiteJson', () => {
  const json = suiteJson(records, failed, settings);

  it('opens with the caution and lists records by name and failures by file', () => {
    expect(Object.keys(json)).toEqual([
      'caution',
      'records',
      'failed',
      'warnings',
      'periods_s',
      'frequencies_hz',
      'statistics',
      'spectra_scaled',
      'spectra',
      'per_record',
    ]);
    expect(json.spectra_scaled).toBe(false);
    expect(json.per_record).toEqual([
      { name: 'a (invented)', file: 'in/a.csv', pga_g: null, scale_factor: 1, pga_scaled_g: null },
      { name: 'b (invented)', file: 'in/b.csv', pga_g: null, scale_factor: 1, pga_scaled_g: null },
    ]);
    expect(json.caution).toBe(CAUTION);
    expect(json.records).toEqual(['a (invented)', 'b (invented)']);
    expect(json.failed.map((f) => f.file)).toEqual(['in/c.csv', 'in/z.csv']);
    expect(json.periods_s).toEqual([0, 1]);
    expect(json.statistics).toBe(STATISTICS_METHOD);
  });

  it('gives the mean and log-normal statistics of the records by period (by hand)', () => {
    const [curve] = json.spectra;
    expect(curve.damping).toBe(0.05);
    expect(curve.mean_psa_g).toEqual([0.25, 0.25].map((v) => expect.closeTo(v, 15)));
    // Median exp(mean ln PSA) = √(0.4·0.1) = 0.2 at both periods.
    expect(curve.median_psa_g).toEqual([0.2, 0.2].map((v) => expect.closeTo(v, 15)));
    // s = |ln 0.4 − ln 0.1|/√2 (sample deviation of two values), p84 = 0.2·e^s.
    const s = Math.log(4) / Math.SQRT2;
    expect(curve.p84_psa_g[0]).toBeCloseTo(0.2 * Math.exp(s), 12);
    expect(curve.p16_psa_g[1]).toBeCloseTo(0.2 * Math.exp(-s), 12);
    expect(curve.sigma_ln_psa[0]).toBeCloseTo(s, 14);
  });

  it('is the same whatever order the records came in', () => {
    expect(suiteJson([...records].reverse(), [...failed].reverse(), settings)).toEqual(json);
  });
});

describe('shards', () => {
  it('names a shard file by its index and count, and keeps what a merge needs', () => {
    const shard = { index: 2, count: 3 };
    expect(shardFileName(shard)).toBe('shard-2-of-3.json');
    const json = shardJson(shard, ['in/a.csv', 'in/b.csv'], settings, records, failed);
    expect(json).toMatchObject({
      caution: CAUTION,
      format: SHARD_FORMAT,
      shard,
      all_files: ['in/a.csv', 'in/b.csv'],
    });
    expect(json.records).toBe(records);
  });
});

describe('the warnings of a suite', () => {
  it('lists a damping above 1000% and each record’s warnings by name, in suite.json and suite.csv', () => {
    // The rule: a damping beyond the measured accuracy range is warned in every output.
    const warned = [
      {
        ...records[0],
        psaG: [
          [0.4, 0.1],
          [0.2, 0.05],
        ],
        warnings: ['PGV 6 m/s is above 5 m/s'],
      },
      {
        ...records[1],
        psaG: [
          [0.1, 0.4],
          [0.05, 0.2],
        ],
      },
    ];
    const heavy = { ...settings, dampings: [0.05, 20] };
    const json = suiteJson(warned, [], heavy);
    expect(json.warnings).toEqual([
      expect.stringMatching(/^damping 2000% is above 1000%/),
      'b (invented): PGV 6 m/s is above 5 m/s',
    ]);
    const csv = suiteToCsv(analyseSuite(warned, heavy), heavy.periodsS);
    expect(csv).toMatch(/^# warning: damping 2000% is above 1000%/m);
    expect(csv).toContain('# warning: b (invented): PGV 6 m/s is above 5 m/s');
    expect(suiteJson(records, [], settings).warnings).toEqual([]);
  });
});

describe('suiteOutcomes', () => {
  it('keeps the records that were swept and lists the patterns that matched nothing first', () => {
    const { records: swept, failed: failures } = suiteOutcomes(
      [
        {
          ok: true,
          file: 'in/a.csv',
          name: 'a',
          psaG: [[0.1]],
          pgaG: 0.1,
          warnings: ['PGA 9 g is above 5 g'],
          spectra: '',
        },
        { ok: false, file: 'in/b.csv', name: 'b', error: 'in/b.csv: no values' },
      ],
      ['in/*.txt'],
    );
    expect(swept).toEqual([
      { name: 'a', file: 'in/a.csv', psaG: [[0.1]], pgaG: 0.1, warnings: ['PGA 9 g is above 5 g'] },
    ]);
    expect(failures).toEqual([
      { file: 'in/*.txt', error: 'in/*.txt: no file matches' },
      { file: 'in/b.csv', error: 'in/b.csv: no values' },
    ]);
  });
});
