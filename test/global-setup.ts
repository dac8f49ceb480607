import { execFileSync } from 'node:child_process';
import { resolve } from 'node:path';

// Build the WebAssembly kernel, dist/ and the CLI bundle once before any test file runs: the CLI tests spawn
// bin/quakesweep.js, which runs the bundle. (Building in each file's beforeAll would race between parallel workers.)
export default function setup(): void {
  const root = resolve(import.meta.dirname, '..');
  execFileSync(process.execPath, [resolve(root, 'scripts/build-wasm.mjs')], { cwd: root, stdio: 'inherit' });
  execFileSync(process.execPath, [resolve(root, 'node_modules/typescript/bin/tsc'), '-p', 'tsconfig.json'], {
    cwd: root,
    stdio: 'inherit',
  });
  execFileSync(process.execPath, [resolve(root, 'scripts/build-cli.mjs')], { cwd: root, stdio: 'inherit' });
}
