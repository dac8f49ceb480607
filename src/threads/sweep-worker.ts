// A sweep worker thread (see SweepPool in sweep-pool.ts): for each job it is sent, it claims groups
// from the shared counter until none is left, and says so.

import { prepareWasmKernel } from '../oscillator/kernels/wasm.js';
import { runClaimedGroups } from './sweep-pool.js';
import { serveJobs } from './team.js';

serveJobs(runClaimedGroups);
// The kernel's instance is made while the first job is on its way.
prepareWasmKernel();
