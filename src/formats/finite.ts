import { inputError } from '../base/errors.js';

/**
 * Refuse a result that holds a number that is not finite. JSON.stringify writes NaN and ±Infinity
 * as null without a word, and String() writes them as "NaN" into a table; either would pass a
 * broken result off as data, so outputs are checked before they are written. `null` is allowed:
 * outputs use it on purpose for "not defined here".
 */
export function assertFiniteResult(value: unknown): void {
  const path = nonFinitePath(value, '');
  if (path !== undefined) throw notFiniteError(path || 'the value');
}

/** The refusal of a value that is not finite, at `where` in a result. */
export function notFiniteError(where: string) {
  return inputError(
    `a result is not a finite number (${where}); the record or the options are out of range, so nothing was written`,
  );
}

function nonFinitePath(value: unknown, path: string): string | undefined {
  if (typeof value === 'number') return Number.isFinite(value) ? undefined : `${path} = ${value}`;
  if (value === null || typeof value !== 'object' || value instanceof DataView) return undefined;
  if (Array.isArray(value) || ArrayBuffer.isView(value)) {
    const items = value as ArrayLike<unknown>;
    for (let i = 0; i < items.length; i++) {
      // Finite numbers are passed over here, so that no path is built for each of them.
      if (typeof items[i] === 'number' && Number.isFinite(items[i])) continue;
      const found = nonFinitePath(items[i], `${path}[${i}]`);
      if (found !== undefined) return found;
    }
    return undefined;
  }
  for (const [key, item] of Object.entries(value)) {
    const found = nonFinitePath(item, path === '' ? key : `${path}.${key}`);
    if (found !== undefined) return found;
  }
  return undefined;
}
