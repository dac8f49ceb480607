/**
 * How many cases the outside checks of the yielding oscillator run (test/reference/yielding-*.ts).
 * The quick run in `npm test` takes a spread subset; QUAKESWEEP_REFERENCE_FULL=1 runs every case
 * with the same code, and QUAKESWEEP_REFERENCE_REPORT names a file where each case appends its
 * figures (one JSON line each).
 */
import { appendFileSync } from 'node:fs';

export const FULL_REFERENCE = process.env.QUAKESWEEP_REFERENCE_FULL === '1';

/** Append one line of figures to the report file (nothing when none is named). */
export function reportReference(name: string, figures: Record<string, unknown>): void {
  const file = process.env.QUAKESWEEP_REFERENCE_REPORT;
  if (file !== undefined && file !== '') appendFileSync(file, `${JSON.stringify({ name, ...figures })}\n`);
}
