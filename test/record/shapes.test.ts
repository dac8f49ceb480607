/**
 * The reader (src/record/read.ts) on invented files of each shape an engineer may receive
 * (test/record/files/, all invented). Expected values are the numbers as written in the files,
 * counted by hand; unit factors are their definitions (1 g = 9.80665 m/s², CGPM 1901; 1 gal = 0.01 m/s²).
 */
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { isQuakesweepError } from '../../src/base/errors.js';
import { type ReadOptions, readRecordText, unitWarnings } from '../../src/record/read.js';

const G = 9.80665;
const folder = join(import.meta.dirname, 'files');

function read(file: string, options: Partial<ReadOptions> = {}) {
  const text = readFileSync(join(folder, file), 'utf8');
  return readRecordText(text, { source: file, ...options });
}

function refusal(run: () => unknown) {
  try {
    run();
  } catch (error) {
    if (!isQuakesweepError(error)) throw error;
    return { kind: error.kind, text: error.describe() };
  }
  throw new Error('read without a word');
}

const values = (r: { accelMS2: Float64Array }, per = 1) => Array.from(r.accelMS2, (v) => v / per);
const step = (r: { processing: readonly { description: string }[] }) => r.processing[0].description;

describe('fixed-width fields', () => {
  it('splits values that touch at a sign, takes NPTS, DT and units from the header, no option needed', () => {
    const r = read('fixed-touching.txt');
    const written = [0, 1e-3, -2.5e-3, 4e-3, -1.25e-2, -2e-2, -1e-2, 3e-3, 0, 5.5e-3, -1e-3, 2e-4];
    expect(values(r)).toEqual(written.map((v) => expect.closeTo(v * G, 15)));
    expect(r.dtS).toBe(0.005);
    expect(r.unitsRead).toBe('g');
    expect(step(r)).toBe(
      "as read: Δt 0.005 s from the header (line 2: 'DT= 0.005 SEC'); values in g from the header (line 3: 'UNITS: G'); wrapped layout, values that touch split at their signs (fields of 10; first on line 4) after 3 header lines; 12 points, as the header states",
    );
  });

  it('cuts declared widths (--fixed 4x9) where values touch with no sign, and says how to otherwise', () => {
    const r = read('fixed-declared.txt', { fixed: [9, 9, 9, 9] });
    expect(values(r)).toEqual([0.01, 0.025, 0.03, 0.04, 0.05, 0.06, 0.07, 0.08]); // m/s2 from the header
    expect(r.dtS).toBe(0.01);
    expect(step(r)).toContain('fixed-width fields 4x9 (--fixed)');
    expect(refusal(() => read('fixed-declared.txt')).text).toBe(
      "fixed-declared.txt:2: '1.000E-022.500E-023.000E-024.000E-02' is not a number (if the values are fixed-width fields that touch, declare their widths with --fixed COUNTxWIDTH)",
    );
  });
});

describe('header keys', () => {
  it('reads npts, dt and units spelled with = or : or spaces, and skips the prose before them', () => {
    const r = read('header-keys.txt');
    expect(values(r, 0.01)).toEqual([0, 1.5, -2.5, 3, -4, 5.5, -6].map((v) => expect.closeTo(v, 12)));
    expect(r.dtS).toBe(0.005);
    expect(r.unitsRead).toBe('gal');
  });

  it('lets options override the header and says so; a contradicting unit is a warning carried in the record', () => {
    const r = read('header-keys.txt', { units: 'm/s2', dtS: 0.01 });
    expect(r.dtS).toBe(0.01);
    expect(step(r)).toContain("--dt 0.01 s overrides the header (line 3: 'dt: 0.005 s'), which says 0.005 s");
    expect(step(r)).toContain("--units m/s2 overrides the header (line 4: 'units gal'), which says gal");
    expect(unitWarnings(r)[0]).toBe(
      "--units m/s2 contradicts the header (line 4: 'units gal'), which says gal; the values are read in m/s2 as told",
    );
    expect(r.processing[1]).toMatchObject({ operation: 'warning' });
    // gal and cm/s2 are the same unit: no contradiction.
    expect(unitWarnings(read('header-keys.txt', { units: 'cm/s2' }))).toEqual([]);
  });

  it("recognises quakesweep synth's own header: the column accel_g, and warns when read as cm/s2", () => {
    const r = read('synth-header.csv');
    expect(r.unitsRead).toBe('g');
    expect(step(r)).toContain("values in g from the column name 'accel_g' (line 3)");
    expect(step(r)).toContain("Δt 0.01 s from the time column, as the header (line 2: 'dt 0.01 s') says too");
    const wrong = unitWarnings(read('synth-header.csv', { units: 'cm/s2' }));
    expect(wrong[0]).toMatch(/^--units cm\/s2 contradicts the column name 'accel_g'/);
  });

  it('refuses a file with more or fewer values than its header states, and one that ends early mid-line', () => {
    const text = readFileSync(join(folder, 'cut-short.txt'), 'utf8'); // 7 values, 8 stated, no line break at the end
    const cut = refusal(() => readRecordText(text, { source: 'x.txt' }));
    expect(cut.text).toMatch(
      /^x\.txt:2: the header states 8 points but the file ends after 7, on a line with no line break: it looks cut short/,
    );
    const ended = refusal(() => readRecordText(`${text}\n`, { source: 'x.txt' }));
    expect(ended.text).toMatch(/^x\.txt:2: the header states 8 points but the file holds 7 values/);
    const more = refusal(() => readRecordText(`${text} 0.7 0.8 0.9\n`, { source: 'x.txt' }));
    expect(more.text).toMatch(/^x\.txt:2: the header states 8 points but 10 values were read/);
  });
});

describe('layouts and columns', () => {
  it('skips a few lines of prose before a time,value table', () => {
    const r = read('prose-header-table.csv', { units: 'g' });
    expect(values(r, G)).toEqual([0, 0.01, -0.02, 0.03].map((v) => expect.closeTo(v, 15)));
    expect(r.dtS).toBeCloseTo(0.02, 15); // (0.06 − 0) / 3
    expect(step(r)).toContain("table, acceleration in column 2 'accel' after 4 header lines");
  });

  it('reads a tab file with decimal commas', () => {
    const r = read('tab-comma.txt', { units: 'm/s2' });
    expect(values(r)).toEqual([0, 0.0125, -0.0031, 0.01]);
    expect(r.dtS).toBeCloseTo(0.01, 15);
  });

  it('refuses to guess among several components, listing them; takes a name in any case', () => {
    expect(refusal(() => read('three-components.csv', { units: 'g' }))).toEqual({
      kind: 'usage',
      text: 'three-components.csv has 4 columns (time, NS, EW, UD): choose the acceleration with --column (a name or a number from 2 to 4)',
    });
    expect(values(read('three-components.csv', { units: 'g', column: 'ud' }), G)).toEqual([0, 0.3, -0.3]);
    expect(values(read('three-components.csv', { units: 'g', column: 3 }), G)).toEqual([0, 0.2, -0.2]);
  });

  it('says how to read values wrapped a few a line when no step is known anywhere', () => {
    expect(refusal(() => read('wrapped-no-dt.txt')).text).toBe(
      "wrapped-no-dt.txt has 4 columns (time, then 3 value columns with no names): choose the acceleration with --column (a name or a number from 2 to 4); or, if it looks like 4 values a line in fields of 7 after 2 header lines with no time column; try --layout wrapped --dt STEP (or state the step in the header, e.g. 'dt = 0.01 s')",
    );
    const r = read('wrapped-no-dt.txt', { layout: 'wrapped', dtS: 0.02 });
    expect(values(r, 0.01)).toEqual([1, 2, 3, 4, 5, 6, 7, 8].map((v) => expect.closeTo(v, 12)));
  });
});

describe('time unit', () => {
  it('refuses a time column plainly not in seconds (steps of 10), unless told the unit', () => {
    expect(refusal(() => read('time-ms.csv', { units: 'g' }))).toEqual({
      kind: 'input',
      text: "time-ms.csv: a time step of 10 s (the time column) is not a ground-motion record's in seconds: if the times are milliseconds give --time-unit ms, if they are seconds --time-unit s",
    });
    const ms = read('time-ms.csv', { units: 'g', timeUnit: 'ms' });
    expect(ms.dtS).toBeCloseTo(0.01, 15); // 10 ms
    expect(step(ms)).toContain('times in ms (--time-unit)');
    expect(read('time-ms.csv', { units: 'g', timeUnit: 's' }).dtS).toBe(10); // as told
  });
});
