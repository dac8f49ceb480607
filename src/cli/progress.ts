import type { RecordOutcome, RecordTask } from '../batch/work.js';

/**
 * Run the records on `jobs` threads, with a progress bar on a terminal's standard error. The pool
 * and the bar are loaded here, not at start-up, so other commands do not pay for them.
 */
export async function runWithProgress(tasks: RecordTask[], jobs: number): Promise<RecordOutcome[]> {
  const { runTasks } = await import('../threads/batch-pool.js');
  const { SingleBar } = process.stderr.isTTY ? await import('cli-progress') : { SingleBar: undefined };
  const bar = SingleBar
    ? new SingleBar({
        stream: process.stderr,
        format: 'quakesweep batch [{bar}] {value}/{total} records, {eta}s left',
      })
    : null;
  bar?.start(tasks.length, 0);
  try {
    return await runTasks(tasks, jobs, () => bar?.increment());
  } finally {
    bar?.stop();
  }
}
