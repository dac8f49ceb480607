/**
 * Crash safety of the output transaction (common practice for safe output): `report` and `batch` are
 * killed at random moments (SIGKILL, SIGTERM, SIGINT) while they replace an older set of outputs,
 * and every folder must then hold exactly the old set or exactly the new one. After SIGTERM and
 * SIGINT nothing else may be left; after SIGKILL only `.qs-` temporaries of the dead process, which
 * the next run into the folder removes or, with a journal, finishes (recoverFolder, as a next run
 * calls it). QUAKESWEEP_KILLS sets the number of kills (default 20, shared by both commands);
 * QUAKESWEEP_KILL_SEED repeats a run. Runs the built CLI (npm run build).
 */
import { spawn, spawnSync } from 'node:child_process';
import { createHash } from 'node:crypto';
import { cpSync, mkdirSync, mkdtempSync, readdirSync, readFileSync, rmSync, statSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { afterAll, describe, expect, it } from 'vitest';
import { TEMPORARY_NAME } from '../../src/output/atomic.js';
import { recoverFolder } from '../../src/output/recover.js';
import { BIN } from '../helpers/run-cli.js';

const KILLS = Number(process.env['QUAKESWEEP_KILLS'] ?? 20);
const SEED = Number(process.env['QUAKESWEEP_KILL_SEED'] ?? Date.now() % 1_000_000);
const RECORDS = fileURLToPath(new URL('../../records/', import.meta.url));
const root = mkdtempSync(join(tmpdir(), 'quakesweep-kill-'));
afterAll(() => rmSync(root, { recursive: true, force: true }));

/** A small seeded generator (Park–Miller), so that a failing run can be repeated. */
function random(seed: number): () => number {
  let state = (seed % 2147483646) + 1;
  return () => {
    state = (state * 48271) % 2147483647;
    return state / 2147483647;
  };
}

/** Every file under `folder`, relative name → SHA-256 of its bytes (folders by their files). */
function fingerprint(folder: string, prefix = ''): Map<string, string> {
  const found = new Map<string, string>();
  for (const name of readdirSync(folder).sort()) {
    const path = join(folder, name);
    if (statSync(path).isDirectory()) {
      for (const [k, v] of fingerprint(path, `${prefix}${name}/`)) found.set(k, v);
    } else found.set(`${prefix}${name}`, createHash('sha256').update(readFileSync(path)).digest('hex'));
  }
  return found;
}

const same = (a: Map<string, string>, b: Map<string, string>) =>
  a.size === b.size && [...a].every(([k, v]) => b.get(k) === v);

const temporaries = (set: Map<string, string>) =>
  [...set.keys()].filter((k) => TEMPORARY_NAME.test(k.split('/').at(-1) ?? ''));

const ENV = { ...process.env, SOURCE_DATE_EPOCH: '1700000000' };

interface Scenario {
  name: string;
  /** The arguments that write the old set and the new one into `out` (cwd: the scenario folder). */
  old: string[];
  fresh: string[];
}

const SCENARIOS: Scenario[] = [
  {
    name: 'report',
    old: ['report', join(RECORDS, 'marrowby-h1.csv'), '--periods', '0.05:2:16', '--out', 'out'],
    fresh: ['report', join(RECORDS, 'marrowby-h2.csv'), '--periods', '0.1:3:20', '--out', 'out'],
  },
  {
    name: 'batch',
    old: [
      'batch',
      join(RECORDS, 'marrowby-h1.csv'),
      join(RECORDS, 'marrowby-h2.csv'),
      '--periods',
      '0.05:2:16',
      '--threads',
      '2',
      '--out',
      'out',
    ],
    fresh: [
      'batch',
      join(RECORDS, 'marrowby-h1.csv'),
      join(RECORDS, 'marrowby-h2.csv'),
      '--periods',
      '0.1:3:20',
      '--threads',
      '2',
      '--out',
      'out',
    ],
  },
];

function runToEnd(cwd: string, args: string[]): number {
  const start = performance.now();
  const result = spawnSync(process.execPath, [BIN, ...args], { cwd, env: ENV, encoding: 'utf8' });
  if (result.status !== 0) throw new Error(`${args.join(' ')}: ${result.stderr}`);
  return performance.now() - start;
}

/** Start `args`, send `signal` after `delayMs`; resolves when the process has ended. */
function runAndKill(cwd: string, args: string[], signal: NodeJS.Signals, delayMs: number): Promise<void> {
  return new Promise((resolve) => {
    const child = spawn(process.execPath, [BIN, ...args], { cwd, env: ENV, stdio: 'ignore' });
    const timer = setTimeout(() => child.kill(signal), delayMs);
    child.on('exit', () => {
      clearTimeout(timer);
      resolve();
    });
  });
}

describe('kill test: a killed report or batch leaves the old set or the new one', () => {
  it(`survives ${KILLS} random kills (seed ${SEED})`, { timeout: 60_000 + KILLS * 4_000 }, async () => {
    const next = random(SEED);
    const tally = { old: 0, new: 0, recovered: 0 };
    for (const [index, scenario] of SCENARIOS.entries()) {
      const work = join(root, scenario.name);
      const out = join(work, 'out');
      const saved = join(root, `${scenario.name}-old`);
      mkdirSync(work);
      const durationMs = runToEnd(work, scenario.fresh); // the new set alone, timed
      const fresh = fingerprint(out);
      rmSync(out, { recursive: true });
      runToEnd(work, scenario.old);
      const old = fingerprint(out);
      cpSync(out, saved, { recursive: true });
      expect(same(old, fresh)).toBe(false);
      const kills = index === 0 ? Math.ceil(KILLS / 2) : Math.floor(KILLS / 2);
      for (let k = 0; k < kills; k++) {
        // The old set again, as written (copied back; only the bytes are compared).
        rmSync(out, { recursive: true });
        cpSync(saved, out, { recursive: true });
        const signal = (['SIGKILL', 'SIGTERM', 'SIGINT'] as const)[Math.floor(next() * 3)];
        // Half the kills anywhere in the run, half near its end, where the renames are.
        const delayMs = k % 2 === 0 ? next() * durationMs * 1.1 : durationMs * (0.75 + 0.35 * next());
        await runAndKill(work, scenario.fresh, signal, delayMs);
        let found = fingerprint(out);
        const left = temporaries(found);
        const where = `${scenario.name}, kill ${k + 1} (${signal} after ${delayMs.toFixed(0)} ms, seed ${SEED})`;
        if (signal !== 'SIGKILL') expect(left, where).toEqual([]);
        if (left.length > 0) {
          // What the next run into the folder does first.
          recoverFolder(out);
          for (const name of readdirSync(out)) {
            if (statSync(join(out, name)).isDirectory()) recoverFolder(join(out, name));
          }
          found = fingerprint(out);
          tally.recovered++;
        }
        const isOld = same(found, old);
        const isNew = same(found, fresh);
        expect(isOld || isNew, `${where}: ${[...found.keys()].join(', ')}`).toBe(true);
        if (isOld) tally.old++;
        else tally.new++;
      }
    }
    console.log(
      `kill test: ${KILLS} kills, seed ${SEED}: ${tally.old} old sets, ${tally.new} new, ${tally.recovered} cleaned after SIGKILL`,
    );
  });
});
