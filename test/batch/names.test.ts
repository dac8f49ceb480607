import { join, resolve, sep } from 'node:path';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { patternRegExp } from '../../src/batch/glob.js';
import { assignNames, sanitiseName } from '../../src/batch/names.js';
import { recordName } from '../../src/record/record.js';

describe('record folder names (common practice: a name from outside never chooses a path)', () => {
  it('turns separators, .. and a leading dot into harmless characters', () => {
    expect(sanitiseName('a/b\\c')).toBe('a_b_c');
    expect(sanitiseName('..')).not.toContain('..');
    expect(sanitiseName('../../etc/passwd')).not.toMatch(/[/\\]|\.\./);
    expect(sanitiseName('.hidden').startsWith('.')).toBe(false);
    expect(sanitiseName('')).toMatch(/^record/);
    for (const own of ['suite.json', 'suite.csv', 'SUITE.svg', 'suite.html'])
      expect(sanitiseName(own)).toBe(`record-${own}`);
    expect(sanitiseName('shard-1-of-2.json')).not.toBe('shard-1-of-2.json');
  });

  it('keeps any name inside the output folder (property over arbitrary strings)', () => {
    const dir = resolve('/tmp/quakesweep-out');
    fc.assert(
      fc.property(fc.string({ unit: 'grapheme', maxLength: 40 }), (name) => {
        const safe = sanitiseName(name);
        const path = resolve(join(dir, safe));
        expect(path.startsWith(dir + sep)).toBe(true);
        expect(path.slice(dir.length + 1)).toBe(safe);
        expect(safe.startsWith('.')).toBe(false);
      }),
    );
  });

  it('makes collisions unique in sorted-file order, without regard to case', () => {
    const names = assignNames(['b/x.csv', 'a/x.csv', 'c/X.txt', 'd/x-2.csv']);
    expect(names.get('a/x.csv')).toBe('x');
    expect(names.get('b/x.csv')).toBe('x-2');
    expect(names.get('c/X.txt')).toBe('X-3');
    // x-2 was taken by b/x.csv before d/x-2.csv came up, so it moves on.
    expect(names.get('d/x-2.csv')).toBe('x-2-2');
    expect(new Set([...names.values()].map((n) => n.toLowerCase())).size).toBe(4);
  });

  it('names a record after its file as the reader does', () => {
    expect(recordName('records/marrowby-h1.csv')).toBe('marrowby-h1');
    expect(recordName('plain')).toBe('plain');
  });
});

describe('simple patterns: * and ? (POSIX shell rules, from memory)', () => {
  it('matches * over any run, ? over one character, and hides dot files from *', () => {
    expect(patternRegExp('*.csv').test('h1.csv')).toBe(true);
    expect(patternRegExp('*.csv').test('h1.txt')).toBe(false);
    expect(patternRegExp('h?.csv').test('h1.csv')).toBe(true);
    expect(patternRegExp('h?.csv').test('h12.csv')).toBe(false);
    expect(patternRegExp('*.csv').test('.hidden.csv')).toBe(false);
    expect(patternRegExp('a+b(1).csv').test('a+b(1).csv')).toBe(true);
  });
});
