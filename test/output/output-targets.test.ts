/**
 * Outputs that are not plain files, and inputs where outputs would go (common practice for safe
 * output): a device or FIFO is written through, never replaced; a symlink's target is written and
 * the link kept; what cannot be written safely is refused in one line; an input at any output path
 * of report, spectrum --svg or batch is refused before any work. (Tests of output-set.ts.)
 */
import { execFileSync, spawn } from 'node:child_process';
import {
  chmodSync,
  copyFileSync,
  linkSync,
  lstatSync,
  mkdirSync,
  readdirSync,
  readFileSync,
  readlinkSync,
  rmSync,
  statSync,
  symlinkSync,
  writeFileSync,
} from 'node:fs';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { OutputSet } from '../../src/output/output-set.js';
import { writeFixtures } from '../helpers/fixtures.js';
import { expectOneLineFailure, runMain } from '../helpers/run-cli.js';

const f = writeFixtures('quakesweep-output-targets-');
afterAll(() => rmSync(f.dir, { recursive: true, force: true }));

function folder(name: string): string {
  const dir = join(f.dir, name);
  mkdirSync(dir);
  return dir;
}

describe('devices, FIFOs and symlinks as outputs', () => {
  it('writes through /dev/null and leaves it the character device it was', () => {
    new OutputSet().file('/dev/null', 'text\n').write();
    expect(statSync('/dev/null').isCharacterDevice()).toBe(true);
  });

  it('writes into a FIFO that has a reader, and refuses one with none instead of waiting', async () => {
    const dir = folder('fifo');
    const fifo = join(dir, 'pipe');
    execFileSync('mkfifo', [fifo]);
    expect(() => new OutputSet().file(fifo, 'x').write()).toThrow('a FIFO with no reader');
    const reader = spawn('cat', [fifo]);
    let got = '';
    reader.stdout.on('data', (chunk) => {
      got += chunk;
    });
    const ended = new Promise((resolve) => reader.on('exit', resolve));
    // cat opens the FIFO a moment after it starts; retry until it does.
    for (let i = 0; ; i++) {
      try {
        new OutputSet().file(fifo, 'through the pipe\n').write();
        break;
      } catch (error) {
        if (i > 200) throw error;
        await new Promise((resolve) => setTimeout(resolve, 10));
      }
    }
    await ended;
    expect(got).toBe('through the pipe\n');
    expect(lstatSync(fifo).isFIFO()).toBe(true);
  });

  it('writes a symlink’s target atomically and keeps the link; refuses a link to nothing', () => {
    const dir = folder('symlink');
    writeFileSync(join(dir, 'real.json'), 'old');
    symlinkSync('real.json', join(dir, 'link.json'));
    new OutputSet().file(join(dir, 'link.json'), 'new').write();
    expect(lstatSync(join(dir, 'link.json')).isSymbolicLink()).toBe(true);
    expect(readlinkSync(join(dir, 'link.json'))).toBe('real.json');
    expect(readFileSync(join(dir, 'real.json'), 'utf8')).toBe('new');
    symlinkSync('nowhere.json', join(dir, 'dangling.json'));
    expect(() => new OutputSet().file(join(dir, 'dangling.json'), 'x').write()).toThrow(
      'is a symbolic link to nothing',
    );
    expect(readdirSync(dir).sort()).toEqual(['dangling.json', 'link.json', 'real.json']);
  });

  it('refuses a hard link of an input (the same inode) and a name over 255 bytes', () => {
    const dir = folder('inode');
    linkSync(f.h1, join(dir, 'same.json'));
    expect(() => new OutputSet([f.h1]).file(join(dir, 'same.json'), 'x').write()).toThrow(
      `refusing to overwrite the input ${f.h1}`,
    );
    expect(() => new OutputSet().file(join(dir, 'a'.repeat(256)), 'x').write()).toThrow(
      'longer than 255 bytes',
    );
  });

  it('writes a valid 250-byte name', () => {
    const dir = folder('long-name');
    const name = `${'n'.repeat(245)}.json`;
    new OutputSet().file(join(dir, name), '{}\n').write();
    expect(readdirSync(dir)).toEqual([name]);
  });
});

describe('an input where an output would go is refused before any work', () => {
  it('report --target DIR/spectra.csv --out DIR', async () => {
    const dir = folder('report-target');
    copyFileSync(f.table, join(dir, 'spectra.csv'));
    const line = expectOneLineFailure(
      await runMain(['report', f.h1, '--units', 'g', '--target', join(dir, 'spectra.csv'), '--out', dir]),
    );
    expect(line).toContain('refusing to overwrite the input');
    expect(readdirSync(dir)).toEqual(['spectra.csv']);
  });

  it('spectrum --target DIR/psa.svg --svg DIR', async () => {
    const dir = folder('spectrum-target');
    copyFileSync(f.table, join(dir, 'psa.svg'));
    const line = expectOneLineFailure(
      await runMain(['spectrum', f.h1, '--units', 'g', '--target', join(dir, 'psa.svg'), '--svg', dir]),
    );
    expect(line).toContain('refusing to overwrite the input');
    expect(readFileSync(join(dir, 'psa.svg')).equals(readFileSync(f.table))).toBe(true);
  });

  it('batch: an input named DIR/suite.json, or lying at another record’s DIR/<name>/spectra.json', async () => {
    const dir = folder('batch');
    copyFileSync(f.h1, join(dir, 'suite.json'));
    let line = expectOneLineFailure(
      await runMain(['batch', f.h2, join(dir, 'suite.json'), '--units', 'g', '--threads', '1', '--out', dir]),
    );
    expect(line).toContain(`refusing to overwrite the input ${join(dir, 'suite.json')}`);
    expect(readdirSync(dir)).toEqual(['suite.json']);
    rmSync(join(dir, 'suite.json'));
    mkdirSync(join(dir, 'h1'));
    copyFileSync(f.h2, join(dir, 'h1', 'spectra.json'));
    line = expectOneLineFailure(
      await runMain([
        'batch',
        f.h1,
        join(dir, 'h1', 'spectra.json'),
        '--units',
        'g',
        '--threads',
        '1',
        '--out',
        dir,
      ]),
    );
    expect(line).toContain('refusing to overwrite the input');
    expect(readdirSync(dir)).toEqual(['h1']);
    expect(readdirSync(join(dir, 'h1'))).toEqual(['spectra.json']);
  });

  it('batch writes every record with the suite, keeping the mode of a file it replaces', async () => {
    const dir = folder('batch-mode');
    const args = [
      'batch',
      f.h1,
      f.h2,
      '--units',
      'g',
      '--periods',
      '0,0.1,1',
      '--threads',
      '1',
      '--out',
      dir,
    ];
    expect((await runMain(args)).code).toBe(0);
    expect(readdirSync(dir).sort()).toEqual([
      'h1',
      'h2',
      'suite.csv',
      'suite.html',
      'suite.json',
      'suite.svg',
    ]);
    chmodSync(join(dir, 'suite.json'), 0o600);
    expect((await runMain(args)).code).toBe(0);
    expect(statSync(join(dir, 'suite.json')).mode & 0o777).toBe(0o600);
    expect(readdirSync(dir).filter((n) => n.startsWith('.'))).toEqual([]);
  });
});
