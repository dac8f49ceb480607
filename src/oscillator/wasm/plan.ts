import { PLAN_WASM_BASE64 } from './plan-binary.js';

/**
 * The sweep plan's arithmetic in WebAssembly (assembly/plan.ts, no SIMD): the pass of
 * recordStatistics over the record and packCoefficients for pre-warped Newmark average
 * acceleration, with the same operations in the same order as the TypeScript in sweep.ts and
 * recurrence.ts and the engine's own Math.exp, Math.cos and Math.cosh, so that the numbers are the
 * same bits. A fresh process ran the TypeScript unoptimized: about 2 ms for the pass over a
 * 40,000-sample record and 4–8 ms for 1,000 oscillators, where this takes a few hundredths.
 */
interface PlanExports {
  memory: WebAssembly.Memory;
  heapBase(): number;
  recordSums(record: number, samples: number, out: number): void;
  averageRows(inputs: number, count: number, pgaMS2: number, jerkMS3: number, rows: number): void;
}

/** Values per oscillator in averageRows' input: period (s), damping ratio, step (s), sub-steps composed. */
export const PLAN_INPUT = 4;
/** Values per oscillator in its rows (COEFFICIENT_STRIDE in kernel.ts). */
const ROW = 14;

let planner: PlanExports | null | undefined;

/** The thread's instance of the module, made on first use; undefined where WebAssembly does not run. */
function instance(): PlanExports | undefined {
  if (planner === undefined) {
    try {
      const module = new WebAssembly.Module(Buffer.from(PLAN_WASM_BASE64, 'base64'));
      const plan = { exp: Math.exp, cos: Math.cos, cosh: Math.cosh };
      planner = new WebAssembly.Instance(module, { plan }).exports as unknown as PlanExports;
    } catch {
      planner = null;
    }
  }
  return planner ?? undefined;
}

/** The module's memory as f64 from its heap base, grown to hold `values` of them. */
function space(exports: PlanExports, values: number): Float64Array {
  const base = exports.heapBase();
  const pages = Math.ceil((base + values * 8) / 65536) - exports.memory.buffer.byteLength / 65536;
  if (pages > 0) exports.memory.grow(pages);
  return new Float64Array(exports.memory.buffer, base, values);
}

/**
 * Σa², Σ(Δa)², max |a| and max |Δa| of the record (recordStatistics' pass), or undefined where
 * WebAssembly does not run.
 */
export function wasmRecordSums(accelMS2: Float64Array): [number, number, number, number] | undefined {
  const exports = instance();
  if (exports === undefined) return undefined;
  const view = space(exports, accelMS2.length + 4);
  view.set(accelMS2);
  exports.recordSums(view.byteOffset, accelMS2.length, view.byteOffset + accelMS2.length * 8);
  const n = accelMS2.length;
  return [view[n], view[n + 1], view[n + 2], view[n + 3]];
}

/**
 * packCoefficients for pre-warped Newmark average acceleration of `count` oscillators described
 * by `inputs` (PLAN_INPUT values each), into `rows` (COEFFICIENT_STRIDE values each); false, with
 * nothing written, where WebAssembly does not run.
 */
export function wasmAverageRows(
  inputs: Float64Array,
  count: number,
  bounds: { pgaMS2: number; jerkMS3: number },
  rows: Float64Array,
): boolean {
  const exports = instance();
  if (exports === undefined) return false;
  const view = space(exports, count * (PLAN_INPUT + ROW));
  view.set(inputs.subarray(0, count * PLAN_INPUT));
  const out = view.byteOffset + count * PLAN_INPUT * 8;
  exports.averageRows(view.byteOffset, count, bounds.pgaMS2, bounds.jerkMS3, out);
  rows.set(view.subarray(count * PLAN_INPUT, count * (PLAN_INPUT + ROW)));
  return true;
}
