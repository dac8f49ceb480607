/**
 * Formula injection: a spreadsheet runs a cell that begins with = + - @ (or a tab or a carriage
 * return) as a formula; a leading apostrophe makes it text (common practice for CSV written for
 * spreadsheets). Numbers must stay numbers. The names below are invented.
 */
import { describe, expect, it } from 'vitest';
import { csvCell, csvNote } from '../../src/formats/csv-cell.js';
import { csvRows } from '../../src/formats/csv-rows.js';
import { csvText } from '../../src/formats/layout.js';

describe('csvCell', () => {
  it.each([
    ['=HYPERLINK("x")', `"'=HYPERLINK(""x"")"`],
    ['+cmd', "'+cmd"],
    ['-2+3+cmd', "'-2+3+cmd"],
    ['@SUM(A1)', "'@SUM(A1)"],
    ['\tname', "'\tname"],
    ['\rname', `"'\rname"`],
  ])('neutralises %j', (text, cell) => {
    expect(csvCell(text)).toBe(cell);
  });

  it('leaves numbers and plain words as they are, and quotes commas and quotes (RFC 4180)', () => {
    for (const text of ['-0.25', '+3e-2', '-1', '.5', 'marrowby-h1', 'psa_g@5%'])
      expect(csvCell(text)).toBe(text);
    expect(csvCell('a,b')).toBe('"a,b"');
    expect(csvCell('say "hi"')).toBe('"say ""hi"""');
  });
});

describe('csvCell and csvNote on names from files', () => {
  it('drop terminal escapes and control characters a file name brought in (found by the options fuzz test)', () => {
    expect(csvCell('bell\u0007 esc\u001b[31mred')).toBe('bell escred');
    expect(csvNote('source: bell\u0007.txt, \u001b[31m=1')).toBe("source: bell.txt,' =1");
  });
});

describe('csvNote', () => {
  it('neutralises every piece between commas, after blanks and quotes, but not numbers', () => {
    expect(csvNote('record: x,=HYPERLINK("e"); npts 3')).toBe(`record: x,'=HYPERLINK("e"); npts 3`);
    expect(csvNote('a, "=1+1"')).toBe(`a,' "=1+1"`);
    expect(csvNote('range 0.1, -0.25, +2')).toBe('range 0.1, -0.25, +2');
    expect(csvNote('=first piece stays behind the # of the line')).toBe(
      '=first piece stays behind the # of the line',
    );
    expect(csvNote('two\nlines')).toBe('two lines');
  });
});

describe('CSV writers put no formula at the start of a cell', () => {
  /** Every cell of a CSV line, split as a spreadsheet does (quotes honoured). */
  const cells = (line: string) =>
    line.match(/("([^"]|"")*"|[^,]*)(,|$)/g)?.map((c) => c.replace(/,$/, '')) ?? [];
  const formula = (cell: string) =>
    /^[=+\-@\t\r]/.test(cell.replace(/^[\s"]+/, '')) && Number.isNaN(Number(cell));

  it('in the header, the notes and the words of csvRows', () => {
    const text = csvRows(
      ['record: a,=HYPERLINK("http://example.invalid")'],
      ['name', 'value'],
      [
        ['b,=cmd|x', -0.25],
        ['@evil', 1],
      ],
    );
    for (const line of text.trimEnd().split('\n')) expect(cells(line).filter(formula)).toEqual([]);
    expect(text).toContain('\n"b,=cmd|x",-0.25\n');
  });

  it('in the header and the notes of csvText (a record name starting a column name)', () => {
    const text = csvText(['record: x,=1+1'], Float64Array.from([0.1]), [
      { name: 'x,=HYPERLINK("e")_psa_g@5%', at: () => -0.25 },
    ]);
    for (const line of text.trimEnd().split('\n')) expect(cells(line).filter(formula)).toEqual([]);
    expect(text.trimEnd().split('\n').at(-1)).toBe('0.1,10,-0.25');
  });
});
