import { closeSync, fstatSync, openSync, readSync, statSync } from 'node:fs';
import { availableParallelism } from 'node:os';
import type { Command } from 'commander';
import { usageError } from '../../base/errors.js';
import { type LengthUnit, parseLengthUnit } from '../../base/units.js';
import { spectrumToCsv } from '../../formats/spectrum-csv.js';
import { formatJson, spectrumToJson } from '../../formats/spectrum-json.js';
import { summaryTable } from '../../formats/spectrum-table.js';
import { defaultPeriodsS, MAX_OSCILLATORS, parseDampings, parsePeriods } from '../../oscillator/grid.js';
import { METHOD_DESCRIPTIONS, parseMethod } from '../../oscillator/recurrence.js';
import { plannedSteps, planSweep, type SweepKernel, sweepOscillators } from '../../oscillator/sweep.js';
import { checkFolder, OutputSet } from '../../output/output-set.js';
import type { PsaOverlay } from '../../plot/index.js';
import { integrateRecord } from '../../record/integrate.js';
import type { GroundRecord } from '../../record/record.js';
import { assembleSpectrum, type Spectrum } from '../../spectrum/spectrum.js';
import { SweepPool } from '../../threads/team.js';
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
  const pool = earlyPool(source, grid, sweep);
  let closing: Promise<void> | undefined;
  try {
    const processed = applyProcessing(await loadRecord(source, options), options);
    const swept = await sweepSpectrum(processed, grid, sweep, pool);
    // The threads stop while the outputs are written (stopping one took 2–3 ms).
    closing = pool?.close();
    const targeted = applyTarget(swept, target, options);
    const spectrum = targeted.spectrum;
    const record = targeted.record(processed);
    const outputs = new OutputSet(options.target === undefined ? [source] : [source, options.target]);
    if (options.svg !== undefined) {
      const overlays = targeted.overlay === undefined ? [] : [targeted.overlay];
      const figure = { axes, lengthUnit, overlays };
      outputs.folder(options.svg, await figures(record, spectrum, figure, options.histories), '--svg');
    }
    const text =
      format === 'json'
        ? formatJson({ ...spectrumToJson(spectrum), ...targeted.json })
        : format === 'csv'
          ? targeted.csv(spectrumToCsv(spectrum, { lengthUnit }))
          : targeted.table(summaryTable(spectrum, lengthUnit));
    outputs.text(options.out, text).write();
  } finally {
    await (closing ?? pool?.close());
  }
}

/**
 * Oscillator-steps from which a sweep is split over threads. A worker thread of the CLI takes
 * about 23 ms to start and the first groups it and this thread step run cold, so in a whole
 * `spectrum` run (medians of 11 on the benchmark's record, 40,000 samples, five dampings) two
 * threads were slower below this (4 million steps: 92 ms against 85; 10 million: 99 against 94),
 * level at 20 million (109 and 109) and faster above (40 million: 129 against 137).
 */
export const PARALLEL_MIN_OSCILLATOR_STEPS = 20_000_000;

function sweepChoice(options: SpectrumCliOptions): { threads?: number; kernel: SweepKernel } {
  const kernel = options.kernel ?? 'auto';
  if (kernel !== 'auto' && kernel !== 'wasm' && kernel !== 'js') {
    throw usageError(`--kernel '${kernel}': use auto, wasm or js`);
  }
  if (options.threads === undefined) return { kernel };
  return { threads: parseThreads(options.threads), kernel };
}

/** The value of --threads: a whole number from 1 to 256. */
export function parseThreads(text: string): number {
  const threads = Number(text);
  if (!Number.isInteger(threads) || threads < 1 || threads > 256) {
    throw usageError(`--threads must be a whole number from 1 to 256, got '${text}'`);
  }
  return threads;
}

/**
 * The threads of a sweep that is likely to be split (PARALLEL_MIN_OSCILLATOR_STEPS), started
 * before the record is read so that they start meanwhile; undefined otherwise. The record's
 * length is guessed from the file's size and the lines of its first 8 KiB (a sample a line in the
 * single and table layouts; a wrapped file guesses short, and is split all the same when it is
 * large, its threads joining later). A wrong guess costs the other core's time and, in this one,
 * a few milliseconds of a short run; sweepSpectrum decides from the record itself.
 */
function earlyPool(
  source: string,
  grid: ReturnType<typeof gridFromOptions>,
  choice: { threads?: number },
): SweepPool | undefined {
  const threads = choice.threads ?? availableParallelism();
  if (threads === 1 || source === '-') return undefined;
  const samples = estimatedLines(source);
  const steps = samples * grid.periodsS.filter((t) => t > 0).length * grid.dampings.length;
  return steps >= PARALLEL_MIN_OSCILLATOR_STEPS ? new SweepPool(threads) : undefined;
}

/**
 * Lines of a file, estimated from its size and the line ends of its first 8 KiB; 0 if it cannot be
 * read or is not a regular file (a named pipe is not opened here: that waits for a writer, and
 * bytes read from it would be lost to the reader).
 */
function estimatedLines(path: string): number {
  let fd: number | undefined;
  try {
    if (!statSync(path).isFile()) return 0;
    fd = openSync(path, 'r');
    const size = fstatSync(fd).size;
    const head = Buffer.allocUnsafe(Math.min(size, 1 << 13));
    const length = readSync(fd, head, 0, head.length, 0);
    let ends = 0;
    for (let i = 0; i < length; i++) if (head[i] === 10) ends++;
    if (ends === 0) for (let i = 0; i < length; i++) if (head[i] === 13) ends++; // lone CR line ends
    return length === 0 ? 0 : (size * Math.max(ends, 1)) / length;
  } catch {
    return 0;
  } finally {
    if (fd !== undefined) closeSync(fd);
  }
}

/** The spectrum of a record, its sweep split over threads (`pool`'s, when given) when it is large. */
async function sweepSpectrum(
  record: GroundRecord,
  grid: ReturnType<typeof gridFromOptions>,
  choice: { threads?: number; kernel: SweepKernel },
  pool?: SweepPool,
): Promise<Spectrum> {
  const options = { ...grid, kernel: choice.kernel };
  const plan = planSweep(record.accelMS2, record.dtS, options);
  const steps = plannedSteps(plan, record.accelMS2.length);
  const threads = choice.threads ?? (steps >= PARALLEL_MIN_OSCILLATOR_STEPS ? availableParallelism() : 1);
  if (threads === 1)
    return assembleSpectrum(record, sweepOscillators(record.accelMS2, record.dtS, options, plan));
  const sweeper = pool?.threads === threads ? pool : new SweepPool(threads);
  try {
    return assembleSpectrum(record, await sweeper.sweep(record.accelMS2, record.dtS, options, plan));
  } finally {
    if (sweeper !== pool) await sweeper.close();
  }
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
