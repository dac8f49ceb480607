/** --axis (src/cli/options/axis.ts) through every command that draws a spectrum figure. */
import { readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { periodAxisFromOptions, svgAxisFromOptions } from '../../../src/cli/options/axis.js';
import { writeFixtures } from '../../helpers/fixtures.js';
import { expectOneLineFailure, runMain } from '../../helpers/run-cli.js';

const f = writeFixtures('quakesweep-axis-');
afterAll(() => rmSync(f.dir, { recursive: true, force: true }));

const HZ_TITLE = '>Frequency f = 1/T (Hz)<';
const GRID = ['--periods', '0,0.05,0.2,1,3'];

describe('periodAxisFromOptions', () => {
  it('period or frequency; unset is undefined (each figure keeps its default); anything else is refused', () => {
    expect(periodAxisFromOptions({})).toBeUndefined();
    expect(periodAxisFromOptions({ axis: 'period' })).toBe('period');
    expect(periodAxisFromOptions({ axis: 'frequency' })).toBe('frequency');
    expect(() => periodAxisFromOptions({ axis: 'hz' })).toThrow("--axis 'hz': use period or frequency");
    expect(() => svgAxisFromOptions({ axis: 'frequency' })).toThrow(
      '--axis sets the axis of the figures; add --svg <dir>',
    );
    expect(svgAxisFromOptions({ axis: 'frequency', svg: 'figures' })).toBe('frequency');
  });
});

describe('every figure command takes --axis frequency', () => {
  const commands: [string, string[]][] = [
    ['spectrum', ['spectrum', f.h1, '--units', 'g', ...GRID]],
    ['design', ['design', '--code', 'asce7-16', '--sds', '1', '--sd1', '0.6', '--tl', '8', ...GRID]],
    ['floor', ['floor', f.h1, '--units', 'g', '--building-period', '0.4', '--modal-factor', '1.3', ...GRID]],
    ['damping', ['damping', f.h1, '--units', 'g', ...GRID]],
    ['rotd', ['rotd', f.h1, f.h2, '--units', 'g', ...GRID]],
  ];
  for (const [name, argv] of commands) {
    it(`${name}: every SVG it writes has the Hz axis; --axis without --svg or of another name is refused`, async () => {
      const svg = join(f.dir, `${name}-svg`);
      const result = await runMain([
        ...argv,
        '--axis',
        'frequency',
        '--svg',
        svg,
        '--out',
        join(f.dir, `${name}.json`),
      ]);
      expect(result.code).toBe(0);
      const files = readdirSync(svg).filter((file) => file.endsWith('.svg'));
      expect(files.length).toBeGreaterThan(0);
      for (const file of files) expect(readFileSync(join(svg, file), 'utf8')).toContain(HZ_TITLE);
      expect(expectOneLineFailure(await runMain([...argv, '--axis', 'frequency']))).toBe(
        'quakesweep: --axis sets the axis of the figures; add --svg <dir>',
      );
      expect(expectOneLineFailure(await runMain([...argv, '--axis', 'hz', '--svg', svg]))).toBe(
        "quakesweep: --axis 'hz': use period or frequency",
      );
    });
  }

  it('report: the floor figure in Hz by default, the spectra in s; --axis period or frequency sets them all', async () => {
    const equipment = join(f.dir, 'above.json');
    const json = JSON.parse(readFileSync(f.equipment, 'utf8'));
    writeFileSync(equipment, JSON.stringify({ ...json, z: 6 }));
    const report = async (out: string, ...extra: string[]) => {
      const argv = ['report', f.h1, '--units', 'g', ...GRID, '--equipment', equipment];
      const building = ['--building-period', '0.4', '--modal-factor', '1.3'];
      const result = await runMain([...argv, ...building, '--out', join(f.dir, out), ...extra]);
      expect(result.code).toBe(0);
      return (file: string) => readFileSync(join(f.dir, out, file), 'utf8');
    };
    const plain = await report('report-default');
    expect(plain('floor-1.svg')).toContain(HZ_TITLE);
    expect(plain('psa.svg')).toContain('>Period T (s)<');
    const periods = await report('report-period', '--axis', 'period');
    expect(periods('floor-1.svg')).toContain('>Period T (s)<');
    const frequencies = await report('report-frequency', '--axis', 'frequency');
    for (const file of ['floor-1.svg', 'psa.svg', 'tripartite.svg'])
      expect(frequencies(file)).toContain(HZ_TITLE);
  });
});
