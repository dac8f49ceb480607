import { inputError } from '../base/errors.js';
import { type CascadePeak, cascadePeak, cascadeRecord } from '../oscillator/cascade.js';
import { checkPeriodsForRecord } from '../oscillator/grid.js';
import { piecewiseExactCoefficients } from '../oscillator/recurrence.js';
import { type GroundRecord, withProcessing } from '../record/record.js';
import { broadenByEvaluation, type DenseBroadening, denseSpacing } from './broaden.js';
import { recordInfo, type Spectrum, type SpectrumCurve, type SpectrumOptions } from './spectrum.js';

/** A building idealised by its fundamental mode, as seen from one floor. */
export interface BuildingMode {
  /** Fundamental period T_b, s. */
  periodS: number;
  /** Modal damping ratio ζ_b. */
  damping: number;
  /** Modal factor at the floor, Γ·φ(floor) (participation factor times mode shape at the floor). */
  modalFactor: number;
}

/** How floor spectra are computed, as outputs state it. */
export const FLOOR_METHOD_DESCRIPTION =
  'exact cascade: building mode and component oscillator stepped together by the matrix exponential (Van Loan 1978), ground linear between samples';

/**
 * The floor's absolute acceleration history for a building idealised by one mode (modal
 * superposition truncated to the fundamental mode; Chopra, Dynamics of Structures, §13.1). With
 * the modal coordinate q of unit participation, q'' + 2ζ_b ω_b q' + ω_b² q = −a_g(t), the floor's
 * displacement relative to the ground is Γφ·q, so its absolute acceleration is
 *
 *   a_floor(t) = a_g(t) + Γφ·q''(t),   q'' = −a_g − 2ζ_b ω_b q' − ω_b² q.
 *
 * q is stepped exactly for the ground acceleration linear between samples (piecewise-exact,
 * Nigam and Jennings 1969) and a_floor is given at the record's own times. Floor spectra are not
 * computed from this sampled history but from the cascade (floorCascadeSpectrum), since the floor
 * motion is not linear between samples. Higher modes, soil–structure interaction, nonlinear
 * response of the building and feedback of the equipment on the floor are not represented.
 */
export function floorRecord(ground: GroundRecord, building: BuildingMode): GroundRecord {
  checkBuilding(building);
  const omega = (2 * Math.PI) / building.periodS;
  const k = piecewiseExactCoefficients(omega, building.damping, ground.dtS);
  const ag = ground.accelMS2;
  const floor = new Float64Array(ag.length);
  const c = 2 * building.damping * omega;
  const stiffness = omega * omega;
  let q = 0;
  let v = 0;
  floor[0] = ag[0] + building.modalFactor * -ag[0];
  for (let i = 1; i < ag.length; i++) {
    const qNext = k.uu * q + k.uv * v + k.up0 * ag[i - 1] + k.up1 * ag[i];
    v = k.vu * q + k.vv * v + k.vp0 * ag[i - 1] + k.vp1 * ag[i];
    q = qNext;
    const relative = -ag[i] - c * v - stiffness * q;
    floor[i] = ag[i] + building.modalFactor * relative;
  }
  return withProcessing(ground, floor, {
    operation: 'floor',
    description:
      `floor absolute acceleration a_g + Γφ·q'' of a one-mode building: T_b = ${building.periodS} s, ` +
      `ζ_b = ${building.damping}, Γφ = ${building.modalFactor}, stepped exactly`,
    parameters: {
      building_period_s: building.periodS,
      building_damping: building.damping,
      modal_factor: building.modalFactor,
      method: 'piecewise-exact',
    },
  });
}

/**
 * The component spectra on a floor, from the cascade (oscillator/cascade.ts): building mode and
 * component oscillator as one linear system driven by the ground record linear between samples.
 * PSV = ωSD, PSA = ω²SD; at T = 0 PSA and SA are the floor's peak acceleration over continuous
 * time, which is also the record PGA the spectrum states (the sampled floor history can miss it
 * between samples).
 */
export function floorCascadeSpectrum(
  ground: GroundRecord,
  building: BuildingMode,
  grid: Pick<SpectrumOptions, 'periodsS' | 'dampings'> & { stepsPerPeriod?: number },
  floor: GroundRecord = floorRecord(ground, building),
): Spectrum {
  checkBuilding(building);
  const record = cascadeRecord(ground.accelMS2, ground.dtS);
  const periods = Float64Array.from(grid.periodsS);
  checkPeriodsForRecord(periods, (ground.accelMS2.length - 1) * ground.dtS);
  // The floor's own peak (T = 0) does not depend on the component damping: computed once.
  const rigid = cascadePeak(record, building, 0, 0, grid.stepsPerPeriod);
  let steps = 0;
  const curves = Array.from(grid.dampings, (damping): SpectrumCurve => {
    const n = periods.length;
    const curve = {
      damping,
      sdM: new Float64Array(n),
      psvMS: new Float64Array(n),
      psaMS2: new Float64Array(n),
      svMS: new Float64Array(n),
      saMS2: new Float64Array(n),
    };
    for (let p = 0; p < n; p++) {
      const t = periods[p];
      const peak = t === 0 ? rigid : cascadePeak(record, building, t, damping, grid.stepsPerPeriod);
      steps += peak.substeps * (ground.accelMS2.length - 1);
      writePeak(curve, p, t, peak);
    }
    return curve;
  });
  return {
    record: { ...recordInfo(floor, grid.dampings, periods), pgaMS2: rigid.saMS2 },
    method: 'piecewise-exact',
    periodsS: periods,
    curves,
    oscillatorSteps: steps,
  };
}

/** Store one cascade peak at index p of a curve, with PSV and PSA from SD (PSA = SA at T = 0). */
export function writePeak(curve: SpectrumCurve, p: number, periodS: number, peak: CascadePeak): void {
  curve.sdM[p] = peak.sdM;
  curve.svMS[p] = peak.svMS;
  curve.saMS2[p] = peak.saMS2;
  if (periodS === 0) {
    curve.psaMS2[p] = peak.saMS2;
    return;
  }
  const omega = (2 * Math.PI) / periodS;
  curve.psvMS[p] = omega * peak.sdM;
  curve.psaMS2[p] = omega * omega * peak.sdM;
}

function checkBuilding(building: BuildingMode): void {
  if (!(building.periodS > 0) || !Number.isFinite(building.periodS)) {
    throw inputError(`the building period must be a positive number of seconds, got ${building.periodS}`);
  }
  if (!(building.damping >= 0) || !(building.damping < 1)) {
    throw inputError(`the building damping must be a fraction 0 ≤ ζ_b < 1, got ${building.damping}`);
  }
  if (!Number.isFinite(building.modalFactor)) {
    throw inputError(`the modal factor Γφ must be a finite number, got ${building.modalFactor}`);
  }
}

export interface FloorSpectra {
  floor: GroundRecord;
  /** The floor spectrum as computed (unbroadened). */
  unbroadened: Spectrum;
  /** The broadened floor spectrum, or the unbroadened one when no broadening was asked for. */
  spectrum: Spectrum;
  broadening: number | null;
  /** How the broadening searched its windows (null when none). */
  dense: DenseBroadening | null;
}

/**
 * The in-structure spectrum of one floor: floorCascadeSpectrum, then, when asked, broadening on a
 * dense internal grid holding the building period (broadenByEvaluation), reported on the grid's periods.
 */
export function floorSpectrum(
  ground: GroundRecord,
  building: BuildingMode,
  grid: Pick<SpectrumOptions, 'periodsS' | 'dampings'> & { stepsPerPeriod?: number },
  broadening: number | null = null,
): FloorSpectra {
  const floor = floorRecord(ground, building);
  const unbroadened = floorCascadeSpectrum(ground, building, grid, floor);
  if (broadening === null) return { floor, unbroadened, spectrum: unbroadened, broadening, dense: null };
  const record = cascadeRecord(ground.accelMS2, ground.dtS);
  const { spectrum, dense } = broadenByEvaluation(
    unbroadened,
    broadening,
    (t, damping) => cascadePeak(record, building, t, damping, grid.stepsPerPeriod),
    [building.periodS],
    denseSpacing,
  );
  return { floor, unbroadened, spectrum, broadening, dense };
}
