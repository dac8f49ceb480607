import type { DemandChoice, ElasticInput } from '../../anchorage/anchorage.js';
import { recordPsaForComponent } from '../../anchorage/elastic-demand.js';
import { EQUIPMENT_UNITS, type Equipment } from '../../anchorage/equipment.js';
import { usageError } from '../../base/errors.js';
import type { Method } from '../../oscillator/recurrence.js';
import { appliedSteps } from '../../record/reading.js';
import { applyProcessing, type ProcessingCliOptions } from './processing.js';
import { loadRecord, type RecordCliOptions } from './record.js';
import { readSpectrumFile } from './spectrum-file.js';

/** The ground motion of `quakesweep anchor`: ground records or a spectrum file. */
export interface MotionCliOptions extends RecordCliOptions, ProcessingCliOptions {
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
  const file = options.spectrum === undefined ? undefined : readSpectrumFile(options.spectrum, equipment);
  if (file === undefined && records.length === 0) return { elastic: null, notes: [] };
  if (equipment.zM > 0 && !file?.isFloor) {
    const { length, mPerLength } = EQUIPMENT_UNITS[equipment.units];
    if (demand !== 'code') {
      throw usageError(
        `the equipment is attached at z = ${equipment.zM / mPerLength} ${length} above the base, so a ground motion does not describe its floor; ` +
          'make a floor spectrum with `quakesweep floor REC ... --format json --out floor.json` and give --spectrum floor.json, ' +
          'or use --demand code',
      );
    }
    const unused =
      'The ground motion given was not used: the equipment is above the base and no floor spectrum was given.';
    return { elastic: null, notes: [unused] };
  }
  if (file !== undefined) return { elastic: file.value, notes: file.isFloor ? [file.floorNote] : [] };
  let elastic: ElasticInput | null = null;
  const processed: string[] = [];
  for (const source of records) {
    const record = applyProcessing(await loadRecord(source, options), options);
    const applied = appliedSteps(record.processing);
    if (applied.length > 0)
      processed.push(`Record ${record.name} processed: ${applied.map((s) => s.description).join('; ')}.`);
    const value = recordPsaForComponent(record, equipment.periodS, equipment.damping, method);
    if (elastic === null || value.psaG > elastic.psaG) elastic = { ...value, source };
  }
  const largest = `Record demand: the largest of ${records.length} records (${records.join(', ')}).`;
  return { elastic, notes: [...processed, ...(records.length > 1 ? [largest] : [])] };
}
