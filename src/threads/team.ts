import { parentPort, Worker } from 'node:worker_threads';
import { inputError, QuakesweepError } from '../base/errors.js';

/**
 * The worker script `file` of this folder: beside this module in dist/; in dist/ from TypeScript
 * source (tests); in dist/cli/workers/ (CommonJS) from the CLI bundle (see scripts/build-cli.mjs).
 */
export function workerScript(file: string): URL {
  const here = import.meta.url;
  if (here.endsWith('.ts')) return new URL(`../../dist/threads/${file}`, here);
  if (here.endsWith('.cjs')) return new URL(`./workers/${file.replace(/\.js$/, '.cjs')}`, here);
  return new URL(`./${file}`, here);
}

/** A worker thread running `script`, its output copied by a listener (cheaper than Node's piping). */
export function startWorker(script: URL, options: { workerData?: unknown } = {}): Worker {
  const worker = new Worker(script, { ...options, stdout: true, stderr: true });
  worker.stdout.on('data', (chunk: Buffer) => process.stdout.write(chunk));
  worker.stderr.on('data', (chunk: Buffer) => process.stderr.write(chunk));
  return worker;
}

/** `values` in a SharedArrayBuffer (itself when it already is), for threads to read. */
export function shared(values: Float64Array): Float64Array {
  if (values.buffer instanceof SharedArrayBuffer) return values;
  const copy = new Float64Array(new SharedArrayBuffer(values.byteLength));
  copy.set(values);
  return copy;
}

/**
 * Worker threads that run the jobs they are sent (`{ id, job }`, answered by `{ id }` or `{ id, error }`:
 * serveJobs) alongside the calling thread, every thread claiming work from the job's shared counter.
 */
export class ThreadTeam {
  readonly threads: number;
  private readonly workers: Worker[] = [];
  private nextId = 0;
  private readonly pending = new Map<
    number,
    { left: number; resolve: () => void; reject: (e: Error) => void }
  >();

  constructor(threads: number, script: URL) {
    if (!Number.isInteger(threads) || threads < 1) {
      throw inputError(`the thread count must be a whole number ≥ 1, got ${threads}`);
    }
    this.threads = threads;
    for (let i = 1; i < threads; i++) {
      const worker = startWorker(script);
      worker.on('message', (message: { id: number; error?: string }) => this.settle(message));
      worker.on('error', (error) => {
        for (const entry of this.pending.values()) entry.reject(error);
        this.pending.clear();
      });
      this.workers.push(worker);
    }
  }

  private settle(message: { id: number; error?: string }): void {
    const entry = this.pending.get(message.id);
    if (entry === undefined) return;
    const failed = message.error !== undefined;
    if (!failed && --entry.left > 0) return;
    this.pending.delete(message.id);
    if (failed) entry.reject(new QuakesweepError('internal', `worker thread: ${message.error}`));
    else entry.resolve();
  }

  /** Send `job` to every worker, run `here` on this thread meanwhile, and wait for them all. */
  async run(job: unknown, here: () => void): Promise<void> {
    const id = this.nextId++;
    const done = new Promise<void>((resolve, reject) => {
      if (this.workers.length === 0) resolve();
      else this.pending.set(id, { left: this.workers.length, resolve, reject });
    });
    for (const worker of this.workers) worker.postMessage({ id, job });
    try {
      here();
    } finally {
      await done;
    }
  }

  async close(): Promise<void> {
    await Promise.all(this.workers.map((worker) => worker.terminate()));
    this.workers.length = 0;
  }
}

/** The worker side of a ThreadTeam: run every job sent, answering `{ id }` or `{ id, error }`. */
export function serveJobs<Job>(run: (job: Job) => void): void {
  parentPort?.on('message', ({ id, job }: { id: number; job: Job }) => {
    try {
      run(job);
      parentPort?.postMessage({ id });
    } catch (error) {
      parentPort?.postMessage({ id, error: error instanceof Error ? error.message : String(error) });
    }
  });
}
