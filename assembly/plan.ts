// The sweep plan's arithmetic in WebAssembly: the twin of recordStatistics' pass over the record
// and of packCoefficients for pre-warped Newmark average acceleration (src/oscillator/sweep.ts and
// recurrence.ts: prewarpedOscillator, newmarkCoefficients, composeSteps, refinementThresholds),
// the same operations in the same order. In a fresh process the TypeScript took about 2 ms for
// the pass over a 40,000-sample record and 4–8 ms for 1,000 oscillators' coefficients, before the
// engine had optimized it; this runs at full speed from the first call. Math.exp, Math.cos and
// Math.cosh are the engine's own (imported), so the numbers are those of the TypeScript, bit for
// bit; the test compares them. Written by hand; compiled by scripts/build-wasm.mjs (no SIMD).

// Imported as plan.exp, plan.cos and plan.cosh (AssemblyScript names a declared function's import
// after its file): the caller hands in Math.exp, Math.cos and Math.cosh.
declare function exp(x: f64): f64;
declare function cos(x: f64): f64;
declare function cosh(x: f64): f64;

/** Values per oscillator in the rows (COEFFICIENT_STRIDE in kernel.ts). */
const STRIDE: usize = 14;
/** Values per oscillator in the input: period (s), damping ratio, step (s), sub-steps composed. */
const INPUT: usize = 4;

/** First free byte of linear memory: the caller lays out its arrays from here. */
export function heapBase(): usize {
  return (__heap_base + 15) & ~15;
}

/**
 * recordStatistics' sums over the `n` samples at `record`: Σa², Σ(Δa)², max |a| and max |Δa|,
 * written to `out` in that order.
 */
export function recordSums(record: usize, n: i32, out: usize): void {
  let previous = load<f64>(record);
  let sum = previous * previous;
  let sumDifferences: f64 = 0;
  let peak = Math.abs(previous);
  let jump: f64 = 0;
  for (let i = 1; i < n; i++) {
    const a = load<f64>(record + ((<usize>i) << 3));
    const difference = a - previous;
    sum += a * a;
    sumDifferences += difference * difference;
    peak = Math.max(peak, Math.abs(a));
    jump = Math.max(jump, Math.abs(difference));
    previous = a;
  }
  store<f64>(out, sum);
  store<f64>(out, sumDifferences, 8);
  store<f64>(out, peak, 16);
  store<f64>(out, jump, 24);
}

// One step of Newmark average acceleration at the pre-warped frequency and damping, as
// StepCoefficients (uu, uv, up0, up1, vu, vv, vp0, vp1).
let uu: f64 = 0;
let uv: f64 = 0;
let up0: f64 = 0;
let up1: f64 = 0;
let vu: f64 = 0;
let vv: f64 = 0;
let vp0: f64 = 0;
let vp1: f64 = 0;
// newmarkCoefficients' step of one unit vector: its (u1, v1).
let u1: f64 = 0;
let v1: f64 = 0;

/** newmarkCoefficients' `step` with γ = 1/2, β = 1/4. */
function newmarkStep(u: f64, v: f64, p0: f64, p1: f64, c: f64, k: f64, h: f64, denominator: f64): void {
  const gamma: f64 = 0.5;
  const beta: f64 = 0.25;
  const a0 = -p0 - c * v - k * u;
  const a1 =
    (-p1 - k * u - (c + k * h) * v - (c * h * (1 - gamma) + k * h * h * (0.5 - beta)) * a0) / denominator;
  u1 = u + h * v + h * h * ((0.5 - beta) * a0 + beta * a1);
  v1 = v + h * ((1 - gamma) * a0 + gamma * a1);
}

/** prewarpedOscillator('newmark-average', …) then newmarkCoefficients: the step's coefficients. */
function averageStep(omegaRadS: f64, damping: f64, stepS: f64): void {
  const h = stepS;
  const decay = exp(-damping * omegaRadS * h);
  const dampedSquared = omegaRadS * omegaRadS * (1 - damping * damping);
  const turn = dampedSquared >= 0 ? cos(Math.sqrt(dampedSquared) * h) : cosh(Math.sqrt(-dampedSquared) * h);
  const trace = 2 * decay * turn;
  const determinant = decay * decay;
  const denominator0 = 1 + trace + determinant;
  const omegaSquared = (4 / (h * h)) * ((1 - trace + determinant) / denominator0);
  const omega = Math.sqrt(omegaSquared);
  const zeta = ((4 / h) * ((1 - determinant) / denominator0)) / (2 * omega);
  // newmarkCoefficients(omega, zeta, h, 0.5, 0.25)
  const c = 2 * zeta * omega;
  const k = omega * omega;
  const denominator = 1 + c * 0.5 * h + k * 0.25 * h * h;
  newmarkStep(1, 0, 0, 0, c, k, h, denominator);
  uu = u1;
  vu = v1;
  newmarkStep(0, 1, 0, 0, c, k, h, denominator);
  uv = u1;
  vv = v1;
  newmarkStep(0, 0, 1, 0, c, k, h, denominator);
  up0 = u1;
  vp0 = v1;
  newmarkStep(0, 0, 0, 1, c, k, h, denominator);
  up1 = u1;
  vp1 = v1;
}

/** composeSteps' `run` of one unit vector through `count` steps: its (u1, v1). */
function composedRun(u0: f64, v0: f64, p0: f64, p1: f64, count: i32): void {
  let u = u0;
  let v = v0;
  const n = <f64>count;
  for (let j = 0; j < count; j++) {
    const pa = p0 + ((p1 - p0) * <f64>j) / n;
    const pb = p0 + ((p1 - p0) * <f64>(j + 1)) / n;
    const un = uu * u + uv * v + up0 * pa + up1 * pb;
    v = vu * u + vv * v + vp0 * pa + vp1 * pb;
    u = un;
  }
  u1 = u;
  v1 = v;
}

/** composeSteps of the current step, `count` times over. */
function compose(count: i32): void {
  if (count === 1) return;
  composedRun(1, 0, 0, 0, count);
  const cuu = u1;
  const cvu = v1;
  composedRun(0, 1, 0, 0, count);
  const cuv = u1;
  const cvv = v1;
  composedRun(0, 0, 1, 0, count);
  const cup0 = u1;
  const cvp0 = v1;
  composedRun(0, 0, 0, 1, count);
  uu = cuu;
  uv = cuv;
  up0 = cup0;
  up1 = u1;
  vu = cvu;
  vv = cvv;
  vp0 = cvp0;
  vp1 = v1;
}

/**
 * packCoefficients of `count` oscillators with pre-warped Newmark average acceleration: `inputs`
 * holds INPUT values per oscillator (period s, damping ratio, executed step s, sub-steps composed
 * into it), `rows` receives STRIDE values per oscillator; PGA and peak jerk are the record's bounds.
 */
export function averageRows(inputs: usize, count: i32, pgaMS2: f64, jerkMS3: f64, rows: usize): void {
  for (let i = 0; i < count; i++) {
    const input = inputs + ((<usize>i * INPUT) << 3);
    const periodS = load<f64>(input);
    const damping = load<f64>(input, 8);
    const stepS = load<f64>(input, 16);
    const composed = <i32>load<f64>(input, 24);
    const omega = (2 * Math.PI) / periodS;
    averageStep(omega, damping, stepS / <f64>composed);
    compose(composed);
    const row = rows + ((<usize>i * STRIDE) << 3);
    store<f64>(row, uu);
    store<f64>(row, uv, 8);
    store<f64>(row, up0, 16);
    store<f64>(row, up1, 24);
    store<f64>(row, vu, 32);
    store<f64>(row, vv, 40);
    store<f64>(row, vp0, 48);
    store<f64>(row, vp1, 56);
    const cRadS = 2 * damping * omega;
    store<f64>(row, cRadS, 64);
    store<f64>(row, omega * omega, 72);
    // refinementThresholds(omega, cRadS, stepS, bounds)
    const half = 0.5 * 1.1 * stepS * stepS;
    store<f64>(row, 1 - half * omega * omega, 80);
    store<f64>(row, half * pgaMS2, 88);
    store<f64>(row, half * jerkMS3, 96);
    store<f64>(row, half * (cRadS * jerkMS3 + omega * omega * pgaMS2), 104);
  }
}
