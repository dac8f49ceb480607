import { QuakesweepError } from '../base/errors.js';
import { claimRecords, processRecord, type RecordOutcome, type RecordTask } from '../batch/work.js';
import { startWorker, workerScript } from './team.js';

/** What each batch worker thread is given: the tasks, and the counter from which records are claimed. */
export interface BatchWorkerData {
  tasks: readonly RecordTask[];
  counter: Int32Array;
}

/** A batch worker's messages: one outcome per record it processed, then that it has finished. */
export type BatchWorkerMessage = { index: number; outcome: RecordOutcome } | { finished: true };

/**
 * Run the tasks on `jobs` threads, this one included, calling `onDone` as each finishes, and give
 * the outcomes back in task order. Every thread claims records from a shared counter, this one at
 * once while the workers start. `here` runs a task on this thread (tests slow it down).
 */
export async function runTasks(
  tasks: readonly RecordTask[],
  jobs: number,
  onDone: (outcome: RecordOutcome) => void = () => {},
  here: (task: RecordTask) => RecordOutcome = processRecord,
): Promise<RecordOutcome[]> {
  const outcomes: RecordOutcome[] = new Array(tasks.length);
  const finish = (index: number, outcome: RecordOutcome) => {
    outcomes[index] = outcome;
    onDone(outcome);
  };
  const data: BatchWorkerData = { tasks, counter: new Int32Array(new SharedArrayBuffer(4)) };
  const script = workerScript('batch-worker.js');
  const threads = Math.max(1, Math.min(jobs, tasks.length));
  const workers = Array.from({ length: threads - 1 }, () => {
    const worker = startWorker(script, { workerData: data });
    return new Promise<void>((resolve, reject) => {
      let finished = false;
      worker.on('message', (message: BatchWorkerMessage) => {
        if ('finished' in message) finished = true;
        else finish(message.index, message.outcome);
      });
      worker.on('error', (error) =>
        reject(new QuakesweepError('internal', `batch worker: ${error.message}`)),
      );
      worker.on('exit', (code) => {
        if (finished) resolve();
        else reject(new QuakesweepError('internal', `a batch worker stopped early (exit code ${code})`));
      });
    });
  });
  // Settle them all even when one fails, so that no worker outlives the batch unawaited.
  const done = Promise.allSettled(workers);
  await claimRecords(tasks, data.counter, finish, here);
  for (const result of await done) if (result.status === 'rejected') throw result.reason;
  return outcomes;
}
