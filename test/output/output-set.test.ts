/**
 * The output set (common practice for safe output): all checks before any write, atomic writes;
 * through the commands, the input is never overwritten whatever the spelling of the output path,
 * a refused run leaves neither output nor temporary file, and a missing folder is named in one line.
 */
import {
  copyFileSync,
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
import { join, relative } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { OutputSet, writeFileAtomic } from '../../src/output/output-set.js';
import { writeFixtures } from '../helpers/fixtures.js';
import { expectOneLineFailure, runMain } from '../helpers/run-cli.js';

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
      const grid = command === 'spectrum' ? ['--periods', '0,1'] : [];
      const line = expectOneLineFailure(
        await runMain([command, input, '--units', 'g', ...grid, '--svg', dir]),
      );
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
