/** Readers of quakesweep's text outputs for the format tests: CSV back to numbers, table alignment. */
import { parse } from 'csv-parse/sync';
import { expect } from 'vitest';
import { CAUTION } from '../../src/base/caution.js';
import { createRecord } from '../../src/record/record.js';

/** An invented record: a decaying 2 Hz sine of peak 0.3 g near its start, 3 s at 0.01 s. */
export function decayingSine(name = 'test motion (invented)', phase = 0) {
  return createRecord({
    name,
    dtS: 0.01,
    accelMS2: Float64Array.from(
      { length: 301 },
      (_, i) => 0.3 * 9.80665 * Math.exp(-i / 150) * Math.sin(2 * Math.PI * 2 * i * 0.01 + phase),
    ),
  });
}

/**
 * A CSV read back by csv-parse (an outside reader): the `#` notes, the header and the rows with
 * each cell as a number, or null for an empty cell.
 */
export function readCsv(text: string) {
  const lines = text.split('\n');
  expect(lines.at(-1)).toBe(''); // ends with a newline
  const notes = lines.filter((line) => line.startsWith('# ')).map((line) => line.slice(2));
  const data = lines.filter((line) => !line.startsWith('#')).join('\n');
  const [header, ...rows] = parse(data, { skip_empty_lines: true }) as string[][];
  for (const row of rows) expect(row).toHaveLength(header.length);
  return { notes, header, rows: rows.map((row) => row.map((cell) => (cell === '' ? null : Number(cell)))) };
}

/** The caution, whole, in the leading `prefix` lines of a text, and nowhere cut. */
export function expectCaution(text: string, prefix: '# ' | '! ') {
  const lines = text.split('\n');
  expect(lines[0].startsWith(`${prefix}Preliminary`)).toBe(true);
  const lead = lines.slice(
    0,
    lines.findIndex((line) => !line.startsWith(prefix)),
  );
  expect(lead.map((line) => line.slice(2)).join(' ')).toContain(CAUTION);
}

/** Where the cells of a line of right-aligned, space-separated cells end. */
function cellEnds(line: string): number[] {
  const ends: number[] = [];
  for (let i = 0; i < line.length; i++) if (line[i] !== ' ' && (line[i + 1] ?? ' ') === ' ') ends.push(i);
  return ends;
}

/**
 * A right-aligned table: every line as long as the heading, every row's cells (no spaces inside)
 * ending at the same columns, and each of those columns the end of a heading.
 */
export function expectAligned(heading: string, rows: readonly string[]) {
  expect(rows.length).toBeGreaterThan(0);
  const ends = cellEnds(rows[0]);
  for (const row of rows) {
    expect(row.length).toBe(heading.length);
    expect(cellEnds(row)).toEqual(ends);
  }
  for (const end of ends) expect(cellEnds(heading)).toContain(end);
}

/** The lines of a text from the one equal to `first`, up to the next blank or parenthesised line. */
export function block(text: string, first: string): string[] {
  const lines = text.split('\n');
  const start = lines.findIndex((line) => line.startsWith(first));
  expect(start).toBeGreaterThanOrEqual(0);
  const end = lines.findIndex((line, i) => i > start && (line === '' || line.startsWith('(')));
  return lines.slice(start, end);
}
