import { type KernelExports, type KernelInstance, kernelInstance } from './wasm.js';

/**
 * One instance of the WebAssembly kernel holding a pair of components and the rotation angles,
 * for RotD (see oscillatorPeaks in spectrum/rotd.ts, whose twin is assembly/rotd.ts).
 */
export class WasmRotD {
  private readonly kernel: KernelInstance;
  private readonly exports: KernelExports;
  private readonly samples: number;
  private readonly angles: number;
  private readonly lanes: number;
  private readonly at: Record<'a1' | 'a2' | 'cos' | 'sin' | 'peaks' | 'thresholds' | 'coefficients', number>;
  private readonly inputs: { a1: Float64Array; a2: Float64Array; cos: Float64Array; sin: Float64Array };
  private view: Float64Array;

  constructor(a1: Float64Array, a2: Float64Array, cos: Float64Array, sin: Float64Array) {
    // The thread's one instance, as WasmSweeper's (see sweepInstance in wasm.ts).
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
