import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { useCliFolder } from '../../helpers/cli-folder.js';
import { expectOneLineFailure } from '../../helpers/run-cli.js';

const folder = useCliFolder('quakesweep-synth-');

/** The data rows of a synth CSV as [time s, acceleration g]. */
function rows(text: string): number[][] {
  const lines = text.split('\n').filter((line) => line !== '' && !line.startsWith('#'));
  expect(lines[0]).toBe('time_s,accel_g');
  return lines.slice(1).map((line) => line.split(',').map(Number));
}

describe('quakesweep synth', () => {
  it('writes duration/dt + 1 samples every dt seconds, in g, scaled to the PGA asked for', async () => {
    const result = await folder.run(
      'synth',
      '--seed',
      '5',
      '--duration',
      '4',
      '--dt',
      '0.02',
      '--pga',
      '0.25',
    );
    expect(result.code).toBe(0);
    const data = rows(result.stdout);
    expect(data).toHaveLength(4 / 0.02 + 1); // samples at 0, 0.02, …, 4 s
    for (const [i, [t]] of data.entries()) expect(t).toBeCloseTo(i * 0.02, 9);
    expect(data.at(-1)?.[0]).toBeCloseTo(4, 9);
    // The record is scaled to its PGA exactly (8 significant digits are written).
    expect(Math.max(...data.map(([, a]) => Math.abs(a)))).toBeCloseTo(0.25, 8);
    expect(result.stdout).toMatch(/^# .*invented data/);
    expect(result.stdout).toMatch(/# seed 5, dt 0\.02 s, PGA 0\.25 g/);
    expect(result.stdout).toMatch(/licensed structural engineer/); // the standing caution
  });

  it('the same seed gives the same bytes; another seed another record', async () => {
    const a = await folder.run('synth', '--seed', '7', '--duration', '2');
    const b = await folder.run('synth', '--seed', '7', '--duration', '2');
    const c = await folder.run('synth', '--seed', '8', '--duration', '2');
    expect(a.stdout).toBe(b.stdout);
    expect(rows(c.stdout)).not.toEqual(rows(a.stdout));
  });

  it('--out writes the file, which reads back as a record in g with the same dt', async () => {
    await folder.run('synth', '--duration', '3', '--dt', '0.01', '--pga', '0.4', '--out', 'rec.csv');
    const written = readFileSync(join(folder.path, 'rec.csv'), 'utf8');
    expect(rows(written)).toHaveLength(301);
    const info = await folder.json('info', 'rec.csv', '--units', 'g');
    expect(info.record.dt_s).toBe(0.01);
    expect(info.record.npts).toBe(301);
    expect(info.record.units_read).toBe('g');
    expect(info.pga_g).toBeCloseTo(0.4, 8);
  });

  it.each([
    [['--dt', '0'], "--dt must be a positive number, got '0'"],
    [['--duration', 'long'], "--duration must be a positive number, got 'long'"],
    [['--pga', '-0.1'], '--pga must be a positive number'],
    [['--site-damping', ''], '--site-damping must be a positive number'],
    [['--seed', '1.5'], "--seed must be a whole number from 0 to 4294967295, got '1.5'"],
    [['--seed', '4294967296'], '--seed must be a whole number from 0 to 4294967295'],
  ])('refuses %j with exit 2 and one line naming the option', async (args, message) => {
    expect(expectOneLineFailure(await folder.run('synth', ...args))).toContain(message);
  });
});
