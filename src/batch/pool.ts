import { Piscina } from 'piscina';
import { processRecord, type RecordOutcome, type RecordTask } from './work.js';

/**
 * Run the tasks on `jobs` worker threads (piscina), calling `onDone` as each finishes, and give
 * the outcomes back in the order of the tasks. With one job the tasks run here, one after another.
 */
export async function runTasks(
  tasks: readonly RecordTask[],
  jobs: number,
  onDone: (outcome: RecordOutcome) => void = () => {},
): Promise<RecordOutcome[]> {
  if (jobs <= 1 || tasks.length <= 1) {
    return tasks.map((task) => {
      const outcome = processRecord(task);
      onDone(outcome);
      return outcome;
    });
  }
  const pool = new Piscina({
    filename: new URL('./worker.js', import.meta.url).href,
    minThreads: Math.min(jobs, tasks.length),
    maxThreads: Math.min(jobs, tasks.length),
  });
  try {
    return await Promise.all(
      tasks.map(async (task) => {
        const outcome = (await pool.run(task)) as RecordOutcome;
        onDone(outcome);
        return outcome;
      }),
    );
  } finally {
    await pool.destroy();
  }
}
