import { usageError } from '../../base/errors.js';

/** The value of --threads: a whole number from 1 to 256. */
export function parseThreads(text: string): number {
  const threads = Number(text);
  if (!Number.isInteger(threads) || threads < 1 || threads > 256) {
    throw usageError(`--threads must be a whole number from 1 to 256, got '${text}'`);
  }
  return threads;
}
