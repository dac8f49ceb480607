import type { Command } from 'commander';
import { usageError } from '../../base/errors.js';
import { floorAssumptions, floorTable, floorToJson } from '../../formats/floor.js';
import { spectrumToCsv } from '../../formats/spectrum-csv.js';
import { formatJson } from '../../formats/spectrum-json.js';
import { MIN_PERIOD_S, parseDampings } from '../../oscillator/grid.js';
import { METHOD_DESCRIPTIONS } from '../../oscillator/recurrence.js';
import { OutputSet } from '../../output/output-set.js';
import { floorFigure } from '../../plot/floor-figure.js';
import { type BuildingMode, floorSpectrum } from '../../spectrum/floor.js';
import { responseSpectrum } from '../../spectrum/spectrum.js';
import { addRecordOptions, loadRecord } from '../record-options.js';
import { addGridOptions, gridFromOptions, type SpectrumCliOptions } from './spectrum.js';

export interface FloorCliOptions extends SpectrumCliOptions {
  buildingPeriod?: string;
  buildingDamping?: string;
  modalFactor?: string;
  broaden?: string | boolean;
  svg?: string;
}

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
    .option('--broaden [fraction]', 'broaden peaks over [T(1−b), T/(1−b)], b = 0.15 unless given')
    .option('--format <format>', 'json or csv (default: a summary table on the terminal, or json with --out)')
    .option('--out <path>', 'write to this file instead of standard output')
    .option('--svg <dir>', 'also draw the floor spectrum against the ground spectrum, DIR/floor.svg')
    .action(async (source: string, options: FloorCliOptions) => {
      await runFloor(source, options);
    });
}

export function buildingFromOptions(options: FloorCliOptions): BuildingMode {
  if (options.buildingPeriod === undefined) throw usageError('--building-period <seconds> is required');
  if (options.modalFactor === undefined)
    throw usageError(
      '--modal-factor <Γφ> is required (1 is the base of a rigid building; about 1.3 to 1.6 at the roof of a regular one)',
    );
  const periodS = Number(options.buildingPeriod);
  if (!(periodS >= MIN_PERIOD_S) || !Number.isFinite(periodS)) {
    throw usageError(
      `--building-period must be a number of seconds ≥ ${MIN_PERIOD_S}, got '${options.buildingPeriod}'`,
    );
  }
  const modalFactor = Number(options.modalFactor);
  if (options.modalFactor.trim() === '' || !Number.isFinite(modalFactor)) {
    throw usageError(`--modal-factor must be a number, got '${options.modalFactor}'`);
  }
  const dampings = parseDampings(options.buildingDamping ?? '5%');
  if (dampings.length !== 1 || !(dampings[0] < 1))
    throw usageError('--building-damping takes one ratio below 1');
  return { periodS, damping: dampings[0], modalFactor };
}

/** `--broaden [b]`: null when absent, 0.15 when given bare, else the fraction 0 ≤ b < 1. */
export function broadeningFromOptions(value: string | boolean | undefined): number | null {
  if (value === undefined || value === false) return null;
  if (value === true) return 0.15;
  const b = Number(value);
  if (value.trim() === '' || !(b >= 0) || !(b < 1))
    throw usageError(`--broaden must be a fraction 0 ≤ b < 1, got '${value}'`);
  return b;
}

export async function runFloor(source: string, options: FloorCliOptions): Promise<void> {
  const grid = gridFromOptions(options);
  const building = { ...buildingFromOptions(options), method: grid.method };
  const broadening = broadeningFromOptions(options.broaden);
  const format = options.format ?? (options.out === undefined ? 'table' : 'json');
  if (!['json', 'csv', 'table'].includes(format)) throw usageError(`--format '${format}': use json or csv`);
  const ground = await loadRecord(source, options);
  const result = floorSpectrum(ground, building, grid, broadening);
  const groundSpectrum = responseSpectrum(ground, grid);
  const assumptions = floorAssumptions(result, building, ground.dtS);
  const text =
    format === 'json'
      ? formatJson(floorToJson(result, groundSpectrum, building, assumptions))
      : format === 'csv'
        ? spectrumToCsv(result.spectrum, { lengthUnit: 'm' })
        : floorTable(result.spectrum, groundSpectrum, building, assumptions);
  const outputs = new OutputSet([source]);
  if (options.svg !== undefined) {
    const figure = floorFigure({
      ground: groundSpectrum,
      floor: result.spectrum,
      unbroadened: result.broadening === null ? undefined : result.unbroadened,
      broadening: result.broadening,
      building,
      methodDescription: METHOD_DESCRIPTIONS[result.spectrum.method],
    });
    outputs.folder(options.svg, [['floor.svg', figure]], '--svg');
  }
  outputs.text(options.out, text).write();
}
