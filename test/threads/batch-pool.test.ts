import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import {
  processRecord,
  type RecordOutcome,
  type RecordTask,
  type SuiteSettings,
} from '../../src/batch/work.js';
import { runTasks } from '../../src/threads/batch-pool.js';

// runTasks on several threads against one: the same outcomes in the same order, each reported once.
// Records: invented decaying sines; one file is broken on purpose.

const folder = mkdtempSync(join(tmpdir(), 'quakesweep-pool-'));
const settings: SuiteSettings = {
  read: { units: 'g', dtS: 0.01, layout: 'auto', skip: 0 },
  plan: {},
  periodsS: [0, 0.1, 0.3, 1, 3],
  dampings: [0.05],
  method: 'newmark-average',
};
const files: string[] = [];

beforeAll(() => {
  mkdirSync(join(folder, 'in'));
  for (let k = 1; k <= 9; k++) {
    const lines = Array.from({ length: 400 }, (_, i) =>
      (0.1 * k * Math.exp(-i / 200) * Math.sin(2 * Math.PI * 0.9 * k * i * 0.01)).toFixed(6),
    );
    const file = join(folder, 'in', `r${k}.txt`);
    writeFileSync(file, `${lines.join('\n')}\n`);
    files.push(file);
  }
  const broken = join(folder, 'in', 'broken.txt');
  writeFileSync(broken, '0.1\nnot-a-number\n0.2\n');
  files.splice(4, 0, broken);
});
afterAll(() => rmSync(folder, { recursive: true, force: true }));

const tasks = (out: string): RecordTask[] =>
  files.map((file, i) => ({ file, name: `rec-${i}`, outDir: join(folder, out), settings }));

describe('runTasks', () => {
  it('gives every outcome once, in the order of the tasks, whatever thread ran it', async () => {
    const one: RecordOutcome[] = [];
    const alone = await runTasks(tasks('one'), 1, (o) => one.push(o));
    const three: RecordOutcome[] = [];
    // This thread sleeps 40 ms a record, so that the two workers (started meanwhile) take some.
    let here = 0;
    const slow = (task: RecordTask) => {
      here++;
      Atomics.wait(new Int32Array(new SharedArrayBuffer(4)), 0, 0, 40);
      return processRecord(task);
    };
    const shared = await runTasks(tasks('three'), 3, (o) => three.push(o), slow);
    expect(here).toBeGreaterThan(0);
    expect(here).toBeLessThan(files.length);
    expect(shared).toEqual(alone);
    expect(three).toHaveLength(files.length);
    expect(new Set(three.map((o) => o.name))).toEqual(new Set(alone.map((o) => o.name)));
    expect(alone.filter((o) => !o.ok).map((o) => o.name)).toEqual(['rec-4']);
    expect(alone[4].ok ? '' : alone[4].error).toMatch(/broken\.txt:2/);
    // The spectra.json text comes back in the outcome (the command writes it); the same on any thread.
    const byName = new Map(three.map((o) => [o.name, o]));
    for (const o of alone.filter((x) => x.ok))
      expect((byName.get(o.name) as { spectra: string }).spectra).toBe(o.spectra);
  });

  it('runs on this thread alone with one job or one task', async () => {
    const single = await runTasks(tasks('single').slice(0, 1), 4);
    expect(single).toHaveLength(1);
    expect(single[0].ok).toBe(true);
  });
});
