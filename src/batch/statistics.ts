import { compareText } from './glob.js';

/** One record's PSA, g, per damping ratio (outer) and period (inner). */
export interface RecordPsa {
  name: string;
  psaG: number[][];
}

/** The suite's statistics at one damping ratio, by period; null where they are not defined. */
export interface SuiteCurve {
  damping: number;
  mean_psa_g: number[];
  median_psa_g: (number | null)[];
  /** The sample standard deviation (n − 1) of ln PSA over the records. */
  sigma_ln_psa: (number | null)[];
  p16_psa_g: (number | null)[];
  p84_psa_g: (number | null)[];
}

/** How the statistics are computed, stated in suite.json. */
export const STATISTICS_METHOD =
  'mean: arithmetic mean of PSA; median, p16, p84: log-normal fit, exp(m), exp(m − s), exp(m + s) with m the mean ' +
  'and s (sigma_ln_psa) the sample standard deviation (n − 1) of ln PSA over the records; records taken in order ' +
  'of name; null where a PSA is 0 or, for s, p16 and p84, with fewer than two records';

/**
 * Mean, median and 16th/84th percentiles of PSA across records at every period and damping, from a
 * log-normal fit (common practice for suites of ground motions: ln PSA taken as normal, the
 * percentiles one standard deviation off). Records are sorted by name, so that a single run and a
 * merge of shards sum in the same order and agree to the last digit.
 */
export function suiteStatistics(
  records: readonly RecordPsa[],
  dampings: readonly number[],
  periodCount: number,
): SuiteCurve[] {
  const sorted = [...records].sort((a, b) => compareText(a.name, b.name));
  const n = sorted.length;
  return dampings.map((damping, d) => {
    const curve: SuiteCurve = {
      damping,
      mean_psa_g: [],
      median_psa_g: [],
      sigma_ln_psa: [],
      p16_psa_g: [],
      p84_psa_g: [],
    };
    if (n === 0) return curve;
    for (let p = 0; p < periodCount; p++) {
      const values = sorted.map((record) => record.psaG[d][p]);
      curve.mean_psa_g.push(sum(values) / n);
      const positive = values.every((value) => value > 0);
      const logs = values.map(Math.log);
      const m = sum(logs) / n;
      curve.median_psa_g.push(positive ? Math.exp(m) : null);
      const s = positive && n >= 2 ? Math.sqrt(sum(logs.map((l) => (l - m) * (l - m))) / (n - 1)) : null;
      curve.sigma_ln_psa.push(s);
      curve.p16_psa_g.push(s === null ? null : Math.exp(m - s));
      curve.p84_psa_g.push(s === null ? null : Math.exp(m + s));
    }
    return curve;
  });
}

/** The sum from the first term to the last. */
function sum(values: readonly number[]): number {
  let total = 0;
  for (const value of values) total += value;
  return total;
}
