// `quakesweep damping` in-process on an invented record (a Gaussian-windowed sine).
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
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
  folder = mkdtempSync(join(tmpdir(), 'quakesweep-damping-'));
  write('h1.txt', 1.6);
});
afterAll(() => rmSync(folder, { recursive: true, force: true }));

describe('quakesweep damping', () => {
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
});
