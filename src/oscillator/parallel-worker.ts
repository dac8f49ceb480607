// A sweep worker thread (see SweepPool in parallel.ts): for each job it is sent, it plans the same
// sweep, claims groups from the shared counter until none is left, and says so.
import { parentPort } from 'node:worker_threads';
import { runClaimedGroups, type SharedSweepJob } from './parallel.js';
import { planSweep } from './sweep.js';

parentPort?.on('message', ({ id, job }: { id: number; job: SharedSweepJob }) => {
  try {
    runClaimedGroups(job, planSweep(job.accelMS2, job.dtS, job.options));
    parentPort?.postMessage({ id });
  } catch (error) {
    parentPort?.postMessage({ id, error: error instanceof Error ? error.message : String(error) });
  }
});
