/**
 * Same input and options, same bytes: every command and format is run twice into separate
 * folders and the files compared byte for byte; no data file carries a date or time of day
 * (common practice for reproducible outputs).
 */
import { mkdirSync, readdirSync, readFileSync, rmSync } from 'node:fs';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { writeFixtures } from '../helpers/fixtures.js';
import { runMain } from '../helpers/run-cli.js';

const f = writeFixtures();
afterAll(() => rmSync(f.dir, { recursive: true, force: true }));

const GRID = ['--periods', '0,0.05,0.1,0.3,1,3'];
/** Each command's argv, with OUT standing for the output folder of the run. */
const COMMANDS: Record<string, string[]> = {
  'spectrum json + svg': [
    'spectrum',
    f.h1,
    '--units',
    'g',
    ...GRID,
    '--damping',
    '2%,5%',
    '--out',
    'OUT/s.json',
    '--svg',
    'OUT',
    '--histories',
  ],
  'spectrum csv': ['spectrum', f.h1, '--units', 'g', ...GRID, '--format', 'csv', '--out', 'OUT/s.csv'],
  'spectrum target': [
    'spectrum',
    f.h1,
    '--units',
    'g',
    ...GRID,
    '--target',
    f.table,
    '--apply-scale',
    '--out',
    'OUT/t.json',
  ],
  'info json + svg': [
    'info',
    f.single,
    '--units',
    'g',
    '--dt',
    '0.01',
    '--out',
    'OUT/i.json',
    '--svg',
    'OUT',
  ],
  'design json': [
    'design',
    '--code',
    'asce7-16',
    '--sds',
    '1',
    '--sd1',
    '0.6',
    '--tl',
    '8',
    '--out',
    'OUT/d.json',
  ],
  'design csv': [
    'design',
    '--code',
    'ec8',
    '--type',
    '1',
    '--ground',
    'C',
    '--ag',
    '0.25',
    '--format',
    'csv',
    '--out',
    'OUT/d.csv',
  ],
  'rotd json': ['rotd', f.h1, f.h2, '--units', 'g', ...GRID, '--out', 'OUT/r.json'],
  'rotd csv': ['rotd', f.h1, f.h2, '--units', 'g', ...GRID, '--format', 'csv', '--out', 'OUT/r.csv'],
  'damping json': ['damping', f.h1, '--units', 'g', ...GRID, '--out', 'OUT/k.json'],
  'damping csv': ['damping', f.h1, '--units', 'g', ...GRID, '--format', 'csv', '--out', 'OUT/k.csv'],
  'floor json': [
    'floor',
    f.h1,
    '--units',
    'g',
    ...GRID,
    '--building-period',
    '0.4',
    '--modal-factor',
    '1.4',
    '--broaden',
    '--out',
    'OUT/f.json',
  ],
  'floor csv': [
    'floor',
    f.h1,
    '--units',
    'g',
    ...GRID,
    '--building-period',
    '0.4',
    '--modal-factor',
    '1.4',
    '--format',
    'csv',
    '--out',
    'OUT/f.csv',
  ],
  'anchor json + svg': [
    'anchor',
    '--equipment',
    f.equipment,
    '--record',
    f.h1,
    '--units',
    'g',
    '--out',
    'OUT/a.json',
    '--svg',
    'OUT',
  ],
  synth: ['synth', '--seed', '7', '--duration', '4', '--out', 'OUT/synth.csv'],
};

async function runInto(name: string, argv: string[], run: number): Promise<Map<string, Buffer>> {
  const out = join(f.dir, `${name.replace(/\W+/g, '-')}-${run}`);
  mkdirSync(out);
  const result = await runMain(argv.map((arg) => arg.replace(/^OUT/, out)));
  if (result.code !== 0) throw new Error(`${name} failed: ${result.stderr}`);
  const files = new Map<string, Buffer>();
  for (const file of readdirSync(out).sort()) files.set(file, readFileSync(join(out, file)));
  return files;
}

describe('every command gives the same bytes twice', () => {
  for (const [name, argv] of Object.entries(COMMANDS)) {
    it(name, async () => {
      const first = await runInto(name, argv, 1);
      const second = await runInto(name, argv, 2);
      expect([...first.keys()]).toEqual([...second.keys()]);
      expect(first.size).toBeGreaterThan(0);
      for (const [file, bytes] of first) {
        expect(second.get(file)?.equals(bytes), `${file} differs between runs`).toBe(true);
        // An ISO date-time, or a clock time, would make the bytes depend on when the tool ran.
        expect(bytes.toString('utf8')).not.toMatch(/\b(19|20)\d\d-\d\d-\d\d[T ]\d\d:\d\d|\b\d\d:\d\d:\d\d\b/);
      }
    });
  }
});
