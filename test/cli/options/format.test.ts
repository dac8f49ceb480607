import { describe, expect, it } from 'vitest';
import { outputFormat } from '../../../src/cli/options/format.js';

describe('outputFormat', () => {
  const allowed = ['table', 'json', 'csv'];

  it('is a table on the terminal and JSON into a file unless --format says otherwise', () => {
    expect(outputFormat({}, allowed, 'json or csv')).toBe('table');
    expect(outputFormat({ out: 'a.json' }, allowed, 'json or csv')).toBe('json');
    expect(outputFormat({ out: 'a.csv', format: 'csv' }, allowed, 'json or csv')).toBe('csv');
  });

  it('refuses a format the command does not write, in the words it gives', () => {
    expect(() => outputFormat({ format: 'xml' }, allowed, 'json or csv')).toThrow(
      "--format 'xml': use json or csv",
    );
    expect(() => outputFormat({ out: 'x' }, ['table', 'csv'], 'csv')).toThrow("--format 'json': use csv");
  });
});
