/**
 * A temporary working folder for in-process CLI tests: `run` calls main() there, `json` runs with
 * --format json and expects success, `writeWindowedSine` writes an invented one-value-a-line
 * record (a Gaussian-windowed sine, 600 samples meant for --dt 0.01).
 */
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, expect } from 'vitest';
import { besidesSuccess, type CliResult, runMainIn } from './run-cli.js';

export interface CliFolder {
  /** The folder's path (empty until the file's beforeAll ran). */
  readonly path: string;
  run(...args: string[]): Promise<CliResult>;
  json(...args: string[]): Promise<ReturnType<typeof JSON.parse>>;
  writeWindowedSine(name: string, frequencyHz: number): void;
}

/** A fresh folder made before the file's tests and removed after them. */
export function useCliFolder(prefix: string, setup: (folder: CliFolder) => void = () => {}): CliFolder {
  let path = '';
  const folder: CliFolder = {
    get path() {
      return path;
    },
    run: (...args) => runMainIn(path, args),
    async json(...args) {
      const result = await runMainIn(path, [...args, '--format', 'json']);
      expect(besidesSuccess(result.stderr)).toBe('');
      expect(result.code).toBe(0);
      return JSON.parse(result.stdout);
    },
    writeWindowedSine(name, frequencyHz) {
      const values = Array.from({ length: 600 }, (_, i) => {
        const t = i * 0.01;
        return String(0.3 * Math.exp(-(((t - 2.5) / 1) ** 2)) * Math.sin(2 * Math.PI * frequencyHz * t));
      });
      writeFileSync(join(path, name), values.join('\n'));
    },
  };
  beforeAll(() => {
    path = mkdtempSync(join(tmpdir(), prefix));
    setup(folder);
  });
  afterAll(() => rmSync(path, { recursive: true, force: true }));
  return folder;
}
