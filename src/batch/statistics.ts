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
  p16_psa_g: (number | null)[];
  p84_psa_g: (number | null)[];
}

/** How the statistics are computed, stated in suite.json. */
export const STATISTICS_METHOD =
  'mean: arithmetic mean of PSA; median, p16, p84: log-normal fit, exp(m), exp(m − s), exp(m + s) with m the mean ' +
  'and s the sample standard deviation (n − 1) of ln PSA over the records; records taken in order of name; null ' +
  'where a PSA is 0 or, for p16 and p84, with fewer than two records';

/**
 * Mean, median and 16th/84th percentiles of PSA across records at every period and damping, the
 * percentiles from a log-normal fit (common practice for suites of ground motions: ln PSA taken as
 * normal, so the median is exp(mean ln PSA) and the 16th and 84th percentiles are one standard
 * deviation below and above it). The records are taken sorted by name, so the sums run in the same
 * order in a single run and in a merge of shards, and the results agree to the last digit.
 */
export function suiteStatistics(
  records: readonly RecordPsa[],
  dampings: readonly number[],
  periodCount: number,
): SuiteCurve[] {
  const sorted = [...records].sort((a, b) => compareText(a.name, b.name));
  const n = sorted.length;
  return dampings.map((damping, d) => {
    const curve: SuiteCurve = { damping, mean_psa_g: [], median_psa_g: [], p16_psa_g: [], p84_psa_g: [] };
    if (n === 0) return curve;
    for (let p = 0; p < periodCount; p++) {
      let sum = 0;
      let logSum = 0;
      let positive = true;
      for (const record of sorted) {
        const value = record.psaG[d][p];
        sum += value;
        if (value > 0) logSum += Math.log(value);
        else positive = false;
      }
      curve.mean_psa_g.push(sum / n);
      const m = logSum / n;
      curve.median_psa_g.push(positive ? Math.exp(m) : null);
      let squares = 0;
      if (positive && n >= 2) {
        for (const record of sorted) {
          const deviation = Math.log(record.psaG[d][p]) - m;
          squares += deviation * deviation;
        }
      }
      const s = positive && n >= 2 ? Math.sqrt(squares / (n - 1)) : null;
      curve.p16_psa_g.push(s === null ? null : Math.exp(m - s));
      curve.p84_psa_g.push(s === null ? null : Math.exp(m + s));
    }
    return curve;
  });
}
