import type { Command } from 'commander';
import { designTable, designToCsv, designToJson } from '../../formats/design.js';
import { designFigure } from '../../plot/design-figure.js';
import {
  checkPeriod,
  type DesignSpectrum,
  defaultDesignPeriodsS,
  designPsaG,
} from '../../spectrum/design.js';
import { count } from '../announce.js';
import { type AxisCliOptions, addAxisOption, svgAxisFromOptions } from '../options/axis.js';
import { addDesignOptions, type DesignCliOptions, designFromOptions } from '../options/design.js';
import { addOutputOptions, type OutputCliOptions, outputFormat, writeProduct } from '../options/format.js';
import { FREQUENCIES_HELP, periodsFromOptions } from '../options/grid.js';

export function registerDesign(program: Command): void {
  const command = program
    .command('design')
    .description(
      'a code design spectrum (ASCE 7-16; ASCE 7-22 two-period or multi-period; Eurocode 8) or a tabulated one, PSA in g by period',
    );
  addDesignOptions(command);
  command
    .option(
      '--periods <grid>',
      'periods, s: a list or a:b:n (default: the default grid where the spectrum is defined, and its last period; a table’s own rows, and a multi-period table’s)',
    )
    .option('--frequencies <grid>', FREQUENCIES_HELP);
  addAxisOption(command);
  addOutputOptions(command, 'also draw the spectrum, DIR/design.svg (PSA against T or f, log–log)').action(
    runDesign,
  );
}

export async function runDesign(
  options: DesignCliOptions & OutputCliOptions & AxisCliOptions,
): Promise<void> {
  outputFormat(options);
  const axis = svgAxisFromOptions(options);
  const spectrum = designFromOptions(options);
  const periodsS = designPeriods(spectrum, options);
  const psaG = designPsaG(spectrum, periodsS);
  const inputs = [options.table, options.multiPeriod].filter((file): file is string => file !== undefined);
  await writeProduct(inputs, options, {
    json: () => designToJson(spectrum, periodsS, psaG),
    csv: () => designToCsv(spectrum, periodsS, psaG),
    table: () => designTable(spectrum, periodsS, psaG),
    figures: () => [['design.svg', designFigure({ spectrum, periodsS, psaG, axis })]],
    summary: `${spectrum.vertical ? 'vertical ' : ''}design spectrum (${spectrum.code}), ${count(periodsS.length, 'period')}`,
  });
}

/**
 * The periods asked for (--periods, or --frequencies as T = 1/f), each checked against the
 * spectrum's range; or the default grid within it.
 */
export function designPeriods(
  spectrum: DesignSpectrum,
  options: { periods?: string; frequencies?: string },
): Float64Array {
  const periodsS = periodsFromOptions(options, () => defaultDesignPeriodsS(spectrum));
  if (options.periods !== undefined || options.frequencies !== undefined)
    for (const t of periodsS) checkPeriod(spectrum, t);
  return periodsS;
}
