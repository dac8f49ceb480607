// A sweep worker thread (see SweepPool in sweep-pool.ts): for each job it is sent (a record with
// the calling thread's plan, or many records), it claims groups or whole records from the shared
// counter until none is left, and says so.

import { prepareWasmKernel } from '../oscillator/kernels/wasm.js';
import {
  runClaimedGroups,
  runClaimedRecords,
  type SharedRecordsJob,
  type SharedSweepJob,
} from './sweep-pool.js';
import { serveJobs } from './team.js';

serveJobs((job: SharedSweepJob | SharedRecordsJob) => {
  if ('kind' in job) runClaimedRecords(job);
  else runClaimedGroups(job);
});
// The kernel's instance is made while the first job is on its way.
prepareWasmKernel();
