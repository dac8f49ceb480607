/** The output set (common practice for safe output): all checks before any write, atomic writes. */
import {
  existsSync,
  mkdirSync,
  mkdtempSync,
  readdirSync,
  readFileSync,
  rmSync,
  symlinkSync,
  writeFileSync,
} from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { OutputSet, writeFileAtomic } from '../../src/output/output-set.js';

const dir = mkdtempSync(join(tmpdir(), 'quakesweep-output-set-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

function fresh(name: string): string {
  const path = join(dir, name);
  mkdirSync(path);
  return path;
}

describe('OutputSet', () => {
  it('writes every file and creates a planned folder whose parent exists', () => {
    const root = fresh('writes');
    new OutputSet()
      .file(join(root, 'a.json'), '{}\n')
      .folder(join(root, 'figs'), [['one.svg', '<svg/>']], '--svg')
      .folder(join(root, 'figs', 'inner'), [['two.svg', '<svg/>']], '--svg')
      .write();
    expect(readdirSync(root).sort()).toEqual(['a.json', 'figs']);
    expect(readdirSync(join(root, 'figs')).sort()).toEqual(['inner', 'one.svg']);
    expect(readFileSync(join(root, 'figs', 'inner', 'two.svg'), 'utf8')).toBe('<svg/>');
  });

  it('refuses two outputs at one path, however spelled, before writing either', () => {
    const root = fresh('twice');
    const set = new OutputSet()
      .folder(join(root, 'figs'), [['design.svg', '<svg/>']], '--svg')
      .file(join(root, 'figs', '..', 'figs', 'design.svg'), '{}');
    expect(() => set.write()).toThrow(/twice \(--svg .*design\.svg and --out\)/);
    expect(readdirSync(root)).toEqual([]);
  });

  it('refuses an input through a symlink, leaving the other outputs unwritten', () => {
    const root = fresh('input');
    const input = join(root, 'record.csv');
    writeFileSync(input, '0.1\n');
    symlinkSync(input, join(root, 'link.json'));
    const set = new OutputSet([input])
      .file(join(root, 'first.json'), '{}')
      .file(join(root, 'link.json'), 'x');
    expect(() => set.write()).toThrow(`refusing to overwrite the input ${input} with an output`);
    expect(existsSync(join(root, 'first.json'))).toBe(false);
    expect(readFileSync(input, 'utf8')).toBe('0.1\n');
  });

  it('names a folder that is a file, or whose parent is missing', () => {
    const root = fresh('folders');
    writeFileSync(join(root, 'file'), '');
    expect(() => new OutputSet().folder(join(root, 'file'), [], '--svg').write()).toThrow(
      `--svg ${join(root, 'file')}: exists and is not a folder`,
    );
    expect(() => new OutputSet().folder(join(root, 'a', 'b')).write()).toThrow(
      `--out ${join(root, 'a', 'b')}: its parent folder does not exist`,
    );
  });

  it('sends the text to standard output when no --out is given, after the files', () => {
    const root = fresh('stdout');
    const written: string[] = [];
    const write = process.stdout.write;
    process.stdout.write = ((chunk: string) => {
      written.push(existsSync(join(root, 'f.svg')) ? `after:${chunk}` : chunk);
      return true;
    }) as typeof process.stdout.write;
    try {
      new OutputSet()
        .folder(root, [['f.svg', '<svg/>']], '--svg')
        .text(undefined, 'table\n')
        .write();
    } finally {
      process.stdout.write = write;
    }
    expect(written).toEqual(['after:table\n']);
  });

  it('writeFileAtomic leaves no temporary file behind', () => {
    const root = fresh('atomic');
    writeFileAtomic(join(root, 'x.txt'), 'bytes');
    expect(readdirSync(root)).toEqual(['x.txt']);
  });
});
