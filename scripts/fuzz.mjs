#!/usr/bin/env node
// The long fuzz campaign: the property tests of test/properties/ with every case count multiplied by
// QUAKESWEEP_FUZZ_SCALE (default 170, a little over 100,000 cases: loader cases in-process,
// spectrum cases through main() in-process, and a few hundred through real child processes).
// Usage: npm run fuzz [-- --scale N --seed S]
import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';

const args = process.argv.slice(2);
const option = (name, fallback) => {
  const i = args.indexOf(name);
  return i >= 0 && i + 1 < args.length ? args[i + 1] : fallback;
};
const scale = option('--scale', process.env.QUAKESWEEP_FUZZ_SCALE ?? '170');
const seed = option('--seed', process.env.QUAKESWEEP_FUZZ_SEED ?? String(Date.now() % 2 ** 31));
const folder = mkdtempSync(join(tmpdir(), 'quakesweep-fuzz-report-'));
const reportFile = join(folder, 'report.jsonl');

console.log(`fuzz: scale ${scale}, seed ${seed} (rerun with --seed ${seed} to repeat)`);
const started = Date.now();
const run = spawnSync(
  process.execPath,
  ['node_modules/vitest/vitest.mjs', 'run', 'test/properties', '--testTimeout', '0', '--reporter', 'dot'],
  {
    stdio: 'inherit',
    env: {
      ...process.env,
      QUAKESWEEP_FUZZ_SCALE: scale,
      QUAKESWEEP_FUZZ_SEED: seed,
      QUAKESWEEP_FUZZ_REPORT: reportFile,
    },
  },
);
let total = 0;
try {
  for (const line of readFileSync(reportFile, 'utf8').split('\n').filter(Boolean)) {
    const entry = JSON.parse(line);
    total += entry.cases ?? 0;
    console.log(`  ${entry.name}: ${JSON.stringify({ ...entry, name: undefined })}`);
  }
} catch {
  console.log('  (no figures: a test failed before reporting; see above)');
}
console.log(`fuzz: ${total} cases in ${Math.round((Date.now() - started) / 1000)} s, exit ${run.status}`);
rmSync(folder, { recursive: true, force: true });
process.exitCode = run.status ?? 1;
