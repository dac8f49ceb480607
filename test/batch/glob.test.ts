import { mkdirSync, mkdtempSync, rmSync, symlinkSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { compareText, expandPatterns, isPattern, patternRegExp } from '../../src/batch/glob.js';

const folder = mkdtempSync(join(tmpdir(), 'quakesweep-glob-'));
afterAll(() => rmSync(folder, { recursive: true, force: true }));
for (const name of ['b.txt', 'a.txt', 'a1.txt', 'ab.csv', '.hidden.txt', 'x+y.txt'])
  writeFileSync(join(folder, name), '');
mkdirSync(join(folder, 'sub.txt')); // a folder whose name matches is not a file

describe('patterns', () => {
  it('is a pattern only when * or ? stands in the last segment', () => {
    expect(isPattern('in/*.txt')).toBe(true);
    expect(isPattern('rec?.csv')).toBe(true);
    expect(isPattern('in*/rec.csv')).toBe(false);
    expect(isPattern('in\\rec.csv')).toBe(false);
  });

  it('* matches any run (none too), ? one character, the rest literally (POSIX shell rules)', () => {
    const star = patternRegExp('a*.txt');
    expect(['a.txt', 'a1.txt', 'abc.txt'].every((name) => star.test(name))).toBe(true);
    expect(star.test('a.csv')).toBe(false);
    expect(star.test('ba.txt')).toBe(false);
    const one = patternRegExp('a?.txt');
    expect(one.test('a1.txt')).toBe(true);
    expect(one.test('a.txt')).toBe(false);
    expect(patternRegExp('x+y.txt').test('x+y.txt')).toBe(true);
    expect(patternRegExp('x+y.txt').test('xxy.txt')).toBe(false);
  });

  it('a leading dot must be matched explicitly', () => {
    expect(patternRegExp('*.txt').test('.hidden.txt')).toBe(false);
    expect(patternRegExp('.*.txt').test('.hidden.txt')).toBe(true);
  });
});

describe('expandPatterns', () => {
  it('matches files of the folder, sorted, once each, plain paths taken as they are', () => {
    const { files, unmatched } = expandPatterns([
      join(folder, '*.txt'),
      join(folder, 'a.txt'),
      join(folder, 'missing.txt'),
    ]);
    expect(files).toEqual(
      ['a.txt', 'a1.txt', 'b.txt', 'missing.txt', 'x+y.txt']
        .map((name) => join(folder, name))
        .sort(compareText),
    );
    expect(unmatched).toEqual([]);
  });

  it('lists the patterns that matched nothing, and a missing folder matches nothing', () => {
    const none = [join(folder, '*.json'), join(folder, 'nowhere', '*.txt')];
    expect(expandPatterns(none)).toEqual({ files: [], unmatched: none, duplicates: [] });
  });

  it('takes one file once however it is spelled: //, .., a link, a pattern and its name', () => {
    const link = join(folder, 'link-to-b.txt');
    symlinkSync(join(folder, 'b.txt'), link);
    try {
      const spellings = [
        `${folder}//a.txt`,
        `${folder}/sub.txt/../a.txt`, // join would tidy these two spellings away
        join(folder, 'a*.txt'),
        link,
        join(folder, 'b.txt'),
      ];
      const { files, duplicates } = expandPatterns(spellings);
      expect(files.filter((f) => f.endsWith('a.txt') && !f.endsWith('1.txt'))).toHaveLength(1);
      expect(files.filter((f) => f.endsWith('b.txt'))).toHaveLength(1);
      expect(files).toContain(join(folder, 'a1.txt'));
      expect(duplicates.map((d) => d.dropped).sort(compareText)).toHaveLength(3);
    } finally {
      rmSync(link);
    }
  });

  it('sorts by code unit, the same in every locale', () => {
    expect(['b', 'B', 'a', 'Z'].sort(compareText)).toEqual(['B', 'Z', 'a', 'b']);
    expect(compareText('a', 'a')).toBe(0);
  });
});
