// A sweep worker thread (see SweepPool in parallel.ts): for each job it is sent (a record with the
// calling thread's plan, or many records), it claims groups or whole records from the shared
// counter until none is left, and says so.
import { parentPort } from 'node:worker_threads';
import {
  runClaimedGroups,
  runClaimedRecords,
  type SharedRecordsJob,
  type SharedSweepJob,
} from './parallel.js';

parentPort?.on('message', ({ id, job }: { id: number; job: SharedSweepJob | SharedRecordsJob }) => {
  try {
    if ('kind' in job) runClaimedRecords(job);
    else runClaimedGroups(job, job.plan);
    parentPort?.postMessage({ id });
  } catch (error) {
    parentPort?.postMessage({ id, error: error instanceof Error ? error.message : String(error) });
  }
});
