import { CHECKPOINT_STRIDE, COEFFICIENT_STRIDE, GROUP_WIDTH, PEAK_STRIDE, STATE_STRIDE } from '../layout.js';
import { SWEEP_WASM_BASE64 } from './wasm-binary.js';

/**
 * A tiny module whose one function returns a v128 constant: it validates only where the engine
 * has WebAssembly 128-bit SIMD (the fixed-width SIMD proposal, WebAssembly 2.0 §4.3). Magic and
 * version; type section () → v128; function section; code section with v128.const 0.
 */
const SIMD_PROBE = Uint8Array.from(
  Buffer.from(
    `0061736d01000000 0105016000017b 03020100 0a160114 00fd0c${'00'.repeat(16)}0b`.replace(/ /g, ''),
    'hex',
  ),
);

let simdSupported: boolean | undefined;

/** Whether `validate` (WebAssembly.validate by default) accepts a SIMD module. */
export function detectWasmSimd(
  validate: (bytes: Uint8Array<ArrayBuffer>) => boolean = (bytes) =>
    typeof WebAssembly === 'object' && WebAssembly.validate(bytes),
): boolean {
  try {
    return validate(SIMD_PROBE);
  } catch {
    return false;
  }
}

/** Whether this engine runs WebAssembly SIMD (detected once). */
export function wasmSimdSupported(): boolean {
  simdSupported ??= detectWasmSimd();
  return simdSupported;
}

/** The exports of assembly/sweep.ts (with RotD's loop, assembly/rotd.ts). */
export interface KernelExports {
  memory: WebAssembly.Memory;
  heapBase(): number;
  runGroup(
    record: number,
    samples: number,
    substeps: number,
    stepS: number,
    coefficients: number,
    state: number,
    peaks: number,
    buffer: number,
    chunkSteps: number,
    blockSteps: number,
    checkpoints: number,
    symmetric: number,
    narrow: number,
  ): void;
  rotdPeaks(
    a1: number,
    a2: number,
    samples: number,
    substeps: number,
    h: number,
    coefficients: number,
    cos: number,
    sin: number,
    angles: number,
    peaks: number,
    thresholds: number,
    ratio: number,
    offset: number,
  ): void;
}

/**
 * The sweep's instance of the kernel in this thread, reused by every WasmSweeper: a new instance
 * per record would map and unmap a fresh linear memory each time, which in a pool of threads
 * costs every thread of the process (the mappings are the process's), and the memory would start
 * cold. Its memory grows to the largest sweep so far and stays.
 */
let sweepInstance: KernelInstance | undefined;

/** The thread's instance of the kernel and the sweeper or RotD loop whose inputs its memory holds. */
export interface KernelInstance {
  exports: KernelExports;
  holder?: unknown;
}

/** The thread's instance of the kernel, made (and its module compiled) on first use. */
export function kernelInstance(): KernelInstance {
  if (sweepInstance === undefined) {
    const module = new WebAssembly.Module(Buffer.from(SWEEP_WASM_BASE64, 'base64'));
    sweepInstance = { exports: new WebAssembly.Instance(module, {}).exports as unknown as KernelExports };
  }
  return sweepInstance;
}

/**
 * Make this thread's instance of the kernel now, where the engine has WebAssembly SIMD: a worker
 * thread does it while it waits for its first job, so that the job starts without it.
 */
export function prepareWasmKernel(): void {
  if (wasmSimdSupported()) kernelInstance();
}

/**
 * The WebAssembly kernel with a record loaded into its memory. Groups of up to GROUP_WIDTH
 * oscillators are stepped by `run`, which takes their coefficients packed as plan.ts packs them
 * (COEFFICIENT_STRIDE per oscillator) and returns their peaks (PEAK_STRIDE per oscillator). All
 * sweepers of a thread share one instance; each loads its record again when another has used it
 * since.
 */
export class WasmSweeper {
  private readonly kernel: KernelInstance;
  private readonly accelMS2: Float64Array;
  private readonly samples: number;
  private readonly coefficients: number;
  private readonly state: number;
  private readonly peaks: number;
  private readonly buffer: number;
  private readonly record: number;
  /** Pass 1's checkpoints, at the end of the layout; memory grows when a group needs more. */
  private readonly checkpoints: number;
  private view: Float64Array;

  constructor(accelMS2: Float64Array) {
    this.kernel = kernelInstance();
    this.accelMS2 = accelMS2;
    this.samples = accelMS2.length;
    const align = (bytes: number) => Math.ceil(bytes / 16) * 16;
    let next = this.kernel.exports.heapBase();
    const take = (bytes: number) => {
      const at = next;
      next += align(bytes);
      return at;
    };
    this.coefficients = take(GROUP_WIDTH * COEFFICIENT_STRIDE * 8);
    this.state = take(GROUP_WIDTH * STATE_STRIDE * 8);
    this.peaks = take(GROUP_WIDTH * PEAK_STRIDE * 8);
    this.buffer = take((STRETCH_STEPS + 1) * 8);
    // 16 bytes past the record: the interpolation may read (and discard) one value beyond it.
    this.record = take(accelMS2.length * 8 + 16);
    this.checkpoints = next;
    this.view = new Float64Array(this.kernel.exports.memory.buffer);
  }

  /** The memory as f64, grown to hold `bytes` of checkpoints and holding this sweeper's record. */
  private memory(bytes: number): Float64Array {
    const memory = this.kernel.exports.memory;
    const pages = Math.ceil((this.checkpoints + bytes) / 65536) - memory.buffer.byteLength / 65536;
    if (pages > 0) memory.grow(pages);
    // One view while the memory stays as it is (growing it replaces its buffer).
    if (this.view.buffer !== memory.buffer) this.view = new Float64Array(memory.buffer);
    if (this.kernel.holder !== this) {
      this.view.set(this.accelMS2, this.record / 8);
      this.view.fill(0, (this.record + this.samples * 8) / 8, (this.record + this.samples * 8 + 16) / 8);
      this.kernel.holder = this;
    }
    return this.view;
  }

  /**
   * Step `count` (≤ GROUP_WIDTH) oscillators from rest over the record with `substeps` sub-steps of
   * `stepS`; `packed` holds their coefficients, one row of COEFFICIENT_STRIDE after another, and
   * their peaks are written to `out` at PEAK_STRIDE per oscillator. `symmetric` says that their
   * forcing coefficients are equal (up0 = up1, vp0 = vp1; see assembly/sweep.ts).
   */
  run(
    packed: Float64Array,
    count: number,
    substeps: number,
    stepS: number,
    symmetric: boolean,
    out: Float64Array,
  ) {
    const blockSteps = checkpointBlockSteps((this.samples - 1) * substeps);
    const blocks = Math.ceil(((this.samples - 1) * substeps) / blockSteps);
    const view = this.memory(blocks * GROUP_WIDTH * CHECKPOINT_STRIDE * 8);
    const c = this.coefficients / 8;
    // Lanes side by side (oscillators 0 and 1 in the first vector, 2 and 3 in the second); a
    // short group repeats its last oscillator.
    for (let i = 0; i < GROUP_WIDTH; i++) {
      const from = Math.min(i, count - 1) * COEFFICIENT_STRIDE;
      const lane = c + (i >> 1) * COEFFICIENT_STRIDE * 2 + (i & 1);
      for (let q = 0; q < COEFFICIENT_STRIDE; q++) view[lane + 2 * q] = packed[from + q];
    }
    this.kernel.exports.runGroup(
      this.record,
      this.samples,
      substeps,
      stepS,
      this.coefficients,
      this.state,
      this.peaks,
      this.buffer,
      STRETCH_STEPS,
      blockSteps,
      this.checkpoints,
      symmetric ? 1 : 0,
      // A group of one or two oscillators fills one vector: step that one only.
      count <= 2 ? 1 : 0,
    );
    const p = this.peaks / 8;
    for (let i = 0; i < count; i++) {
      const lane = p + (i >> 1) * PEAK_STRIDE * 2 + (i & 1);
      for (let q = 0; q < PEAK_STRIDE; q++) out[i * PEAK_STRIDE + q] = view[lane + 2 * q];
    }
  }
}

/** Steps of pass 1 per call: the interpolated input of a sub-stepped group is built this many at a time. */
export const STRETCH_STEPS = 8192;

/** Checkpoint blocks a group's pass 1 keeps at most, unless its blocks would outgrow a stretch. */
const MAX_BLOCKS = 16384;

/**
 * Steps per checkpoint block for a group that takes `totalSteps` steps: a power of two from 64 (a
 * block's checkpoint costs a few stores; pass 2 steps whole blocks again) up to STRETCH_STEPS,
 * doubled while the blocks would be more than MAX_BLOCKS, so that their memory stays bounded.
 */
export function checkpointBlockSteps(totalSteps: number): number {
  let blockSteps = 64;
  while (blockSteps < STRETCH_STEPS && Math.ceil(totalSteps / blockSteps) > MAX_BLOCKS) blockSteps *= 2;
  return blockSteps;
}
