import { createReadStream, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { isQuakesweepError } from '../../src/base/errors.js';
import { parseNumber } from '../../src/record/number.js';
import { plausibilityWarnings } from '../../src/record/plausibility.js';
import { type ReadOptions, readRecordStream, readRecordText } from '../../src/record/read.js';
import { createRecord } from '../../src/record/record.js';

// Every record in these tests is invented for the test.

const base: ReadOptions = { source: 'rec.csv', units: 'm/s2' };

function read(text: string, options: Partial<ReadOptions> = {}) {
  return readRecordText(text, { ...base, ...options });
}

/** The typed error thrown by `run`, with its message and line. */
function failure(run: () => unknown) {
  try {
    run();
  } catch (error) {
    if (!isQuakesweepError(error)) throw error;
    return { kind: error.kind, line: error.line, file: error.file, message: error.message };
  }
  throw new Error('expected an error');
}

function values(record: { accelMS2: Float64Array }) {
  return Array.from(record.accelMS2);
}

/** Feed text to the stream reader in pieces of `size` bytes, cutting lines, CRLFs and characters. */
async function readInPieces(text: string, size: number, options: Partial<ReadOptions> = {}) {
  const bytes = new TextEncoder().encode(text);
  async function* pieces() {
    for (let i = 0; i < bytes.length; i += size) yield bytes.subarray(i, i + size);
  }
  return readRecordStream(pieces(), { ...base, ...options });
}

describe('layouts', () => {
  it('reads one value a line with the step from --dt', () => {
    const record = read('0.1\n0.2\n-0.3\n', { dtS: 0.01, layout: 'single' });
    expect(values(record)).toEqual([0.1, 0.2, -0.3]); // the values as written
    expect(record.dtS).toBe(0.01);
    expect(read('0.1\n0.2\n', { dtS: 0.01 }).accelMS2.length).toBe(2); // auto finds one column
  });

  it('reads a time and value table with a header row and # comments, the step from the time column', () => {
    const text = '# invented test record\ntime (s),accel\n0,1\n0.01,2\n# halfway\n0.02,3\n';
    const record = read(text);
    expect(values(record)).toEqual([1, 2, 3]);
    expect(record.dtS).toBeCloseTo(0.01, 12); // (0.02 − 0) / 2, closed form
  });

  it.each([
    ['commas', '0,1\n0.5,2\n1.0,3\n'],
    ['commas with spaces', '0 , 1\n0.5,  2\n1.0 ,3\n'],
    ['tabs', '0\t1\n0.5\t2\n1.0\t3\n'],
    ['semicolons', '0;1\n0.5;2\n1.0;3\n'],
    ['runs of spaces', '  0    1\n  0.5  2\n  1.0  3   \n'],
    ['spaces and tabs', '0 \t 1\n0.5\t\t2\n1.0 3\n'],
  ])('separates columns by %s', (_, text) => {
    const record = read(text);
    expect(values(record)).toEqual([1, 2, 3]);
    expect(record.dtS).toBe(0.5); // (1.0 − 0) / 2 exactly in binary
  });

  it('chooses the separator from the data, not from a header written in words', () => {
    expect(values(read('time; accel (g)\n0,1\n0.5,2\n'))).toEqual([1, 2]);
    expect(values(read('time, accel\n0\t1\n0.5\t2\n'))).toEqual([1, 2]);
  });

  it('picks the acceleration column with --column (1-based, column 1 is time, or a name), none by default of several', () => {
    const text = 't,a,b,c\n0,1,10,100\n0.02,2,20,200\n0.04,3,30,300\n';
    expect(values(read(text, { column: 2 }))).toEqual([1, 2, 3]);
    expect(values(read(text, { column: 3 }))).toEqual([10, 20, 30]);
    expect(values(read(text, { column: 'C' }))).toEqual([100, 200, 300]); // names in any case
    expect(failure(() => read(text)).message).toBe(
      'rec.csv has 4 columns (t, a, b, c): choose the acceleration with --column (a name or a number from 2 to 4)',
    );
    expect(values(read('t,a\n0,1\n0.02,2\n'))).toEqual([1, 2]); // one value column: no need to choose
  });

  it('keeps the message one line when column names hold separators or control characters', () => {
    // Invented names with a line and a paragraph separator (U+2028, U+2029) in them.
    const text = 't,a\u2028x,b\u2029,c\n0,1,10,100\n0.02,2,20,200\n';
    const message = failure(() => read(text)).message;
    expect(message).toBe(
      'rec.csv has 4 columns (t, a\\u2028x, b, c): choose the acceleration with --column (a name or a number from 2 to 4)',
    );
    expect(failure(() => read(text, { column: 'z' })).message).toMatch(/its columns: t, a\\u2028x, b, c$/);
  });

  it('reads values wrapped several a line, in row order, after --skip header lines', () => {
    const text = 'INVENTED STATION\nnpts 7 dt 0.02\n1 2 3\n4 5 6\n7\n';
    const record = read(text, { layout: 'wrapped', skip: 2, dtS: 0.02 });
    expect(values(record)).toEqual([1, 2, 3, 4, 5, 6, 7]);
    expect(record.dtS).toBe(0.02);
  });

  it('chooses the separator past a long --skip header, in memory and through the stream', async () => {
    // 3000 header lines with commas (over 64 KiB), then space-separated data.
    const header = Array.from(
      { length: 3000 },
      (_, i) => `header line ${i}, of the invented file, ${'x'.repeat(20)}`,
    );
    const text = `${header.join('\n')}\n0  1\n0.5  2\n1.0  3\n`;
    expect(values(read(text, { skip: 3000 }))).toEqual([1, 2, 3]);
    expect(values(await readInPieces(text, 4096, { skip: 3000 }))).toEqual([1, 2, 3]);
  });

  it('skips --skip lines before a table too, and counts lines from the top of the file', () => {
    const text = 'junk: 1,2;3\nmore junk\n0,1\n0.1,2\n0.2,x\n';
    expect(failure(() => read(text, { skip: 2 })).line).toBe(5);
  });
});

describe('number forms and line ends', () => {
  it('parses Fortran exponents with D or d', () => {
    // 1.5D-03 is Fortran's double-precision 1.5 × 10⁻³ (common practice in record files).
    expect(parseNumber('1.5D-03')).toBe(1.5e-3);
    expect(parseNumber('1.5d+2')).toBe(150);
    expect(parseNumber('-2.5E-1')).toBe(-0.25);
    expect(parseNumber('.5')).toBe(0.5);
    expect(parseNumber('3.')).toBe(3);
    expect(values(read('1.5D-03\n1.5d+2\n', { dtS: 0.01 }))).toEqual([1.5e-3, 150]);
  });

  it('refuses NaN, infinities, overflow and other words', () => {
    for (const text of ['NaN', 'Infinity', '-Infinity', 'inf', '1e999', '0x10', '1,5', '', '1.2.3', '1e'])
      expect(parseNumber(text)).toBeNaN();
  });

  it('reads CRLF and CR line ends and a UTF-8 byte-order mark', () => {
    expect(values(read('\ufefftime,a\r\n0,1\r\n0.1,2\r\n', {}))).toEqual([1, 2]);
    expect(values(read('0,1\r0.1,2\r0.2,3', {}))).toEqual([1, 2, 3]);
  });

  it('reads the same through the stream in 1-byte pieces (CRLF, BOM and é split across pieces)', async () => {
    const text = '\ufeff# séisme inventé\r\ntime,a\r\n0,1\r\n0.1,2\r\n0.2,3\r\n';
    const record = await readInPieces(text, 1);
    expect(values(record)).toEqual([1, 2, 3]);
    expect(record.dtS).toBeCloseTo(0.1, 12);
  });
});

describe('decimal commas', () => {
  // Decision: a comma is a decimal mark only in a file separated by semicolons, where it cannot
  // separate fields, and only if the whole file writes its decimals that way.
  it('reads decimal commas in a file separated by semicolons, time column included', () => {
    const record = read('t;a\n0;0,5\n0,01;-1,25\n0,02;2,0D-1\n');
    expect(values(record)).toEqual([0.5, -1.25, 0.2]);
    expect(record.dtS).toBeCloseTo(0.01, 12);
  });

  it('refuses a semicolon file that mixes decimal points and decimal commas, naming the line', () => {
    const error = failure(() => read('0;0,5\n0,01;1,5\n0,02;2.5\n'));
    expect(error.line).toBe(3);
    expect(error.message).toMatch(/decimal '\.'.*line 1 used ','/);
  });

  it('reads decimal commas in a tab-separated file (a comma cannot separate there), one mark a file', () => {
    const record = read('0,0000\t0,0000\n0,0125\t-0,0031\n0,0250\t0,0100\n');
    expect(values(record)).toEqual([0, -0.0031, 0.01]); // the values as written
    expect(record.dtS).toBeCloseTo(0.0125, 15); // (0.025 − 0) / 2
    const mixed = failure(() => read('0,0\t0,5\n0.01\t1.5\n'));
    expect(mixed.line).toBe(2);
    expect(mixed.message).toMatch(/a decimal '\.' here, but line 1 used ','/);
  });

  it('still refuses a comma value where commas may separate, naming where they are read', () => {
    const error = failure(() => read('0 0,5\n0.01 1,5\n'));
    expect(error.message).toMatch(/not a number/);
  });
});

describe('time column', () => {
  it('names the line where the step changes', () => {
    const error = failure(() => read('t,a\n0,1\n0.01,2\n0.02,3\n0.04,4\n0.05,5\n'));
    expect(error.line).toBe(5);
    expect(error.message).toMatch(/the time step changes here: 0\.02 s after 0\.01 s/);
  });

  it('refuses a repeated or decreasing time, naming the line', () => {
    expect(failure(() => read('0,1\n0.01,2\n0.01,3\n')).line).toBe(3);
    expect(failure(() => read('0,1\n0.01,2\n0.005,3\n')).line).toBe(3);
    expect(failure(() => read('0,1\n0.01,2\n0.005,3\n')).message).toMatch(/time does not increase/);
  });

  it('accepts times rounded to their printed digits (k/256 s written to 4 decimals)', () => {
    // Closed form: t_k = k / 256 s, printed with toFixed(4); the mean step recovers 1/256 s.
    const lines = Array.from({ length: 2561 }, (_, k) => `${(k / 256).toFixed(4)},${k % 7}`);
    const record = read(lines.join('\n'));
    expect(record.dtS).toBeCloseTo(1 / 256, 9);
    expect(record.accelMS2.length).toBe(2561);
  });

  it('refuses a jump of one printed digit when that digit is the step itself', () => {
    expect(failure(() => read('0,1\n0.01,2\n0.03,3\n')).line).toBe(3);
  });

  it('refuses --dt that disagrees with the time column', () => {
    expect(failure(() => read('0,1\n0.01,2\n', { dtS: 0.02 })).message).toMatch(/--dt 0\.02 disagrees/);
  });
});

describe('units', () => {
  // Each factor is checked against its definition, written out here, not taken from units.ts.
  it.each([
    ['g', 9.80665], // standard gravity, exact by definition (CGPM 1901)
    ['m/s2', 1],
    ['cm/s2', 0.01],
    ['gal', 0.01], // 1 gal = 1 cm/s² (definition of the gal)
    ['mm/s2', 0.001],
    ['in/s2', 0.0254], // 1 in = 0.0254 m exactly (international yard and pound agreement, 1959)
    ['ft/s2', 12 * 0.0254], // 1 ft = 12 in = 0.3048 m exactly (same agreement)
  ] as const)('converts %s to m/s²', (units, metresPerSecondSquared) => {
    const record = read('2.5\n-4\n', { units, dtS: 0.01 });
    expect(record.accelMS2[0]).toBeCloseTo(2.5 * metresPerSecondSquared, 14);
    expect(record.accelMS2[1]).toBeCloseTo(-4 * metresPerSecondSquared, 14);
    expect(record.unitsRead).toBe(units);
  });

  it('checks 1 ft = 0.3048 m as the agreement states it', () => {
    expect(read('1\n1\n', { units: 'ft/s2', dtS: 0.01 }).accelMS2[0]).toBeCloseTo(0.3048, 15);
  });
});

describe('unit warnings', () => {
  const record = (peak: number, units: 'g' | 'gal' | 'm/s2', factor: number) =>
    createRecord({ name: 'r', dtS: 0.01, accelMS2: Float64Array.from([0, peak * factor]), unitsRead: units });

  it('warns above 5 g, naming the unit read and a unit that would fit', () => {
    // 981 read in g: the same numbers in cm/s2 would be 981 / 980.665 ≈ 1.00 g (closed form).
    const warnings = plausibilityWarnings(record(981, 'g', 9.80665));
    // and PGV: a jump to 981 g within 0.01 s is ½·9620·0.01 ≈ 48 m/s (trapezoid, closed form)
    expect(warnings).toHaveLength(2);
    expect(warnings[1]).toMatch(/^PGV 48\.1 m\/s is above 5 m\/s/);
    expect(warnings[0]).toMatch(/read in g is above 5 g/);
    expect(warnings[0]).toMatch(/in cm\/s2 it would be 1\.00 g/);
  });

  it('warns below 0.001 g and not inside the range (common practice thresholds)', () => {
    expect(plausibilityWarnings(record(0.5e-3, 'g', 9.80665))[0]).toMatch(/below 0\.001 g/);
    expect(plausibilityWarnings(record(300, 'gal', 0.01))).toEqual([]); // 3 m/s² ≈ 0.31 g
    expect(plausibilityWarnings(record(5, 'g', 9.80665))).toEqual([]); // the bound itself
    expect(plausibilityWarnings(record(1e-3, 'g', 9.80665))).toEqual([]);
  });
});

describe('bad input is refused with the line', () => {
  it.each([
    ['a word', '0,1\n0.01,abc\n', 2, /'abc' is not a number/],
    ['NaN', '0.1\nNaN\n0.3\n', 2, /'NaN' is not a number/],
    ['Infinity', '0.1\n0.2\nInfinity\n', 3, /'Infinity' is not a number/],
    ['-Infinity', '0,1\n0.01,-Infinity\n', 2, /'-Infinity' is not a number/],
    ['an overflow', '0.1\n1e999\n', 2, /'1e999' is not a number/],
    ['an empty value', '0,1\n0.01,\n0.02,3\n', 2, /empty value in column 2/],
    ['an empty value', 't,a\n0,1\n0.01,\n', 3, /empty value in column 2/],
    ['too few columns', '0,1\n0.01,2\n0.02\n', 3, /expected 2 columns, found 1 column/],
    ['too many columns', '0 1\n0.01 2\n0.02 3 4\n', 3, /expected 2 columns, found 3 columns/],
    ['a header line of words among the values', 'time,a\n0,1\nseconds,g\n', 3, /'seconds' is not a number/],
    ['a header row only', 'time,accel\n', 1, /a header row but no values after it/],
    ['a header row and comments only', '# x\n\ntime,accel\n# y\n', 3, /a header row but no values/],
    ['one sample', 'time,a\n0,1\n', 2, /only 1 sample/],
    ['NUL bytes', '0.1\n0.2\n\u0000\u0001\u0002\n', 3, /binary data, not a text record/],
    ['bytes that are not UTF-8', '0.1\n\ufffd\ufffdP\n', 2, /binary data/],
  ])('%s', (_, text, line, message) => {
    const error = failure(() =>
      read(text, { dtS: text.includes(',') || text.includes(' ') ? undefined : 0.01 }),
    );
    expect(error.kind).toBe('input');
    expect(error.file).toBe('rec.csv');
    expect(error.line).toBe(line);
    expect(error.message).toMatch(message);
  });

  it('refuses an empty file and a file of comments, naming the file', () => {
    for (const text of ['', '\n\n', '# only\n# comments\n']) {
      const error = failure(() => read(text, { dtS: 0.01 }));
      expect(error.file).toBe('rec.csv');
      expect(error.message).toMatch(/no values found/);
    }
  });

  it('refuses random bytes through the stream with a line, not a fault', async () => {
    // Fixed pseudo-random bytes (a linear congruential generator, Knuth's MMIX constants) so the
    // test is the same every run.
    const bytes = new Uint8Array(4096);
    let state = 12345n;
    for (let i = 0; i < bytes.length; i++) {
      state = (state * 6364136223846793005n + 1442695040888963407n) & 0xffffffffffffffffn;
      bytes[i] = Number(state >> 56n);
    }
    async function* pieces() {
      yield bytes;
    }
    const error = await readRecordStream(pieces(), { ...base, dtS: 0.01 }).then(
      () => undefined,
      (e: unknown) => e,
    );
    expect(isQuakesweepError(error) && error.kind).toBe('input');
    expect(isQuakesweepError(error) && error.line).toBeGreaterThanOrEqual(1);
  });

  it('refuses options that cannot apply, as usage errors', () => {
    expect(failure(() => read('1\n2\n')).message).toMatch(/give the time step with --dt/);
    expect(failure(() => read('1\n2\n', { layout: 'wrapped' })).kind).toBe('usage');
    expect(failure(() => read('0,1\n0.1,2\n', { column: 1 })).message).toMatch(/column 1 is time/);
    expect(failure(() => read('0,1\n0.1,2\n', { column: 3 })).message).toMatch(/has 2 columns/);
    expect(failure(() => read('0,1\n0.1,2\n', { layout: 'single', dtS: 0.1 })).line).toBe(1);
    expect(failure(() => read('1\n2\n', { layout: 'table' })).line).toBe(1);
    expect(failure(() => read('1 2\n', { layout: 'wrapped', dtS: 0.1, column: 2 })).kind).toBe('usage');
  });
});

describe('large files', () => {
  const folder = mkdtempSync(join(tmpdir(), 'quakesweep-read-'));
  afterAll(() => rmSync(folder, { recursive: true, force: true }));

  it('streams 2,000,000 lines from a file and keeps every value', async () => {
    // Closed form: a_k = 0.3 sin(0.001 k), written to 6 decimals, so each read value is within
    // 5e-7 of it.
    const count = 2_000_000;
    const path = join(folder, 'big.txt');
    const parts: string[] = [];
    for (let k = 0; k < count; k++) parts.push((0.3 * Math.sin(0.001 * k)).toFixed(6));
    writeFileSync(path, `${parts.join('\n')}\n`);
    parts.length = 0;
    const record = await readRecordStream(createReadStream(path), {
      source: path,
      units: 'm/s2',
      dtS: 0.005,
    });
    expect(record.accelMS2).toBeInstanceOf(Float64Array);
    expect(record.accelMS2.length).toBe(count);
    let worst = 0;
    for (let k = 0; k < count; k++)
      worst = Math.max(worst, Math.abs(record.accelMS2[k] - 0.3 * Math.sin(0.001 * k)));
    expect(worst).toBeLessThanOrEqual(5.000001e-7);
  });
});

describe('a first field of nearly 1 MB', () => {
  it('is taken as a header and skipped at once, in memory and from a stream', async () => {
    // Invented file: a first line of 999,000 digits and a letter (no number), then two rows.
    // Generous bound on purpose (speed is measured in bench/read.js): the earlier number pattern
    // backtracked quadratically here, for minutes.
    const text = `${'1'.repeat(999_000)}x,accel\n0,0.5\n0.01,-0.25\n`;
    const start = performance.now();
    expect(values(read(text))).toEqual([0.5, -0.25]);
    expect(values(await readInPieces(text, 65_536))).toEqual([0.5, -0.25]);
    expect(performance.now() - start).toBeLessThan(2000);
  });
});
