import { inputError } from '../base/errors.js';
import { recordRoughness } from '../oscillator/record-statistics.js';
import { executedStepCoefficients, type Method } from '../oscillator/recurrence.js';
import { substepCount } from '../oscillator/substeps.js';
import { type GroundRecord, withProcessing } from '../record/record.js';
import { interpolateSpectrum } from './interpolate.js';
import { responseSpectrum, type Spectrum, type SpectrumCurve, type SpectrumOptions } from './spectrum.js';

/** A building idealised by its fundamental mode, as seen from one floor. */
export interface BuildingMode {
  /** Fundamental period T_b, s. */
  periodS: number;
  /** Modal damping ratio ζ_b. */
  damping: number;
  /** Modal factor at the floor, Γ·φ(floor) (participation factor times mode shape at the floor). */
  modalFactor: number;
  /** Step method for the building's response (default Newmark-β average acceleration). */
  method?: Method;
}

/**
 * The floor's absolute acceleration history for a building idealised by one mode (modal
 * superposition truncated to the fundamental mode; Chopra, Dynamics of Structures, §13.1). With
 * the modal coordinate q of unit participation, q'' + 2ζ_b ω_b q' + ω_b² q = −a_g(t), the floor's
 * displacement relative to the ground is Γφ·q, so its absolute acceleration is
 *
 *   a_floor(t) = a_g(t) + Γφ·q''(t),   q'' = −a_g − 2ζ_b ω_b q' − ω_b² q.
 *
 * q is stepped with the sweep's pre-warped recurrences (executedStepCoefficients, substepCount,
 * ground acceleration linear between samples) and a_floor is sampled at the record's own times.
 * Higher modes, soil–structure interaction, nonlinear response of the building and feedback of
 * the equipment on the floor are not represented.
 */
export function floorRecord(ground: GroundRecord, building: BuildingMode): GroundRecord {
  checkBuilding(building);
  const method = building.method ?? 'newmark-average';
  const omega = (2 * Math.PI) / building.periodS;
  const durationS = (ground.accelMS2.length - 1) * ground.dtS;
  const substeps = substepCount(method, building.periodS, ground.dtS, {
    damping: building.damping,
    durationS,
    roughness: recordRoughness(ground.accelMS2),
  });
  const k = executedStepCoefficients(method, omega, building.damping, ground.dtS / substeps);
  const ag = ground.accelMS2;
  const floor = new Float64Array(ag.length);
  const c = 2 * building.damping * omega;
  const stiffness = omega * omega;
  let q = 0;
  let v = 0;
  floor[0] = ag[0] + building.modalFactor * -ag[0];
  for (let i = 1; i < ag.length; i++) {
    const p0 = ag[i - 1];
    const dp = (ag[i] - p0) / substeps;
    for (let s = 0; s < substeps; s++) {
      const a = p0 + dp * s;
      const b = s === substeps - 1 ? ag[i] : p0 + dp * (s + 1);
      const qNext = k.uu * q + k.uv * v + k.up0 * a + k.up1 * b;
      v = k.vu * q + k.vv * v + k.vp0 * a + k.vp1 * b;
      q = qNext;
    }
    const relative = -ag[i] - c * v - stiffness * q;
    floor[i] = ag[i] + building.modalFactor * relative;
  }
  return withProcessing(ground, floor, {
    operation: 'floor',
    description:
      `floor absolute acceleration a_g + Γφ·q'' of a one-mode building: T_b = ${building.periodS} s, ` +
      `ζ_b = ${building.damping}, Γφ = ${building.modalFactor}, ${method}`,
    parameters: {
      building_period_s: building.periodS,
      building_damping: building.damping,
      modal_factor: building.modalFactor,
      method,
      substeps,
    },
  });
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

/**
 * Peak broadening of an in-structure spectrum (US NRC Regulatory Guide 1.122, from memory: each
 * peak is widened by ±15% of its frequency to cover uncertainty in the structure's frequencies).
 * Reading used here: the broadened value at T is the largest value of the unbroadened spectrum
 * over the window [T(1 − b), T/(1 − b)], b = 0.15 by default. A peak at T_p then becomes a plateau
 * from T_p(1 − b) to T_p/(1 − b), which covers ±b both in period and in frequency (a little wider
 * than either alone). The window's end values are interpolated log–log so that a coarse grid does
 * not narrow it. The guide's further smoothing of valleys is not done. T = 0 is left as is.
 * The result is never below the unbroadened spectrum (T itself lies in its window).
 */
export function broadenCurve(
  periodsS: ArrayLike<number>,
  values: ArrayLike<number>,
  fraction = 0.15,
): Float64Array {
  if (!(fraction >= 0) || !(fraction < 1))
    throw inputError(`the broadening must be a fraction 0 ≤ b < 1, got ${fraction}`);
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
 * Broaden a spectrum's curves: PSA is broadened and SD = PSA/ω², PSV = PSA/ω are taken from it so
 * that the three stay consistent; SV and SA are broadened on their own.
 */
export function broadenSpectrum(spectrum: Spectrum, fraction = 0.15): Spectrum {
  const periods = spectrum.periodsS;
  const curves: SpectrumCurve[] = spectrum.curves.map((curve) => {
    const psaMS2 = broadenCurve(periods, curve.psaMS2, fraction);
    const sdM = new Float64Array(periods.length);
    const psvMS = new Float64Array(periods.length);
    for (let p = 0; p < periods.length; p++) {
      if (periods[p] === 0) continue;
      const omega = (2 * Math.PI) / periods[p];
      psvMS[p] = psaMS2[p] / omega;
      sdM[p] = psaMS2[p] / (omega * omega);
    }
    return {
      damping: curve.damping,
      sdM,
      psvMS,
      psaMS2,
      svMS: broadenCurve(periods, curve.svMS, fraction),
      saMS2: broadenCurve(periods, curve.saMS2, fraction),
    };
  });
  return { ...spectrum, curves };
}

export interface FloorSpectra {
  floor: GroundRecord;
  /** The floor spectrum as computed (unbroadened). */
  unbroadened: Spectrum;
  /** The broadened floor spectrum, or the unbroadened one when no broadening was asked for. */
  spectrum: Spectrum;
  broadening: number | null;
}

/** The in-structure spectrum of one floor: floorRecord, then responseSpectrum, then optional broadening. */
export function floorSpectrum(
  ground: GroundRecord,
  building: BuildingMode,
  grid: SpectrumOptions,
  broadening: number | null = null,
): FloorSpectra {
  const floor = floorRecord(ground, { method: grid.method, ...building });
  const unbroadened = responseSpectrum(floor, grid);
  const spectrum = broadening === null ? unbroadened : broadenSpectrum(unbroadened, broadening);
  return { floor, unbroadened, spectrum, broadening };
}
