import { inputError } from '../base/errors.js';

/** How the suite check is stated in every output that carries it. */
export const SUITE_CHECK_CRITERION =
  'the suite mean PSA (arithmetic mean over the records, of the scaled spectra when each record is scaled) ' +
  'divided by the target PSA at every grid period in the check range, both ends included; the suite passes ' +
  'when no ratio is below the fraction (common practice for suites of records; preliminary, not a code check)';

/** What the check is and is not, stated beside its result wherever it is shown. */
export const SUITE_CHECK_NOTE =
  'Preliminary: a screening of the suite mean against a fraction of the target at the grid periods, not the ' +
  'check of any code; the governing code, its record-selection rules and a licensed engineer decide.';

/** The check range of a structure of period T: 0.2T to 2T (common practice). */
export function structurePeriodRange(periodS: number): [number, number] {
  return [0.2 * periodS, 2 * periodS];
}

export interface SuiteCheckOptions {
  /** The least ratio of suite mean to target that passes, e.g. 0.9. */
  fraction: number;
  /** Periods checked, s: [from, to], both included. */
  rangeS: readonly [number, number];
  /** Where the range comes from, one line for the outputs (e.g. "0.2T–2T with T = 1 s"). */
  rangeSource: string;
}

export interface SuiteCheck {
  fraction: number;
  /** The range asked for, s. */
  rangeS: [number, number];
  rangeSource: string;
  /** The first and last grid periods in the range, s. */
  checkedRangeS: [number, number];
  periodCount: number;
  pass: boolean;
  /** The least ratio of suite mean to target in the range, and the period where it is. */
  worstRatio: number;
  worstPeriodS: number;
  /** Mean / target at every grid period where the target is defined (null elsewhere). */
  ratios: (number | null)[];
  /** Whether each grid period lies in the check range. */
  inRange: boolean[];
  criterion: string;
  /** Notes for a person (e.g. few grid periods in the range), written with the results. */
  warnings: string[];
}

/** Fewer grid periods than this in the check range earn a warning. */
const FEW_PERIODS = 8;

/**
 * Compare the suite mean with `fraction` × target at the grid periods in the range: the worst
 * (least) ratio and its period, pass when it is not below the fraction. Only grid periods are
 * checked, so the result is as fine as the grid; the target must be defined over the whole range.
 */
export function checkSuite(
  periodsS: ArrayLike<number>,
  meanPsaG: ArrayLike<number>,
  targetPsaG: readonly (number | null)[],
  options: SuiteCheckOptions,
): SuiteCheck {
  const { fraction, rangeS } = options;
  if (!(fraction > 0) || !Number.isFinite(fraction))
    throw inputError(`the check fraction must be above 0, got ${fraction}`);
  const ratios: (number | null)[] = [];
  const inRange: boolean[] = [];
  const used: number[] = [];
  for (let i = 0; i < periodsS.length; i++) {
    const t = periodsS[i];
    const target = targetPsaG[i];
    ratios.push(target === null || !(target > 0) ? null : meanPsaG[i] / target);
    const inside = t >= rangeS[0] && t <= rangeS[1];
    inRange.push(inside);
    if (!inside) continue;
    if (target === null)
      throw inputError(`the check range reaches T = ${t} s, where the target is not defined`);
    used.push(i);
  }
  if (used.length === 0)
    throw inputError(`no period of the grid lies in the check range ${rangeS[0]}–${rangeS[1]} s`);
  let worst = used[0];
  for (const i of used) if ((ratios[i] as number) < (ratios[worst] as number)) worst = i;
  const worstRatio = ratios[worst] as number;
  const warnings =
    used.length < FEW_PERIODS
      ? [
          `only ${used.length} grid period${used.length === 1 ? '' : 's'} in the check range; a finer --periods grid checks more`,
        ]
      : [];
  return {
    fraction,
    rangeS: [rangeS[0], rangeS[1]],
    rangeSource: options.rangeSource,
    checkedRangeS: [periodsS[used[0]], periodsS[used[used.length - 1]]],
    periodCount: used.length,
    pass: worstRatio >= fraction,
    worstRatio,
    worstPeriodS: periodsS[worst],
    ratios,
    inRange,
    criterion: SUITE_CHECK_CRITERION,
    warnings,
  };
}
