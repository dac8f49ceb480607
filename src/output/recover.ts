import { existsSync, readdirSync, readFileSync, renameSync, rmSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { TEMPORARY_NAME } from './atomic.js';
import type { Journal } from './transaction.js';

/**
 * What a process killed outright (SIGKILL, power loss) can leave in a folder, and how the next run
 * into that folder cleans it before writing: temporaries `.qs-<pid>-<tag>.tmp|old|jtmp` whose
 * process no longer runs are removed, and a journal `.qs-<pid>-<tag>.jnl` of such a process means
 * its renames had begun with every file staged, so they are finished (roll forward, giving the
 * new set whole) before the journal, its copies in other folders and the kept old copies are removed.
 */
export function recoverFolder(folder: string): void {
  let names: string[];
  try {
    names = readdirSync(folder);
  } catch {
    return;
  }
  // A journal of the parent folder (batch: DIR for DIR/<record>/) may name staged files here.
  if (dirname(folder) !== folder) rollForwardIn(dirname(folder), staleNames(dirname(folder)));
  rollForwardIn(folder, names);
  for (const name of staleNames(folder, names).filter((n) => !n.endsWith('.jnl')))
    rmSync(join(folder, name), { force: true });
}

function staleNames(folder: string, names?: string[]): string[] {
  let all = names;
  if (all === undefined) {
    try {
      all = readdirSync(folder);
    } catch {
      return [];
    }
  }
  return all.filter((name) => {
    const match = TEMPORARY_NAME.exec(name);
    return match !== null && !isRunning(Number.parseInt(match[1], 36));
  });
}

function rollForwardIn(folder: string, names: string[]): void {
  for (const name of staleNames(folder, names).filter((n) => n.endsWith('.jnl')))
    rollForward(join(folder, name));
}

function rollForward(journal: string): void {
  let entries: Journal['entries'];
  let journals: string[];
  try {
    const parsed = JSON.parse(readFileSync(journal, 'utf8')) as Journal;
    entries = parsed.entries;
    journals = parsed.journals ?? [journal];
  } catch {
    // A journal is written atomically; one that does not parse is not ours. Leave it.
    return;
  }
  for (const entry of entries) {
    if (existsSync(entry.temporary)) renameSync(entry.temporary, entry.final);
  }
  for (const copy of new Set([journal, ...journals])) rmSync(copy, { force: true });
  for (const entry of entries) if (entry.backup !== undefined) rmSync(entry.backup, { force: true });
}

/** Whether a process with this id runs (one of another user's counts as running). */
function isRunning(pid: number): boolean {
  if (pid === process.pid) return true;
  try {
    process.kill(pid, 0);
    return true;
  } catch (error) {
    return (error as NodeJS.ErrnoException).code === 'EPERM';
  }
}
