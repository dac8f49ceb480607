import { CAUTION } from '../base/caution.js';
import { printable } from '../base/printable.js';

/**
 * The two lines every successful command ends with on standard error: what was made and where it
 * went, then the caution (standard error, so that a product piped on standard output stays clean).
 */
export function announceSuccess(summary: string, written: readonly string[]): void {
  const where = written.length === 0 ? '' : `; wrote ${written.join(', ')}`;
  // Names and paths from the command line may hold terminal control sequences (see printable).
  process.stderr.write(`quakesweep: done: ${printable(`${summary}${where}`)}\n`);
  process.stderr.write(`quakesweep: caution: ${CAUTION}\n`);
}

/** "61 periods × 2 dampings": the size of a grid, for a summary. */
export function gridWords(periods: number, dampings: number): string {
  return `${count(periods, 'period')} × ${count(dampings, 'damping')}`;
}

/** "1 record", "3 records". */
export function count(n: number, noun: string): string {
  return `${n} ${noun}${n === 1 ? '' : 's'}`;
}
