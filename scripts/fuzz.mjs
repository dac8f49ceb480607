#!/usr/bin/env node
// The long fuzz campaign: the property tests of test/properties/ with every case count multiplied by
// QUAKESWEEP_FUZZ_SCALE (default 170). At the default scale: reader cases in-process (about 100,000),
// spectrum cases through main() in-process and through a few hundred child processes, hostile and
// plausible options across the commands (options.test.ts: 5,100 in-process, 120 bounded child
// processes), and damaged shards merged (merge.test.ts: 6,800 in-process, 120 child processes).
// Then the crash-safety kill test (test/output/crash-safety.test.ts) with QUAKESWEEP_KILLS=100
// random kills of `report` and `batch`, about 3 minutes; `--kills N` sets the number, `--no-kills`
// skips it. The whole run takes about half an hour on 2 cores (see the figures it prints).
// Usage: npm run fuzz [-- --scale N --seed S --kills N --no-kills]
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
const kills = args.includes('--no-kills') ? 0 : Number(option('--kills', '100'));
const folder = mkdtempSync(join(tmpdir(), 'quakesweep-fuzz-report-'));
const reportFile = join(folder, 'report.jsonl');

console.log(`fuzz: scale ${scale}, seed ${seed} (rerun with --seed ${seed} to repeat)`);
const started = Date.now();
const vitest = (files, env) =>
  spawnSync(
    process.execPath,
    ['node_modules/vitest/vitest.mjs', 'run', ...files, '--testTimeout', '0', '--reporter', 'dot'],
    { stdio: 'inherit', env: { ...process.env, ...env } },
  );
const run = vitest(['test/properties'], {
  QUAKESWEEP_FUZZ_SCALE: scale,
  QUAKESWEEP_FUZZ_SEED: seed,
  QUAKESWEEP_FUZZ_REPORT: reportFile,
});
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
const propertiesS = Math.round((Date.now() - started) / 1000);
console.log(`fuzz: ${total} cases in ${propertiesS} s, exit ${run.status}`);
let status = run.status ?? 1;
if (kills > 0) {
  const killStart = Date.now();
  const killRun = vitest(['test/output/crash-safety.test.ts'], {
    QUAKESWEEP_KILLS: String(kills),
    QUAKESWEEP_KILL_SEED: String(Number(seed) % 1_000_000),
  });
  console.log(
    `fuzz: kill test, ${kills} kills in ${Math.round((Date.now() - killStart) / 1000)} s, exit ${killRun.status}`,
  );
  if (status === 0) status = killRun.status ?? 1;
}
console.log(`fuzz: done in ${Math.round((Date.now() - started) / 1000)} s, exit ${status}`);
rmSync(folder, { recursive: true, force: true });
process.exitCode = status;
