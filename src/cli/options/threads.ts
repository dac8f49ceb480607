import { usageError } from '../../base/errors.js';
import type { SweepKernel } from '../../oscillator/sweep.js';
import { wholeNumber } from './record.js';

/** The value of --threads: a whole number from 1 to 256. */
export function parseThreads(text: string): number {
  return wholeNumber('--threads', text, 1, 256);
}

/** --threads and --kernel of a sweep, each auto unless given. */
export function sweepFromOptions(options: { threads?: string; kernel?: string }): {
  threads: number | 'auto';
  kernel: SweepKernel;
} {
  const kernel = options.kernel ?? 'auto';
  if (kernel !== 'auto' && kernel !== 'wasm' && kernel !== 'js') {
    throw usageError(`--kernel '${kernel}': use auto, wasm or js`);
  }
  return { threads: options.threads === undefined ? 'auto' : parseThreads(options.threads), kernel };
}
