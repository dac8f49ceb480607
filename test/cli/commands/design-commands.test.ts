import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import { CAUTION } from '../../../src/base/caution.js';

// Runs the compiled CLI (npm test builds first); the records are invented test motions.
const BIN = join(import.meta.dirname, '../../../bin/quakesweep.js');
let folder = '';

function run(...args: string[]) {
  const result = spawnSync(process.execPath, [BIN, ...args], { cwd: folder, encoding: 'utf8' });
  return { code: result.status, stdout: result.stdout, stderr: result.stderr };
}

function json(...args: string[]) {
  const result = run(...args, '--format', 'json');
  expect(result.stderr).toBe('');
  expect(result.code).toBe(0);
  return JSON.parse(result.stdout);
}

beforeAll(() => {
  folder = mkdtempSync(join(tmpdir(), 'quakesweep-design-'));
  const write = (name: string, f: number) =>
    writeFileSync(
      join(folder, name),
      Array.from({ length: 600 }, (_, i) => {
        const t = i * 0.01;
        return String(0.3 * Math.exp(-(((t - 2.5) / 1) ** 2)) * Math.sin(2 * Math.PI * f * t));
      }).join('\n'),
    );
  write('h1.txt', 1.6);
  write('h2.txt', 0.9);
});

describe('quakesweep design', () => {
  it('--code asce7-16 --sds 1.0 --sd1 0.6 --tl 8 (values from §11.4.6, hand calculation)', () => {
    const out = json(
      'design',
      '--code',
      'asce7-16',
      '--sds',
      '1.0',
      '--sd1',
      '0.6',
      '--tl',
      '8',
      '--periods',
      '0,0.12,1,10',
    );
    expect(out.caution).toBe(CAUTION);
    expect(out.periods_s).toEqual([0, 0.12, 1, 10]);
    expect(out.psa_g[0]).toBeCloseTo(0.4, 12);
    expect(out.psa_g[1]).toBeCloseTo(1.0, 12);
    expect(out.psa_g[2]).toBeCloseTo(0.6, 12);
    expect(out.psa_g[3]).toBeCloseTo(0.048, 12);
    expect(out.parameters.tl_s).toBe(8);
  });

  it('--code ec8 --type 1 --ground C --ag 0.25 --damping 10% (EN 1998-1 Eq. 3.3 and 3.6)', () => {
    const out = json(
      'design',
      '--code',
      'ec8',
      '--type',
      '1',
      '--ground',
      'C',
      '--ag',
      '0.25',
      '--damping',
      '10%',
      '--periods',
      '0.4',
    );
    expect(out.psa_g[0]).toBeCloseTo(2.5 * 0.25 * 1.15 * Math.sqrt(10 / 15), 12);
    const whole = json('design', '--code', 'ec8', '--type', '1', '--ground', 'C', '--ag', '0.25');
    expect(Math.max(...whole.periods_s)).toBeLessThanOrEqual(4); // the spectrum stops at 4 s
  });

  it('prints the caution first on the terminal', () => {
    const out = run('design', '--code', 'asce7-16', '--sds', '1.0', '--sd1', '0.6', '--tl', '8');
    expect(out.code).toBe(0);
    expect(out.stdout.startsWith('! Preliminary')).toBe(true);
  });

  it('--format csv --out, read back with --table, round-trips', () => {
    const written = run(
      'design',
      '--code',
      'ec8',
      '--type',
      '2',
      '--ground',
      'D',
      '--ag',
      '0.2',
      '--format',
      'csv',
      '--out',
      'ec8.csv',
    );
    expect(written.code).toBe(0);
    expect(readFileSync(join(folder, 'ec8.csv'), 'utf8')).toContain('period_s,psa_g');
    const original = json('design', '--code', 'ec8', '--type', '2', '--ground', 'D', '--ag', '0.2');
    const back = json('design', '--table', 'ec8.csv');
    expect(back.periods_s).toEqual(original.periods_s);
    expect(back.psa_g).toEqual(original.psa_g);
  });

  it('refuses mixed or missing options with exit code 2', () => {
    const mixed = run(
      'design',
      '--code',
      'asce7-16',
      '--sds',
      '1',
      '--sd1',
      '0.6',
      '--tl',
      '8',
      '--ground',
      'C',
    );
    expect(mixed.code).toBe(2);
    expect(mixed.stderr).toMatch(/^quakesweep: --ground does not apply/);
    expect(run('design', '--code', 'ec8', '--type', '1', '--ag', '0.25').stderr).toMatch(
      /--ground is required/,
    );
    expect(run('design').code).toBe(2);
    const outside = run(
      'design',
      '--code',
      'ec8',
      '--type',
      '1',
      '--ground',
      'C',
      '--ag',
      '0.25',
      '--periods',
      '5',
    );
    expect(outside.code).toBe(2);
    expect(outside.stderr).toMatch(/outside/);
  });
});

describe('quakesweep spectrum --target', () => {
  const record = ['h1.txt', '--units', 'g', '--dt', '0.01'];

  it('reports the scaling and the target in JSON; --apply-scale scales and records the step', () => {
    const plain = json('spectrum', ...record, '--periods', '0,0.2,0.5,1,2');
    const fitted = json(
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
    expect(fitted.record.processing).toEqual([]);
    const applied = json(
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
    expect(applied.record.processing[0].operation).toBe('scale');
    expect(applied.spectra[0].psa_g[3]).toBeCloseTo(psa[3] * s.factor, 10);
  });

  it('accepts ec8 targets and table files, and refuses scaling options without a target', () => {
    const ec8 = json('spectrum', ...record, '--target', 'ec8:type=1,ground=C,ag=0.25');
    expect(ec8.target.psa_g.at(-1)).toBeNull(); // 10 s is beyond the Eurocode 8 spectrum
    expect(ec8.scaling.range_s[1]).toBeLessThanOrEqual(4);
    writeFileSync(join(folder, 'site.csv'), 'period_s,psa_g\n0.1,0.5\n3,0.2\n');
    const table = json('spectrum', ...record, '--target', 'site.csv');
    expect(table.scaling.range_s[0]).toBeGreaterThanOrEqual(0.1);
    const bad = run('spectrum', ...record, '--apply-scale');
    expect(bad.code).toBe(2);
    expect(bad.stderr).toMatch(/needs --target/);
    const csv = run('spectrum', ...record, '--periods', '0.2,1', '--target', 'site.csv', '--format', 'csv');
    expect(csv.stdout).toMatch(/# scaling: factor/);
    expect(csv.stdout).toMatch(/,target_psa_g\n/);
  });
});

describe('quakesweep damping', () => {
  it('--damping 2%,5%,10%,20%: ratios to 5% and published factors', () => {
    const out = json(
      'damping',
      'h1.txt',
      '--units',
      'g',
      '--dt',
      '0.01',
      '--damping',
      '2%,5%,10%,20%',
      '--periods',
      '0,0.3,1',
    );
    expect(out.spectra.map((s: { damping: number }) => s.damping)).toEqual([0.02, 0.05, 0.1, 0.2]);
    expect(out.spectra[1].ratio_to_reference).toEqual([1, 1, 1]);
    expect(out.spectra[3].published.ec8_eta_ratio).toBeCloseTo(Math.sqrt(10 / 25), 12); // EN 1998-1 Eq. 3.6
    const added = json(
      'damping',
      'h1.txt',
      '--units',
      'g',
      '--dt',
      '0.01',
      '--damping',
      '10%',
      '--periods',
      '0.3',
    );
    expect(added.reference_added).toBe(true);
  });
});

describe('quakesweep rotd', () => {
  it('H1 H2 with --periods, --damping, --method: JSON shape', () => {
    const out = json(
      'rotd',
      'h1.txt',
      'h2.txt',
      '--units',
      'g',
      '--dt',
      '0.01',
      '--periods',
      '0,0.5,1',
      '--damping',
      '5%,10%',
      '--method',
      'piecewise-exact',
    );
    expect(out.caution).toBe(CAUTION);
    expect(out.periods_s).toEqual([0, 0.5, 1]);
    expect(out.spectra).toHaveLength(2);
    for (const key of ['rotd50_g', 'rotd100_g', 'geomean_g']) expect(out.spectra[0][key]).toHaveLength(3);
  });

  it('the same record twice gives RotD100 = √2 × its PSA (closed form)', () => {
    const own = json('spectrum', 'h1.txt', '--units', 'g', '--dt', '0.01', '--periods', '0.5,1');
    const pair = json('rotd', 'h1.txt', 'h1.txt', '--units', 'g', '--dt', '0.01', '--periods', '0.5,1');
    for (let p = 0; p < 2; p++) {
      expect(pair.spectra[0].rotd100_g[p] / own.spectra[0].psa_g[p]).toBeCloseTo(Math.SQRT2, 9);
    }
  });

  it('refuses two components with different steps, and a coarse angle step (exit 2)', () => {
    const timed = (name: string, dtS: number) =>
      writeFileSync(
        join(folder, name),
        Array.from({ length: 50 }, (_, i) => `${i * dtS} ${Math.sin(i)}`).join('\n'),
      );
    timed('fine.txt', 0.01);
    timed('coarse.txt', 0.02);
    const steps = run('rotd', 'fine.txt', 'coarse.txt', '--units', 'g');
    expect(steps.code).toBe(2);
    expect(steps.stderr).toMatch(/^quakesweep: coarse\.txt: the two components have different time steps/);
    const out = run('rotd', 'h1.txt', 'h2.txt', '--units', 'g', '--dt', '0.01', '--angle-step', '3');
    expect(out.code).toBe(2);
    expect(out.stderr).toMatch(/angle step/);
  });
});
