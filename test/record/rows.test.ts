import { describe, expect, it } from 'vitest';
import { readRecordText } from '../../src/record/read.js';
import { type RowLayout, RowScanner } from '../../src/record/rows.js';

// The WebAssembly row scanner (assembly/rows.ts) reads runs of numeric rows for the reader; it
// must read them with the values Number() gives (ECMAScript's correctly rounded decimal
// conversion is the oracle for the digits), and stop before any other line, which the reader
// then reads itself. Whole files are checked against the TypeScript reader alone in
// lines.test.ts, on every input of its property tests.

// Values in m/s² (a factor of 1), so that the values read are the numbers written; the test of
// the factor is below.
const layout = (overrides: Partial<RowLayout> = {}): RowLayout => ({
  columns: 2,
  valueColumn: 2,
  whitespace: false,
  unitMS2: 1,
  limitMS2: 1e6,
  count: 1,
  timeFirstS: 0,
  timePreviousS: 0,
  ...overrides,
});

function scan(text: string, overrides: Partial<RowLayout> = {}) {
  const scanner = RowScanner.get();
  if (scanner === null) throw new Error('no WebAssembly on this engine');
  const result = scanner.scan(text, 0, layout(overrides));
  return { ...result, values: Array.from(result.values) };
}

describe('the WebAssembly row scanner', () => {
  it('reads rows ended by \\n and \\r\\n, blanks around fields, and skips empty lines', () => {
    const text = '0.01,1.5\n0.02 , 2.5\r\n\n  0.03,-3e-2\n0.04,+.25\n';
    expect(scan(text)).toMatchObject({
      next: text.length,
      lines: 5,
      values: [1.5, 2.5, -0.03, 0.25],
      timePreviousS: 0.04,
      refused: false,
    });
  });

  it('reads rows separated by runs of spaces and tabs, and one value a line', () => {
    expect(scan('  0.01 \t 7\n0.02\t\t8  \n', { whitespace: true }).values).toEqual([7, 8]);
    expect(scan('7\n-8.5\n1e3\n', { columns: 1, valueColumn: 1 }).values).toEqual([7, -8.5, 1000]);
  });

  it.each([
    ['a comment', '0.01,1\n# note\n0.02,2\n'],
    ['a word', '0.01,1\n0.02,abc\n'],
    ['a D exponent', '0.01,1\n0.02,1.5D-03\n'],
    ['16 significant digits', '0.01,1\n0.02,1.234567890123456\n'],
    ['a scale beyond 10^22', '0.01,1\n0.02,1e23\n'],
    ['a missing column', '0.01,1\n0.02\n'],
    ['an extra comma', '0.01,1\n0.02,2,\n'],
    ['a character outside ASCII', '0.01,1\n0.02,2°\n'],
    ['a lone carriage return', '0.01,1\n0.02,2\r0.03,3\n'],
    ['a time that does not increase', '0.01,1\n0.01,2\n'],
    ['a step that changes', '0.01,1\n0.035,2\n'],
    ['a value above the limit (10⁶ m/s² here)', '0.01,1\n0.02,2e6\n'],
    ['a line of blanks', '0.01,1\n   \n'],
  ])('stops before %s, after the rows before it', (_, text) => {
    // Two samples before, at −0.01 s and 0 s: the step is 0.01 s from the first row on.
    const result = scan(text, { count: 2, timeFirstS: -0.01 });
    expect(result.refused).toBe(true);
    expect(result.values).toEqual([1]);
    expect(result.next).toBe(text.indexOf('\n') + 1);
  });

  it("stores each value times the unit's factor (m/s²)", () => {
    const text = '0.01,1.5\n0.02,-0.3\n0.03,0.123456789\n';
    expect(scan(text, { unitMS2: 9.80665, limitMS2: 9.80665e6 }).values).toEqual([
      1.5 * 9.80665,
      -0.3 * 9.80665,
      0.123456789 * 9.80665,
    ]);
    // The limit applies to the value in m/s²: 2·10⁵ g passes 10⁶ m/s² only as 2·10⁵ m/s².
    expect(scan('0.01,2e5\n', { unitMS2: 9.80665, limitMS2: 1e6 }).refused).toBe(true);
    expect(scan('0.01,2e5\n', { unitMS2: 1, limitMS2: 1e6 }).refused).toBe(false);
  });

  it('stops, without refusing, at a line with no end yet and at a carriage return that ends the text', () => {
    expect(scan('0.01,1\n0.02,2')).toMatchObject({ values: [1], lines: 1, refused: false });
    expect(scan('0.01,1\n0.02,2\r')).toMatchObject({ values: [1], lines: 1, refused: false });
  });

  it('gives the values Number() gives for decimals of up to 15 digits (correct rounding)', () => {
    // A fixed pseudo-random sequence (a linear congruential generator, common practice).
    let seed = 12345;
    const next = () => {
      seed = (seed * 1103515245 + 12345) % 2 ** 31;
      return seed / 2 ** 31;
    };
    const fields: string[] = [];
    for (let i = 0; i < 3000; i++) {
      const digits = 1 + Math.floor(next() * 15);
      let mantissa = '';
      for (let d = 0; d < digits; d++) mantissa += Math.floor(next() * 10);
      const point = Math.floor(next() * (digits + 1));
      let field = `${mantissa.slice(0, point)}.${mantissa.slice(point)}`;
      if (field === '.') field = '0';
      if (next() < 0.5) field += `e${Math.floor(next() * 15) - 7}`;
      if (next() < 0.3) field = `-${field}`;
      fields.push(field);
    }
    const text = fields.map((f) => `${f}\n`).join('');
    const result = scan(text, { columns: 1, valueColumn: 1, limitMS2: Number.POSITIVE_INFINITY });
    expect(result.refused).toBe(false);
    expect(result.values).toEqual(fields.map(Number));
  });

  it('reads most of a whole file, and the reader gives the same record as its own rows would', () => {
    const lines = ['time_s,accel_g'];
    for (let i = 0; i < 5000; i++) lines.push(`${(i * 0.01).toFixed(2)},${Math.sin(i / 7).toFixed(6)}`);
    const text = `${lines.join('\n')}\n`;
    const record = readRecordText(text, { units: 'g', source: 'rows.csv' });
    expect(record.accelMS2).toHaveLength(5000);
    for (let i = 0; i < 5000; i++) {
      expect(record.accelMS2[i]).toBe(Number(Math.sin(i / 7).toFixed(6)) * 9.80665);
    }
    expect(record.dtS).toBeCloseTo(0.01, 12);
    // The scanner itself takes every row after the first.
    const after = text.indexOf('\n', text.indexOf('\n') + 1) + 1;
    const run = RowScanner.get()?.scan(
      text,
      after,
      layout({ timePreviousS: 0, timeFirstS: 0, unitMS2: 9.80665 }),
    );
    expect(run?.values.length).toBe(4999);
  });
});

describe('the text the scanner holds', () => {
  it('reads on in the text it copied, one byte a character, past characters outside ASCII', () => {
    const scanner = RowScanner.get();
    if (scanner === null) throw new Error('no WebAssembly on this engine');
    // Line 2 has two characters outside ASCII (é, and 😀 as two UTF-16 units); after it, the
    // rows are found at their character offsets in the text without copying it again.
    const text = '0.01,1\n# é 😀\n0.02,2\n0.03,3\n';
    const first = scanner.scan(text, 0, layout());
    expect(first).toMatchObject({ lines: 1, refused: true, next: 7 });
    const after = text.indexOf('0.02');
    const second = scanner.scan(text, after, layout({ count: 2, timeFirstS: 0, timePreviousS: 0.01 }));
    expect(Array.from(second.values)).toEqual([2, 3]);
    expect(second).toMatchObject({ next: text.length, lines: 2, refused: false });
  });

  it('reads another string, and lays out anew from the line cut at the end of what it holds', () => {
    const scanner = RowScanner.get();
    if (scanner === null) throw new Error('no WebAssembly on this engine');
    scanner.scan('0.01,1\n0.02,2\n', 0, layout());
    expect(Array.from(scanner.scan('0.01,5\n', 0, layout()).values)).toEqual([5]);
    // 30,000 lines of 11 characters (the line end included): 330,000 characters, more than the
    // 2¹⁸ = 262,144 it lays out at a time, so the first scan stops, unrefused, before the line cut
    // there: ⌊262,144 / 11⌋ = 23,831 lines read, up to 23,831 × 11 = 262,141.
    const rows = Array.from({ length: 30_000 }, (_, i) => `${String(i + 1).padStart(6, '0')},${i % 10}.5`);
    const text = `${rows.join('\n')}\n`;
    const first = scanner.scan(text, 0, layout({ timePreviousS: 0 }));
    expect(first).toMatchObject({ lines: 23_831, next: 262_141, refused: false });
    const count = 1 + first.lines;
    const second = scanner.scan(text, first.next, layout({ count, timePreviousS: first.timePreviousS }));
    expect(second).toMatchObject({ lines: 30_000 - 23_831, next: text.length, refused: false });
    expect(second.values[0]).toBe(1.5); // line 23,831 from 0: 23,831 mod 10 = 1
  });
});
