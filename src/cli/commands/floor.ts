import type { Command } from 'commander';
import { cautionLines } from '../../base/caution.js';
import { usageError } from '../../base/errors.js';
import { STANDARD_GRAVITY_MS2 } from '../../base/units.js';
import { dampingLabel, spectrumToCsv } from '../../formats/spectrum-csv.js';
import { formatJson, spectrumToJson } from '../../formats/spectrum-json.js';
import { MIN_PERIOD_S, parseDampings } from '../../oscillator/grid.js';
import { METHOD_DESCRIPTIONS } from '../../oscillator/recurrence.js';
import { OutputSet } from '../../output/output-set.js';
import { floorFigure } from '../../plot/floor-figure.js';
import { type BuildingMode, type FloorSpectra, floorSpectrum } from '../../spectrum/floor.js';
import { responseSpectrum, type Spectrum } from '../../spectrum/spectrum.js';
import { addRecordOptions, loadRecord } from '../record-options.js';
import { wrapText } from './anchor.js';
import { addGridOptions, gridFromOptions, type SpectrumCliOptions } from './spectrum.js';

export interface FloorCliOptions extends SpectrumCliOptions {
  buildingPeriod?: string;
  buildingDamping?: string;
  modalFactor?: string;
  broaden?: string | boolean;
  svg?: string;
}

export function registerFloor(program: Command): void {
  const command = program
    .command('floor')
    .description('in-structure (floor) response spectra from a ground record and a one-mode building')
    .argument('<record>', 'ground record file, or - for standard input');
  addRecordOptions(command);
  addGridOptions(command);
  command
    .option('--building-period <seconds>', "the building's fundamental period T_b, s (required)")
    .option('--building-damping <ratio>', "the building's modal damping, fraction or percentage", '5%')
    .option(
      '--modal-factor <value>',
      'Γφ at the floor: participation factor times mode shape there (required)',
    )
    .option('--broaden [fraction]', 'broaden peaks over [T(1−b), T/(1−b)], b = 0.15 unless given')
    .option('--format <format>', 'json or csv (default: a summary table on the terminal, or json with --out)')
    .option('--out <path>', 'write to this file instead of standard output')
    .option('--svg <dir>', 'also draw the floor spectrum against the ground spectrum, DIR/floor.svg')
    .action(async (source: string, options: FloorCliOptions) => {
      await runFloor(source, options);
    });
}

export function buildingFromOptions(options: FloorCliOptions): BuildingMode {
  if (options.buildingPeriod === undefined) throw usageError('--building-period <seconds> is required');
  if (options.modalFactor === undefined)
    throw usageError(
      '--modal-factor <Γφ> is required (1 is the base of a rigid building; about 1.3 to 1.6 at the roof of a regular one)',
    );
  const periodS = Number(options.buildingPeriod);
  if (!(periodS >= MIN_PERIOD_S) || !Number.isFinite(periodS)) {
    throw usageError(
      `--building-period must be a number of seconds ≥ ${MIN_PERIOD_S}, got '${options.buildingPeriod}'`,
    );
  }
  const modalFactor = Number(options.modalFactor);
  if (options.modalFactor.trim() === '' || !Number.isFinite(modalFactor)) {
    throw usageError(`--modal-factor must be a number, got '${options.modalFactor}'`);
  }
  const dampings = parseDampings(options.buildingDamping ?? '5%');
  if (dampings.length !== 1 || !(dampings[0] < 1))
    throw usageError('--building-damping takes one ratio below 1');
  return { periodS, damping: dampings[0], modalFactor };
}

/** `--broaden [b]`: null when absent, 0.15 when given bare, else the fraction 0 ≤ b < 1. */
export function broadeningFromOptions(value: string | boolean | undefined): number | null {
  if (value === undefined || value === false) return null;
  if (value === true) return 0.15;
  const b = Number(value);
  if (value.trim() === '' || !(b >= 0) || !(b < 1))
    throw usageError(`--broaden must be a fraction 0 ≤ b < 1, got '${value}'`);
  return b;
}

export function floorAssumptions(result: FloorSpectra, building: BuildingMode, dtS: number): string[] {
  const out = [
    "Building idealised by its fundamental mode: q'' + 2ζ_b ω_b q' + ω_b² q = −a_g; floor absolute acceleration " +
      "a_g + Γφ·q''. Higher modes, soil–structure interaction, nonlinear building response and the equipment's " +
      'feedback on the floor are not represented.',
    'Floor acceleration sampled at the record’s own times; the component oscillators take it as linear between samples.',
    'Component spectra of the floor record by the same sweep as `quakesweep spectrum`.',
  ];
  if (building.periodS < 10 * dtS) {
    out.push(
      `T_b = ${building.periodS} s is under 10 record steps (${dtS} s): the floor history is coarsely sampled; resample the record finer.`,
    );
  }
  out.push(
    result.broadening === null
      ? 'Peaks not broadened (--broaden to widen them for uncertain building frequencies).'
      : `Peaks broadened (US NRC Regulatory Guide 1.122, from memory: ±15% of frequency): value at T = largest over ` +
          `[T(1−b), T/(1−b)], b = ${result.broadening}, which covers ±b in period and in frequency; ` +
          'PSA broadened and SD, PSV derived from it; SV, SA broadened on their own; valleys not smoothed.',
  );
  return out;
}

export async function runFloor(source: string, options: FloorCliOptions): Promise<void> {
  const grid = gridFromOptions(options);
  const building = { ...buildingFromOptions(options), method: grid.method };
  const broadening = broadeningFromOptions(options.broaden);
  const format = options.format ?? (options.out === undefined ? 'table' : 'json');
  if (!['json', 'csv', 'table'].includes(format)) throw usageError(`--format '${format}': use json or csv`);
  const ground = await loadRecord(source, options);
  const result = floorSpectrum(ground, building, grid, broadening);
  const groundSpectrum = responseSpectrum(ground, grid);
  const assumptions = floorAssumptions(result, building, ground.dtS);
  let text: string;
  if (format === 'json') {
    text = formatJson({
      ...spectrumToJson(result.spectrum),
      building: {
        period_s: building.periodS,
        damping: building.damping,
        modal_factor: building.modalFactor,
        method: grid.method,
      },
      broadening:
        broadening === null
          ? null
          : {
              fraction: broadening,
              window: 'max over [T(1-b), T/(1-b)]',
              source: 'US NRC Regulatory Guide 1.122 (from memory)',
            },
      unbroadened_psa_g: result.unbroadened.curves.map((curve) => ({
        damping: curve.damping,
        psa_g: Array.from(curve.psaMS2, (v) => v / STANDARD_GRAVITY_MS2),
      })),
      ground: {
        name: ground.name,
        source: ground.source,
        pga_g: groundSpectrum.record.pgaMS2 / STANDARD_GRAVITY_MS2,
        spectra: groundSpectrum.curves.map((curve) => ({
          damping: curve.damping,
          psa_g: Array.from(curve.psaMS2, (v) => v / STANDARD_GRAVITY_MS2),
        })),
      },
      assumptions,
    });
  } else if (format === 'csv') {
    text = spectrumToCsv(result.spectrum, { lengthUnit: 'm' });
  } else {
    text = floorTable(result.spectrum, groundSpectrum, building, assumptions);
  }
  const outputs = new OutputSet([source]);
  if (options.svg !== undefined) {
    const figure = floorFigure({
      ground: groundSpectrum,
      floor: result.spectrum,
      unbroadened: result.broadening === null ? undefined : result.unbroadened,
      broadening: result.broadening,
      building,
      methodDescription: METHOD_DESCRIPTIONS[result.spectrum.method],
    });
    outputs.folder(options.svg, [['floor.svg', figure]], '--svg');
  }
  outputs.text(options.out, text).write();
}

function floorTable(
  floor: Spectrum,
  ground: Spectrum,
  building: BuildingMode,
  assumptions: string[],
): string {
  const g = STANDARD_GRAVITY_MS2;
  const out: string[] = [];
  for (const line of cautionLines(92)) out.push(`! ${line}`);
  out.push('');
  out.push(
    `record    ${ground.record.name} (${ground.record.source}), PGA ${(ground.record.pgaMS2 / g).toFixed(4)} g`,
  );
  out.push(
    `building  T_b ${building.periodS} s, ζ_b ${building.damping}, Γφ ${building.modalFactor}; floor PGA ${(floor.record.pgaMS2 / g).toFixed(4)} g`,
  );
  out.push(`method    ${METHOD_DESCRIPTIONS[floor.method]}`);
  out.push('');
  const header = ['T (s)'.padStart(8)];
  for (const curve of floor.curves) {
    const d = dampingLabel(curve.damping);
    header.push(`ground PSA g @${d}`.padStart(18), `floor PSA g @${d}`.padStart(17));
  }
  out.push(header.join(' '));
  const periods = floor.periodsS;
  const rows = periods.length <= 16 ? Array.from(periods, (_, i) => i) : pickRows(periods);
  for (const p of rows) {
    const row = [Number(periods[p].toPrecision(3)).toString().padStart(8)];
    floor.curves.forEach((curve, d) => {
      row.push(
        (ground.curves[d].psaMS2[p] / g).toPrecision(4).padStart(18),
        (curve.psaMS2[p] / g).toPrecision(4).padStart(17),
      );
    });
    out.push(row.join(' '));
  }
  out.push(`(${periods.length} periods; --format json for all of them)`);
  out.push('');
  out.push('method and assumptions');
  for (const line of assumptions) out.push(...wrapText(line, 92, '  - ', '    '));
  return `${out.join('\n')}\n`;
}

function pickRows(periodsS: Float64Array): number[] {
  const targets = [0, 0.02, 0.05, 0.1, 0.2, 0.3, 0.5, 0.75, 1, 1.5, 2, 3, 5, 10];
  const rows = new Set<number>();
  for (const target of targets) {
    let best = 0;
    for (let i = 1; i < periodsS.length; i++)
      if (Math.abs(periodsS[i] - target) < Math.abs(periodsS[best] - target)) best = i;
    rows.add(best);
  }
  return [...rows].sort((a, b) => a - b);
}
