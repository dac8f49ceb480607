/**
 * What the next run does with what a killed one left (common practice for safe output): a journal
 * of a dead process is finished (every staged file renamed into place), its kept copies and stray
 * temporaries removed; a live process's files and other dot-files are left alone.
 */

import { spawnSync } from 'node:child_process';
import {
  existsSync,
  mkdirSync,
  mkdtempSync,
  readdirSync,
  readFileSync,
  rmSync,
  writeFileSync,
} from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { recoverFolder } from '../../src/output/recover.js';

const dir = mkdtempSync(join(tmpdir(), 'quakesweep-recover-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

// A pid no process holds: above the kernel's default pid_max of 2^22 (Linux, from memory).
const DEAD = (2 ** 22 + 17).toString(36);

describe('recoverFolder', () => {
  it('finishes the renames a dead process journalled, in this folder and one below', () => {
    const folder = join(dir, 'journal');
    mkdirSync(join(folder, 'rec'), { recursive: true });
    writeFileSync(join(folder, 'suite.json'), 'old');
    writeFileSync(join(folder, `.qs-${DEAD}-a.tmp`), 'new suite');
    writeFileSync(join(folder, 'rec', `.qs-${DEAD}-b.tmp`), 'new spectra');
    writeFileSync(join(folder, `.qs-${DEAD}-c.old`), 'old');
    const entries = [
      { temporary: join(folder, 'rec', `.qs-${DEAD}-b.tmp`), final: join(folder, 'rec', 'spectra.json') },
      {
        temporary: join(folder, `.qs-${DEAD}-a.tmp`),
        final: join(folder, 'suite.json'),
        backup: join(folder, `.qs-${DEAD}-c.old`),
      },
    ];
    writeFileSync(join(folder, `.qs-${DEAD}-j.jnl`), JSON.stringify({ entries }));
    // A subfolder recovered first still finds its parent's journal before removing anything.
    recoverFolder(join(folder, 'rec'));
    recoverFolder(folder);
    expect(readdirSync(folder).sort()).toEqual(['rec', 'suite.json']);
    expect(readFileSync(join(folder, 'suite.json'), 'utf8')).toBe('new suite');
    expect(readFileSync(join(folder, 'rec', 'spectra.json'), 'utf8')).toBe('new spectra');
  });

  it('removes the stray temporaries of a dead process and keeps those of a live one', () => {
    const folder = join(dir, 'stray');
    mkdirSync(folder);
    const live = `.qs-${process.pid.toString(36)}-x.tmp`;
    for (const name of [`.qs-${DEAD}-y.tmp`, `.qs-${DEAD}-z.jtmp`, live, '.qs-notes', 'a.json'])
      writeFileSync(join(folder, name), '');
    recoverFolder(folder);
    expect(readdirSync(folder).sort()).toEqual([live, '.qs-notes', 'a.json'].sort());
    expect(existsSync(join(folder, live))).toBe(true);
  });
});

describe('a SIGKILL between two renames', () => {
  it('leaves a journal from which the next run finishes the new set', () => {
    const folder = join(dir, 'killed');
    mkdirSync(folder);
    for (const name of ['a.json', 'b.csv', 'c.svg']) writeFileSync(join(folder, name), `old ${name}`);
    const dist = (name: string) => JSON.stringify(new URL(`../../dist/output/${name}`, import.meta.url).href);
    // The built transaction (test/global-setup.ts builds dist/), killed by SIGKILL before its third rename.
    const script = `
      const { renameSync, statSync } = require('node:fs');
      const { join } = require('node:path');
      Promise.all([import(${dist('transaction.js')}), import(${dist('atomic.js')})]).then(([{ commitFiles }, { stageFile }]) => {
        const folder = ${JSON.stringify(folder)};
        const planned = ['a.json', 'b.csv', 'c.svg', 'd.html'].map((name) => {
          const final = join(folder, name);
          let replaces; try { replaces = statSync(final); } catch {}
          return { final, contents: 'new ' + name, replaces };
        });
        let renames = 0;
        commitFiles(planned, folder, { stage: stageFile, rename(from, to) {
          if (renames++ === 2) process.kill(process.pid, 'SIGKILL');
          renameSync(from, to);
        } });
      });`;
    const result = spawnSync(process.execPath, ['-e', script], { encoding: 'utf8' });
    expect(result.signal, result.stderr).toBe('SIGKILL');
    const mixed = readdirSync(folder);
    expect(mixed.some((name) => name.endsWith('.jnl'))).toBe(true);
    recoverFolder(folder);
    expect(
      Object.fromEntries(
        readdirSync(folder)
          .sort()
          .map((n) => [n, readFileSync(join(folder, n), 'utf8')]),
      ),
    ).toEqual({
      'a.json': 'new a.json',
      'b.csv': 'new b.csv',
      'c.svg': 'new c.svg',
      'd.html': 'new d.html',
    });
  });

  it('with files in two folders, a run into either one finishes the whole set (a journal in each)', () => {
    const main = join(dir, 'two', 'out');
    const figures = join(dir, 'two', 'figures');
    mkdirSync(main, { recursive: true });
    mkdirSync(figures, { recursive: true });
    writeFileSync(join(main, 'a.json'), 'old a.json');
    writeFileSync(join(figures, 'b.svg'), 'old b.svg');
    writeFileSync(join(figures, 'c.svg'), 'old c.svg');
    const dist = (name: string) => JSON.stringify(new URL(`../../dist/output/${name}`, import.meta.url).href);
    // Killed after two of four renames: a.json and b.svg are new, c.svg is old, d.json not yet there.
    const script = `
      const { renameSync, statSync } = require('node:fs');
      const { join } = require('node:path');
      Promise.all([import(${dist('transaction.js')}), import(${dist('atomic.js')})]).then(([{ commitFiles }, { stageFile }]) => {
        const planned = [[${JSON.stringify(main)}, 'a.json'], [${JSON.stringify(figures)}, 'b.svg'],
          [${JSON.stringify(figures)}, 'c.svg'], [${JSON.stringify(main)}, 'd.json']].map(([folder, name]) => {
          const final = join(folder, name);
          let replaces; try { replaces = statSync(final); } catch {}
          return { final, contents: 'new ' + name, replaces };
        });
        let renames = 0;
        commitFiles(planned, ${JSON.stringify(main)}, { stage: stageFile, rename(from, to) {
          if (renames++ === 2) process.kill(process.pid, 'SIGKILL');
          renameSync(from, to);
        } });
      });`;
    const result = spawnSync(process.execPath, ['-e', script], { encoding: 'utf8' });
    expect(result.signal, result.stderr).toBe('SIGKILL');
    expect(readdirSync(figures).some((name) => name.endsWith('.jnl'))).toBe(true);
    const contents = (folder: string) =>
      Object.fromEntries(
        readdirSync(folder)
          .sort()
          .map((n) => [n, readFileSync(join(folder, n), 'utf8')]),
      );
    // The next run writes into the figures folder only.
    recoverFolder(figures);
    expect(contents(figures)).toEqual({ 'b.svg': 'new b.svg', 'c.svg': 'new c.svg' });
    expect(contents(main)).toEqual({ 'a.json': 'new a.json', 'd.json': 'new d.json' });
  });
});
