/**
 * Golden outputs: the bytes of every command's outputs (files, standard output, standard error and
 * the exit code) over the invented demo records and a few seeded generated ones, compared with the
 * copies kept in test/golden/expected/. A change that alters any output byte fails here; when the
 * change is meant (a fixed defect, a new field), regenerate with
 *
 *     GOLDEN_UPDATE=1 npx vitest run test/golden
 *
 * and say in the commit which outputs changed and why (common practice: approval testing).
 * The temporary folder's path is written as <TMP>, the working folder's as <CWD> and the demo's wall time as <time>, so that the
 * copies do not depend on where and how fast the test ran.
 */
import {
  copyFileSync,
  existsSync,
  mkdirSync,
  mkdtempSync,
  readdirSync,
  readFileSync,
  rmSync,
  writeFileSync,
} from 'node:fs';
import { tmpdir } from 'node:os';
import { join, relative } from 'node:path';
import { fileURLToPath } from 'node:url';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { runMain } from '../helpers/run-cli.js';
import { GOLDEN_CASES, GOLDEN_FOLLOW_UPS } from './cases.js';

const RECORDS = fileURLToPath(new URL('../../records/', import.meta.url));
const EXPECTED = fileURLToPath(new URL('./expected/', import.meta.url));
const UPDATE = process.env['GOLDEN_UPDATE'] === '1';

let root = '';
let input = '';

async function run(argv: string[], out: string, env: Record<string, string> = {}) {
  const saved = Object.fromEntries(Object.keys(env).map((key) => [key, process.env[key]]));
  Object.assign(process.env, env);
  try {
    // IN/ also after a key (a target's `multi-period=IN/…`).
    return await runMain(argv.map((arg) => arg.replace(/(^|=)IN\//, `$1${input}/`).replace(/^OUT/, out)));
  } finally {
    for (const [key, value] of Object.entries(saved)) {
      if (value === undefined) delete process.env[key];
      else process.env[key] = value;
    }
  }
}

/** The inputs: the demo records and equipment, seeded synth records, a target table, a floor spectrum and a floor envelope. */
async function writeInputs(): Promise<void> {
  for (const file of readdirSync(RECORDS)) copyFileSync(join(RECORDS, file), join(input, file));
  const synth = async (argv: string[], file: string) => {
    const result = await run(['synth', ...argv, '--out', join(input, file)], input);
    if (result.code !== 0) throw new Error(`synth failed: ${result.stderr}`);
  };
  await synth(
    ['--seed', '101', '--dt', '0.005', '--duration', '12', '--pga', '0.45', '--site-frequency', '5'],
    'gen-a.csv',
  );
  await synth(
    ['--seed', '102', '--dt', '0.02', '--duration', '25', '--pga', '0.2', '--site-frequency', '1.2'],
    'gen-b.csv',
  );
  // One value a line in m/s² (no header, no time column).
  await synth(['--seed', '103', '--dt', '0.005', '--duration', '8', '--pga', '0.3'], 'gen-c.tmp');
  const rows = readFileSync(join(input, 'gen-c.tmp'), 'utf8')
    .split('\n')
    .filter((line) => /^-?\d/.test(line))
    .map((line) => (Number(line.split(',')[1]) * 9.80665).toPrecision(7));
  writeFileSync(join(input, 'gen-single.txt'), `${rows.join('\n')}\n`);
  rmSync(join(input, 'gen-c.tmp'));
  writeFileSync(join(input, 'target.csv'), 'period_s,psa_g\n0,0.4\n0.1,0.9\n0.6,1.0\n2,0.3\n4,0.15\n');
  writeFileSync(
    join(input, 'equipment-pump.json'),
    JSON.stringify({
      name: 'Pump P-7 (invented)',
      units: 'SI',
      weight: 12,
      cg_height: 0.8,
      anchors: [
        [-0.4, -0.3],
        [0.4, -0.3],
        [0.4, 0.3],
        [-0.4, 0.3],
      ],
      cg_plan: [0.05, -0.02],
      period_s: 0.1,
      damping: 0.05,
      z: 0,
      h: 10,
      ap: 1,
      rp: 2.5,
      ip: 1,
      sds: 1,
      omega0: 2.5,
    }),
  );
  const floor = await run(
    [
      'floor',
      `${input}/marrowby-h1.csv`,
      '--units',
      'g',
      '--building-period',
      '0.5',
      '--modal-factor',
      '1.3',
      '--out',
      join(input, 'floor-spectrum.json'),
    ],
    input,
  );
  if (floor.code !== 0) throw new Error(`floor failed: ${floor.stderr}`);
  // The floor envelope of the demo's two horizontals and a generated record, for anchor --spectrum.
  const envelope = await run(
    [
      'floor',
      ...['marrowby-h1.csv', 'marrowby-h2.csv', 'gen-a.csv'].map((f) => `${input}/${f}`),
      ...['--units', 'g', '--building-period', '0.5', '--modal-factor', '1.3', '--broaden'],
      ...['--out', join(input, 'floor-envelope.json')],
    ],
    input,
  );
  if (envelope.code !== 0) throw new Error(`floor failed: ${envelope.stderr}`);
}

/** Every file below `dir`, by its path relative to `dir` (sorted), with <TMP> for the folder. */
function collect(dir: string, into: Map<string, string> = new Map(), base = dir): Map<string, string> {
  if (!existsSync(dir)) return into;
  for (const entry of readdirSync(dir, { withFileTypes: true }).sort((a, b) =>
    a.name.localeCompare(b.name),
  )) {
    const path = join(dir, entry.name);
    if (entry.isDirectory()) collect(path, into, base);
    else into.set(relative(base, path), readFileSync(path, 'utf8'));
  }
  return into;
}

/** The folder as <TMP>, the working folder (the report's "run from") as <CWD>, and the one timing a command prints (the demo's "written in 0.8 s") as <time>. */
const anonymise = (text: string) =>
  text
    .split(root)
    .join('<TMP>')
    .split(process.cwd())
    .join('<CWD>')
    .replace(/written in \d+(\.\d+)? s/g, 'written in <time> s');

beforeAll(async () => {
  root = mkdtempSync(join(tmpdir(), 'quakesweep-golden-'));
  input = join(root, 'in');
  mkdirSync(input);
  await writeInputs();
}, 120_000);
afterAll(() => rmSync(root, { recursive: true, force: true }));

describe('golden outputs', () => {
  for (const golden of GOLDEN_CASES) {
    it(golden.name, async () => {
      const out = join(root, golden.name);
      mkdirSync(out);
      const runs = [golden.argv, ...(GOLDEN_FOLLOW_UPS[golden.name] ?? [])];
      const actual = new Map<string, string>();
      for (const [index, argv] of runs.entries()) {
        const result = await run(argv, out, golden.env);
        const tag = runs.length > 1 ? `#${index + 1}` : '';
        actual.set(`_exit${tag}`, `${result.code}\n`);
        actual.set(`_stdout${tag}`, result.stdout);
        actual.set(`_stderr${tag}`, result.stderr);
      }
      for (const [file, text] of collect(out)) actual.set(file, text);
      for (const [key, text] of actual) actual.set(key, anonymise(text));

      const expectedDir = join(EXPECTED, golden.name);
      if (UPDATE) {
        rmSync(expectedDir, { recursive: true, force: true });
        for (const [file, text] of actual) {
          mkdirSync(join(expectedDir, file, '..'), { recursive: true });
          writeFileSync(join(expectedDir, file), text);
        }
        return;
      }
      const expected = collect(expectedDir);
      expect([...actual.keys()].sort(), 'the set of outputs').toEqual([...expected.keys()].sort());
      for (const [file, text] of expected) {
        // Compared as text: a difference shows as a diff of the lines.
        expect(actual.get(file), `${golden.name}/${file}`).toBe(text);
      }
    });
  }
});
