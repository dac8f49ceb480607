import { CHECKPOINT_STRIDE, COEFFICIENT_STRIDE, GROUP_WIDTH, PEAK_STRIDE, STATE_STRIDE } from '../layout.js';
import { SWEEP_WASM_BASE64 } from './wasm-binary.js';

/**
 * A tiny module whose one function returns a v128 constant: it validates only where the engine
 * has WebAssembly 128-bit SIMD (the fixed-width SIMD proposal, WebAssembly 2.0 §4.3). Magic and
 * version; type section () → v128; function section; code section with v128.const 0.
 */
const SIMD_PROBE = Buffer.from(
  `0061736d01000000 0105016000017b 03020100 0a160114 00fd0c${'00'.repeat(16)}0b`.replace(/ /g, ''),
  'hex',
);

let simdSupported: boolean | undefined;

/** Whether this engine runs WebAssembly SIMD (detected once, by validating SIMD_PROBE). */
export function wasmSimdSupported(): boolean {
  simdSupported ??= typeof WebAssembly === 'object' && WebAssembly.validate(SIMD_PROBE);
  return simdSupported;
}

/** The exports of assembly/sweep.ts (runGroup) and assembly/rotd.ts (rotdPeaks), documented there. */
interface KernelExports {
  memory: WebAssembly.Memory;
  heapBase(): number;
  runGroup(...parameters: number[]): void;
  rotdPeaks(...parameters: number[]): void;
}

/**
 * The thread's one instance of the kernel, shared by every WasmSweeper and WasmRotD (an instance
 * per record would map a fresh, cold memory each time, at a cost to every thread of the process).
 * `holder`: whose inputs it holds.
 */
export interface KernelInstance {
  exports: KernelExports;
  view: Float64Array;
  holder?: KernelInputs;
}

/** A user of the kernel, which loads its inputs (a record, or two components and angles) into its memory. */
export interface KernelInputs {
  load(view: Float64Array): void;
}

let instance: KernelInstance | undefined;

/** The thread's instance of the kernel, made (and its module compiled) on first use. */
export function kernelInstance(): KernelInstance {
  if (instance === undefined) {
    const module = new WebAssembly.Module(Buffer.from(SWEEP_WASM_BASE64, 'base64'));
    const exports = new WebAssembly.Instance(module, {}).exports as unknown as KernelExports;
    instance = { exports, view: new Float64Array(exports.memory.buffer) };
  }
  return instance;
}

/** Make this thread's instance of the kernel now where SIMD runs (a worker awaiting its first job). */
export function prepareWasmKernel(): void {
  if (wasmSimdSupported()) kernelInstance();
}

/** Byte offsets of areas of the given sizes, 16-byte aligned, from the kernel's heap base, and their end. */
export function heapAreas<Area extends string>(
  kernel: KernelInstance,
  bytes: Record<Area, number>,
): Record<Area | 'end', number> {
  const at = { end: kernel.exports.heapBase() } as Record<Area | 'end', number>;
  for (const area of Object.keys(bytes) as Area[]) {
    at[area] = at.end;
    at.end += Math.ceil(bytes[area] / 16) * 16;
  }
  return at;
}

/** The kernel's memory as f64, grown to at least `bytes`, holding the inputs of `holder`. */
export function kernelMemory(kernel: KernelInstance, bytes: number, holder: KernelInputs): Float64Array {
  const memory = kernel.exports.memory;
  const pages = Math.ceil(bytes / 65536) - memory.buffer.byteLength / 65536;
  if (pages > 0) memory.grow(pages);
  // One view while the memory stays as it is (growing it replaces its buffer).
  if (kernel.view.buffer !== memory.buffer) kernel.view = new Float64Array(memory.buffer);
  if (kernel.holder !== holder) {
    holder.load(kernel.view);
    kernel.holder = holder;
  }
  return kernel.view;
}

/** The WebAssembly kernel with a record loaded into its memory, stepping groups of up to GROUP_WIDTH. */
export class WasmSweeper implements KernelInputs {
  private readonly kernel = kernelInstance();
  /** The areas of the layout; pass 1's checkpoints follow them. */
  private readonly at;

  constructor(private readonly accelMS2: Float64Array) {
    this.at = heapAreas(this.kernel, {
      coefficients: GROUP_WIDTH * COEFFICIENT_STRIDE * 8,
      state: GROUP_WIDTH * STATE_STRIDE * 8,
      peaks: GROUP_WIDTH * PEAK_STRIDE * 8,
      buffer: (STRETCH_STEPS + 1) * 8,
      // 16 bytes past the record: the interpolation may read (and discard) one value beyond it.
      record: accelMS2.length * 8 + 16,
    });
  }

  load(view: Float64Array): void {
    const end = this.at.record / 8 + this.accelMS2.length;
    view.set(this.accelMS2, this.at.record / 8);
    view.fill(0, end, end + 2);
  }

  /**
   * Step `count` oscillators from rest with `substeps` sub-steps of `stepS`; `packed` holds their
   * rows of coefficients (plan.ts), `out` gets their peaks (PEAK_STRIDE each). `symmetric`: their
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
    const samples = this.accelMS2.length;
    const blockSteps = checkpointBlockSteps((samples - 1) * substeps);
    const blocks = Math.ceil(((samples - 1) * substeps) / blockSteps);
    const { at } = this;
    const view = kernelMemory(this.kernel, at.end + blocks * GROUP_WIDTH * CHECKPOINT_STRIDE * 8, this);
    const c = at.coefficients / 8;
    // Lanes interleaved (0 and 1 in the first vector, 2 and 3 in the second); a short group repeats its last.
    for (let i = 0; i < GROUP_WIDTH; i++) {
      const from = Math.min(i, count - 1) * COEFFICIENT_STRIDE;
      const lane = c + (i >> 1) * COEFFICIENT_STRIDE * 2 + (i & 1);
      for (let q = 0; q < COEFFICIENT_STRIDE; q++) view[lane + 2 * q] = packed[from + q];
    }
    this.kernel.exports.runGroup(
      at.record,
      samples,
      substeps,
      stepS,
      at.coefficients,
      at.state,
      at.peaks,
      at.buffer,
      STRETCH_STEPS,
      blockSteps,
      at.end,
      symmetric ? 1 : 0,
      // A group of one or two oscillators fills one vector: step that one only.
      count <= 2 ? 1 : 0,
    );
    const p = at.peaks / 8;
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
 * Steps per checkpoint block for a group of `totalSteps` steps: a power of two from 64 (a block's
 * checkpoint costs a few stores; pass 2 steps whole blocks again) up to STRETCH_STEPS, doubled
 * while the blocks would outnumber MAX_BLOCKS.
 */
export function checkpointBlockSteps(totalSteps: number): number {
  let blockSteps = 64;
  while (blockSteps < STRETCH_STEPS && Math.ceil(totalSteps / blockSteps) > MAX_BLOCKS) blockSteps *= 2;
  return blockSteps;
}
