import type { Command } from 'commander';
import { STANDARD_GRAVITY_MS2 } from '../../base/units.js';
import { INFO_METHODS, infoTable, infoToJson } from '../../formats/info.js';
import { formatJson } from '../../formats/spectrum-json.js';
import { logSpaced } from '../../oscillator/grid.js';
import { fourierFigure } from '../../plot/fourier-figure.js';
import { historiesFigure } from '../../plot/histories-figure.js';
import { husidFigure } from '../../plot/husid-figure.js';
import {
  fourierAmplitudeSpectrum,
  KONNO_OHMACHI_DEFAULT_B,
  konnoOhmachiSmooth,
} from '../../record/fourier.js';
import { integrateRecord } from '../../record/integrate.js';
import { type GroundMotionMeasures, groundMotionMeasures, husidCurve } from '../../record/measures.js';
import type { GroundRecord } from '../../record/record.js';
import { predominantPeriod } from '../../spectrum/predominant.js';
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
  addOutputOptions(command, 'table or json (default: table on the terminal, json with --out)')
    .option('--svg <folder>', 'also draw histories.svg, husid.svg and fourier.svg into this folder')
    .option('--bracket-threshold <g>', 'threshold of the bracketed duration, g', '0.05')
    .option(
      '--smoothing <b>',
      'Konno–Ohmachi b of the smoothed Fourier spectrum in the figure, or none',
      '40',
    )
    .action(async (source: string, options: InfoCliOptions) => {
      await runInfo(source, options);
    });
}

export async function runInfo(source: string, options: InfoCliOptions): Promise<void> {
  const format = outputFormat(options, ['json', 'table'], 'table or json');
  const thresholdG = positiveNumber('--bracket-threshold', options.bracketThreshold ?? '0.05');
  const smoothing = parseSmoothing(options.smoothing ?? String(KONNO_OHMACHI_DEFAULT_B));
  const record = applyProcessing(await loadRecord(source, options), options);
  const measures = groundMotionMeasures(record, { bracketThresholdMS2: thresholdG * STANDARD_GRAVITY_MS2 });
  const predominant = predominantPeriod(record);
  const json = infoToJson(record, measures, predominant);
  const text = format === 'json' ? formatJson(json) : infoTable(json);
  writeProduct([source], options, text, () => figures(record, measures, smoothing));
}

function parseSmoothing(text: string): number | null {
  if (text.trim().toLowerCase() === 'none') return null;
  return positiveNumber('--smoothing', text);
}

/** histories.svg, husid.svg and fourier.svg, by file name. */
function figures(
  record: GroundRecord,
  m: GroundMotionMeasures,
  smoothingB: number | null,
): [string, string][] {
  const about = { name: record.name, source: record.source, processing: record.processing };
  const histories = historiesFigure(
    {
      ...about,
      dtS: record.dtS,
      ...integrateRecord(record),
      integrationDescription: INFO_METHODS.integration,
    },
    { lengthUnit: 'm' },
  );
  const husid = husidFigure({
    ...about,
    dtS: record.dtS,
    husid: husidCurve(record.accelMS2, record.dtS),
    t5S: m.t5S,
    t75S: m.t75S,
    t95S: m.t95S,
  });
  const fas = fourierAmplitudeSpectrum(record.accelMS2, record.dtS);
  let smoothed: { smoothedHz?: Float64Array; smoothedMS?: Float64Array; smoothingLabel?: string } = {};
  if (smoothingB !== null) {
    const fLow = fas.frequenciesHz[1];
    const fHigh = fas.frequenciesHz[fas.frequenciesHz.length - 1];
    const count = Math.max(2, Math.ceil(60 * Math.log10(fHigh / fLow)));
    const smoothedHz = Float64Array.from(logSpaced(fLow, fHigh, count));
    smoothed = {
      smoothedHz,
      smoothedMS: konnoOhmachiSmooth(fas.frequenciesHz, fas.amplitudeMS, {
        bandwidth: smoothingB,
        centresHz: smoothedHz,
      }),
      smoothingLabel: `Konno–Ohmachi 1998, b = ${smoothingB}`,
    };
  }
  const fourier = fourierFigure({
    ...about,
    frequenciesHz: fas.frequenciesHz,
    amplitudeMS: fas.amplitudeMS,
    ...smoothed,
    methodDescription: `FFT of ${fas.transformLength} points (zero-padded), amplitude = Δt·|DFT|`,
  });
  return [
    ['histories.svg', histories],
    ['husid.svg', husid],
    ['fourier.svg', fourier],
  ];
}
