import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it, vi } from 'vitest';
import { CAUTION } from '../../../src/base/caution.js';
import { main } from '../../../src/cli/main.js';

const folder = mkdtempSync(join(tmpdir(), 'quakesweep-info-'));
afterAll(() => rmSync(folder, { recursive: true, force: true }));

// An invented record: a decaying 1.5 Hz wave on a small offset, in g, one value a line.
const recordPath = join(folder, 'invented.txt');
writeFileSync(
  recordPath,
  Array.from({ length: 2000 }, (_, i) => {
    const t = i * 0.01;
    return (0.2 * Math.exp(-t / 6) * Math.sin(2 * Math.PI * 1.5 * t) + 0.001).toFixed(6);
  }).join('\n'),
);

async function run(args: string[]) {
  const out: string[] = [];
  const err: string[] = [];
  const stdout = vi.spyOn(process.stdout, 'write').mockImplementation((chunk) => {
    out.push(String(chunk));
    return true;
  });
  const stderr = vi.spyOn(process.stderr, 'write').mockImplementation((chunk) => {
    err.push(String(chunk));
    return true;
  });
  try {
    const code = await main(args);
    return { code, stdout: out.join(''), stderr: err.join('') };
  } finally {
    stdout.mockRestore();
    stderr.mockRestore();
  }
}

describe('quakesweep info', () => {
  it('--format json has the documented keys, units in their names', async () => {
    const outPath = join(folder, 'info.json');
    const result = await run([
      'info',
      recordPath,
      '--units',
      'g',
      '--dt',
      '0.01',
      '--baseline',
      'mean',
      '--filter',
      'highpass:0.1:4',
      '--format',
      'json',
      '--out',
      outPath,
    ]);
    expect(result.code).toBe(0);
    const json = JSON.parse(readFileSync(outPath, 'utf8'));
    for (const key of [
      'caution',
      'record',
      'processing',
      'pga_g',
      'pgv_m_s',
      'pgd_m',
      'arias_m_s',
      'd5_75_s',
      'd5_95_s',
      'cav_m_s',
      'mean_period_s',
      'pga_time_s',
      'bracketed_duration_s',
      'predominant_period_s',
    ]) {
      expect(json).toHaveProperty(key);
    }
    expect(json.caution).toBe(CAUTION);
    expect(json.record).toMatchObject({ name: 'invented', npts: 2000, dt_s: 0.01 });
    expect(json.processing.steps.map((s: { operation: string }) => s.operation)).toEqual([
      'read',
      'baseline',
      'filter',
    ]);
    // PGA of the wave is close to 0.2 g (invented data; the filter changes it a little).
    expect(json.pga_g).toBeGreaterThan(0.15);
    expect(json.pga_g).toBeLessThan(0.25);
  });

  it('the terminal table starts with the caution', async () => {
    const result = await run(['info', recordPath, '--units', 'g', '--dt', '0.01']);
    expect(result.code).toBe(0);
    expect(result.stdout.startsWith('! Preliminary engineering aid only.')).toBe(true);
    expect(result.stdout).toContain('D5–95');
  });

  it('refuses a corner above Nyquist with one line and exit code 2', async () => {
    const result = await run(['info', recordPath, '--units', 'g', '--dt', '0.01', '--filter', 'lowpass:60']);
    expect(result.code).toBe(2);
    expect(result.stderr).toMatch(/^quakesweep: .*Nyquist frequency 50 Hz.*\n$/);
  });

  it('--svg writes histories.svg, husid.svg and fourier.svg with escaped text and the caution', async () => {
    const svgFolder = join(folder, 'figures');
    const result = await run([
      'info',
      recordPath,
      '--units',
      'g',
      '--dt',
      '0.01',
      '--name',
      'site <A> & "B"',
      '--svg',
      svgFolder,
      '--format',
      'json',
    ]);
    expect(result.code).toBe(0);
    for (const file of ['histories.svg', 'husid.svg', 'fourier.svg']) {
      const svg = readFileSync(join(svgFolder, file), 'utf8');
      // < and & must be escaped in character data; a quote need not be (XML 1.0 §2.4).
      expect(svg).toContain('site &lt;A&gt; &amp; "B"');
      expect(svg).not.toContain('<A>');
      expect(svg).toContain('Preliminary engineering aid only.');
    }
  });

  it('--out info.csv writes CSV (the format from the extension), the same values as the JSON', async () => {
    const base = ['info', recordPath, '--units', 'g', '--dt', '0.01'];
    const csvPath = join(folder, 'measures.csv');
    const written = await run([...base, '--out', csvPath]);
    expect(written.code).toBe(0);
    expect(written.stderr).toMatch(
      /^quakesweep: done: ground-motion measures of invented, 2000 samples at 0.01 s; wrote .*measures\.csv \(csv\)$/m,
    );
    const json = JSON.parse((await run([...base, '--format', 'json'])).stdout);
    const csv = readFileSync(csvPath, 'utf8');
    expect(csv).toContain('measure,value,unit');
    expect(csv).toContain(`\npga_g,${json.pga_g},g\n`);
    expect(csv).toContain(`\nd5_95_s,${json.d5_95_s},s\n`);
  });
});
