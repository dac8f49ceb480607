import { describe, expect, it } from 'vitest';
import { checkSuite, SUITE_CHECK_CRITERION, structurePeriodRange } from '../../src/batch/suite-check.js';

// Invented suite means against an invented flat target of 1 g; the ratios are worked by hand.
const periodsS = [0, 0.1, 0.2, 0.5, 1, 2, 3];
const target = [1, 1, 1, 1, 1, 1, null];
const mean = [1.2, 0.5, 0.95, 0.92, 0.97, 1.1, 0.1];

describe('structurePeriodRange', () => {
  it('is 0.2T to 2T (common practice)', () => {
    expect(structurePeriodRange(1)).toEqual([0.2, 2]);
    expect(structurePeriodRange(0.5)).toEqual([0.1, 1]);
  });
});

describe('checkSuite', () => {
  const options = { fraction: 0.9, rangeS: [0.2, 2] as const, rangeSource: 'test' };

  it('takes the least ratio of mean to target at the grid periods in the range, both ends included (by hand)', () => {
    const check = checkSuite(periodsS, mean, target, options);
    expect(check.pass).toBe(true); // least 0.92 ≥ 0.9; the 0.5 at 0.1 s lies outside the range
    expect(check.worstRatio).toBeCloseTo(0.92, 15);
    expect(check.worstPeriodS).toBe(0.5);
    expect(check.periodCount).toBe(4);
    expect(check.checkedRangeS).toEqual([0.2, 2]);
    expect(check.inRange).toEqual([false, false, true, true, true, true, false]);
    expect(check.ratios).toEqual([1.2, 0.5, 0.95, 0.92, 0.97, 1.1, null]);
    expect(check.criterion).toBe(SUITE_CHECK_CRITERION);
    expect(check.warnings[0]).toMatch(/only 4 grid periods in the check range/);
  });

  it('fails when a ratio is below the fraction, and passes at exactly the fraction', () => {
    expect(checkSuite(periodsS, mean, target, { ...options, fraction: 0.93 }).pass).toBe(false);
    expect(checkSuite(periodsS, mean, target, { ...options, fraction: 0.92 }).pass).toBe(true);
    const wide = checkSuite(periodsS, mean, target, { ...options, rangeS: [0.05, 2] });
    expect(wide.pass).toBe(false);
    expect(wide.worstPeriodS).toBe(0.1);
  });

  it('refuses a range with no grid period, one where the target is not defined, and a fraction ≤ 0', () => {
    expect(() => checkSuite(periodsS, mean, target, { ...options, rangeS: [0.25, 0.45] })).toThrow(
      'no period of the grid lies in the check range 0.25–0.45 s',
    );
    expect(() => checkSuite(periodsS, mean, target, { ...options, rangeS: [1, 3] })).toThrow(
      'the check range reaches T = 3 s, where the target is not defined',
    );
    expect(() => checkSuite(periodsS, mean, target, { ...options, fraction: 0 })).toThrow('above 0');
  });
});
