// A RotD worker thread (see rotDSpectraParallel in rotd.ts): computes the curves of the periods it
// is given and sends them back.
import { parentPort, workerData } from 'node:worker_threads';
import { type RotDWork, rotDCurves } from './rotd.js';

try {
  parentPort?.postMessage({ curves: rotDCurves(workerData as RotDWork) });
} catch (error) {
  parentPort?.postMessage({ error: error instanceof Error ? error.message : String(error) });
}
