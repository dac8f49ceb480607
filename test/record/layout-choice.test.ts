import { describe, expect, it } from 'vitest';
import {
  countHint,
  firstColumnIsTime,
  fixedHint,
  layoutWords,
  wrappedHint,
} from '../../src/record/layout-choice.js';

const rows = (...lines: string[]) => lines.map((l, i) => ({ fields: l.split(' '), line: i + 1 }));

describe('table or wrapped', () => {
  it('takes a first column rising by one step as time', () => {
    expect(firstColumnIsTime(rows('0 1', '0.01 2', '0.02 3'))).toBe(true);
    expect(firstColumnIsTime(rows('0 0 0', '0.001 0.002 0.004', '0.01 -0.02 0.03'))).toBe(false);
    expect(firstColumnIsTime(rows('0 1', '0.01 2 3'))).toBe(false); // rows of other widths
    expect(firstColumnIsTime(rows('0.5 1', '0.2 2'))).toBe(false); // falling
  });
});

describe('hints', () => {
  const seen = { firstLine: 5, perLine: 8, width: 13 };
  it('describe the layout seen and the options that would read it', () => {
    expect(layoutWords(seen)).toBe('8 values a line in fields of 13 after 4 header lines');
    expect(wrappedHint(seen)).toMatch(/try --layout wrapped --dt STEP/);
    expect(countHint({ firstLine: 3, perLine: 2 }, 8)).toBe(
      'line 3 has 2 values and this line 8; if lines 1 to 3 are part of the header, try --skip 3',
    );
    expect(fixedHint(seen)).toBe(
      'looks like 8 values a line in fields of 13 after 4 header lines; try --fixed 8x13',
    );
  });
});
