import { heapAreas, type KernelInputs, kernelInstance, kernelMemory } from './wasm.js';

/**
 * The thread's instance of the WebAssembly kernel holding a pair of components and the rotation
 * angles, for RotD (see oscillatorPeaks in spectrum/rotd.ts, whose twin is assembly/rotd.ts).
 */
export class WasmRotD implements KernelInputs {
  private readonly kernel = kernelInstance();
  private readonly inputs: { a1: Float64Array; a2: Float64Array; cos: Float64Array; sin: Float64Array };
  /** The angles as the kernel steps them, an even count: a padding angle has cos = sin = 0. */
  private readonly lanes: number;
  private readonly at;

  constructor(a1: Float64Array, a2: Float64Array, cos: Float64Array, sin: Float64Array) {
    this.inputs = { a1, a2, cos, sin };
    this.lanes = cos.length + (cos.length % 2);
    const lane = this.lanes * 8;
    this.at = heapAreas(this.kernel, {
      coefficients: 8 * 8,
      cos: lane,
      sin: lane,
      peaks: lane,
      thresholds: lane,
      a1: a1.length * 8,
      a2: a2.length * 8,
    });
  }

  load(view: Float64Array): void {
    const { a1, a2, cos, sin } = this.inputs;
    view.set(a1, this.at.a1 / 8);
    view.set(a2, this.at.a2 / 8);
    view.fill(0, this.at.cos / 8, this.at.cos / 8 + 2 * this.lanes);
    view.set(cos, this.at.cos / 8);
    view.set(sin, this.at.sin / 8);
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
    const view = kernelMemory(this.kernel, at.end, this);
    for (let i = 0; i < 8; i++) view[at.coefficients / 8 + i] = coefficients[i];
    // The peaks and, after them, the thresholds start at zero.
    view.fill(0, at.peaks / 8, at.peaks / 8 + 2 * this.lanes);
    this.kernel.exports.rotdPeaks(
      at.a1,
      at.a2,
      this.inputs.a1.length,
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
    out.set(view.subarray(at.peaks / 8, at.peaks / 8 + this.inputs.cos.length));
  }
}
