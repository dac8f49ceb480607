import type { ElasticInput } from '../anchorage/anchorage.js';
import { psaAtPeriod, recordPsaForComponent } from '../anchorage/elastic-demand.js';
import type { Equipment } from '../anchorage/equipment.js';
import { STANDARD_GRAVITY_MS2 } from '../base/units.js';
import { floorAssumptions } from '../formats/floor.js';
import { METHOD_DESCRIPTIONS, type Method } from '../oscillator/recurrence.js';
import { psaFigure } from '../plot/index.js';
import type { GroundRecord } from '../record/record.js';
import { type BuildingMode, floorSpectrum } from '../spectrum/floor.js';
import { responseSpectrum } from '../spectrum/spectrum.js';

/** The elastic demand of one item of equipment in a report, with the motion it came from. */
export interface EquipmentDemand {
  elastic: ElasticInput | null;
  motion: string;
  notes: string[];
  /** The floor spectrum figure (SVG), for equipment above the base in a described building. */
  floor?: string;
}

/**
 * The elastic demand of one item: on grade, the record's own oscillator at the component's period
 * and damping; above the base, the floor spectrum of the one-mode building (floor.ts), broadened
 * as `broadening` says; without a building, none (the code force alone).
 */
export function equipmentDemand(
  e: Equipment,
  record: GroundRecord,
  building: BuildingMode | null,
  broadening: number | null,
  periodsS: Float64Array,
  method: Method,
): EquipmentDemand {
  if (e.zM === 0) {
    const value = recordPsaForComponent(record, e.periodS, e.damping, method);
    return { elastic: { ...value, source: record.name }, motion: `ground record ${record.name}`, notes: [] };
  }
  if (building === null) {
    return {
      elastic: null,
      motion:
        'none: the equipment is above the base and no building was described (--building-period, --modal-factor)',
      notes: [
        'The ground motion was not used: the equipment is above the base and no floor spectrum was made.',
      ],
    };
  }
  const grid = { periodsS, dampings: [e.damping], method };
  const floor = floorSpectrum(record, { ...building, method }, grid, broadening);
  const psa = Array.from(floor.spectrum.curves[0].psaMS2, (v) => v / STANDARD_GRAVITY_MS2);
  let value: { psaG: number; how: string };
  if (e.periodS === 'rigid') {
    const zero = Array.from(periodsS).indexOf(0);
    value =
      zero >= 0
        ? { psaG: psa[zero], how: 'PSA at T = 0 of the floor spectrum (floor PGA), rigid component' }
        : { psaG: floor.spectrum.record.pgaMS2 / STANDARD_GRAVITY_MS2, how: 'floor PGA, rigid component' };
  } else {
    value = psaAtPeriod(periodsS, psa, e.periodS, 'the floor spectrum');
  }
  const ground = responseSpectrum(record, grid);
  const figure = psaFigure(floor.spectrum, {
    methodDescription: METHOD_DESCRIPTIONS[method],
    overlays: [
      {
        label: `ground PSA, ζ = ${e.damping * 100}%`,
        periodsS: Array.from(periodsS).filter((t) => t > 0),
        psaG: Array.from(ground.curves[0].psaMS2, (v) => v / STANDARD_GRAVITY_MS2).filter(
          (_, i) => periodsS[i] > 0,
        ),
      },
    ],
  });
  const motion = `floor spectrum of ${record.name}: T_b = ${building.periodS} s, ζ_b = ${building.damping}, Γφ = ${building.modalFactor}${floor.broadening === null ? '' : `, peaks broadened ±${floor.broadening}`}`;
  return {
    elastic: { ...value, source: 'floor spectrum' },
    motion,
    notes: [
      ...floorAssumptions(floor, building, record.dtS),
      'This tool does not check that Γφ belongs to the floor at z.',
    ],
    floor: figure,
  };
}
