// A RotD worker thread (see RotDPool in rotd.ts): for each job it is sent, it claims (damping,
// period) cells from the shared counter until none is left, and says so.
import { serveJobs } from '../oscillator/parallel.js';
import { runClaimedRotD } from './rotd.js';

serveJobs(runClaimedRotD);
