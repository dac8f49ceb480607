import type { Command } from 'commander';
import { usageError } from '../../base/errors.js';
import { PERIOD_AXES, type PeriodAxis } from '../../plot/period-axis.js';

export interface AxisCliOptions {
  axis?: string;
}

/** Add --axis period|frequency, the horizontal axis of the command's spectrum figures. */
export function addAxisOption(
  command: Command,
  help = 'x axis of the figures: period (s) or frequency (Hz)',
) {
  return command.option('--axis <axis>', help);
}

/** The value of --axis, or undefined when it is not given (each figure's default then applies). */
export function periodAxisFromOptions(options: AxisCliOptions): PeriodAxis | undefined {
  const axis = options.axis;
  if (axis === undefined) return undefined;
  if (!(PERIOD_AXES as readonly string[]).includes(axis))
    throw usageError(`--axis '${axis}': use ${PERIOD_AXES.join(' or ')}`);
  return axis as PeriodAxis;
}

/** --axis of a command whose figures are written with --svg: given without --svg, it is refused. */
export function svgAxisFromOptions(options: AxisCliOptions & { svg?: string }): PeriodAxis | undefined {
  const axis = periodAxisFromOptions(options);
  if (axis !== undefined && options.svg === undefined)
    throw usageError('--axis sets the axis of the figures; add --svg <dir>');
  return axis;
}
