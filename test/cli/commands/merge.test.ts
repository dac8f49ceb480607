import { cpSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import { useCliFolder } from '../../helpers/cli-folder.js';
import { expectOneLineFailure } from '../../helpers/run-cli.js';

// quakesweep merge on the shards of a batch of three invented records (windowed sines); the
// batch's worker threads run dist/.
const folder = useCliFolder('quakesweep-merge-', (f) => {
  for (const [name, hz] of [
    ['a.txt', 0.8],
    ['b.txt', 1.6],
    ['c.txt', 3.1],
  ] as const)
    f.writeWindowedSine(name, hz);
});
const grid = ['--units', 'g', '--dt', '0.01', '--periods', '0,0.1,0.3,1', '--damping', '5%'];
const batch = (...args: string[]) =>
  folder.run('batch', 'a.txt', 'b.txt', 'c.txt', ...grid, '--jobs', '1', ...args);
const read = (...path: string[]) => readFileSync(join(folder.path, ...path), 'utf8');

beforeAll(async () => {
  for (const result of [
    await batch('--out', 'whole'),
    await batch('--shard', '1/2', '--out', 's1'),
    await batch('--shard', '2/2', '--out', 's2'),
    await batch('--shard', '2/3', '--out', 'thirds'),
  ])
    expect(result.code).toBe(0);
});

describe('quakesweep merge', () => {
  it('two shards merged give the unsharded suite.json and record folders byte for byte', async () => {
    const merged = await folder.run('merge', 's1', 's2', '--out', 'merged');
    expect(merged.code).toBe(0);
    expect(merged.stderr).toMatch(/merged 2 shards: 3 records, 0 failed/);
    expect(read('merged', 'suite.json')).toBe(read('whole', 'suite.json'));
    // The suite table and figure too (the report differs only in the command line it quotes).
    expect(read('merged', 'suite.csv')).toBe(read('whole', 'suite.csv'));
    expect(read('merged', 'suite.svg')).toBe(read('whole', 'suite.svg'));
    expect(read('merged', 'suite.html')).toContain('quakesweep merge s1 s2 --out merged');
    for (const name of ['a', 'b', 'c'])
      expect(read('merged', name, 'spectra.json')).toBe(read('whole', name, 'spectra.json'));
  });

  it('carries the warnings into the merged suite: a damping above 1000% and each record’s own', async () => {
    // A fourth invented record whose PGA (8 g read in g) the reader warns of (PGA > 5 g, common practice).
    writeFileSync(
      join(folder.path, 'loud.txt'),
      Array.from({ length: 300 }, (_, i) => 8 * Math.sin(i / 5)).join('\n'),
    );
    const heavy = ['loud.txt', 'a.txt', ...grid, '--damping', '5%,2000%', '--jobs', '1'];
    for (const args of [
      ['--out', 'hw'],
      ['--shard', '1/2', '--out', 'h1'],
      ['--shard', '2/2', '--out', 'h2'],
    ])
      expect((await folder.run('batch', ...heavy, ...args)).code).toBe(0);
    expect((await folder.run('merge', 'h1', 'h2', '--out', 'hm')).code).toBe(0);
    expect(read('hm', 'suite.json')).toBe(read('hw', 'suite.json'));
    const warnings: string[] = JSON.parse(read('hm', 'suite.json')).warnings;
    expect(warnings[0]).toMatch(/^damping 2000% is above 1000%/);
    expect(warnings.some((w) => /^loud: PGA 8(\.\d+)? g read in g is above 5 g/.test(w))).toBe(true);
    expect(read('hm', 'suite.html')).toContain('class="warnings"');
  });

  it('scales and checks a sharded suite at the merge as one batch run does, byte for byte', async () => {
    // The target, scaling and check options of batch, given to merge instead (ASCE/SEI 7-16 §11.4.6 form).
    const suite = ['--target', 'asce7-16:sds=1.0,sd1=0.6,tl=8', '--scale-each', '--structure-period', '0.5'];
    expect((await batch(...suite, '--out', 'tw')).code).toBe(0);
    const merged = await folder.run('merge', 's1', 's2', '--out', 'tm', ...suite);
    expect(merged.code).toBe(0);
    expect(merged.stderr).toMatch(
      /merged 2 shards: 3 records, 0 failed; suite check (PASS|FAIL) \(least mean\/target/,
    );
    for (const name of ['suite.json', 'suite.csv', 'suite.svg'])
      expect(read('tm', name)).toBe(read('tw', name));
    expect(JSON.parse(read('tm', 'suite.json')).scaling.records).toHaveLength(3);
    // batch --shard points there; the scaling options need the target; a target is never overwritten.
    expect(expectOneLineFailure(await batch('--shard', '1/2', ...suite, '--out', 'x1'))).toMatch(
      /--target does not go with --shard: give it .* to `quakesweep merge`/,
    );
    expect(
      expectOneLineFailure(await folder.run('merge', 's1', 's2', '--out', 'x2', '--scale-each')),
    ).toMatch(/--scale-each needs --target/);
    writeFileSync(join(folder.path, 'tm', 'suite.csv'), 'period_s,psa_g\n0.1,1\n1,0.5\n');
    expect(
      expectOneLineFailure(await folder.run('merge', 's1', 's2', '--out', 'tm', '--target', 'tm/suite.csv')),
    ).toMatch(/refusing to overwrite the input tm\/suite\.csv/);
    expect(read('tm', 'suite.csv')).toBe('period_s,psa_g\n0.1,1\n1,0.5\n');
  });

  it('merges into one of the shard folders, copying only the other shard’s records', async () => {
    cpSync(join(folder.path, 's1'), join(folder.path, 'into'), { recursive: true });
    expect((await folder.run('merge', 'into', 's2', '--out', 'into')).code).toBe(0);
    expect(read('into', 'suite.json')).toBe(read('whole', 'suite.json'));
  });

  it('refuses shards that do not make one whole run, with exit 2 and one line', async () => {
    const refusal = async (...args: string[]) => expectOneLineFailure(await folder.run('merge', ...args));
    expect(await refusal('s1', '--out', 'm1')).toMatch(/shard 2 of 2 missing/);
    expect(await refusal('s1', 's1', '--out', 'm2')).toMatch(/shard 1 of 2 is also in/);
    expect(await refusal('s1', 'thirds', '--out', 'm3')).toMatch(/is shard 2 of 3, others are of 2/);
    expect(await refusal('nowhere', '--out', 'm4')).toMatch(/nowhere: no such folder/);
    expect(await refusal('whole', '--out', 'm5')).toMatch(/no shard-i-of-N\.json in whole/);
  });

  it('refuses a shard run with other options, a damaged summary and an unsafe record name', async () => {
    const other = await folder.run(
      'batch',
      'a.txt',
      'b.txt',
      'c.txt',
      ...grid,
      '--damping',
      '2%',
      '--shard',
      '2/2',
      '--out',
      'other',
    );
    expect(other.code).toBe(0);
    const refusal = async (...args: string[]) => expectOneLineFailure(await folder.run('merge', ...args));
    expect(await refusal('s1', 'other', '--out', 'm6')).toMatch(
      /was run with other reading, processing or grid options/,
    );
    cpSync(join(folder.path, 's2'), join(folder.path, 'bad'), { recursive: true });
    writeFileSync(join(folder.path, 'bad', 'shard-2-of-2.json'), '{ not json');
    expect(await refusal('s1', 'bad', '--out', 'm7')).toMatch(/shard-2-of-2\.json: not valid JSON/);
    const shard = JSON.parse(read('s2', 'shard-2-of-2.json'));
    shard.records[0].name = '../escape';
    writeFileSync(join(folder.path, 'bad', 'shard-2-of-2.json'), JSON.stringify(shard));
    expect(await refusal('s1', 'bad', '--out', 'm8')).toMatch(
      /record name "\.\.\/escape" is not a safe folder name/,
    );
  });

  it('refuses edited shards: zero, non-numeric or huge counts, bad PSA, a record twice, numbers unlike the copied spectra', async () => {
    const refusal = async (...args: string[]) => expectOneLineFailure(await folder.run('merge', ...args));
    // biome-ignore lint/suspicious/noExplicitAny: the summaries are edited as loose JSON on purpose
    type Loose = any;
    const edited = async (name: string, edit: (shard: Loose) => void, spectra?: (s: Loose) => void) => {
      cpSync(join(folder.path, 's2'), join(folder.path, name), { recursive: true });
      const shard = JSON.parse(read('s2', 'shard-2-of-2.json'));
      edit(shard);
      writeFileSync(join(folder.path, name, 'shard-2-of-2.json'), JSON.stringify(shard));
      if (spectra !== undefined) {
        const record = shard.records[0].name;
        const json = JSON.parse(read('s2', record, 'spectra.json'));
        spectra(json);
        writeFileSync(join(folder.path, name, record, 'spectra.json'), JSON.stringify(json));
      }
      return refusal('s1', name, '--out', `${name}-out`);
    };
    expect(await edited('e1', (s) => (s.shard.count = 0))).toMatch(
      /"shard\.count" must be a whole number from 1 to 100000, got 0/,
    );
    expect(await edited('e2', (s) => (s.shard.count = 'two'))).toMatch(
      /"shard\.count" must be a whole number/,
    );
    // count 1e9 once aborted V8 (an array of a billion shard numbers): refused first.
    expect(await edited('e3', (s) => (s.shard.count = 1e9))).toMatch(/got 1000000000/);
    expect(await edited('e4', (s) => (s.records[0].psaG[0][1] = -1))).toMatch(
      /"psaG" must be 1 × 4 finite numbers ≥ 0/,
    );
    // The first shard's record listed again in the second: not among the second shard's files.
    const first = JSON.parse(read('s1', 'shard-1-of-2.json')).records[0];
    expect(await edited('e5', (s) => s.records.push(first))).toMatch(
      /is not one of the files of shard 2 of 2/,
    );
    expect(await edited('e6', (s) => (s.records[0].psaG[0][2] *= 2))).toMatch(
      /spectra\.json: says PSA .* g at T = 0\.3 s, ζ = 0\.05, where the shard summary says/,
    );
    expect(
      await edited(
        'e7',
        () => {},
        (j) => (j.spectra[0].psa_g[1] *= 1.01),
      ),
    ).toMatch(/says PSA .* at T = 0\.1 s/);
  });
});
