import { existsSync, readdirSync, realpathSync, statSync } from 'node:fs';
import { dirname, join } from 'node:path';

/** Whether a path names a pattern: `*` or `?` in its last segment (no `/` or `\` after it). */
export function isPattern(path: string): boolean {
  return /[*?][^\\/]*$/.test(path);
}

/**
 * A file-name pattern as a regular expression: `*` matches any run of characters, `?` exactly one;
 * a leading dot must be matched explicitly (as in a POSIX shell), so `*` skips hidden files.
 */
export function patternRegExp(pattern: string): RegExp {
  const body = pattern
    .replace(/[.+^${}()|[\]\\]/g, '\\$&')
    .replace(/\*/g, '[^/\\\\]*')
    .replace(/\?/g, '[^/\\\\]');
  return new RegExp(`^${pattern.startsWith('.') ? '' : '(?!\\.)'}${body}$`);
}

/**
 * Expand the arguments of `batch`: a plain path is taken as is (the run reports a missing file); a
 * pattern is matched against the files of its literal folder (no recursion, no `**`, no brackets).
 * `files`: every file named or matched, once each, sorted; `unmatched`: patterns that matched none;
 * `duplicates`: spellings dropped because they name a file already taken (the same real path, as
 * `s//x.csv` and `s/x.csv`, `../s/x.csv`, a link, or a pattern and the name it matched), each with
 * the spelling kept (the first in sorted order).
 */
export function expandPatterns(args: readonly string[]): {
  files: string[];
  unmatched: string[];
  duplicates: { dropped: string; kept: string }[];
} {
  const found = new Set<string>();
  const unmatched: string[] = [];
  for (const arg of args) {
    if (!isPattern(arg)) {
      found.add(arg);
      continue;
    }
    const folder = /[\\/]/.test(arg) ? dirname(arg) : '.';
    const name = arg.split(/[\\/]/).pop() ?? arg;
    const matcher = patternRegExp(name);
    const matches =
      existsSync(folder) && statSync(folder).isDirectory()
        ? readdirSync(folder)
            .filter((entry) => matcher.test(entry))
            .map((entry) => (folder === '.' && !arg.startsWith('.') ? entry : join(folder, entry)))
            .filter((path) => statSync(path).isFile())
        : [];
    if (matches.length === 0) unmatched.push(arg);
    for (const path of matches) found.add(path);
  }
  return { ...uniqueByRealPath([...found].sort(compareText)), unmatched };
}

/** Keep the first of the paths that resolve to one real file; a path that does not resolve stays. */
function uniqueByRealPath(sorted: readonly string[]): {
  files: string[];
  duplicates: { dropped: string; kept: string }[];
} {
  const byReal = new Map<string, string>();
  const files: string[] = [];
  const duplicates: { dropped: string; kept: string }[] = [];
  for (const path of sorted) {
    let real: string;
    try {
      real = realpathSync(path);
    } catch {
      files.push(path); // missing or unreadable: the run reports it
      continue;
    }
    const kept = byReal.get(real);
    if (kept !== undefined) {
      duplicates.push({ dropped: path, kept });
      continue;
    }
    byReal.set(real, path);
    files.push(path);
  }
  return { files, duplicates };
}

/** Code-unit order: the same on every machine and locale. */
export function compareText(a: string, b: string): number {
  return a < b ? -1 : a > b ? 1 : 0;
}
