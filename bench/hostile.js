// Time of two inputs that once took minutes (`node bench/hostile.js [DIST …]`, after `npm run
// build`): a record whose first line is one field of 999,000 digits and a letter (the header test),
// and a bolt group of 16,000 anchors on a grid (each rule). Each compiled tree given (default:
// ./dist) runs both; a run past LIMIT_S is stopped and shown as such, so an old tree can be
// compared without waiting for it. Nothing here is a test: speed is measured here and never
// asserted in the test suite. The inputs are invented.
import { spawnSync } from 'node:child_process';
import { resolve } from 'node:path';
import { pathToFileURL } from 'node:url';

const LIMIT_S = Number(process.env.BENCH_LIMIT_S ?? 120);
const roots =
  process.argv.length > 2 ? process.argv.slice(2) : [new URL('../dist', import.meta.url).pathname];

const header = `
const { readRecordText } = await import(process.env.BASE + 'record/read.js');
const text = '1'.repeat(999000) + 'x,accel\\n0,0.5\\n0.01,-0.25\\n';
const start = performance.now();
readRecordText(text, { source: 'bench.csv', units: 'g' });
console.log(performance.now() - start);`;
const bolts = (rule) => `
const { boltGroupForces } = await import(process.env.BASE + 'anchorage/bolt-group.js');
const anchors = [];
for (let i = 0; anchors.length < 16000; i++) anchors.push([(i % 127) * 0.1, Math.floor(i / 127) * 0.07]);
const start = performance.now();
boltGroupForces({ anchors, cgPlan: [5, 3.8], cgHeight: 1.2, horizontalForce: 30, deadLoad: 50, rule: '${rule}' });
console.log(performance.now() - start);`;

const jobs = [
  ['header test, first field of 999,000 digits', header],
  ['bolt group, 16,000 anchors, projected', bolts('projected')],
  ['bolt group, 16,000 anchors, biaxial', bolts('biaxial')],
];
for (const root of roots) {
  const base = pathToFileURL(`${resolve(root)}/`).href;
  for (const [name, code] of jobs) {
    const run = spawnSync(process.execPath, ['--input-type=module', '-e', code], {
      env: { ...process.env, BASE: base },
      encoding: 'utf8',
      timeout: LIMIT_S * 1000,
    });
    const ms = Number(run.stdout.trim());
    const figure =
      run.status === 0 && Number.isFinite(ms) ? `${ms.toFixed(0)} ms` : `over ${LIMIT_S} s (stopped)`;
    console.log(`${root}  ${name}: ${figure}`);
  }
}
