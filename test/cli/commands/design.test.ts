// `quakesweep design` in-process: code spectra checked against their published formulas, tables, refusals.
import { readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { CAUTION } from '../../../src/base/caution.js';
import { useCliFolder } from '../../helpers/cli-folder.js';
import { expectOneLineFailure } from '../../helpers/run-cli.js';

// An invented ASCE 7-22 multi-period site table (not from any hazard data).
const MULTI_PERIOD = '# invented\nperiod_s,sa_g\n0,0.4\n0.2,1.0\n1,0.8\n4,0.2\n';
const folder = useCliFolder('quakesweep-design-', (f) => writeFileSync(join(f.path, 'mp.csv'), MULTI_PERIOD));
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

  it('--code asce7-22 --sds 1.2 --sd1 0.48 --tl 6: the two-period spectrum (§11.4.5.2, hand calculation)', async () => {
    const out = await json(
      'design',
      '--code',
      'asce7-22',
      '--sds',
      '1.2',
      '--sd1',
      '0.48',
      '--tl',
      '6',
      '--periods',
      '0,0.04,0.2,3,12',
    );
    expect(out.caution).toBe(CAUTION);
    expect(out.code).toBe('asce7-22');
    expect(out.parameters.form).toBe('two-period');
    expect(out.damping).toBe(0.05);
    // T0 = 0.08 s, TS = 0.4 s: 0.4 S_DS; S_DS (0.4 + 0.6 · 0.5); S_DS; S_D1/3; S_D1 T_L/144.
    const expected = [0.48, 0.84, 1.2, 0.16, 0.02];
    for (const [i, value] of (out.psa_g as number[]).entries()) expect(value).toBeCloseTo(expected[i], 12);
  });

  it('--code asce7-22 --multi-period FILE: the site table at its own rows, log–log between them', async () => {
    const rows = await json('design', '--code', 'asce7-22', '--multi-period', 'mp.csv');
    expect(rows.periods_s).toEqual([0, 0.2, 1, 4]);
    expect(rows.psa_g).toEqual([0.4, 1.0, 0.8, 0.2]);
    expect(rows.parameters).toEqual({ form: 'multi-period', source: 'mp.csv', rows: 4 });
    const between = await json('design', '--code', 'asce7-22', '--multi-period', 'mp.csv', '--periods', '2');
    expect(between.psa_g[0]).toBeCloseTo(0.4, 12); // √(0.8 · 0.2): halfway in log T from 1 s to 4 s
    const csv = await run('design', '--code', 'asce7-22', '--multi-period', 'mp.csv', '--format', 'csv');
    expect(csv.stdout).toContain('# spectrum: ASCE/SEI 7-22 §11.4.5.1 multi-period design spectrum');
    expect(csv.stdout.startsWith('# Preliminary engineering aid only.')).toBe(true); // the caution first
  });

  it.each([
    [
      ['--code', 'asce7-22', '--multi-period', 'mp.csv', '--periods', '5'],
      'quakesweep: T = 5 s is outside the asce7-22 multi-period spectrum of mp.csv, defined from 0 s to 4 s',
    ],
    [
      ['--code', 'asce7-22', '--multi-period', 'mp.csv', '--sds', '1'],
      /^quakesweep: --sds does not go with a multi-period table/,
    ],
    [['--code', 'asce7-22', '--table', 'mp.csv'], /^quakesweep: --table does not apply to --code asce7-22/],
    [
      ['--code', 'ec8', '--type', '1', '--ground', 'C', '--ag', '0.2', '--tl', '8'],
      'quakesweep: --tl does not apply to --code ec8',
    ],
    [
      ['--code', 'ec8', '--type', '1', '--ground', 'C', '--ag', '0.2', '--multi-period', 'mp.csv'],
      'quakesweep: --multi-period does not apply to --code ec8',
    ],
    [['--code', 'asce7-22'], /^quakesweep: --sds is required: ASCE 7-22 takes/],
    [['--code', 'asce7-22', '--multi-period', 'absent.csv'], 'quakesweep: absent.csv: no such file'],
    [
      ['--code', 'asce7-22', '--multi-period', 'mp.csv', '--out', 'mp.csv'],
      'quakesweep: refusing to overwrite the input mp.csv with an output',
    ],
  ])('refuses %j with one line, exit 2', async (args, message) => {
    const line = expectOneLineFailure(await run('design', ...(args as string[])));
    if (typeof message === 'string') expect(line).toBe(message);
    else expect(line).toMatch(message);
  });
});
