import { existsSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { readRecordText } from '../../../src/record/read.js';
import {
  besidesSuccess,
  type CliResult,
  expectOneLineFailure,
  runChild,
  runMain,
} from '../../helpers/run-cli.js';

// The record options (file, --units, --dt, --skip, standard input) through `quakesweep spectrum`
// on invented records: in-process main() run in the records' folder, a child process for stdin.
const folder = mkdtempSync(join(tmpdir(), 'quakesweep-cli-'));

afterAll(() => rmSync(folder, { recursive: true, force: true }));

async function run(args: string[], input?: string): Promise<CliResult> {
  if (input !== undefined) return runChild(['spectrum', ...args], { cwd: folder, input });
  const cwd = process.cwd();
  process.chdir(folder);
  try {
    return await runMain(['spectrum', ...args]);
  } finally {
    process.chdir(cwd);
  }
}

function file(name: string, content: string | Buffer): string {
  writeFileSync(join(folder, name), content);
  return name;
}

/** A table of `count` rows, time k·0.01 s, value 0.1·sin(k). */
function table(count: number): string[] {
  return Array.from(
    { length: count },
    (_, k) => `${(k * 0.01).toFixed(2)},${(0.1 * Math.sin(k)).toFixed(5)}`,
  );
}

/** One line on stderr, exit 2, no stack trace (the brief's rule for bad input). */
function expectRefused(result: CliResult, line: string | RegExp) {
  expect(result.code).toBe(2);
  const lines = result.stderr.trimEnd().split('\n');
  expect(lines).toHaveLength(1);
  if (typeof line === 'string') expect(lines[0]).toBe(line);
  else expect(lines[0]).toMatch(line);
  expect(result.stderr).not.toMatch(/\n\s+at /);
  expect(result.stdout).toBe('');
}

describe('bad records through the CLI', () => {
  it('names the file, the line and what was found', async () => {
    const rows = ['time,accel', ...table(15), '0.15,abc', '0.16,0.1'];
    const name = file('rec.csv', rows.join('\n'));
    expectRefused(await run([name, '--units', 'g']), "quakesweep: rec.csv:17: 'abc' is not a number");
  });

  it.each([
    ['NaN', ['0,0.1', '0.01,NaN', '0.02,0.1'], "quakesweep: bad.csv:2: 'NaN' is not a number"],
    ['Infinity', ['0,0.1', '0.01,0.2', '0.02,Infinity'], "quakesweep: bad.csv:3: 'Infinity' is not a number"],
    ['an empty value', ['0,0.1', '0.01,', '0.02,0.1'], 'quakesweep: bad.csv:2: empty value in column 2'],
    [
      'a short row',
      ['0,0.1', '0.01,0.2', '0.02'],
      'quakesweep: bad.csv:3: expected 2 columns, found 1 column',
    ],
    ['a header only', ['time,accel'], 'quakesweep: bad.csv:1: a header row but no values after it'],
    [
      'a changed step',
      ['0,1', '0.01,2', '0.02,3', '0.05,4'],
      /^quakesweep: bad\.csv:4: the time step changes here/,
    ],
    ['a repeated time', ['0,1', '0.01,2', '0.01,3'], /^quakesweep: bad\.csv:3: time does not increase/],
  ])('refuses %s with its line', async (_, rows, expected) => {
    expectRefused(await run([file('bad.csv', rows.join('\n')), '--units', 'g']), expected);
  });

  it('refuses an empty file', async () => {
    expectRefused(
      await run([file('empty.txt', ''), '--units', 'g', '--dt', '0.01']),
      /^quakesweep: empty\.txt: no values/,
    );
  });

  it('refuses binary garbage with a line, as bad input (exit 2), not an internal fault', async () => {
    const bytes = Buffer.alloc(2048);
    for (let i = 0; i < bytes.length; i++) bytes[i] = (i * 7919 + 13) % 256; // fixed, not text
    expectRefused(
      await run([file('noise.bin', bytes), '--units', 'g', '--dt', '0.01']),
      /^quakesweep: noise\.bin:\d+: /,
    );
  });

  it('requires the units and lists the accepted ones', async () => {
    const result = await run([file('ok.csv', table(20).join('\n'))]);
    expectRefused(result, /units are required.*accepted: g, m\/s2, cm\/s2, gal, mm\/s2, in\/s2, ft\/s2/);
  });

  it('refuses a missing file in one line', async () => {
    expectRefused(await run(['nowhere.csv', '--units', 'g']), 'quakesweep: nowhere.csv: no such file');
  });

  it('refuses a folder in one line, naming it', async () => {
    expectRefused(await run([folder, '--units', 'g', '--dt', '0.01']), `quakesweep: ${folder}: is a folder`);
  });

  it('refuses --dt that disagrees with the time column, naming the file', async () => {
    const result = await run([file('dt.csv', table(20).join('\n')), '--units', 'g', '--dt', '0.02']);
    expectRefused(result, "quakesweep: dt.csv: --dt 0.02 disagrees with the time column's step, 0.01 s");
  });

  it('refuses a one-value-a-line file without --dt', async () => {
    expectRefused(
      await run([file('single.txt', '0.1\n0.2\n0.3\n'), '--units', 'g']),
      /give the time step with --dt/,
    );
  });
});

describe('standard input', () => {
  it('reads a record from - and reports it', async () => {
    const input = ['# invented', 'time\taccel', ...table(50).map((row) => row.replace(',', '\t'))].join(
      '\r\n',
    );
    const result = await run(['-', '--units', 'g', '--periods', '0,0.5', '--format', 'json'], input);
    expect(besidesSuccess(result.stderr)).toBe('');
    expect(result.code).toBe(0);
    const json = JSON.parse(result.stdout);
    expect(json.record.npts).toBe(50);
    expect(json.record.dt_s).toBeCloseTo(0.01, 12); // 0.49 s / 49 steps, closed form
    // PGA of 0.1·sin(k), k = 0…49, written to 5 decimals: the largest |sin k| is at k = 11,
    // 11 being nearest 3.5π (closed form), |sin 11| = 0.999990, so the PGA reads 0.10000 g.
    expect(json.record.pga_g).toBeCloseTo(0.1, 9);
  });

  it('names standard input as - in errors', async () => {
    expectRefused(
      await run(['-', '--units', 'gal', '--dt', '0.01'], '1\n2\nabc\n'),
      "quakesweep: -:3: 'abc' is not a number",
    );
  });
});

describe('unit warnings', () => {
  it('warns on stderr, without failing, when the PGA looks like the wrong unit', async () => {
    // 981 read in g is 981 g; the same numbers in cm/s² would be about 1 g.
    const rows = ['0,0', '0.01,981', '0.02,-500', '0.03,0'];
    const result = await run([file('gal.csv', rows.join('\n')), '--units', 'g', '--periods', '0']);
    expect(result.code).toBe(0);
    expect(result.stderr).toMatch(/^quakesweep: warning: gal\.csv: PGA 981 g read in g is above 5 g/);
    expect(result.stderr).toMatch(/in cm\/s2 it would be 1\.00 g/);
  });

  it('does not warn on a plausible PGA', async () => {
    const result = await run([file('ok.csv', table(20).join('\n')), '--units', 'g', '--periods', '0']);
    expect(result.code).toBe(0);
    expect(besidesSuccess(result.stderr)).toBe('');
  });
});

describe('never silently wrong', () => {
  it('refuses a sample above 10^6 g, naming the file and line (no Infinity or null downstream)', async () => {
    const huge = join(folder, file('huge.txt', '0.1\n1e300\n-0.2\n'));
    for (const command of ['spectrum', 'info', 'damping']) {
      const out = join(folder, `huge-${command}.json`);
      const line = expectOneLineFailure(
        await runMain([command, huge, '--units', 'g', '--dt', '0.01', '--out', out]),
      );
      expect(line).toContain(`${huge}:2:`);
      expect(existsSync(out)).toBe(false);
    }
  });

  it('warns, naming the unit, when the PGA looks like the wrong unit (5 g and 0.001 g, common practice)', async () => {
    const small = await run([
      file('small.csv', table(20).join('\n')),
      '--units',
      'mm/s2',
      '--periods',
      '0,1',
    ]);
    expect(small.code).toBe(0);
    expect(small.stderr).toMatch(/warning: small\.csv: PGA .* read in mm\/s2 is below 0\.001 g/);
    const big = join(folder, file('mm.txt', '1000\n-3000\n500\n'));
    const info = await runMain([
      'info',
      big,
      '--units',
      'g',
      '--dt',
      '0.01',
      '--out',
      join(folder, 'mm.json'),
    ]);
    expect(info.stderr).toMatch(/warning: .*PGA 3000 g read in g is above 5 g/);
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

describe('standard input is bounded', () => {
  // A stream has no size to check first; past the bound it is refused, not read into memory.
  it('passes chunks up to the bound and refuses the one that passes it, naming stdin', async () => {
    const { boundedStdin, MAX_STDIN_BYTES } = await import('../../../src/cli/options/record.js');
    expect(MAX_STDIN_BYTES).toBe(2 ** 31);
    async function* endless() {
      for (;;) yield new Uint8Array(1000);
    }
    const seen: number[] = [];
    const read = async () => {
      for await (const chunk of boundedStdin(endless(), 5000)) seen.push(chunk.length);
    };
    await expect(read()).rejects.toThrow(/^more than 5000 bytes on standard input/);
    expect(seen).toEqual([1000, 1000, 1000, 1000, 1000]);
    const text = [];
    async function* two() {
      yield '0.1\n';
      yield '0.2\n';
    }
    for await (const chunk of boundedStdin(two(), 8)) text.push(chunk);
    expect(text).toEqual(['0.1\n', '0.2\n']);
  });
});
