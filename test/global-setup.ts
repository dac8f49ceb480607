import { execFileSync } from 'node:child_process';
import { resolve } from 'node:path';

// `npm run build` once before any test file runs: the CLI tests spawn bin/quakesweep.js and the
// worker threads run dist/, so both must be built from the sources under test. This is the one
// build of `npm test` (building in each file's beforeAll would race between parallel workers).
export default function setup(): void {
  const root = resolve(import.meta.dirname, '..');
  execFileSync('npm', ['run', '--silent', 'build'], { cwd: root, stdio: 'inherit' });
}
