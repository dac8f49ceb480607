// The worker thread of SweepPool and RotDPool: for each job it is sent (a sweep's groups, or RotD's
// cells), it claims work from the job's shared counter until none is left, and says so.

import { prepareWasmKernel } from '../oscillator/kernels/wasm.js';
import { type RotDJob, runRotDCells } from '../spectrum/rotd.js';
import { runClaimedGroups, type SharedSweepJob } from './sweep-pool.js';
import { serveJobs } from './team.js';

serveJobs((job: SharedSweepJob | RotDJob) => ('plan' in job ? runClaimedGroups(job) : runRotDCells(job)));
// The kernel's instance is made while the first job is on its way.
prepareWasmKernel();
