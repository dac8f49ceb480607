// `quakesweep design` in-process: code spectra checked against their published formulas, tables, refusals.
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { CAUTION } from '../../../src/base/caution.js';
import { useCliFolder } from '../../helpers/cli-folder.js';

const folder = useCliFolder('quakesweep-design-');
const { run, json } = folder;

describe('quakesweep design', () => {
  it('--code asce7-16 --sds 1.0 --sd1 0.6 --tl 8 (values from §11.4.6, hand calculation)', async () => {
    const out = await json(
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

  it('--code ec8 --type 1 --ground C --ag 0.25 --damping 10% (EN 1998-1 Eq. 3.3 and 3.6)', async () => {
    const out = await json(
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
    const whole = await json('design', '--code', 'ec8', '--type', '1', '--ground', 'C', '--ag', '0.25');
    expect(Math.max(...whole.periods_s)).toBeLessThanOrEqual(4); // the spectrum stops at 4 s
  });

  it('prints the caution first on the terminal', async () => {
    const out = await run('design', '--code', 'asce7-16', '--sds', '1.0', '--sd1', '0.6', '--tl', '8');
    expect(out.code).toBe(0);
    expect(out.stdout.startsWith('! Preliminary')).toBe(true);
  });

  it('--format csv --out, read back with --table, round-trips', async () => {
    const written = await run(
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
    expect(readFileSync(join(folder.path, 'ec8.csv'), 'utf8')).toContain('period_s,frequency_hz,psa_g');
    const original = await json('design', '--code', 'ec8', '--type', '2', '--ground', 'D', '--ag', '0.2');
    const back = await json('design', '--table', 'ec8.csv');
    expect(back.periods_s).toEqual(original.periods_s);
    expect(back.psa_g).toEqual(original.psa_g);
  });

  it('refuses mixed or missing options with exit code 2', async () => {
    const mixed = await run(
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
    expect((await run('design', '--code', 'ec8', '--type', '1', '--ag', '0.25')).stderr).toMatch(
      /--ground is required/,
    );
    expect((await run('design')).code).toBe(2);
    const outside = await run(
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
