import { SWEEP_WASM_BASE64 } from './binary.js';

/**
 * A tiny module whose one function returns a v128 constant: it validates only where the engine
 * has WebAssembly 128-bit SIMD (the fixed-width SIMD proposal, WebAssembly 2.0 §4.3).
 */
const SIMD_PROBE: Uint8Array<ArrayBuffer> = new Uint8Array([
  0x00,
  0x61,
  0x73,
  0x6d,
  0x01,
  0x00,
  0x00,
  0x00, // magic, version
  0x01,
  0x05,
  0x01,
  0x60,
  0x00,
  0x01,
  0x7b, // type section: () → v128
  0x03,
  0x02,
  0x01,
  0x00, // function section
  0x0a,
  0x16,
  0x01,
  0x14,
  0x00,
  0xfd,
  0x0c, // code section: v128.const
  ...new Array(16).fill(0),
  0x0b,
]);

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

/** Oscillators per pass of the WebAssembly kernel (two f64x2 vectors; see assembly/sweep.ts). */
export const WASM_WIDTH = 4;
/** Coefficients, state values and peaks per oscillator (the layout of assembly/sweep.ts). */
const COEFFICIENTS = 14;
const STATES = 5;
const PEAKS = 3;
/** Values per oscillator in a checkpoint of pass 1 (see assembly/sweep.ts). */
const CHECKPOINT = 5;

interface SweepExports {
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

let compiled: WebAssembly.Module | undefined;

function sweepModule(): WebAssembly.Module {
  if (compiled === undefined) {
    // Buffer's decoder: a loop over atob's characters ran cold, then was compiled, in every thread.
    compiled = new WebAssembly.Module(Buffer.from(SWEEP_WASM_BASE64, 'base64'));
  }
  return compiled;
}

/**
 * The sweep's instance of the kernel in this thread, reused by every WasmSweeper: a new instance
 * per record would map and unmap a fresh linear memory each time, which in a pool of threads
 * costs every thread of the process (the mappings are the process's), and the memory would start
 * cold. Its memory grows to the largest sweep so far and stays.
 */
let sweepInstance: { exports: SweepExports; holder?: unknown } | undefined;

/** The thread's instance of the kernel, made on first use. */
function kernelInstance(): { exports: SweepExports; holder?: unknown } {
  sweepInstance ??= {
    exports: new WebAssembly.Instance(sweepModule(), {}).exports as unknown as SweepExports,
  };
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
 * The WebAssembly kernel with a record loaded into its memory. Groups of up to WASM_WIDTH
 * oscillators are stepped by `run`, which takes their coefficients packed as sweep.ts packs them
 * (COEFFICIENT_STRIDE per oscillator) and returns their peaks (PEAK_STRIDE per oscillator). All
 * sweepers of a thread share one instance; each loads its record again when another has used it
 * since.
 */
export class WasmSweeper {
  private readonly kernel: { exports: SweepExports; holder?: unknown };
  private readonly accelMS2: Float64Array;
  private readonly samples: number;
  private readonly chunkSteps: number;
  private readonly coefficients: number;
  private readonly state: number;
  private readonly peaks: number;
  private readonly buffer: number;
  private readonly record: number;
  /** Pass 1's checkpoints, at the end of the layout; memory grows when a group needs more. */
  private readonly checkpoints: number;
  private view: Float64Array;

  constructor(accelMS2: Float64Array, chunkSteps: number) {
    this.kernel = kernelInstance();
    this.accelMS2 = accelMS2;
    this.samples = accelMS2.length;
    this.chunkSteps = chunkSteps;
    const align = (bytes: number) => Math.ceil(bytes / 16) * 16;
    let next = this.kernel.exports.heapBase();
    const take = (bytes: number) => {
      const at = next;
      next += align(bytes);
      return at;
    };
    this.coefficients = take(WASM_WIDTH * COEFFICIENTS * 8);
    this.state = take(WASM_WIDTH * STATES * 8);
    this.peaks = take(WASM_WIDTH * PEAKS * 8);
    this.buffer = take((chunkSteps + 1) * 8);
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
   * Step `count` (≤ WASM_WIDTH) oscillators from rest over the record with `substeps` sub-steps of
   * `stepS` and checkpoints every `blockSteps` steps; `packed` holds their coefficients, one row of
   * COEFFICIENT_STRIDE after another, and their peaks are written to `out` at PEAK_STRIDE (3) per
   * oscillator.
   */
  run(
    packed: Float64Array,
    count: number,
    substeps: number,
    stepS: number,
    blockSteps: number,
    symmetric: boolean,
    out: Float64Array,
  ) {
    const blocks = Math.ceil(((this.samples - 1) * substeps) / blockSteps);
    const view = this.memory(blocks * WASM_WIDTH * CHECKPOINT * 8);
    const c = this.coefficients / 8;
    // Lanes side by side (oscillators 0 and 1 in the first vector, 2 and 3 in the second); a
    // short group repeats its last oscillator.
    for (let i = 0; i < WASM_WIDTH; i++) {
      const from = Math.min(i, count - 1) * COEFFICIENTS;
      const lane = c + (i >> 1) * COEFFICIENTS * 2 + (i & 1);
      for (let q = 0; q < COEFFICIENTS; q++) view[lane + 2 * q] = packed[from + q];
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
      this.chunkSteps,
      blockSteps,
      this.checkpoints,
      symmetric ? 1 : 0,
      // A group of one or two oscillators fills one vector: step that one only.
      count <= 2 ? 1 : 0,
    );
    const p = this.peaks / 8;
    for (let i = 0; i < count; i++) {
      const lane = p + (i >> 1) * PEAKS * 2 + (i & 1);
      for (let q = 0; q < PEAKS; q++) out[i * PEAKS + q] = view[lane + 2 * q];
    }
  }
}

/**
 * One instance of the WebAssembly kernel holding a pair of components and the rotation angles,
 * for RotD (see oscillatorPeaks in spectrum/rotd.ts, whose twin is assembly/rotd.ts).
 */
export class WasmRotD {
  private readonly kernel: { exports: SweepExports; holder?: unknown };
  private readonly exports: SweepExports;
  private readonly samples: number;
  private readonly angles: number;
  private readonly lanes: number;
  private readonly at: Record<'a1' | 'a2' | 'cos' | 'sin' | 'peaks' | 'thresholds' | 'coefficients', number>;
  private readonly inputs: { a1: Float64Array; a2: Float64Array; cos: Float64Array; sin: Float64Array };
  private view: Float64Array;

  constructor(a1: Float64Array, a2: Float64Array, cos: Float64Array, sin: Float64Array) {
    // The thread's one instance, as WasmSweeper's (see sweepInstance).
    this.kernel = kernelInstance();
    this.exports = this.kernel.exports;
    this.samples = a1.length;
    this.angles = cos.length;
    this.lanes = cos.length + (cos.length % 2); // an even count; a padding angle has cos = sin = 0
    this.inputs = { a1, a2, cos, sin };
    let next = this.exports.heapBase();
    const take = (values: number) => {
      const at = next;
      next += Math.ceil((values * 8) / 16) * 16;
      return at;
    };
    this.at = {
      coefficients: take(8),
      cos: take(this.lanes),
      sin: take(this.lanes),
      peaks: take(this.lanes),
      thresholds: take(this.lanes),
      a1: take(a1.length),
      a2: take(a2.length),
    };
    const memory = this.exports.memory;
    const pages = Math.ceil(next / 65536) - memory.buffer.byteLength / 65536;
    if (pages > 0) memory.grow(pages);
    this.view = this.load();
  }

  /** The memory as f64, holding this loop's components and angles (loaded again if another used it). */
  private load(): Float64Array {
    if (this.kernel.holder === this && this.view.buffer === this.exports.memory.buffer) return this.view;
    const view = new Float64Array(this.exports.memory.buffer);
    if (this.kernel.holder !== this) {
      const { a1, a2, cos, sin } = this.inputs;
      view.set(a1, this.at.a1 / 8);
      view.set(a2, this.at.a2 / 8);
      view.fill(0, this.at.cos / 8, this.at.cos / 8 + 2 * this.lanes);
      view.set(cos, this.at.cos / 8);
      view.set(sin, this.at.sin / 8);
      this.kernel.holder = this;
    }
    return view;
  }

  /** Peak |u(θ)| of one oscillator for every angle into `out` (length: the angle count). */
  run(
    coefficients: ArrayLike<number>,
    substeps: number,
    h: number,
    ratio: number,
    offset: number,
    out: Float64Array,
  ): void {
    const { at } = this;
    const view = this.load();
    this.view = view;
    for (let i = 0; i < 8; i++) view[at.coefficients / 8 + i] = coefficients[i];
    view.fill(0, at.peaks / 8, at.peaks / 8 + 2 * this.lanes);
    this.exports.rotdPeaks(
      at.a1,
      at.a2,
      this.samples,
      substeps,
      h,
      at.coefficients,
      at.cos,
      at.sin,
      this.lanes,
      at.peaks,
      at.thresholds,
      ratio,
      offset,
    );
    out.set(view.subarray(at.peaks / 8, at.peaks / 8 + this.angles));
  }
}
