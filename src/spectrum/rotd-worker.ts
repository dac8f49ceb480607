// A RotD worker thread (see RotDPool in rotd.ts): for each job it is sent, it claims (damping,
// period) cells from the shared counter until none is left, and says so.
import { parentPort } from 'node:worker_threads';
import { runClaimedRotD, type SharedRotDJob } from './rotd.js';

parentPort?.on('message', ({ id, job }: { id: number; job: SharedRotDJob }) => {
  try {
    runClaimedRotD(job);
    parentPort?.postMessage({ id });
  } catch (error) {
    parentPort?.postMessage({ id, error: error instanceof Error ? error.message : String(error) });
  }
});
