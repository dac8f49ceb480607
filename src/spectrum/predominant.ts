import { logSpaced } from '../oscillator/grid.js';
import type { GroundRecord } from '../record/record.js';
import { responseSpectrum } from './spectrum.js';

/** The predominant period and the 5%-damped PSA peak it was read from. */
export interface PredominantPeriod {
  periodS: number;
  psaMS2: number;
  damping: number;
  /** The period grid searched: first, last, count (log-spaced). */
  grid: { fromS: number; toS: number; count: number };
}

/**
 * Predominant period T_p: the period of the largest 5%-damped pseudo-acceleration (Rathje,
 * Abrahamson and Bray 1998, §"Predominant period"), searched over 200 log-spaced periods from
 * 0.02 s to 10 s with the default oscillator method.
 */
export function predominantPeriod(
  record: GroundRecord,
  grid = { fromS: 0.02, toS: 10, count: 200 },
): PredominantPeriod {
  const periodsS = logSpaced(grid.fromS, grid.toS, grid.count);
  const spectrum = responseSpectrum(record, { periodsS, dampings: [0.05] });
  const psa = spectrum.curves[0].psaMS2;
  let best = 0;
  for (let p = 1; p < psa.length; p++) if (psa[p] > psa[best]) best = p;
  return { periodS: periodsS[best], psaMS2: psa[best], damping: 0.05, grid };
}
