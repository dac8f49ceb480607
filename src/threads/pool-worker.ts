// The worker thread of SweepPool and RotDPool: claims a job's groups or cells until none is left.
import { prepareWasmKernel } from '../oscillator/kernels/wasm.js';
import { type RotDJob, runRotDCells } from '../spectrum/rotd.js';
import { runClaimedGroups, type SharedSweepJob } from './sweep-pool.js';
import { serveJobs } from './team.js';

serveJobs((job: SharedSweepJob | RotDJob) => ('plan' in job ? runClaimedGroups(job) : runRotDCells(job)));
// The kernel's instance is made while the first job is on its way.
prepareWasmKernel();
