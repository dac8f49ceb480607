import { CAUTION } from '../base/caution.js';
import type {
  DemandCurve,
  DuctilityDemandSpectra,
  DuctilitySpectra,
  ElasticPeaks,
} from '../inelastic/ductility.js';
import { describeHysteresis, type Hysteresis, postYieldRatio } from '../inelastic/hysteresis.js';
import { frequenciesHz } from './frequency.js';
import { recordToJson } from './spectrum-json.js';

/** The one step method of the yielding oscillator, by the name the elastic method keys use. */
export const YIELDING_METHOD_NAME = 'newmark-average';

/** What the demand's ductility is, for its outputs (it is not bounded below by 1). */
export const DEMAND_DEFINITION =
  'ductility = um/uy, the peak displacement over the yield displacement; below 1 where the ' +
  'oscillator stays elastic at the given strength';

/** The `model` object: its name as --model takes it, its kind and α (0 for elastoplastic). */
export function modelToJson(model: Hysteresis) {
  return { name: describeHysteresis(model), kind: model.kind, post_yield_ratio: postYieldRatio(model) };
}

/** The elastic oscillators the strengths are normalised by: u_o and ω²·u_o per damping. */
export function elasticToJson(elastic: readonly ElasticPeaks[]) {
  return elastic.map((peaks) => ({
    damping: peaks.damping,
    sd_m: Array.from(peaks.sdM),
    psa_g: Array.from(peaks.psaG),
  }));
}

/**
 * The JSON of `quakesweep ductility` (constant-ductility spectra). The keys (caution,
 * record, model, periods_s, spectra with damping, ductility, ay_g, uy_m, um_m, ry) are relied on by
 * scripts; beside them the method, the strength convention and tolerance, the achieved ductility
 * and normalised strength of every cell and the elastic peaks, for a reviewer.
 */
export function ductilityToJson(spectra: DuctilitySpectra) {
  return {
    caution: CAUTION,
    record: recordToJson(spectra.record),
    model: modelToJson(spectra.model),
    method: YIELDING_METHOD_NAME,
    method_description: spectra.method,
    convention: spectra.convention,
    ductility_tolerance: spectra.tolerance,
    periods_s: Array.from(spectra.periodsS),
    frequencies_hz: frequenciesHz(spectra.periodsS),
    elastic: elasticToJson(spectra.elastic),
    spectra: spectra.curves.map((curve) => ({
      damping: curve.damping,
      ductility: curve.ductility,
      ay_g: Array.from(curve.ayG),
      uy_m: Array.from(curve.uyM),
      um_m: Array.from(curve.umM),
      ry: Array.from(curve.ry),
      strength_ratio: Array.from(curve.strengthRatio),
      achieved_ductility: Array.from(curve.achievedDuctility),
    })),
  };
}

/** A given strength as JSON: {"ry": 4} or {"ay_g": 0.2}. */
export function strengthToJson(strength: DemandCurve['strength']) {
  return 'ry' in strength ? { ry: strength.ry } : { ay_g: strength.ayG };
}

/** The JSON of `quakesweep ductility --strength` (ductility demand spectra). */
export function ductilityDemandToJson(demand: DuctilityDemandSpectra) {
  return {
    caution: CAUTION,
    record: recordToJson(demand.record),
    model: modelToJson(demand.model),
    method: YIELDING_METHOD_NAME,
    method_description: demand.method,
    definition: DEMAND_DEFINITION,
    periods_s: Array.from(demand.periodsS),
    frequencies_hz: frequenciesHz(demand.periodsS),
    elastic: elasticToJson(demand.elastic),
    spectra: demand.curves.map((curve) => ({
      damping: curve.damping,
      strength: strengthToJson(curve.strength),
      ductility: Array.from(curve.ductility),
      ay_g: Array.from(curve.ayG),
      uy_m: Array.from(curve.uyM),
      um_m: Array.from(curve.umM),
      ry: Array.from(curve.ry),
      yield_events: Array.from(curve.yieldEvents),
    })),
  };
}

export type DuctilityJson = ReturnType<typeof ductilityToJson>;
export type DuctilityDemandJson = ReturnType<typeof ductilityDemandToJson>;
