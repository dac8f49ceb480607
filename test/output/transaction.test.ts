/**
 * The transaction (common practice for safe output): all files or none, the old set restored when
 * a rename fails and kept when staging fails (as on a full disk), modes kept, short temporary names.
 */
import {
  chmodSync,
  mkdirSync,
  mkdtempSync,
  readdirSync,
  readFileSync,
  renameSync,
  rmSync,
  statSync,
  writeFileSync,
} from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { stageFile } from '../../src/output/atomic.js';
import { commitFiles, type TransactionIo } from '../../src/output/transaction.js';

const dir = mkdtempSync(join(tmpdir(), 'quakesweep-transaction-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

function oldSet(name: string): string {
  const folder = join(dir, name);
  mkdirSync(folder);
  for (const file of ['a.json', 'b.csv', 'c.svg']) writeFileSync(join(folder, file), `old ${file}`);
  return folder;
}

const contents = (folder: string) =>
  Object.fromEntries(
    readdirSync(folder)
      .sort()
      .map((f) => [f, readFileSync(join(folder, f), 'utf8')]),
  );

function plan(folder: string) {
  return ['a.json', 'b.csv', 'c.svg', 'd.html'].map((file) => {
    const final = join(folder, file);
    let replaces: ReturnType<typeof statSync> | undefined;
    try {
      replaces = statSync(final);
    } catch {
      replaces = undefined;
    }
    return { final, contents: `new ${file}`, replaces };
  });
}

describe('commitFiles', () => {
  it('replaces the whole set and leaves no temporary, journal or kept copy', () => {
    const folder = oldSet('whole');
    commitFiles(plan(folder), folder);
    expect(contents(folder)).toEqual({
      'a.json': 'new a.json',
      'b.csv': 'new b.csv',
      'c.svg': 'new c.svg',
      'd.html': 'new d.html',
    });
  });

  it('restores the old set when the third rename fails (new files removed, old ones back)', () => {
    const folder = oldSet('rename-fails');
    let renames = 0;
    const io: TransactionIo = {
      stage: stageFile,
      rename(from, to) {
        if (++renames === 3) throw Object.assign(new Error('injected'), { code: 'EIO' });
        renameSync(from, to);
      },
    };
    expect(() => commitFiles(plan(folder), folder, io)).toThrow('injected');
    expect(contents(folder)).toEqual({ 'a.json': 'old a.json', 'b.csv': 'old b.csv', 'c.svg': 'old c.svg' });
  });

  it('keeps the old set untouched when staging fails part way (a full disk, ENOSPC)', () => {
    const folder = oldSet('disk-full');
    let staged = 0;
    const io: TransactionIo = {
      stage(target, text, replaces) {
        if (++staged === 3)
          throw Object.assign(new Error('ENOSPC: no space left on device'), { code: 'ENOSPC' });
        return stageFile(target, text, replaces);
      },
      rename: renameSync,
    };
    expect(() => commitFiles(plan(folder), folder, io)).toThrow('ENOSPC');
    expect(contents(folder)).toEqual({ 'a.json': 'old a.json', 'b.csv': 'old b.csv', 'c.svg': 'old c.svg' });
  });

  it('keeps the mode of a file it replaces', () => {
    const folder = oldSet('modes');
    chmodSync(join(folder, 'a.json'), 0o600);
    chmodSync(join(folder, 'b.csv'), 0o644);
    commitFiles(plan(folder), folder);
    expect(statSync(join(folder, 'a.json')).mode & 0o777).toBe(0o600);
    expect(statSync(join(folder, 'b.csv')).mode & 0o777).toBe(0o644);
  });

  it('stages a file whose valid name is 250 bytes (the temporary name is short)', () => {
    const folder = join(dir, 'long');
    mkdirSync(folder);
    const name = `${'é'.repeat(122)}.csv`; // 244 + 4 = 248 bytes in UTF-8
    expect(Buffer.byteLength(name)).toBeGreaterThanOrEqual(248);
    commitFiles([{ final: join(folder, name), contents: 'x' }], folder);
    expect(readdirSync(folder)).toEqual([name]);
  });
});
