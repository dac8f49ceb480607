import type { Command } from 'commander';
import { CAUTION, cautionLines } from '../../base/caution.js';
import { usageError } from '../../base/errors.js';
import { STANDARD_GRAVITY_MS2 } from '../../base/units.js';
import { dampingLabel } from '../../formats/spectrum-csv.js';
import { formatJson, recordToJson } from '../../formats/spectrum-json.js';
import { METHOD_DESCRIPTIONS } from '../../oscillator/recurrence.js';
import { OutputSet } from '../../output/output-set.js';
import { rotdFigure } from '../../plot/rotd-figure.js';
import { type RotDSpectra, rotDSpectraParallel } from '../../spectrum/rotd.js';
import { addRecordOptions, loadRecord, positiveNumber, type RecordCliOptions } from '../record-options.js';
import {
  addGridOptions,
  type GridCliOptions,
  gridFromOptions,
  parseThreads,
  summaryRows,
} from './spectrum.js';

export interface RotDCliOptions extends RecordCliOptions, GridCliOptions {
  format?: string;
  out?: string;
  angleStep?: string;
  svg?: string;
  threads?: string;
}

/**
 * Oscillator-steps (periods × dampings × samples, each stepping 180 rotations) from which RotD is
 * dealt out over threads: a worker costs 50–80 ms to start (module and kernel included), about
 * 1,000,000 such steps of the WebAssembly loop.
 */
export const ROTD_PARALLEL_MIN_STEPS = 1_000_000;

/**
 * Threads for a RotD job of `periods` × `dampings` oscillators over `samples` samples: the
 * --threads given, else all cores (undefined) for a large job and one for a small one.
 */
export function rotdThreads(
  periods: number,
  dampings: number,
  samples: number,
  text?: string,
): number | undefined {
  if (text !== undefined) return parseThreads(text);
  return periods * dampings * samples >= ROTD_PARALLEL_MIN_STEPS ? undefined : 1;
}

export function registerRotD(program: Command): void {
  const command = program
    .command('rotd')
    .description('RotD50, RotD100 and geometric-mean PSA of two horizontal components')
    .argument('<first>', 'first horizontal component, or - for standard input')
    .argument('<second>', 'second horizontal component (same time step), at right angles to the first');
  addRecordOptions(command);
  addGridOptions(command);
  command
    .option('--angle-step <degrees>', 'rotation step over 0–180°, at most 1° and a divisor of 180', '1')
    .option('--format <format>', 'json or csv (default: a table on the terminal, or json with --out)')
    .option('--out <path>', 'write to this file instead of standard output')
    .option('--svg <dir>', 'also draw RotD50, RotD100 and the geometric mean, DIR/rotd.svg')
    .option('--threads <n>', 'threads (default: all cores for a large job; small ones use one)')
    .action(async (first: string, second: string, options: RotDCliOptions) => {
      await runRotD(first, second, options);
    });
}

export async function runRotD(first: string, second: string, options: RotDCliOptions): Promise<void> {
  const format = options.format ?? (options.out === undefined ? 'table' : 'json');
  if (!['json', 'csv', 'table'].includes(format)) throw usageError(`--format '${format}': use json or csv`);
  if (first === '-' && second === '-')
    throw usageError('only one of the two components can be standard input');
  const grid = gridFromOptions(options);
  const angleStepDeg = positiveNumber('--angle-step', options.angleStep ?? '1');
  const one = await loadRecord(first, options);
  const two = await loadRecord(second, options);
  const samples = Math.max(one.accelMS2.length, two.accelMS2.length);
  const threads = rotdThreads(grid.periodsS.length, grid.dampings.length, samples, options.threads);
  const spectra = await rotDSpectraParallel(one, two, { ...grid, angleStepDeg, threads });
  const text =
    format === 'json'
      ? formatJson(rotdToJson(spectra))
      : format === 'csv'
        ? rotdToCsv(spectra)
        : rotdTable(spectra);
  const outputs = new OutputSet([first, second]);
  if (options.svg !== undefined) {
    const figure = rotdFigure({ spectra, methodDescription: METHOD_DESCRIPTIONS[spectra.method] });
    outputs.folder(options.svg, [['rotd.svg', figure]], '--svg');
  }
  outputs.text(options.out, text).write();
}

const toG = (values: Float64Array) => Array.from(values, (value) => value / STANDARD_GRAVITY_MS2);

function notes(spectra: RotDSpectra): string[] {
  const out = [
    `PSA(θ) = ω² max|u₁ cos θ + u₂ sin θ| over ${180 / spectra.angleStepDeg} angles 0 ≤ θ < 180° in steps of ${spectra.angleStepDeg}°; RotD50 is the median over angles, RotD100 the largest (Boore 2010); geometric mean √(PSA₁ PSA₂) of the components as recorded`,
  ];
  if (spectra.paddedSamples > 0) {
    out.push(`the shorter component was padded with ${spectra.paddedSamples} zero samples (ground at rest)`);
  }
  return out;
}

export function rotdToJson(spectra: RotDSpectra) {
  return {
    caution: CAUTION,
    records: spectra.records.map(recordToJson),
    method: spectra.method,
    method_description: METHOD_DESCRIPTIONS[spectra.method],
    angle_step_deg: spectra.angleStepDeg,
    padded_samples: spectra.paddedSamples,
    notes: notes(spectra),
    periods_s: Array.from(spectra.periodsS),
    spectra: spectra.curves.map((curve) => ({
      damping: curve.damping,
      rotd50_g: toG(curve.rotd50MS2),
      rotd100_g: toG(curve.rotd100MS2),
      geomean_g: toG(curve.geomeanMS2),
    })),
  };
}

export function rotdToCsv(spectra: RotDSpectra): string {
  const lines = cautionLines().map((line) => `# ${line}`);
  for (const record of spectra.records) {
    lines.push(`# record: ${record.name.replace(/[\r\n]+/g, ' ')}; npts ${record.npts}; dt ${record.dtS} s`);
  }
  lines.push(`# method: ${spectra.method}`);
  for (const note of notes(spectra)) lines.push(`# ${note}`);
  const header = ['period_s'];
  for (const curve of spectra.curves) {
    const d = dampingLabel(curve.damping);
    header.push(`rotd50_g@${d}`, `rotd100_g@${d}`, `geomean_g@${d}`);
  }
  lines.push(header.join(','));
  for (let p = 0; p < spectra.periodsS.length; p++) {
    const row = [String(spectra.periodsS[p])];
    for (const curve of spectra.curves) {
      row.push(
        String(curve.rotd50MS2[p] / STANDARD_GRAVITY_MS2),
        String(curve.rotd100MS2[p] / STANDARD_GRAVITY_MS2),
        String(curve.geomeanMS2[p] / STANDARD_GRAVITY_MS2),
      );
    }
    lines.push(row.join(','));
  }
  return `${lines.join('\n')}\n`;
}

export function rotdTable(spectra: RotDSpectra): string {
  const out = cautionLines(92).map((line) => `! ${line}`);
  out.push('');
  for (const r of spectra.records) {
    out.push(
      `record  ${r.name} (${r.source}), ${r.npts} samples at ${r.dtS} s, PGA ${(r.pgaMS2 / STANDARD_GRAVITY_MS2).toFixed(4)} g`,
    );
  }
  out.push(`method  ${METHOD_DESCRIPTIONS[spectra.method]}`);
  for (const note of notes(spectra)) out.push(`note    ${note}`);
  out.push('');
  const header = ['T (s)'.padStart(8)];
  for (const curve of spectra.curves) {
    const d = dampingLabel(curve.damping);
    header.push(
      `RotD50 g @${d}`.padStart(15),
      `RotD100 g @${d}`.padStart(16),
      `geomean g @${d}`.padStart(16),
    );
  }
  out.push(header.join(' '));
  for (const p of summaryRows(spectra.periodsS)) {
    const row = [Number(spectra.periodsS[p].toPrecision(3)).toString().padStart(8)];
    for (const curve of spectra.curves) {
      row.push(
        (curve.rotd50MS2[p] / STANDARD_GRAVITY_MS2).toPrecision(4).padStart(15),
        (curve.rotd100MS2[p] / STANDARD_GRAVITY_MS2).toPrecision(4).padStart(16),
        (curve.geomeanMS2[p] / STANDARD_GRAVITY_MS2).toPrecision(4).padStart(16),
      );
    }
    out.push(row.join(' '));
  }
  out.push(`(${spectra.periodsS.length} periods; --format json or csv for all of them)`);
  return `${out.join('\n')}\n`;
}
