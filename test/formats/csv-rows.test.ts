import { describe, expect, it } from 'vitest';
import { cautionLines } from '../../src/base/caution.js';
import { csvRows } from '../../src/formats/csv-rows.js';

describe('csvRows', () => {
  it('caution and notes on # lines, the header, then the rows; words quoted as RFC 4180 says', () => {
    const text = csvRows(
      ['first\nnote'],
      ['name', 'value'],
      [
        ['plain', 1.5],
        ['with, comma', null],
        ['say "hi"', -2e-9],
      ],
    );
    const lines = text.split('\n');
    expect(lines.slice(0, cautionLines().length)).toEqual(cautionLines().map((l) => `# ${l}`));
    expect(lines.slice(cautionLines().length)).toEqual([
      '# first note',
      'name,value',
      'plain,1.5',
      '"with, comma",',
      '"say ""hi""",-2e-9',
      '',
    ]);
  });

  it('refuses a value that is not finite, naming its column', () => {
    expect(() => csvRows([], ['a', 'b'], [[1, Number.NaN]])).toThrow(/b = NaN/);
  });
});
