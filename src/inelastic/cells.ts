// One cell of the yielding spectra, (damping, period): the work of one thread (ductility.ts
// assembles the cells; threads/ductility-pool.ts deals them out).
import { STANDARD_GRAVITY_MS2 } from '../base/units.js';
import type { Hysteresis } from './hysteresis.js';
import { strengthCell, strengthsForDuctilities } from './strength-search.js';
import { yieldingPeak } from './yielding.js';

/**
 * A checked constant-ductility job: what each of its (damping, period) cells needs, the record's
 * samples aside. Cell c = d·periods + p (damping-major, as the curves).
 */
export interface DuctilityPlan {
  model: Hysteresis;
  periodsS: Float64Array;
  dampings: Float64Array;
  ductilities: number[];
  /** The record's roughness for the sub-step rule (recordRoughness). */
  roughness: number;
  /** The elastic peak u_o of each cell (the elastic engine's SD), m; 0 at T = 0. */
  elasticSdM: Float64Array;
}

/** A strength given to the demand spectra: R_y = f_o/f_y, or A_y in g, the same for every period. */
export type DemandStrength = { ry: number } | { ayG: number };

/** A checked demand job: what each of its (damping, period) cells needs, the record's samples aside. */
export interface DemandPlan {
  model: Hysteresis;
  periodsS: Float64Array;
  dampings: Float64Array;
  strengths: DemandStrength[];
  /** The record's roughness for the sub-step rule (recordRoughness). */
  roughness: number;
  /** The elastic peak u_o of each cell (the elastic engine's SD), m. */
  elasticSdM: Float64Array;
}

/** Numbers a cell writes: u_o and the runs, then f̄_y, u_m and the achieved μ of each ductility. */
export function ductilityCellLength(plan: DuctilityPlan): number {
  return 2 + 3 * plan.ductilities.length;
}

/**
 * The strength search of one (damping, period) cell, written to `results` from
 * cell·ductilityCellLength; a rigid cell (T = 0) writes nothing (RIGID_CONVENTION).
 */
export function ductilityCell(
  accelMS2: Float64Array,
  dtS: number,
  plan: DuctilityPlan,
  cell: number,
  results: Float64Array,
): void {
  const nPeriods = plan.periodsS.length;
  const periodS = plan.periodsS[cell % nPeriods];
  if (periodS === 0) return;
  const damping = plan.dampings[Math.floor(cell / nPeriods)];
  const found = strengthsForDuctilities(
    accelMS2,
    dtS,
    strengthCell(periodS, damping, plan.model, dtS, plan.roughness, plan.elasticSdM[cell]),
    plan.ductilities,
  );
  let at = cell * ductilityCellLength(plan);
  results[at++] = found.elasticPeakM;
  results[at++] = found.runs;
  for (let d = 0; d < plan.ductilities.length; d++) {
    results[at++] = found.strengthRatio[d];
    results[at++] = found.peakM[d];
    results[at++] = found.achieved[d];
  }
}

/** Numbers a cell writes: u_o, then u_y, the ductility, u_m and the yield events of each strength. */
export function demandCellLength(plan: DemandPlan): number {
  return 1 + 4 * plan.strengths.length;
}

/** The runs of one (damping, period) cell, written to `results` from cell·demandCellLength. */
export function demandCell(
  accelMS2: Float64Array,
  dtS: number,
  plan: DemandPlan,
  cell: number,
  results: Float64Array,
): void {
  const nPeriods = plan.periodsS.length;
  const periodS = plan.periodsS[cell % nPeriods];
  const damping = plan.dampings[Math.floor(cell / nPeriods)];
  const omega2 = ((2 * Math.PI) / periodS) ** 2;
  const { substeps } = strengthCell(periodS, damping, plan.model, dtS, plan.roughness);
  const base = { periodS, damping, model: plan.model, substeps };
  const uo = plan.elasticSdM[cell];
  let at = cell * demandCellLength(plan);
  results[at++] = uo;
  for (const strength of plan.strengths) {
    const uyM = 'ry' in strength ? uo / strength.ry : (strength.ayG * STANDARD_GRAVITY_MS2) / omega2;
    const peak = yieldingPeak(accelMS2, dtS, { ...base, yieldDisplacementM: uyM });
    results[at++] = uyM;
    results[at++] = peak.ductility;
    results[at++] = peak.peakDisplacementM;
    results[at++] = peak.yieldEvents;
  }
}
