import { STANDARD_GRAVITY_MS2 as G, gFromMS2 } from '../base/units.js';
import { type BuildingMode, FLOOR_METHOD_DESCRIPTION, type FloorSpectra } from '../spectrum/floor.js';
import type { Spectrum } from '../spectrum/spectrum.js';
import { assumptionLines, columnsByDamping, periodTable, pgaText, terminalText } from './layout.js';
import { spectrumToJson, toG } from './spectrum-json.js';

export function floorAssumptions(result: FloorSpectra): string[] {
  const out = [
    "Building idealised by its fundamental mode: q'' + 2ζ_b ω_b q' + ω_b² q = −a_g; floor absolute acceleration " +
      "a_g + Γφ·q''. Higher modes, soil–structure interaction, nonlinear building response and the equipment's " +
      'feedback on the floor are not represented.',
    'Component spectra from the cascade: the building mode and each component oscillator stepped together, exactly ' +
      'for the ground record linear between samples (matrix exponential of the joint system, Van Loan 1978), so the ' +
      'floor motion is never sampled and re-interpolated; peaks by cubic Hermite search between sub-steps, under ' +
      'the accuracy rule of `quakesweep spectrum`. Floor PGA (PSA at T = 0): the peak over continuous time.',
  ];
  const dense = result.dense;
  out.push(
    result.broadening === null || dense === null
      ? 'Peaks not broadened (--broaden to widen them for uncertain building frequencies).'
      : `Peaks broadened (US NRC Regulatory Guide 1.122, Rev. 1 (1978): ±15% of frequency): value at T = largest over ` +
          `[T(1−b), T/(1−b)], b = ${result.broadening}, which covers ±b in period and in frequency; ` +
          `windows searched on an internal grid of up to ${dense.densePeriods} periods (the building period and every window's ends among them) ` +
          `with ${dense.refinedPeaks} local peaks refined between its points, then reported on the output periods; ` +
          'PSA broadened and SD, PSV derived from it; SV, SA broadened on their own; valleys not smoothed.',
  );
  return out;
}

export function floorTable(
  floor: Spectrum,
  ground: Spectrum,
  building: BuildingMode,
  assumptions: string[],
): string {
  const curves = floor.curves.map((curve, d) => ({ ...curve, ground: ground.curves[d] }));
  const columns = columnsByDamping(curves, [
    { name: 'ground_psa_g', heading: 'ground PSA g', width: 18, at: (c, p) => c.ground.psaMS2[p] / G },
    { name: 'floor_psa_g', heading: 'floor PSA g', width: 17, at: (c, p) => c.psaMS2[p] / G },
  ]);
  return terminalText([
    `record    ${ground.record.name} (${ground.record.source}), ${pgaText(ground.record.pgaMS2)}`,
    `building  T_b ${building.periodS} s, ζ_b ${building.damping}, Γφ ${building.modalFactor}; floor ${pgaText(floor.record.pgaMS2)}`,
    `method    ${FLOOR_METHOD_DESCRIPTION}`,
    '',
    ...periodTable(floor.periodsS, columns, true),
    `(${floor.periodsS.length} periods; --format json for all of them)`,
    ...assumptionLines(assumptions),
  ]);
}

const psaCurvesG = (spectrum: Spectrum) =>
  spectrum.curves.map((c) => ({ damping: c.damping, psa_g: toG(c.psaMS2, spectrum.periodsS) }));

/** The one-mode building as the floor JSONs state it. */
export function buildingToJson(building: BuildingMode) {
  return {
    period_s: building.periodS,
    damping: building.damping,
    modal_factor: building.modalFactor,
    method: 'piecewise-exact',
  };
}

/** The broadening as the floor JSONs state it (null when none); `extra` adds fields. */
export function broadeningToJson<Extra extends { [key: string]: string }>(
  fraction: number | null,
  extra: Extra = {} as Extra,
) {
  if (fraction === null) return null;
  return {
    fraction,
    window: 'max over [T(1-b), T/(1-b)]',
    // The guide's ±15% is from memory (docs/methods-and-verification.md); outputs name it plainly.
    source:
      'US NRC Regulatory Guide 1.122, Rev. 1 (1978), Development of Floor Design Response Spectra for Seismic Design of Floor-Supported Equipment or Components',
    ...extra,
  };
}

/** The JSON of `quakesweep floor`: the floor spectrum's, with the building, the ground and the assumptions. */
export function floorToJson(
  result: FloorSpectra,
  ground: Spectrum,
  building: BuildingMode,
  assumptions: string[],
) {
  return {
    ...spectrumToJson(result.spectrum),
    method_description: FLOOR_METHOD_DESCRIPTION,
    building: buildingToJson(building),
    broadening: broadeningToJson(result.broadening),
    unbroadened_psa_g: psaCurvesG(result.unbroadened),
    ground: {
      name: ground.record.name,
      source: ground.record.source,
      pga_g: gFromMS2(ground.record.pgaMS2),
      spectra: psaCurvesG(ground),
    },
    assumptions,
  };
}
