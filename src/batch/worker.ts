import { processRecord, type RecordOutcome, type RecordTask } from './work.js';

/** The worker-thread entry of the batch pool (piscina calls the default export once a task). */
export default function run(task: RecordTask): RecordOutcome {
  return processRecord(task);
}
