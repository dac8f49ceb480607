// A RotD worker thread (see RotDPool in rotd-pool.ts): for each job it is sent, it claims (damping,
// period) cells from the shared counter until none is left, and says so.

import { prepareWasmKernel } from '../oscillator/kernels/wasm.js';
import { runRotDCells } from '../spectrum/rotd.js';
import { serveJobs } from './team.js';

serveJobs(runRotDCells);
// The kernel's instance is made while the first job is on its way.
prepareWasmKernel();
