// The memory layout that the sweep's kernels share: read by the TypeScript here and by
// scripts/generate-wasm-kernel.mjs (from dist/ after tsc), which writes assembly/sweep.ts with it.

/** The step's recurrence uu … vp1 (see recurrence.ts), first in an oscillator's row of packed coefficients. */
export const STEP_KEYS = ['uu', 'uv', 'up0', 'up1', 'vu', 'vv', 'vp0', 'vp1'] as const;

/**
 * The values of a row, in order: the step's, c = 2ζω and k = ω² for the absolute acceleration
 * −(c·v + k·u), and the ratio r and offsets du, dv, ds of refinementThresholds (peak.ts).
 */
const ROW = [...STEP_KEYS, 'c', 'k', 'ratio', 'du', 'dv', 'ds'] as const;

/** Where each value sits in a row. */
export const COEFFICIENT = Object.fromEntries(ROW.map((name, i) => [name, i])) as Record<RowValue, number>;
type RowValue = (typeof ROW)[number];

/** Values in an oscillator's row of packed coefficients. */
export const COEFFICIENT_STRIDE = ROW.length;

/** Peaks per oscillator, in this order: |u|max (m), |v|max (m/s), |ü + a_g|max (m/s²). */
export const PEAK_STRIDE = 3;

/** Per oscillator in a checkpoint of pass 1: u and v at the block's start, then its largest |u|, |v|, |s|. */
export const CHECKPOINT_STRIDE = 5;
export const CHECKPOINT_MAXIMA = 2;

/** Per oscillator in the WebAssembly kernel's state: u and v between stretches of pass 1, 3 thresholds. */
export const STATE_STRIDE = 5;

/** Oscillators per pass of the WebAssembly kernel (two f64x2 vectors) and per planned group. */
export const GROUP_WIDTH = 4;
