import { spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { CAUTION } from '../../../src/base/caution.js';
import {
  besidesSuccess,
  type CliResult,
  expectOneLineFailure,
  runMain,
  runMainIn,
} from '../../helpers/run-cli.js';

// `quakesweep spectrum` on an invented record: in-process main(), and the built CLI where threads
// and a pipe are the point.
const root = resolve(import.meta.dirname, '../../..');
const bin = join(root, 'bin', 'quakesweep.js');
const folder = mkdtempSync(join(tmpdir(), 'quakesweep-spectrum-'));
afterAll(() => rmSync(folder, { recursive: true, force: true }));

const recordFile = join(folder, 'invented.csv');
writeFileSync(
  recordFile,
  `time_s,accel_g\n${Array.from({ length: 1500 }, (_, i) => {
    const t = i * 0.01;
    return `${t.toFixed(2)},${(0.25 * Math.exp(-(((t - 5) / 2) ** 2)) * Math.sin(2 * Math.PI * 2 * t)).toFixed(6)}`;
  }).join('\n')}\n`,
);

function run(...args: string[]): Promise<CliResult> {
  return runMain(['spectrum', recordFile, '--units', 'g', ...args]);
}

describe('quakesweep spectrum', () => {
  it('writes the JSON contract with its keys and units', async () => {
    const result = await run('--format', 'json', '--damping', '2%,0.05', '--periods', '0,0.1,1');
    expect(result.code).toBe(0);
    const json = JSON.parse(result.stdout);
    expect(json.caution).toBe(CAUTION);
    expect(Object.keys(json.record)).toEqual(expect.arrayContaining(['name', 'npts', 'dt_s', 'pga_g']));
    expect(json.record.npts).toBe(1500);
    expect(json.record.dt_s).toBeCloseTo(0.01, 12);
    expect(json.method).toBe('newmark-average');
    expect(json.periods_s).toEqual([0, 0.1, 1]);
    expect(json.spectra.map((s: { damping: number }) => s.damping)).toEqual([0.02, 0.05]);
    for (const curve of json.spectra) {
      for (const key of ['sd_m', 'psv_m_s', 'psa_g', 'sv_m_s', 'sa_g']) expect(curve[key]).toHaveLength(3);
      // T = 0: rigid, PSA = SA = PGA (common practice).
      expect(curve.psa_g[0]).toBeCloseTo(json.record.pga_g, 12);
      expect(curve.sa_g[0]).toBeCloseTo(json.record.pga_g, 12);
      expect(curve.sd_m[0]).toBe(0);
      // PSV = ωSD and PSA = ω²SD (definitions).
      const omega = (2 * Math.PI) / 1;
      expect(curve.psv_m_s[2]).toBeCloseTo(omega * curve.sd_m[2], 12);
      expect(curve.psa_g[2]).toBeCloseTo((omega * omega * curve.sd_m[2]) / 9.80665, 12);
    }
  });

  it('uses the default grid: T = 0 and at least 100 log-spaced periods from 0.01 s to 10 s at 5%', async () => {
    const json = JSON.parse((await run('--format', 'json')).stdout);
    expect(json.periods_s[0]).toBe(0);
    expect(json.periods_s[1]).toBeCloseTo(0.01, 12);
    expect(json.periods_s.at(-1)).toBeCloseTo(10, 12);
    expect(json.periods_s.length).toBeGreaterThanOrEqual(101);
    expect(json.spectra).toHaveLength(1);
    expect(json.spectra[0].damping).toBe(0.05);
  });

  it('writes CSV with the caution on # lines and units in the header, in the length unit asked', async () => {
    const result = await run('--format', 'csv', '--periods', '0.2:2:5', '--length-unit', 'mm');
    expect(result.code).toBe(0);
    const lines = result.stdout.trim().split('\n');
    const comments = lines.filter((line) => line.startsWith('#'));
    expect(comments.map((line) => line.slice(2)).join(' ')).toContain(CAUTION);
    const header = lines.find((line) => line.startsWith('period_s'))!;
    expect(header.split(',')).toEqual([
      'period_s',
      'frequency_hz',
      'sd_mm@5%',
      'psv_mm_s@5%',
      'psa_g@5%',
      'sv_mm_s@5%',
      'sa_g@5%',
    ]);
    const rows = lines.filter((line) => !line.startsWith('#') && line !== header);
    expect(rows).toHaveLength(5);
    const json = JSON.parse((await run('--format', 'json', '--periods', '0.2:2:5')).stdout);
    expect(Number(rows[2].split(',')[2])).toBeCloseTo(json.spectra[0].sd_m[2] * 1000, 9);
  });

  it('prints a summary table that starts with the caution', async () => {
    const result = await run('--periods', '0,0.5,1');
    expect(result.code).toBe(0);
    expect(result.stdout.split('\n')[0].startsWith('! ')).toBe(true);
    expect(result.stdout.replace(/\n! /g, ' ')).toContain(CAUTION.slice(0, 60));
  });

  it('writes --out atomically and leaves no temporary file', async () => {
    const out = join(folder, 'out.json');
    const result = await run('--periods', '0,1', '--out', out);
    expect(result.code).toBe(0);
    expect(JSON.parse(readFileSync(out, 'utf8')).caution).toBe(CAUTION);
    expect(readdirSync(folder).filter((name) => name.includes('.tmp'))).toEqual([]);
  });

  it.each([
    [['--damping', '5'], /5% for a percentage/],
    [['--damping', '-0.1'], /negative/],
    [['--periods', '1:0.1:10'], /a < b/],
    [['--periods', '0.1,abc'], /not a number/],
    [['--periods', '-1,1'], /negative/],
    [['--method', 'runge-kutta'], /accepted: newmark-average/],
    [['--format', 'xml'], /use table, json or csv/],
    [['--length-unit', 'furlong'], /unknown length unit/],
  ])('refuses %s with one line and exit code 2', async (args, message) => {
    const out = join(folder, 'never.json');
    const result = await run(...args, '--out', out);
    expect(result.code).toBe(2);
    expect(result.stderr.trim().split('\n')).toHaveLength(1);
    expect(result.stderr).toMatch(message);
    expect(existsSync(out)).toBe(false);
  });

  it('refuses more than a million oscillators without --force', async () => {
    const result = await run('--periods', '0.01:10:600000', '--damping', '2%,5%');
    expect(result.code).toBe(2);
    expect(result.stderr).toMatch(/--force/);
  });

  it('runs every method', async () => {
    for (const method of ['newmark-average', 'newmark-linear', 'piecewise-exact']) {
      const json = JSON.parse((await run('--format', 'json', '--method', method, '--periods', '0.5')).stdout);
      expect(json.method).toBe(method);
      expect(json.spectra[0].psa_g[0]).toBeGreaterThan(0);
    }
  });

  it('writes the same bytes on one thread, on two, and when threads started early go unused', async () => {
    // 20,000 samples: the first 700 lines short (about 12 bytes), the rest padded with blanks to 80
    // bytes, so that spectrum, which guesses the record's length from the line ends of the file's
    // first 8 KiB before reading it, guesses about 100,000 and starts its threads early. 2,000
    // oscillators: 40 million steps, split over them; 750: 15 million, below the 20 million from
    // which a sweep is split, so the threads started go unused. --threads 1 never starts them.
    const big = join(folder, 'long.csv');
    const lines = Array.from({ length: 20_000 }, (_, i) => {
      const line = `${(i * 0.005).toFixed(3)},${(0.1 * Math.sin(i / 9) * Math.exp(-i / 8_000)).toFixed(6)}`;
      return i < 700 ? line : line.padEnd(79);
    });
    writeFileSync(big, `${lines.join('\n')}\n`);
    const spectrum = (source: string, args: string[]) => {
      const result = spawnSync(
        process.execPath,
        [bin, 'spectrum', source, '--units', 'g', '--format', 'json', '--name', 'long', ...args],
        { cwd: folder, encoding: 'utf8' },
      );
      expect(besidesSuccess(result.stderr)).toBe('');
      expect(result.status).toBe(0);
      return result.stdout;
    };
    const split = ['--periods', '0.05:10:400', '--damping', '2%,5%,10%,20%,30%'];
    const alone = spectrum(big, [...split, '--threads', '1']);
    expect(spectrum(big, split)).toBe(alone);
    expect(spectrum(big, [...split, '--threads', '2'])).toBe(alone);
    const unsplit = ['--periods', '0.05:10:150', '--damping', '2%,5%,10%,20%,30%'];
    expect(spectrum(big, unsplit)).toBe(spectrum(big, [...unsplit, '--threads', '1']));
    // A pipe named as the record: read whole, and split over threads all the same.
    const piped = spawnSync(
      '/bin/sh',
      [
        '-c',
        `cat long.csv | "${process.execPath}" "${bin}" spectrum /dev/stdin --units g --format json ${split.join(' ')}`,
      ],
      { cwd: folder, encoding: 'utf8' },
    );
    expect(besidesSuccess(piped.stderr)).toBe('');
    const fromPipe = JSON.parse(piped.stdout);
    expect(fromPipe.spectra).toEqual(JSON.parse(alone).spectra);
    expect(fromPipe.record.npts).toBe(20_000);
  });
});

/** `quakesweep ARGS` run in the test folder, so file names are given as a person types them. */
function runIn(...args: string[]): Promise<CliResult> {
  return runMainIn(folder, args);
}

async function jsonIn(...args: string[]) {
  const result = await runIn(...args, '--format', 'json');
  expect(besidesSuccess(result.stderr)).toBe('');
  expect(result.code).toBe(0);
  return JSON.parse(result.stdout);
}

// h1.txt: a Gaussian-windowed 1.6 Hz sine, 6 s at 0.01 s (invented), one value a line.
writeFileSync(
  join(folder, 'h1.txt'),
  Array.from({ length: 600 }, (_, i) => {
    const t = i * 0.01;
    return String(0.3 * Math.exp(-(((t - 2.5) / 1) ** 2)) * Math.sin(2 * Math.PI * 1.6 * t));
  }).join('\n'),
);

describe('quakesweep spectrum --target', () => {
  const record = ['h1.txt', '--units', 'g', '--dt', '0.01'];

  it('reports the scaling and the target in JSON; --apply-scale scales and records the step', async () => {
    const plain = await jsonIn('spectrum', ...record, '--periods', '0,0.2,0.5,1,2');
    const fitted = await jsonIn(
      'spectrum',
      ...record,
      '--periods',
      '0,0.2,0.5,1,2',
      '--target',
      'asce7-16:sds=1.0,sd1=0.6,tl=8',
      '--scale-range',
      '0.2:1',
    );
    expect(fitted.target.psa_g).toHaveLength(5);
    expect(fitted.target.psa_g[2]).toBeCloseTo(1.0, 12);
    const s = fitted.scaling;
    expect(s.range_s).toEqual([0.2, 1]);
    // exp(mean(ln target − ln record)) over 0.2, 0.5, 1 s, from the unscaled record's PSA.
    const psa = plain.spectra[0].psa_g;
    const expected = Math.exp((Math.log(1.0 / psa[1]) + Math.log(1.0 / psa[2]) + Math.log(0.6 / psa[3])) / 3);
    expect(s.factor).toBeCloseTo(expected, 10);
    expect(s.min_ratio).toBeLessThanOrEqual(s.mean_ratio);
    expect(s.max_ratio).toBeGreaterThanOrEqual(s.mean_ratio);
    // Only the reading is stated: fitting a target does not scale the record.
    expect(fitted.record.processing.map((step: { operation: string }) => step.operation)).toEqual(['read']);
    const applied = await jsonIn(
      'spectrum',
      ...record,
      '--periods',
      '0,0.2,0.5,1,2',
      '--target',
      'asce7-16:sds=1.0,sd1=0.6,tl=8',
      '--scale-range',
      '0.2:1',
      '--apply-scale',
    );
    expect(applied.record.processing[1].operation).toBe('scale'); // after the reading
    expect(applied.spectra[0].psa_g[3]).toBeCloseTo(psa[3] * s.factor, 10);
  });

  it('accepts ec8 targets and table files, and refuses scaling options without a target', async () => {
    const ec8 = await jsonIn('spectrum', ...record, '--target', 'ec8:type=1,ground=C,ag=0.25');
    expect(ec8.target.psa_g.at(-1)).toBeNull(); // 10 s is beyond the Eurocode 8 spectrum
    expect(ec8.scaling.range_s[1]).toBeLessThanOrEqual(4);
    writeFileSync(join(folder, 'site.csv'), 'period_s,psa_g\n0.1,0.5\n3,0.2\n');
    const table = await jsonIn('spectrum', ...record, '--target', 'site.csv');
    expect(table.scaling.range_s[0]).toBeGreaterThanOrEqual(0.1);
    const bad = await runIn('spectrum', ...record, '--apply-scale');
    expect(bad.code).toBe(2);
    expect(bad.stderr).toMatch(/needs --target/);
    const csv = await runIn(
      'spectrum',
      ...record,
      '--periods',
      '0.2,1',
      '--target',
      'site.csv',
      '--format',
      'csv',
    );
    expect(csv.stdout).toMatch(/# scaling: factor/);
    expect(csv.stdout).toMatch(/,target_psa_g\n/);
  });

  it('accepts both ASCE 7-22 forms, and keeps outputs off the multi-period table it read', async () => {
    const twoPeriod = await jsonIn(
      'spectrum',
      ...record,
      '--periods',
      '0.2,1,10',
      '--target',
      'asce7-22:sds=1.0,sd1=0.6,tl=8',
    );
    expect(twoPeriod.target.code).toBe('asce7-22');
    expect(twoPeriod.target.psa_g[1]).toBeCloseTo(0.6, 12); // §11.4.5.2: S_D1/T at 1 s
    // An invented site table: log–log halfway between (1, 0.8) and (4, 0.2) is √(0.8 · 0.2) = 0.4 g.
    writeFileSync(join(folder, 'mp.csv'), '# invented\nperiod_s,sa_g\n0,0.4\n0.2,1.0\n1,0.8\n4,0.2\n');
    const multi = await jsonIn(
      'spectrum',
      ...record,
      '--periods',
      '0.2,2,10',
      '--target',
      'asce7-22:multi-period=mp.csv',
    );
    expect(multi.target.parameters).toEqual({ form: 'multi-period', source: 'mp.csv', rows: 4 });
    expect(multi.target.psa_g[1]).toBeCloseTo(0.4, 12);
    expect(multi.target.psa_g[2]).toBeNull(); // 10 s is beyond the table
    const over = await runIn(
      'spectrum',
      ...record,
      '--target',
      'asce7-22:multi-period=mp.csv',
      '--out',
      'mp.csv',
    );
    expect(expectOneLineFailure(over)).toBe(
      'quakesweep: refusing to overwrite the input mp.csv with an output',
    );
    const mixed = await runIn('spectrum', ...record, '--target', 'asce7-22:multi-period=mp.csv,sds=1');
    expect(expectOneLineFailure(mixed)).toMatch(/sds= does not go with a multi-period table/);
  });
});
