import type { Command } from 'commander';
import { usageError } from '../../base/errors.js';
import { ductilityDemandToCsv, ductilityToCsv } from '../../formats/ductility-csv.js';
import {
  ductilityDemandToJson,
  ductilityToJson,
  YIELDING_METHOD_NAME,
} from '../../formats/ductility-json.js';
import { ductilityDemandTable, ductilityTable } from '../../formats/ductility-table.js';
import type { DuctilityDemandSpectra, DuctilitySpectra } from '../../inelastic/ductility.js';
import type { Hysteresis } from '../../inelastic/hysteresis.js';
import { referenceReductions } from '../../inelastic/r-mu-t.js';
import { MAX_OSCILLATORS } from '../../oscillator/grid.js';
import { ductilityFigures } from '../../plot/ductility-figure.js';
import type { PeriodAxis } from '../../plot/period-axis.js';
import type { GroundRecord } from '../../record/record.js';
import { ductilityDemandOnThreads, ductilitySpectraOnThreads } from '../../threads/ductility-pool.js';
import { gridWords } from '../announce.js';
import { type AxisCliOptions, addAxisOption, svgAxisFromOptions } from '../options/axis.js';
import { addOutputOptions, type OutputCliOptions, outputFormat, writeProduct } from '../options/format.js';
import { FREQUENCIES_HELP, type GridCliOptions, gridFromOptions } from '../options/grid.js';
import {
  addInelasticOptions,
  type InelasticCliOptions,
  modelFromOptions,
  parseDuctilities,
  parseStrengths,
} from '../options/inelastic.js';
import { addProcessingOptions, applyProcessing, type ProcessingCliOptions } from '../options/processing.js';
import { addRecordOptions, loadRecord, type RecordCliOptions } from '../options/record.js';
import { addThreadOptions, parseThreads } from '../options/threads.js';

export interface DuctilityCliOptions
  extends RecordCliOptions,
    ProcessingCliOptions,
    GridCliOptions,
    InelasticCliOptions,
    OutputCliOptions,
    AxisCliOptions {
  threads?: string;
}

export function registerDuctility(program: Command): void {
  const command = program
    .command('ductility')
    .description(
      'constant-ductility spectra of a yielding oscillator (A_y, R_y for target ductilities), or with --strength the ductility demand',
    )
    .argument('<record>', 'record file, or - for standard input');
  addRecordOptions(command);
  addProcessingOptions(command);
  addInelasticOptions(command)
    .option(
      '--periods <grid>',
      'periods, s: a list (0,0.1,0.5) or a:b:n log-spaced (default: 0 and 0.01 to 10 s, 40 a decade, 1-2-5 on it; with --strength the same without 0, as T = 0 has no finite demand)',
    )
    .option('--frequencies <grid>', FREQUENCIES_HELP)
    .option('--damping <list>', 'damping ratios as fractions or percentages, e.g. 0.02,5%', '5%')
    .option(
      '--method <method>',
      `step method: ${YIELDING_METHOD_NAME} (the only one for the yielding oscillator)`,
    )
    .option(
      '--force',
      `allow more than ${String(MAX_OSCILLATORS).replace(/\B(?=(\d{3})+(?!\d))/g, ',')} oscillators (periods × dampings)`,
    );
  addThreadOptions(command, false);
  addAxisOption(command);
  addOutputOptions(
    command,
    'also draw the figures: DIR/ductility-ay.svg and DIR/ductility-ry.svg, or with --strength DIR/ductility-demand.svg',
  ).action((source: string, options: DuctilityCliOptions, self: Command) =>
    runDuctility(source, options, self.getOptionValueSource('ductility') === 'cli'),
  );
}

/** What the options ask to compute: target ductilities, or given strengths (the demand). */
interface DuctilityRequest {
  periodsS: Float64Array;
  dampings: Float64Array;
  model: Hysteresis;
  ductilities: number[];
  strengths?: { ry: number[] } | { ayG: number[] };
}

/**
 * `quakesweep ductility`: every option is checked before the record is read; `ductilityGiven` tells
 * an explicit --ductility from its default (refused beside --strength).
 */
export async function runDuctility(
  source: string,
  options: DuctilityCliOptions,
  ductilityGiven = false,
): Promise<void> {
  const request = requestFromOptions(options, ductilityGiven);
  const threads = options.threads === undefined ? 'auto' : parseThreads(options.threads);
  outputFormat(options);
  const axis = svgAxisFromOptions(options);
  const record = applyProcessing(await loadRecord(source, options), options);
  const result = await computeSpectra(record, request, threads);
  await writeProduct([source], options, {
    json: () =>
      'ductility' in result ? ductilityToJson(result.ductility) : ductilityDemandToJson(result.demand),
    csv: () =>
      'ductility' in result ? ductilityToCsv(result.ductility) : ductilityDemandToCsv(result.demand),
    table: () =>
      'ductility' in result ? ductilityTable(result.ductility) : ductilityDemandTable(result.demand),
    figures: () => figuresOf(result, axis),
    summary: `${'ductility' in result ? 'constant-ductility spectra' : 'ductility demand'} of ${record.name}, ${gridWords(request.periodsS.length, request.dampings.length)}`,
  });
}

/** The figures of the result as [file name, SVG]; R_y beside the published R–μ–T relations. */
function figuresOf(
  result: { ductility: DuctilitySpectra } | { demand: DuctilityDemandSpectra },
  axis: PeriodAxis | undefined,
): [string, string][] {
  const figures =
    'ductility' in result
      ? ductilityFigures(result.ductility, { references: referenceReductions(result.ductility), axis })
      : ductilityFigures(result.demand, { axis });
  return figures.map(({ name, svg }) => [name, svg]);
}

function requestFromOptions(options: DuctilityCliOptions, ductilityGiven: boolean): DuctilityRequest {
  if (options.method !== undefined && options.method !== YIELDING_METHOD_NAME)
    throw usageError(
      `--method '${options.method}': the yielding oscillator is stepped by ${YIELDING_METHOD_NAME} only`,
    );
  if (options.strength !== undefined && ductilityGiven)
    throw usageError('give --ductility (target ductilities) or --strength (given strengths), not both');
  const model = modelFromOptions(options);
  const strengths = options.strength === undefined ? undefined : parseStrengths(options.strength);
  const ductilities = strengths === undefined ? parseDuctilities(options.ductility ?? '') : [];
  const grid = gridFromOptions({ ...options, method: undefined });
  // A rigid oscillator has no finite demand below the PGA: the demand's default grid leaves T = 0 out.
  const defaultGrid = options.periods === undefined && options.frequencies === undefined;
  const periodsS =
    strengths !== undefined && defaultGrid ? grid.periodsS.filter((t) => t > 0) : grid.periodsS;
  return { periodsS, dampings: grid.dampings, model, ductilities, strengths };
}

/** The one library call of the command, its (damping, period) cells dealt out over `threads`. */
async function computeSpectra(
  record: GroundRecord,
  request: DuctilityRequest,
  threads: number | 'auto',
): Promise<{ ductility: DuctilitySpectra } | { demand: DuctilityDemandSpectra }> {
  const { periodsS, dampings, model, strengths } = request;
  if (strengths === undefined) {
    const options = { periodsS, dampings, model, ductilities: request.ductilities };
    return { ductility: await ductilitySpectraOnThreads(record, options, threads) };
  }
  const options = { periodsS, dampings, model, ...strengths };
  return { demand: await ductilityDemandOnThreads(record, options, threads) };
}
