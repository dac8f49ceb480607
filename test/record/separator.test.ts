import { describe, expect, it } from 'vitest';
import { MAX_LINE_CHARACTERS, sniffSeparator } from '../../src/record/separator.js';

describe('sniffSeparator', () => {
  it('reads the first line of numbers: semicolon, then tab, then comma, else spaces', () => {
    expect(sniffSeparator('0;0,1\n0,01;0,2\n', 0)).toBe(';');
    expect(sniffSeparator('0\t0.1\n', 0)).toBe('whitespace');
    expect(sniffSeparator('0,0.1\n', 0)).toBe(',');
    expect(sniffSeparator('0   0.1\n', 0)).toBe('whitespace');
    expect(sniffSeparator('0.1\n0.2\n', 0)).toBe('whitespace');
  });

  it('is not misled by a header in words, comments, blank lines, a BOM or skipped lines', () => {
    expect(sniffSeparator('time; accel, in g\n0 0.1\n', 0)).toBe('whitespace');
    expect(sniffSeparator('\ufeff# a, b; c\n\n0,0.1\n', 0)).toBe(',');
    expect(sniffSeparator('0;1\n0,0.1\n', 1)).toBe(',');
  });

  it('falls back to the first line of text, and to a comma when there is none', () => {
    expect(sniffSeparator('time;accel\n', 0)).toBe(';');
    expect(sniffSeparator('# only a comment\n', 0)).toBe(',');
    expect(sniffSeparator('', 0)).toBe(',');
  });

  it('ignores the cut last line of a partial text, and stops before an over-long line', () => {
    expect(sniffSeparator('time\taccel\n0;0', 0, true)).toBe('whitespace');
    expect(sniffSeparator('time\taccel\n0;0', 0, false)).toBe(';');
    const long = `0;${'1'.repeat(MAX_LINE_CHARACTERS)}`;
    expect(sniffSeparator(`time,accel\n${long}\n0 1\n`, 0)).toBe(',');
  });
});
