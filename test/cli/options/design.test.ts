import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { designFromOptions, loadTableSpectrum } from '../../../src/cli/options/design.js';

const folder = mkdtempSync(join(tmpdir(), 'quakesweep-design-options-'));
afterAll(() => rmSync(folder, { recursive: true, force: true }));

describe('designFromOptions', () => {
  it('builds ASCE 7-16 from S_DS, S_D1 and T_L (§11.4.6: S_a = S_D1/T between T_s and T_L)', () => {
    const spectrum = designFromOptions({ code: ' ASCE7-16 ', sds: '1.0', sd1: '0.6', tl: '8' });
    expect(spectrum.psaG(1)).toBeCloseTo(0.6, 12);
    expect(spectrum.psaG(0)).toBeCloseTo(0.4, 12); // 0.4 S_DS at T = 0
  });

  it('builds Eurocode 8 with η from the damping (EN 1998-1 Eq. 3.6: η = √(10/(5 + ξ%)))', () => {
    const at = (damping?: string) =>
      designFromOptions({ code: 'ec8', type: '1', ground: 'C', ag: '0.25', damping }).psaG(0.4);
    expect(at()).toBeCloseTo(2.5 * 0.25 * 1.15, 12); // plateau, S = 1.15 for type 1 ground C
    expect(at('10%') / at()).toBeCloseTo(Math.sqrt(10 / 15), 12);
  });

  it('reads a table file', () => {
    const file = join(folder, 'site.csv');
    writeFileSync(file, 'period_s,psa_g\n0.1,0.5\n3,0.2\n');
    expect(designFromOptions({ table: file }).psaG(0.1)).toBe(0.5);
    expect(loadTableSpectrum(file).psaG(3)).toBe(0.2);
  });

  it('builds ASCE 7-22 two-period from S_DS, S_D1 and T_L (§11.4.5.2: S_D1/T between T_S and T_L)', () => {
    const spectrum = designFromOptions({ code: 'asce7-22', sds: '1.0', sd1: '0.6', tl: '8' });
    expect(spectrum.code).toBe('asce7-22');
    expect(spectrum.parameters.form).toBe('two-period');
    expect(spectrum.psaG(1)).toBeCloseTo(0.6, 12);
  });

  it('reads the ASCE 7-22 multi-period table of --multi-period (§11.4.5.1)', () => {
    const file = join(folder, 'mp.csv');
    writeFileSync(file, '# invented\nperiod_s,sa_g\n0,0.4\n0.2,1.0\n1,0.8\n4,0.2\n');
    const spectrum = designFromOptions({ code: 'asce7-22', multiPeriod: file });
    expect(spectrum.parameters).toEqual({ form: 'multi-period', source: file, rows: 4 });
    expect(spectrum.psaG(2)).toBeCloseTo(0.4, 12); // log–log halfway from (1, 0.8) to (4, 0.2): √(0.8 · 0.2)
    expect(() => spectrum.psaG(5)).toThrow(
      `outside the asce7-22 multi-period spectrum of ${file}, defined from 0 s to 4 s`,
    );
    writeFileSync(join(folder, 'bad.csv'), 'period_s,sa_g\n0.2,1\n0.1,0.9\n');
    expect(() => designFromOptions({ code: 'asce7-22', multiPeriod: join(folder, 'bad.csv') })).toThrow(
      'periods must increase: 0.1 s follows 0.2 s',
    );
  });

  it('reads the invented demo table records/site-multiperiod-7-22.csv, which says it is invented', () => {
    const file = 'records/site-multiperiod-7-22.csv';
    expect(readFileSync(file, 'utf8').split('\n')[0]).toMatch(/^# Invented/);
    const spectrum = designFromOptions({ code: 'asce7-22', multiPeriod: file });
    expect([spectrum.minPeriodS, spectrum.maxPeriodS]).toEqual([0, 10]);
    const rows = spectrum.tabulatedPeriodsS ?? new Float64Array();
    expect(rows.length).toBeGreaterThanOrEqual(20);
    // A plausible shape (common practice): rising from T = 0 to a peak between 0.1 and 0.5 s, then falling.
    const values = Array.from(rows, (t) => spectrum.psaG(t));
    const peak = values.indexOf(Math.max(...values));
    expect(rows[peak]).toBeGreaterThan(0.1);
    expect(rows[peak]).toBeLessThan(0.5);
    for (let i = peak + 1; i < values.length; i++) expect(values[i]).toBeLessThan(values[i - 1]);
  });

  it.each([
    [{}, 'choose a spectrum: --code asce7-16, --code asce7-22, --code ec8 or --table FILE'],
    [{ code: 'nbc' }, "--code 'nbc': use asce7-16, asce7-22 or ec8"],
    [{ code: 'asce7-16', sds: '1', sd1: '0.6' }, '--tl is required'],
    [{ code: 'asce7-16', sds: 'x', sd1: '0.6', tl: '8' }, "--sds 'x' is not a number"],
    [
      { code: 'asce7-16', sds: '1', sd1: '0.6', tl: '8', ag: '0.2' },
      '--ag does not apply to --code asce7-16',
    ],
    [{ code: 'ec8', type: '1', ground: 'C', ag: '0.2', tl: '8' }, '--tl does not apply to --code ec8'],
    [{ table: 't.csv', code: 'ec8' }, 'give either --code or --table, not both'],
    [{ table: 't.csv', sds: '1' }, '--sds does not apply to --table'],
    [{ code: 'asce7-22' }, '--sds is required: ASCE 7-22 takes S_DS, S_D1 and T_L (two-period, §11.4.5.2)'],
    [{ code: 'asce7-22', sds: '1', sd1: '0.6' }, '--tl is required'],
    [{ code: 'asce7-22', multiPeriod: 'mp.csv', sds: '1' }, '--sds does not go with a multi-period table'],
    [{ code: 'asce7-22', multiPeriod: 'mp.csv', tl: '8' }, '--tl does not go with a multi-period table'],
    [{ code: 'asce7-22', table: 't.csv' }, '--table does not apply to --code asce7-22'],
    [
      { code: 'asce7-22', sds: '1', sd1: '0.6', tl: '8', ground: 'C' },
      '--ground does not apply to --code asce7-22',
    ],
    [{ code: 'ec8', type: '1', ground: 'C', ag: '0.2', sds: '1' }, '--sds does not apply to --code ec8'],
    [
      { code: 'ec8', type: '1', ground: 'C', ag: '0.2', multiPeriod: 'mp.csv' },
      '--multi-period does not apply to --code ec8',
    ],
    [
      { code: 'asce7-16', sds: '1', sd1: '0.6', tl: '8', multiPeriod: 'mp.csv' },
      '--multi-period does not apply to --code asce7-16',
    ],
    [{ multiPeriod: 'mp.csv' }, '--multi-period needs --code asce7-22'],
    [{ table: 't.csv', multiPeriod: 'mp.csv' }, '--multi-period does not apply to --table'],
  ])('refuses %o', (options, message) => {
    expect(() => designFromOptions(options)).toThrow(message);
  });
});
