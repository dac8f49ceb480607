import { existsSync, mkdirSync, statSync } from 'node:fs';
import { dirname, resolve } from 'node:path';
import { usageError } from '../base/errors.js';

/** Make the output folder: it may exist (a folder), or be created when its parent exists. */
export function prepareOutputFolder(out: string, option = '--out'): void {
  const path = resolve(out);
  if (existsSync(path)) {
    if (!statSync(path).isDirectory()) throw usageError(`${option} ${out}: exists and is not a folder`);
    return;
  }
  if (!existsSync(dirname(path))) throw usageError(`${option} ${out}: its parent folder does not exist`);
  mkdirSync(path);
}
