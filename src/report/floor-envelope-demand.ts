import type { ElasticInput } from '../anchorage/anchorage.js';
import { componentPsaOnCurve } from '../anchorage/elastic-demand.js';
import type { Equipment } from '../anchorage/equipment.js';
import { floorSetAssumptions } from '../formats/floor-set.js';
import type { Method } from '../oscillator/recurrence.js';
import { floorSetFigure } from '../plot/floor-set-figure.js';
import type { PeriodAxis } from '../plot/period-axis.js';
import type { GroundRecord } from '../record/record.js';
import { type BuildingMode, FLOOR_METHOD_DESCRIPTION } from '../spectrum/floor.js';
import { floorSpectrumSet, recordLabels } from '../spectrum/floor-set.js';

/** The elastic demand of equipment above the base from the envelope of several floor spectra. */
export interface FloorEnvelopeDemand {
  elastic: ElasticInput;
  motion: string;
  notes: string[];
  /** The figure of every record's floor spectrum, their mean and their envelope (SVG). */
  floor: string;
  floorCaption: string;
}

/**
 * The demand of equipment above the base from the envelope of the floor spectra of several ground
 * records (e.g. both horizontals) through one building, each broadened first as `broadening`
 * says (floorSpectrumSet): the envelope's PSA at the component's period and damping, or its value
 * at T = 0 (the largest floor PGA) for a rigid component.
 */
export function floorEnvelopeDemand(
  e: Equipment,
  records: readonly GroundRecord[],
  building: BuildingMode,
  motion: {
    grid: { periodsS: Float64Array; method: Method };
    broadening?: number | null;
    axis?: PeriodAxis;
  },
): FloorEnvelopeDemand {
  const { periodsS, method } = motion.grid;
  const grid = { periodsS, dampings: [e.damping], method };
  const set = floorSpectrumSet(records, building, grid, motion.broadening ?? null);
  const value = componentPsaOnCurve(e.periodS, periodsS, set.envelope.curves[0].psaMS2, set.envelope.pgaMS2, {
    curve: 'floor envelope',
    pga: 'largest floor PGA',
  });
  const labels = recordLabels(set.grounds);
  const broadened =
    set.broadening === null ? '' : `, peaks broadened ±${set.broadening} on each record first`;
  const n = records.length;
  return {
    elastic: { ...value, source: 'floor envelope' },
    motion: `floor envelope of ${n} records (${labels.join(', ')}): T_b = ${building.periodS} s, ζ_b = ${building.damping}, Γφ = ${building.modalFactor}${broadened}`,
    notes: [...floorSetAssumptions(set), 'This tool does not check that Γφ belongs to the floor at z.'],
    floor: floorSetFigure({
      set,
      labels,
      building,
      methodDescription: FLOOR_METHOD_DESCRIPTION,
      axis: motion.axis ?? 'frequency',
    }),
    floorCaption: `Floor spectra of ${n} records for the equipment: each, their mean and their envelope`,
  };
}
