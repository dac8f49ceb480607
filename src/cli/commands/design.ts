import type { Command } from 'commander';
import { CAUTION, cautionLines } from '../../base/caution.js';
import { usageError } from '../../base/errors.js';
import { formatJson } from '../../formats/spectrum-json.js';
import { defaultPeriodsS, parsePeriods } from '../../oscillator/grid.js';
import { OutputSet } from '../../output/output-set.js';
import { designFigure } from '../../plot/design-figure.js';
import { checkPeriod, coversPeriod, type DesignSpectrum, designPsaG } from '../../spectrum/design.js';
import { addDesignOptions, type DesignCliOptions, designFromOptions } from '../target-options.js';

export interface DesignCommandOptions extends DesignCliOptions {
  periods?: string;
  format?: string;
  out?: string;
  svg?: string;
}

export function registerDesign(program: Command): void {
  const command = program
    .command('design')
    .description('a code design spectrum (ASCE 7-16, Eurocode 8) or a tabulated one, PSA in g by period');
  addDesignOptions(command);
  command
    .option(
      '--periods <grid>',
      'periods, s: a list or a:b:n (default: 0 and 0.01:10:120 where the spectrum is defined; a table’s own rows)',
    )
    .option('--format <format>', 'json or csv (default: a table on the terminal, or json with --out)')
    .option('--out <path>', 'write to this file instead of standard output')
    .option('--svg <dir>', 'also draw the spectrum, DIR/design.svg (PSA against T, log–log)')
    .action((options: DesignCommandOptions) => runDesign(options));
}

export function runDesign(options: DesignCommandOptions): void {
  const format = options.format ?? (options.out === undefined ? 'table' : 'json');
  if (!['json', 'csv', 'table'].includes(format)) throw usageError(`--format '${format}': use json or csv`);
  const spectrum = designFromOptions(options);
  const periodsS = designPeriods(spectrum, options.periods);
  const psaG = designPsaG(spectrum, periodsS);
  const text =
    format === 'json'
      ? formatJson(designToJson(spectrum, periodsS, psaG))
      : format === 'csv'
        ? designToCsv(spectrum, periodsS, psaG)
        : designTable(spectrum, periodsS, psaG);
  const inputs = options.table === undefined ? [] : [options.table];
  const outputs = new OutputSet(inputs);
  if (options.svg !== undefined)
    outputs.folder(options.svg, [['design.svg', designFigure({ spectrum, periodsS, psaG })]], '--svg');
  outputs.text(options.out, text).write();
}

/** The periods asked for, each checked against the spectrum's range; or the default grid within it. */
export function designPeriods(spectrum: DesignSpectrum, text: string | undefined): Float64Array {
  if (text !== undefined) {
    const periodsS = parsePeriods(text);
    for (const t of periodsS) checkPeriod(spectrum, t);
    return periodsS;
  }
  if (spectrum.tabulatedPeriodsS !== undefined) return spectrum.tabulatedPeriodsS;
  return defaultPeriodsS().filter((t) => coversPeriod(spectrum, t));
}

export function designToJson(spectrum: DesignSpectrum, periodsS: Float64Array, psaG: Float64Array) {
  return {
    caution: CAUTION,
    code: spectrum.code,
    description: spectrum.description,
    parameters: spectrum.parameters,
    damping: spectrum.damping ?? null,
    periods_s: Array.from(periodsS),
    psa_g: Array.from(psaG),
  };
}

/** The caution and the description on `#` lines, then `period_s,psa_g` (readable again by --table). */
export function designToCsv(spectrum: DesignSpectrum, periodsS: Float64Array, psaG: Float64Array): string {
  const lines = cautionLines().map((line) => `# ${line}`);
  lines.push(`# spectrum: ${spectrum.description.replace(/[\r\n]+/g, ' ')}`);
  lines.push('period_s,psa_g');
  for (let i = 0; i < periodsS.length; i++) lines.push(`${periodsS[i]},${psaG[i]}`);
  return `${lines.join('\n')}\n`;
}

export function designTable(spectrum: DesignSpectrum, periodsS: Float64Array, psaG: Float64Array): string {
  const out = cautionLines(92).map((line) => `! ${line}`);
  out.push('', spectrum.description, '', `${'T (s)'.padStart(10)} ${'PSA (g)'.padStart(12)}`);
  for (let i = 0; i < periodsS.length; i++) {
    out.push(
      `${Number(periodsS[i].toPrecision(4)).toString().padStart(10)} ${psaG[i].toPrecision(5).padStart(12)}`,
    );
  }
  return `${out.join('\n')}\n`;
}
