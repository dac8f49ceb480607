import { describe, expect, it } from 'vitest';
import { FORMAT_HELP, outputFormat } from '../../../src/cli/options/format.js';

describe('outputFormat', () => {
  it('is a table on the terminal; into a file, the format its extension names, else JSON', () => {
    expect(outputFormat({})).toBe('table');
    expect(outputFormat({ out: 'a.json' })).toBe('json');
    expect(outputFormat({ out: 'a.csv' })).toBe('csv');
    expect(outputFormat({ out: 'A.CSV' })).toBe('csv');
    expect(outputFormat({ out: 'notes.txt' })).toBe('table');
    expect(outputFormat({ out: 'result' })).toBe('json');
    expect(outputFormat({ out: 'result.dat' })).toBe('json');
    expect(outputFormat({ out: 'dir.csv/result' })).toBe('json');
  });

  it('takes --format when given, on the terminal or beside an extension that agrees or names none', () => {
    expect(outputFormat({ format: 'csv' })).toBe('csv');
    expect(outputFormat({ format: 'JSON' })).toBe('json');
    expect(outputFormat({ format: 'table' })).toBe('table');
    expect(outputFormat({ out: 'a.csv', format: 'csv' })).toBe('csv');
    expect(outputFormat({ out: 'a.dat', format: 'csv' })).toBe('csv');
    expect(outputFormat({ out: 'a.txt', format: 'table' })).toBe('table');
  });

  it('refuses an unknown format, and a format that contradicts the extension of --out', () => {
    expect(() => outputFormat({ format: 'xml' })).toThrow("--format 'xml': use table, json or csv");
    expect(() => outputFormat({ format: 'json', out: 'x.csv' })).toThrow(
      '--format json contradicts --out x.csv (a csv name); change one of them',
    );
    expect(() => outputFormat({ format: 'csv', out: 'x.txt' })).toThrow('contradicts --out x.txt');
    expect(() => outputFormat({ format: 'table', out: 'x.json' })).toThrow('contradicts');
  });

  it('says the rule in its help', () => {
    expect(FORMAT_HELP).toContain('table, json or csv');
    expect(FORMAT_HELP).toContain('.csv, .json or .txt');
  });
});
