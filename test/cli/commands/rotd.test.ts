// `quakesweep rotd` in-process on two invented components (Gaussian-windowed sines).
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { CAUTION } from '../../../src/base/caution.js';
import { type CliResult, runMainIn } from '../../helpers/run-cli.js';

let folder = '';

function run(...args: string[]): Promise<CliResult> {
  return runMainIn(folder, args);
}

async function json(...args: string[]) {
  const result = await run(...args, '--format', 'json');
  expect(result.stderr).toBe('');
  expect(result.code).toBe(0);
  return JSON.parse(result.stdout);
}

function write(name: string, frequencyHz: number): void {
  writeFileSync(
    join(folder, name),
    Array.from({ length: 600 }, (_, i) => {
      const t = i * 0.01;
      return String(0.3 * Math.exp(-(((t - 2.5) / 1) ** 2)) * Math.sin(2 * Math.PI * frequencyHz * t));
    }).join('\n'),
  );
}

beforeAll(() => {
  folder = mkdtempSync(join(tmpdir(), 'quakesweep-rotd-'));
  write('h1.txt', 1.6);
  write('h2.txt', 0.9);
});
afterAll(() => rmSync(folder, { recursive: true, force: true }));

describe('quakesweep rotd', () => {
  it('H1 H2 with --periods, --damping, --method: JSON shape', async () => {
    const out = await json(
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

  it('the same record twice gives RotD100 = √2 × its PSA (closed form)', async () => {
    const own = await json('spectrum', 'h1.txt', '--units', 'g', '--dt', '0.01', '--periods', '0.5,1');
    const pair = await json('rotd', 'h1.txt', 'h1.txt', '--units', 'g', '--dt', '0.01', '--periods', '0.5,1');
    for (let p = 0; p < 2; p++) {
      expect(pair.spectra[0].rotd100_g[p] / own.spectra[0].psa_g[p]).toBeCloseTo(Math.SQRT2, 9);
    }
  });

  it('refuses two components with different steps, and a coarse angle step (exit 2)', async () => {
    const timed = (name: string, dtS: number) =>
      writeFileSync(
        join(folder, name),
        Array.from({ length: 50 }, (_, i) => `${i * dtS} ${Math.sin(i)}`).join('\n'),
      );
    timed('fine.txt', 0.01);
    timed('coarse.txt', 0.02);
    const steps = await run('rotd', 'fine.txt', 'coarse.txt', '--units', 'g');
    expect(steps.code).toBe(2);
    expect(steps.stderr).toMatch(/^quakesweep: coarse\.txt: the two components have different time steps/);
    const out = await run('rotd', 'h1.txt', 'h2.txt', '--units', 'g', '--dt', '0.01', '--angle-step', '3');
    expect(out.code).toBe(2);
    expect(out.stderr).toMatch(/angle step/);
  });
});
