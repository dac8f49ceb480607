import type { Command } from 'commander';
import { CAUTION, cautionLines } from '../../base/caution.js';
import { usageError } from '../../base/errors.js';
import { STANDARD_GRAVITY_MS2 } from '../../base/units.js';
import { dampingLabel } from '../../formats/spectrum-csv.js';
import { formatJson, recordToJson } from '../../formats/spectrum-json.js';
import { METHOD_DESCRIPTIONS } from '../../oscillator/recurrence.js';
import { OutputSet } from '../../output/output-set.js';
import { dampingFigure } from '../../plot/damping-figure.js';
import { compareDamping, type DampingComparison } from '../../spectrum/damping.js';
import { responseSpectrum, type Spectrum } from '../../spectrum/spectrum.js';
import { addRecordOptions, loadRecord, type RecordCliOptions } from '../record-options.js';
import { addGridOptions, type GridCliOptions, gridFromOptions, summaryRows } from './spectrum.js';

export interface DampingCliOptions extends RecordCliOptions, GridCliOptions {
  format?: string;
  out?: string;
  svg?: string;
}

/** Damping ratios compared when --damping is not given. */
export const DEFAULT_DAMPING_LIST = '2%,5%,10%,20%';

/** The reference damping every ratio is taken against. */
const REFERENCE_DAMPING = 0.05;

export function registerDamping(program: Command): void {
  const command = program
    .command('damping')
    .description(
      'PSA at several damping ratios and its ratio to 5% damping, beside the Eurocode 8 and Newmark–Hall factors',
    )
    .argument('<record>', 'record file, or - for standard input');
  addRecordOptions(command);
  addGridOptions(command);
  command
    .option('--format <format>', 'json or csv (default: a table on the terminal, or json with --out)')
    .option('--out <path>', 'write to this file instead of standard output')
    .option('--svg <dir>', 'also draw the spectra and their ratios to 5%, DIR/damping.svg')
    .action(async (source: string, options: DampingCliOptions) => {
      const fromDefault = command.getOptionValueSource('damping') === 'default';
      await runDamping(source, { ...options, damping: fromDefault ? DEFAULT_DAMPING_LIST : options.damping });
    });
}

export async function runDamping(source: string, options: DampingCliOptions): Promise<void> {
  const format = options.format ?? (options.out === undefined ? 'table' : 'json');
  if (!['json', 'csv', 'table'].includes(format)) throw usageError(`--format '${format}': use json or csv`);
  const grid = gridFromOptions(options);
  const added = !Array.from(grid.dampings).some((d) => Math.abs(d - REFERENCE_DAMPING) < 1e-12);
  const dampings = added ? Float64Array.from([...grid.dampings, REFERENCE_DAMPING]).sort() : grid.dampings;
  const record = await loadRecord(source, options);
  const spectrum = responseSpectrum(record, { ...grid, dampings });
  const comparison = compareDamping(spectrum, REFERENCE_DAMPING);
  const text =
    format === 'json'
      ? formatJson(dampingToJson(spectrum, comparison, added))
      : format === 'csv'
        ? dampingToCsv(spectrum, comparison)
        : dampingTable(spectrum, comparison, added);
  const outputs = new OutputSet([source]);
  if (options.svg !== undefined) {
    const figure = dampingFigure({
      record: spectrum.record,
      methodDescription: METHOD_DESCRIPTIONS[spectrum.method],
      comparison,
    });
    outputs.folder(options.svg, [['damping.svg', figure]], '--svg');
  }
  outputs.text(options.out, text).write();
}

const SOURCES = {
  ec8_eta: 'EN 1998-1:2004 §3.2.2.2, Eq. 3.6: η = √(10/(5 + ξ)) ≥ 0.55, ξ in percent; ratio η(ξ)/η(5%)',
  newmark_hall_1982:
    'Newmark and Hall (1982), median amplification factors 3.21 − 0.68 ln ξ (acceleration), 2.31 − 0.41 ln ξ (velocity), 1.82 − 0.27 ln ξ (displacement), ξ in percent; ratio at ξ to at 5% (coefficients from memory)',
};

const nullable = (value: number | null) => (value === null || Number.isNaN(value) ? null : value);

export function dampingToJson(spectrum: Spectrum, comparison: DampingComparison, added: boolean) {
  return {
    caution: CAUTION,
    record: recordToJson(spectrum.record),
    method: spectrum.method,
    method_description: METHOD_DESCRIPTIONS[spectrum.method],
    reference_damping: comparison.referenceDamping,
    reference_added: added,
    published_sources: SOURCES,
    periods_s: Array.from(comparison.periodsS),
    spectra: comparison.curves.map((curve) => ({
      damping: curve.damping,
      psa_g: Array.from(curve.psaMS2, (value) => value / STANDARD_GRAVITY_MS2),
      ratio_to_reference: Array.from(curve.ratio, nullable),
      geometric_mean_ratio: nullable(curve.geometricMeanRatio),
      published: {
        ec8_eta_ratio: curve.published.ec8Eta,
        newmark_hall_1982_ratio: {
          acceleration: curve.published.newmarkHall.acceleration,
          velocity: curve.published.newmarkHall.velocity,
          displacement: curve.published.newmarkHall.displacement,
        },
      },
    })),
  };
}

export function dampingToCsv(spectrum: Spectrum, comparison: DampingComparison): string {
  const lines = cautionLines().map((line) => `# ${line}`);
  lines.push(`# record: ${spectrum.record.name.replace(/[\r\n]+/g, ' ')}; method: ${spectrum.method}`);
  lines.push(`# reference damping: ${dampingLabel(comparison.referenceDamping)}`);
  for (const curve of comparison.curves) {
    const nh = curve.published.newmarkHall;
    lines.push(
      `# published ratio at ${dampingLabel(curve.damping)}: EC8 eta ${curve.published.ec8Eta}; Newmark-Hall acceleration ${nh.acceleration ?? ''} velocity ${nh.velocity ?? ''} displacement ${nh.displacement ?? ''}`,
    );
  }
  const header = ['period_s'];
  for (const curve of comparison.curves) header.push(`psa_g@${dampingLabel(curve.damping)}`);
  for (const curve of comparison.curves) header.push(`ratio@${dampingLabel(curve.damping)}`);
  lines.push(header.join(','));
  for (let p = 0; p < comparison.periodsS.length; p++) {
    const row = [String(comparison.periodsS[p])];
    for (const curve of comparison.curves) row.push(String(curve.psaMS2[p] / STANDARD_GRAVITY_MS2));
    for (const curve of comparison.curves)
      row.push(Number.isNaN(curve.ratio[p]) ? '' : String(curve.ratio[p]));
    lines.push(row.join(','));
  }
  return `${lines.join('\n')}\n`;
}

export function dampingTable(spectrum: Spectrum, comparison: DampingComparison, added: boolean): string {
  const out = cautionLines(92).map((line) => `! ${line}`);
  const r = spectrum.record;
  out.push('', `record  ${r.name} (${r.source}), ${r.npts} samples at ${r.dtS} s`);
  out.push(`method  ${METHOD_DESCRIPTIONS[spectrum.method]}`);
  out.push(`ratios  PSA(ξ)/PSA(5%)${added ? ' (5% added as the reference)' : ''}`, '');
  const f = (value: number | null) => (value === null || Number.isNaN(value) ? '-' : value.toFixed(3));
  out.push(
    `${'ξ'.padStart(7)} ${'record'.padStart(8)} ${'EC8 η'.padStart(8)} ${'NH acc'.padStart(8)} ${'NH vel'.padStart(8)} ${'NH disp'.padStart(8)}`,
  );
  for (const curve of comparison.curves) {
    const nh = curve.published.newmarkHall;
    out.push(
      [
        dampingLabel(curve.damping).padStart(7),
        f(curve.geometricMeanRatio).padStart(8),
        f(curve.published.ec8Eta).padStart(8),
        f(nh.acceleration).padStart(8),
        f(nh.velocity).padStart(8),
        f(nh.displacement).padStart(8),
      ].join(' '),
    );
  }
  out.push('(record: geometric mean of the ratio over the periods above 0 s)', '');
  const header = ['T (s)'.padStart(8)];
  for (const curve of comparison.curves) {
    const d = dampingLabel(curve.damping);
    header.push(`PSA g @${d}`.padStart(13), `ratio @${d}`.padStart(12));
  }
  out.push(header.join(' '));
  for (const p of summaryRows(comparison.periodsS)) {
    const row = [Number(comparison.periodsS[p].toPrecision(3)).toString().padStart(8)];
    for (const curve of comparison.curves) {
      row.push(
        (curve.psaMS2[p] / STANDARD_GRAVITY_MS2).toPrecision(4).padStart(13),
        f(curve.ratio[p]).padStart(12),
      );
    }
    out.push(row.join(' '));
  }
  out.push(`(${comparison.periodsS.length} periods; --format json or csv for all of them)`);
  return `${out.join('\n')}\n`;
}
