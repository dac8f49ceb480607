// `quakesweep record` in-process on an invented record (a Gaussian-windowed sine, 6 s at 0.01 s).
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { CAUTION } from '../../../src/base/caution.js';
import { useCliFolder } from '../../helpers/cli-folder.js';
import { besidesSuccess, expectOneLineFailure } from '../../helpers/run-cli.js';

const folder = useCliFolder('quakesweep-record-', (f) => f.writeWindowedSine('h1.txt', 1.6));
const { run, json } = folder;
const read = ['h1.txt', '--units', 'g', '--dt', '0.01'];
const file = (name: string) => readFileSync(join(folder.path, name), 'utf8');

describe('quakesweep record', () => {
  it('writes the processed record, whose spectrum is the spectrum of the record processed', async () => {
    const processing = ['--baseline', 'linear', '--filter', 'bandpass:0.2-20', '--resample', '0.005'];
    const written = await run('record', ...read, ...processing, '--out', 'p.csv');
    expect(written.code).toBe(0);
    expect(besidesSuccess(written.stderr)).toBe('');
    expect(written.stderr).toMatch(
      /^quakesweep: done: record h1, 1199 samples at 0.005 s, baseline, filter, resample, acceleration in g; wrote p\.csv \(csv\)$/m,
    );
    expect(written.stderr).toContain(`quakesweep: caution: ${CAUTION}`);
    const text = file('p.csv');
    expect(text).toMatch(/^# dt: 0.005 s$/m);
    expect(text).toMatch(/^# npts: 1199$/m);
    expect(text).toMatch(/^# step 1: baseline correction/m);
    expect(text).toMatch(/^# step 3: resampled from 0.01 s to 0.005 s/m);
    const periods = ['--periods', '0,0.2,0.6,1.5'];
    const direct = await json('spectrum', ...read, ...processing, ...periods);
    const again = await json('spectrum', 'p.csv', '--units', 'g', ...periods);
    expect(again.record.npts).toBe(direct.record.npts);
    expect(again.record.dt_s).toBeCloseTo(direct.record.dt_s, 15);
    // The same samples (to one rounding in g), so the same spectrum to 1e-12.
    direct.spectra[0].psa_g.forEach((v: number, i: number) => {
      expect(Math.abs(again.spectra[0].psa_g[i] - v)).toBeLessThan(1e-12 * v);
    });
  });

  it('round trip: the file read back with quakesweep gives the same record, bit for bit in m/s²', async () => {
    const first = await json('record', ...read, '--taper', '5%', '--accel-unit', 'm/s2');
    await run(
      'record',
      ...read,
      '--taper',
      '5%',
      '--accel-unit',
      'm/s2',
      '--with',
      'velocity',
      '--out',
      'a.csv',
    );
    const back = await json('record', 'a.csv', '--units', 'm/s2', '--column', '2');
    expect(back['accel_m/s2']).toEqual(first['accel_m/s2']);
    expect(back.record.npts).toBe(first.record.npts);
    expect(Math.abs(back.record.dt_s - first.record.dt_s)).toBeLessThan(1e-15);
    // And in g: the record as read comes back bit for bit.
    await run('record', ...read, '--out', 'g.txt');
    expect(file('g.txt')).toMatch(/^\s*time_s\s+accel_g$/m);
    const asRead = await json('record', ...read);
    const fromText = await json('record', 'g.txt', '--units', 'g');
    expect(fromText.accel_g).toEqual(asRead.accel_g);
  });

  it('--with velocity,displacement and --length-unit: the integrals from rest, in cm', async () => {
    const out = await json('record', ...read, '--with', 'velocity,displacement', '--length-unit', 'cm');
    const a = out.accel_g as number[];
    const v = out.velocity_cm_s as number[];
    const d = out.displacement_cm as number[];
    expect(v).toHaveLength(a.length);
    // Trapezoidal rule (closed form): v_i = v_{i−1} + dt/2·(a_{i−1} + a_i), g = 980.665 cm/s².
    for (const i of [1, 250, 599]) {
      expect(v[i] - v[i - 1]).toBeCloseTo(0.005 * (a[i - 1] + a[i]) * 980.665, 9);
      expect(d[i] - d[i - 1]).toBeCloseTo(0.005 * (v[i - 1] + v[i]), 9);
    }
    expect(out.integration).toMatch(/trapezoidal/);
  });

  it('--scale multiplies the processed record and states it', async () => {
    const plain = await json('record', ...read);
    const scaled = await json('record', ...read, '--scale', '2.5');
    scaled.accel_g.forEach((value: number, i: number) => {
      expect(value).toBeCloseTo(2.5 * plain.accel_g[i], 14);
    });
    expect(scaled.processing.map((s: { operation: string }) => s.operation)).toEqual(['read', 'scale']);
    expect(scaled.processing[1].description).toBe('amplitude × 2.5 (given with --scale)');
  });

  it('--target --apply-scale writes the record scaled to the target, and its spectrum then fits with factor 1', async () => {
    const target = ['--target', 'asce7-16:sds=1.0,sd1=0.6,tl=8', '--periods', '0.1:2:20'];
    const written = await run('record', ...read, ...target, '--apply-scale', '--out', 's.csv');
    expect(written.code).toBe(0);
    expect(file('s.csv')).toMatch(/^# step 1: amplitude × [0-9.]+ to match the asce7-16 target/m);
    const refit = await json('spectrum', 's.csv', '--units', 'g', ...target);
    // Scaling by the fitted factor leaves a factor of 1 to fit (least squares in ln PSA is scale-equivariant).
    expect(refit.scaling.factor).toBeCloseTo(1, 9);
  });

  it('takes the format from --out and refuses a contradiction', async () => {
    await run('record', ...read, '--out', 'r.json');
    expect(JSON.parse(file('r.json')).caution).toBe(CAUTION);
    const line = expectOneLineFailure(await run('record', ...read, '--format', 'json', '--out', 'x.csv'));
    expect(line).toBe('quakesweep: --format json contradicts --out x.csv (a csv name); change one of them');
  });

  it.each([
    [
      ['--with', 'acceleration'],
      "--with 'acceleration': use velocity, displacement or velocity,displacement",
    ],
    [['--scale', '-1'], '--scale must be a positive number'],
    [
      ['--scale', '2', '--target', 'asce7-16:sds=1.0,sd1=0.6,tl=8', '--apply-scale'],
      'give --scale or --target, not both',
    ],
    [
      ['--target', 'asce7-16:sds=1.0,sd1=0.6,tl=8'],
      '--target only scales the record written with --apply-scale',
    ],
    [['--accel-unit', 'furlong/s2'], "unknown acceleration unit 'furlong/s2'"],
    [['--length-unit', 'yd'], "unknown length unit 'yd'"],
    [['--filter', 'highpass:x'], '--filter'],
  ])('refuses %j in one line, exit 2', async (args, message) => {
    expect(expectOneLineFailure(await run('record', ...read, ...args))).toContain(message);
  });
});
