import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { CAUTION } from '../../../src/base/caution.js';
import { ductilityDemandToJson, ductilityToJson } from '../../../src/formats/ductility-json.js';
import { formatJson } from '../../../src/formats/spectrum-json.js';
import { constantDuctilitySpectra, ductilityDemandSpectra } from '../../../src/inelastic/ductility.js';
import { createRecord } from '../../../src/record/record.js';
import { useCliFolder } from '../../helpers/cli-folder.js';
import { besidesSuccess, expectOneLineFailure, runMain } from '../../helpers/run-cli.js';

const folder = useCliFolder('quakesweep-ductility-', (f) => f.writeWindowedSine('sine.txt', 1.6));
const { json, run } = folder;
const record = ['sine.txt', '--units', 'g', '--dt', '0.01'];
const periods = ['--periods', '0,0.2,1'];

/** The record the CLI reads from sine.txt (values in g, times standard gravity). */
function sameRecord() {
  const text = readFileSync(join(folder.path, 'sine.txt'), 'utf8');
  const accelMS2 = Float64Array.from(text.trim().split('\n'), (line) => Number(line) * 9.80665);
  return createRecord({ name: 'sine', source: 'sine.txt', dtS: 0.01, accelMS2 });
}

/** A JSON value as the CLI would write it (formatJson, read back). */
const asWritten = (value: unknown) => JSON.parse(formatJson(value));

describe('quakesweep ductility', () => {
  it('--help names the default ductilities and the demand grid without T = 0', async () => {
    const help = (await runMain(['ductility', '--help'])).stdout.replace(/\s+/g, ' ');
    expect(help).toContain('(default: "1,1.5,2,4,6,8")');
    expect(help).toContain('with --strength the same without 0, as T = 0 has no finite demand');
    expect(help).toContain('newmark-average (the only one for the yielding oscillator)');
  });

  it('JSON: the library constant-ductility spectra of the record read, key for key', async () => {
    const out = await json(
      'ductility',
      ...record,
      ...periods,
      '--ductility',
      '1,2,4',
      '--model',
      'bilinear:0.05',
    );
    const expected = asWritten(
      ductilityToJson(
        constantDuctilitySpectra(sameRecord(), {
          periodsS: [0, 0.2, 1],
          dampings: [0.05],
          ductilities: [1, 2, 4],
          model: { kind: 'bilinear', alpha: 0.05 },
        }),
      ),
    );
    expect(out.caution).toBe(CAUTION);
    expect({ ...out, record: undefined }).toEqual({ ...expected, record: undefined });
    expect(out.record.name).toBe('sine');
  });

  it('--strength: the demand of the library, over the default grid without T = 0', async () => {
    const out = await json('ductility', ...record, '--strength', '2,4', '--damping', '2%');
    expect(out.periods_s).toHaveLength(121);
    expect(out.periods_s[0]).toBe(0.01);
    const expected = asWritten(
      ductilityDemandToJson(
        ductilityDemandSpectra(sameRecord(), {
          periodsS: out.periods_s,
          dampings: [0.02],
          model: { kind: 'elastoplastic' },
          ry: [2, 4],
        }),
      ),
    );
    expect({ ...out, record: undefined }).toEqual({ ...expected, record: undefined });
    const inG = await json('ductility', ...record, '--periods', '0.5', '--strength', '0.1g');
    expect(inG.spectra[0].strength).toEqual({ ay_g: 0.1 });
  });

  it('writes the table on the terminal, CSV with --format csv, JSON with --out', async () => {
    const table = await run('ductility', ...record, ...periods, '--ductility', '1,2');
    expect(table.code).toBe(0);
    expect(table.stdout.startsWith('! Preliminary engineering aid only.')).toBe(true);
    expect(table.stdout).toContain('   T (s)   elastic     μ = 1     μ = 2');
    const csv = await run('ductility', ...record, ...periods, '--ductility', '2', '--format', 'csv');
    expect(csv.stdout.startsWith('# Preliminary engineering aid only.')).toBe(true);
    expect(csv.stdout).toContain('period_s,frequency_hz,sd_m@5%,psa_g@5%,ay_g@5%/mu=2,');
    const written = await run('ductility', ...record, ...periods, '--ductility', '2', '--out', 'd.json');
    expect(written).toMatchObject({ code: 0, stdout: '' });
    expect(besidesSuccess(written.stderr)).toBe('');
    const file = JSON.parse(readFileSync(join(folder.path, 'd.json'), 'utf8'));
    expect(file.spectra[0].ductility).toBe(2);
  });

  it('states the processing asked for, and --threads gives the same numbers', async () => {
    const base = [...record, '--periods', '0.5', '--ductility', '2'];
    const out = await json('ductility', ...base, '--baseline', 'linear', '--threads', '2');
    expect(out.record.processing.map((s: { operation: string }) => s.operation)).toEqual([
      'read',
      'baseline',
    ]);
    const one = await json('ductility', ...base, '--baseline', 'linear', '--threads', '1');
    expect(out.spectra).toEqual(one.spectra);
  });

  it('--svg draws A_y and R_y (beside the published relations), or with --strength the demand, each with the caution', async () => {
    const both = await run(
      'ductility',
      ...record,
      ...periods,
      '--ductility',
      '1,2',
      '--svg',
      'figs',
      '--axis',
      'frequency',
    );
    expect(both.code).toBe(0);
    expect(besidesSuccess(both.stderr)).toBe('');
    const ry = readFileSync(join(folder.path, 'figs', 'ductility-ry.svg'), 'utf8');
    expect(ry).toContain('Newmark–Hall (1982)');
    expect(ry).toContain('Nassar–Krawinkler (1991)');
    expect(ry).toContain('Frequency f = 1/T (Hz)');
    const ay = readFileSync(join(folder.path, 'figs', 'ductility-ay.svg'), 'utf8');
    expect(ay.replace(/<[^>]+>/g, ' ').replace(/\s+/g, ' ')).toContain(CAUTION.slice(0, 60));
    const demand = await run(
      'ductility',
      ...record,
      '--periods',
      '0.2,1',
      '--strength',
      '2',
      '--svg',
      'demand',
    );
    expect(demand.code).toBe(0);
    expect(besidesSuccess(demand.stderr)).toBe('');
    expect(readFileSync(join(folder.path, 'demand', 'ductility-demand.svg'), 'utf8')).toContain('R_y = 2');
  });

  it.each([
    [['--axis', 'frequency'], '--axis sets the axis of the figures; add --svg <dir>'],
    [['--ductility', '0.5'], '--ductility: 0.5 is below 1'],
    [['--model', 'bilinear:1'], "--model 'bilinear:1': use elastoplastic or bilinear:α with 0 ≤ α < 1"],
    [['--model', 'bilinear:-0.1'], "--model 'bilinear:-0.1'"],
    [['--strength', '0'], '--strength: 0 is not above 0'],
    [['--strength', '0g'], '--strength: 0g is not above 0'],
    [['--strength', '2', '--ductility', '1,2'], 'give --ductility (target ductilities) or --strength'],
    [['--strength', '2', '--ductility', '1,1.5,2,4,6,8'], 'not both'],
    [['--method', 'newmark-linear'], 'stepped by newmark-average only'],
    [['--strength', '2', '--periods', '0,1'], 'T = 0 (rigid) has no finite demand'],
    [['--format', 'svg'], "--format 'svg': use table, json or csv"],
    [['--threads', '0'], '--threads'],
  ])('refuses %j in one line, exit 2', async (args, message) => {
    const line = expectOneLineFailure(await run('ductility', ...record, '--periods', '0.5', ...args));
    expect(line).toContain(message);
  });
});
