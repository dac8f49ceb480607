import { spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { CAUTION } from '../../src/base/caution.js';

const root = resolve(import.meta.dirname, '../..');
const bin = join(root, 'bin', 'quakesweep.js');
const folder = mkdtempSync(join(tmpdir(), 'quakesweep-demo-'));

afterAll(() => rmSync(folder, { recursive: true, force: true }));

describe('quakesweep demo and report folders', () => {
  it('runs from a folder outside the package and writes the full report', () => {
    const result = spawnSync(process.execPath, [bin, 'demo'], { cwd: folder, encoding: 'utf8' });
    expect(result.stderr).toBe('');
    expect(result.status).toBe(0);
    expect(result.stdout).toContain(CAUTION.split(' ').slice(0, 6).join(' '));
    const html = readFileSync(join(folder, 'demo-output', 'report.html'), 'utf8');
    for (const text of [
      'RotD50',
      'Damping comparison',
      'Generator G-1 (invented)',
      'floor spectrum',
      'invented',
    ]) {
      expect(html).toContain(text);
    }
    expect(existsSync(join(folder, 'demo-output', 'rotd.svg'))).toBe(true);
  });

  it('refuses an output folder whose parent does not exist, in one line, exit 2', () => {
    const result = spawnSync(
      process.execPath,
      [bin, 'report', join(root, 'records', 'marrowby-h1.csv'), '--units', 'g', '--out', 'no/such/dir'],
      { cwd: folder, encoding: 'utf8' },
    );
    expect(result.status).toBe(2);
    expect(result.stderr.trim().split('\n')).toHaveLength(1);
    expect(result.stderr).toMatch(/parent folder does not exist/);
  });
});
