/**
 * What the next run does with what a killed one left (common practice for safe output): a journal
 * of a dead process is finished (every staged file renamed into place), its kept copies and stray
 * temporaries removed; a live process's files and other dot-files are left alone.
 */
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
