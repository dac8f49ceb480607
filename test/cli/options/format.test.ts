import { describe, expect, it } from 'vitest';
import { outputFormat } from '../../../src/cli/options/format.js';

describe('outputFormat', () => {
  it('is a table on the terminal and JSON into a file unless --format says otherwise', () => {
    expect(outputFormat({}, 'json or csv')).toBe('table');
    expect(outputFormat({ out: 'a.json' }, 'json or csv')).toBe('json');
    expect(outputFormat({ out: 'a.csv', format: 'csv' }, 'json or csv')).toBe('csv');
    expect(outputFormat({ format: 'table' }, 'json or csv')).toBe('table');
  });

  it('refuses a format the command does not write, in the words it gives', () => {
    expect(() => outputFormat({ format: 'xml' }, 'json or csv')).toThrow("--format 'xml': use json or csv");
    expect(() => outputFormat({ format: 'csv' }, 'json or table')).toThrow(
      "--format 'csv': use json or table",
    );
    expect(() => outputFormat({ out: 'x' }, 'csv')).toThrow("--format 'json': use csv");
  });
});
