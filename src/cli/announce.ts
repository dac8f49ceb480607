import { CAUTION } from '../base/caution.js';

/**
 * The two lines every successful command ends with on standard error: what was made and where it
 * went, then the caution (standard error, so that a product piped on standard output stays clean).
 */
export function announceSuccess(summary: string, written: readonly string[]): void {
  const where = written.length === 0 ? '' : `; wrote ${written.join(', ')}`;
  process.stderr.write(`quakesweep: done: ${summary}${where}\n`);
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
