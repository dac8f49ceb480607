import {
  existsSync,
  mkdirSync,
  mkdtempSync,
  readdirSync,
  readFileSync,
  rmSync,
  writeFileSync,
} from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { type CliResult, runMainIn } from '../../helpers/run-cli.js';

// quakesweep batch and merge in-process (the worker threads run dist/) on small invented records
// (decaying sines), coarse grid, in the folder of the records as a person would run them.
const folder = mkdtempSync(join(tmpdir(), 'quakesweep-batch-'));
const inputs = join(folder, 'in');
const grid = [
  '--units',
  'g',
  '--dt',
  '0.01',
  '--periods',
  '0,0.05,0.1,0.2,0.3,0.5,0.8,1.2,2,3',
  '--damping',
  '5%,10%',
];

/** main(args) in the test folder, with `env` added to the environment for the run. */
async function run(args: string[], env: Record<string, string> = {}): Promise<CliResult> {
  const saved = Object.keys(env).map((key) => [key, process.env[key]] as const);
  Object.assign(process.env, env);
  try {
    return await runMainIn(folder, args);
  } finally {
    for (const [key, value] of saved) {
      if (value === undefined) delete process.env[key];
      else process.env[key] = value;
    }
  }
}

function record(name: string, frequencyHz: number): void {
  const lines = Array.from({ length: 600 }, (_, i) =>
    (0.2 * Math.exp(-i / 300) * Math.sin(2 * Math.PI * frequencyHz * i * 0.01)).toFixed(6),
  );
  writeFileSync(join(inputs, name), `${lines.join('\n')}\n`);
}

beforeAll(() => {
  mkdirSync(inputs);
  for (let k = 1; k <= 5; k++) record(`rec${k}.txt`, 0.7 * k);
  writeFileSync(join(inputs, 'broken.txt'), '0.1\nnot-a-number\n0.2\n');
});
afterAll(() => rmSync(folder, { recursive: true, force: true }));

describe('quakesweep batch', () => {
  it('finishes the good records past a broken one, lists it, and exits 1', async () => {
    const result = await run(['batch', 'in/*.txt', ...grid, '--jobs', '2', '--out', 'single']);
    expect(result.code).toBe(1);
    expect(result.stderr).toMatch(/failed: .*broken\.txt:2/);
    expect(result.stderr).not.toMatch(/\n\s+at /); // no stack trace
    const suite = JSON.parse(readFileSync(join(folder, 'single', 'suite.json'), 'utf8'));
    expect(suite.records).toEqual(['rec1', 'rec2', 'rec3', 'rec4', 'rec5']);
    expect(suite.failed).toHaveLength(1);
    expect(suite.failed[0].file).toBe(join('in', 'broken.txt'));
    expect(suite.spectra.map((s: { damping: number }) => s.damping)).toEqual([0.05, 0.1]);
    for (const name of suite.records)
      expect(existsSync(join(folder, 'single', name, 'spectra.json'))).toBe(true);
    // The suite mean at T = 0 is the mean of the records' PGA (closed form: PSA(0) = PGA).
    const pgas = suite.records.map(
      (name: string) =>
        JSON.parse(readFileSync(join(folder, 'single', name, 'spectra.json'), 'utf8')).record.pga_g,
    );
    const mean = pgas.reduce((a: number, b: number) => a + b, 0) / pgas.length;
    expect(suite.spectra[0].mean_psa_g[0]).toBeCloseTo(mean, 12);
  });

  it('three shards merged give the same suite.json byte for byte (Slurm and Kubernetes variables too)', async () => {
    await run(['batch', 'in/*.txt', ...grid, '--jobs', '1', '--out', 'single1']);
    const one = await run(['batch', 'in/*.txt', ...grid, '--shard', '1/3', '--out', 'shards-a']);
    expect(one.code).toBe(1); // broken.txt sorts first, into shard 1
    expect(one.stderr).toMatch(/broken\.txt/);
    await run(['batch', 'in/*.txt', ...grid, '--shard', 'auto', '--out', 'shards-b'], {
      SLURM_ARRAY_TASK_ID: '2',
      SLURM_ARRAY_TASK_MIN: '1',
      SLURM_ARRAY_TASK_MAX: '3',
    });
    await run(['batch', 'in/*.txt', ...grid, '--shard', 'auto', '--shard-count', '3', '--out', 'shards-b'], {
      JOB_COMPLETION_INDEX: '2',
    });
    expect(readdirSync(join(folder, 'shards-b')).filter((f) => f.startsWith('shard-'))).toHaveLength(2);
    const merged = await run(['merge', 'shards-a', 'shards-b', '--out', 'merged']);
    expect(merged.code).toBe(0);
    const single = readFileSync(join(folder, 'single1', 'suite.json'), 'utf8');
    expect(readFileSync(join(folder, 'merged', 'suite.json'), 'utf8')).toBe(single);
    expect(readFileSync(join(folder, 'single', 'suite.json'), 'utf8')).toBe(single); // 2 workers = 1
    expect(readFileSync(join(folder, 'merged', 'rec4', 'spectra.json'), 'utf8')).toBe(
      readFileSync(join(folder, 'single1', 'rec4', 'spectra.json'), 'utf8'),
    );
    const missing = await run(['merge', 'shards-b', '--out', 'merged2']);
    expect(missing.code).toBe(2);
    expect(missing.stderr).toMatch(/shard 1 of 3 missing/);
  });

  it('never writes outside DIR whatever the record is called', async () => {
    const evil = join(folder, 'evil');
    mkdirSync(join(evil, 'sub'), { recursive: true });
    for (const name of ['..csv', '...txt', '.hidden.txt', 'suite.json.txt', 'a\\..\\b.txt']) {
      writeFileSync(join(evil, 'sub', name), readFileSync(join(inputs, 'rec1.txt')));
    }
    const files = readdirSync(join(evil, 'sub')).map((f) => join('evil', 'sub', f));
    const before = readdirSync(evil).sort();
    const result = await run(['batch', ...files, ...grid, '--out', join('evil', 'out')]);
    expect(result.code).toBe(0);
    expect(readdirSync(evil).sort()).toEqual([...before, 'out'].sort());
    const out = readdirSync(join(evil, 'out'));
    expect(out).toContain('suite.json');
    for (const name of out)
      expect(name.startsWith('.') || name.includes('..') || /[/\\]/.test(name)).toBe(false);
    expect(out).toHaveLength(files.length + 1);
  });
});
