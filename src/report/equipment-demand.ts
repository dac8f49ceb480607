import { analyseAnchorage, type ElasticInput } from '../anchorage/anchorage.js';
import { componentPsaOnCurve, recordPsaForComponent } from '../anchorage/elastic-demand.js';
import type { Equipment } from '../anchorage/equipment.js';
import { anchorageToJson } from '../formats/anchorage-json.js';
import { anchorPlanInput } from '../formats/anchorage-plan.js';
import { floorAssumptions } from '../formats/floor.js';
import type { Method } from '../oscillator/recurrence.js';
import { floorFigure } from '../plot/floor-figure.js';
import { anchorPlanSvg, type PeriodAxis } from '../plot/index.js';
import type { GroundRecord } from '../record/record.js';
import { type BuildingMode, FLOOR_METHOD_DESCRIPTION, floorSpectrum } from '../spectrum/floor.js';
import { responseSpectrum } from '../spectrum/spectrum.js';
import type { ReportAnchorage } from './anchorage-section.js';
import { floorEnvelopeDemand } from './floor-envelope-demand.js';
import type { ReportFigure } from './html.js';

/** The elastic demand of one item of equipment in a report, with the motion it came from. */
export interface EquipmentDemand {
  elastic: ElasticInput | null;
  motion: string;
  notes: string[];
  /** The floor spectrum figure (SVG), for equipment above the base in a described building. */
  floor?: string;
  /** Its caption, when it is not the one floor spectrum's. */
  floorCaption?: string;
}

/** Where the demand of equipment comes from: the grid, and the building of equipment above the base. */
export interface DemandMotion {
  grid: { periodsS: Float64Array; method: Method };
  building?: BuildingMode | null;
  broadening?: number | null;
  /** The floor spectrum figure's x axis; default frequency. */
  axis?: PeriodAxis;
  /**
   * Further ground records (e.g. the second horizontal, processed and scaled alike): equipment
   * above the base then takes the envelope of the floor spectra of the record and of these.
   */
  floorRecords?: readonly GroundRecord[];
}

/**
 * The elastic demand of one item: on grade, the record's own oscillator at the component's period
 * and damping; above the base, the floor spectrum of the one-mode building (floor.ts), broadened
 * as `broadening` says; without a building, none (the code force alone).
 */
export function equipmentDemand(e: Equipment, record: GroundRecord, motion: DemandMotion): EquipmentDemand {
  const { periodsS, method } = motion.grid;
  const { building } = motion;
  if (e.zM === 0) {
    const value = recordPsaForComponent(record, e.periodS, e.damping, method);
    return { elastic: { ...value, source: record.name }, motion: `ground record ${record.name}`, notes: [] };
  }
  if (!building) {
    return {
      elastic: null,
      motion:
        'none: the equipment is above the base and no building was described (--building-period, --modal-factor)',
      notes: [
        'The ground motion was not used: the equipment is above the base and no floor spectrum was made.',
      ],
    };
  }
  if ((motion.floorRecords ?? []).length > 0)
    return floorEnvelopeDemand(e, [record, ...(motion.floorRecords ?? [])], building, motion);
  const grid = { periodsS, dampings: [e.damping], method };
  const floor = floorSpectrum(record, building, grid, motion.broadening ?? null);
  const curve = floor.spectrum.curves[0].psaMS2;
  const value = componentPsaOnCurve(e.periodS, periodsS, curve, floor.spectrum.record.pgaMS2, {
    curve: 'floor spectrum',
    pga: 'floor PGA',
  });
  // The same figure as `quakesweep floor` makes (floor.svg).
  const figure = floorFigure({
    ground: responseSpectrum(record, grid),
    floor: floor.spectrum,
    unbroadened: floor.broadening === null ? undefined : floor.unbroadened,
    broadening: floor.broadening,
    building,
    methodDescription: FLOOR_METHOD_DESCRIPTION,
    axis: motion.axis ?? 'frequency',
  });
  const broadened = floor.broadening === null ? '' : `, peaks broadened ±${floor.broadening}`;
  return {
    elastic: { ...value, source: 'floor spectrum' },
    motion: `floor spectrum of ${record.name}: T_b = ${building.periodS} s, ζ_b = ${building.damping}, Γφ = ${building.modalFactor}${broadened}`,
    notes: [...floorAssumptions(floor), 'This tool does not check that Γφ belongs to the floor at z.'],
    floor: figure,
  };
}

/**
 * Item `n` of the report's equipment: its anchorage for the larger of the code force and the
 * elastic demand (the code force alone without a motion), and its figures, the floor spectrum first.
 */
export function equipmentAnchorage(
  n: number,
  equipment: { file: string; value: Equipment },
  record: GroundRecord,
  motion: DemandMotion,
): ReportAnchorage {
  const demand = equipmentDemand(equipment.value, record, motion);
  const analysis = analyseAnchorage(equipment.value, {
    elastic: demand.elastic,
    demand: demand.elastic === null ? 'code' : 'max',
  });
  analysis.assumptions.push(...demand.notes);
  const figures: ReportFigure[] = [
    {
      file: `anchor-plan-${n}.svg`,
      caption: `Anchor plan of equipment ${n} with the worst tensions`,
      svg: anchorPlanSvg(anchorPlanInput(analysis)),
    },
  ];
  if (demand.floor !== undefined) {
    const caption =
      demand.floorCaption?.replace('the equipment', `equipment ${n}`) ??
      `Floor spectrum for equipment ${n}, with the ground PSA`;
    figures.unshift({ file: `floor-${n}.svg`, caption, svg: demand.floor });
  }
  return { json: anchorageToJson(analysis), file: equipment.file, motion: demand.motion, figures };
}
