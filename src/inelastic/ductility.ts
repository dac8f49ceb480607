import { usageError } from '../base/errors.js';
import { STANDARD_GRAVITY_MS2 } from '../base/units.js';
import { recordRoughness } from '../oscillator/record-statistics.js';
import type { GroundRecord } from '../record/record.js';
import { recordInfo, responseSpectrum, type SpectrumRecordInfo } from '../spectrum/spectrum.js';
import {
  type DemandPlan,
  type DemandStrength,
  type DuctilityPlan,
  demandCell,
  demandCellLength,
  ductilityCell,
  ductilityCellLength,
} from './cells.js';
import { checkHysteresis, type Hysteresis } from './hysteresis.js';
import { DUCTILITY_TOLERANCE, STRENGTH_CONVENTION } from './strength-search.js';
import {
  YIELDING_MAX_STEPS_PER_PERIOD,
  YIELDING_RECORD_FACTOR,
  YIELDING_STEPS_PER_PERIOD,
} from './yielding.js';

/** What a rigid oscillator (T = 0) is given in a constant-ductility spectrum. */
export const RIGID_CONVENTION =
  'T = 0 (rigid): it does not deform before it yields, so any strength below m·PGA lets it slide ' +
  'without bound and any strength at or above it keeps it elastic; Ay = PGA, Ry = 1, uy = um = 0 ' +
  'and achieved ductility 1 for every target';

/** How the yielding oscillator is stepped, for outputs. */
export const YIELDING_METHOD =
  `Newmark average acceleration (γ = 1/2, β = 1/4) with Newton–Raphson iterations, steps split at ` +
  `yielding and unloading; sub-steps per record step max(1, ⌈N·Δt/T⌉, ⌈${YIELDING_RECORD_FACTOR}·R²⌉), ` +
  `R the record's roughness, N = min(${YIELDING_MAX_STEPS_PER_PERIOD}, max(${YIELDING_STEPS_PER_PERIOD}, ` +
  `${YIELDING_STEPS_PER_PERIOD}·√(0.025/ζ))) steps per elastic period; R_y = u_o/u_y with u_o the ` +
  `elastic spectrum's SD (newmark-average, pre-warped)`;

/** One target ductility at one damping ratio; arrays indexed by period. */
export interface DuctilityCurve {
  damping: number;
  /** Target ductility μ. */
  ductility: number;
  /** Yield pseudo-acceleration A_y = f_y/m = ω²·u_y, g (PGA at T = 0). */
  ayG: Float64Array;
  /** Yield displacement u_y, m. */
  uyM: Float64Array;
  /** Peak displacement u_m, m. */
  umM: Float64Array;
  /** Strength reduction factor R_y = f_o/f_y = 1/f̄_y. */
  ry: Float64Array;
  /** Normalised strength f̄_y = f_y/f_o. */
  strengthRatio: Float64Array;
  /** Ductility achieved at the reported strength, u_m/u_y. */
  achievedDuctility: Float64Array;
}

/** The elastic oscillators the strengths are normalised by; arrays indexed by period. */
export interface ElasticPeaks {
  damping: number;
  /** Elastic peak displacement u_o, m (0 at T = 0). */
  sdM: Float64Array;
  /** Elastic pseudo-acceleration ω²·u_o, g (PGA at T = 0). */
  psaG: Float64Array;
}

export interface DuctilitySpectra {
  record: SpectrumRecordInfo;
  model: Hysteresis;
  method: string;
  /** Which strength is reported where several give the target, and what T = 0 gets. */
  convention: string;
  /** The search's tolerance on the achieved ductility, as a fraction of the target. */
  tolerance: number;
  periodsS: Float64Array;
  elastic: ElasticPeaks[];
  /** Damping-major: every ductility of the first damping, then the next. */
  curves: DuctilityCurve[];
  /** Oscillator runs of the whole search (a measure of the work). */
  oscillatorRuns: number;
}

export interface DuctilitySpectraOptions {
  periodsS: ArrayLike<number>;
  dampings: ArrayLike<number>;
  /** Target ductilities μ ≥ 1. */
  ductilities: ArrayLike<number>;
  model: Hysteresis;
}

/**
 * Constant-ductility spectra (Veletsos and Newmark 1960; Chopra, Dynamics of Structures, §7.5,
 * from memory): for each period, damping ratio and target ductility μ, the yield strength of the
 * yielding oscillator (yielding.ts) whose peak ductility demand is μ, found by strengthsForDuctilities
 * (STRENGTH_CONVENTION). f_o = k·u_o is the elastic strength of the same oscillator, u_o its peak.
 * Cell by cell (ductilityCell), then assembled; threads/ductility-pool.ts deals the cells out.
 */
export function constantDuctilitySpectra(
  record: GroundRecord,
  options: DuctilitySpectraOptions,
): DuctilitySpectra {
  const plan = planDuctilitySpectra(record, options);
  const cells = plan.dampings.length * plan.periodsS.length;
  const results = new Float64Array(cells * ductilityCellLength(plan));
  for (let cell = 0; cell < cells; cell++) ductilityCell(record.accelMS2, record.dtS, plan, cell, results);
  return assembleDuctilitySpectra(record, plan, results);
}

/** Check the options of constantDuctilitySpectra (usage errors) and plan its cells. */
export function planDuctilitySpectra(record: GroundRecord, options: DuctilitySpectraOptions): DuctilityPlan {
  const model = checkHysteresis(options.model);
  const periodsS = checkPeriods(options.periodsS);
  const dampings = checkDampings(options.dampings);
  const ductilities = Array.from(options.ductilities);
  if (ductilities.length === 0) throw usageError('--ductility: give at least one ductility ratio');
  for (const mu of ductilities) {
    if (!(mu >= 1) || !Number.isFinite(mu))
      throw usageError(`--ductility ${mu}: ductility ratios are finite and ≥ 1`);
  }
  const roughness = recordRoughness(record.accelMS2);
  return {
    model,
    periodsS,
    dampings,
    ductilities,
    roughness,
    elasticSdM: elasticPeaks(record, periodsS, dampings),
  };
}

/** The spectra of a plan from its cells' results (ductilityCell). */
export function assembleDuctilitySpectra(
  record: GroundRecord,
  plan: DuctilityPlan,
  results: Float64Array,
): DuctilitySpectra {
  const { periodsS, ductilities } = plan;
  const nPeriods = periodsS.length;
  const length = ductilityCellLength(plan);
  const pgaG = record.pgaMS2 / STANDARD_GRAVITY_MS2;
  const elastic: ElasticPeaks[] = [];
  const curves: DuctilityCurve[] = [];
  let runs = 0;
  plan.dampings.forEach((damping, d) => {
    const peaks: ElasticPeaks = {
      damping,
      sdM: new Float64Array(nPeriods),
      psaG: new Float64Array(nPeriods),
    };
    const rows = ductilities.map((ductility) => emptyCurve(damping, ductility, nPeriods));
    for (let p = 0; p < nPeriods; p++) {
      const periodS = periodsS[p];
      if (periodS === 0) {
        peaks.psaG[p] = pgaG;
        for (const row of rows) {
          row.ayG[p] = pgaG;
          row.ry[p] = 1;
          row.strengthRatio[p] = 1;
          row.achievedDuctility[p] = 1;
        }
        continue;
      }
      const omega2 = ((2 * Math.PI) / periodS) ** 2;
      const at = (d * nPeriods + p) * length;
      const elasticPeakM = results[at];
      runs += results[at + 1];
      peaks.sdM[p] = elasticPeakM;
      peaks.psaG[p] = (omega2 * elasticPeakM) / STANDARD_GRAVITY_MS2;
      rows.forEach((row, k) => {
        const strengthRatio = results[at + 2 + 3 * k];
        const uyM = strengthRatio * elasticPeakM;
        row.uyM[p] = uyM;
        row.umM[p] = results[at + 3 + 3 * k];
        row.ayG[p] = (omega2 * uyM) / STANDARD_GRAVITY_MS2;
        row.strengthRatio[p] = strengthRatio;
        row.ry[p] = 1 / strengthRatio;
        row.achievedDuctility[p] = results[at + 4 + 3 * k];
      });
    }
    elastic.push(peaks);
    curves.push(...rows);
  });
  return {
    record: recordInfo(record, plan.dampings, periodsS),
    model: plan.model,
    method: YIELDING_METHOD,
    convention: `${STRENGTH_CONVENTION}. ${RIGID_CONVENTION}`,
    tolerance: DUCTILITY_TOLERANCE,
    periodsS,
    elastic,
    curves,
    oscillatorRuns: runs,
  };
}

/**
 * The elastic peaks u_o (SD, m) the strengths are normalised by, damping-major like the cells, from
 * the elastic engine (newmark-average, pre-warped: within 0.3% of the exact peak; see
 * oscillator/substeps.ts), so that μ = 1 is the elastic spectrum itself. 0 at T = 0.
 */
function elasticPeaks(record: GroundRecord, periodsS: Float64Array, dampings: Float64Array): Float64Array {
  const spectrum = responseSpectrum(record, { periodsS, dampings, method: 'newmark-average' });
  const sdM = new Float64Array(dampings.length * periodsS.length);
  for (const [d, curve] of spectrum.curves.entries()) sdM.set(curve.sdM, d * periodsS.length);
  return sdM;
}

function emptyCurve(damping: number, ductility: number, n: number): DuctilityCurve {
  return {
    damping,
    ductility,
    ayG: new Float64Array(n),
    uyM: new Float64Array(n),
    umM: new Float64Array(n),
    ry: new Float64Array(n),
    strengthRatio: new Float64Array(n),
    achievedDuctility: new Float64Array(n),
  };
}

/** One given strength at one damping ratio; arrays indexed by period. */
export interface DemandCurve {
  damping: number;
  /** The strength as given: R_y = f_o/f_y for every period, or A_y (g) for every period. */
  strength: DemandStrength;
  /** Peak ductility demand u_m/u_y (below 1 where the oscillator stays elastic). */
  ductility: Float64Array;
  ayG: Float64Array;
  uyM: Float64Array;
  umM: Float64Array;
  ry: Float64Array;
  /** Yield excursions of the run. */
  yieldEvents: Float64Array;
}

export interface DuctilityDemandSpectra {
  record: SpectrumRecordInfo;
  model: Hysteresis;
  method: string;
  periodsS: Float64Array;
  elastic: ElasticPeaks[];
  /** Damping-major: every strength of the first damping, then the next. */
  curves: DemandCurve[];
}

export interface DemandSpectraOptions {
  /** Periods > 0, s: a rigid oscillator's demand is unbounded below the PGA and is refused. */
  periodsS: ArrayLike<number>;
  dampings: ArrayLike<number>;
  model: Hysteresis;
  /** Strength reduction factors R_y > 0 (one curve each); or */
  ry?: ArrayLike<number>;
  /** yield pseudo-accelerations A_y > 0, g (one curve each); exactly one of the two. */
  ayG?: ArrayLike<number>;
}

/**
 * Ductility demand spectra: the peak ductility u_m/u_y of the yielding oscillator (yielding.ts)
 * for a given strength, as R_y (u_y = u_o/R_y, u_o the elastic peak) or as A_y (u_y = A_y/ω²).
 * Cell by cell (demandCell), then assembled; threads/ductility-pool.ts deals the cells out.
 */
export function ductilityDemandSpectra(
  record: GroundRecord,
  options: DemandSpectraOptions,
): DuctilityDemandSpectra {
  const plan = planDemandSpectra(record, options);
  const cells = plan.dampings.length * plan.periodsS.length;
  const results = new Float64Array(cells * demandCellLength(plan));
  for (let cell = 0; cell < cells; cell++) demandCell(record.accelMS2, record.dtS, plan, cell, results);
  return assembleDemandSpectra(record, plan, results);
}

/** Check the options of ductilityDemandSpectra (usage errors) and plan its cells. */
export function planDemandSpectra(record: GroundRecord, options: DemandSpectraOptions): DemandPlan {
  const model = checkHysteresis(options.model);
  const periodsS = checkPeriods(options.periodsS);
  if (periodsS.includes(0))
    throw usageError('ductility demand: T = 0 (rigid) has no finite demand below the PGA; use periods > 0');
  const dampings = checkDampings(options.dampings);
  if ((options.ry === undefined) === (options.ayG === undefined))
    throw usageError('ductility demand: give the strength as R_y or as A_y, not both nor neither');
  const strengths: DemandStrength[] =
    options.ry !== undefined
      ? Array.from(options.ry, (ry) => ({ ry }))
      : Array.from(options.ayG ?? [], (ayG) => ({ ayG }));
  if (strengths.length === 0) throw usageError('ductility demand: give at least one strength');
  for (const strength of strengths) {
    const value = 'ry' in strength ? strength.ry : strength.ayG;
    if (!(value > 0) || !Number.isFinite(value))
      throw usageError(`strength ${value}: ${'ry' in strength ? 'R_y' : 'A_y'} must be finite and > 0`);
  }
  const roughness = recordRoughness(record.accelMS2);
  return {
    model,
    periodsS,
    dampings,
    strengths,
    roughness,
    elasticSdM: elasticPeaks(record, periodsS, dampings),
  };
}

/** The demand spectra of a plan from its cells' results (demandCell). */
export function assembleDemandSpectra(
  record: GroundRecord,
  plan: DemandPlan,
  results: Float64Array,
): DuctilityDemandSpectra {
  const { periodsS } = plan;
  const n = periodsS.length;
  const length = demandCellLength(plan);
  const elastic: ElasticPeaks[] = [];
  const curves: DemandCurve[] = [];
  plan.dampings.forEach((damping, d) => {
    const peaks: ElasticPeaks = { damping, sdM: new Float64Array(n), psaG: new Float64Array(n) };
    const rows = plan.strengths.map((strength) => emptyDemand(damping, strength, n));
    for (let p = 0; p < n; p++) {
      const omega2 = ((2 * Math.PI) / periodsS[p]) ** 2;
      const at = (d * n + p) * length;
      const uo = results[at];
      peaks.sdM[p] = uo;
      peaks.psaG[p] = (omega2 * uo) / STANDARD_GRAVITY_MS2;
      rows.forEach((row, k) => {
        const uyM = results[at + 1 + 4 * k];
        row.ductility[p] = results[at + 2 + 4 * k];
        row.uyM[p] = uyM;
        row.umM[p] = results[at + 3 + 4 * k];
        row.ayG[p] = (omega2 * uyM) / STANDARD_GRAVITY_MS2;
        row.ry[p] = uo / uyM;
        row.yieldEvents[p] = results[at + 4 + 4 * k];
      });
    }
    elastic.push(peaks);
    curves.push(...rows);
  });
  return {
    record: recordInfo(record, plan.dampings, periodsS),
    model: plan.model,
    method: YIELDING_METHOD,
    periodsS,
    elastic,
    curves,
  };
}

function emptyDemand(damping: number, strength: DemandStrength, n: number): DemandCurve {
  const array = () => new Float64Array(n);
  return {
    damping,
    strength,
    ductility: array(),
    ayG: array(),
    uyM: array(),
    umM: array(),
    ry: array(),
    yieldEvents: array(),
  };
}

function checkPeriods(values: ArrayLike<number>): Float64Array {
  const periodsS = Float64Array.from(values);
  if (periodsS.length === 0) throw usageError('--periods: give at least one period');
  for (const t of periodsS) {
    if (!(t >= 0) || !Number.isFinite(t)) throw usageError(`--periods: ${t} is not a period ≥ 0 s`);
  }
  return periodsS;
}

function checkDampings(values: ArrayLike<number>): Float64Array {
  const dampings = Float64Array.from(values);
  if (dampings.length === 0) throw usageError('--damping: give at least one damping ratio');
  for (const z of dampings) {
    if (!(z >= 0) || !Number.isFinite(z)) throw usageError(`--damping: ${z} is not a damping ratio ≥ 0`);
  }
  return dampings;
}
