import { existsSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { afterAll, describe, expect, it, vi } from 'vitest';
import { shared, startWorker, ThreadTeam, workerScript } from '../../src/threads/team.js';

// Worker threads run the built library (dist/), which the global setup builds.
const team = new URL('../../dist/threads/team.js', import.meta.url).href;
const folder = mkdtempSync(join(tmpdir(), 'quakesweep-team-'));
afterAll(() => rmSync(folder, { recursive: true, force: true }));

/** A worker script that claims items from the job's counter and counts each one it took. */
const claimer = join(folder, 'claimer.mjs');
writeFileSync(
  claimer,
  `import { serveJobs } from '${team}';
serveJobs((job) => {
  if (job.fail) throw new Error('boom');
  for (;;) {
    const item = Atomics.add(job.counter, 0, 1);
    if (item >= job.seen.length) return;
    Atomics.add(job.seen, item, 1);
    Atomics.add(job.byWorkers, 0, 1);
    Atomics.wait(new Int32Array(new SharedArrayBuffer(4)), 0, 0, 1); // 1 ms an item
  }
});
`,
);

interface CountingJob {
  counter: Int32Array;
  seen: Int32Array;
  byWorkers: Int32Array;
  fail?: boolean;
}

const sharedInts = (length: number) => new Int32Array(new SharedArrayBuffer(4 * length));
const newJob = (items: number): CountingJob => ({
  counter: sharedInts(1),
  seen: sharedInts(items),
  byWorkers: sharedInts(1),
});

/** This thread's share of a job: the same claim loop, 1 ms an item. */
function claimHere(job: CountingJob): number {
  let taken = 0;
  for (;;) {
    const item = Atomics.add(job.counter, 0, 1);
    if (item >= job.seen.length) return taken;
    Atomics.add(job.seen, item, 1);
    taken++;
    Atomics.wait(new Int32Array(new SharedArrayBuffer(4)), 0, 0, 1);
  }
}

describe('ThreadTeam', () => {
  it('hands every item of the shared counter out once, to this thread and the workers together', async () => {
    // Atomics.add returns each value of the counter to exactly one caller (ECMAScript §25.4):
    // however the threads interleave, every item is taken once and no item is lost.
    const pool = new ThreadTeam(3, pathToFileURL(claimer));
    try {
      for (const items of [200, 7]) {
        const job = newJob(items);
        let here = 0;
        await pool.run(job, () => {
          here = claimHere(job);
        });
        expect(Array.from(job.seen).every((count) => count === 1)).toBe(true);
        expect(here + job.byWorkers[0]).toBe(items);
      }
    } finally {
      await pool.close();
    }
  });

  it('runs the job on this thread alone with one thread, and refuses a count that is not whole and ≥ 1', async () => {
    const alone = new ThreadTeam(1, pathToFileURL(claimer));
    const job = newJob(5);
    await alone.run(job, () => claimHere(job));
    expect(Array.from(job.seen)).toEqual([1, 1, 1, 1, 1]);
    expect(job.byWorkers[0]).toBe(0);
    expect(() => new ThreadTeam(0, pathToFileURL(claimer))).toThrow(/thread count/);
    expect(() => new ThreadTeam(2.5, pathToFileURL(claimer))).toThrow(/thread count/);
  });

  it('fails the job with the worker’s error, and serves the next job after it', async () => {
    const pool = new ThreadTeam(2, pathToFileURL(claimer));
    try {
      await expect(pool.run({ ...newJob(3), fail: true }, () => {})).rejects.toThrow(/worker thread: boom/);
      const job = newJob(4);
      await pool.run(job, () => {});
      expect(job.byWorkers[0]).toBe(4); // this thread took none: the worker did them all
    } finally {
      await pool.close();
    }
  });
});

describe('the thread helpers', () => {
  it('finds this folder’s worker scripts in dist/ when run from the sources', () => {
    const script = workerScript('pool-worker.js');
    expect(fileURLToPath(script)).toMatch(/dist[/\\]threads[/\\]pool-worker\.js$/);
    expect(existsSync(script)).toBe(true);
  });

  it('puts values in shared memory once: a copy of ordinary arrays, shared ones as they are', () => {
    const plain = Float64Array.from([1.5, -2, 3e-300]);
    const copy = shared(plain);
    expect(copy.buffer).toBeInstanceOf(SharedArrayBuffer);
    expect(copy).not.toBe(plain);
    expect(Array.from(copy)).toEqual(Array.from(plain));
    expect(shared(copy)).toBe(copy);
  });

  it('copies a worker’s standard output to this process’s', async () => {
    const talker = join(folder, 'talker.mjs');
    writeFileSync(talker, "process.stdout.write('hello from a worker\\n');\n");
    const write = vi.spyOn(process.stdout, 'write').mockImplementation(() => true);
    try {
      const worker = startWorker(pathToFileURL(talker));
      await new Promise((resolve) => worker.on('exit', resolve));
      await new Promise((resolve) => setImmediate(resolve));
      expect(write.mock.calls.map(([chunk]) => String(chunk)).join('')).toContain('hello from a worker');
    } finally {
      write.mockRestore();
    }
  });
});
