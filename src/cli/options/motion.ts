import type { DemandChoice, ElasticInput } from '../../anchorage/anchorage.js';
import { recordPsaForComponent } from '../../anchorage/elastic-demand.js';
import { EQUIPMENT_UNITS, type Equipment } from '../../anchorage/equipment.js';
import { usageError } from '../../base/errors.js';
import type { Method } from '../../oscillator/recurrence.js';
import { loadRecord, type RecordCliOptions } from './record.js';
import { readSpectrumFile } from './spectrum-file.js';

/** The ground motion of `quakesweep anchor`: ground records or a spectrum file. */
export interface MotionCliOptions extends RecordCliOptions {
  record?: string[];
  spectrum?: string;
}

/**
 * The elastic demand of the motion the options name (none without one), with the notes it adds to
 * the assumptions: the largest of several records, a floor spectrum's building, a motion not used.
 */
export async function elasticFromOptions(
  options: MotionCliOptions,
  equipment: Equipment,
  demand: DemandChoice,
  method: Method,
): Promise<{ elastic: ElasticInput | null; notes: string[] }> {
  const records = options.record ?? [];
  const notes: string[] = [];
  let elastic: ElasticInput | null = null;
  if (options.spectrum !== undefined) {
    const read = readSpectrumFile(options.spectrum, equipment);
    if (equipment.zM > 0 && !read.isFloor) {
      refuseGroundOnFloor(equipment, demand, notes);
    } else {
      elastic = read.value;
      if (read.isFloor) notes.push(read.floorNote);
    }
  } else if (records.length > 0) {
    if (equipment.zM > 0) {
      refuseGroundOnFloor(equipment, demand, notes);
    } else {
      for (const source of records) {
        const record = await loadRecord(source, options);
        const value = recordPsaForComponent(record, equipment.periodS, equipment.damping, method);
        if (elastic === null || value.psaG > elastic.psaG) elastic = { ...value, source };
      }
      if (records.length > 1 && elastic !== null) {
        notes.push(`Record demand: the largest of ${records.length} records (${records.join(', ')}).`);
      }
    }
  }
  return { elastic, notes };
}

function refuseGroundOnFloor(equipment: Equipment, demand: DemandChoice, notes: string[]): void {
  const length = EQUIPMENT_UNITS[equipment.units].length;
  const z = equipment.zM / EQUIPMENT_UNITS[equipment.units].mPerLength;
  if (demand !== 'code') {
    throw usageError(
      `the equipment is attached at z = ${z} ${length} above the base, so a ground motion does not describe its floor; ` +
        'make a floor spectrum with `quakesweep floor REC ... --format json --out floor.json` and give --spectrum floor.json, ' +
        'or use --demand code',
    );
  }
  notes.push(
    'The ground motion given was not used: the equipment is above the base and no floor spectrum was given.',
  );
}
