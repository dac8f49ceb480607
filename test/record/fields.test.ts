/**
 * A line's fields. The oracle is csv-parse itself, called here with the options that state the
 * grammar (no quotes, `#` comments, the separator, fields trimmed unless the separator is
 * whitespace): plainFields must split every plain line as csv-parse splits it, and csvFields is
 * csv-parse's answer for every other line.
 */
import { parse } from 'csv-parse/sync';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { csvFields, plainFields } from '../../src/record/fields.js';
import type { Separator } from '../../src/record/separator.js';
import { FUZZ_SEED, runs } from '../fuzz/budget.js';

function csvParse(line: string, separator: Separator): string[] {
  const records = parse(line, {
    delimiter: separator === 'whitespace' ? [' ', '\t'] : separator,
    trim: separator !== 'whitespace',
    comment: '#',
    quote: false,
    skip_empty_lines: true,
    relax_column_count: true,
  }) as string[][];
  return records[0] ?? [];
}

const separators: Separator[] = [',', ';', 'whitespace'];
const plainLine = fc
  .array(fc.constantFrom(...'0123456789aZ+-.,;_()[]/% \t'.split(''), '1.5e-3', 'time', '  ', '\t\t'), {
    minLength: 1,
    maxLength: 30,
  })
  .map((parts) => parts.join(''));

describe('plainFields', () => {
  it('splits every plain line as csv-parse does, for each separator (property)', () => {
    fc.assert(
      fc.property(plainLine, fc.constantFrom(...separators), (line, separator) => {
        expect(plainFields(line, separator)).toEqual(csvParse(line, separator));
      }),
      { seed: FUZZ_SEED + 30, numRuns: runs(3000) },
    );
  });

  it('leaves every other line to csv-parse', () => {
    for (const line of ['0,1 # note', '"1",2', '0,\u00a01', '0,é', '0,\u00001', '0,1\u3000', "0,'1'"])
      expect([line, plainFields(line, ',')]).toEqual([line, undefined]);
  });
});

describe('csvFields', () => {
  it.each([
    ['0.2,x # d', ',', ['0.2', 'x']], // a comment after the fields
    ['# a comment', ',', undefined],
    ['0,"1"', ',', ['0', '"1"']], // no quotes: a quote is part of a field
    ['0;\u00a01,5', ';', ['0', '1,5']], // a no-break space is trimmed
    ['0 \u00a0', 'whitespace', ['0', '\u00a0']],
  ] as const)('%j with %j', (line, separator, fields) => {
    expect(csvFields(line, separator, 'f.csv', 1)).toEqual(fields);
    expect(csvParse(line, separator)).toEqual(fields ?? []);
  });
});
