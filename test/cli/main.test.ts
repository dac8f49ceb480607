/**
 * Errors everywhere: every command with missing, malformed or unknown options, missing files, a
 * folder as a file, an empty file and an unreadable file exits 2 with one line on stderr and no
 * stack trace (the project's rule for errors; common practice for command-line tools).
 */

import { spawnSync } from 'node:child_process';
import { chmodSync, existsSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { JSDOM } from 'jsdom';
import { afterAll, describe, expect, it } from 'vitest';
import { CAUTION } from '../../src/base/caution.js';
import { writeFixtures } from '../helpers/fixtures.js';
import { BIN, expectOneLineFailure, runChild, runMain, STACK_TRACE } from '../helpers/run-cli.js';

const f = writeFixtures();
const unreadable = join(f.dir, 'unreadable.txt');
writeFileSync(unreadable, '0.1\n0.2\n');
chmodSync(unreadable, 0o000);
afterAll(() => {
  chmodSync(unreadable, 0o600);
  rmSync(f.dir, { recursive: true, force: true });
});
/** Root reads any file whatever its mode; then the unreadable cases cannot be made and are left out. */
const canBeUnreadable = (() => {
  try {
    readFileSync(unreadable);
    return false;
  } catch {
    return true;
  }
})();
const missing = join(f.dir, 'no-such-file.csv');
const bldg = ['--building-period', '0.4', '--modal-factor', '1.3'];
const asce = ['--code', 'asce7-16', '--sds', '1', '--sd1', '0.6', '--tl', '8'];

/** Each command's bad invocations, and a word the one line must hold. */
// The units are asked of a file whose header does not state them (f.h1's column name says g).
const CASES: Record<string, [string[], RegExp][]> = {
  spectrum: [
    [['spectrum'], /missing required argument/],
    [['spectrum', f.single, '--dt', '0.01'], /units are required/],
    [['spectrum', f.h1, '--units', 'furlongs'], /unknown acceleration unit/],
    [['spectrum', f.single, '--units', 'g'], /--dt/],
    [['spectrum', f.single, '--units', 'g', '--dt', 'abc'], /--dt/],
    [['spectrum', f.single, '--units', 'g', '--dt', '-1'], /--dt/],
    [['spectrum', f.h1, '--units', 'g', '--dt', '0.02'], /disagrees/],
    [['spectrum', f.h1, '--units', 'g', '--format', 'xml'], /--format/],
    [['spectrum', f.h1, '--units', 'g', '--axes', 'polar'], /--axes/],
    [['spectrum', f.h1, '--units', 'g', '--method', 'euler'], /method/],
    [['spectrum', f.h1, '--units', 'g', '--length-unit', 'cubit'], /length unit/],
    [['spectrum', f.h1, '--units', 'g', '--svg', join(missing, 'figs')], /parent folder does not exist/],
    [['spectrum', f.h1, '--units', 'g', '--histories'], /--svg/],
    [['spectrum', f.h1, '--units', 'g', '--column', '0'], /--column/],
    [['spectrum', f.h1, '--units', 'g', '--column', '7'], /--column/],
    [['spectrum', f.h1, '--units', 'g', '--skip', '-2'], /--skip/],
    [['spectrum', f.h1, '--units', 'g', '--layout', 'diagonal'], /--layout/],
    [['spectrum', f.h1, '--units', 'g', '--filter', 'highpass:x'], /--filter/],
    [['spectrum', f.h1, '--units', 'g', '--taper', '70%'], /--taper/],
    [['spectrum', f.h1, '--units', 'g', '--baseline', 'quartic'], /--baseline/],
    [['spectrum', f.h1, '--units', 'g', '--resample', '0'], /--resample/],
    [['spectrum', f.h1, '--units', 'g', '--target', 'asce7-16:sds=x'], /./],
    [['spectrum', f.h1, '--units', 'g', '--scale-range', '0.1:1'], /--target/],
    [['spectrum', f.h1, '--units', 'g', '--perods', '1'], /unknown option/],
    [['spectrum', missing, '--units', 'g'], /no such file/],
    [['spectrum', f.dir, '--units', 'g'], /is a folder/],
    [['spectrum', f.empty, '--units', 'g', '--dt', '0.01'], /no values/],
    [['spectrum', unreadable, '--units', 'g', '--dt', '0.01'], /permission denied/],
  ],
  info: [
    [['info'], /missing required argument/],
    [['info', f.single, '--dt', '0.01'], /units are required/],
    [['info', f.h1, '--units', 'g', '--format', 'xml'], /--format/],
    [['info', f.h1, '--units', 'g', '--format', 'json', '--out', 'x.csv'], /contradicts/],
    [['info', f.h1, '--units', 'g', '--bracket-threshold', '-1'], /--bracket-threshold/],
    [['info', f.h1, '--units', 'g', '--smoothing', 'wide'], /--smoothing/],
    [['info', missing, '--units', 'g'], /no such file/],
    [['info', f.dir, '--units', 'g'], /is a folder/],
    [['info', f.empty, '--units', 'g', '--dt', '0.01'], /no values/],
  ],
  design: [
    [['design'], /choose a spectrum/],
    [['design', '--code', 'nz1170'], /--code/],
    [['design', '--code', 'asce7-16', '--sds', '1'], /--sd1/],
    [['design', ...asce.slice(0, 3), 'x', ...asce.slice(4)], /not a number/],
    [['design', '--code', 'ec8', '--type', '3', '--ground', 'C', '--ag', '0.2'], /type/i],
    [['design', '--code', 'ec8', '--type', '1', '--ground', 'Z', '--ag', '0.2'], /ground/i],
    [['design', ...asce, '--format', 'xml'], /--format/],
    [['design', '--table', missing], /no such file/],
    [['design', '--table', f.dir], /is a folder/],
    [['design', '--table', f.empty], /./],
    [['design', '--table', unreadable], /permission denied/],
  ],
  damping: [
    [['damping'], /missing required argument/],
    [['damping', f.single, '--dt', '0.01'], /units are required/],
    [['damping', f.h1, '--units', 'g', '--format', 'xml'], /--format/],
    [['damping', missing, '--units', 'g'], /no such file/],
    [['damping', f.empty, '--units', 'g', '--dt', '0.01'], /no values/],
  ],
  rotd: [
    [['rotd', f.h1], /missing required argument/],
    [['rotd', f.single, f.single, '--dt', '0.01'], /units are required/],
    [['rotd', f.h1, f.h2, '--units', 'g', '--angle-step', '7'], /angle step/],
    [['rotd', f.h1, f.h2, '--units', 'g', '--angle-step', 'x'], /--angle-step/],
    [['rotd', '-', '-', '--units', 'g'], /standard input/],
    [['rotd', f.h1, missing, '--units', 'g'], /no such file/],
    [['rotd', f.h1, f.single, '--units', 'g', '--dt', '0.02'], /./],
  ],
  floor: [
    [['floor', f.h1, '--units', 'g'], /--building-period/],
    [['floor', f.h1, '--units', 'g', '--building-period', '0.4'], /--modal-factor/],
    [['floor', f.h1, '--units', 'g', ...bldg, '--building-damping', '2%,5%'], /building-damping/],
    [['floor', f.h1, '--units', 'g', ...bldg, '--broaden', '1.5'], /--broaden/],
    [['floor', f.h1, '--units', 'g', '--building-period', 'abc', '--modal-factor', '1'], /--building-period/],
    [['floor', f.h1, '--units', 'g', '--building-period', '0.4', '--modal-factor', 'x'], /--modal-factor/],
    [['floor', missing, '--units', 'g', ...bldg], /no such file/],
  ],
  ductility: [
    [['ductility'], /missing required argument/],
    [['ductility', f.single, '--dt', '0.01'], /units are required/],
    [['ductility', missing, '--units', 'g'], /no such file/],
    [['ductility', f.dir, '--units', 'g'], /is a folder/],
    [['ductility', f.h1, '--units', 'g', '--ductility', '0.9'], /below 1/],
    [['ductility', f.h1, '--units', 'g', '--model', 'bilinear:1.2'], /--model/],
    [['ductility', f.h1, '--units', 'g', '--strength', '0'], /--strength/],
    [['ductility', f.h1, '--units', 'g', '--strength', '2', '--ductility', '2'], /not both/],
    [['ductility', f.h1, '--units', 'g', '--method', 'piecewise-exact'], /newmark-average only/],
    [
      ['ductility', f.h1, '--units', 'g', '--periods', '0.5', '--out', join(missing, 'd.json')],
      /does not exist/,
    ],
    [
      ['ductility', f.h1, '--units', 'g', '--periods', '0.5', '--svg', join(missing, 'figs')],
      /parent folder does not exist/,
    ],
    [['ductility', f.h1, '--units', 'g', '--axis', 'frequency'], /add --svg/],
  ],
  anchor: [
    [['anchor'], /--equipment/],
    [['anchor', '--equipment', missing], /no such file/],
    [['anchor', '--equipment', f.dir], /is a folder/],
    [['anchor', '--equipment', f.empty], /./],
    [['anchor', '--equipment', f.h1], /./],
    [['anchor', '--equipment', unreadable], /permission denied/],
    [['anchor', '--equipment', f.equipment, '--demand', 'most'], /demand/],
    [['anchor', '--equipment', f.equipment, '--record', f.single, '--dt', '0.01'], /units are required/],
    [['anchor', '--equipment', f.equipment, '--spectrum', f.h1], /./],
    [['anchor', '--equipment', f.equipment, '--spectrum', missing], /no such file/],
    [['anchor', '--equipment', f.equipment, '--format', 'xml'], /--format/],
  ],
  synth: [
    [['synth', '--dt', '0'], /--dt/],
    [['synth', '--seed', '-1'], /--seed/],
    [['synth', '--duration', 'long'], /--duration/],
    [['synth', '--out', join(missing, 'x.csv')], /does not exist/],
  ],
  record: [
    [['record'], /missing required argument/],
    [['record', f.h1], /units are required/],
    [['record', f.h1, '--units', 'g', '--with', 'jerk'], /--with/],
    [['record', f.h1, '--units', 'g', '--format', 'xml'], /--format/],
    [['record', f.h1, '--units', 'g', '--out', join(missing, 'x.csv')], /does not exist/],
    [['record', f.h1, '--units', 'g', '--out', f.h1], /refusing to overwrite the input/],
    [['record', missing, '--units', 'g'], /no such file/],
  ],
  program: [
    [['bogus'], /unknown command/],
    [['--frobnicate'], /unknown option/],
    [['help', 'spectrun'], /^quakesweep: no command 'spectrun' to explain; did you mean 'spectrum'\?$/],
    [['help', 'flor'], /did you mean 'floor'\?/],
    [['help', 'xyzzy'], /no command 'xyzzy' to explain; the commands are spectrum, info, record, /],
  ],
};

describe('every bad invocation gives exit 2 and one line', () => {
  for (const [command, cases] of Object.entries(CASES)) {
    it(command, async () => {
      const wrong: string[] = [];
      for (const [argv, expected] of cases) {
        if (!canBeUnreadable && argv.includes(unreadable)) continue;
        try {
          const line = expectOneLineFailure(await runMain(argv));
          if (!expected.test(line)) wrong.push(`${argv.join(' ')}\n  got: ${line}`);
        } catch (error) {
          wrong.push(`${argv.join(' ')}\n  ${(error as Error).message}`);
        }
      }
      expect(wrong).toEqual([]);
    });
  }
});

describe('help', () => {
  it('explains a command by name, and the program without one (exit 0)', async () => {
    const one = await runMain(['help', 'record']);
    expect(one.code).toBe(0);
    expect(one.stdout).toMatch(/Usage: quakesweep record/);
    expect((await runMain(['help'])).code).toBe(0);
  });
});

/** One successful run of every command here (batch and merge have their own tests). */
const SUCCESSES: Record<string, string[]> = {
  spectrum: ['spectrum', f.h1, '--units', 'g', '--periods', '0,0.5'],
  info: ['info', f.h1, '--units', 'g', '--format', 'csv'],
  record: ['record', f.h1, '--units', 'g', '--format', 'csv'],
  design: ['design', ...asce, '--periods', '0.5,1'],
  damping: ['damping', f.h1, '--units', 'g', '--periods', '0.5'],
  rotd: ['rotd', f.h1, f.h2, '--units', 'g', '--periods', '0.5', '--format', 'json'],
  floor: ['floor', f.h1, '--units', 'g', ...bldg, '--periods', '0.5', '--format', 'csv'],
  ductility: ['ductility', f.h1, '--units', 'g', '--periods', '0.5', '--ductility', '2'],
  anchor: ['anchor', '--equipment', f.equipment, '--format', 'csv'],
  synth: ['synth', '--duration', '2'],
  report: ['report', f.h1, '--units', 'g', '--periods', '0.2,0.5', '--out', join(f.dir, 'report')],
};

describe('every command ends a success with a summary and the caution on stderr', () => {
  for (const [command, argv] of Object.entries(SUCCESSES)) {
    it(command, async () => {
      const result = await runMain(argv);
      expect(result.code).toBe(0);
      const lines = result.stderr.split('\n').filter((line) => line !== '');
      expect(lines).toHaveLength(2);
      expect(lines[0]).toMatch(/^quakesweep: done: \S.*; wrote \S/);
      expect(lines[1]).toBe(`quakesweep: caution: ${CAUTION}`);
    });
  }
});

describe('failing streams and OS errors: one line, exit 2, no stack trace', () => {
  it('standard output closed early (EPIPE, as `| head -1` does)', () => {
    // Invented record long enough that its CSV overflows the pipe after head has gone.
    const long = join(f.dir, 'long.csv');
    const rows = Array.from(
      { length: 100_000 },
      (_, i) => `${(i * 0.01).toFixed(2)},${(0.1 * Math.sin(i)).toFixed(5)}`,
    );
    writeFileSync(long, `time_s,accel_g\n${rows.join('\n')}\n`);
    const result = spawnSync(
      '/bin/sh',
      ['-c', `"${process.execPath}" "${BIN}" record "${long}" --units g --format csv | head -1`],
      {
        encoding: 'utf8',
        timeout: 20_000,
      },
    );
    // The shell's status is head's; the one line tells ours (stderr passes the pipe by).
    const lines = result.stderr.split('\n').filter((l) => /^quakesweep: (?!done|caution)/.test(l));
    expect(lines).toEqual(['quakesweep: standard output was closed before the end; the output is cut short']);
    expect(result.stderr).not.toMatch(STACK_TRACE);
  });

  it.runIf(existsSync('/dev/full'))('standard output on a full device (ENOSPC)', () => {
    const result = spawnSync(
      '/bin/sh',
      ['-c', `"${process.execPath}" "${BIN}" spectrum "${f.h1}" > /dev/full; echo "exit $?" >&2`],
      {
        encoding: 'utf8',
        timeout: 20_000,
      },
    );
    expect(result.stderr).toContain(
      'quakesweep: standard output: no space left on the device; the output is cut short',
    );
    expect(result.stderr).toContain('exit 2');
    expect(result.stderr).not.toMatch(STACK_TRACE);
  });

  it('a file name too long for the file system (ENAMETOOLONG) names the path', async () => {
    const out = join(f.dir, `${'n'.repeat(300)}.json`);
    const line = expectOneLineFailure(await runMain(['spectrum', f.h1, '--out', out]));
    expect(line).toMatch(/n{100}\.json: (name too long|its name is longer than 255 bytes)$/);
    expect(line).not.toMatch(/internal error/);
  });

  it('a write into a folder that refuses it (EACCES, or EROFS) names the path', async () => {
    const folder = join(f.dir, 'read-only');
    const { mkdirSync } = await import('node:fs');
    mkdirSync(folder);
    chmodSync(folder, 0o500);
    try {
      const result = await runMain(['spectrum', f.h1, '--out', join(folder, 'x.json')]);
      // Root writes into any folder whatever its mode; then only the success can be checked.
      if (result.code !== 0) expect(expectOneLineFailure(result)).toMatch(/read-only.*: permission denied$/);
    } finally {
      chmodSync(folder, 0o700);
    }
  });
});

describe('hostile record names (invented)', () => {
  it('a control character in a name leaves the SVG well-formed XML, and no escape reaches stderr', () => {
    const folder = join(f.dir, 'named');
    const result = runChild([
      'spectrum',
      f.h1,
      '--name',
      'h1\u0001\u001b[31m,=HYPERLINK(1)',
      '--svg',
      folder,
    ]);
    expect(result.code).toBe(0);
    const text = readFileSync(join(folder, 'psa.svg'), 'utf8');
    const doc = new JSDOM(text, { contentType: 'image/svg+xml' }).window.document;
    expect(doc.getElementsByTagName('parsererror').length).toBe(0);
    expect(text).toContain('h1,=HYPERLINK(1)');
    // biome-ignore lint/suspicious/noControlCharactersInRegex: looking for control characters is the point
    expect(result.stderr + result.stdout).not.toMatch(/[\u0000-\u0008\u001b]/);
  });

  it('a bell or an escape in a file name does not reach a table on standard output (found by the long fuzz run)', () => {
    const file = join(f.dir, 'bell\u0007esc\u001b[31m.txt');
    writeFileSync(file, readFileSync(f.h1));
    const equipment = new URL('../../records/equipment-generator.json', import.meta.url).pathname;
    const result = runChild([
      'anchor',
      '--equipment',
      equipment,
      '--record',
      file,
      '--units',
      'g',
      '--format',
      'table',
    ]);
    expect(result.code, result.stderr).toBe(0);
    expect(result.stdout).toContain('bellesc');
    // biome-ignore lint/suspicious/noControlCharactersInRegex: looking for control characters is the point
    expect(result.stdout).not.toMatch(/[\u0000-\u0008\u001b\u007f-\u009f]/);
  });

  it('an escape sequence in a file name reaches neither a warning nor the summary on stderr (found by the options fuzz test)', async () => {
    // The name of the record is made printable; the path in a unit warning and in "wrote …" once was not.
    const file = join(f.dir, 'esc\u001b[31mred\u001b[0m.txt');
    writeFileSync(file, readFileSync(f.h1));
    const out = join(f.dir, 'esc\u001b]0;title\u0007.json');
    const result = await runMain(['spectrum', file, '--units', 'cm/s2', '--out', out]);
    expect(result.code).toBe(0);
    expect(result.stderr).toMatch(/warning: .*escred\.txt: PGA/);
    // biome-ignore lint/suspicious/noControlCharactersInRegex: looking for control characters is the point
    expect(result.stderr).not.toMatch(/[\u0000-\u0008\u001b]/);
  });
});
