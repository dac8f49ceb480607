import { describe, expect, it } from 'vitest';
import {
  expandTouching,
  fieldWidth,
  fixedFields,
  parseFixedWidths,
  splitTouching,
} from '../../src/record/fixed.js';

// Lines below are invented, in the fixed-width shapes Fortran's E and F formats write.

describe('declared widths', () => {
  it('parses count x width and lists of widths', () => {
    expect(parseFixedWidths('3x10')).toEqual([10, 10, 10]);
    expect(parseFixedWidths('8,12')).toEqual([8, 12]);
    expect(parseFixedWidths('2x5,9')).toEqual([5, 5, 9]);
    for (const bad of ['', 'x10', '0x10', '3x0', 'ten', '1001x1'])
      expect(() => parseFixedWidths(bad)).toThrow(/--fixed/);
  });

  it('cuts a line at the widths, the last repeating, a short last line leaving blanks off', () => {
    expect(fixedFields('1.000E-022.500E-02-3.00E-02', [9])).toEqual(['1.000E-02', '2.500E-02', '-3.00E-02']);
    expect(fixedFields('   0.01   1.5', [7])).toEqual(['0.01', '1.5']);
    expect(fixedFields('  0.0        ', [5])).toEqual(['0.0']);
    expect(fixedFields('  0.0       7', [5])).toEqual(['0.0', '', '7']); // a blank inside is kept
  });
});

describe('values that touch', () => {
  it('splits at a sign after a digit or a point, never inside an exponent', () => {
    expect(splitTouching('0.000E+00-1.145E-04')).toEqual(['0.000E+00', '-1.145E-04']);
    expect(splitTouching('1.5-2.5+3.')).toEqual(['1.5', '-2.5', '+3.']);
    expect(splitTouching('1.5E-04')).toBeNull(); // one number
    expect(splitTouching('1.0E-022.0E-02')).toBeNull(); // touching without a sign: declared widths only
    expect(splitTouching('abc-1')).toBeNull();
  });

  it('expands the fields of a line, the same array when nothing touches', () => {
    const plain = ['1', '2'];
    expect(expandTouching(plain)).toBe(plain);
    expect(expandTouching(['1', '2.0-3.0', '4'])).toEqual(['1', '2.0', '-3.0', '4']);
  });

  it('finds the width of right-aligned fields, or none', () => {
    expect(fieldWidth(' 1.381E-03-2.280E-04-1.094E-03')).toBe(10);
    expect(fieldWidth('   0.00000D+0  -2.52540D-5')).toBe(13);
    expect(fieldWidth('1 22 333')).toBeUndefined();
    expect(fieldWidth('0.5')).toBeUndefined();
  });
});
