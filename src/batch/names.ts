import { recordName } from '../record/record.js';
import { compareText } from './glob.js';

/** File names the suite itself writes in its folder, which a record folder must not take. */
const RESERVED = /^(suite\.(json|csv|svg|html)|shard-.*\.json)$/i;

/**
 * A folder name that stays inside the output folder whatever the record is called: letters,
 * digits, `-`, `_` and single dots only (anything else becomes `_`), no `..`, no leading dot, at
 * most 96 characters, never empty and never one of the suite's own file names.
 */
export function sanitiseName(name: string): string {
  let safe = name
    .normalize('NFC')
    .replace(/[^A-Za-z0-9._-]/g, '_')
    .replace(/\.{2,}/g, '_')
    .replace(/^\.+/, '_')
    .slice(0, 96);
  if (/^_*$/.test(safe)) safe = `record${safe}`;
  if (RESERVED.test(safe)) safe = `record-${safe}`;
  return safe;
}

/**
 * Folder names for every file of the whole (unsharded) list, so that every shard names a record
 * alike: sanitised, then made unique regardless of case in sorted order by `-2`, `-3`, ….
 */
export function assignNames(files: readonly string[]): Map<string, string> {
  const names = new Map<string, string>();
  const taken = new Set<string>();
  for (const file of [...files].sort(compareText)) {
    const base = sanitiseName(recordName(file));
    let name = base;
    for (let k = 2; taken.has(name.toLowerCase()); k++) name = `${base}-${k}`;
    taken.add(name.toLowerCase());
    names.set(file, name);
  }
  return names;
}
