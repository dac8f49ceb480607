// A batch worker thread (runTasks in batch-pool.ts): claims records, posts each outcome, then `finished`.
import { parentPort, workerData } from 'node:worker_threads';
import { claimRecords } from '../batch/work.js';
import type { BatchWorkerData, BatchWorkerMessage } from './batch-pool.js';

const { tasks, counter } = workerData as BatchWorkerData;
const post = (message: BatchWorkerMessage) => parentPort?.postMessage(message);
// No top-level await: the CLI bundles this script as CommonJS (scripts/build-cli.mjs).
void claimRecords(tasks, counter, (index, outcome) => post({ index, outcome })).then(() =>
  post({ finished: true }),
);
