import { formatNumber } from '../base/numbers.js';
import { BASELINE_NAMES, removePolynomialBaseline } from './baseline.js';
import { describeFilter, type FilterSpec, padDurationS, zeroPhaseFilter } from './filter.js';
import { type GroundRecord, withProcessing } from './record.js';
import { ANTI_ALIAS_ORDER, LANCZOS_LOBES, resampleHistory } from './resample.js';
import { cosineTaper } from './taper.js';

/** What to do to a record: nothing unless asked. */
export interface ProcessingPlan {
  /** Order of the least-squares polynomial removed from the acceleration: 0 (mean) to 3. */
  baselineOrder?: number;
  /** Share of the record tapered at each end, 0 to 0.5 (0.05 for 5%). */
  taperFraction?: number;
  filter?: FilterSpec;
  /** New time step, s. */
  resampleDtS?: number;
}

/** The fixed order in which a plan is applied. */
export const PROCESSING_ORDER = ['baseline', 'taper', 'filter', 'resample'] as const;

/**
 * Apply a plan in PROCESSING_ORDER, each step recorded: the baseline first to centre the record, the
 * taper so the filter starts near zero, resampling last so the filter sees the samples as recorded.
 */
export function applyProcessingPlan(record: GroundRecord, plan: ProcessingPlan): GroundRecord {
  let out = record;
  const { baselineOrder: order, taperFraction: fraction, filter: spec, resampleDtS: newDtS } = plan;
  if (order !== undefined) {
    const what = order === 0 ? 'mean removed' : `least-squares ${BASELINE_NAMES[order]} polynomial removed`;
    out = withProcessing(out, removePolynomialBaseline(out.accelMS2, order), {
      operation: 'baseline',
      description: `baseline correction: ${what} from the acceleration`,
      parameters: { order, name: BASELINE_NAMES[order] },
    });
  }
  if (fraction !== undefined) {
    out = withProcessing(out, cosineTaper(out.accelMS2, fraction), {
      operation: 'taper',
      description: `cosine (Tukey) taper of ${formatNumber(fraction * 100, 6)}% of the record at each end`,
      parameters: { fraction_each_end: fraction },
    });
  }
  if (spec !== undefined) {
    out = withProcessing(out, zeroPhaseFilter(out.accelMS2, out.dtS, spec), {
      operation: 'filter',
      description: describeFilter(spec),
      parameters: {
        kind: spec.kind,
        order: spec.order,
        low_corner_hz: spec.lowCornerHz ?? null,
        high_corner_hz: spec.highCornerHz ?? null,
        zero_phase: true,
        pad_each_end_s: padDurationS(spec),
      },
    });
  }
  if (newDtS !== undefined) {
    const { values, antiAliasHz } = resampleHistory(out.accelMS2, out.dtS, newDtS);
    const filterNote =
      antiAliasHz === null
        ? 'finer step, no anti-alias filter needed'
        : `after a zero-phase Butterworth anti-alias low-pass of order ${ANTI_ALIAS_ORDER} at ${formatNumber(antiAliasHz)} Hz`;
    const description = `resampled from ${formatNumber(out.dtS, 6)} s to ${formatNumber(newDtS, 6)} s by Lanczos-windowed sinc interpolation (${LANCZOS_LOBES} lobes), ${filterNote}`;
    const parameters = { from_dt_s: out.dtS, to_dt_s: newDtS, anti_alias_hz: antiAliasHz };
    out = withProcessing(out, values, { operation: 'resample', description, parameters }, newDtS);
  }
  return out;
}
