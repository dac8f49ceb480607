import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import type { RecordTask } from '../../src/batch/work.js';
import { runWithProgress } from '../../src/cli/progress.js';
import { useCliFolder } from '../helpers/cli-folder.js';

const folder = useCliFolder('quakesweep-progress-', (f) => {
  f.writeWindowedSine('a.txt', 1);
  f.writeWindowedSine('b.txt', 2);
});
const settings = {
  read: { units: 'g' as const, dtS: 0.01, skip: 0, layout: 'auto' as const },
  plan: {},
  periodsS: [0, 0.5],
  dampings: [0.05],
  method: 'newmark-average' as const,
};
const tasks = (...names: string[]): RecordTask[] =>
  names.map((name) => ({
    file: join(folder.path, name),
    name: name.replace('.txt', ''),
    outDir: folder.path,
    settings,
  }));

/** runWithProgress with process.stderr's writes captured and its isTTY set to `tty`. */
async function captured(tty: boolean, work: RecordTask[], jobs: number) {
  const stderr = process.stderr as NodeJS.WriteStream & { isTTY: boolean };
  const { write, isTTY } = stderr;
  const written: string[] = [];
  stderr.write = ((chunk: string | Uint8Array) => written.push(String(chunk)) > 0) as typeof stderr.write;
  stderr.isTTY = tty;
  try {
    return { outcomes: await runWithProgress(work, jobs), stderr: written.join('') };
  } finally {
    stderr.write = write;
    stderr.isTTY = isTTY;
  }
}

describe('runWithProgress', () => {
  it('gives one outcome per record, in the order given, and each record’s spectra.json text', async () => {
    const { outcomes, stderr } = await captured(false, tasks('b.txt', 'missing.txt', 'a.txt'), 1);
    expect(outcomes.map((o) => [o.name, o.ok])).toEqual([
      ['b', true],
      ['missing', false],
      ['a', true],
    ]);
    const failed = outcomes[1];
    expect(failed.ok ? '' : failed.error).toMatch(/missing\.txt: no such file/);
    const a = outcomes[2];
    const spectra = JSON.parse(a.ok ? a.spectra : '{}'); // the command writes it, with the suite
    expect(spectra.spectra[0].psa_g[0]).toBeCloseTo(spectra.record.pga_g, 12); // PSA(T = 0) = PGA, closed form
    expect(stderr).toBe(''); // no bar when standard error is not a terminal
  });

  it('draws a bar of records done on a terminal', async () => {
    const { outcomes, stderr } = await captured(true, tasks('a.txt', 'b.txt'), 1);
    expect(outcomes.every((o) => o.ok)).toBe(true);
    expect(stderr).toMatch(/quakesweep batch \[.*\] 2\/2 records/);
  });
});
