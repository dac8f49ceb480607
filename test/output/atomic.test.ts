import { mkdirSync, mkdtempSync, readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { writeAtomic } from '../../src/output/atomic.js';

const folder = mkdtempSync(join(tmpdir(), 'quakesweep-atomic-'));
afterAll(() => rmSync(folder, { recursive: true, force: true }));

describe('writeAtomic', () => {
  it('writes text and bytes, replacing a file that exists, and leaves no temporary file', () => {
    const path = join(folder, 'out.json');
    writeFileSync(path, 'old');
    writeAtomic(path, '{"ü": 1}\n');
    expect(readFileSync(path, 'utf8')).toBe('{"ü": 1}\n');
    const bytes = Uint8Array.from({ length: 200_000 }, (_, i) => i % 251);
    writeAtomic(path, bytes);
    expect(readFileSync(path).equals(Buffer.from(bytes))).toBe(true);
    expect(readdirSync(folder)).toEqual(['out.json']);
  });

  it('leaves nothing behind when the rename fails, and throws', () => {
    const target = join(folder, 'a-folder');
    writeFileSync(join(folder, 'keep.txt'), 'x');
    // Renaming a file onto a folder fails after the temporary file was written.
    mkdirSync(join(target, 'inside'), { recursive: true });
    expect(() => writeAtomic(target, 'text')).toThrow();
    expect(readdirSync(folder).sort()).toEqual(['a-folder', 'keep.txt', 'out.json']);
  });

  it('throws for a missing folder, writing nothing', () => {
    expect(() => writeAtomic(join(folder, 'nope', 'out.json'), 'x')).toThrow(/ENOENT/);
  });
});
