import { cautionLines } from '../base/caution.js';
import { STANDARD_GRAVITY_MS2 } from '../base/units.js';
import { METHOD_DESCRIPTIONS, type Method } from '../oscillator/recurrence.js';
import type { BuildingMode, FloorSpectra } from '../spectrum/floor.js';
import type { Spectrum } from '../spectrum/spectrum.js';
import { dampingLabel } from './spectrum-csv.js';
import { spectrumToJson, toG } from './spectrum-json.js';
import { type PeriodColumn, periodTable } from './spectrum-table.js';
import { wrapText } from './wrap.js';

export function floorAssumptions(result: FloorSpectra, building: BuildingMode, dtS: number): string[] {
  const out = [
    "Building idealised by its fundamental mode: q'' + 2ζ_b ω_b q' + ω_b² q = −a_g; floor absolute acceleration " +
      "a_g + Γφ·q''. Higher modes, soil–structure interaction, nonlinear building response and the equipment's " +
      'feedback on the floor are not represented.',
    'Floor acceleration sampled at the record’s own times; the component oscillators take it as linear between samples.',
    'Component spectra of the floor record by the same sweep as `quakesweep spectrum`.',
  ];
  if (building.periodS < 10 * dtS) {
    out.push(
      `T_b = ${building.periodS} s is under 10 record steps (${dtS} s): the floor history is coarsely sampled; resample the record finer.`,
    );
  }
  out.push(
    result.broadening === null
      ? 'Peaks not broadened (--broaden to widen them for uncertain building frequencies).'
      : `Peaks broadened (US NRC Regulatory Guide 1.122, from memory: ±15% of frequency): value at T = largest over ` +
          `[T(1−b), T/(1−b)], b = ${result.broadening}, which covers ±b in period and in frequency; ` +
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
  const g = STANDARD_GRAVITY_MS2;
  const out: string[] = [];
  for (const line of cautionLines(92)) out.push(`! ${line}`);
  out.push('');
  out.push(
    `record    ${ground.record.name} (${ground.record.source}), PGA ${(ground.record.pgaMS2 / g).toFixed(4)} g`,
  );
  out.push(
    `building  T_b ${building.periodS} s, ζ_b ${building.damping}, Γφ ${building.modalFactor}; floor PGA ${(floor.record.pgaMS2 / g).toFixed(4)} g`,
  );
  out.push(`method    ${METHOD_DESCRIPTIONS[floor.method]}`);
  out.push('');
  const columns = floor.curves.flatMap((curve, d): PeriodColumn[] => {
    const label = dampingLabel(curve.damping);
    return [
      { heading: `ground PSA g @${label}`, width: 18, at: (p) => ground.curves[d].psaMS2[p] / g },
      { heading: `floor PSA g @${label}`, width: 17, at: (p) => curve.psaMS2[p] / g },
    ];
  });
  out.push(...periodTable(floor.periodsS, columns, true));
  out.push(`(${floor.periodsS.length} periods; --format json for all of them)`);
  out.push('');
  out.push('method and assumptions');
  for (const line of assumptions) out.push(...wrapText(line, 92, '  - ', '    '));
  return `${out.join('\n')}\n`;
}

const psaCurvesG = (spectrum: Spectrum) =>
  spectrum.curves.map((curve) => ({
    damping: curve.damping,
    psa_g: toG(curve.psaMS2),
  }));

/** The JSON of `quakesweep floor`: the floor spectrum's, with the building, the ground and the assumptions. */
export function floorToJson(
  result: FloorSpectra,
  ground: Spectrum,
  building: BuildingMode & { method: Method },
  assumptions: string[],
) {
  return {
    ...spectrumToJson(result.spectrum),
    building: {
      period_s: building.periodS,
      damping: building.damping,
      modal_factor: building.modalFactor,
      method: building.method,
    },
    broadening:
      result.broadening === null
        ? null
        : {
            fraction: result.broadening,
            window: 'max over [T(1-b), T/(1-b)]',
            source: 'US NRC Regulatory Guide 1.122 (from memory)',
          },
    unbroadened_psa_g: psaCurvesG(result.unbroadened),
    ground: {
      name: ground.record.name,
      source: ground.record.source,
      pga_g: ground.record.pgaMS2 / STANDARD_GRAVITY_MS2,
      spectra: psaCurvesG(ground),
    },
    assumptions,
  };
}
