import { formatNumber, formatRange } from '../base/numbers.js';
import type { TargetFit } from '../spectrum/target.js';
import { dampingLabel } from './layout.js';

/** The keys a target adds to the spectrum JSON. */
export function targetToJson(fit: TargetFit) {
  return {
    target: {
      code: fit.target.code,
      description: fit.description,
      parameters: fit.target.parameters,
      damping: fit.target.damping ?? null,
      psa_g: fit.psaG,
    },
    scaling: {
      factor: fit.factor,
      range_s: fit.rangeS,
      period_count: fit.periodCount,
      mean_ratio: fit.meanRatio,
      min_ratio: fit.minRatio,
      max_ratio: fit.maxRatio,
      criterion: fit.criterion,
      damping: fit.damping,
      applied: fit.applied,
    },
  };
}

/** The notes a target adds to the spectrum CSV. */
export function targetCsvNotes(fit: TargetFit): string[] {
  return [
    `target: ${fit.description}`,
    `scaling: factor ${formatNumber(fit.factor)} over ${formatRange(fit.rangeS[0], fit.rangeS[1], 's')} (${fit.periodCount} periods); record/target after scaling mean ${formatNumber(fit.meanRatio)} min ${formatNumber(fit.minRatio)} max ${formatNumber(fit.maxRatio)}; ${fit.applied ? 'applied' : 'not applied'}`,
    `scaling criterion: ${fit.criterion}`,
  ];
}

/** The lines a target adds under the terminal summary. */
export function targetTableLines(fit: TargetFit): string[] {
  const f = (value: number) => formatNumber(value);
  return [
    `target  ${fit.description}`,
    `scale   × ${f(fit.factor)} to match it at ${dampingLabel(fit.damping)} over ${formatRange(fit.rangeS[0], fit.rangeS[1], 's')} (${fit.periodCount} periods)${fit.applied ? ', applied to every number above' : ', not applied (--apply-scale)'}`,
    `        after scaling, record/target: mean ${f(fit.meanRatio)}, min ${f(fit.minRatio)}, max ${f(fit.maxRatio)}`,
    `        criterion: ${fit.criterion}`,
  ];
}
