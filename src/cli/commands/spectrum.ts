import type { Command } from 'commander';
import { usageError } from '../../base/errors.js';
import { type LengthUnit, parseLengthUnit } from '../../base/units.js';
import { spectrumToCsv } from '../../formats/spectrum-csv.js';
import { formatJson, spectrumToJson } from '../../formats/spectrum-json.js';
import { summaryTable } from '../../formats/spectrum-table.js';
import { targetToJson } from '../../formats/target.js';
import { defaultPeriodsS, MAX_OSCILLATORS, parseDampings, parsePeriods } from '../../oscillator/grid.js';
import { METHOD_DESCRIPTIONS, parseMethod } from '../../oscillator/recurrence.js';
import type { SweepKernel } from '../../oscillator/sweep.js';
import { checkFolder, OutputSet } from '../../output/output-set.js';
import type { PsaOverlay } from '../../plot/index.js';
import { integrateRecord } from '../../record/integrate.js';
import type { GroundRecord } from '../../record/record.js';
import { responseSpectrumParallel, type Spectrum } from '../../spectrum/spectrum.js';
import { targetOverlay, targetRecord } from '../../spectrum/target.js';
import { addProcessingOptions, applyProcessing, type ProcessingCliOptions } from '../processing-options.js';
import { addRecordOptions, loadRecord, type RecordCliOptions } from '../record-options.js';
import { addTargetOptions, applyTarget, loadTarget, type TargetCliOptions } from '../target-options.js';

export interface GridCliOptions {
  periods?: string;
  damping?: string;
  method?: string;
  force?: boolean;
}

export interface SpectrumCliOptions
  extends RecordCliOptions,
    ProcessingCliOptions,
    GridCliOptions,
    TargetCliOptions {
  format?: string;
  out?: string;
  lengthUnit?: string;
  svg?: string;
  axes?: string;
  histories?: boolean;
  threads?: string;
  kernel?: string;
}

/** Add --periods, --damping, --method and --force. */
export function addGridOptions(command: Command): Command {
  return command
    .option(
      '--periods <grid>',
      'periods, s: a list (0,0.1,0.5) or a:b:n log-spaced (default: 0 and 0.01:10:120)',
    )
    .option('--damping <list>', 'damping ratios as fractions or percentages, e.g. 0.02,5%', '5%')
    .option('--method <method>', 'newmark-average, newmark-linear or piecewise-exact', 'newmark-average')
    .option('--force', `allow more than ${thousands(MAX_OSCILLATORS)} oscillators`);
}

/** 1000000 → "1,000,000" (toLocaleString would load the locale data: 25 ms of every start-up). */
function thousands(value: number): string {
  return String(value).replace(/\B(?=(\d{3})+(?!\d))/g, ',');
}

export function gridFromOptions(options: GridCliOptions) {
  const periodsS = options.periods === undefined ? defaultPeriodsS() : parsePeriods(options.periods);
  const dampings = parseDampings(options.damping ?? '5%');
  const method = parseMethod(options.method ?? 'newmark-average');
  const count = periodsS.length * dampings.length;
  if (count > MAX_OSCILLATORS && !options.force) {
    throw usageError(`${count} oscillators is more than ${MAX_OSCILLATORS}; add --force if you mean it`);
  }
  return { periodsS, dampings, method };
}

export function registerSpectrum(program: Command): void {
  const command = program
    .command('spectrum')
    .description('response spectra (SD, PSV, PSA, SV, SA) of a ground-acceleration record')
    .argument('<record>', 'record file, or - for standard input');
  addRecordOptions(command);
  addProcessingOptions(command);
  addGridOptions(command);
  addTargetOptions(command);
  command
    .option('--format <format>', 'json or csv (default: a summary table on the terminal, or json with --out)')
    .option('--out <path>', 'write to this file instead of standard output')
    .option(
      '--length-unit <unit>',
      'length unit for CSV, figures and the terminal summary: m, cm, mm, in, ft',
      'm',
    )
    .option(
      '--svg <dir>',
      'also write psa.svg, sd.svg, psv.svg and tripartite.svg into this folder (created if its parent exists)',
    )
    .option('--axes <axes>', 'axes of the PSA, SD and PSV figures: log or linear', 'log')
    .option(
      '--histories',
      'with --svg, also write histories.svg (ground acceleration, velocity, displacement)',
    )
    .option('--threads <n>', 'threads for a large sweep (default: all cores; small sweeps use one)')
    .option('--kernel <kernel>', 'sweep kernel: auto (WebAssembly SIMD where available), wasm or js', 'auto')
    .action(async (source: string, options: SpectrumCliOptions) => {
      await runSpectrum(source, options);
    });
}

export async function runSpectrum(source: string, options: SpectrumCliOptions): Promise<void> {
  const grid = gridFromOptions(options);
  const lengthUnit = parseLengthUnit(options.lengthUnit ?? 'm');
  const format = options.format ?? (options.out === undefined ? 'table' : 'json');
  if (!['json', 'csv', 'table'].includes(format)) throw usageError(`--format '${format}': use json or csv`);
  const axes = figureAxes(options);
  const target = loadTarget(options);
  const sweep = sweepChoice(options);
  const processed = applyProcessing(await loadRecord(source, options), options);
  const swept = await responseSpectrumParallel(processed, { ...grid, ...sweep });
  const { fit, spectrum } = applyTarget(swept, target, options);
  const record = targetRecord(processed, fit);
  const outputs = new OutputSet(options.target === undefined ? [source] : [source, options.target]);
  if (options.svg !== undefined) {
    const overlays = fit === undefined ? [] : [targetOverlay(spectrum.periodsS, fit)];
    const figure = { axes, lengthUnit, overlays };
    outputs.folder(options.svg, await figures(record, spectrum, figure, options.histories), '--svg');
  }
  const text =
    format === 'json'
      ? formatJson({ ...spectrumToJson(spectrum), ...(fit && targetToJson(fit)) })
      : format === 'csv'
        ? spectrumToCsv(spectrum, { lengthUnit, target: fit })
        : summaryTable(spectrum, lengthUnit, fit);
  outputs.text(options.out, text).write();
}

function sweepChoice(options: SpectrumCliOptions): { threads: number | 'auto'; kernel: SweepKernel } {
  const kernel = options.kernel ?? 'auto';
  if (kernel !== 'auto' && kernel !== 'wasm' && kernel !== 'js') {
    throw usageError(`--kernel '${kernel}': use auto, wasm or js`);
  }
  return { threads: options.threads === undefined ? 'auto' : parseThreads(options.threads), kernel };
}

/** The value of --threads: a whole number from 1 to 256. */
export function parseThreads(text: string): number {
  const threads = Number(text);
  if (!Number.isInteger(threads) || threads < 1 || threads > 256) {
    throw usageError(`--threads must be a whole number from 1 to 256, got '${text}'`);
  }
  return threads;
}

function figureAxes(options: SpectrumCliOptions): 'log' | 'linear' {
  const axes = options.axes ?? 'log';
  if (axes !== 'log' && axes !== 'linear') throw usageError(`--axes '${axes}': use log or linear`);
  if (options.histories && options.svg === undefined) throw usageError('--histories needs --svg <dir>');
  if (options.svg !== undefined) checkFolder({ path: options.svg, option: '--svg' });
  return axes;
}

/** The figures of --svg, by file name (the figure modules load only here). */
async function figures(
  record: GroundRecord,
  spectrum: Spectrum,
  figure: { axes: 'log' | 'linear'; lengthUnit: LengthUnit; overlays: PsaOverlay[] },
  histories: boolean | undefined,
): Promise<[string, string][]> {
  const { historiesFigure, psaFigure, psvFigure, sdFigure, tripartiteFigure } = await import(
    '../../plot/index.js'
  );
  const shared = { ...figure, methodDescription: METHOD_DESCRIPTIONS[spectrum.method] };
  const files: [string, string][] = [
    ['psa.svg', psaFigure(spectrum, shared)],
    ['sd.svg', sdFigure(spectrum, shared)],
    ['psv.svg', psvFigure(spectrum, shared)],
    ['tripartite.svg', tripartiteFigure(spectrum, shared)],
  ];
  if (histories) {
    files.push([
      'histories.svg',
      historiesFigure({ ...record, ...integrateRecord(record) }, { lengthUnit: figure.lengthUnit }),
    ]);
  }
  return files;
}
