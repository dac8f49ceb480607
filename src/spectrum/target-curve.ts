import { coversPeriod, type DesignSpectrum } from './design.js';

/** Points a decade of the drawn target curve: its corners fall within 1.2% of a point. */
const POINTS_PER_DECADE = 200;

/**
 * The target as a figure draws it: not only at the grid periods (where a grid that steps past the
 * target's end, e.g. 3.98 s then 4.22 s for Eurocode 8's 4 s, would cut the curve short and round
 * its corners), but at the grid periods it covers, a log-spaced fill over the part of the grid's
 * span where it is defined, both ends of that part, and a table's own periods.
 */
export function drawnTargetCurve(
  target: DesignSpectrum,
  gridPeriodsS: ArrayLike<number>,
): { periodsS: number[]; psaG: number[] } {
  const grid = Array.from(gridPeriodsS);
  const positive = grid.filter((t) => t > 0);
  const periods = new Set(grid.filter((t) => coversPeriod(target, t)));
  if (positive.length > 0) {
    const lo = Math.max(Math.min(...positive), target.minPeriodS);
    const hi = Math.min(Math.max(...positive), target.maxPeriodS);
    if (lo > 0 && hi >= lo) {
      periods.add(lo);
      periods.add(hi);
      const n = Math.ceil(Math.log10(hi / lo) * POINTS_PER_DECADE);
      for (let i = 1; i < n; i++) periods.add(lo * (hi / lo) ** (i / n));
      for (const t of target.tabulatedPeriodsS ?? []) if (t >= lo && t <= hi) periods.add(t);
    }
  }
  const periodsS = [...periods].filter((t) => coversPeriod(target, t)).sort((a, b) => a - b);
  return { periodsS, psaG: periodsS.map((t) => target.psaG(t)) };
}

/** The target as a figure's overlay: labelled by the first part of its description, drawn as above. */
export function targetCurveOverlay(
  fit: { target: DesignSpectrum; description: string },
  gridPeriodsS: ArrayLike<number>,
): { label: string; periodsS: number[]; psaG: number[] } {
  return {
    label: `target: ${fit.description.split(': ')[0]}`,
    ...drawnTargetCurve(fit.target, gridPeriodsS),
  };
}
