/**
 * Safe output (common practice): the input is never overwritten, whatever the spelling of the
 * output path; a refused or failed run leaves neither the output nor a temporary file; a missing
 * folder is named in one line. Also: absurd record magnitudes and period grids are refused, and no
 * output carries NaN or Infinity.
 */
import {
  copyFileSync,
  existsSync,
  mkdirSync,
  readdirSync,
  readFileSync,
  rmSync,
  symlinkSync,
  writeFileSync,
} from 'node:fs';
import { join, relative } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { formatJson } from '../../src/formats/spectrum-json.js';
import { readRecordText } from '../../src/record/read.js';
import { writeFixtures } from './fixtures.js';
import { expectOneLineFailure, runMain } from './run-cli.js';

const f = writeFixtures();
afterAll(() => rmSync(f.dir, { recursive: true, force: true }));
const original = readFileSync(f.h1);

function folderWith(name: string): string {
  const dir = join(f.dir, name);
  mkdirSync(dir);
  return dir;
}

describe('the input is never overwritten', () => {
  const spellings: [string, () => string][] = [
    ['the same path', () => f.h1],
    ['another spelling', () => join(f.dir, 'x', '..', 'h1.csv')],
    ['a relative path', () => relative(process.cwd(), f.h1)],
    [
      'a symlink to it',
      () => {
        const link = join(f.dir, 'link.json');
        if (!existsSync(link)) symlinkSync(f.h1, link);
        return link;
      },
    ],
  ];
  for (const [label, out] of spellings) {
    it(`refuses --out as ${label}`, async () => {
      for (const command of [
        ['spectrum', f.h1, '--units', 'g'],
        ['info', f.h1, '--units', 'g'],
        ['damping', f.h1, '--units', 'g'],
        ['rotd', f.h2, f.h1, '--units', 'g'],
        ['floor', f.h1, '--units', 'g', '--building-period', '0.4', '--modal-factor', '1.3'],
        ['anchor', '--equipment', f.equipment, '--record', f.h1, '--units', 'g'],
      ]) {
        const line = expectOneLineFailure(
          await runMain(
            [...command, '--periods', '0,0.1,1', '--out', out()].filter(
              (a, i, all) =>
                !(command[0] === 'anchor' && (a === '--periods' || all[i - 1] === '--periods')) &&
                !(command[0] === 'info' && (a === '--periods' || all[i - 1] === '--periods')),
            ),
          ),
        );
        expect(line).toContain('refusing to overwrite the input');
        expect(readFileSync(f.h1).equals(original)).toBe(true);
      }
    });
  }

  it('refuses --svg into a folder holding the input under a figure name, writing no figure', async () => {
    for (const [command, name] of [
      ['spectrum', 'psa.svg'],
      ['spectrum', 'tripartite.svg'],
      ['info', 'husid.svg'],
      ['info', 'fourier.svg'],
    ]) {
      const dir = folderWith(`svg-${command}-${name}`);
      const input = join(dir, name);
      copyFileSync(f.h1, input);
      const line = expectOneLineFailure(await runMain([command, input, '--units', 'g', '--svg', dir]));
      expect(line).toContain('refusing to overwrite the input');
      expect(readdirSync(dir)).toEqual([name]);
      expect(readFileSync(input).equals(original)).toBe(true);
    }
  });

  it('refuses the design table as --out', async () => {
    const line = expectOneLineFailure(await runMain(['design', '--table', f.table, '--out', f.table]));
    expect(line).toContain('refusing to overwrite the input');
  });
});

describe('output paths that cannot be written', () => {
  it('names a missing folder in one line and leaves nothing', async () => {
    const dir = folderWith('missing');
    const line = expectOneLineFailure(
      await runMain(['spectrum', f.h1, '--units', 'g', '--out', join(dir, 'nope', 'out.json')]),
    );
    expect(line).toMatch(/folder .*nope does not exist/);
    expect(readdirSync(dir)).toEqual([]);
  });

  it('names a folder given as --out, not a temporary file', async () => {
    const dir = folderWith('as-folder');
    mkdirSync(join(dir, 'out.json'));
    const line = expectOneLineFailure(
      await runMain(['spectrum', f.h1, '--units', 'g', '--out', join(dir, 'out.json')]),
    );
    expect(line).toContain('it is a folder');
    expect(readdirSync(dir)).toEqual(['out.json']);
  });

  it('writes no figure when --out is refused', async () => {
    const dir = folderWith('figures-then-out');
    expectOneLineFailure(await runMain(['spectrum', f.h1, '--units', 'g', '--svg', dir, '--out', f.h1]));
    expect(readdirSync(dir)).toEqual([]);
  });
});

describe('every output of a command is checked before any is written', () => {
  it('floor, damping and rotd with --out naming the input write no figure', async () => {
    for (const command of [
      ['damping', f.h1, '--units', 'g'],
      ['rotd', f.h2, f.h1, '--units', 'g'],
      ['floor', f.h1, '--units', 'g', '--building-period', '0.4', '--modal-factor', '1.3'],
    ]) {
      const dir = folderWith(`input-as-out-${command[0]}`);
      const line = expectOneLineFailure(
        await runMain([...command, '--periods', '0,0.1,1', '--svg', dir, '--out', f.h1]),
      );
      expect(line).toContain('refusing to overwrite the input');
      expect(readdirSync(dir)).toEqual([]);
      expect(readFileSync(f.h1).equals(original)).toBe(true);
    }
  });

  it('design --out at the path of its own figure is refused, and nothing is written', async () => {
    const dir = join(f.dir, 'design-figs');
    const args = ['design', '--code', 'asce7-16', '--sds', '1', '--sd1', '0.6', '--tl', '8'];
    const line = expectOneLineFailure(
      await runMain([...args, '--svg', dir, '--out', join(dir, 'design.svg')]),
    );
    expect(line).toContain(`cannot write ${join(dir, 'design.svg')} twice`);
    expect(existsSync(dir)).toBe(false);
  });

  it('spectrum --svg creates a missing folder whose parent exists, as the other commands do', async () => {
    const dir = join(f.dir, 'spectrum-new-figs');
    const result = await runMain(['spectrum', f.h1, '--units', 'g', '--periods', '0,0.1,1', '--svg', dir]);
    expect(result.code).toBe(0);
    expect(readdirSync(dir).sort()).toEqual(['psa.svg', 'psv.svg', 'sd.svg', 'tripartite.svg']);
  });

  it('every command refuses --svg whose parent folder is missing, in the same words', async () => {
    const missing = join(f.dir, 'no-parent', 'figs');
    for (const command of [
      ['spectrum', f.h1, '--units', 'g'],
      ['info', f.h1, '--units', 'g'],
      ['damping', f.h1, '--units', 'g'],
      ['design', '--code', 'asce7-16', '--sds', '1', '--sd1', '0.6', '--tl', '8'],
    ]) {
      const line = expectOneLineFailure(await runMain([...command, '--svg', missing]));
      expect(line).toBe(`quakesweep: --svg ${missing}: its parent folder does not exist`);
    }
    expect(existsSync(join(f.dir, 'no-parent'))).toBe(false);
  });
});

describe('never silently wrong', () => {
  it('refuses a sample above 10^6 g, naming the file and line (no Infinity or null downstream)', async () => {
    const file = join(f.dir, 'huge.txt');
    writeFileSync(file, '0.1\n1e300\n-0.2\n');
    const dir = folderWith('huge');
    for (const command of ['spectrum', 'info', 'damping']) {
      const out = join(dir, `${command}.json`);
      const line = expectOneLineFailure(
        await runMain([command, file, '--units', 'g', '--dt', '0.01', '--out', out]),
      );
      expect(line).toContain(`${file}:2:`);
      expect(existsSync(out)).toBe(false);
    }
  });

  it('formatJson refuses NaN and Infinity instead of writing null', () => {
    expect(() => formatJson({ a: [1, Number.NaN] })).toThrow(/a\[1\] = NaN/);
    expect(() => formatJson({ b: { c: Number.POSITIVE_INFINITY } })).toThrow(/b\.c = Infinity/);
    expect(formatJson({ a: null, b: [1, 2] })).toBe('{\n  "a": null,\n  "b": [\n    1,\n    2\n  ]\n}\n');
  });

  it('warns, naming the unit, when the PGA looks like the wrong unit (5 g and 0.0001 g, common practice)', async () => {
    const dir = folderWith('warn');
    const big = await runMain([
      'spectrum',
      f.h1,
      '--units',
      'mm/s2',
      '--periods',
      '0,1',
      '--out',
      join(dir, 'a.json'),
    ]);
    expect(big.code).toBe(0);
    expect(big.stderr).toMatch(/warning: .*h1\.csv: PGA .* read in mm\/s2 is below 0\.0001 g/);
    const file = join(f.dir, 'mm.txt');
    writeFileSync(file, '1000\n-3000\n500\n');
    const small = await runMain(['info', file, '--units', 'g', '--dt', '0.01', '--out', join(dir, 'b.json')]);
    expect(small.stderr).toMatch(/warning: .*PGA 3\.00e\+3 g read in g is above 5 g/);
  });

  it('--skip counts comment lines among the skipped ones (a sample was dropped before)', () => {
    const record = readRecordText('# header\nstation x\n0.1\n0.2\n0.3\n', {
      units: 'g',
      dtS: 0.01,
      skip: 2,
      source: 'x',
    });
    expect(record.accelMS2.length).toBe(3); // three data lines after two skipped lines, by counting
  });
});

describe('period grids and damping lists that make no sense are refused on every command', () => {
  const bad: [string, string, RegExp][] = [
    ['--periods', '-1', /negative/],
    ['--periods', '', /not a number|empty/],
    ['--periods', '1e-300', /shorter than 0\.0001 s/],
    ['--periods', '0.01:10:1', /n must be an integer ≥ 2/],
    ['--periods', '0.01:10:2000000', /more than 1000000/],
    ['--periods', '0.1,0.1', /appears twice/],
    ['--periods', 'abc', /not a number/],
    ['--damping', '-5%', /negative/],
    ['--damping', '5', /above 1/],
    ['--damping', '', /not a number/],
    ['--damping', '5%,0.05', /appears twice/],
  ];
  const commands: string[][] = [
    ['spectrum', f.h1, '--units', 'g'],
    ['damping', f.h1, '--units', 'g'],
    ['rotd', f.h1, f.h2, '--units', 'g'],
    ['floor', f.h1, '--units', 'g', '--building-period', '0.4', '--modal-factor', '1.3'],
  ];
  for (const command of commands) {
    it(command[0], async () => {
      for (const [option, value, reason] of bad) {
        const line = expectOneLineFailure(await runMain([...command, option, value]));
        expect(line).toMatch(reason);
      }
      const many = expectOneLineFailure(
        await runMain([...command, '--periods', '0.01:10:600000', '--damping', '1%,2%']),
      );
      expect(many).toMatch(/add --force/);
    });
  }
  it('design', async () => {
    for (const [option, value, reason] of bad.filter(([o]) => o === '--periods')) {
      const line = expectOneLineFailure(
        await runMain([
          'design',
          '--code',
          'asce7-16',
          '--sds',
          '1',
          '--sd1',
          '0.6',
          '--tl',
          '8',
          option,
          value,
        ]),
      );
      expect(line).toMatch(reason);
    }
  });
  it('floor --building-period and anchor period_s below 0.1 ms', async () => {
    expect(
      expectOneLineFailure(
        await runMain(['floor', f.h1, '--units', 'g', '--building-period', '1e-300', '--modal-factor', '1']),
      ),
    ).toMatch(/≥ 0\.0001/);
    const equipment = join(f.dir, 'tiny-period.json');
    writeFileSync(
      equipment,
      readFileSync(f.equipment, 'utf8').replace('"period_s":0.1', '"period_s":1e-300'),
    );
    expect(
      expectOneLineFailure(
        await runMain(['anchor', '--equipment', equipment, '--record', f.h1, '--units', 'g']),
      ),
    ).toMatch(/period_s/);
  });
});
