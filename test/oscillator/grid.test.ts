import { describe, expect, it } from 'vitest';
import {
  checkPeriodsForRecord,
  dampingWarnings,
  defaultPeriodsS,
  logSpaced,
  MAX_FREQUENCY_HZ,
  MAX_OSCILLATORS,
  MIN_PERIOD_S,
  parseDampings,
  parseFrequencies,
  parsePeriods,
  periodWarnings,
} from '../../src/oscillator/grid.js';

describe('period grids', () => {
  it('logSpaced: both ends exact, a constant ratio between neighbours', () => {
    const periods = logSpaced(0.1, 10, 5);
    expect(periods[0]).toBe(0.1);
    expect(periods[4]).toBe(10);
    // 0.1 to 10 is two decades in four steps: a ratio of 10^(1/2) (closed form).
    for (let i = 1; i < 5; i++) expect(periods[i] / periods[i - 1]).toBeCloseTo(Math.sqrt(10), 12);
    expect(logSpaced(0.5, 2, 1)).toEqual([0.5]);
  });

  it('the default grid is T = 0 and 121 periods from 0.01 s to 10 s, 40 a decade', () => {
    const grid = defaultPeriodsS();
    expect(grid).toHaveLength(122);
    expect(grid[0]).toBe(0);
    expect(grid[1]).toBe(0.01);
    expect(grid[121]).toBe(10);
    // 40 a decade evenly in log T: a ratio of 10^(1/40) between neighbours (closed form), but
    // where a round period replaced its neighbour, within half a percent of it.
    for (let i = 2; i < grid.length; i++) {
      expect(Math.abs(grid[i] / grid[i - 1] / 10 ** (1 / 40) - 1)).toBeLessThan(0.005);
    }
    expect(grid[3] / grid[2]).toBeCloseTo(10 ** (1 / 40), 12);
  });

  it('the default grid holds the round periods of a 1-2-5 series exactly (common practice)', () => {
    const grid = Array.from(defaultPeriodsS());
    for (const t of [0.01, 0.02, 0.05, 0.1, 0.2, 0.5, 1, 2, 5, 10]) expect(grid).toContain(t);
    // and the other periods the terminal tables show (src/formats/layout.ts, summaryRows)
    for (const t of [0.03, 0.3, 3, 0.075, 0.75, 7.5, 0.015, 0.15, 1.5]) expect(grid).toContain(t);
    expect([...grid].sort((a, b) => a - b)).toEqual(grid);
  });

  it('parses a list, sorted, and a:b:n', () => {
    expect(Array.from(parsePeriods(' 1, 0, 0.2 '))).toEqual([0, 0.2, 1]);
    expect(Array.from(parsePeriods('0.1:10:5'))).toEqual(logSpaced(0.1, 10, 5));
    expect(Array.from(parsePeriods(String(MIN_PERIOD_S)))).toEqual([1e-4]);
  });

  it.each([
    ['0.1:1', "--periods '0.1:1': use a:b:n, e.g. 0.01:10:100"],
    ['0:1:5', "--periods '0:1:5': need 0 < a < b (log spacing cannot start at 0; add 0 with a list)"],
    ['1:0.1:5', /need 0 < a < b/],
    ['0.1:1:2.5', "--periods '0.1:1:2.5': n must be an integer ≥ 2"],
    [
      `0.1:1:${MAX_OSCILLATORS + 1}`,
      `--periods '0.1:1:${MAX_OSCILLATORS + 1}': n = 1000001 is more than 1000000`,
    ],
    ['0.1,,1', "--periods: '' is not a number"],
    ['-0.5', '--periods: -0.5 is negative; periods are ≥ 0 s (0 means rigid)'],
    ['0.00005', "--periods '0.00005': 0.00005 s is shorter than 0.0001 s; use 0 for a rigid oscillator"],
    ['1,0.5,1', '--periods: 1 s appears twice'],
  ])('refuses --periods %s', (text, message) => {
    expect(() => parsePeriods(text)).toThrow(message);
  });
});

describe('damping lists', () => {
  it('reads fractions and percentages, keeping the order given', () => {
    expect(Array.from(parseDampings('5%, 0.02,150%'))).toEqual([0.05, 0.02, 1.5]);
  });

  it.each([
    ['5', '--damping: 5 is above 1; write 5% for a percentage, or a fraction such as 0.05'],
    ['-1%', '--damping: -1% is negative; damping ratios are ≥ 0'],
    ['x', "--damping: 'x' is not a number"],
    ['5%,0.05', '--damping: 0.05 appears twice'],
  ])('refuses --damping %s', (text, message) => {
    expect(() => parseDampings(text)).toThrow(message);
  });
});

describe('frequency grids', () => {
  it('a list in Hz gives the periods T = 1/f, ascending (highest frequency first)', () => {
    // 0.5, 4 and 10 Hz are 2, 0.25 and 0.1 s (by hand).
    expect(Array.from(parseFrequencies(' 4, 0.5 ,10 '))).toEqual([0.1, 0.25, 2]);
  });

  it('a:b:n: n log-spaced frequencies from a to b Hz, ends exact, as periods from 1/b to 1/a', () => {
    const periods = parseFrequencies('0.1:100:4');
    expect(periods).toHaveLength(4);
    // Ends: 1/100 = 0.01 s and 1/0.1 = 10 s (by hand); three decades in three steps, so the
    // inner frequencies are 10 and 1 Hz, periods 0.1 and 1 s, a ratio of 10 between neighbours.
    expect(periods[0]).toBeCloseTo(0.01, 15);
    expect(periods[3]).toBeCloseTo(10, 13);
    expect(periods[1]).toBeCloseTo(0.1, 14);
    expect(periods[2]).toBeCloseTo(1, 14);
    for (let i = 1; i < 4; i++) expect(periods[i] / periods[i - 1]).toBeCloseTo(10, 12);
    // Log spacing: the frequencies 1/T have equal steps in log f.
    const logF = Array.from(periods, (t) => Math.log10(1 / t));
    for (let i = 1; i < 4; i++) expect(logF[i - 1] - logF[i]).toBeCloseTo(1, 12);
  });

  it('the highest frequency is that of the shortest period, 10 kHz', () => {
    expect(MAX_FREQUENCY_HZ).toBe(1 / MIN_PERIOD_S);
    expect(Array.from(parseFrequencies('10000'))).toEqual([1e-4]);
    expect(() => parseFrequencies('10001')).toThrow("--frequencies '10001': 10001 Hz is above 10000 Hz");
  });

  it.each([
    ['0', '--frequencies: 0 Hz is not above 0; for T = 0 (rigid) use --periods'],
    ['-1', '--frequencies: -1 Hz is not above 0; for T = 0 (rigid) use --periods'],
    ['1,,2', "--frequencies: '' is not a number"],
    ['1:2', "--frequencies '1:2': use a:b:n, e.g. 0.1:100:100"],
    ['0:10:5', "--frequencies '0:10:5': need 0 < a < b, in Hz"],
    ['10:1:5', "--frequencies '10:1:5': need 0 < a < b, in Hz"],
    ['1:10:1', "--frequencies '1:10:1': n must be an integer ≥ 2"],
    ['1:10:2000000', "--frequencies '1:10:2000000': n = 2000000 is more than 1000000"],
    ['2,1,2', '--frequencies: 2 Hz appears twice'],
  ])('refuses %s', (text, message) => {
    expect(() => parseFrequencies(text)).toThrow(message);
  });
});

describe('damping limits', () => {
  // The measured range of docs/methods-and-verification.md: the campaign to ζ = 10, a subset to 100.
  it('refuses a bare % and damping above 10000%', () => {
    expect(() => parseDampings('%')).toThrow("--damping: '%' is not a number");
    expect(() => parseDampings('5%, %')).toThrow("' %' is not a number");
    expect(() => parseDampings('1e7%')).toThrow(/above 10000%/);
    expect(parseDampings('10000%')[0]).toBe(100);
  });

  it('warns above 1000%, and not at it', () => {
    expect(dampingWarnings(parseDampings('5%,1000%'))).toEqual([]);
    expect(dampingWarnings(parseDampings('5%,2000%'))[0]).toMatch(/^damping 2000% is above 1000%/);
  });
});

describe('periods against the record’s length', () => {
  it('warns of periods longer than the record (the sweep ends with it), and not of one equal to it', () => {
    expect(periodWarnings([0, 1, 40], 40)).toEqual([]);
    expect(periodWarnings([0, 1, 50], 40)[0]).toMatch(/^T = 50 s is longer than the record \(40 s\)/);
    expect(periodWarnings([45, 50, 60], 40)[0]).toMatch(/^3 periods, 45–60 s, are longer than the record/);
    expect(periodWarnings([45], 40)[0]).toMatch(/read these values as lower bounds$/);
  });

  it('refuses a period over 1000 record lengths with one line saying the longest allowed', () => {
    expect(() => checkPeriodsForRecord([0, 1, 40_000], 40)).not.toThrow();
    expect(() => checkPeriodsForRecord([0, 1, 40_001], 40)).toThrow(
      "--periods: T = 40001 s is more than 1000 times the record's length (40 s); use periods up to 40000 s for this record",
    );
  });
});

describe('the period ceiling at its edge', () => {
  it('takes a period of exactly 1000 record lengths when the length falls an ulp short (long fuzz run)', () => {
    // 10 steps of 0.0003 s is 0.0029999999999999996 s in floating point; 3 s is 1000 lengths.
    expect(() => checkPeriodsForRecord([3], 10 * 0.0003)).not.toThrow();
    expect(() => checkPeriodsForRecord([3.001], 10 * 0.0003)).toThrow(/more than 1000 times/);
  });
});
