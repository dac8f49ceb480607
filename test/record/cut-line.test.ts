import { describe, expect, it } from 'vitest';
import { isQuakesweepError } from '../../src/base/errors.js';
import { cutValue, linesBefore } from '../../src/record/cut-line.js';
import { readRecordText } from '../../src/record/read.js';

// Invented files written with a fixed format (common practice: a fixed number of decimals or
// exponent digits per column); a last line cut mid-number prints shorter than those above it.

function refusal(read: () => unknown): string {
  try {
    read();
  } catch (error) {
    if (isQuakesweepError(error)) return error.describe();
    throw error;
  }
  throw new Error('read without a word');
}

const FIXED = Array.from({ length: 8 }, (_, i) => `${i + 1}.2345e-03`).join('\n');

describe('a last line cut short', () => {
  it('refuses a fixed-format file whose last value, with no line break, is printed shorter', () => {
    for (const tail of ['5.23', '5.2345e-0', '5.2345']) {
      const text = refusal(() =>
        readRecordText(`${FIXED}\n${tail}`, { units: 'g', dtS: 0.01, source: 'cut.txt' }),
      );
      expect(text).toMatch(/^cut\.txt:9: the file ends here with no line break, on '.*', printed shorter/);
    }
  });

  it('takes the same last value after a line break, and a whole last value with none', () => {
    expect(
      readRecordText(`${FIXED}\n5.23\n`, { units: 'g', dtS: 0.01, source: 'ok.txt' }).accelMS2.length,
    ).toBe(9);
    expect(
      readRecordText(`${FIXED}\n5.2345e-03`, { units: 'g', dtS: 0.01, source: 'ok.txt' }).accelMS2.length,
    ).toBe(9);
  });

  it('never judges free formats, nor a wrapped last line that is short of values', () => {
    expect(
      readRecordText('0.5\n0.25\n0.125\n0.75\n0.5', { units: 'g', dtS: 0.01, source: 'ok.txt' }).accelMS2
        .length,
    ).toBe(5);
    // Shortest round-trip output (String of a double): 17 digits, a shorter one by chance is whole.
    const shortest = [...Array(8).fill('0.12345678901234567'), '0.1234567890123'].join('\n');
    expect(readRecordText(shortest, { units: 'g', dtS: 0.01, source: 'ok.txt' }).accelMS2.length).toBe(9);
    const wrapped = `${Array(8).fill('1.50 2.50 3.50').join('\n')}\n1.50`;
    expect(readRecordText(wrapped, { units: 'g', dtS: 0.01, source: 'ok.txt' }).accelMS2.length).toBe(25);
  });

  it('compares each value with the ones in its column (a time column of its own shape)', () => {
    const before = Array.from({ length: 8 }, (_, i) => `0.0${i},${i + 1}.234e-03`);
    expect(cutValue(before, '0.08,4.2')).toBe('4.2');
    expect(cutValue(before, '0.08,4.234e-03')).toBeUndefined();
    expect(cutValue(before.slice(1), '0.08,4.2')).toBeUndefined(); // too few lines to judge
  });

  it('finds the complete lines before a point, across \\r\\n, skipping blank lines', () => {
    const text = 'a\r\nb\r\n\r\nc\nd';
    expect(linesBefore(text, text.indexOf('d'), 3)).toEqual(['b', 'c']); // 'a' may have begun earlier
    expect(linesBefore(text, text.indexOf('d'), 3, true)).toEqual(['a', 'b', 'c']);
  });
});
