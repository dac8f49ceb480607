import { inputError } from '../base/errors.js';
import { referencePeaks } from './kernels/reference.js';
import { WasmSweeper, wasmSimdSupported } from './kernels/wasm.js';
import { COEFFICIENT_STRIDE, GROUP_WIDTH, PEAK_STRIDE } from './layout.js';
import { type PlannedOscillator, packCoefficients, type SweepPlan } from './plan.js';
import type { SweepKernel } from './sweep.js';

/** The kernel a sweep uses: WebAssembly SIMD where the engine has it, unless told otherwise. */
export function resolveKernel(kernel: SweepKernel, simd = wasmSimdSupported()): 'wasm' | 'js' {
  if (kernel === 'wasm' && !simd) throw inputError('the WebAssembly SIMD kernel does not run on this engine');
  if (kernel === 'auto') return simd ? 'wasm' : 'js';
  return kernel;
}

/**
 * A function that steps one planned group over the record from rest and returns its peaks
 * (PEAK_STRIDE per oscillator, in an array reused between calls), packing its coefficients itself.
 */
export function groupRunner(
  accelMS2: Float64Array,
  plan: SweepPlan,
  kernel: SweepKernel,
): (group: PlannedOscillator[]) => Float64Array {
  const values = new Float64Array(GROUP_WIDTH * PEAK_STRIDE);
  const packed = new Float64Array(GROUP_WIDTH * COEFFICIENT_STRIDE);
  const sweeper = resolveKernel(kernel) === 'wasm' ? new WasmSweeper(accelMS2) : undefined;
  return (group) => {
    const substeps = group[0].substeps;
    const stepS = plan.dtS / substeps;
    for (let g = 0; g < group.length; g++) {
      packCoefficients(packed, g, group[g], plan.method, stepS, plan.bounds, plan.prewarp);
    }
    if (sweeper !== undefined) {
      // Newmark average acceleration has equal forcing coefficients unless sub-steps are composed.
      const symmetric = plan.method === 'newmark-average' && group.every((o) => o.composed === 1);
      sweeper.run(packed, group.length, substeps, stepS, symmetric, values);
    } else {
      for (let g = 0; g < group.length; g++) {
        const row = packed.subarray(g * COEFFICIENT_STRIDE, (g + 1) * COEFFICIENT_STRIDE);
        referencePeaks(accelMS2, substeps, stepS, row, values, g * PEAK_STRIDE);
      }
    }
    return values;
  };
}
