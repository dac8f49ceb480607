import { realpathSync } from 'node:fs';
import { resolve } from 'node:path';
import type { Command } from 'commander';
import { usageError } from '../../base/errors.js';
import { floorAssumptions, floorTable, floorToJson } from '../../formats/floor.js';
import {
  floorSetAssumptions,
  floorSetTable,
  floorSetToCsv,
  floorSetToJson,
} from '../../formats/floor-set.js';
import { spectrumToCsv } from '../../formats/spectrum-csv.js';
import { floorFigure } from '../../plot/floor-figure.js';
import { floorSetFigure } from '../../plot/floor-set-figure.js';
import { appliedSteps } from '../../record/reading.js';
import type { GroundRecord } from '../../record/record.js';
import { FLOOR_METHOD_DESCRIPTION, floorSpectrum } from '../../spectrum/floor.js';
import { floorSpectrumSet, recordLabels } from '../../spectrum/floor-set.js';
import { responseSpectrum } from '../../spectrum/spectrum.js';
import { gridWords } from '../announce.js';
import { type AxisCliOptions, addAxisOption, svgAxisFromOptions } from '../options/axis.js';
import { type BuildingCliOptions, broadeningFromOptions, buildingFromOptions } from '../options/building.js';
import { addOutputOptions, type OutputCliOptions, outputFormat, writeProduct } from '../options/format.js';
import { addGridOptions, type GridCliOptions, gridFromOptions } from '../options/grid.js';
import { addProcessingOptions, applyProcessing, type ProcessingCliOptions } from '../options/processing.js';
import { addRecordOptions, loadRecord, type RecordCliOptions } from '../options/record.js';

export interface FloorCliOptions
  extends RecordCliOptions,
    ProcessingCliOptions,
    GridCliOptions,
    BuildingCliOptions,
    OutputCliOptions,
    AxisCliOptions {}

export function registerFloor(program: Command): void {
  const command = program
    .command('floor')
    .description(
      'in-structure (floor) response spectra from ground records and a one-mode building; with several records also their mean and envelope',
    )
    .argument(
      '<records...>',
      'ground record files (read alike), - for standard input once; several give each floor spectrum, their mean and envelope',
    );
  addRecordOptions(command);
  addProcessingOptions(command);
  addGridOptions(command);
  command
    .option('--building-period <seconds>', "the building's fundamental period T_b, s (required)")
    .option('--building-damping <ratio>', "the building's modal damping, fraction or percentage", '5%')
    .option(
      '--modal-factor <value>',
      'Γφ at the floor: participation factor times mode shape there (required)',
    )
    .option('--broaden [fraction]', 'broaden peaks over [T(1−b), T/(1−b)], b = 0.15 unless given');
  addAxisOption(command);
  addOutputOptions(
    command,
    'also draw the floor spectrum against the ground spectrum (several records: each, the mean and the envelope), DIR/floor.svg',
  ).action(runFloor);
}

/** `quakesweep floor`: one record (a path, or a list of one) as ever, several as a set. */
export async function runFloor(records: string | string[], options: FloorCliOptions): Promise<void> {
  const sources = typeof records === 'string' ? [records] : records;
  if (sources.length > 1) return runFloorSet(sources, options);
  const [source] = sources;
  const grid = gridFromOptions(options);
  const building = buildingFromOptions(options);
  const broadening = broadeningFromOptions(options.broaden);
  outputFormat(options);
  const axis = svgAxisFromOptions(options);
  const ground = applyProcessing(await loadRecord(source, options), options);
  const result = floorSpectrum(ground, building, grid, broadening);
  const groundSpectrum = responseSpectrum(ground, grid);
  const assumptions = [...floorAssumptions(result), ...processingNotes([ground])];
  const figure = () =>
    floorFigure({
      ground: groundSpectrum,
      floor: result.spectrum,
      unbroadened: result.broadening === null ? undefined : result.unbroadened,
      broadening: result.broadening,
      building,
      methodDescription: FLOOR_METHOD_DESCRIPTION,
      axis,
    });
  await writeProduct([source], options, {
    json: () => floorToJson(result, groundSpectrum, building, assumptions),
    csv: () => spectrumToCsv(result.spectrum, { lengthUnit: 'm' }),
    table: () => floorTable(result.spectrum, groundSpectrum, building, assumptions),
    figures: () => [['floor.svg', figure()]],
    summary: `floor spectrum of ${ground.name} (T_b ${building.periodS} s), ${gridWords(grid.periodsS.length, grid.dampings.length)}`,
  });
}

/** Several records: each floor spectrum (broadened first when asked), their mean and their envelope. */
async function runFloorSet(sources: string[], options: FloorCliOptions): Promise<void> {
  checkSources(sources);
  if (options.name !== undefined)
    throw usageError('--name names one record; with several records each keeps its file name');
  const grid = gridFromOptions(options);
  const building = buildingFromOptions(options);
  const broadening = broadeningFromOptions(options.broaden);
  outputFormat(options);
  const axis = svgAxisFromOptions(options);
  const grounds = [];
  for (const source of sources) grounds.push(applyProcessing(await loadRecord(source, options), options));
  const set = floorSpectrumSet(grounds, building, grid, broadening);
  const assumptions = [...floorSetAssumptions(set), ...processingNotes(grounds)];
  const labels = recordLabels(set.grounds);
  const figure = () =>
    floorSetFigure({ set, labels, building, methodDescription: FLOOR_METHOD_DESCRIPTION, axis });
  await writeProduct(sources, options, {
    json: () => floorSetToJson(set, building, assumptions),
    csv: () => floorSetToCsv(set, assumptions),
    table: () => floorSetTable(set, building, assumptions),
    figures: () => [['floor.svg', figure()]],
    summary: `floor spectra of ${grounds.length} records with their mean and envelope (T_b ${building.periodS} s), ${gridWords(grid.periodsS.length, grid.dampings.length)}`,
  });
}

/** The processing of each ground record before the building, one line a record that had any. */
function processingNotes(grounds: readonly GroundRecord[]): string[] {
  return grounds
    .filter((g) => appliedSteps(g.processing).length > 0)
    .map(
      (g) =>
        `Ground record ${g.name} processed: ${appliedSteps(g.processing)
          .map((step) => step.description)
          .join('; ')}.`,
    );
}

/** Standard input at most once, and no file twice (it would count twice in the mean and envelope). */
function checkSources(sources: string[]): void {
  if (sources.filter((s) => s === '-').length > 1)
    throw usageError('standard input (-) can be given only once');
  const seen = new Map<string, string>();
  for (const source of sources) {
    if (source === '-') continue;
    const key = samePath(source);
    const before = seen.get(key);
    if (before !== undefined)
      throw usageError(
        `${source}: given twice${before === source ? '' : ` (as ${before})`}; give each record once, or it counts twice in the mean`,
      );
    seen.set(key, source);
  }
}

/** A path by the file it names: its real path when it exists (links followed), else as resolved. */
function samePath(path: string): string {
  try {
    return realpathSync(path);
  } catch {
    return resolve(path);
  }
}
