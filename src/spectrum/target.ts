import { usageError } from '../base/errors.js';
import { formatNumber } from '../base/numbers.js';
import { STANDARD_GRAVITY_MS2 } from '../base/units.js';
import type { GroundRecord } from '../record/record.js';
import { asce722TwoPeriodSpectrum } from './asce722.js';
import {
  asce716Spectrum,
  coversPeriod,
  type DesignSpectrum,
  EC8_GROUNDS,
  type Ec8Ground,
  ec8Spectrum,
} from './design.js';
import { type ScaleResult, scaleRecord, scaleSpectrum, scaleStep, scaleToTarget } from './scale.js';
import type { Spectrum, SpectrumCurve } from './spectrum.js';
import { targetCurveOverlay } from './target-curve.js';

/**
 * A target spectrum as written on the command line: a code spectrum, already built, or the path
 * of a file, which the caller reads (the core does no I/O): a table, or the site's ASCE 7-22
 * multi-period table (read by readSpectrumTable, then asce722MultiPeriodSpectrum).
 */
export type TargetSpec = CodeTarget | { kind: 'table'; path: string };

/** A code spectrum as its keys describe it: built, or the multi-period table file still to read. */
export type CodeTarget = { kind: 'code'; spectrum: DesignSpectrum } | { kind: 'multi-period'; path: string };

/**
 * The parameters of each code spectrum, by the keys a target (and the `design` command) names them
 * with. ASCE 7-22 takes sds, sd1, tl (two-period, §11.4.5.2) or multi-period (§11.4.5.1), not both.
 */
export const CODE_KEYS = {
  'asce7-16': ['sds', 'sd1', 'tl'],
  'asce7-22': ['sds', 'sd1', 'tl', 'multi-period'],
  ec8: ['type', 'ground', 'ag', 'damping'],
} as const;

export type DesignCode = keyof typeof CODE_KEYS;

export const DESIGN_CODES = Object.keys(CODE_KEYS) as DesignCode[];

/** Whether `text` (lower case) names a code of CODE_KEYS. */
export function isDesignCode(text: string): text is DesignCode {
  return Object.hasOwn(CODE_KEYS, text);
}

/** The two-period keys of ASCE 7-22, which do not go with its multi-period table. */
const TWO_PERIOD_KEYS = ['sds', 'sd1', 'tl'] as const;

type CodeFields = { [key in (typeof CODE_KEYS)[DesignCode][number]]?: string };

/**
 * Parse a target: `asce7-16:sds=1.0,sd1=0.6,tl=8`, `asce7-22:sds=1.0,sd1=0.6,tl=8`,
 * `asce7-22:multi-period=FILE`, `ec8:type=1,ground=C,ag=0.25[,damping=5%]` (the parameters of
 * codeTarget), or anything else, which is taken as the path of a two-column table of period (s)
 * and PSA (g).
 */
export function parseTargetSpec(text: string): TargetSpec {
  const spec = text.trim();
  const colon = spec.indexOf(':');
  const code = colon > 0 ? spec.slice(0, colon).toLowerCase() : '';
  if (!isDesignCode(code)) {
    if (spec === '') throw usageError('--target is empty');
    return { kind: 'table', path: spec };
  }
  const fields: { [key: string]: string } = {};
  for (const item of spec.slice(colon + 1).split(',')) {
    const equals = item.indexOf('=');
    if (equals <= 0) throw usageError(`target '${spec}': '${item}' is not key=value`);
    const key = item.slice(0, equals).trim().toLowerCase();
    if (key in fields) throw usageError(`target '${spec}': ${key} is given twice`);
    if (!(CODE_KEYS[code] as readonly string[]).includes(key)) {
      throw usageError(`target '${spec}': unknown key '${key}'; accepted: ${CODE_KEYS[code].join(', ')}`);
    }
    fields[key] = item.slice(equals + 1).trim();
  }
  return codeTarget(code, fields, (key) => `target '${spec}': ${key}=`);
}

/**
 * The code spectrum its keys describe (CODE_KEYS), as codeSpectrum builds it; for ASCE 7-22 with
 * `multi-period`, the table file to read instead, refused beside the two-period keys.
 */
export function codeTarget(code: DesignCode, fields: CodeFields, label: (key: string) => string): CodeTarget {
  const table = fields['multi-period'];
  if (code !== 'asce7-22') return { kind: 'code', spectrum: codeSpectrum(code, fields, label) };
  const forms =
    "ASCE 7-22 takes S_DS, S_D1 and T_L (two-period, §11.4.5.2) or the site's multi-period table (§11.4.5.1)";
  const twoPeriod = TWO_PERIOD_KEYS.find((key) => fields[key] !== undefined);
  if (table === undefined) {
    if (twoPeriod === undefined) throw usageError(`${label('sds')} is required: ${forms}`);
    return { kind: 'code', spectrum: codeSpectrum(code, fields, label) };
  }
  if (twoPeriod !== undefined) {
    throw usageError(`${label(twoPeriod)} does not go with a multi-period table: ${forms}, not both`);
  }
  if (table.trim() === '') throw usageError(`${label('multi-period')} needs a file`);
  return { kind: 'multi-period', path: table.trim() };
}

/**
 * The code spectrum of its parameters, given as text by key (CODE_KEYS): accelerations in g,
 * periods in s, the Eurocode 8 damping a fraction or a percentage (5% when left out); ASCE 7-22
 * here is its two-period form (its multi-period table goes through codeTarget). `label` names a
 * parameter in the messages as the user wrote it.
 */
export function codeSpectrum(
  code: DesignCode,
  fields: CodeFields,
  label: (key: string) => string,
): DesignSpectrum {
  const text = (key: keyof CodeFields): string => {
    const value = fields[key];
    if (value === undefined || value.trim() === '') throw usageError(`${label(key)} is required`);
    return value;
  };
  const number = (key: keyof CodeFields): number => {
    const value = Number(text(key));
    if (!Number.isFinite(value)) throw usageError(`${label(key)} '${fields[key]}' is not a number`);
    return value;
  };
  if (code === 'asce7-16')
    return asce716Spectrum({ sdsG: number('sds'), sd1G: number('sd1'), tlS: number('tl') });
  if (code === 'asce7-22') {
    // The multi-period form names a file, which only the caller reads (codeTarget).
    if (fields['multi-period'] !== undefined)
      throw usageError(`${label('multi-period')} names a file: use codeTarget`);
    return asce722TwoPeriodSpectrum({ sdsG: number('sds'), sd1G: number('sd1'), tlS: number('tl') });
  }
  return ec8Spectrum({
    type: parseEc8Type(text('type')),
    ground: parseEc8Ground(text('ground')),
    agG: number('ag'),
    damping: fields.damping === undefined ? 0.05 : parseDampingRatio(fields.damping),
  });
}

/** `1` or `2`. */
function parseEc8Type(text: string): 1 | 2 {
  if (text.trim() === '1') return 1;
  if (text.trim() === '2') return 2;
  throw usageError(`Eurocode 8 spectrum type '${text}': use 1 or 2`);
}

/** A ground type A–E, in either case. */
function parseEc8Ground(text: string): Ec8Ground {
  const ground = text.trim().toUpperCase();
  if ((EC8_GROUNDS as readonly string[]).includes(ground)) return ground as Ec8Ground;
  throw usageError(`Eurocode 8 ground type '${text}': use A, B, C, D or E (S1 and S2 need special studies)`);
}

/** One damping ratio: a fraction (0.05) or a percentage (5%); a bare number above 1 is refused. */
function parseDampingRatio(text: string): number {
  const part = text.trim();
  const percent = part.endsWith('%');
  const value = Number(percent ? part.slice(0, -1).trim() : part);
  if (part === '' || !Number.isFinite(value) || value < 0) {
    throw usageError(`damping '${text}' is not a ratio ≥ 0 (write 0.05 or 5%)`);
  }
  if (!percent && value > 1) throw usageError(`damping ${part} is above 1; write ${part}% for a percentage`);
  return percent ? value / 100 : value;
}

/** A record's spectrum fitted to a target spectrum (scaleToTarget), as data for the outputs. */
export interface TargetFit extends ScaleResult {
  target: DesignSpectrum;
  description: string;
  /** The damping ratio of the record curve compared with the target. */
  damping: number;
  /** Whether the factor was applied to the spectrum (and to the record, by targetRecord). */
  applied: boolean;
  /** Target PSA, g, at the spectrum's periods (null where the target does not cover the period). */
  psaG: (number | null)[];
}

/**
 * Fit `target` to the spectrum's curve at the target's damping over `rangeS` (default: every grid
 * period above 0 it covers); with `apply`, the spectrum comes back scaled by the factor.
 */
export function fitTarget(
  spectrum: Spectrum,
  target: DesignSpectrum,
  options: { rangeS?: [number, number]; apply?: boolean } = {},
): { fit: TargetFit; spectrum: Spectrum } {
  const curve = targetCurve(spectrum, target);
  const recordPsaG = curve.psaMS2.map((value) => value / STANDARD_GRAVITY_MS2);
  const scaling = scaleToTarget(spectrum.periodsS, recordPsaG, target, { rangeS: options.rangeS });
  const applied = options.apply === true;
  const fit: TargetFit = {
    ...scaling,
    target,
    description: target.description,
    damping: curve.damping,
    applied,
    psaG: Array.from(spectrum.periodsS, (t) => (coversPeriod(target, t) ? target.psaG(t) : null)),
  };
  return { fit, spectrum: applied ? scaleSpectrum(spectrum, fit.factor, scaleStep(fit, target)) : spectrum };
}

/** The record as the outputs of a fit see it: scaled when the fit was applied. */
export function targetRecord(record: GroundRecord, fit: TargetFit | undefined): GroundRecord {
  return fit?.applied ? scaleRecord(record, fit.factor, scaleStep(fit, fit.target)) : record;
}

/** The target as a curve for the PSA figures (targetCurveOverlay: its own points over the grid's span), PSA in g. */
export function targetOverlay(
  periodsS: Float64Array,
  fit: TargetFit,
): { label: string; periodsS: number[]; psaG: number[] } {
  return targetCurveOverlay(fit, periodsS);
}

/**
 * The record curve compared with the target: the one at the target's damping (5% for ASCE 7, ξ
 * for Eurocode 8); for a table, which states none, the 5% curve, or the only curve.
 */
function targetCurve(spectrum: Spectrum, target: DesignSpectrum): SpectrumCurve {
  const wanted = target.damping ?? (spectrum.curves.length === 1 ? spectrum.curves[0].damping : 0.05);
  const curve = spectrum.curves.find((c) => Math.abs(c.damping - wanted) < 1e-12);
  if (curve === undefined) {
    throw usageError(`the target is for ${formatNumber(100 * wanted, 6)}% damping: include it in --damping`);
  }
  return curve;
}
