import type { Command } from 'commander';
import { floorAssumptions, floorTable, floorToJson } from '../../formats/floor.js';
import { spectrumToCsv } from '../../formats/spectrum-csv.js';
import { METHOD_DESCRIPTIONS } from '../../oscillator/recurrence.js';
import { floorFigure } from '../../plot/floor-figure.js';
import { floorSpectrum } from '../../spectrum/floor.js';
import { responseSpectrum } from '../../spectrum/spectrum.js';
import { type AxisCliOptions, addAxisOption, svgAxisFromOptions } from '../options/axis.js';
import { type BuildingCliOptions, broadeningFromOptions, buildingFromOptions } from '../options/building.js';
import { addOutputOptions, type OutputCliOptions, outputFormat, writeProduct } from '../options/format.js';
import { addGridOptions, type GridCliOptions, gridFromOptions } from '../options/grid.js';
import { addRecordOptions, loadRecord, type RecordCliOptions } from '../options/record.js';

export interface FloorCliOptions
  extends RecordCliOptions,
    GridCliOptions,
    BuildingCliOptions,
    OutputCliOptions,
    AxisCliOptions {}

export function registerFloor(program: Command): void {
  const command = program
    .command('floor')
    .description('in-structure (floor) response spectra from a ground record and a one-mode building')
    .argument('<record>', 'ground record file, or - for standard input');
  addRecordOptions(command);
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
    'json or csv (default: a summary table on the terminal, or json with --out)',
    'also draw the floor spectrum against the ground spectrum, DIR/floor.svg',
  ).action(runFloor);
}

export async function runFloor(source: string, options: FloorCliOptions): Promise<void> {
  const grid = gridFromOptions(options);
  const building = { ...buildingFromOptions(options), method: grid.method };
  const broadening = broadeningFromOptions(options.broaden);
  outputFormat(options, 'json or csv');
  const axis = svgAxisFromOptions(options);
  const ground = await loadRecord(source, options);
  const result = floorSpectrum(ground, building, grid, broadening);
  const groundSpectrum = responseSpectrum(ground, grid);
  const assumptions = floorAssumptions(result, building, ground.dtS);
  const figure = () =>
    floorFigure({
      ground: groundSpectrum,
      floor: result.spectrum,
      unbroadened: result.broadening === null ? undefined : result.unbroadened,
      broadening: result.broadening,
      building,
      methodDescription: METHOD_DESCRIPTIONS[result.spectrum.method],
      axis,
    });
  await writeProduct([source], options, {
    json: () => floorToJson(result, groundSpectrum, building, assumptions),
    csv: () => spectrumToCsv(result.spectrum, { lengthUnit: 'm' }),
    table: () => floorTable(result.spectrum, groundSpectrum, building, assumptions),
    figures: () => [['floor.svg', figure()]],
  });
}
