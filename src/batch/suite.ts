import { inputError, isQuakesweepError, usageError } from '../base/errors.js';
import { formatNumber } from '../base/numbers.js';
import { dampingWarnings } from '../oscillator/grid.js';
import { coversPeriod, type DesignSpectrum } from '../spectrum/design.js';
import { SCALE_CRITERION, type ScaleResult, scaleToTarget } from '../spectrum/scale.js';
import { compareText } from './glob.js';
import { type SuiteCurve, suiteStatistics } from './statistics.js';
import { checkSuite, type SuiteCheck, type SuiteCheckOptions } from './suite-check.js';

/** A record of a suite as the analysis needs it: PSA, g, per damping (outer) and period (inner). */
export interface SuiteMember {
  name: string;
  file: string;
  psaG: number[][];
  /** Peak ground acceleration as read and processed, g (absent in shard files of older versions). */
  pgaG?: number;
  /** What reading the record warned of (absent in shard files of older versions). */
  warnings?: string[];
}

/** What to do with a suite beyond its statistics. */
export interface SuiteAnalysisOptions {
  target?: DesignSpectrum;
  /** Scale every record to the target before the statistics. */
  scaleEach?: boolean;
  /** Periods over which each record is fitted, s (default: every grid period > 0 the target covers). */
  scaleRangeS?: readonly [number, number];
  /** The check of the suite mean against a fraction of the target. */
  check?: SuiteCheckOptions;
}

/** One record's scale factor and how well it fits, beside its name. */
export interface MemberScaling extends Omit<ScaleResult, 'criterion'> {
  name: string;
}

export interface SuiteAnalysis {
  /** Members sorted by name, their PSA scaled when `scaling` is present. */
  members: SuiteMember[];
  /** The warnings of the suite: dampings beyond the measured accuracy range, then each record's, "name: text". */
  warnings: string[];
  /** The factor applied to each member, in the order of `members` (1 when not scaled). */
  factors: number[];
  /** Statistics of the members' PSA as used (scaled when scaling). */
  statistics: SuiteCurve[];
  target?: {
    spectrum: DesignSpectrum;
    /** The damping ratio at which the target is compared (its own, else 5% or the only one). */
    damping: number;
    dampingIndex: number;
    /** Target PSA, g, at the grid periods (null where it is not defined). */
    psaG: (number | null)[];
  };
  scaling?: { criterion: string; records: MemberScaling[] };
  check?: SuiteCheck;
}

/**
 * The suite's statistics and, with a target, each record's amplitude scale factor to it
 * (scaleToTarget, least squares in ln PSA at the target's damping; the factor scales every
 * damping's PSA alike, as the oscillators are linear) and the check of the suite mean against a
 * fraction of the target (checkSuite).
 */
export function analyseSuite(
  records: readonly SuiteMember[],
  settings: { periodsS: readonly number[]; dampings: readonly number[] },
  options: SuiteAnalysisOptions = {},
): SuiteAnalysis {
  const sorted = [...records].sort((a, b) => compareText(a.name, b.name));
  const { periodsS, dampings } = settings;
  const warnings = [
    ...dampingWarnings(dampings),
    ...sorted.flatMap((member) => (member.warnings ?? []).map((w) => `${member.name}: ${w}`)),
  ];
  const spectrum = options.target;
  if (spectrum === undefined) {
    if (options.scaleEach || options.check) throw usageError('scaling and the suite check need a target');
    return {
      members: sorted,
      warnings,
      factors: sorted.map(() => 1),
      statistics: suiteStatistics(sorted, dampings, periodsS.length),
    };
  }
  const dampingIndex = targetDampingIndex(dampings, spectrum);
  const target = {
    spectrum,
    damping: dampings[dampingIndex],
    dampingIndex,
    psaG: periodsS.map((t) => (coversPeriod(spectrum, t) ? spectrum.psaG(t) : null)),
  };
  let members = sorted;
  let factors = sorted.map(() => 1);
  let scaling: SuiteAnalysis['scaling'];
  if (options.scaleEach) {
    const results = sorted.map((member) => {
      try {
        const { criterion: _, ...fit } = scaleToTarget(periodsS, member.psaG[dampingIndex], spectrum, {
          rangeS: options.scaleRangeS,
        });
        return { name: member.name, ...fit };
      } catch (error) {
        if (isQuakesweepError(error)) throw inputError(`${member.file}: ${error.message}`);
        throw error;
      }
    });
    factors = results.map((r) => r.factor);
    members = sorted.map((member, i) => ({
      ...member,
      psaG: member.psaG.map((curve) => curve.map((value) => value * factors[i])),
    }));
    scaling = { criterion: SCALE_CRITERION, records: results };
  }
  const statistics = suiteStatistics(members, dampings, periodsS.length);
  const check =
    options.check === undefined
      ? undefined
      : checkSuite(periodsS, statistics[dampingIndex].mean_psa_g, target.psaG, options.check);
  return { members, warnings, factors, statistics, target, scaling, check };
}

/**
 * The damping ratio at which a target is compared: its own (5% for ASCE 7, ξ for Eurocode 8); for
 * a table, which states none, 5%, or the only damping of the grid.
 */
export function targetDampingIndex(dampings: readonly number[], target: DesignSpectrum): number {
  const wanted = target.damping ?? (dampings.length === 1 ? dampings[0] : 0.05);
  const index = dampings.findIndex((d) => Math.abs(d - wanted) < 1e-12);
  if (index < 0)
    throw usageError(`the target is for ${formatNumber(100 * wanted, 6)}% damping: include it in --damping`);
  return index;
}

/**
 * Refuse, before any record is swept, what analyseSuite would refuse once they are: a target whose
 * damping is not swept, and a scaling or check range that holds no grid period or reaches a grid
 * period where the target is not defined.
 */
export function checkSuitePlan(
  settings: { periodsS: readonly number[]; dampings: readonly number[] },
  options: SuiteAnalysisOptions,
): void {
  const target = options.target;
  if (target === undefined) return;
  targetDampingIndex(settings.dampings, target);
  const ranges: [string, readonly [number, number] | undefined][] = [
    ['scaling', options.scaleEach ? options.scaleRangeS : undefined],
    ['check', options.check?.rangeS],
  ];
  for (const [what, range] of ranges) {
    if (range === undefined) continue;
    const inside = settings.periodsS.filter((t) => t >= range[0] && t <= range[1]);
    const [from, to] = range.map((t) => formatNumber(t));
    if (inside.length === 0)
      throw usageError(`no period of the grid lies in the ${what} range ${from}–${to} s`);
    const outside = inside.find((t) => !coversPeriod(target, t));
    if (outside !== undefined)
      throw usageError(
        `the ${what} range ${from}–${to} s reaches T = ${formatNumber(outside)} s, outside the target (defined from ${target.minPeriodS} s to ${target.maxPeriodS} s)`,
      );
  }
}
