import { inputError } from '../base/errors.js';
import { ec8DampingCorrection } from './design.js';
import type { Spectrum } from './spectrum.js';

/**
 * Newmark and Hall (1982) median (50th percentile) spectrum amplification factors for horizontal
 * motion, with ξ the damping ratio in percent (Newmark, N. M. and Hall, W. J., Earthquake Spectra
 * and Design, EERI 1982; coefficients from memory):
 *
 *   acceleration  α_A = 3.21 − 0.68 ln ξ
 *   velocity      α_V = 2.31 − 0.41 ln ξ
 *   displacement  α_D = 1.82 − 0.27 ln ξ
 *
 * Undefined (null) at ξ = 0 and wherever the regression falls to 0 or below (very high damping).
 */
export interface AmplificationFactors {
  acceleration: number | null;
  velocity: number | null;
  displacement: number | null;
}

export function newmarkHallFactors(damping: number): AmplificationFactors {
  const percent = 100 * damping;
  const factor = (a: number, b: number): number | null => {
    if (!(percent > 0)) return null;
    const value = a - b * Math.log(percent);
    return value > 0 ? value : null;
  };
  return {
    acceleration: factor(3.21, 0.68),
    velocity: factor(2.31, 0.41),
    displacement: factor(1.82, 0.27),
  };
}

/** Published factors at ξ divided by the same factors at the reference damping. */
export interface PublishedDampingRatios {
  damping: number;
  /** Eurocode 8 η(ξ)/η(ξ_ref) (EN 1998-1 §3.2.2.2, Eq. 3.6; η = 1 at 5%). */
  ec8Eta: number;
  /** Newmark–Hall (1982) median amplification factors at ξ over those at ξ_ref. */
  newmarkHall: AmplificationFactors;
}

export function publishedDampingRatios(damping: number, referenceDamping: number): PublishedDampingRatios {
  const here = newmarkHallFactors(damping);
  const there = newmarkHallFactors(referenceDamping);
  const ratio = (a: number | null, b: number | null) => (a === null || b === null ? null : a / b);
  return {
    damping,
    ec8Eta: ec8DampingCorrection(damping) / ec8DampingCorrection(referenceDamping),
    newmarkHall: {
      acceleration: ratio(here.acceleration, there.acceleration),
      velocity: ratio(here.velocity, there.velocity),
      displacement: ratio(here.displacement, there.displacement),
    },
  };
}

/** One damping ratio's PSA and its ratio to the reference damping's PSA, period by period. */
export interface DampingCurveComparison {
  damping: number;
  /** PSA, m/s². */
  psaMS2: Float64Array;
  /** PSA(ξ)/PSA(ξ_ref) at each period; NaN where the reference PSA is 0. */
  ratio: Float64Array;
  /** Geometric mean of the ratio over the periods above 0 s (NaN if there are none). */
  geometricMeanRatio: number;
  published: PublishedDampingRatios;
}

export interface DampingComparison {
  referenceDamping: number;
  periodsS: Float64Array;
  curves: DampingCurveComparison[];
}

/**
 * The record's PSA at each damping ratio of `spectrum` divided by its PSA at the reference damping
 * (5% by default), period by period, beside the published damping factors of Eurocode 8 and
 * Newmark–Hall (1982) for the same ratios. The spectrum must include the reference damping.
 */
export function compareDamping(spectrum: Spectrum, referenceDamping = 0.05): DampingComparison {
  const reference = spectrum.curves.find((curve) => Math.abs(curve.damping - referenceDamping) < 1e-12);
  if (reference === undefined) {
    throw inputError(`the spectrum has no ${100 * referenceDamping}% curve to compare with`);
  }
  const periodsS = spectrum.periodsS;
  const curves = spectrum.curves.map((curve) => {
    const ratio = new Float64Array(periodsS.length);
    let logSum = 0;
    let count = 0;
    for (let p = 0; p < periodsS.length; p++) {
      const base = reference.psaMS2[p];
      ratio[p] = base > 0 ? curve.psaMS2[p] / base : Number.NaN;
      if (periodsS[p] > 0 && ratio[p] > 0) {
        logSum += Math.log(ratio[p]);
        count++;
      }
    }
    return {
      damping: curve.damping,
      psaMS2: curve.psaMS2,
      ratio,
      geometricMeanRatio: count > 0 ? Math.exp(logSum / count) : Number.NaN,
      published: publishedDampingRatios(curve.damping, referenceDamping),
    };
  });
  return { referenceDamping, periodsS, curves };
}
