import { writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { isQuakesweepError } from '../../src/base/errors.js';
import type { ReadOptions } from '../../src/record/read.js';
import { readRecordText } from '../../src/record/read.js';
import { RecordReader } from '../../src/record/reader.js';
import { RowScanner } from '../../src/record/rows.js';
import { useCliFolder } from '../helpers/cli-folder.js';

// The record reader takes rows one at a time (row()) or in runs from the row scanner (rowsFrom())
// and keeps the samples in m/s². Expected values are written out by hand below; the unit factors
// are their definitions (standard gravity 9.80665 m/s², CGPM 1901; 1 gal = 1 cm/s²; from memory).

const G = 9.80665;
const SOURCE = 'invented/site-a.csv';

function rows(reader: RecordReader, lines: string[][], first = 1): void {
  for (const [i, fields] of lines.entries()) reader.row(fields, first + i);
}

/** The error a reading throws: its kind, and the one line a person sees. */
function refusal(read: () => unknown): { kind: string; text: string } {
  try {
    read();
  } catch (error) {
    if (!isQuakesweepError(error)) throw error;
    return { kind: error.kind, text: error.describe() };
  }
  throw new Error('read without a word');
}

describe('rows one at a time', () => {
  it('takes one header row of names, then times and values, in m/s², the step from the time column', () => {
    const reader = new RecordReader({ units: 'g', source: SOURCE }, null);
    rows(reader, [
      ['time_s', 'accel_g'],
      ['0', '0.5'],
      ['0.02', '-0.25'],
      ['0.04', '1'],
    ]);
    const record = reader.finish();
    expect(Array.from(record.accelMS2)).toEqual([0.5 * G, -0.25 * G, G]);
    expect(record.dtS).toBeCloseTo(0.02, 15); // (0.04 − 0) / 2
    expect(record.name).toBe('site-a'); // the file's base name without extension
    expect(record.unitsRead).toBe('g');
  });

  it('reads cm/s² (gal) as hundredths of m/s², the chosen column, and checks the others are numbers', () => {
    const reader = new RecordReader({ units: 'cm/s2', column: 2, source: SOURCE, name: 'x' }, null);
    rows(reader, [
      ['0', '150', '7'],
      ['0.01', '-20', '8'],
    ]);
    expect(Array.from(reader.finish().accelMS2)).toEqual([150 * 0.01, -20 * 0.01]);
    const bad = new RecordReader({ units: 'cm/s2', column: 2, source: SOURCE }, null);
    rows(bad, [['0', '150', '7']]);
    expect(refusal(() => bad.row(['0.01', '-20', 'n/a'], 2)).text).toBe(`${SOURCE}:2: 'n/a' is not a number`);
  });

  it('reads values wrapped several a line in row order, with the step given', () => {
    const reader = new RecordReader({ units: 'm/s2', layout: 'wrapped', dtS: 0.005, source: SOURCE }, null);
    rows(reader, [['1', '2', '3'], ['4'], ['5', '6']]);
    const record = reader.finish();
    expect(Array.from(record.accelMS2)).toEqual([1, 2, 3, 4, 5, 6]);
    expect(record.dtS).toBe(0.005);
  });
});

describe('refusals: the file, the line, and the kind that makes the CLI exit 2', () => {
  const table = (lines: string[][], options: Partial<ReadOptions> = {}) =>
    refusal(() => {
      const reader = new RecordReader({ units: 'g', source: SOURCE, ...options }, null);
      rows(reader, lines);
      return reader.finish();
    });

  it.each([
    ['a missing column', [['0', '1'], ['0.01']], `${SOURCE}:2: expected 2 columns, found 1 column`],
    [
      'an extra column',
      [
        ['0', '1'],
        ['0.01', '2', '3'],
      ],
      `${SOURCE}:2: expected 2 columns, found 3 columns (line 1 has 2 values and this line 3; if line 1 is part of the header, try --skip 1)`,
    ],
    [
      'a time that goes back',
      [
        ['0', '1'],
        ['0.01', '2'],
        ['0.005', '3'],
      ],
      `${SOURCE}:3: time does not increase: 0.005 s after 0.01 s (looks like 2 values a line with no time column; try --layout wrapped --dt STEP (or state the step in the header, e.g. 'dt = 0.01 s'))`,
    ],
    [
      // The step 0.01 s, then 0.02 s: off the mean by far more than a last printed digit.
      'a step that changes',
      [
        ['0', '1'],
        ['0.01', '2'],
        ['0.03', '3'],
      ],
      `${SOURCE}:3: the time step changes here: 0.02 s after 0.01 s; the step must be uniform (looks like 2 values a line with no time column; try --layout wrapped --dt STEP (or state the step in the header, e.g. 'dt = 0.01 s'))`,
    ],
    [
      'a value beyond 10⁶ g',
      [
        ['0', '1'],
        ['0.01', '2e6'],
      ],
      `${SOURCE}:2: 2000000 g is above 1e+6 g, which no ground motion reaches in any unit`,
    ],
    [
      'an empty value',
      [
        ['0', '1'],
        ['0.01', ''],
      ],
      `${SOURCE}:2: empty value in column 2`,
    ],
    [
      'a control character',
      [
        ['0', '1'],
        ['0.01', '2\u0001'],
      ],
      `${SOURCE}:2: binary data, not a text record`,
    ],
    [
      'one sample only',
      [
        ['t', 'a'],
        ['0', '1'],
      ],
      `${SOURCE}:2: only 1 sample; a record needs at least 2`,
    ],
    [
      'a header and nothing after it',
      [['time', 'accel']],
      `${SOURCE}:1: a header row but no values after it`,
    ],
  ])('refuses %s', (_, lines, text) => {
    expect(table(lines)).toEqual({ kind: 'input', text });
  });

  it('skips header lines before the data, and refuses a file with no row at all without a line', () => {
    expect(
      table([
        ['time', 'accel'],
        ['t', 'a'],
      ]).text,
    ).toBe(
      `${SOURCE}: no values found: the file is empty or holds only comments and blank lines, or only 2 lines of header text`,
    );
    expect(table([])).toEqual({
      kind: 'input',
      text: `${SOURCE}: no values found: the file is empty or holds only comments and blank lines`,
    });
  });

  it('refuses options that cannot apply as usage errors', () => {
    // Without --dt a single layout needs the header's step: refused at the first row when it states none.
    expect(table([['1'], ['2']], { layout: 'single' }).text).toBe(
      `${SOURCE} has one value a line and no time column: give the time step with --dt (the header states none)`,
    );
    expect(refusal(() => new RecordReader({ units: 'g', dtS: -1, source: SOURCE }, null)).text).toBe(
      '--dt must be a positive number of seconds, got -1',
    );
    expect(table([['0', '1']], { column: 3 }).text).toBe(
      `--column 3: ${SOURCE} has 2 columns; column 1 is time, so choose 2 to 2`,
    );
  });

  it('names the line counted from the top of the file, skipped lines included', () => {
    const text = 'made up\nby hand\n0,1\n0.01,2\n0.02,x\n';
    expect(refusal(() => readRecordText(text, { units: 'g', skip: 2, source: SOURCE })).text).toBe(
      `${SOURCE}:5: 'x' is not a number`,
    );
  });

  const cli = useCliFolder('quakesweep-reader-');
  it('exits 2 with that one line from the CLI', async () => {
    writeFileSync(join(cli.path, 'bad.csv'), 'time,accel\n0,0.1\n0.01,0.2\n0.02\n');
    const result = await cli.run('info', 'bad.csv', '--units', 'g');
    expect(result.code).toBe(2);
    expect(result.stderr).toContain('bad.csv:4: expected 2 columns, found 1 column');
  });
});

describe('runs of rows from the row scanner', () => {
  const scanner = RowScanner.get();
  if (scanner === null) throw new Error('no WebAssembly on this engine');

  it('reads on from the first row up to a line it does not read, which row() then takes', () => {
    // Line 1 is the first row (read by row()); lines 2–3 are plain rows, line 4 has a comment.
    const text = '0.01,2\n0.02,3\n0.03,4 # peak\n0.04,5\n';
    const fast = new RecordReader({ units: 'm/s2', source: SOURCE }, scanner);
    fast.row(['0', '1'], 1);
    expect(fast.readsRows).toBe(true);
    const run = fast.rowsFrom(text, 0);
    expect(run).toEqual({ next: text.indexOf('0.03'), lines: 2 });
    fast.row(['0.03', '4'], 4);
    expect(fast.rowsFrom(text, text.indexOf('0.04'))).toEqual({ next: text.length, lines: 1 });
    fast.textDone();
    const record = fast.finish();
    expect(Array.from(record.accelMS2)).toEqual([1, 2, 3, 4, 5]);
    expect(record.dtS).toBeCloseTo(0.01, 15); // (0.04 − 0) / 4
  });

  it('is not used for semicolon files, whose decimals the scanner does not track', () => {
    const reader = new RecordReader({ units: 'g', source: SOURCE }, scanner);
    reader.separator = ';';
    reader.row(['0', '0,5'], 1);
    expect(reader.readsRows).toBe(false);
  });

  it('gives the record row() gives, whichever reads the rows (files with a header, comments, skip)', () => {
    const lines = ['# invented site A, not a real station', 'time_s,accel_g'];
    for (let i = 0; i < 3000; i++)
      lines.push(`${(i * 0.005).toFixed(3)},${(Math.sin(i / 9) / 3).toFixed(7)}`);
    lines.splice(1500, 0, '# a comment half way');
    const text = `${lines.join('\r\n')}\r\n`;
    const options = { units: 'g' as const, skip: 1, source: SOURCE };
    const withScanner = readRecordText(text, options);
    const alone = readRecordText(text, options, null);
    expect(Array.from(withScanner.accelMS2)).toEqual(Array.from(alone.accelMS2));
    expect(withScanner.dtS).toBe(alone.dtS);
    expect(alone.accelMS2[1]).toBe(Number((Math.sin(1 / 9) / 3).toFixed(7)) * G);
  });
});

describe('a first row with a letter slipped into a number', () => {
  // Invented rows. A header line is a line of words; a row of numbers with one bad field is a bad
  // row, refused with its line (common practice: never drop data silently).
  it('refuses a first row of a number and NaN or Infinity naming the line, not taking it as column names (long fuzz run)', () => {
    for (const bad of ['NaN', 'Infinity', '-inf'])
      expect(() =>
        readRecordText(`0.00,${bad}\n0.01,0.2\n0.02,0.3\n`, { units: 'g', source: 'x.csv' }),
      ).toThrow(/is not a number/);
  });

  it('refuses `0,0x10` and `0.1O` naming the line, not dropping them as a header', () => {
    const csv = refusal(() =>
      readRecordText('0,0x10\n0.01,0.2\n0.02,0.3\n', { units: 'g', source: 'x.csv' }),
    );
    expect(csv.text).toBe("x.csv:1: '0x10' is not a number");
    const one = refusal(() => readRecordText('0.1O\n0.2\n0.3\n', { units: 'g', dtS: 0.01, source: 'y.txt' }));
    expect(one.text).toBe("y.txt:1: '0.1O' is not a number");
  });

  it('still skips real text headers: names, keys with numbers, a count then a word', () => {
    for (const head of ['time_s,accel_g', 'NPTS= 3 DT= 0.01 SEC', '3 POINTS', 'acc (g) 2nd floor']) {
      const r = readRecordText(`${head}\n0.1\n0.2\n0.3\n`, { units: 'g', dtS: 0.01, source: 'z.txt' });
      expect(r.accelMS2.length).toBe(3);
    }
  });
});
