import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import type { Command } from 'commander';
import { type Equipment, parseEquipment } from '../../anchorage/equipment.js';
import { usageError } from '../../base/errors.js';
import { parseLengthUnit } from '../../base/units.js';
import { checkFolder, OutputSet } from '../../output/output-set.js';
import { assembleReport, type ReportRequest } from '../../report/assemble.js';
import type { BuildingMode } from '../../spectrum/floor.js';
import { parseScaleRange } from '../../spectrum/scale.js';
import { type BuildingCliOptions, broadeningFromOptions, buildingFromOptions } from '../options/building.js';
import { figureAxes } from '../options/format.js';
import { generationTime } from '../options/generation-time.js';
import { addGridOptions, type GridCliOptions, gridFromOptions } from '../options/grid.js';
import { addProcessingOptions, applyProcessing, type ProcessingCliOptions } from '../options/processing.js';
import { addRecordOptions, loadRecord, positiveNumber, type RecordCliOptions } from '../options/record.js';
import { addTargetOptions, loadTarget, type TargetCliOptions } from '../options/target.js';

export interface ReportCliOptions
  extends RecordCliOptions,
    ProcessingCliOptions,
    GridCliOptions,
    TargetCliOptions,
    BuildingCliOptions {
  out?: string;
  lengthUnit?: string;
  axes?: string;
  equipment?: string[];
  buildingPeriod?: string;
  buildingDamping?: string;
  modalFactor?: string;
  broaden?: string | boolean;
  pair?: string;
  angleStep?: string;
  title?: string;
  note?: string[];
}

const collect = (value: string, previous: string[]) => [...previous, value];

export function registerReport(program: Command): void {
  const command = program
    .command('report')
    .description('a self-contained HTML calculation report (with spectra.json, spectra.csv and SVG figures)')
    .argument('<record>', 'record file');
  addRecordOptions(command);
  addProcessingOptions(command);
  addGridOptions(command);
  addTargetOptions(command);
  command
    .requiredOption(
      '--out <dir>',
      'folder for report.html and the files beside it (created if its parent exists)',
    )
    .option(
      '--note <text>',
      'a paragraph under the title, e.g. where the inputs come from (repeatable)',
      collect,
      [],
    )
    .option('--title <text>', 'title of the report (default: "Response spectra of <record name>")')
    .option('--length-unit <unit>', 'length unit of SD and PSV in tables and figures: m, cm, mm, in, ft', 'm')
    .option('--axes <axes>', 'axes of the PSA, SD and PSV figures: log or linear', 'log')
    .option('--pair <record>', 'second horizontal component, at right angles: adds RotD50 and RotD100')
    .option('--angle-step <degrees>', 'with --pair: rotation step, at most 1° and a divisor of 180', '1')
    .option(
      '--equipment <file>',
      'equipment description (JSON) for anchorage demands (repeatable)',
      collect,
      [],
    )
    .option('--building-period <seconds>', 'for equipment above the base: the building period T_b, s')
    .option('--building-damping <ratio>', "for equipment above the base: the building's modal damping", '5%')
    .option('--modal-factor <value>', 'for equipment above the base: Γφ at its floor')
    .option('--broaden [fraction]', 'broaden the floor spectrum peaks, b = 0.15 unless given')
    .action(async (source: string, options: ReportCliOptions, cmd: Command) => {
      const words =
        (cmd.parent as unknown as { rawArgs?: string[] } | null)?.rawArgs ?? process.argv.slice(2);
      await runReport(source, options, words);
    });
}

export async function runReport(
  source: string,
  options: ReportCliOptions,
  commandLine: string[],
): Promise<string> {
  const out = options.out;
  if (out === undefined) throw usageError('--out <dir> is required');
  const grid = gridFromOptions(options);
  const lengthUnit = parseLengthUnit(options.lengthUnit ?? 'm');
  const axes = figureAxes(options.axes);
  const target = loadTarget(options);
  const equipment = (options.equipment ?? []).map((file) => ({
    file,
    value: parseEquipment(readFileSync(file, 'utf8'), file),
  }));
  const building = needsBuilding(
    equipment.map((e) => e.value),
    options,
  );
  const broadening = broadeningFromOptions(options.broaden);
  checkFolder({ path: out, option: '--out' });
  const read = await loadRecord(source, options);
  const processed = applyProcessing(read, options);
  const rangeS = options.scaleRange === undefined ? undefined : parseScaleRange(options.scaleRange);
  let pair: ReportRequest['pair'];
  if (options.pair !== undefined) {
    // --name names the main record only; the second component keeps its file's name.
    const second = applyProcessing(await loadRecord(options.pair, { ...options, name: undefined }), options);
    pair = { record: second, angleStepDeg: positiveNumber('--angle-step', options.angleStep ?? '1') };
  }
  const files = await assembleReport({
    read,
    processed,
    grid,
    target:
      target === undefined ? undefined : { spectrum: target, rangeS, apply: options.applyScale === true },
    lengthUnit,
    axes,
    pair,
    equipment,
    building,
    broadening,
    title: options.title,
    notes: options.note,
    commandLine,
    workingDirectory: process.cwd(),
    generatedAt: generationTime(),
  });
  const inputs = [source, ...(options.pair ? [options.pair] : []), ...equipment.map((e) => e.file)];
  new OutputSet(inputs).folder(out, files).write();
  return join(out, 'report.html');
}

/** The building mode, when any equipment is above the base and the options describe one. */
function needsBuilding(equipment: Equipment[], options: ReportCliOptions): BuildingMode | null {
  if (options.buildingPeriod === undefined && options.modalFactor === undefined) return null;
  if (!equipment.some((e) => e.zM > 0))
    throw usageError('--building-period and --modal-factor apply to equipment above the base (z > 0)');
  return buildingFromOptions(options);
}
