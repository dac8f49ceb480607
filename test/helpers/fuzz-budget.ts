/**
 * How many cases each fuzz test runs. The fixed-seed run in `npm test` is small; `npm run fuzz`
 * (scripts/fuzz.mjs) sets QUAKESWEEP_FUZZ_SCALE to run the long campaign with the same code, and
 * QUAKESWEEP_FUZZ_REPORT to a file where each test appends its figures.
 */
import { appendFileSync } from 'node:fs';

const scale = Number(process.env.QUAKESWEEP_FUZZ_SCALE ?? '1');

export const FUZZ_SEED = Number(process.env.QUAKESWEEP_FUZZ_SEED ?? '20250611');

/** `base` cases in the quick run, `base × scale` in the long one (the scale capped at `maxScale`). */
export function runs(base: number, maxScale = Number.POSITIVE_INFINITY): number {
  const factor = Number.isFinite(scale) && scale > 0 ? Math.min(scale, maxScale) : 1;
  return Math.max(1, Math.round(base * factor));
}

/** Append one line of figures to the long run's report (nothing in the quick run). */
export function report(name: string, figures: Record<string, unknown>): void {
  const file = process.env.QUAKESWEEP_FUZZ_REPORT;
  if (file !== undefined && file !== '') appendFileSync(file, `${JSON.stringify({ name, ...figures })}\n`);
}
