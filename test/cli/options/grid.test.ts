/**
 * The period grid and damping list options (src/cli/options/grid.ts), through every command that
 * takes them: grids and damping lists that make no sense are refused in one line, exit 2.
 */
import { readFileSync, rmSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { gridFromOptions } from '../../../src/cli/options/grid.js';
import { writeFixtures } from '../../helpers/fixtures.js';
import { expectOneLineFailure, runMain } from '../../helpers/run-cli.js';

const f = writeFixtures();
afterAll(() => rmSync(f.dir, { recursive: true, force: true }));

describe('period grids and damping lists that make no sense are refused on every command', () => {
  const bad: [string, string, RegExp][] = [
    ['--periods', '-1', /negative/],
    ['--periods', '', /not a number|empty/],
    ['--periods', '1e-300', /shorter than 0\.0001 s/],
    ['--periods', '0.01:10:1', /n must be an integer ≥ 2/],
    ['--periods', '0.01:10:2000000', /more than 1000000/],
    ['--periods', '0.1,0.1', /appears twice/],
    ['--periods', 'abc', /not a number/],
    ['--frequencies', '0', /0 Hz is not above 0/],
    ['--frequencies', '-2,1', /-2 Hz is not above 0/],
    ['--frequencies', '0:10:5', /need 0 < a < b, in Hz/],
    ['--frequencies', '1:20000:5', /20000 Hz is above 10000 Hz/],
    ['--frequencies', '2,2', /2 Hz appears twice/],
    ['--frequencies', 'x', /not a number/],
    ['--damping', '-5%', /negative/],
    ['--damping', '5', /above 1/],
    ['--damping', '', /not a number/],
    ['--damping', '5%,0.05', /appears twice/],
  ];
  const commands: string[][] = [
    ['spectrum', f.h1, '--units', 'g'],
    ['damping', f.h1, '--units', 'g'],
    ['rotd', f.h1, f.h2, '--units', 'g'],
    ['floor', f.h1, '--units', 'g', '--building-period', '0.4', '--modal-factor', '1.3'],
  ];
  for (const command of commands) {
    it(command[0], async () => {
      for (const [option, value, reason] of bad) {
        const line = expectOneLineFailure(await runMain([...command, option, value]));
        expect(line).toMatch(reason);
      }
      const many = expectOneLineFailure(
        await runMain([...command, '--periods', '0.01:10:600000', '--damping', '1%,2%']),
      );
      expect(many).toMatch(/add --force/);
      const both = expectOneLineFailure(await runMain([...command, '--periods', '1', '--frequencies', '1']));
      expect(both).toBe('quakesweep: give --periods or --frequencies, not both');
    });
  }
  it('design', async () => {
    for (const [option, value, reason] of bad.filter(([o]) => o !== '--damping')) {
      const line = expectOneLineFailure(
        await runMain([
          'design',
          '--code',
          'asce7-16',
          '--sds',
          '1',
          '--sd1',
          '0.6',
          '--tl',
          '8',
          option,
          value,
        ]),
      );
      expect(line).toMatch(reason);
    }
  });
  it('floor --building-period and anchor period_s below 0.1 ms', async () => {
    expect(
      expectOneLineFailure(
        await runMain(['floor', f.h1, '--units', 'g', '--building-period', '1e-300', '--modal-factor', '1']),
      ),
    ).toMatch(/≥ 0\.0001/);
    const equipment = join(f.dir, 'tiny-period.json');
    writeFileSync(
      equipment,
      readFileSync(f.equipment, 'utf8').replace('"period_s":0.1', '"period_s":1e-300'),
    );
    expect(
      expectOneLineFailure(
        await runMain(['anchor', '--equipment', equipment, '--record', f.h1, '--units', 'g']),
      ),
    ).toMatch(/period_s/);
  });
});

describe('gridFromOptions', () => {
  it('takes --frequencies as periods T = 1/f, ascending as --periods gives them', () => {
    // 1, 2 and 5 Hz are 1, 0.5 and 0.2 s (by hand), the highest frequency first.
    expect(Array.from(gridFromOptions({ frequencies: '1,5,2' }).periodsS)).toEqual([0.2, 0.5, 1]);
    expect(() => gridFromOptions({ periods: '1', frequencies: '1' })).toThrow(
      'give --periods or --frequencies, not both',
    );
  });

  it('defaults to T = 0 and 121 periods from 0.01 s to 10 s, 5%, Newmark average acceleration', () => {
    const grid = gridFromOptions({});
    expect(grid.periodsS).toHaveLength(122);
    expect(Array.from(grid.dampings)).toEqual([0.05]);
    expect(grid.method).toBe('newmark-average');
  });

  it('counts periods × dampings against the million, which --force lifts', () => {
    const many = { periods: '0.01:10:500001', damping: '2%,5%' };
    expect(() => gridFromOptions(many)).toThrow(
      '1000002 oscillators is more than 1000000; add --force if you mean it',
    );
    expect(gridFromOptions({ ...many, force: true }).periodsS).toHaveLength(500_001);
    expect(() => gridFromOptions({ method: 'runge-kutta' })).toThrow(/accepted: newmark-average/);
  });
});
