import { describe, expect, it } from 'vitest';
import { useCliFolder } from '../../helpers/cli-folder.js';
import { runMain } from '../../helpers/run-cli.js';

const folder = useCliFolder('quakesweep-damping-', (f) => f.writeWindowedSine('h1.txt', 1.6));
const { json } = folder;

describe('quakesweep damping', () => {
  it('--help states the damping ratios used when --damping is not given', async () => {
    const help = await runMain(['damping', '--help']);
    expect(help.stdout.replace(/\s+/g, ' ')).toContain('(default: "2%,5%,10%,20%")');
  });

  it('--damping 2%,5%,10%,20%: ratios to 5% and published factors', async () => {
    const out = await json(
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
    const added = await json(
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

  it('takes the processing options: a high-pass far above the motion removes it, and the step is stated', async () => {
    const args = ['damping', 'h1.txt', '--units', 'g', '--dt', '0.01', '--periods', '0.3,0.6'];
    const plain = await json(...args);
    const filtered = await json(...args, '--filter', 'highpass:8');
    expect(plain.record.processing.map((s: { operation: string }) => s.operation)).toEqual(['read']);
    expect(filtered.record.processing.map((s: { operation: string }) => s.operation)).toEqual([
      'read',
      'filter',
    ]);
    // Butterworth magnitude |H| = 1/√(1 + (f_c/f)^(2n)) (closed form): order 4 at 8 Hz keeps
    // (1.6/8)^4 ≈ 0.0016 of a 1.6 Hz motion, squared by the forward-backward pass.
    expect(filtered.spectra[1].psa_g[1]).toBeLessThan(0.01 * plain.spectra[1].psa_g[1]);
    const csv = await folder.run(...args, '--filter', 'highpass:8', '--format', 'csv');
    expect(csv.stdout).toMatch(/^# processing: high-pass Butterworth/m);
  });

  it('--threads and --kernel give the same numbers as one thread', async () => {
    const args = ['damping', 'h1.txt', '--units', 'g', '--dt', '0.01', '--periods', '0.01:5:40'];
    const one = await json(...args, '--threads', '1');
    const two = await json(...args, '--threads', '2');
    expect(two.spectra).toEqual(one.spectra); // the same bits on any number of threads
    const js = await json(...args, '--kernel', 'js');
    // Both kernels give the same peaks to 1e-12 (DEVELOPERS.md, "The sweep kernel").
    js.spectra[1].psa_g.forEach((v: number, i: number) => {
      expect(Math.abs(v - one.spectra[1].psa_g[i])).toBeLessThan(1e-11 * one.spectra[1].psa_g[i]);
    });
  });
});
