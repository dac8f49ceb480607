// The worker thread of DuctilityPool: claims a job's (damping, period) cells until none is left.
import { type DuctilityJob, runDuctilityCells } from './ductility-job.js';
import { serveJobs } from './team.js';

serveJobs((job: DuctilityJob) => runDuctilityCells(job));
