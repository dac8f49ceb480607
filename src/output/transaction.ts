import { constants, copyFileSync, linkSync, renameSync, rmSync, type Stats } from 'node:fs';
import { dirname } from 'node:path';
import { stageFile, temporaryPath, writeAtomic } from './atomic.js';
import { forget, remember } from './signals.js';

/** One file of a transaction: its destination (a real path) and, when one exists, the file it replaces. */
export interface PlannedWrite {
  final: string;
  contents: string | Uint8Array;
  replaces?: Stats;
}

/** What a journal lists for each file: enough for a later run to finish the renames (recover.ts). */
export interface JournalEntry {
  temporary: string;
  final: string;
  backup?: string;
}

/** A journal file: the renames, and every copy of the journal (removed together once they are done). */
export interface Journal {
  pid: number;
  entries: JournalEntry[];
  journals?: string[];
}

/** The file operations a transaction uses; a test swaps one to make it fail at a chosen point. */
export interface TransactionIo {
  stage: typeof stageFile;
  rename: (from: string, to: string) => void;
}

const REAL_IO: TransactionIo = { stage: stageFile, rename: renameSync };

/**
 * Write every file or none (the old ones kept). In order:
 * 1. stage each file under a short temporary name in its own folder, flushed (a failure, e.g. disk
 *    full, removes the staged ones and leaves the old set untouched);
 * 2. keep each file being replaced under a second name (a hard link, else a copy);
 * 3. write a journal in `journalFolder` listing the renames (written atomically itself), and a copy
 *    in every other folder receiving a file that a run into it would not find from there (recover.ts
 *    looks in a folder and its parent): a run into any one folder finishes the whole set;
 * 4. rename each staged file over its destination, in the given order (callers put the file that
 *    names the others last); if one rename fails, the ones done are undone from the kept copies;
 * 5. remove the journal, then the kept copies.
 * Everything runs synchronously, so SIGINT and SIGTERM (handled in signals.ts) are seen only before
 * step 1 or after step 5. After a SIGKILL the journal lets the next run into the folder finish
 * step 4 (roll forward), and temporaries of a dead process are removed (recover.ts).
 */
export function commitFiles(
  planned: readonly PlannedWrite[],
  journalFolder: string,
  io: TransactionIo = REAL_IO,
): void {
  if (planned.length === 0) return;
  if (planned.length === 1 && planned[0].replaces === undefined && io === REAL_IO) {
    // One new file needs no journal: its rename alone is the transaction.
    commitOne(planned[0]);
    return;
  }
  const entries: JournalEntry[] = [];
  const cleanup = () => {
    for (const entry of entries) {
      rmSync(entry.temporary, { force: true });
      if (entry.backup !== undefined) rmSync(entry.backup, { force: true });
    }
  };
  remember(cleanup);
  let journals: string[] = [];
  try {
    for (const file of planned) {
      entries.push({ temporary: io.stage(file.final, file.contents, file.replaces), final: file.final });
    }
    for (const [i, file] of planned.entries()) {
      if (file.replaces !== undefined) entries[i].backup = keepCopy(file.final);
    }
    journals = journalFolders(entries, journalFolder).map((folder) => temporaryPath(folder, 'jnl'));
    const text = `${JSON.stringify({ pid: process.pid, entries, journals } satisfies Journal)}\n`;
    for (const journal of journals) writeAtomic(journal, text);
  } catch (error) {
    for (const journal of journals) rmSync(journal, { force: true });
    cleanup();
    forget(cleanup);
    throw error;
  }
  let done = 0;
  try {
    for (; done < entries.length; done++) io.rename(entries[done].temporary, entries[done].final);
  } catch (error) {
    undo(entries.slice(0, done));
    cleanup();
    for (const journal of journals) rmSync(journal, { force: true });
    forget(cleanup);
    throw error;
  }
  for (const journal of journals) rmSync(journal, { force: true });
  cleanup();
  forget(cleanup);
}

/**
 * Where the journal goes: `main`, and every folder of the entries that is neither `main` nor one of
 * its subfolders (a batch's record folders are found from their parent).
 */
function journalFolders(entries: readonly JournalEntry[], main: string): string[] {
  const folders = new Set([main]);
  for (const entry of entries) {
    const folder = dirname(entry.final);
    if (folder !== main && dirname(folder) !== main) folders.add(folder);
  }
  return [...folders];
}

function commitOne(file: PlannedWrite): void {
  const temporary = stageFile(file.final, file.contents);
  const cleanup = () => rmSync(temporary, { force: true });
  remember(cleanup);
  try {
    renameSync(temporary, file.final);
  } catch (error) {
    cleanup();
    throw error;
  } finally {
    forget(cleanup);
  }
}

/** A second name for `path`'s current bytes: a hard link where the file system has them, else a copy. */
function keepCopy(path: string): string {
  const backup = temporaryPath(dirname(path), 'old');
  try {
    linkSync(path, backup);
  } catch {
    copyFileSync(path, backup, constants.COPYFILE_EXCL);
  }
  return backup;
}

/** Put back the old files (or remove the new ones that had none) of the renames done. */
function undo(done: readonly JournalEntry[]): void {
  for (const entry of [...done].reverse()) {
    try {
      if (entry.backup !== undefined) renameSync(entry.backup, entry.final);
      else rmSync(entry.final, { force: true });
    } catch {
      // Keep undoing the others; the error that started this is the one reported.
    }
  }
}
