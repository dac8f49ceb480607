/**
 * Property tests of `quakesweep merge` on damaged shards (issue 21 item 4 and its own cases): a real
 * batch of three invented records (windowed sines) is run once as shards 1/2 and 2/2; each case
 * copies them, applies one or two mutations (counts 0, -1, 1e9, 'x', fractional; a record in both
 * shards; a number edited in a summary or in a copied spectra.json; files removed or added; JSON
 * truncated; NaN/Infinity; other settings in one shard; periods unsorted everywhere; …) and merges,
 * sometimes over an older set of outputs, sometimes into a shard folder. Either
 * - the merge succeeds and its suite.json, suite.csv and record spectra are byte for byte those of
 *   the unmutated merge (the mutation was harmless), or
 * - it exits 2 with one line on stderr naming the damaged file (or the missing shard), no stack
 *   trace, and the output folder is as it was (absent, or the old set kept), no `.qs-` temporary.
 * In-process through main(), and a capped share as child processes (no V8 abort, no hang).
 */
import { cpSync, existsSync, mkdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import fc from 'fast-check';
import { beforeAll, describe, expect, it } from 'vitest';
import { useCliFolder } from '../helpers/cli-folder.js';
import { FUZZ_SEED, report, runs } from '../helpers/fuzz-budget.js';
import { filesUnder, runBoundedChild, temporaryAmong, V8_ABORT } from '../helpers/fuzz-outputs.js';
import { type CliResult, expectOneLineFailure, runMainIn } from '../helpers/run-cli.js';

const folder = useCliFolder('quakesweep-fuzz-merge-', (f) => {
  for (const [name, hz] of [
    ['a.txt', 0.8],
    ['b.txt', 1.6],
    ['c.txt', 3.1],
  ] as const)
    f.writeWindowedSine(name, hz);
});
const GRID = [
  '--units',
  'g',
  '--dt',
  '0.01',
  '--periods',
  '0,0.1,0.3,1',
  '--damping',
  '2%,5%',
  '--jobs',
  '1',
];
const SHARD_FILE = { 1: 'shard-1-of-2.json', 2: 'shard-2-of-2.json' } as const;
/** The unmutated merge: suite files and record spectra, relative path → text. */
const reference = new Map<string, string>();

beforeAll(async () => {
  const batch = (...args: string[]) => folder.run('batch', 'a.txt', 'b.txt', 'c.txt', ...GRID, ...args);
  expect((await batch('--shard', '1/2', '--out', 's1')).code).toBe(0);
  expect((await batch('--shard', '2/2', '--out', 's2')).code).toBe(0);
  expect((await folder.run('merge', 's1', 's2', '--out', 'reference')).code).toBe(0);
  for (const file of filesUnder(join(folder.path, 'reference')))
    if (!file.endsWith('.html'))
      reference.set(file, readFileSync(join(folder.path, 'reference', file), 'utf8'));
});

type Side = 1 | 2;
// biome-ignore lint/suspicious/noExplicitAny: summaries and spectra are edited as loose JSON on purpose
type Loose = any;

/** A case folder holding copies of the two shard folders, with JSON read and written by path. */
class Shards {
  constructor(readonly dir: string) {}
  path(side: Side, ...rest: string[]) {
    return join(this.dir, `s${side}`, ...rest);
  }
  summary(side: Side): Loose {
    return JSON.parse(readFileSync(this.path(side, SHARD_FILE[side]), 'utf8'));
  }
  writeSummary(side: Side, json: Loose, indent = 2) {
    writeFileSync(this.path(side, SHARD_FILE[side]), JSON.stringify(json, null, indent));
  }
  edit(side: Side, change: (json: Loose) => void) {
    const json = this.summary(side);
    change(json);
    this.writeSummary(side, json);
  }
  /** The record folder names of a shard (from its summary as the batch wrote it). */
  records(side: Side): string[] {
    return side === 1 ? ['a'] : ['b', 'c'];
  }
  spectra(side: Side, record: string): Loose {
    return JSON.parse(readFileSync(this.path(side, record, 'spectra.json'), 'utf8'));
  }
  writeSpectra(side: Side, record: string, json: Loose) {
    writeFileSync(this.path(side, record, 'spectra.json'), `${JSON.stringify(json, null, 2)}\n`);
  }
}

/** One mutation: what it does to the copies, and whether it leaves the merge's meaning unchanged. */
interface Mutation {
  label: string;
  apply(s: Shards): void;
  harmless: boolean;
}

const side = fc.constantFrom<Side>(1, 2);
const other = (s: Side): Side => (s === 1 ? 2 : 1);
const ODD_VALUES: unknown[] = [
  0,
  -1,
  1e9,
  'x',
  1.5,
  null,
  '2',
  'NaN',
  'Infinity',
  1e5,
  100001,
  true,
  [2],
  {},
];

const mutation: fc.Arbitrary<Mutation> = fc.oneof(
  // Shard counts and numbers (issue 21: zero, non-numeric, fractional, a billion).
  fc.record({ s: side, v: fc.constantFrom(...ODD_VALUES, 2) }).map(({ s, v }) => ({
    label: `s${s} shard.count = ${JSON.stringify(v)}`,
    apply: (x: Shards) => x.edit(s, (j) => (j.shard.count = v)),
    harmless: v === 2,
  })),
  fc
    .record({ s: side, v: fc.constantFrom<unknown>(0, 3, -1, 'x', 1.5, null, '1', 1, 2) })
    .map(({ s, v }) => ({
      label: `s${s} shard.index = ${JSON.stringify(v)}`,
      apply: (x: Shards) => x.edit(s, (j) => (j.shard.index = v)),
      harmless: v === s,
    })),
  // A record in both shards (with or without its folder copied along).
  fc.record({ s: side, folderToo: fc.boolean() }).map(({ s, folderToo }) => ({
    label: `a record of s${other(s)} listed in s${s}${folderToo ? ' with its folder' : ''}`,
    apply: (x: Shards) => {
      const moved = x.summary(other(s)).records[0];
      x.edit(s, (j) => j.records.push(moved));
      if (folderToo) cpSync(x.path(other(s), moved.name), x.path(s, moved.name), { recursive: true });
    },
    harmless: false,
  })),
  // A number edited in the summary or in the copied spectra (a factor of 1 is no edit).
  fc
    .record({
      s: side,
      where: fc.constantFrom('summary', 'spectra', 'pga'),
      r: fc.nat(),
      d: fc.nat(1),
      p: fc.nat(3),
      v: fc.constantFrom<unknown>(1, 1 + 1e-9, 1.01, 2, 0, -1, 'NaN', 'Infinity', null, '0.3', 1e-300),
    })
    .map(({ s, where, r, d, p, v }) => ({
      label: `s${s} ${where} number r${r % (s === 1 ? 1 : 2)} [${d}][${p}] × ${JSON.stringify(v)}`,
      apply: (x: Shards) => {
        const record = x.records(s)[r % x.records(s).length];
        const scaled = (old: number) => (typeof v === 'number' ? old * v : v);
        if (where === 'summary')
          x.edit(s, (j) => {
            const entry = j.records.find((e: Loose) => e.name === record);
            entry.psaG[d][p] = scaled(entry.psaG[d][p]);
          });
        else {
          const json = x.spectra(s, record);
          if (where === 'pga') json.record.pga_g = scaled(json.record.pga_g);
          else json.spectra[d].psa_g[p] = scaled(json.spectra[d].psa_g[p]);
          x.writeSpectra(s, record, json);
        }
      },
      // Multiplying a zero by anything leaves it zero (PSA at T = 0 is never zero here, so only exact 1).
      harmless: v === 1,
    })),
  // Files removed, or a record left out of its summary.
  fc
    .record({ s: side, what: fc.constantFrom('summary', 'spectra', 'folder', 'entry') })
    .map(({ s, what }) => ({
      label: `s${s}: ${what} removed`,
      apply: (x: Shards) => {
        const record = x.records(s)[0];
        if (what === 'summary') rmSync(x.path(s, SHARD_FILE[s]));
        else if (what === 'entry') x.edit(s, (j) => j.records.shift());
        else if (what === 'spectra') rmSync(x.path(s, record, 'spectra.json'));
        else rmSync(x.path(s, record), { recursive: true });
      },
      harmless: false,
    })),
  // Files added: a note, a stray record folder, a stale temporary (harmless); another shard's summary.
  fc
    .record({ s: side, what: fc.constantFrom('note', 'folder', 'temporary', 'third') })
    .map(({ s, what }) => ({
      label: `s${s}: extra ${what}`,
      apply: (x: Shards) => {
        if (what === 'note') writeFileSync(x.path(s, 'notes.txt'), 'invented notes\n');
        else if (what === 'folder')
          cpSync(x.path(s, x.records(s)[0]), x.path(s, 'stray'), { recursive: true });
        else if (what === 'temporary') writeFileSync(x.path(s, '.qs-1a2b-3c.tmp'), 'half');
        else writeFileSync(x.path(s, 'shard-3-of-2.json'), readFileSync(x.path(s, SHARD_FILE[s])));
      },
      harmless: what !== 'third',
    })),
  // Truncated JSON.
  fc
    .record({
      s: side,
      which: fc.constantFrom('summary', 'spectra'),
      at: fc.double({ min: 0, max: 0.999, noNaN: true }),
    })
    .map(({ s, which, at }) => ({
      label: `s${s} ${which} truncated at ${at.toFixed(3)}`,
      apply: (x: Shards) => {
        const file =
          which === 'summary' ? x.path(s, SHARD_FILE[s]) : x.path(s, x.records(s)[0], 'spectra.json');
        const text = readFileSync(file, 'utf8');
        // Cut before the closing brace at the least, so the JSON is always incomplete.
        writeFileSync(file, text.slice(0, Math.min(Math.floor(at * text.length), text.trimEnd().length - 1)));
      },
      harmless: false,
    })),
  // Non-finite numbers written into the text (1e400 parses as Infinity; NaN is not JSON).
  fc
    .record({
      s: side,
      which: fc.constantFrom('summary', 'spectra'),
      token: fc.constantFrom('NaN', 'Infinity', '-Infinity', '1e400', '-1e400'),
    })
    .map(({ s, which, token }) => ({
      label: `s${s} ${which}: a number replaced by ${token}`,
      apply: (x: Shards) => {
        const file =
          which === 'summary' ? x.path(s, SHARD_FILE[s]) : x.path(s, x.records(s)[0], 'spectra.json');
        const text = readFileSync(file, 'utf8');
        writeFileSync(file, text.replace(/(\n\s+)0\.\d+/, `$1${token}`));
      },
      harmless: false,
    })),
  // Other settings in one shard.
  fc
    .record({ s: side, what: fc.constantFrom('dampings', 'periods', 'method', 'units', 'unsorted') })
    .map(({ s, what }) => ({
      label: `s${s}: other ${what}`,
      apply: (x: Shards) =>
        x.edit(s, (j) => {
          if (what === 'dampings') j.settings.dampings = [0.02, 0.1];
          else if (what === 'periods') j.settings.periodsS = [0, 0.1, 0.3, 2];
          else if (what === 'method') j.settings.method = 'newmark-linear';
          else if (what === 'units') j.settings.read.units = 'm/s2';
          else j.settings.periodsS = [...j.settings.periodsS].reverse();
        }),
      harmless: false,
    })),
  // Periods unsorted (or repeated) in every summary and every copied spectrum alike.
  fc.constantFrom('reversed', 'repeated').map((how) => ({
    label: `periods ${how} everywhere`,
    apply: (x: Shards) => {
      const order = how === 'reversed' ? [3, 2, 1, 0] : [0, 1, 1, 3];
      const reorder = (row: unknown[]) => order.map((i) => row[i]);
      for (const s of [1, 2] as const) {
        x.edit(s, (j) => {
          j.settings.periodsS = reorder(j.settings.periodsS);
          for (const r of j.records) r.psaG = r.psaG.map(reorder);
        });
        for (const record of x.records(s)) {
          const json = x.spectra(s, record);
          json.periods_s = reorder(json.periods_s);
          if (Array.isArray(json.frequencies_hz)) json.frequencies_hz = reorder(json.frequencies_hz);
          for (const curve of json.spectra)
            for (const key of Object.keys(curve))
              if (Array.isArray(curve[key])) curve[key] = reorder(curve[key]);
          x.writeSpectra(s, record, json);
        }
      }
    },
    harmless: false,
  })),
  // The same summary rewritten without indentation, keys in another order: harmless.
  side.map((s) => ({
    label: `s${s} summary rewritten compactly, keys reversed`,
    apply: (x: Shards) => {
      const json = x.summary(s);
      x.writeSummary(s, Object.fromEntries(Object.entries(json).reverse()), 0);
    },
    harmless: true,
  })),
  // A failure listed that the shard cannot have had: another shard's file, a file of no shard, its own.
  // (In shard 1 a file of no shard looks like an unmatched pattern, which only shard 1 lists: not a test.)
  fc
    .record({ s: side, file: fc.constantFrom('other', 'nowhere', 'own') })
    .filter(({ s, file }) => s === 2 || file !== 'nowhere')
    .map(({ s, file }) => ({
      label: `s${s}: failed lists ${file} file`,
      apply: (x: Shards) =>
        x.edit(s, (j) => {
          const name =
            file === 'other'
              ? x.summary(other(s)).records[0].file
              : file === 'own'
                ? j.records[0].file
                : 'nowhere.txt';
          j.failed.push({ file: name, error: 'invented failure' });
        }),
      harmless: false,
    })),
  // Record names and file lists.
  fc
    .record({ s: side, name: fc.constantFrom('../escape', 'A', '', 'a b', 'b', 'x'.repeat(300)) })
    .map(({ s, name }) => ({
      label: `s${s} record renamed ${JSON.stringify(name)}`,
      apply: (x: Shards) => x.edit(s, (j) => (j.records[0].name = name)),
      harmless: false,
    })),
  fc
    .record({ both: fc.boolean(), list: fc.constantFrom('added', 'dropped', 'reordered') })
    .map(({ both, list }) => ({
      label: `all_files ${list} in ${both ? 'both shards' : 's2'}`,
      apply: (x: Shards) => {
        for (const s of both ? ([1, 2] as const) : ([2] as const))
          x.edit(s, (j) => {
            if (list === 'added') j.all_files.push('d.txt');
            else if (list === 'dropped') j.all_files.pop();
            else j.all_files.reverse();
          });
      },
      harmless: false,
    })),
);

/**
 * Two mutations that together are a consistent edit (a record moved from a shard's records to its
 * failures reads as a run where it failed; one PSA scaled alike in a summary and its copied
 * spectra): a merge cannot tell, so the pair is not a test.
 */
const consistentEdit = (mutations: Mutation[]) =>
  // The same number edited alike in a summary and in its copied spectra: also a consistent edit.
  new Set(mutations.map((m) => m.label.replace(' spectra number ', ' summary number '))).size <
    mutations.length ||
  [1, 2].some(
    (s) =>
      mutations.some((m) => m.label === `s${s}: failed lists own file`) &&
      mutations.some((m) => m.label === `s${s}: entry removed`),
  );

const mergeCase = fc.record({
  mutations: fc.array(mutation, { minLength: 1, maxLength: 2 }).filter((m) => !consistentEdit(m)),
  /** Where the merge writes: a new folder, over an older set of outputs, or into shard folder 1. */
  out: fc.constantFrom<'new' | 'old set' | 'into s1'>('new', 'new', 'old set', 'into s1'),
});

/** Cases the long runs check at random, run first every time (issue 21's own merge cases). */
const EXAMPLES: { mutations: Mutation[]; out: 'new' | 'old set' | 'into s1' }[] = [
  {
    label: 's2 shard.count = 0',
    apply: (x: Shards) => x.edit(2, (j) => (j.shard.count = 0)),
    harmless: false,
  },
  {
    label: 's2 shard.count = 1e9',
    apply: (x: Shards) => x.edit(2, (j) => (j.shard.count = 1e9)),
    harmless: false,
  },
  {
    label: 's2 summary PSA × 1.01',
    apply: (x: Shards) => x.edit(2, (j) => (j.records[0].psaG[1][2] *= 1.01)),
    harmless: false,
  },
  {
    label: 's1 copied spectra PSA × 1.01',
    apply: (x: Shards) => {
      const json = x.spectra(1, 'a');
      json.spectra[0].psa_g[1] *= 1.01;
      x.writeSpectra(1, 'a', json);
    },
    harmless: false,
  },
  {
    label: 'a record of s1 listed in s2',
    apply: (x: Shards) => x.edit(2, (j) => j.records.push(x.summary(1).records[0])),
    harmless: false,
  },
].map((m) => ({ mutations: [m], out: 'old set' as const }));

let serial = 0;

/** Relative path → bytes (as text) of every file under `dir` (empty if it does not exist). */
function snapshot(dir: string): Map<string, string> {
  const found = new Map<string, string>();
  if (!existsSync(dir)) return found;
  for (const file of filesUnder(dir)) found.set(file, readFileSync(join(dir, file), 'utf8'));
  return found;
}
const sameSnapshot = (a: Map<string, string>, b: Map<string, string>) =>
  a.size === b.size && [...a].every(([k, v]) => b.get(k) === v);

async function check(
  c: { mutations: Mutation[]; out: 'new' | 'old set' | 'into s1' },
  run: (argv: string[], cwd: string) => Promise<CliResult>,
  tally: { cases: number; merged: number; refused: number; maxMs: number },
) {
  const dir = join(folder.path, `case-${serial++}`);
  mkdirSync(dir);
  cpSync(join(folder.path, 's1'), join(dir, 's1'), { recursive: true });
  cpSync(join(folder.path, 's2'), join(dir, 's2'), { recursive: true });
  const shards = new Shards(dir);
  for (const m of c.mutations) {
    try {
      m.apply(shards);
    } catch {
      // The file it edits was already removed or truncated by the mutation before: nothing to do.
    }
  }
  const out = c.out === 'into s1' ? 's1' : 'merged';
  if (c.out === 'old set') {
    // An older set: the reference with its suite.json replaced, so old and new differ.
    cpSync(join(folder.path, 'reference'), join(dir, 'merged'), { recursive: true });
    writeFileSync(join(dir, 'merged', 'suite.json'), '{"invented": "an older suite"}\n');
  }
  const before = snapshot(join(dir, out));
  const argv = ['merge', 's1', 's2', '--out', out];
  const result = await run(argv, dir);
  const fail = (problem: string): never => {
    throw new Error(
      `${problem}\nmutations: ${c.mutations.map((m) => m.label).join('; ')}\nout: ${c.out}\nargv: ${JSON.stringify(argv)}\nexit ${result.code}\nstderr: ${JSON.stringify(result.stderr)}`,
    );
  };
  tally.cases++;
  tally.maxMs = Math.max(tally.maxMs, result.ms);
  if (V8_ABORT.test(result.stderr)) fail('V8 aborted');
  if (result.code === -1) fail('hung (killed at the timeout)');
  const temporary = temporaryAmong(filesUnder(dir).filter((f) => !f.endsWith('.qs-1a2b-3c.tmp')));
  if (temporary !== undefined) fail(`temporary left: ${temporary}`);
  const harmless = c.mutations.every((m) => m.harmless);
  if (result.code === 0) {
    tally.merged++;
    const after = snapshot(join(dir, out));
    for (const [file, text] of reference)
      if (after.get(file) !== text) fail(`merged ${file} differs from the unmutated merge`);
  } else {
    tally.refused++;
    if (harmless) fail('a harmless change was refused');
    let line = '';
    try {
      line = expectOneLineFailure(result);
    } catch (error) {
      fail((error as Error).message);
    }
    if (!/\bs[12]\b/.test(line) && !/missing/.test(line)) fail('the refusal names no file');
    if (!sameSnapshot(before, snapshot(join(dir, out)))) fail(`the refusal changed ${out}`);
  }
  rmSync(dir, { recursive: true, force: true });
}

describe('merge of damaged shards through main()', () => {
  it('merges to the unmutated suite or refuses in one line naming the file, the output folder as it was', async () => {
    const tally = { cases: 0, merged: 0, refused: 0, maxMs: 0 };
    await fc.assert(
      fc.asyncProperty(mergeCase, (c) => check(c, (argv, cwd) => runMainIn(cwd, argv), tally)),
      { seed: FUZZ_SEED + 40, numRuns: runs(40), examples: EXAMPLES.map((c) => [c]) },
    );
    report('merge via main()', { ...tally, maxMs: Math.round(tally.maxMs) });
  });
});

describe('merge of damaged shards as child processes', () => {
  it('the same, for real: no V8 abort, no hang', async () => {
    const tally = { cases: 0, merged: 0, refused: 0, maxMs: 0 };
    await fc.assert(
      fc.asyncProperty(mergeCase, (c) =>
        check(c, async (argv, cwd) => runBoundedChild(argv, cwd, 20_000), tally),
      ),
      { seed: FUZZ_SEED + 41, numRuns: runs(3, 40) },
    );
    report('merge as child processes', { ...tally, maxMs: Math.round(tally.maxMs) });
  });
});
