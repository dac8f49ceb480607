import { describe, expect, it } from 'vitest';
import { checkShard, MAX_SHARDS, spectraDisagreement } from '../../src/batch/shard-check.js';

// Invented shard summaries of the shape `batch --shard` writes; the checks are definitions (a PSA is
// finite and ≥ 0; shard i of N has 1 ≤ i ≤ N) and the shard's slice of shardSlice.
const summary = () => ({
  shard: { index: 2, count: 2 },
  all_files: ['a.txt', 'b.txt', 'c.txt', 'd.txt'],
  settings: { periodsS: [0, 1], dampings: [0.05] },
  records: [{ name: 'c', file: 'c.txt', psaG: [[0.3, 0.2]], pgaG: 0.3 }],
  failed: [{ file: 'd.txt', error: 'd.txt:2: bad' }],
});

describe('checkShard', () => {
  it('takes a whole summary', () => {
    expect(checkShard(summary(), 's.json').records[0].name).toBe('c');
  });

  it('refuses counts that are zero, not numbers, not whole or huge, and an index out of them', () => {
    for (const count of [0, 'two', 1.5, 1e9, MAX_SHARDS + 1]) {
      const s = summary();
      (s.shard as { count: unknown }).count = count;
      expect(() => checkShard(s, 's.json')).toThrow(/"shard\.count" must be a whole number from 1 to 100000/);
    }
    const s = summary();
    s.shard.index = 3;
    expect(() => checkShard(s, 's.json')).toThrow(/"shard\.index" must be a whole number from 1 to 2, got 3/);
  });

  it('refuses a PSA table of the wrong size or with a negative value, and a record of another shard', () => {
    const negative = summary();
    negative.records[0].psaG[0][1] = -0.2;
    expect(() => checkShard(negative, 's.json')).toThrow(/"psaG" must be 1 × 2 finite numbers ≥ 0/);
    const short = summary();
    short.records[0].psaG = [[0.3]];
    expect(() => checkShard(short, 's.json')).toThrow(/"psaG" must be 1 × 2/);
    const other = summary();
    other.records[0].file = 'a.txt'; // a.txt is shard 1's
    expect(() => checkShard(other, 's.json')).toThrow(/a\.txt is not one of the files of shard 2 of 2/);
  });
});

describe('checkShard on the period grid', () => {
  it('refuses periods out of order or repeated, as the grid is always written ascending (found by the merge fuzz test)', () => {
    for (const periodsS of [
      [1, 0],
      [0, 0],
    ]) {
      const s = summary();
      s.settings.periodsS = periodsS;
      expect(() => checkShard(s, 's.json')).toThrow(
        /"settings\.periodsS" must be in ascending order without repeats/,
      );
    }
  });
});

describe('checkShard on records and failures', () => {
  it('refuses a failure of another shard or of a record, and a file of the slice left out (found by the merge fuzz test)', () => {
    const other = summary();
    other.failed.push({ file: 'a.txt', error: 'invented' }); // a.txt is shard 1's
    expect(() => checkShard(other, 's.json')).toThrow(
      /"failed"\[1\]: a\.txt is not one of the files of shard 2 of 2/,
    );
    const twice = summary();
    twice.failed.push({ file: 'c.txt', error: 'invented' });
    expect(() => checkShard(twice, 's.json')).toThrow(/c\.txt is also among the shard's records/);
    const lost = summary();
    lost.records = [];
    expect(() => checkShard(lost, 's.json')).toThrow(
      /c\.txt of shard 2 of 2 is neither among its records nor its failures/,
    );
    // An unmatched pattern is listed by shard 1 alone (batch --shard).
    const pattern = summary();
    pattern.failed.push({ file: 'nothing-*.txt', error: 'no file matches' });
    expect(() => checkShard(pattern, 's.json')).toThrow(/nothing-\*\.txt is not among the run's files/);
    pattern.shard.index = 1;
    pattern.records = [{ name: 'a', file: 'a.txt', psaG: [[0.3, 0.2]], pgaG: 0.3 }];
    pattern.failed = [
      { file: 'b.txt', error: 'invented' },
      { file: 'nothing-*.txt', error: 'no file matches' },
    ];
    expect(checkShard(pattern, 's.json').failed).toHaveLength(2);
  });
});

describe('spectraDisagreement', () => {
  const record = summary().records[0];
  const settings = summary().settings;
  const spectra = (psa: number[], pga = 0.3) => ({
    record: { pga_g: pga },
    periods_s: [0, 1],
    spectra: [{ damping: 0.05, psa_g: psa }],
  });
  it('finds none when the copied spectra hold the summary’s numbers', () => {
    expect(spectraDisagreement(record, settings, spectra([0.3, 0.2]))).toBeUndefined();
  });
  it('names the first PSA or the PGA that differs, and other periods', () => {
    expect(spectraDisagreement(record, settings, spectra([0.3, 0.25]))).toBe(
      'says PSA 0.25 g at T = 1 s, ζ = 0.05, where the shard summary says 0.2',
    );
    expect(spectraDisagreement(record, settings, spectra([0.3, 0.2], 0.4))).toMatch(/says PGA 0\.4 g/);
    expect(spectraDisagreement(record, { ...settings, periodsS: [0, 2] }, spectra([0.3, 0.2]))).toMatch(
      /other periods/,
    );
  });
});
