import { spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, readdirSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { CAUTION } from '../../../src/base/caution.js';
import { besidesSuccess } from '../../helpers/run-cli.js';

// The built CLI run from a folder outside the package, as a person runs the demo: it must find
// its invented records inside the package.

const root = resolve(import.meta.dirname, '../../..');
const bin = join(root, 'bin', 'quakesweep.js');
const folder = mkdtempSync(join(tmpdir(), 'quakesweep-demo-'));

afterAll(() => rmSync(folder, { recursive: true, force: true }));

describe('quakesweep demo', () => {
  it('runs from a folder outside the package and writes the full report', () => {
    const result = spawnSync(process.execPath, [bin, 'demo'], { cwd: folder, encoding: 'utf8' });
    expect(besidesSuccess(result.stderr)).toBe('');
    expect(result.status).toBe(0);
    expect(result.stdout).toContain(CAUTION.split(' ').slice(0, 6).join(' '));
    const html = readFileSync(join(folder, 'demo-output', 'report.html'), 'utf8');
    for (const text of [
      'RotD50',
      'Damping comparison',
      'Generator G-1 (invented)',
      'floor spectrum',
      'Inelastic response',
      'Newmark–Hall (1982)',
      'invented',
    ]) {
      expect(html).toContain(text);
    }
    expect(existsSync(join(folder, 'demo-output', 'rotd.svg'))).toBe(true);
    expect(existsSync(join(folder, 'demo-output', 'ductility-ry.svg'))).toBe(true);
    // Published factors are cited by title, year and clause; no output says "(from memory)"
    // (the uncertainty notes live in docs/methods-and-verification.md and the tests).
    for (const file of readdirSync(join(folder, 'demo-output'))) {
      const text = readFileSync(join(folder, 'demo-output', file), 'utf8');
      expect(text, file).not.toMatch(/from memory/);
    }
    expect(html).toContain('US NRC Regulatory Guide 1.122, Rev. 1 (1978)');
    expect(html).toContain('ASCE/SEI 7-22 §13.3.1 with §12.4.2.2');
  });
});
