/**
 * A line's fields. The oracle is csv-parse, called here with the options that state the grammar
 * (the separator, fields trimmed unless the separator is whitespace, `#` comments, no quotes, a
 * limit of 1,000,000 on a line's size as csv-parse counts it): lineFields must give the fields
 * csv-parse gives, and refuse the lines it refuses, for every line.
 */
import { parse } from 'csv-parse/sync';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { isQuakesweepError } from '../../src/base/errors.js';
import { lineFields } from '../../src/record/fields.js';
import type { Separator } from '../../src/record/separator.js';
import { FUZZ_SEED, runs } from '../helpers/fuzz-budget.js';

/** csv-parse's fields of one line, or 'refused' when it throws. */
function csvParse(line: string, separator: Separator): string[] | 'refused' {
  try {
    const records = parse(line, {
      delimiter: separator === 'whitespace' ? [' ', '\t'] : separator,
      trim: separator !== 'whitespace',
      comment: '#',
      quote: false,
      skip_empty_lines: true,
      relax_column_count: true,
      max_record_size: 1_000_000,
    }) as string[][];
    return records[0] ?? [];
  } catch {
    return 'refused';
  }
}

function fields(line: string, separator: Separator): string[] | 'refused' {
  try {
    return lineFields(line, separator, 'f.csv', 1);
  } catch (error) {
    if (!isQuakesweepError(error)) throw error;
    expect(error.message).toBe('a line longer than 1000000 characters: is this a text record?');
    return 'refused';
  }
}

const separators: Separator[] = [',', ';', 'whitespace'];
/** Pieces of lines of every kind: numbers, separators, words, comments, quotes, white space of every kind, controls. */
const piece = fc.oneof(
  fc.constantFrom(...'0123456789aZ+-.,;_()[]/%# \t"\''.split('')),
  fc.constantFrom('1.5e-3', 'time', '  ', '\t\t', ' , ', ' ; ', '# note', 'é', '°', '😀', '\u00a0', '\u3000'),
  fc.constantFrom('\u000b', '\u000c', '\u0085', '\u2028', '\ufeff', '\u0000', '\u0007', '\ufffd', '\u1680'),
  fc.string({ maxLength: 3, unit: 'binary' }).filter((s) => !/[\r\n\ud800-\udfff]/.test(s)),
);
const line = fc.array(piece, { minLength: 1, maxLength: 30 }).map((parts) => parts.join(''));

describe('lineFields', () => {
  it('gives the fields csv-parse gives, for every line and separator (property)', () => {
    fc.assert(
      fc.property(line, fc.constantFrom(...separators), (text, separator) => {
        expect(fields(text, separator)).toEqual(csvParse(text, separator));
      }),
      { seed: FUZZ_SEED + 30, numRuns: runs(5000) },
    );
  });

  it.each([
    ['0.2,x # d', ',', ['0.2', 'x']], // a comment after the fields
    ['# a comment', ',', []],
    ['  # a comment', ',', []],
    ['0,"1"', ',', ['0', '"1"']], // no quotes: a quote is part of a field
    ['0;\u00a01,5\u3000', ';', ['0', '1,5']], // white space of other kinds is trimmed too
    ['0 \u00a0', 'whitespace', ['0', '\u00a0']], // only spaces and tabs separate
    [' 0\t\t1', 'whitespace', ['', '0', '', '1']], // every one of them
  ] as const)('%j with %j', (text, separator, expected) => {
    expect(fields(text, separator)).toEqual(expected);
    expect(csvParse(text, separator)).toEqual(expected);
  });

  it('refuses a line over 1,000,000 bytes of fields as csv-parse counts them, and no other', () => {
    // € is 3 bytes of UTF-8: 333,334 of them are 1,000,002 bytes; 333,333 and a digit are 1,000,000.
    const cases: [string, Separator][] = [
      ['€'.repeat(333_334), ','],
      [`${'€'.repeat(333_333)}1`, ','],
      [`${'€'.repeat(333_333)}12`, ','],
      [`   ${'€'.repeat(333_333)}12  `, ','],
      [`${'€'.repeat(200_000)},${'€'.repeat(200_000)}`, ';'],
      [`${'1'.repeat(500_000)},${'€'.repeat(166_667)}`, ','],
      [`${'1'.repeat(500_000)} ${'€'.repeat(166_667)}`, 'whitespace'],
      [`${'€'.repeat(300_000)}# ${'€'.repeat(300_000)}`, ','],
      [`😀${'€'.repeat(333_332)}`, ','],
    ];
    const outcomes = cases.map(([text, separator]) => fields(text, separator));
    expect(outcomes).toEqual(cases.map(([text, separator]) => csvParse(text, separator)));
    expect(outcomes.filter((o) => o === 'refused').length).toBeGreaterThan(2); // some are refused
    expect(outcomes[1]).not.toBe('refused'); // 1,000,000 bytes: at the limit, not over it
  });
});
