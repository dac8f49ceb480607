import type { Command } from 'commander';
import { usageError } from '../../base/errors.js';
import type { SweepKernel } from '../../oscillator/sweep.js';
import { wholeNumber } from './record.js';

/** --threads and --kernel as commander hands them over. */
export interface ThreadCliOptions {
  threads?: string;
  kernel?: string;
}

/** The help of --threads, the same on every command that has it. */
export const THREADS_HELP = 'threads, 1 to 256 (default: all cores for a large job; small ones use one)';

/** Add --threads and, unless `kernel` is false, --kernel (the options of a sweep). */
export function addThreadOptions(command: Command, kernel = true): Command {
  command.option('--threads <n>', THREADS_HELP);
  if (kernel)
    command.option(
      '--kernel <kernel>',
      'sweep kernel: auto (WebAssembly SIMD where available), wasm or js',
      'auto',
    );
  return command;
}

/** The value of --threads: a whole number from 1 to 256. */
export function parseThreads(text: string): number {
  return wholeNumber('--threads', text, 1, 256);
}

/** --threads and --kernel of a sweep, each auto unless given. */
export function sweepFromOptions(options: ThreadCliOptions): {
  threads: number | 'auto';
  kernel: SweepKernel;
} {
  const kernel = options.kernel ?? 'auto';
  if (kernel !== 'auto' && kernel !== 'wasm' && kernel !== 'js') {
    throw usageError(`--kernel '${kernel}': use auto, wasm or js`);
  }
  return { threads: options.threads === undefined ? 'auto' : parseThreads(options.threads), kernel };
}
