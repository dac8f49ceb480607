import { formatNumber } from './html.js';

/** The rule the report states for the usable period band after filtering. */
export const USABLE_BAND_RULE =
  'periods from 1/f_lp, the lowest low-pass corner (filter or anti-alias), up to 0.8/f_hp = 1/(1.25 f_hp), f_hp the high-pass corner (common practice: spectral values outside it reflect the filter more than the ground motion)';

/** The usable period band after filtering, s; a bound is null where no filter sets it. */
export interface UsableBand {
  fromS: number | null;
  toS: number | null;
}

/** One processing step as records carry it (src/record/process.ts). */
interface Step {
  operation: string;
  parameters?: Record<string, unknown>;
}

const corner = (value: unknown) => (typeof value === 'number' && value > 0 ? value : null);

/**
 * The usable period band of a record processed by `steps`, by USABLE_BAND_RULE: the high-pass
 * corner of a band- or high-pass filter bounds the long periods, its low-pass corner or a
 * resampling's anti-alias low-pass the short ones. Null when nothing was filtered.
 */
export function usableBand(steps: readonly Step[]): UsableBand | null {
  const highPass: number[] = [];
  const lowPass: number[] = [];
  for (const step of steps) {
    const p = step.parameters ?? {};
    if (step.operation === 'filter') {
      const hp = corner(p.low_corner_hz);
      const lp = corner(p.high_corner_hz);
      if (hp !== null) highPass.push(hp);
      if (lp !== null) lowPass.push(lp);
    } else if (step.operation === 'resample') {
      const lp = corner(p.anti_alias_hz);
      if (lp !== null) lowPass.push(lp);
    }
  }
  if (highPass.length === 0 && lowPass.length === 0) return null;
  return {
    fromS: lowPass.length > 0 ? 1 / Math.min(...lowPass) : null,
    toS: highPass.length > 0 ? 0.8 / Math.max(...highPass) : null,
  };
}

/** The band in words, e.g. "0.04–8 s", "up to 8 s", "from 0.04 s". */
export function usableBandText(band: UsableBand): string {
  const s = (v: number) => formatNumber(v, 3);
  if (band.fromS !== null && band.toS !== null) return `${s(band.fromS)}–${s(band.toS)} s`;
  if (band.toS !== null) return `up to ${s(band.toS)} s`;
  return `from ${s(band.fromS as number)} s`;
}
