// A batch worker thread (see runTasks in pool.ts): it claims records from the shared counter until
// none is left, posting each one's outcome as it finishes it, then says it has finished and ends.
import { parentPort, workerData } from 'node:worker_threads';
import type { BatchWorkerData, BatchWorkerMessage } from './pool.js';
import { processRecord } from './work.js';

const { tasks, counter } = workerData as BatchWorkerData;
const post = (message: BatchWorkerMessage) => parentPort?.postMessage(message);
for (;;) {
  const index = Atomics.add(counter, 0, 1);
  if (index >= tasks.length) break;
  post({ index, outcome: processRecord(tasks[index]) });
}
post({ finished: true });
