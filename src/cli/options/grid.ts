import type { Command } from 'commander';
import { usageError } from '../../base/errors.js';
import {
  dampingWarnings,
  defaultPeriodsS,
  MAX_OSCILLATORS,
  parseDampings,
  parseFrequencies,
  parsePeriods,
} from '../../oscillator/grid.js';
import { parseMethod } from '../../oscillator/recurrence.js';

export interface GridCliOptions {
  periods?: string;
  frequencies?: string;
  damping?: string;
  method?: string;
  force?: boolean;
}

/** Add --periods (or --frequencies), --damping, --method and --force. */
export function addGridOptions(command: Command, defaultDamping = '5%'): Command {
  return command
    .option(
      '--periods <grid>',
      'periods, s: a list (0,0.1,0.5) or a:b:n log-spaced (default: 0 and 0.01 to 10 s, 40 a decade, 1-2-5 on it)',
    )
    .option('--frequencies <grid>', FREQUENCIES_HELP)
    .option('--damping <list>', 'damping ratios as fractions or percentages, e.g. 0.02,5%', defaultDamping)
    .option('--method <method>', 'newmark-average, newmark-linear or piecewise-exact', 'newmark-average')
    .option('--force', `allow more than ${thousands(MAX_OSCILLATORS)} oscillators`);
}

/** 1000000 → "1,000,000" (toLocaleString would load the locale data at every start-up). */
function thousands(value: number): string {
  return String(value).replace(/\B(?=(\d{3})+(?!\d))/g, ',');
}

export const FREQUENCIES_HELP =
  'instead of --periods: frequencies, Hz, a list (1,2,5) or a:b:n log-spaced; swept at T = 1/f';

/**
 * The periods of --periods or --frequencies (T = 1/f, ascending either way), or `fallback` when
 * neither is given; both at once is refused.
 */
export function periodsFromOptions(
  options: Pick<GridCliOptions, 'periods' | 'frequencies'>,
  fallback: () => Float64Array = defaultPeriodsS,
): Float64Array {
  if (options.periods !== undefined && options.frequencies !== undefined)
    throw usageError('give --periods or --frequencies, not both');
  if (options.frequencies !== undefined) return parseFrequencies(options.frequencies);
  return options.periods === undefined ? fallback() : parsePeriods(options.periods);
}

/** The grid the options name; more than MAX_OSCILLATORS oscillators needs --force. */
export function gridFromOptions(options: GridCliOptions) {
  const periodsS = periodsFromOptions(options);
  const dampings = parseDampings(options.damping ?? '5%');
  const method = parseMethod(options.method ?? 'newmark-average');
  const count = periodsS.length * dampings.length;
  if (count > MAX_OSCILLATORS && !options.force) {
    throw usageError(`${count} oscillators is more than ${MAX_OSCILLATORS}; add --force if you mean it`);
  }
  for (const warning of dampingWarnings(dampings)) process.stderr.write(`quakesweep: warning: ${warning}\n`);
  return { periodsS, dampings, method };
}
