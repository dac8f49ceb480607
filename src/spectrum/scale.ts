import { inputError, usageError } from '../base/errors.js';
import { formatNumber } from '../base/numbers.js';
import { type GroundRecord, type ProcessingStep, withProcessing } from '../record/record.js';
import { coversPeriod, type DesignSpectrum } from './design.js';
import type { Spectrum, SpectrumCurve } from './spectrum.js';
import { targetCurveOverlay } from './target-curve.js';

/** The criterion scaleToTarget applies, as stated in every output that uses it. */
export const SCALE_CRITERION =
  'least squares in ln PSA over the grid periods in the range: factor = exp(mean(ln target − ln record)); ' +
  'ratios are factor × record / target, so their geometric mean is 1';

/** How well a record, scaled by `factor`, matches a target over a period range. */
export interface ScaleResult {
  /** The amplitude factor that makes the record match the target best. */
  factor: number;
  /** The period range used, s (the first and last grid periods in it). */
  rangeS: [number, number];
  /** Grid periods used. */
  periodCount: number;
  /** Arithmetic mean, least and greatest of factor × record PSA / target PSA over those periods. */
  meanRatio: number;
  minRatio: number;
  maxRatio: number;
  criterion: string;
}

/**
 * The amplitude factor c minimising Σ (ln target(Tᵢ) − ln(c · PSA(Tᵢ)))² over the grid periods Tᵢ
 * in the range, which is c = exp(mean(ln target − ln PSA)) (least squares on log spectral values;
 * common practice for amplitude scaling of records to a target spectrum). `rangeS` is the period
 * range [from, to], s, both included; by default every grid period above 0 the target covers.
 */
export function scaleToTarget(
  periodsS: ArrayLike<number>,
  recordPsaG: ArrayLike<number>,
  target: DesignSpectrum,
  options: { rangeS?: readonly [number, number] } = {},
): ScaleResult {
  const used: number[] = [];
  const range = options.rangeS;
  for (let i = 0; i < periodsS.length; i++) {
    const t = periodsS[i];
    if (range === undefined ? t > 0 && coversPeriod(target, t) : t >= range[0] && t <= range[1]) used.push(i);
  }
  if (used.length === 0) {
    throw inputError(
      range === undefined
        ? 'no period of the grid above 0 s lies where the target is defined'
        : `no period of the grid lies in the scaling range ${range[0]}–${range[1]} s`,
    );
  }
  let sum = 0;
  for (const i of used) {
    const t = periodsS[i];
    if (!coversPeriod(target, t)) {
      throw inputError(
        `the scaling range reaches T = ${formatNumber(t)} s, outside the target (defined from ${target.minPeriodS} s to ${target.maxPeriodS} s)`,
      );
    }
    if (!(recordPsaG[i] > 0))
      throw inputError(`the record's PSA is 0 at T = ${t} s; it cannot be scaled there`);
    sum += Math.log(target.psaG(t)) - Math.log(recordPsaG[i]);
  }
  const factor = Math.exp(sum / used.length);
  const ratios = used.map((i) => (factor * recordPsaG[i]) / target.psaG(periodsS[i]));
  return {
    factor,
    rangeS: [periodsS[used[0]], periodsS[used[used.length - 1]]],
    periodCount: used.length,
    meanRatio: ratios.reduce((sum, ratio) => sum + ratio, 0) / used.length,
    minRatio: Math.min(...ratios),
    maxRatio: Math.max(...ratios),
    criterion: SCALE_CRITERION,
  };
}

/** Parse `a:b`, a period range in seconds with 0 ≤ a < b, given as `option` (named in the refusal). */
export function parseScaleRange(text: string, option = '--scale-range'): [number, number] {
  const parts = text.split(':');
  const [from, to] = parts.map((part) => (part.trim() === '' ? Number.NaN : Number(part)));
  if (parts.length !== 2 || !(from >= 0) || !(to > from) || !Number.isFinite(to)) {
    throw usageError(`${option} '${text}': use a:b in seconds with 0 ≤ a < b, e.g. 0.2:1.5`);
  }
  return [from, to];
}

/** The processing step that records an amplitude scaling. */
export function scaleStep(result: ScaleResult, target: DesignSpectrum): ProcessingStep {
  return {
    operation: 'scale',
    description: `amplitude × ${formatNumber(result.factor)} to match the ${target.code} target over ${formatNumber(result.rangeS[0])}–${formatNumber(result.rangeS[1])} s (least squares in ln PSA)`,
    parameters: {
      factor: result.factor,
      range_from_s: result.rangeS[0],
      range_to_s: result.rangeS[1],
      target: target.description,
    },
  };
}

/** The record with every sample multiplied by `factor`, the step on its list. */
export function scaleRecord(record: GroundRecord, factor: number, step: ProcessingStep): GroundRecord {
  return withProcessing(
    record,
    record.accelMS2.map((value) => value * factor),
    step,
  );
}

/**
 * The spectrum of the record scaled by `factor` (> 0), without sweeping again: the oscillator is
 * linear and starts from rest, so every response, and every peak, scales by the same factor.
 */
export function scaleSpectrum(spectrum: Spectrum, factor: number, step: ProcessingStep): Spectrum {
  if (!(factor > 0) || !Number.isFinite(factor))
    throw inputError(`scale factor must be positive, got ${factor}`);
  const times = (values: Float64Array) => values.map((value) => value * factor);
  const curves: SpectrumCurve[] = spectrum.curves.map((curve) => ({
    damping: curve.damping,
    sdM: times(curve.sdM),
    psvMS: times(curve.psvMS),
    psaMS2: times(curve.psaMS2),
    svMS: times(curve.svMS),
    saMS2: times(curve.saMS2),
  }));
  return {
    ...spectrum,
    record: {
      ...spectrum.record,
      pgaMS2: spectrum.record.pgaMS2 * factor,
      processing: [...spectrum.record.processing, step],
    },
    curves,
  };
}

/** A curve for the PSA figure of a scaled record: PSA in g at periods in s, with the range it was fitted over. */
export interface ScaleOverlay {
  label: string;
  periodsS: number[];
  psaG: number[];
  /** The fitting range, s, for the figure to shade (the target's overlay carries it). */
  rangeS?: [number, number];
}

/**
 * What the PSA figure draws for a fit: the target over the periods it covers, with the fitting
 * range; and, when the factor was not applied, the record's curve at the fit's damping times the
 * factor, so that the fit can be seen (when applied, the record's curves are already scaled).
 */
export function scaleOverlays(
  periodsS: ArrayLike<number>,
  recordPsaG: ArrayLike<number>,
  fit: ScaleResult & {
    target: DesignSpectrum;
    psaG: readonly (number | null)[];
    description: string;
    applied: boolean;
    damping: number;
  },
): ScaleOverlay[] {
  const overlays: ScaleOverlay[] = [{ ...targetCurveOverlay(fit, periodsS), rangeS: fit.rangeS }];
  if (!fit.applied) {
    overlays.push({
      label: `record × ${formatNumber(fit.factor)} (ζ = ${formatNumber(100 * fit.damping, 6)}%, not applied)`,
      periodsS: Array.from(periodsS),
      psaG: Array.from(recordPsaG, (value) => value * fit.factor),
    });
  }
  return overlays;
}
