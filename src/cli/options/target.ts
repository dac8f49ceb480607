import type { Command } from 'commander';
import { usageError } from '../../base/errors.js';
import { parseScaleRange } from '../../spectrum/scale.js';
import { parseTargetSpec } from '../../spectrum/target.js';
import { loadCodeTarget, loadTableSpectrum } from './design.js';

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
      'target spectrum: asce7-16:sds=1.0,sd1=0.6,tl=8, asce7-22:sds=1.0,sd1=0.6,tl=8 (two-period), asce7-22:multi-period=FILE, ec8:type=1,ground=C,ag=0.25[,damping=5%], or a table file',
    )
    .option(
      '--scale-range <a:b>',
      'periods, s, over which to fit the target (default: every grid period > 0 it covers)',
    )
    .option('--apply-scale', 'scale the record by the fitted factor for every output');
}

/**
 * The target named by --target, its fitting range, whether to apply it and the files read for it
 * (to keep outputs off them); refuses the scaling options without it.
 */
export function targetFromOptions(options: TargetCliOptions) {
  if (options.target === undefined) {
    if (options.scaleRange !== undefined) throw usageError('--scale-range needs --target');
    if (options.applyScale) throw usageError('--apply-scale needs --target');
    return undefined;
  }
  const spec = parseTargetSpec(options.target);
  return {
    spectrum: spec.kind === 'table' ? loadTableSpectrum(spec.path) : loadCodeTarget(spec),
    files: spec.kind === 'code' ? [] : [spec.path],
    rangeS: options.scaleRange === undefined ? undefined : parseScaleRange(options.scaleRange),
    apply: options.applyScale === true,
  };
}
