import type { Command } from 'commander';
import { usageError } from '../../base/errors.js';
import type { DesignSpectrum } from '../../spectrum/design.js';
import { parseScaleRange } from '../../spectrum/scale.js';
import type { Spectrum } from '../../spectrum/spectrum.js';
import { fitTarget, parseTargetSpec, type TargetFit } from '../../spectrum/target.js';
import { loadTableSpectrum } from './design.js';

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

/** The target, its fitting range and whether to apply it, as the options name them. */
export interface TargetChoice {
  spectrum: DesignSpectrum;
  rangeS?: [number, number];
  apply: boolean;
}

/** The target named by --target, or undefined; refuses the scaling options without it. */
export function targetFromOptions(options: TargetCliOptions): TargetChoice | undefined {
  if (options.target === undefined) {
    if (options.scaleRange !== undefined) throw usageError('--scale-range needs --target');
    if (options.applyScale) throw usageError('--apply-scale needs --target');
    return undefined;
  }
  const spec = parseTargetSpec(options.target);
  return {
    spectrum: spec.kind === 'code' ? spec.spectrum : loadTableSpectrum(spec.path),
    rangeS: options.scaleRange === undefined ? undefined : parseScaleRange(options.scaleRange),
    apply: options.applyScale === true,
  };
}

/** Fit the target to the spectrum, scaled by the fit when it is applied; no target, no fit. */
export function applyTarget(
  spectrum: Spectrum,
  target: TargetChoice | undefined,
): { fit?: TargetFit; spectrum: Spectrum } {
  return target === undefined ? { spectrum } : fitTarget(spectrum, target.spectrum, target);
}
