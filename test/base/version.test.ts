import { spawnSync } from 'node:child_process';
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { VERSION } from '../../src/base/version.js';

const packageVersion = JSON.parse(
  readFileSync(new URL('../../package.json', import.meta.url), 'utf8'),
).version;
const BIN = fileURLToPath(new URL('../../bin/quakesweep.js', import.meta.url));

describe('VERSION', () => {
  it("is package.json's version", () => {
    expect(VERSION).toBe(packageVersion);
    expect(VERSION).toMatch(/^\d+\.\d+\.\d+/);
  });

  it('is what the built command prints for --version', () => {
    const result = spawnSync(process.execPath, [BIN, '--version'], { encoding: 'utf8' });
    expect(result.status).toBe(0);
    expect(result.stdout.trim()).toBe(packageVersion);
  });
});
