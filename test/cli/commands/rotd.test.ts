// `quakesweep rotd` in-process on two invented components (Gaussian-windowed sines).
import { writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { CAUTION } from '../../../src/base/caution.js';
import { useCliFolder } from '../../helpers/cli-folder.js';

const folder = useCliFolder('quakesweep-rotd-', (f) => {
  f.writeWindowedSine('h1.txt', 1.6);
  f.writeWindowedSine('h2.txt', 0.9);
});
const { run, json } = folder;

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
        join(folder.path, name),
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

  it('takes the processing options, applied to both components and stated for each', async () => {
    const args = ['rotd', 'h1.txt', 'h2.txt', '--units', 'g', '--dt', '0.01', '--periods', '0.5,1'];
    const plain = await json(...args);
    const filtered = await json(...args, '--baseline', 'linear', '--filter', 'highpass:5');
    for (const record of filtered.records)
      expect(record.processing.map((s: { operation: string }) => s.operation)).toEqual([
        'read',
        'baseline',
        'filter',
      ]);
    // A 5 Hz order-4 high-pass keeps under (1.6/5)^4 ≈ 1% of motions at 0.9 and 1.6 Hz (Butterworth, closed form).
    expect(filtered.spectra[0].rotd50_g[1]).toBeLessThan(0.05 * plain.spectra[0].rotd50_g[1]);
    const table = await folder.run(...args, '--filter', 'highpass:5');
    expect(table.stdout.match(/processed: high-pass/g)).toHaveLength(2);
  });
});
