import type { Command } from 'commander';
import { usageError } from '../../base/errors.js';
import { parseLengthUnit, STANDARD_GRAVITY_MS2 } from '../../base/units.js';
import { spectrumToCsv } from '../../formats/spectrum-csv.js';
import { spectrumToJson } from '../../formats/spectrum-json.js';
import { summaryTable } from '../../formats/spectrum-table.js';
import { targetToJson } from '../../formats/target.js';
import { METHOD_DESCRIPTIONS } from '../../oscillator/recurrence.js';
import { checkFolderInputs } from '../../output/output-set.js';
import { scaleOverlays } from '../../spectrum/scale.js';
import { responseSpectrumParallel, type Spectrum } from '../../spectrum/spectrum.js';
import { fitTarget, targetRecord } from '../../spectrum/target.js';
import { gridWords } from '../announce.js';
import { type AxisCliOptions, addAxisOption, svgAxisFromOptions } from '../options/axis.js';
import {
  addOutputOptions,
  figureAxes,
  type OutputCliOptions,
  outputFormat,
  writeProduct,
} from '../options/format.js';
import { addGridOptions, type GridCliOptions, gridFromOptions } from '../options/grid.js';
import { addProcessingOptions, applyProcessing, type ProcessingCliOptions } from '../options/processing.js';
import { addRecordOptions, loadRecord, type RecordCliOptions } from '../options/record.js';
import { addTargetOptions, type TargetCliOptions, targetFromOptions } from '../options/target.js';
import { addThreadOptions, sweepFromOptions } from '../options/threads.js';

export interface SpectrumCliOptions
  extends RecordCliOptions,
    ProcessingCliOptions,
    GridCliOptions,
    TargetCliOptions,
    OutputCliOptions,
    AxisCliOptions {
  lengthUnit?: string;
  axes?: string;
  histories?: boolean;
  threads?: string;
  kernel?: string;
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
  addAxisOption(command);
  addOutputOptions(command)
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
    .action(runSpectrum);
  addThreadOptions(command);
}

export async function runSpectrum(source: string, options: SpectrumCliOptions): Promise<void> {
  const grid = gridFromOptions(options);
  const lengthUnit = parseLengthUnit(options.lengthUnit ?? 'm');
  outputFormat(options);
  const axes = figureAxes(options.axes);
  const axis = svgAxisFromOptions(options);
  if (options.histories && options.svg === undefined) throw usageError('--histories needs --svg <dir>');
  const target = targetFromOptions(options);
  if (options.svg !== undefined)
    checkFolderInputs({ path: options.svg, option: '--svg' }, [source, ...(target?.files ?? [])], (name) =>
      name.endsWith('.svg'),
    );
  const sweep = sweepFromOptions(options);
  const processed = applyProcessing(await loadRecord(source, options), options);
  const swept = await responseSpectrumParallel(processed, { ...grid, ...sweep });
  const { fit, spectrum } =
    target === undefined ? { fit: undefined, spectrum: swept } : fitTarget(swept, target.spectrum, target);
  const inputs = [source, ...(target?.files ?? [])];
  await writeProduct(inputs, options, {
    json: () => ({ ...spectrumToJson(spectrum), ...(fit && targetToJson(fit)) }),
    csv: () => spectrumToCsv(spectrum, { lengthUnit, target: fit }),
    table: () => summaryTable(spectrum, lengthUnit, fit),
    async figures() {
      // The figure modules load only for --svg.
      const { spectrumFigures } = await import('../../report/spectrum-figures.js');
      const overlays =
        fit === undefined ? [] : scaleOverlays(spectrum.periodsS, fitCurvePsaG(spectrum, fit), fit);
      const methodDescription = METHOD_DESCRIPTIONS[spectrum.method];
      const shared = { axes, axis, lengthUnit, overlays, methodDescription };
      const figures = spectrumFigures(
        targetRecord(processed, fit),
        spectrum,
        shared,
        options.histories === true,
      );
      return figures.map((f): [string, string] => [f.file, f.svg]);
    },
    summary: `spectra of ${spectrum.record.name}, ${gridWords(spectrum.periodsS.length, spectrum.curves.length)}${fit === undefined ? '' : ', fitted to the target'}`,
  });
}

/** The PSA, g, of the curve a fit compared with the target (the one at the fit's damping). */
function fitCurvePsaG(spectrum: Spectrum, fit: { damping: number }): number[] {
  const curve = spectrum.curves.find((c) => c.damping === fit.damping) ?? spectrum.curves[0];
  return Array.from(curve.psaMS2, (value) => value / STANDARD_GRAVITY_MS2);
}
