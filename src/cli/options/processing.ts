import type { Command } from 'commander';
import { usageError } from '../../base/errors.js';
import { BASELINE_NAMES } from '../../record/baseline.js';
import { type FilterSpec, MAX_FILTER_ORDER } from '../../record/filter.js';
import { applyProcessingPlan, type ProcessingPlan } from '../../record/process.js';
import type { GroundRecord } from '../../record/record.js';
import { positiveNumber } from './record.js';

/** Processing options as commander hands them over. */
export interface ProcessingCliOptions {
  baseline?: string;
  taper?: string;
  filter?: string;
  resample?: string;
}

/** Butterworth order when `--filter` does not give one. */
export const DEFAULT_FILTER_ORDER = 4;

/**
 * Add the processing options. Nothing is done unless asked; what is asked is applied in the
 * fixed order baseline → taper → filter → resample and stated in every output.
 */
export function addProcessingOptions(command: Command): Command {
  return command
    .option('--baseline <order>', 'remove a least-squares baseline: mean, linear, quadratic, cubic (or 0-3)')
    .option('--taper <percent>', 'cosine taper of this share of the record at each end, e.g. 5%')
    .option(
      '--filter <spec>',
      `zero-phase Butterworth: highpass:Hz[:order], lowpass:Hz[:order], bandpass:low-high[:order] (order ${DEFAULT_FILTER_ORDER} if left out)`,
    )
    .option('--resample <seconds>', 'resample to this time step, s (anti-alias filter when coarser)');
}

/** Turn the options into a plan, refusing malformed values (corners are checked against the record). */
export function processingPlanFromOptions(options: ProcessingCliOptions): ProcessingPlan {
  const plan: ProcessingPlan = {};
  if (options.baseline !== undefined) plan.baselineOrder = parseBaseline(options.baseline);
  if (options.taper !== undefined) plan.taperFraction = parseTaper(options.taper);
  if (options.filter !== undefined) plan.filter = parseFilter(options.filter);
  if (options.resample !== undefined) plan.resampleDtS = positiveNumber('--resample', options.resample);
  return plan;
}

/** Apply the processing the options ask for (none if none), each step recorded on the record. */
export function applyProcessing(record: GroundRecord, options: ProcessingCliOptions): GroundRecord {
  return applyProcessingPlan(record, processingPlanFromOptions(options));
}

export function parseBaseline(text: string): number {
  const key = text.trim().toLowerCase();
  const byName = (BASELINE_NAMES as readonly string[]).indexOf(key);
  if (byName >= 0) return byName;
  if (/^[0-3]$/.test(key)) return Number(key);
  throw usageError(`--baseline '${text}': use mean, linear, quadratic or cubic (or 0, 1, 2, 3)`);
}

export function parseTaper(text: string): number {
  const match = /^\s*([0-9]*\.?[0-9]+)\s*%\s*$/.exec(text);
  if (match === null)
    throw usageError(`--taper '${text}': write a percentage of the record at each end, e.g. 5%`);
  const percent = Number(match[1]);
  if (percent > 50) throw usageError(`--taper '${text}': at most 50% at each end`);
  return percent / 100;
}

export function parseFilter(text: string): FilterSpec {
  const refusal = (why: string) => usageError(`--filter '${text}': ${why}`);
  const hint = 'use highpass:0.1, lowpass:25:4 or bandpass:0.1-25:4';
  const [kind, corners, orderText, ...rest] = text.trim().toLowerCase().split(':');
  if (corners === undefined || rest.length > 0) throw refusal(hint);
  const order = orderText === undefined ? DEFAULT_FILTER_ORDER : Number(orderText);
  if (orderText !== undefined && (orderText.trim() === '' || !Number.isInteger(order) || order < 1))
    throw refusal(`the order must be a whole number ≥ 1, got '${orderText}'`);
  if (order > MAX_FILTER_ORDER) throw refusal(`the order must be at most ${MAX_FILTER_ORDER}`);
  const frequency = (value: string): number => {
    const hz = Number(value);
    if (value.trim() === '' || !Number.isFinite(hz) || hz <= 0)
      throw refusal(`'${value}' is not a positive frequency in Hz`);
    return hz;
  };
  if (kind === 'highpass') return { kind, order, lowCornerHz: frequency(corners) };
  if (kind === 'lowpass') return { kind, order, highCornerHz: frequency(corners) };
  if (kind !== 'bandpass') throw refusal(`unknown filter '${kind}'; ${hint}`);
  const band = corners.split('-');
  if (band.length !== 2) throw refusal('a band is low-high in Hz, e.g. 0.1-25');
  const [lowCornerHz, highCornerHz] = band.map(frequency);
  if (lowCornerHz >= highCornerHz) throw refusal('the low corner must be below the high corner');
  return { kind, order, lowCornerHz, highCornerHz };
}
