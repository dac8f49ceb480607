import type { Command } from 'commander';
import { formatNumber } from '../../base/numbers.js';
import { STANDARD_GRAVITY_MS2 } from '../../base/units.js';
import { infoTable, infoToJson } from '../../formats/info.js';
import { infoToCsv } from '../../formats/info-csv.js';
import { KONNO_OHMACHI_DEFAULT_B } from '../../record/fourier.js';
import { groundMotionMeasures } from '../../record/measures.js';
import { recordFigures } from '../../report/record-figures.js';
import { predominantPeriod } from '../../spectrum/predominant.js';
import { count } from '../announce.js';
import { addOutputOptions, type OutputCliOptions, outputFormat, writeProduct } from '../options/format.js';
import { addProcessingOptions, applyProcessing, type ProcessingCliOptions } from '../options/processing.js';
import { addRecordOptions, loadRecord, positiveNumber, type RecordCliOptions } from '../options/record.js';

export interface InfoCliOptions extends RecordCliOptions, ProcessingCliOptions, OutputCliOptions {
  bracketThreshold?: string;
  smoothing?: string;
}

export function registerInfo(program: Command): void {
  const command = program
    .command('info')
    .description('ground-motion measures of a record: peaks, Arias intensity, durations, CAV, periods')
    .argument('<record>', 'record file, or - for standard input');
  addRecordOptions(command);
  addProcessingOptions(command);
  addOutputOptions(command, 'also draw histories.svg, husid.svg and fourier.svg into this folder')
    .option('--bracket-threshold <g>', 'threshold of the bracketed duration, g', '0.05')
    .option(
      '--smoothing <b>',
      'Konno–Ohmachi b of the smoothed Fourier spectrum in the figure, or none',
      '40',
    )
    .action(runInfo);
}

export async function runInfo(source: string, options: InfoCliOptions): Promise<void> {
  outputFormat(options);
  const thresholdG = positiveNumber('--bracket-threshold', options.bracketThreshold ?? '0.05');
  const smoothingText = options.smoothing ?? String(KONNO_OHMACHI_DEFAULT_B);
  const smoothing =
    smoothingText.trim().toLowerCase() === 'none' ? null : positiveNumber('--smoothing', smoothingText);
  const record = applyProcessing(await loadRecord(source, options), options);
  const measures = groundMotionMeasures(record, { bracketThresholdMS2: thresholdG * STANDARD_GRAVITY_MS2 });
  const predominant = predominantPeriod(record);
  const json = infoToJson(record, measures, predominant);
  await writeProduct([source], options, {
    json: () => json,
    csv: () => infoToCsv(json),
    table: () => infoTable(json),
    figures: () => recordFigures(record, measures, smoothing),
    summary: `ground-motion measures of ${record.name}, ${count(record.accelMS2.length, 'sample')} at ${formatNumber(record.dtS, 6)} s`,
  });
}
