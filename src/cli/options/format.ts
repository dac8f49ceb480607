import { usageError } from '../../base/errors.js';

/**
 * The value of --format, one of `allowed`: by default a table on the terminal, or json with --out.
 * `hint` is the list the refusal names (the commands name it each in their own words).
 */
export function outputFormat(
  options: { format?: string; out?: string },
  allowed: readonly string[],
  hint: string,
): string {
  const format = options.format ?? (options.out === undefined ? 'table' : 'json');
  if (!allowed.includes(format)) throw usageError(`--format '${format}': use ${hint}`);
  return format;
}
