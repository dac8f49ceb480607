// The loops of the SIMD sweep kernel as AssemblyScript templates, for
// scripts/generate-wasm-kernel.mjs (see there): pass 1 (scan), pass 2 (refine) and the scalar
// Hermite refinement, with the memory layout of src/oscillator/layout.ts.
import {
  CHECKPOINT_MAXIMA,
  CHECKPOINT_STRIDE,
  COEFFICIENT,
  COEFFICIENT_STRIDE,
  GROUP_WIDTH,
  PEAK_STRIDE,
  STATE_STRIDE,
} from '../dist/oscillator/layout.js';

/** Vectors per pass, two oscillators each. */
export const VECTORS = GROUP_WIDTH / 2;
/** Bytes per vector of a checkpoint, of the peaks (and thresholds), and of the state's u and v. */
export const CHECKPOINT_BYTES = CHECKPOINT_STRIDE * 16;
export const PEAK_BYTES = PEAK_STRIDE * 16;
export const STATE_BYTES = (STATE_STRIDE - PEAK_STRIDE) * 16;
/** Byte offset of quantity q (0: |u|, 1: |v|, 2: |s|) among a checkpoint's maxima. */
export const maximum = (q) => (CHECKPOINT_MAXIMA + q) * 16;
const each = (fn, join = '\n', count = VECTORS) => Array.from({ length: count }, (_, j) => fn(j)).join(join);
const names = ['uu', 'uv', 'up0', 'up1', 'vu', 'vv', 'vp0', 'vp1', 'c', 'k'];
const coefficient = (j, name) => (j * COEFFICIENT_STRIDE + COEFFICIENT[name]) * 16;
// Coefficients held in locals: all ten, or for a symmetric recurrence (up0 = up1, vp0 = vp1)
// the eight that remain.
const hotNames = (symmetric) => (symmetric ? names.filter((n) => n !== 'up0' && n !== 'vp0') : names);
const loadCoefficients = (symmetric, vectors) =>
  each(
    (j) =>
      hotNames(symmetric)
        .map((n) => `  const ${n}${j} = v128.load(coefficients, ${coefficient(j, n)});`)
        .join('\n'),
    '\n',
    vectors,
  );

// The general update keeps the TypeScript kernel's order of operations, ((a + b) + c) + d, so the
// two kernels give the same bits; the symmetric one adds its single forcing term last.
const update = (symmetric, q, j) => {
  const free = `f64x2.add(f64x2.mul(${q}u${j}, uo${j}), f64x2.mul(${q}v${j}, vo${j}))`;
  return symmetric
    ? `f64x2.add(${free}, f64x2.mul(${q}p1${j}, sum))`
    : `f64x2.add(f64x2.add(${free}, f64x2.mul(${q}p0${j}, pa)), f64x2.mul(${q}p1${j}, pb))`;
};
// One step of vector j: the new state, and cs = c·v + k·u, whose magnitude is |s| (s = −cs is the
// absolute acceleration; its sign is only needed when refining).
const advance = (symmetric, j) => `      const uo${j} = u${j};
      const vo${j} = v${j};
      u${j} = ${update(symmetric, 'u', j)};
      v${j} = ${update(symmetric, 'v', j)};
      const cs${j} = f64x2.add(f64x2.mul(c${j}, v${j}), f64x2.mul(k${j}, u${j}));`;
// The input of step n: p at its start (pas) and end (pbs), as splats or their sum.
const input = (symmetric, n) => `      const pbs = load<f64>(input + (<usize>(${n}) << 3));
      ${symmetric ? 'const sum = f64x2.splat(pas + pbs);' : 'const pa = f64x2.splat(pas);\n      const pb = f64x2.splat(pbs);'}`;

// Pass 1, one step of every vector: advance and fold |u|, |v|, |s| into the block's maxima. pmax
// is one instruction (max, unlike f64x2.max, need not order NaNs and zeros: the values are finite
// magnitudes), and the magnitude is an and with the mask held in a local.
const scanStep = (symmetric, vectors, n) => `    {
${input(symmetric, n)}
${each(
  (j) => `${advance(symmetric, j)}
      mu${j} = f64x2.pmax(mu${j}, v128.and(u${j}, magnitude));
      mv${j} = f64x2.pmax(mv${j}, v128.and(v${j}, magnitude));
      ms${j} = f64x2.pmax(ms${j}, v128.and(cs${j}, magnitude));`,
  '\n',
  vectors,
)}
      pas = pbs;
    }`;

export const scan = (name, symmetric, vectors) => `/**
 * Pass 1 for ${vectors * 2} oscillators: step them over \`steps\` steps through the inputs input[0..steps]
 * (f64 at byte address \`input\`), continuing from the state at \`state\` (u, v per vector), and for
 * each block of \`blockSteps\` steps write its checkpoint (u and v at its start, the largest |u|,
 * |v| and |s| at its steps) to \`checkpoints\`, one block after another.${
   symmetric
     ? `
 * For recurrences whose two forcing coefficients are equal (up0 = up1 and vp0 = vp1, as for Newmark
 * average acceleration, where both are −βh²/D and −γh/D in exact arithmetic): the forcing is
 * up1·(p_n + p_{n+1}), two multiplications and two additions fewer per oscillator-step.`
     : ''
 }
 */
function ${name}(input: usize, steps: i32, blockSteps: i32, coefficients: usize, state: usize, checkpoints: usize): void {
${loadCoefficients(symmetric, vectors)}
  const magnitude = v128.load(MAGNITUDE);
${each((j) => `  let u${j} = v128.load(state, ${j * STATE_BYTES});\n  let v${j} = v128.load(state, ${j * STATE_BYTES + 16});`, '\n', vectors)}
  let pas = load<f64>(input);
  let out = checkpoints;
  for (let first = 0; first < steps; first += blockSteps) {
${each(
  (j) => `    v128.store(out, u${j}, ${j * CHECKPOINT_BYTES});
    v128.store(out, v${j}, ${j * CHECKPOINT_BYTES + 16});
    let mu${j} = f64x2.splat(0);
    let mv${j} = f64x2.splat(0);
    let ms${j} = f64x2.splat(0);`,
  '\n',
  vectors,
)}
    const last = min(first + blockSteps, steps);
    let n = first + 1;
    for (; n < last; n += 2) {
${scanStep(symmetric, vectors, 'n')}
${scanStep(symmetric, vectors, 'n + 1')}
    }
    if (n === last) {
${scanStep(symmetric, vectors, 'n')}
    }
${each(
  (j) => `    v128.store(out, mu${j}, ${j * CHECKPOINT_BYTES + maximum(0)});
    v128.store(out, mv${j}, ${j * CHECKPOINT_BYTES + maximum(1)});
    v128.store(out, ms${j}, ${j * CHECKPOINT_BYTES + maximum(2)});`,
  '\n',
  vectors,
)}
    out += ${vectors * CHECKPOINT_BYTES};
  }
${each((j) => `  v128.store(state, u${j}, ${j * STATE_BYTES});\n  v128.store(state, v${j}, ${j * STATE_BYTES + 16});`, '\n', vectors)}
}`;

// Pass 2, per quantity (u, v, s) of the one vector: on a step whose new end passes the threshold,
// only lanes whose cubic Hermite H may turn inside the step go on to the scalar refinement
// (hermiteLane). H' is the quadratic f(t) = m0(1 − t) + m1·t − ca·t(1 − t) (ca as in the Hermite
// below), so with m0 and m1 of one sign f ≥ min(|m0|, |m1|) − |ca|/4 and a root in (0, 1) needs
// m0·m1 ≤ 0 or |ca| ≥ 4·min(|m0|, |m1|); the test takes 3.5 for rounding to spare, so it is a
// superset of the steps where the scalar refinement changes anything.
const quantities = [
  { q0: 'uo0', q1: 'u0', d0: 'vo0', d1: 'v0', slot: 0, hit: 'hitU', needs: '' },
  { q0: 'vo0', q1: 'v0', d0: 'ar0', d1: 'ar1', slot: 1, hit: 'hitV', needs: 'accelerations' },
  { q0: 'so', q1: 'sn', d0: 'js0', d1: 'js1', slot: 2, hit: 'hitS', needs: 'jerks' },
];
// The absolute acceleration s = −(c v + k u) and the relative one (s − p) at both ends of the step.
const accelerations = `
            const so = f64x2.neg(f64x2.add(f64x2.mul(c0, vo0), f64x2.mul(k0, uo0)));
            const sn = f64x2.neg(cs0);
            const ar0 = f64x2.sub(so, f64x2.splat(pas));
            const ar1 = f64x2.sub(sn, f64x2.splat(pbs));`;
// ds/dt = −c·(s − p) − k·v at both ends.
const jerks = `${accelerations}
            const js0 = f64x2.sub(f64x2.mul(f64x2.neg(c0), ar0), f64x2.mul(k0, vo0));
            const js1 = f64x2.sub(f64x2.mul(f64x2.neg(c0), ar1), f64x2.mul(k0, v0));`;
const lane = (q, l) => `              if (need & ${1 << l}) {
                hermiteLane(
                  f64x2.extract_lane(${q.q0}, ${l}),
                  f64x2.extract_lane(${q.q1}, ${l}),
                  f64x2.extract_lane(${q.d0}, ${l}),
                  f64x2.extract_lane(${q.d1}, ${l}),
                  h,
                  peaks + ${(q.slot * 2 + l) * 8},
                );
              }`;

export const refine = (name, symmetric) => `/**
 * Pass 2 for the two oscillators of one vector: step them over \`steps\` steps from the state at
 * \`start\` (u, v: a block's checkpoint) and fold the Hermite peaks of the steps whose new end passes
 * the thresholds at \`thresholds\` (|u|, |v|, |s|) into \`peaks\`. The step is pass 1's, so the
 * states are the same bits.
 */
function ${name}(input: usize, steps: i32, h: f64, coefficients: usize, start: usize, thresholds: usize, peaks: usize): void {
${loadCoefficients(symmetric, 1)}
  const magnitude = v128.load(MAGNITUDE);
  let u0 = v128.load(start, 0);
  let v0 = v128.load(start, 16);
  const tu = v128.load(thresholds, 0);
  const tv = v128.load(thresholds, 16);
  const ts = v128.load(thresholds, 32);
  const hv = f64x2.splat(h);
  const zero = f64x2.splat(0);
  const three = f64x2.splat(3);
  const six = f64x2.splat(6);
  const bend = f64x2.splat(3.5);
  let pas = load<f64>(input);
  for (let n = 1; n <= steps; n++) {
${input(symmetric, 'n')}
${advance(symmetric, 0)}
    const hitU = f64x2.gt(v128.and(u0, magnitude), tu);
    const hitV = f64x2.gt(v128.and(v0, magnitude), tv);
    const hitS = f64x2.gt(v128.and(cs0, magnitude), ts);
    if (v128.any_true(v128.or(v128.or(hitU, hitV), hitS))) {
${quantities
  .map(
    (
      q,
    ) => `      if (v128.any_true(${q.hit})) {${q.needs === 'accelerations' ? accelerations : q.needs === 'jerks' ? jerks : ''}
            const m0 = f64x2.mul(${q.d0}, hv);
            const m1 = f64x2.mul(${q.d1}, hv);
            const ca = f64x2.add(
              f64x2.mul(six, f64x2.sub(${q.q0}, ${q.q1})),
              f64x2.mul(three, f64x2.add(m0, m1)),
            );
            const turns = v128.or(
              f64x2.le(f64x2.mul(m0, m1), zero),
              f64x2.ge(f64x2.abs(ca), f64x2.mul(bend, f64x2.min(f64x2.abs(m0), f64x2.abs(m1)))),
            );
            const need = i64x2.bitmask(v128.and(${q.hit}, turns));
            if (need !== 0) {
${lane(q, 0)}
${lane(q, 1)}
            }
      }`,
  )
  .join('\n')}
    }
    pas = pbs;
  }
}`;

export const hermite = (target, q0, q1, d0, d1) => `{
    const m0 = (${d0}) * h;
    const m1 = (${d1}) * h;
    const qa = ${q0};
    const qb = ${q1};
    const ca = 6 * qa + 3 * m0 - 6 * qb + 3 * m1;
    const cb = -6 * qa - 4 * m0 + 6 * qb - 2 * m1;
    // H'(t) = ca t² + cb t + m0 with H'(0) = m0 and H'(1) = m1. Where m0 and m1 have the same
    // sign, H' has a root in (0, 1) only if its vertex −cb/(2ca) lies there and it bends back
    // towards zero (ca·m0 > 0); otherwise the roots the formula below would find are outside
    // (0, 1) (or at its ends, where H is the end value already counted), and the square root
    // and divisions are skipped. Exact in real arithmetic; the kernels agree to rounding.
    if (!(m0 * m1 > 0) || (ca * m0 > 0 && ca * cb < 0 && Math.abs(cb) < 2 * Math.abs(ca))) {
    if (Math.abs(ca) > 1e-9 * (Math.abs(cb) + Math.abs(m0))) {
      const disc = cb * cb - 4 * ca * m0;
      if (disc >= 0) {
        const root = Math.sqrt(disc);
        const qq = -0.5 * (cb + (cb >= 0 ? root : -root));
        const ta = qq / ca;
        const tb = qq !== 0 ? m0 / qq : -1;
        ${target} = hermiteAt(${target}, qa, qb, m0, m1, ta);
        ${target} = hermiteAt(${target}, qa, qb, m0, m1, tb);
      }
    } else if (cb !== 0) {
      ${target} = hermiteAt(${target}, qa, qb, m0, m1, -m0 / cb);
    }
    }
  }`;
