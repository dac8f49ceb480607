// The sweep benchmark (`npm run bench`, after `npm run build`): the standard job, a RotD job, a
// 50-record batch, the constant-ductility search and the memory of a 2,000,000-sample record.
// Every figure is the median of REPEAT runs; the machine may be shared, so read the figures as
// indications. Nothing here is a test: speed is measured here and never asserted in the test suite.
import { execFileSync, spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { availableParallelism, tmpdir } from 'node:os';
import { join } from 'node:path';
import { loadRecord } from '../dist/cli/options/record.js';
import { formatJson, spectrumToJson } from '../dist/formats/spectrum-json.js';
import { constantDuctilitySpectra } from '../dist/inelastic/ductility.js';
import { defaultPeriodsS, logSpaced } from '../dist/oscillator/grid.js';
import { sweepOscillators } from '../dist/oscillator/sweep.js';
import { writeFileAtomic } from '../dist/output/output-set.js';
import { synthesizeRecord } from '../dist/record/synth.js';
import { rotDSpectra } from '../dist/spectrum/rotd.js';
import { assembleSpectrum } from '../dist/spectrum/spectrum.js';
import { ductilitySpectraOnThreads } from '../dist/threads/ductility-pool.js';
import { RotDPool } from '../dist/threads/rotd-pool.js';
import { SweepPool } from '../dist/threads/sweep-pool.js';

const REPEAT = Number(process.env.BENCH_REPEAT ?? 5);
const QUICK = process.env.BENCH_QUICK === '1';
const POOL_WARM_JOBS = 8;
const folder = mkdtempSync(join(tmpdir(), 'quakesweep-bench-'));
const cli = new URL('../bin/quakesweep.js', import.meta.url).pathname;
const cores = availableParallelism();
const rows = [];
/** The standard job's default method (newmark-average) on one thread, ms, by kernel (wasm, js). */
const kernelOneMs = {};

const median = (values) => {
  const sorted = [...values].sort((a, b) => a - b);
  const m = sorted.length >> 1;
  return sorted.length % 2 ? sorted[m] : 0.5 * (sorted[m - 1] + sorted[m]);
};
async function timed(fn, repeat = REPEAT) {
  const times = [];
  const cpu = [];
  let result;
  for (let i = 0; i < repeat; i++) {
    const start = performance.now();
    const used = process.cpuUsage();
    result = await fn();
    times.push(performance.now() - start);
    const { user, system } = process.cpuUsage(used);
    cpu.push((user + system) / 1000);
  }
  // cpuMs: CPU time of all this process's threads; on a machine shared with other work it shows
  // whether the threads ran side by side (cpuMs ≈ threads × ms) or took turns (cpuMs ≈ ms).
  return { ms: median(times), cpuMs: median(cpu), result };
}
const mega = (steps, ms) => (steps / ms / 1e3).toFixed(0);
/** One line of the table; with `steps`, its rate in million steps per second beside it. */
function row(job, variant, fields) {
  rows.push({ job, variant, ...fields, mps: fields.steps && mega(fields.steps, fields.ms) });
}
/**
 * A new pool's first job, then its median after POOL_WARM_JOBS jobs: a pool's first jobs run
 * slower, its threads' code being still cold. The pool is closed after.
 */
async function pooled(pool, job, repeat = REPEAT) {
  const first = await timed(job, 1);
  for (let i = 1; i < POOL_WARM_JOBS; i++) await job();
  const all = await timed(job, repeat);
  await pool.close();
  return { all, note: `after ${POOL_WARM_JOBS} jobs (first job ${first.ms.toFixed(0)} ms)` };
}
function writeCsv(path, record) {
  const lines = ['time_s,accel_g'];
  for (let i = 0; i < record.accelMS2.length; i++) {
    lines.push(`${(i * record.dtS).toFixed(4)},${(record.accelMS2[i] / 9.80665).toPrecision(9)}`);
  }
  writeFileSync(path, `${lines.join('\n')}\n`);
}
function peakKb(args) {
  // GNU time's maximum resident set size, where it is installed.
  if (!existsSync('/usr/bin/time')) return undefined;
  const run = spawnSync('/usr/bin/time', ['-f', '%M', process.execPath, ...args], { encoding: 'utf8' });
  if (run.status !== 0) throw new Error(`bench: ${args.join(' ')} failed: ${run.stderr}`);
  return Number(run.stderr.trim().split('\n').pop());
}
function childMs(args) {
  const start = performance.now();
  execFileSync(process.execPath, args, { stdio: ['ignore', 'ignore', 'inherit'] });
  return performance.now() - start;
}

// The standard job: 40,000 samples at 0.005 s, 200 periods 0.05–10 s, five dampings.
const standard = synthesizeRecord({ seed: 2026, dtS: 0.005, durationS: 199.995, name: 'bench-standard' });
const grid = { periodsS: logSpaced(0.05, 10, 200), dampings: [0, 0.02, 0.05, 0.1, 0.2] };
const nominal = grid.periodsS.length * grid.dampings.length * standard.accelMS2.length;
const csv = join(folder, 'standard.csv');
writeCsv(csv, standard);

for (const method of QUICK ? ['newmark-average'] : ['newmark-average', 'piecewise-exact']) {
  for (const kernel of ['wasm', 'js']) {
    const options = { ...grid, method, kernel };
    // Warm-up (JIT, wasm tier-up): the first runs of a process are slower.
    for (let i = 0; i < 3; i++) sweepOscillators(standard.accelMS2, standard.dtS, options);
    const one = await timed(() => sweepOscillators(standard.accelMS2, standard.dtS, options));
    const executed = one.result.oscillatorSteps;
    if (method === 'newmark-average') kernelOneMs[kernel] = one.ms;
    row('standard', `${method} ${kernel} 1 thread`, {
      ms: one.ms,
      steps: nominal,
      note: `executed ${executed} (${mega(executed, one.ms)} M/s); CPU ${one.cpuMs.toFixed(0)} ms`,
    });
    const pool = new SweepPool(cores);
    const { all, note } = await pooled(pool, () => pool.sweep(standard.accelMS2, standard.dtS, options));
    row('standard', `${method} ${kernel} ${cores} threads`, {
      ms: all.ms,
      steps: nominal,
      note: `×${(one.ms / all.ms).toFixed(2)} ${note}; CPU ${all.cpuMs.toFixed(0)} ms, all threads`,
    });
  }
}

// Stages of the standard job in this process, and the whole CLI job as a child process.
{
  const read = await timed(() => loadRecord(csv, { units: 'g' }));
  const record = read.result;
  const sweep = await timed(() => sweepOscillators(record.accelMS2, record.dtS, grid));
  const out = join(folder, 'standard.json');
  const write = await timed(() =>
    writeFileAtomic(out, formatJson(spectrumToJson(assembleSpectrum(record, sweep.result))), [csv]),
  );
  row('standard stages', 'read CSV / sweep (1 thread) / write JSON', {
    ms: read.ms + sweep.ms + write.ms,
    note: `${read.ms.toFixed(0)} + ${sweep.ms.toFixed(0)} + ${write.ms.toFixed(0)} ms`,
  });
  // Node's start-up and the CLI runs taken in turn, so that both see the machine in the same state
  // (a shared machine's speed drifts from one second to the next); at least 11 of each.
  const args = ['spectrum', csv, '--units', 'g', '--periods', '0.05:10:200', '--damping', '0,2%,5%,10%,20%'];
  const variants = [[], ['--threads', '1'], ['--kernel', 'js', '--threads', '1']];
  const startups = [];
  const runs = variants.map(() => []);
  for (let i = 0; i < Math.max(REPEAT, 11); i++) {
    startups.push(childMs(['-e', '0']));
    for (const [v, extra] of variants.entries())
      runs[v].push(childMs([cli, ...args, ...extra, '--out', out]));
  }
  const startup = median(startups);
  variants.forEach((extra, v) => {
    const ms = median(runs[v]);
    // The whole-job target: at most 1.5 × the kernel's own time (one thread) + Node's start-up.
    const kernel = extra.includes('js') ? 'js' : 'wasm';
    const ratio = `; (CLI − start-up) / ${kernel} kernel ${((ms - startup) / kernelOneMs[kernel]).toFixed(2)}${extra.length === 0 ? ' (target ≤ 1.5)' : ''}`;
    row('standard CLI', `quakesweep spectrum ${extra.join(' ') || '(defaults)'}`, {
      ms,
      note: `node start-up ${startup.toFixed(0)} ms; peak ${peakKb([cli, ...args, ...extra, '--out', out]) ?? '?'} KB${ratio}`,
    });
  });
}

// RotD: two components, 40 periods, 180 angles; the loop over angles in each kernel, on one
// thread and with the periods dealt out over all cores. Steps count each angle's rotated
// oscillator (nominal: periods × samples × angles).
const [first, second] = [3001, 3002].map((seed) => synthesizeRecord({ seed, dtS: 0.01, durationS: 79.99 }));
{
  const rotd = { periodsS: logSpaced(0.05, 10, QUICK ? 10 : 40), dampings: [0.05] };
  const n = first.accelMS2.length;
  const nominalRotd = rotd.periodsS.length * n * 180;
  for (const kernel of ['wasm', 'js']) {
    const options = { ...rotd, kernel };
    for (let i = 0; i < 3; i++) rotDSpectra(first, second, options); // warm-up
    const alone = await timed(() => rotDSpectra(first, second, options), QUICK ? 1 : REPEAT);
    const job = `2 × ${n} samples, ${rotd.periodsS.length} periods, 180 angles, ${kernel}`;
    row('RotD', `${job} 1 thread`, {
      ms: alone.ms,
      steps: nominalRotd,
      note: `rotated oscillator-steps; CPU ${alone.cpuMs.toFixed(0)} ms`,
    });
    // A pool kept for a suite of pairs.
    const pool = new RotDPool(cores);
    const { all, note } = await pooled(pool, () => pool.rotd(first, second, options), QUICK ? 1 : REPEAT);
    row('RotD', `${job} ${cores} threads`, {
      ms: all.ms,
      steps: nominalRotd,
      note: `×${(alone.ms / all.ms).toFixed(2)} ${note}; CPU ${all.cpuMs.toFixed(0)} ms`,
    });
  }
}

// A batch of 50 records in the library: the sweep alone, one record after another, on one thread
// and on a pool of all cores.
const records = Array.from({ length: 50 }, (_, i) =>
  synthesizeRecord({ seed: 5000 + i, dtS: 0.005, durationS: 40 + (i % 7) }),
);
for (const kernel of ['wasm', 'js']) {
  const batch = { periodsS: defaultPeriodsS(), dampings: [0.05], kernel };
  let steps = 0;
  let nominalBatch = 0;
  for (const r of records) sweepOscillators(r.accelMS2, r.dtS, batch); // warm-up
  const alone = await timed(
    () => {
      steps = 0;
      nominalBatch = 0;
      for (const r of records) {
        steps += sweepOscillators(r.accelMS2, r.dtS, batch).oscillatorSteps;
        nominalBatch += batch.periodsS.length * r.accelMS2.length;
      }
    },
    QUICK ? 1 : REPEAT,
  );
  row('batch 50', `${kernel} 1 thread`, {
    ms: alone.ms,
    steps: nominalBatch,
    note: `executed ${steps}`,
  });
  // One pool kept for the suite, each record split over its threads in turn (the batch command,
  // which deals records out whole to its threads, is timed below).
  const pool = new SweepPool(cores);
  const suite = async () => {
    for (const r of records) await pool.sweep(r.accelMS2, r.dtS, batch);
  };
  for (let i = 0; i < 3; i++) await suite(); // warm-up
  const split = await timed(suite, QUICK ? 1 : REPEAT);
  await pool.close();
  row('batch 50', `${kernel} pool of ${cores} threads, each record split`, {
    ms: split.ms,
    steps: nominalBatch,
    note: `×${(alone.ms / split.ms).toFixed(2)}; CPU ${split.cpuMs.toFixed(0)} ms, all threads`,
  });
}

// RotD and the batch through the CLI: the whole process's wall time and peak memory.
{
  const paths = [first, second].map((record, i) => {
    const path = join(folder, `pair-${i + 1}.csv`);
    writeCsv(path, record);
    return path;
  });
  const rotdArgs = [cli, 'rotd', ...paths, '--units', 'g', '--periods', '0.05:10:40', '--damping', '5%'];
  for (const threads of ['1', String(cores)]) {
    const args = [...rotdArgs, '--threads', threads, '--out', join(folder, 'rotd.json')];
    const runs = Array.from({ length: QUICK ? 1 : REPEAT }, () => childMs(args));
    row('RotD CLI', `quakesweep rotd --threads ${threads}`, {
      ms: median(runs),
      note: `peak ${peakKb(args) ?? '?'} KB`,
    });
  }
  for (const [i, r] of records.entries())
    writeCsv(join(folder, `batch-${String(i).padStart(2, '0')}.csv`), r);
  const batchArgs = [cli, 'batch', join(folder, 'batch-*.csv'), '--units', 'g', '--damping', '5%'];
  for (const jobs of ['1', String(cores)]) {
    const args = [...batchArgs, '--threads', jobs, '--out', join(folder, `batch-out-${jobs}`)];
    const runs = Array.from({ length: QUICK ? 1 : REPEAT }, () => childMs(args));
    row('batch CLI', `quakesweep batch (50 records) --threads ${jobs}`, {
      ms: median(runs),
      note: `peak ${peakKb(args) ?? '?'} KB (main process; workers are threads of it)`,
    });
  }
}

// Constant-ductility spectra: the default grid (T = 0 and 121 periods 0.01–10 s, μ = 1, 1.5, 2,
// 4, 6, 8, elastoplastic, 5%) on a 40,000-sample record at 0.01 s, on one thread and with the
// (damping, period) cells dealt out over all cores; each threaded call starts its threads and
// closes them, as a command does. Target: under 5 s on all cores.
{
  const record = synthesizeRecord({ seed: 1818, dtS: 0.01, durationS: 399.99, name: 'bench-ductility' });
  const options = {
    periodsS: defaultPeriodsS(),
    dampings: [0.05],
    ductilities: [1, 1.5, 2, 4, 6, 8],
    model: { kind: 'elastoplastic' },
  };
  const repeat = QUICK ? 1 : REPEAT;
  // Warm-up on the record's first 2,000 samples: every code path, a twentieth of the work.
  const head = { ...record, accelMS2: record.accelMS2.subarray(0, 2000) };
  constantDuctilitySpectra(head, options);
  await ductilitySpectraOnThreads(head, options, cores);
  const variant = (threads) =>
    `default grid (122 periods incl. T = 0 × 6 μ × 5%), ${record.accelMS2.length} samples, ${threads} thread${threads === 1 ? '' : 's'}`;
  const alone = await timed(() => constantDuctilitySpectra(record, options), repeat);
  const runs = alone.result.oscillatorRuns;
  row('ductility', variant(1), {
    ms: alone.ms,
    note: `${runs} oscillator runs; CPU ${alone.cpuMs.toFixed(0)} ms`,
  });
  const all = await timed(() => ductilitySpectraOnThreads(record, options, cores), repeat);
  row('ductility', variant(cores), {
    ms: all.ms,
    note: `×${(alone.ms / all.ms).toFixed(2)} (target < 5000 ms); threads started per call; CPU ${all.cpuMs.toFixed(0)} ms, all threads`,
  });
  // The whole command on the same record and grid (its defaults: the grid above), as a child
  // process: reading the CSV, the search, the JSON.
  const path = join(folder, 'ductility.csv');
  writeCsv(path, record);
  for (const threads of ['1', String(cores)]) {
    const args = [
      cli,
      'ductility',
      path,
      '--units',
      'g',
      '--threads',
      threads,
      '--out',
      join(folder, 'ductility.json'),
    ];
    const runs = Array.from({ length: repeat }, () => childMs(args));
    row('ductility CLI', `quakesweep ductility (defaults) --threads ${threads}`, {
      ms: median(runs),
      note: `peak ${peakKb(args) ?? '?'} KB`,
    });
  }
}

// Memory: a 2,000,000-sample record with the default grid, through the CLI.
if (!QUICK) {
  const big = synthesizeRecord({ seed: 7007, dtS: 0.01, durationS: 19999.99 });
  const path = join(folder, 'big.csv');
  writeCsv(path, big);
  const start = performance.now();
  const kb = peakKb([cli, 'spectrum', path, '--units', 'g', '--out', join(folder, 'big.json')]);
  row('memory', `CLI spectrum, ${big.accelMS2.length} samples, default grid`, {
    ms: performance.now() - start,
    note: `peak ${kb ?? '?'} KB (limit 300 MB)`,
  });
}

rmSync(folder, { recursive: true, force: true });
console.log(`quakesweep bench: medians of ${REPEAT}, ${cores} cores (shared machines make these noisy)`);
console.log(`standard job nominal oscillator-steps (oscillators × samples): ${nominal}`);
const pad = (text, width) => String(text).padEnd(width);
console.log(`${pad('job', 16)}${pad('variant', 66)}${pad('ms', 9)}${pad('steps', 12)}${pad('M/s', 7)}note`);
for (const r of rows) {
  console.log(
    `${pad(r.job, 16)}${pad(r.variant, 66)}${pad(r.ms.toFixed(0), 9)}${pad(r.steps ?? '', 12)}${pad(r.mps ?? '', 7)}${r.note ?? ''}`,
  );
}
