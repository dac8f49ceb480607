// The memory layout that the sweep's kernels share: read by the TypeScript here and by
// scripts/generate-wasm-kernel.mjs (from dist/ after tsc), which writes assembly/sweep.ts with it.

/**
 * Where each value sits in an oscillator's row of packed coefficients: the step's recurrence
 * uu … vp1 (see recurrence.ts), c = 2ζω and k = ω² for the absolute acceleration −(c·v + k·u),
 * and the refinement threshold's ratio r and offsets du, dv, ds for u, v and the absolute
 * acceleration (see refinementThresholds in plan.ts).
 */
export const COEFFICIENT = {
  uu: 0,
  uv: 1,
  up0: 2,
  up1: 3,
  vu: 4,
  vv: 5,
  vp0: 6,
  vp1: 7,
  c: 8,
  k: 9,
  ratio: 10,
  du: 11,
  dv: 12,
  ds: 13,
} as const;

/** Values in an oscillator's row of packed coefficients. */
export const COEFFICIENT_STRIDE = 14;

/** Peaks per oscillator, in this order: |u|max (m), |v|max (m/s), |ü + a_g|max (m/s²). */
export const PEAK_STRIDE = 3;

/**
 * Values per oscillator in a block's checkpoint of the WebAssembly kernel's first pass: u and v
 * at the block's start, then the block's largest |u|, |v| and |s| (CHECKPOINT_MAXIMA onwards).
 */
export const CHECKPOINT_STRIDE = 5;
export const CHECKPOINT_MAXIMA = 2;

/**
 * Values per oscillator in the WebAssembly kernel's state area: u and v, carried from stretch to
 * stretch of the first pass, then the three refinement thresholds.
 */
export const STATE_STRIDE = 5;

/** Oscillators per pass of the WebAssembly kernel (two f64x2 vectors) and per planned group. */
export const GROUP_WIDTH = 4;
