import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { processRecord, type RecordTask, type SuiteSettings } from '../../src/batch/work.js';
import type { BatchWorkerMessage } from '../../src/threads/batch-pool.js';
import { startWorker, workerScript } from '../../src/threads/team.js';

// The batch worker (dist/, built by the global setup) started on its own: it must claim every
// record of the shared counter once, post each outcome as processRecord gives it here, and then
// say it has finished. Records: invented decaying sines, and one broken file.
const folder = mkdtempSync(join(tmpdir(), 'quakesweep-batch-worker-'));
afterAll(() => rmSync(folder, { recursive: true, force: true }));
const settings: SuiteSettings = {
  read: { units: 'g', dtS: 0.01, layout: 'auto', skip: 0 },
  plan: {},
  periodsS: [0, 0.2, 1],
  dampings: [0.05],
  method: 'newmark-average',
};
const files = [1, 2, 3].map((k) => {
  const file = join(folder, `r${k}.txt`);
  const rows = Array.from({ length: 300 }, (_, i) =>
    (0.1 * k * Math.exp(-i / 150) * Math.sin(0.3 * k * i)).toFixed(6),
  );
  writeFileSync(file, `${rows.join('\n')}\n`);
  return file;
});
writeFileSync(join(folder, 'broken.txt'), '0.1\nnot-a-number\n');
files.push(join(folder, 'broken.txt'));
const tasks = (out: string): RecordTask[] =>
  files.map((file, i) => ({ file, name: `rec-${i}`, outDir: join(folder, out), settings }));

describe('the batch worker', () => {
  it('claims every record once, posts its outcome, then finishes', async () => {
    const counter = new Int32Array(new SharedArrayBuffer(4));
    const worker = startWorker(workerScript('batch-worker.js'), {
      workerData: { tasks: tasks('worker'), counter },
    });
    const messages: BatchWorkerMessage[] = [];
    worker.on('message', (message: BatchWorkerMessage) => messages.push(message));
    await new Promise((resolve) => worker.on('exit', resolve));
    expect(messages.at(-1)).toEqual({ finished: true });
    const posted = messages.slice(0, -1) as { index: number; outcome: unknown }[];
    expect(posted.map((m) => m.index)).toEqual([0, 1, 2, 3]);
    expect(counter[0]).toBeGreaterThanOrEqual(files.length);
    tasks('here').forEach((task, i) => {
      expect(posted[i].outcome).toEqual(processRecord(task));
    });
    // The outcomes (spectra.json text included) are equal; nothing is written by a worker.
  });
});
