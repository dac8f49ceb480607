// The worker thread of DuctilityPool: claims a job's (damping, period) cells until none is left.
import { type DuctilityJob, runDuctilityCells } from './ductility-pool.js';
import { serveJobs } from './team.js';

serveJobs((job: DuctilityJob) => runDuctilityCells(job));
