import { describe, expect, it } from 'vitest';
import { CAUTION } from '../../src/base/caution.js';
import { announceSuccess, count, gridWords } from '../../src/cli/announce.js';

describe('announceSuccess', () => {
  it('writes what was made and where, then the caution, on standard error', () => {
    const written: string[] = [];
    const original = process.stderr.write;
    process.stderr.write = ((chunk: string) => {
      written.push(chunk);
      return true;
    }) as typeof process.stderr.write;
    try {
      announceSuccess('spectra of h1, 2 periods × 1 damping', ['s.json (json)', '4 figures in figs']);
      announceSuccess('nothing written', []);
    } finally {
      process.stderr.write = original;
    }
    expect(written).toEqual([
      'quakesweep: done: spectra of h1, 2 periods × 1 damping; wrote s.json (json), 4 figures in figs\n',
      `quakesweep: caution: ${CAUTION}\n`,
      'quakesweep: done: nothing written\n',
      `quakesweep: caution: ${CAUTION}\n`,
    ]);
  });

  it('counts in words', () => {
    expect(gridWords(1, 1)).toBe('1 period × 1 damping');
    expect(gridWords(121, 4)).toBe('121 periods × 4 dampings');
    expect(count(0, 'record')).toBe('0 records');
  });
});
