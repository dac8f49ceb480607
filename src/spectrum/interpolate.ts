/** How a value was read off a tabulated spectrum. */
export interface Interpolated {
  value: number;
  /** 'point': a row of the table itself; 'linear': linear in T; 'log-log': linear in log T and log S. */
  rule: 'point' | 'linear' | 'log-log';
  /** The rows the value was read from (the same row twice for a point). */
  lo: number;
  hi: number;
}

/**
 * A value of a tabulated spectrum S(T) at period T (s), periods strictly increasing. Between two
 * rows it is interpolated linearly in log T and log S, i.e. along straight lines on the log–log
 * plot where spectra are drawn (the usual rule for tabulated spectra; common practice). Where
 * that is undefined it is linear in T instead: between a T = 0 row (the PGA) and the next, and
 * next to a value that is not positive. A T within `tolerance` (relative, at least 1 s absolute
 * scale) of a row takes that row's value as is. Outside the table nothing is extrapolated: the
 * result is undefined, and each caller says what that means for it.
 */
export function interpolateSpectrum(
  periodsS: ArrayLike<number>,
  values: ArrayLike<number>,
  periodS: number,
  tolerance = 0,
): Interpolated | undefined {
  const n = periodsS.length;
  if (n === 0) return undefined;
  const at = (row: number): Interpolated | undefined =>
    Math.abs(periodsS[row] - periodS) <= tolerance * Math.max(1, periodS)
      ? { value: values[row], rule: 'point', lo: row, hi: row }
      : undefined;
  const edge = at(0) ?? at(n - 1);
  if (edge) return edge;
  if (!(periodS > periodsS[0] && periodS < periodsS[n - 1])) return undefined;
  let lo = 0;
  let hi = n - 1;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (periodsS[mid] <= periodS) lo = mid;
    else hi = mid;
  }
  const row = at(lo) ?? at(hi);
  if (row) return row;
  const t0 = periodsS[lo];
  const t1 = periodsS[hi];
  const v0 = values[lo];
  const v1 = values[hi];
  if (t0 === 0 || !(v0 > 0) || !(v1 > 0)) {
    return { value: v0 + ((v1 - v0) * (periodS - t0)) / (t1 - t0), rule: 'linear', lo, hi };
  }
  const fraction = Math.log(periodS / t0) / Math.log(t1 / t0);
  return { value: Math.exp(Math.log(v0) + fraction * Math.log(v1 / v0)), rule: 'log-log', lo, hi };
}
