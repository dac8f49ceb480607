import {
  existsSync,
  mkdirSync,
  mkdtempSync,
  readdirSync,
  readFileSync,
  rmSync,
  symlinkSync,
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

  it('sweeps one file once however it is named (//, .., a pattern and its name), and says so', async () => {
    const result = await run([
      'batch',
      'in//rec1.txt',
      'in/../in/rec1.txt',
      'in/rec?.txt',
      ...grid,
      '--jobs',
      '1',
      '--out',
      'twice',
    ]);
    expect(result.code).toBe(0);
    expect(result.stderr).toMatch(/is the same file as .*rec1\.txt; swept once/);
    const suite = JSON.parse(readFileSync(join(folder, 'twice', 'suite.json'), 'utf8'));
    expect(suite.records).toEqual(['rec1', 'rec2', 'rec3', 'rec4', 'rec5']);
  });

  it('sweeps a record and a symlink to it once, and keeps outputs off a linked input', async () => {
    const linked = join(folder, 'linked');
    mkdirSync(linked);
    symlinkSync(join(inputs, 'rec2.txt'), join(linked, 'alias.txt'));
    const result = await run([
      'batch',
      'in/rec2.txt',
      'linked/alias.txt',
      ...grid,
      '--jobs',
      '1',
      '--out',
      'links',
    ]);
    expect(result.code).toBe(0);
    expect(result.stderr).toMatch(/alias\.txt is the same file as .*rec2\.txt; swept once/);
    expect(JSON.parse(readFileSync(join(folder, 'links', 'suite.json'), 'utf8')).records).toEqual(['rec2']);
    // A link planted where an output goes (links2/rec2/spectra.json → the input) is refused, the input intact.
    mkdirSync(join(folder, 'links2', 'rec2'), { recursive: true });
    const before = readFileSync(join(inputs, 'rec2.txt'), 'utf8');
    symlinkSync(join(inputs, 'rec2.txt'), join(folder, 'links2', 'rec2', 'spectra.json'));
    const refused = await run(['batch', 'in/rec2.txt', ...grid, '--jobs', '1', '--out', 'links2']);
    expect(refused.code).toBe(2);
    expect(refused.stderr).toMatch(/refusing to overwrite the input .*rec2\.txt/);
    expect(readFileSync(join(inputs, 'rec2.txt'), 'utf8')).toBe(before);
    expect(existsSync(join(folder, 'links2', 'suite.json'))).toBe(false);
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

  it('--scale-each: each record scaled to the target, the suite checked, suite.csv, .svg and .html beside suite.json', async () => {
    const target = 'asce7-16:sds=1.0,sd1=0.6,tl=8';
    const args = ['batch', 'in/rec*.txt', ...grid, '--target', target, '--scale-each'];
    const result = await run([...args, '--structure-period', '0.5', '--threads', '2', '--out', 'scaled']);
    expect(result.code).toBe(0);
    expect(result.stderr).toContain('Preliminary engineering aid only.');
    expect(result.stderr).toMatch(
      /quakesweep: 5 of 5 records done; suite check (PASS|FAIL) \(least mean\/target [\d.]+ at [\d.]+ s, needs 0\.9; preliminary\); scaled\/suite\.json\n/,
    );
    expect(result.stderr).toMatch(/warning: suite check: only 5 grid periods in the check range/);
    const out = join(folder, 'scaled');
    expect(
      readdirSync(out)
        .filter((f) => f.startsWith('suite'))
        .sort(),
    ).toEqual(['suite.csv', 'suite.html', 'suite.json', 'suite.svg']);
    const suite = JSON.parse(readFileSync(join(out, 'suite.json'), 'utf8'));
    expect(suite.spectra_scaled).toBe(true);
    expect(suite.check.range_s).toEqual([0.1, 1]); // 0.2T–2T, T = 0.5 s
    expect(suite.check.period_count).toBe(5); // 0.1, 0.2, 0.3, 0.5, 0.8 s
    // ASCE/SEI 7-16 §11.4.6, written out here: T0 = 0.2·S_D1/S_DS, T_S = S_D1/S_DS.
    const asce = (t: number) => (t < 0.12 ? 1 * (0.4 + (0.6 * t) / 0.12) : t <= 0.6 ? 1 : 0.6 / t);
    const periods: number[] = suite.periods_s;
    const used = periods.map((t, i) => [t, i]).filter(([t]) => t >= 0.1 && t <= 1);
    const means = periods.map(() => 0);
    for (const [k, name] of suite.records.entries()) {
      const own = JSON.parse(readFileSync(join(out, name, 'spectra.json'), 'utf8'));
      const psa: number[] = own.spectra[0].psa_g; // 5%: the target's damping
      // Least squares in ln PSA: ln c = mean(ln target − ln PSA) over the range (closed form).
      const lnC = used.reduce((sum, [t, i]) => sum + Math.log(asce(t)) - Math.log(psa[i]), 0) / used.length;
      expect(suite.per_record[k].scale_factor).toBeCloseTo(Math.exp(lnC), 10);
      expect(suite.per_record[k].pga_scaled_g).toBeCloseTo(own.record.pga_g * Math.exp(lnC), 10);
      for (const [i] of periods.entries()) means[i] += (Math.exp(lnC) * psa[i]) / suite.records.length;
    }
    for (const [i] of periods.entries()) expect(suite.spectra[0].mean_psa_g[i]).toBeCloseTo(means[i], 10);
    const worst = Math.min(...used.map(([t, i]) => means[i] / asce(t)));
    expect(suite.check.worst_ratio).toBeCloseTo(worst, 10);
    expect(suite.check.result).toBe(worst >= 0.9 ? 'pass' : 'fail');
    const csv = readFileSync(join(out, 'suite.csv'), 'utf8');
    expect(csv).toContain('rec5_psa_g@10%');
    expect(readFileSync(join(out, 'suite.svg'), 'utf8')).toContain('class="check-range"');
    expect(readFileSync(join(out, 'suite.html'), 'utf8')).toContain('Suite check (preliminary)');
  });

  it('takes --jobs, the old name of --threads, without listing it in the help; refuses target options alone', async () => {
    const old = await run(['batch', 'in/rec1.txt', ...grid, '--jobs', '1', '--out', 'old-name']);
    expect(old.code).toBe(0);
    expect(old.stderr).toMatch(/1 of 1 records done; old-name\/suite\.json/);
    const help = await run(['batch', '--help']);
    expect(help.stdout).toContain('--threads <n>');
    expect(help.stdout).not.toContain('--jobs');
    const alone = await run(['batch', 'in/rec1.txt', ...grid, '--scale-each', '--out', 'alone']);
    expect(alone.code).toBe(2);
    expect(alone.stderr).toMatch(/--scale-each needs --target/);
    expect(existsSync(join(folder, 'alone'))).toBe(false);
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
    expect(out).toEqual(expect.arrayContaining(['suite.json', 'suite.csv', 'suite.svg', 'suite.html']));
    for (const name of out)
      expect(name.startsWith('.') || name.includes('..') || /[/\\]/.test(name)).toBe(false);
    expect(out).toHaveLength(files.length + 4);
  });
});
