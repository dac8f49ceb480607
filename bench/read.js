// Time of reading a record text file (`node bench/read.js [DIST …]`, after `npm run build`):
// loadRecord from each compiled tree given (default: ./dist) on a 40,000-line two-column file,
// `time_s,accel_g` then lines like `12.3450,1.23456789e-02`. The runs of the trees are
// interleaved and each figure is the median of REPEAT runs, so that a shared, noisy machine
// disturbs them alike. Nothing here is a test: speed is measured here and never asserted in the
// test suite.
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { pathToFileURL } from 'node:url';

const REPEAT = Number(process.env.BENCH_REPEAT ?? 7);
const LINES = 40_000;
const roots =
  process.argv.length > 2 ? process.argv.slice(2) : [new URL('../dist', import.meta.url).pathname];

const folder = mkdtempSync(join(tmpdir(), 'quakesweep-bench-read-'));
const file = join(folder, 'rec.csv');
const lines = ['time_s,accel_g'];
for (let i = 0; i < LINES; i++) {
  const g = 0.3 * Math.sin(i * 0.05) * Math.exp(-i / 20_000) + 1e-4 * Math.cos(i * 1.7);
  const [mantissa, exponent] = g.toExponential(8).split('e');
  const e = Number(exponent);
  lines.push(
    `${(i * 0.005).toFixed(4)},${mantissa}e${e < 0 ? '-' : '+'}${String(Math.abs(e)).padStart(2, '0')}`,
  );
}
writeFileSync(file, `${lines.join('\n')}\n`);

const median = (values) => {
  const sorted = [...values].sort((a, b) => a - b);
  const m = sorted.length >> 1;
  return sorted.length % 2 ? sorted[m] : 0.5 * (sorted[m - 1] + sorted[m]);
};

const variants = [];
for (const root of roots) {
  const base = pathToFileURL(`${resolve(root)}/`);
  const { loadRecord } = await import(new URL('cli/options/record.js', base).href);
  variants.push({
    name: `${root} loadRecord`,
    run: () => loadRecord(file, { units: 'g' }),
    times: [],
    cpu: [],
  });
}

for (const variant of variants) await variant.run(); // warm up each once
let samples;
for (let i = 0; i < REPEAT; i++) {
  for (const variant of variants) {
    const used = process.cpuUsage();
    const start = performance.now();
    const record = await variant.run();
    variant.times.push(performance.now() - start);
    const { user, system } = process.cpuUsage(used);
    variant.cpu.push((user + system) / 1000);
    samples ??= record.accelMS2.length;
    if (record.accelMS2.length !== samples) throw new Error(`${variant.name} read ${record.accelMS2.length}`);
  }
}
rmSync(folder, { recursive: true, force: true });

// CPU time is shown beside the wall time: on a machine shared with other work it varies less.
console.log(`${LINES} lines, ${samples} samples; medians of ${REPEAT} interleaved runs`);
for (const variant of variants)
  console.log(
    `${variant.name.padEnd(40)} ${median(variant.times).toFixed(1).padStart(7)} ms wall, ${median(variant.cpu).toFixed(1).padStart(7)} ms CPU   (wall: ${variant.times.map((t) => t.toFixed(0)).join(' ')})`,
  );
