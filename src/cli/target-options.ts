import { readFileSync } from 'node:fs';
import type { Command } from 'commander';
import { usageError } from '../base/errors.js';
import { STANDARD_GRAVITY_MS2 } from '../base/units.js';
import type { GroundRecord } from '../record/record.js';
import { asce716Spectrum, coversPeriod, type DesignSpectrum, ec8Spectrum } from '../spectrum/design.js';
import { readSpectrumTable, tableSpectrum } from '../spectrum/design-table.js';
import {
  parseScaleRange,
  type ScaleResult,
  scaleRecord,
  scaleSpectrum,
  scaleStep,
  scaleToTarget,
} from '../spectrum/scale.js';
import type { Spectrum, SpectrumCurve } from '../spectrum/spectrum.js';
import { parseDampingRatio, parseEc8Ground, parseEc8Type, parseTargetSpec } from '../spectrum/target.js';

/** The options that choose a design spectrum (the `design` command). */
export interface DesignCliOptions {
  code?: string;
  sds?: string;
  sd1?: string;
  tl?: string;
  type?: string;
  ground?: string;
  ag?: string;
  damping?: string;
  table?: string;
}

export function addDesignOptions(command: Command): Command {
  return command
    .option('--code <code>', 'asce7-16 or ec8')
    .option('--sds <g>', 'ASCE 7-16: S_DS, g')
    .option('--sd1 <g>', 'ASCE 7-16: S_D1, g')
    .option('--tl <s>', 'ASCE 7-16: long-period transition period T_L, s')
    .option('--type <n>', 'Eurocode 8: spectrum type, 1 or 2')
    .option('--ground <type>', 'Eurocode 8: ground type A, B, C, D or E')
    .option('--ag <g>', 'Eurocode 8: design ground acceleration on type A ground a_g, g')
    .option('--damping <ratio>', 'Eurocode 8: viscous damping for η, fraction or percentage (default 5%)')
    .option('--table <file>', 'a two-column CSV of period (s) and PSA (g) instead of a code');
}

const ASCE_KEYS = ['sds', 'sd1', 'tl'] as const;
const EC8_KEYS = ['type', 'ground', 'ag', 'damping'] as const;

/** Build the design spectrum the options describe, reading the table file if one is named. */
export function designFromOptions(options: DesignCliOptions): DesignSpectrum {
  if (options.table !== undefined) {
    if (options.code !== undefined) throw usageError('give either --code or --table, not both');
    refuse(options, [...ASCE_KEYS, ...EC8_KEYS], '--table');
    return loadTableSpectrum(options.table);
  }
  const code = options.code?.trim().toLowerCase();
  if (code === 'asce7-16') {
    refuse(options, EC8_KEYS, '--code asce7-16');
    return asce716Spectrum({
      sdsG: required(options, 'sds'),
      sd1G: required(options, 'sd1'),
      tlS: required(options, 'tl'),
    });
  }
  if (code === 'ec8') {
    refuse(options, ASCE_KEYS, '--code ec8');
    return ec8Spectrum({
      type: parseEc8Type(text(options, 'type')),
      ground: parseEc8Ground(text(options, 'ground')),
      agG: required(options, 'ag'),
      damping: options.damping === undefined ? 0.05 : parseDampingRatio(options.damping),
    });
  }
  if (code === undefined) throw usageError('choose a spectrum: --code asce7-16, --code ec8 or --table FILE');
  throw usageError(`--code '${options.code}': use asce7-16 or ec8`);
}

/** Read a table spectrum file (errors name the file and line). */
export function loadTableSpectrum(path: string): DesignSpectrum {
  return tableSpectrum(readSpectrumTable(readFileSync(path, 'utf8'), path), path);
}

function text(options: DesignCliOptions, key: keyof DesignCliOptions): string {
  const value = options[key];
  if (value === undefined) throw usageError(`--${key} is required with --code ${options.code}`);
  return value;
}

function required(options: DesignCliOptions, key: keyof DesignCliOptions): number {
  const raw = text(options, key);
  const value = Number(raw);
  if (raw.trim() === '' || !Number.isFinite(value)) throw usageError(`--${key} '${raw}' is not a number`);
  return value;
}

function refuse(options: DesignCliOptions, keys: readonly (keyof DesignCliOptions)[], context: string): void {
  for (const key of keys) {
    if (options[key] !== undefined) throw usageError(`--${key} does not apply to ${context}`);
  }
}

/** The target options of `spectrum`. */
export interface TargetCliOptions {
  target?: string;
  scaleRange?: string;
  applyScale?: boolean;
}

export function addTargetOptions(command: Command): Command {
  return command
    .option(
      '--target <spec>',
      'target spectrum: asce7-16:sds=1.0,sd1=0.6,tl=8, ec8:type=1,ground=C,ag=0.25[,damping=5%], or a table file',
    )
    .option(
      '--scale-range <a:b>',
      'periods, s, over which to fit the target (default: every grid period > 0 it covers)',
    )
    .option('--apply-scale', 'scale the record by the fitted factor for every output');
}

/** The target named by --target, or undefined; refuses the scaling options without it. */
export function loadTarget(options: TargetCliOptions): DesignSpectrum | undefined {
  if (options.target === undefined) {
    if (options.scaleRange !== undefined) throw usageError('--scale-range needs --target');
    if (options.applyScale) throw usageError('--apply-scale needs --target');
    return undefined;
  }
  const spec = parseTargetSpec(options.target);
  return spec.kind === 'code' ? spec.spectrum : loadTableSpectrum(spec.path);
}

/** What a target adds to the outputs of `spectrum`. */
export interface TargetOutcome {
  /** The spectrum to write: scaled with --apply-scale, as it was otherwise. */
  spectrum: Spectrum;
  /** Extra keys for the JSON document. */
  json: { [key: string]: unknown };
  /** Add the target column and the scaling lines to the CSV text. */
  csv(text: string): string;
  /** Add the target and scaling lines to the terminal summary. */
  table(text: string): string;
  /** The target as a curve for the PSA and four-way figures (periods it covers only). */
  overlay?: { label: string; periodsS: number[]; psaG: number[] };
  /** The record as downstream outputs should see it: scaled with --apply-scale. */
  record(record: GroundRecord): GroundRecord;
}

const NO_TARGET: Omit<TargetOutcome, 'spectrum'> = {
  json: {},
  csv: (text) => text,
  table: (text) => text,
  record: (record) => record,
};

/** Fit the target to the spectrum (and scale it with --apply-scale). */
export function applyTarget(
  spectrum: Spectrum,
  target: DesignSpectrum | undefined,
  options: TargetCliOptions,
): TargetOutcome {
  if (target === undefined) return { spectrum, ...NO_TARGET };
  const curve = targetCurve(spectrum, target);
  const recordPsaG = curve.psaMS2.map((value) => value / STANDARD_GRAVITY_MS2);
  const rangeS = options.scaleRange === undefined ? undefined : parseScaleRange(options.scaleRange);
  const scaling = scaleToTarget(spectrum.periodsS, recordPsaG, target, { rangeS });
  const applied = options.applyScale === true;
  const out = applied ? scaleSpectrum(spectrum, scaling.factor, scaleStep(scaling, target)) : spectrum;
  const targetG = Array.from(spectrum.periodsS, (t) => (coversPeriod(target, t) ? target.psaG(t) : null));
  return {
    spectrum: out,
    json: {
      target: {
        code: target.code,
        description: target.description,
        parameters: target.parameters,
        damping: target.damping ?? null,
        psa_g: targetG,
      },
      scaling: {
        factor: scaling.factor,
        range_s: scaling.rangeS,
        period_count: scaling.periodCount,
        mean_ratio: scaling.meanRatio,
        min_ratio: scaling.minRatio,
        max_ratio: scaling.maxRatio,
        criterion: scaling.criterion,
        damping: curve.damping,
        applied,
      },
    },
    csv: (text) => csvWithTarget(text, target, targetG, scaling, applied),
    table: (text) => `${text}\n${scalingLines(target, scaling, curve.damping, applied).join('\n')}\n`,
    overlay: {
      label: `target: ${target.description.split(': ')[0]}`,
      periodsS: Array.from(spectrum.periodsS).filter((_, i) => targetG[i] !== null),
      psaG: targetG.filter((value): value is number => value !== null),
    },
    record: (record) => (applied ? scaleRecord(record, scaling.factor, scaleStep(scaling, target)) : record),
  };
}

/**
 * The record curve compared with the target: the one at the target's damping (5% for ASCE 7, ξ
 * for Eurocode 8); for a table, which states none, the 5% curve, or the only curve.
 */
function targetCurve(spectrum: Spectrum, target: DesignSpectrum): SpectrumCurve {
  const wanted = target.damping ?? (spectrum.curves.length === 1 ? spectrum.curves[0].damping : 0.05);
  const curve = spectrum.curves.find((c) => Math.abs(c.damping - wanted) < 1e-12);
  if (curve === undefined) {
    throw usageError(
      `the target is for ${Number((100 * wanted).toPrecision(6))}% damping: include it in --damping`,
    );
  }
  return curve;
}

function scalingLines(target: DesignSpectrum, s: ScaleResult, damping: number, applied: boolean): string[] {
  const f = (value: number) => value.toPrecision(4);
  return [
    `target  ${target.description}`,
    `scale   × ${f(s.factor)} to match it at ${Number((100 * damping).toPrecision(6))}% over ${s.rangeS[0]}–${s.rangeS[1]} s (${s.periodCount} periods)${applied ? ', applied to every number above' : ', not applied (--apply-scale)'}`,
    `        after scaling, record/target: mean ${f(s.meanRatio)}, min ${f(s.minRatio)}, max ${f(s.maxRatio)}`,
    `        criterion: ${s.criterion}`,
  ];
}

function csvWithTarget(
  text: string,
  target: DesignSpectrum,
  targetG: (number | null)[],
  s: ScaleResult,
  applied: boolean,
): string {
  const lines = text.replace(/\n$/, '').split('\n');
  const header = lines.findIndex((line) => !line.startsWith('#'));
  const notes = [
    `# target: ${target.description.replace(/[\r\n]+/g, ' ')}`,
    `# scaling: factor ${s.factor} over ${s.rangeS[0]}-${s.rangeS[1]} s (${s.periodCount} periods); record/target after scaling mean ${s.meanRatio} min ${s.minRatio} max ${s.maxRatio}; ${applied ? 'applied' : 'not applied'}`,
    `# scaling criterion: ${s.criterion}`,
  ];
  const body = lines.slice(header).map((line, i) => {
    if (i === 0) return `${line},target_psa_g`;
    const value = targetG[i - 1];
    return `${line},${value === null || value === undefined ? '' : String(value)}`;
  });
  return `${[...lines.slice(0, header), ...notes, ...body].join('\n')}\n`;
}
