import { inputError } from '../base/errors.js';
import type { Hysteresis } from './hysteresis.js';
import { substepsFor, yieldingPeak } from './yielding.js';

/** The achieved ductility is accepted within this fraction of the target: |μ_a − μ|/μ ≤ 0.5%. */
export const DUCTILITY_TOLERANCE = 0.005;
/** Bisection stops, short of the tolerance, when the bracket is this narrow: f̄_hi/f̄_lo − 1 ≤ 1e-4. */
export const STRENGTH_RESOLUTION = 1e-4;
/** The scan's grid of normalised strengths: f̄_y = 0.9^k, k = 1, 2, …, down to MIN_STRENGTH. */
export const SCAN_RATIO = 0.9;
/** The weakest normalised strength scanned; a target not reached above it is refused. */
export const MIN_STRENGTH = 1e-3;

/** How the search picks one strength where several give the target ductility (stated in outputs). */
export const STRENGTH_CONVENTION =
  'largest strength: f̄y = fy/fo is scanned from 1 down on the grid 0.9^k; the first grid interval ' +
  'where the ductility reaches the target is bisected (in log f̄y) until the achieved ductility is ' +
  'within 0.5% of the target; where the ductility jumps across the target (no strength gives it to ' +
  'within 0.5%), the strength just above the jump (to 1e-4) is reported with its achieved ductility';

/** One oscillator: period, damping, model; and its elastic peak. */
export interface StrengthCell {
  periodS: number;
  damping: number;
  model: Hysteresis;
  /** Sub-steps per record step (substepsFor), the same for every run of the cell. */
  substeps: number;
  /**
   * The elastic peak u_o the strengths are normalised by, m; default the yielding oscillator's own
   * never-yielding run. The spectra pass the elastic engine's (pre-warped, within 0.3% of exact),
   * since R_y = u_o/u_y carries any error of u_o whole.
   */
  elasticPeakM?: number;
}

/** The strengths found for each target ductility of one cell (arrays indexed like `ductilities`). */
export interface CellStrengths {
  /** Elastic peak u_o, m. */
  elasticPeakM: number;
  /** Normalised yield strength f̄_y = f_y/f_o = u_y/u_o. */
  strengthRatio: Float64Array;
  /** Peak displacement u_m at that strength, m. */
  peakM: Float64Array;
  /** Achieved ductility u_m/u_y. */
  achieved: Float64Array;
  /** Oscillator runs the search took (the elastic one included). */
  runs: number;
}

/** The cell of one oscillator, with the sub-step rule applied for this record. */
export function strengthCell(
  periodS: number,
  damping: number,
  model: Hysteresis,
  dtS: number,
  roughness: number,
  elasticPeakM?: number,
): StrengthCell {
  return { periodS, damping, model, substeps: substepsFor(periodS, damping, dtS, roughness), elasticPeakM };
}

/**
 * For each target ductility μ ≥ 1, the largest yield strength whose peak ductility demand is μ
 * (STRENGTH_CONVENTION). The scan is shared by every target of the cell; a run whose |u| passes
 * the largest target still open (times 1 + tolerance) stops there, as does a bisection run past its
 * target, since only the side of the target matters then. μ = 1 is f̄_y = 1 (the elastic peak).
 */
export function strengthsForDuctilities(
  accelMS2: Float64Array,
  dtS: number,
  cell: StrengthCell,
  ductilities: ArrayLike<number>,
): CellStrengths {
  const count = ductilities.length;
  const found: CellStrengths = {
    elasticPeakM: 0,
    strengthRatio: new Float64Array(count),
    peakM: new Float64Array(count),
    achieved: new Float64Array(count),
    runs: 0,
  };
  const run = (strength: number, stopDuctility: number) => {
    found.runs++;
    const uy = strength === Number.POSITIVE_INFINITY ? strength : strength * found.elasticPeakM;
    return yieldingPeak(accelMS2, dtS, {
      periodS: cell.periodS,
      damping: cell.damping,
      model: cell.model,
      yieldDisplacementM: uy,
      substeps: cell.substeps,
      stopAboveM: stopDuctility * uy,
    });
  };
  found.elasticPeakM =
    cell.elasticPeakM ?? run(Number.POSITIVE_INFINITY, Number.POSITIVE_INFINITY).peakDisplacementM;
  if (!(found.elasticPeakM > 0))
    throw inputError('the record does not move the oscillator: no strength to find');

  const settle = (index: number, strength: number, peakM: number, achieved: number) => {
    found.strengthRatio[index] = strength;
    found.peakM[index] = peakM;
    found.achieved[index] = achieved;
  };
  // Targets still without a bracket; each bracket is [lo, hi] with μ(lo) ≥ μ > μ(hi).
  const open: number[] = [];
  const brackets: { index: number; lo: number; hi: number; hiPeakM: number; hiAchieved: number }[] = [];
  for (let index = 0; index < count; index++) {
    if (ductilities[index] === 1) settle(index, 1, found.elasticPeakM, 1);
    else open.push(index);
  }
  let previous = { strength: 1, peakM: found.elasticPeakM, achieved: 1 };
  for (let k = 1; open.length > 0; k++) {
    const strength = SCAN_RATIO ** k;
    if (strength < MIN_STRENGTH) {
      const target = Math.min(...open.map((index) => ductilities[index]));
      throw inputError(
        `ductility ${target} is not reached at T = ${cell.periodS} s, ζ = ${cell.damping} above f̄y = ${MIN_STRENGTH}`,
      );
    }
    const widest = Math.max(...open.map((index) => ductilities[index]));
    const peak = run(strength, widest * (1 + DUCTILITY_TOLERANCE));
    const achieved = peak.ductility;
    for (let o = open.length - 1; o >= 0; o--) {
      const index = open[o];
      const target = ductilities[index];
      if (Math.abs(achieved - target) <= DUCTILITY_TOLERANCE * target) {
        settle(index, strength, peak.peakDisplacementM, achieved);
      } else if (achieved >= target) {
        brackets.push({
          index,
          lo: strength,
          hi: previous.strength,
          hiPeakM: previous.peakM,
          hiAchieved: previous.achieved,
        });
      } else continue;
      open.splice(o, 1);
    }
    previous = { strength, peakM: peak.peakDisplacementM, achieved };
  }

  for (const bracket of brackets) {
    const target = ductilities[bracket.index];
    let { lo, hi, hiPeakM, hiAchieved } = bracket;
    let settled = false;
    while (hi / lo - 1 > STRENGTH_RESOLUTION) {
      const middle = Math.sqrt(lo * hi);
      const peak = run(middle, target * (1 + DUCTILITY_TOLERANCE));
      if (Math.abs(peak.ductility - target) <= DUCTILITY_TOLERANCE * target) {
        settle(bracket.index, middle, peak.peakDisplacementM, peak.ductility);
        settled = true;
        break;
      }
      if (peak.ductility >= target) lo = middle;
      else {
        hi = middle;
        hiPeakM = peak.peakDisplacementM;
        hiAchieved = peak.ductility;
      }
    }
    if (!settled) settle(bracket.index, hi, hiPeakM, hiAchieved);
  }
  return found;
}
