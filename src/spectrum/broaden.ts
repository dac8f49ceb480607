import { inputError } from '../base/errors.js';
import { interpolateSpectrum } from './interpolate.js';
import type { Spectrum, SpectrumCurve } from './spectrum.js';

/**
 * Peak broadening of an in-structure spectrum (US NRC Regulatory Guide 1.122, from memory: each
 * peak is widened by ±15% of its frequency to cover uncertainty in the structure's frequencies).
 * Reading used here: the broadened value at T is the largest value of the unbroadened spectrum
 * over the window [T(1 − b), T/(1 − b)], b = 0.15 by default. A peak at T_p then becomes a plateau
 * from T_p(1 − b) to T_p/(1 − b), which covers ±b both in period and in frequency (a little wider
 * than either alone). The guide's further smoothing of valleys is not done. T = 0 is left as is.
 * The result is never below the unbroadened spectrum (T itself lies in its window).
 */
export function checkBroadening(fraction: number): void {
  if (!(fraction >= 0) || !(fraction < 1))
    throw inputError(`the broadening must be a fraction 0 ≤ b < 1, got ${fraction}`);
}

/**
 * Broadening of a spectrum known only on its grid (checkBroadening for the rule): the window's end
 * values are interpolated log–log so that a coarse grid does not narrow it, but a peak between
 * grid points is missed. Spectra that can be computed at any period use broadenByEvaluation.
 */
export function broadenCurve(
  periodsS: ArrayLike<number>,
  values: ArrayLike<number>,
  fraction = 0.15,
): Float64Array {
  checkBroadening(fraction);
  return Float64Array.from(periodsS, (t, i) => {
    if (t === 0) return values[i];
    const low = t * (1 - fraction);
    const high = t / (1 - fraction);
    let peak = values[i];
    for (let j = 0; j < periodsS.length; j++) {
      if (periodsS[j] >= low && periodsS[j] <= high && values[j] > peak) peak = values[j];
    }
    return Math.max(peak, valueAt(periodsS, values, low), valueAt(periodsS, values, high));
  });
}

/** The spectrum at a window's end, on the positive part of the grid; −∞ elsewhere (so it never wins a max). */
function valueAt(periodsS: ArrayLike<number>, values: ArrayLike<number>, t: number): number {
  const found = interpolateSpectrum(periodsS, values, t);
  return found && periodsS[found.lo] > 0 ? found.value : Number.NEGATIVE_INFINITY;
}

/**
 * A spectrum with its PSA, SV and SA replaced by broadened curves, SD = PSA/ω² and PSV = PSA/ω
 * taken from the broadened PSA so that the three stay consistent.
 */
function withBroadened(
  spectrum: Spectrum,
  broadened: (curve: SpectrumCurve, d: number) => Pick<SpectrumCurve, 'psaMS2' | 'svMS' | 'saMS2'>,
): Spectrum {
  const periods = spectrum.periodsS;
  const curves: SpectrumCurve[] = spectrum.curves.map((curve, d) => {
    const { psaMS2, svMS, saMS2 } = broadened(curve, d);
    const sdM = new Float64Array(periods.length);
    const psvMS = new Float64Array(periods.length);
    for (let p = 0; p < periods.length; p++) {
      if (periods[p] === 0) continue;
      const omega = (2 * Math.PI) / periods[p];
      psvMS[p] = psaMS2[p] / omega;
      sdM[p] = psaMS2[p] / (omega * omega);
    }
    return { damping: curve.damping, sdM, psvMS, psaMS2, svMS, saMS2 };
  });
  return { ...spectrum, curves };
}

/** broadenCurve on each of a spectrum's PSA, SV and SA (withBroadened). */
export function broadenSpectrum(spectrum: Spectrum, fraction = 0.15): Spectrum {
  return withBroadened(spectrum, (curve) => ({
    psaMS2: broadenCurve(spectrum.periodsS, curve.psaMS2, fraction),
    svMS: broadenCurve(spectrum.periodsS, curve.svMS, fraction),
    saMS2: broadenCurve(spectrum.periodsS, curve.saMS2, fraction),
  }));
}

/** Peaks of one oscillator (period T > 0, damping ζ), from whatever computes the spectrum. */
export type PeakEvaluator = (
  periodS: number,
  damping: number,
) => { sdM: number; svMS: number; saMS2: number };

export interface DenseBroadening {
  /** Periods > 0 of the internal grid the windows were searched on (the finest, for the lightest damping). */
  densePeriods: number;
  /** Local peaks refined between internal grid points (all curves and quantities). */
  refinedPeaks: number;
}

/** Largest spacing of the internal grid in ln T; finer where the damping is light (denseSpacing). */
export const DENSE_SPACING = 0.01;

/**
 * Internal grid spacing in ln T: the sharpest peak of a spectrum at damping ζ, the oscillator's
 * resonance with a narrow band of the input, is about 2ζ wide in ln T at half its power (the
 * half-power bandwidth, Chopra, Dynamics of Structures, §3.2.5, from memory), so a spacing of ζ
 * puts every such peak's top within about 11% of a sample; between 0.002 and DENSE_SPACING.
 */
export function denseSpacing(lightestDamping: number): number {
  return Math.min(DENSE_SPACING, Math.max(0.002, lightestDamping));
}

const quantities = ['psaMS2', 'svMS', 'saMS2'] as const;
type Quantity = (typeof quantities)[number];

/**
 * Broadening (checkBroadening for the rule) of a spectrum that can be computed at any period: the
 * windows are searched on a dense internal grid — the user's periods, every window's two ends,
 * `extraPeriods` (the building period), and log-spaced points `spacing(ζ)` apart in ln T, one grid
 * per damping ratio — and every
 * local peak of the internal grid that could decide a window is refined between its neighbours
 * (broadenedOnGrid), so that the broadened value is the window's true maximum to the accuracy of
 * `evaluate`, whatever the user's grid.
 * The result is reported on the spectrum's own periods.
 */
export function broadenByEvaluation(
  spectrum: Spectrum,
  fraction: number,
  evaluatePeak: PeakEvaluator,
  extraPeriods: readonly number[],
  spacing: (damping: number) => number,
): { spectrum: Spectrum; dense: DenseBroadening } {
  checkBroadening(fraction);
  const periods = spectrum.periodsS;
  const positive = Array.from(periods).filter((t) => t > 0);
  const dense: DenseBroadening = { densePeriods: 0, refinedPeaks: 0 };
  if (positive.length === 0 || fraction === 0) return { spectrum: withBroadened(spectrum, (c) => c), dense };
  const grids = spectrum.curves.map((curve) =>
    internalGrid(positive, fraction, extraPeriods, spacing(curve.damping)),
  );
  // The quantities of one damping refine the same local peaks from the same scan points.
  const memo = new Map<string, ReturnType<PeakEvaluator>>();
  const evaluate = (t: number, damping: number) => {
    const key = `${t} ${damping}`;
    let peak = memo.get(key);
    if (peak === undefined) {
      peak = evaluatePeak(t, damping);
      memo.set(key, peak);
    }
    return peak;
  };
  dense.densePeriods = Math.max(...grids.map((g) => g.length));
  const values = spectrum.curves.map((curve, d) => denseValues(grids[d], curve.damping, evaluate));
  const result = withBroadened(spectrum, (curve, d) => {
    const out = {} as Record<Quantity, Float64Array>;
    for (const quantity of quantities) {
      const at = (t: number) => quantityOf(evaluate(t, curve.damping), t, quantity);
      const found = broadenedOnGrid(periods, curve[quantity], fraction, grids[d], values[d][quantity], at);
      dense.refinedPeaks += found.refined;
      out[quantity] = found.values;
    }
    return out;
  });
  return { spectrum: result, dense };
}

/** The sorted internal grid: the periods, their windows' ends, the extra periods within reach, and the fill. */
function internalGrid(
  positive: number[],
  fraction: number,
  extra: readonly number[],
  spacing: number,
): Float64Array {
  const points = new Set<number>();
  for (const t of positive) {
    points.add(t);
    points.add(t * (1 - fraction));
    points.add(t / (1 - fraction));
  }
  const low = Math.min(...points);
  const high = Math.max(...points);
  for (const t of extra) if (t >= low && t <= high) points.add(t);
  const count = Math.ceil(Math.log(high / low) / spacing);
  for (let i = 1; i < count; i++) points.add(low * Math.exp((i * Math.log(high / low)) / count));
  return Float64Array.from(points).sort();
}

function quantityOf(peak: ReturnType<PeakEvaluator>, periodS: number, quantity: Quantity): number {
  if (quantity === 'psaMS2') {
    const omega = (2 * Math.PI) / periodS;
    return omega * omega * peak.sdM;
  }
  return peak[quantity];
}

function denseValues(
  grid: Float64Array,
  damping: number,
  evaluate: PeakEvaluator,
): Record<Quantity, Float64Array> {
  const out = {
    psaMS2: new Float64Array(grid.length),
    svMS: new Float64Array(grid.length),
    saMS2: new Float64Array(grid.length),
  };
  for (let i = 0; i < grid.length; i++) {
    const peak = evaluate(grid[i], damping);
    for (const quantity of quantities) out[quantity][i] = quantityOf(peak, grid[i], quantity);
  }
  return out;
}

/**
 * Golden-section steps in ln T around the best point of the scan: 0.618^14 ≈ 1.2e-3 of its bracket,
 * a quarter of a grid spacing, so within 3e-6 in ln T of the top (where a smooth peak of
 * half-power width 2ζ is within 1e-4 of its value even at ζ = 0.002).
 */
const GOLDEN_STEPS = 14;

/** Points scanned between a local peak's grid neighbours before the golden-section search. */
const SCAN_POINTS = 5;

/**
 * How far below the window's largest sample a local peak's sample may lie and still be refined:
 * with the grid no coarser than the lightest damping in ln T (denseSpacing), a resonant peak's
 * samples are within about 11% of its top (half a spacing off a peak of half-power width 2ζ).
 */
const REFINE_WITHIN = 0.85;

interface Refined {
  periodS: number;
  value: number;
}

/**
 * Broadened values on `periods`: for each window, the largest sample on the internal grid (its
 * ends are grid points), raised by the local peaks inside it that could top it, refined (once
 * each) by refinePeak, from the highest sample down.
 */
function broadenedOnGrid(
  periods: Float64Array,
  own: ArrayLike<number>,
  fraction: number,
  grid: Float64Array,
  sampled: Float64Array,
  at: (t: number) => number,
): { values: Float64Array; refined: number } {
  const peaks: number[] = [];
  for (let j = 1; j < grid.length - 1; j++)
    if (sampled[j] >= sampled[j - 1] && sampled[j] >= sampled[j + 1]) peaks.push(j);
  const cache = new Map<number, Refined>();
  const values = Float64Array.from(periods, (t, p) => {
    if (t === 0) return own[p];
    const low = t * (1 - fraction);
    const high = t / (1 - fraction);
    let best = Number.NEGATIVE_INFINITY;
    for (let i = 0; i < grid.length; i++)
      if (grid[i] >= low && grid[i] <= high) best = Math.max(best, sampled[i]);
    const candidates = peaks
      .filter((j) => grid[j] >= low && grid[j] <= high && sampled[j] >= REFINE_WITHIN * best)
      .sort((x, y) => sampled[y] - sampled[x]);
    for (const j of candidates) {
      if (sampled[j] < REFINE_WITHIN * best) break;
      let peak = cache.get(j);
      if (peak === undefined) {
        peak = refinePeak(grid, sampled, j, at);
        cache.set(j, peak);
      }
      if (peak.periodS >= low && peak.periodS <= high) best = Math.max(best, peak.value);
    }
    return best;
  });
  return { values, refined: cache.size };
}

/**
 * The top of the local peak at grid point j: the bracket between its neighbours scanned at
 * SCAN_POINTS points (the curve is a maximum over the record's cycles, so it can hold kinks and
 * several close peaks between two grid points), then a golden-section search in ln T around the
 * best point; the largest value met is kept, so the result is never below the sample.
 */
function refinePeak(
  grid: Float64Array,
  sampled: Float64Array,
  j: number,
  at: (t: number) => number,
): Refined {
  const ratio = (Math.sqrt(5) - 1) / 2;
  let best: Refined = { periodS: grid[j], value: sampled[j] };
  const probe = (x: number) => {
    const t = Math.exp(x);
    const value = at(t);
    if (value > best.value) best = { periodS: t, value };
    return value;
  };
  const lo = Math.log(grid[j - 1]);
  const hi = Math.log(grid[j + 1]);
  const scan = Array.from({ length: SCAN_POINTS + 2 }, (_, i) => lo + ((hi - lo) * i) / (SCAN_POINTS + 1));
  let top = 0;
  for (let i = 1; i <= SCAN_POINTS; i++) if (probe(scan[i]) >= best.value) top = i;
  // Around the best scanned point, or around the grid point itself when no scanned point beat it.
  const centre = Math.log(grid[j]);
  let a = top > 0 ? scan[top - 1] : Math.max(...scan.filter((x) => x < centre));
  let b = top > 0 ? scan[top + 1] : Math.min(...scan.filter((x) => x > centre));
  let x1 = b - ratio * (b - a);
  let x2 = a + ratio * (b - a);
  let f1 = probe(x1);
  let f2 = probe(x2);
  for (let step = 0; step < GOLDEN_STEPS; step++) {
    if (f1 >= f2) {
      b = x2;
      x2 = x1;
      f2 = f1;
      x1 = b - ratio * (b - a);
      f1 = probe(x1);
    } else {
      a = x1;
      x1 = x2;
      f1 = f2;
      x2 = a + ratio * (b - a);
      f2 = probe(x2);
    }
  }
  return best;
}
