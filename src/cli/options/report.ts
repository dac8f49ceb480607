import { createHash } from 'node:crypto';
import { readFileSync } from 'node:fs';
import { parseEquipment } from '../../anchorage/equipment.js';
import { isQuakesweepError, usageError } from '../../base/errors.js';
import { parseLengthUnit } from '../../base/units.js';
import { parsePeriods } from '../../oscillator/grid.js';
import { checkFolderInputs } from '../../output/output-set.js';
import type { ReportRequest } from '../../report/assemble.js';
import { type AxisCliOptions, periodAxisFromOptions } from './axis.js';
import { type BuildingCliOptions, broadeningFromOptions, buildingFromOptions } from './building.js';
import { figureAxes } from './format.js';
import { generationTime } from './generation-time.js';
import { type GridCliOptions, gridFromOptions } from './grid.js';
import { type InelasticCliOptions, modelFromOptions, parseDuctilities } from './inelastic.js';
import { applyProcessing, type ProcessingCliOptions } from './processing.js';
import { loadRecord, positiveNumber, type RecordCliOptions } from './record.js';
import { type TargetCliOptions, targetFromOptions } from './target.js';

/** The options of `quakesweep report` (and of the report `quakesweep demo` makes). */
export interface ReportCliOptions
  extends RecordCliOptions,
    ProcessingCliOptions,
    GridCliOptions,
    TargetCliOptions,
    BuildingCliOptions,
    AxisCliOptions,
    Pick<InelasticCliOptions, 'ductility' | 'model'> {
  ductilityPeriods?: string;
  out?: string;
  lengthUnit?: string;
  axes?: string;
  equipment?: string[];
  pair?: string;
  angleStep?: string;
  title?: string;
  note?: string[];
  project?: string;
  preparedBy?: string;
  checkedBy?: string;
  floorEnvelope?: boolean;
}

/**
 * Check the options, read the record, its pair and the equipment, and say what report to
 * assemble, which files it is made from and the folder it goes to. `commandLine` is the one the report states.
 */
export async function reportRequest(
  source: string,
  options: ReportCliOptions,
  commandLine: string[],
): Promise<{ request: ReportRequest; inputs: string[]; out: string }> {
  const out = options.out;
  if (out === undefined) throw usageError('--out <dir> is required');
  const equipment = (options.equipment ?? []).map((file) => ({
    file,
    value: parseEquipment(readFileSync(file, 'utf8'), file),
  }));
  const aboveBase = options.buildingPeriod !== undefined || options.modalFactor !== undefined;
  if (aboveBase && !equipment.some((e) => e.value.zM > 0))
    throw usageError('--building-period and --modal-factor apply to equipment above the base (z > 0)');
  if (options.floorEnvelope && (options.pair === undefined || !aboveBase))
    throw usageError('--floor-envelope needs --pair and a building (--building-period, --modal-factor)');
  const settings = {
    grid: gridFromOptions(options),
    lengthUnit: parseLengthUnit(options.lengthUnit ?? 'm'),
    axes: figureAxes(options.axes),
    axis: periodAxisFromOptions(options),
    target: targetFromOptions(options),
    equipment,
    building: aboveBase ? buildingFromOptions(options) : null,
    broadening: broadeningFromOptions(options.broaden),
    floorEnvelope: options.floorEnvelope === true,
    ductility: ductilityFromOptions(options),
    title: options.title,
    notes: options.note,
    titleBlock: { project: options.project, preparedBy: options.preparedBy, checkedBy: options.checkedBy },
    commandLine,
    workingDirectory: process.cwd(),
    generatedAt: generationTime(),
  };
  // Before any work: no input where the report would write (the output set checks the names again).
  const named = [
    source,
    options.pair ?? '-',
    ...equipment.map((e) => e.file),
    ...(settings.target?.files ?? []),
  ];
  checkFolderInputs({ path: out, option: '--out' }, named, isReportFile);
  const read = await loadRecord(source, options);
  let pair: ReportRequest['pair'];
  if (options.pair !== undefined) {
    // --name names the main record only; the second component keeps its file's name.
    const second = applyProcessing(await loadRecord(options.pair, { ...options, name: undefined }), options);
    pair = { record: second, angleStepDeg: positiveNumber('--angle-step', options.angleStep ?? '1') };
  }
  const request: ReportRequest = { ...settings, read, processed: applyProcessing(read, options), pair };
  const roles: [string, string][] = [
    ['record', source],
    ...(options.pair ? [['second component', options.pair] as [string, string]] : []),
    ...equipment.map((e): [string, string] => ['equipment', e.file]),
    ...(settings.target?.files ?? []).map((file): [string, string] => ['target spectrum', file]),
  ];
  request.inputFiles = roles.map(([role, path]) => ({ role, path, sha256: sha256OfFile(path) }));
  return { request, inputs: roles.map(([, path]) => path), out };
}

/** The SHA-256 of a file's bytes, hex, as the report states it beside the file; none of standard input. */
export function sha256OfFile(path: string): string {
  if (path === '-') return 'not computed (standard input)';
  return createHash('sha256').update(readFileSync(path)).digest('hex');
}

/** The inelastic section of --ductility, --model and --ductility-periods; none without --ductility. */
export function ductilityFromOptions(options: ReportCliOptions): ReportRequest['ductility'] {
  if (options.ductility === undefined) {
    if (options.model !== undefined || options.ductilityPeriods !== undefined)
      throw usageError('--model and --ductility-periods apply with --ductility');
    return undefined;
  }
  const ductilities = parseDuctilities(options.ductility);
  const model = modelFromOptions(options);
  if (options.ductilityPeriods === undefined) return { ductilities, model };
  try {
    return { ductilities, model, periodsS: parsePeriods(options.ductilityPeriods) };
  } catch (error) {
    if (!isQuakesweepError(error)) throw error;
    throw usageError(error.message.replace(/^--periods/, '--ductility-periods'));
  }
}

/** The words of a command line that gives `options` (camelCase keys as --kebab-case flags). */
export function optionWords(options: ReportCliOptions): string[] {
  const words: string[] = [];
  for (const [key, value] of Object.entries(options)) {
    const flag = `--${key.replace(/[A-Z]/g, (c) => `-${c.toLowerCase()}`)}`;
    for (const item of Array.isArray(value) ? value : [value]) {
      if (item === true) words.push(flag);
      else words.push(flag, String(item));
    }
  }
  return words;
}

/** The names a report may write in its folder (assemble.ts): report.html, spectra.*, anchorage-N.json, figures. */
const isReportFile = (name: string) =>
  /^(report\.html|spectra\.(json|csv)|anchorage-\d+\.json)$/.test(name) || name.endsWith('.svg');
