import { spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { CAUTION } from '../../src/base/caution.js';

// `quakesweep spectrum` end to end on an invented record (the built CLI, as a user runs it).
const root = resolve(import.meta.dirname, '../..');
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

function run(...args: string[]) {
  const result = spawnSync(process.execPath, [bin, 'spectrum', recordFile, '--units', 'g', ...args], {
    cwd: folder,
    encoding: 'utf8',
  });
  return { code: result.status, stdout: result.stdout, stderr: result.stderr };
}

describe('quakesweep spectrum', () => {
  it('writes the JSON contract with its keys and units', () => {
    const result = run('--format', 'json', '--damping', '2%,0.05', '--periods', '0,0.1,1');
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

  it('uses the default grid: T = 0 and at least 100 log-spaced periods from 0.01 s to 10 s at 5%', () => {
    const json = JSON.parse(run('--format', 'json').stdout);
    expect(json.periods_s[0]).toBe(0);
    expect(json.periods_s[1]).toBeCloseTo(0.01, 12);
    expect(json.periods_s.at(-1)).toBeCloseTo(10, 12);
    expect(json.periods_s.length).toBeGreaterThanOrEqual(101);
    expect(json.spectra).toHaveLength(1);
    expect(json.spectra[0].damping).toBe(0.05);
  });

  it('writes CSV with the caution on # lines and units in the header, in the length unit asked', () => {
    const result = run('--format', 'csv', '--periods', '0.2:2:5', '--length-unit', 'mm');
    expect(result.code).toBe(0);
    const lines = result.stdout.trim().split('\n');
    const comments = lines.filter((line) => line.startsWith('#'));
    expect(comments.map((line) => line.slice(2)).join(' ')).toContain(CAUTION);
    const header = lines.find((line) => line.startsWith('period_s'))!;
    expect(header.split(',')).toEqual([
      'period_s',
      'sd_mm@5%',
      'psv_mm_s@5%',
      'psa_g@5%',
      'sv_mm_s@5%',
      'sa_g@5%',
    ]);
    const rows = lines.filter((line) => !line.startsWith('#') && line !== header);
    expect(rows).toHaveLength(5);
    const json = JSON.parse(run('--format', 'json', '--periods', '0.2:2:5').stdout);
    expect(Number(rows[2].split(',')[1])).toBeCloseTo(json.spectra[0].sd_m[2] * 1000, 9);
  });

  it('prints a summary table that starts with the caution', () => {
    const result = run();
    expect(result.code).toBe(0);
    expect(result.stdout.split('\n')[0].startsWith('! ')).toBe(true);
    expect(result.stdout.replace(/\n! /g, ' ')).toContain(CAUTION.slice(0, 60));
  });

  it('writes --out atomically and leaves no temporary file', () => {
    const out = join(folder, 'out.json');
    const result = run('--out', out);
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
    [['--format', 'xml'], /use json or csv/],
    [['--length-unit', 'furlong'], /unknown length unit/],
  ])('refuses %s with one line and exit code 2', (args, message) => {
    const out = join(folder, 'never.json');
    const result = run(...args, '--out', out);
    expect(result.code).toBe(2);
    expect(result.stderr.trim().split('\n')).toHaveLength(1);
    expect(result.stderr).toMatch(message);
    expect(existsSync(out)).toBe(false);
  });

  it('refuses more than a million oscillators without --force', () => {
    const result = run('--periods', '0.01:10:600000', '--damping', '2%,5%');
    expect(result.code).toBe(2);
    expect(result.stderr).toMatch(/--force/);
  });

  it('runs every method', () => {
    for (const method of ['newmark-average', 'newmark-linear', 'piecewise-exact']) {
      const json = JSON.parse(run('--format', 'json', '--method', method, '--periods', '0.5').stdout);
      expect(json.method).toBe(method);
      expect(json.spectra[0].psa_g[0]).toBeGreaterThan(0);
    }
  });

  it('writes the same bytes on one thread, on two, and when threads started early go unused', () => {
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
      expect(result.stderr).toBe('');
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
    expect(piped.stderr).toBe('');
    const fromPipe = JSON.parse(piped.stdout);
    expect(fromPipe.spectra).toEqual(JSON.parse(alone).spectra);
    expect(fromPipe.record.npts).toBe(20_000);
  });
});
