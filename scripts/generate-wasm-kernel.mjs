// Writes assembly/sweep.ts: the SIMD sweep kernel in AssemblyScript, the WebAssembly twin of
// src/oscillator/kernel.ts (same recurrence, same operation order, same threshold test and
// Hermite refinement). Four oscillators are stepped per pass as two f64x2 vectors whose
// coefficients and states live in locals. Four rather than eight: with eight, a step somewhere
// in the pass needs refinement most of the time (each lane does on about a fifth of its steps),
// and sub-step counts shared by few oscillators leave more lanes idle; four measured faster.
// Run `npm run generate` after editing this template; the output is committed and reviewed like
// any other source file, and compiled by scripts/build-wasm.mjs at build time.
import { writeFileSync } from 'node:fs';

// Vectors per pass (two oscillators each); VECTORS=n in the environment tries another width.
const VECTORS = Number(process.env.VECTORS ?? 2);
const COEFFICIENT_COUNT = 14;
const each = (fn, join = '\n', count = VECTORS) => Array.from({ length: count }, (_, j) => fn(j)).join(join);
// The masks of all vectors or-ed as a balanced tree, for one any_true per step.
const anyMask = (count) => {
  let terms = Array.from({ length: count }, (_, j) => `m${j}`);
  while (terms.length > 1) {
    const next = [];
    for (let i = 0; i < terms.length; i += 2) {
      next.push(i + 1 < terms.length ? `v128.or(${terms[i]}, ${terms[i + 1]})` : terms[i]);
    }
    terms = next;
  }
  return terms[0];
};
const names = ['uu', 'uv', 'up0', 'up1', 'vu', 'vv', 'vp0', 'vp1', 'c', 'k'];
const stateNames = ['u', 'v', 'tu', 'tv', 'ts'];
// Coefficients held in locals: all ten, or for a symmetric recurrence (up0 = up1, vp0 = vp1)
// the eight that remain.
const hotNames = (symmetric) => (symmetric ? names.filter((n) => n !== 'up0' && n !== 'vp0') : names);

// The general update keeps the TypeScript kernel's order of operations, ((a + b) + c) + d, so the
// two kernels give the same bits; the symmetric one adds its single forcing term last.
const update = (symmetric, q, j) => {
  const free = `f64x2.add(f64x2.mul(${q}u${j}, uo${j}), f64x2.mul(${q}v${j}, vo${j}))`;
  return symmetric
    ? `f64x2.add(${free}, f64x2.mul(${q}p1${j}, sum))`
    : `f64x2.add(f64x2.add(${free}, f64x2.mul(${q}p0${j}, pa)), f64x2.mul(${q}p1${j}, pb))`;
};

const step = (symmetric, vectors) =>
  each(
    (j) => `      const uo${j} = u${j};
      const vo${j} = v${j};
      u${j} = ${update(symmetric, 'u', j)};
      v${j} = ${update(symmetric, 'v', j)};
      // |s| = |−(c v + k u)| = |c v + k u| exactly: the sign is only needed when refining.
      const cs${j} = f64x2.add(f64x2.mul(c${j}, v${j}), f64x2.mul(k${j}, u${j}));
      const hu${j} = f64x2.gt(f64x2.abs(u${j}), tu${j});
      const hv${j} = f64x2.gt(f64x2.abs(v${j}), tv${j});
      const hs${j} = f64x2.gt(f64x2.abs(cs${j}), ts${j});
      const m${j} = v128.or(v128.or(hu${j}, hv${j}), hs${j});`,
    '\n',
    vectors,
  );

// The rare path of one vector, taken when a lane's new end passes a threshold. Per quantity
// (u, v, s) and in vector form: the peak becomes max(peak, |new end|) and the threshold follows
// it, as in kernel.ts; only lanes whose cubic Hermite H may turn inside the step go on to the
// scalar refinement (hermiteLane). H' is the quadratic f(t) = m0(1 − t) + m1·t − ca·t(1 − t)
// (ca as in the Hermite below), so with m0 and m1 of one sign f ≥ min(|m0|, |m1|) − |ca|/4 and
// a root in (0, 1) needs m0·m1 ≤ 0 or |ca| ≥ 4·min(|m0|, |m1|); the test takes 3.5 for rounding
// to spare, so it is a superset of the steps where the scalar refinement changes anything, and
// the peaks are those of refinement on every passing step. Most passing steps are a quantity
// climbing past its running peak, which need no Hermite.
const quantities = (j) => [
  {
    q0: `uo${j}`,
    q1: `u${j}`,
    d0: `vo${j}`,
    d1: `v${j}`,
    slot: 0,
    offset: 11,
    t: `tu${j}`,
    hit: `hu${j}`,
    needs: '',
  },
  {
    q0: `vo${j}`,
    q1: `v${j}`,
    d0: `ar0`,
    d1: `ar1`,
    slot: 1,
    offset: 12,
    t: `tv${j}`,
    hit: `hv${j}`,
    needs: accelerations(j),
  },
  {
    q0: `so`,
    q1: `sn`,
    d0: `js0`,
    d1: `js1`,
    slot: 2,
    offset: 13,
    t: `ts${j}`,
    hit: `hs${j}`,
    needs: accelerations(j) + jerks(j),
  },
];
// The absolute acceleration s = −(c v + k u) and the relative one (s − p) at both ends of the step.
const accelerations = (j) => `
            const so = f64x2.neg(f64x2.add(f64x2.mul(c${j}, vo${j}), f64x2.mul(k${j}, uo${j})));
            const sn = f64x2.neg(cs${j});
            const ar0 = f64x2.sub(so, f64x2.splat(pas));
            const ar1 = f64x2.sub(sn, f64x2.splat(pbs));`;
// ds/dt = −c·(s − p) − k·v at both ends.
const jerks = (j) => `
            const js0 = f64x2.sub(f64x2.mul(f64x2.neg(c${j}), ar0), f64x2.mul(k${j}, vo${j}));
            const js1 = f64x2.sub(f64x2.mul(f64x2.neg(c${j}), ar1), f64x2.mul(k${j}, v${j}));`;
const lane = (j, q, l) => `              if (need & ${1 << l}) {
                hermiteLane(
                  f64x2.extract_lane(${q.q0}, ${l}),
                  f64x2.extract_lane(${q.q1}, ${l}),
                  f64x2.extract_lane(${q.d0}, ${l}),
                  f64x2.extract_lane(${q.d1}, ${l}),
                  h,
                  peaks + ${((j * 3 + q.slot) * 2 + l) * 8},
                );
              }`;
const refine = (vectors) =>
  each(
    (j) => `        if (v128.any_true(m${j})) {
          const ratio = v128.load(coefficients, ${(j * COEFFICIENT_COUNT + 10) * 16});
${quantities(j)
  .map(
    (q) => `          if (v128.any_true(${q.hit})) {
            const hit = ${q.hit};${q.needs}
            const end = f64x2.abs(${q.q1});
            {
              const peak = f64x2.max(v128.load(peaks, ${(j * 3 + q.slot) * 16}), end);
              v128.store(peaks, peak, ${(j * 3 + q.slot) * 16});
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
              const need = i64x2.bitmask(v128.and(hit, turns));
              let refined = peak;
              if (need !== 0) {
${lane(j, q, 0)}
${lane(j, q, 1)}
                refined = v128.load(peaks, ${(j * 3 + q.slot) * 16});
              }
              const threshold = f64x2.sub(
                f64x2.mul(refined, ratio),
                v128.load(coefficients, ${(j * COEFFICIENT_COUNT + q.offset) * 16}),
              );
              ${q.t} = v128.bitselect(threshold, ${q.t}, hit);
            }
          }`,
  )
  .join('\n')}
        }`,
    '\n',
    vectors,
  );

const hermite = (target, q0, q1, d0, d1) => `{
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

const kernel = (name, symmetric, vectors) => `/**
 * Step ${vectors * 2} oscillators over \`steps\` steps of length \`h\` through the ground accelerations
 * input[0..steps] (f64 at byte address \`input\`), continuing from \`state\` and updating \`peaks\`.${
   symmetric
     ? `
 * For recurrences whose two forcing coefficients are equal (up0 = up1 and vp0 = vp1, as for Newmark
 * average acceleration, where both are −βh²/D and −γh/D in exact arithmetic): the forcing is
 * up1·(p_n + p_{n+1}), two multiplications and two additions fewer per oscillator-step.`
     : ''
 }
 */
function ${name}(input: usize, steps: i32, h: f64, coefficients: usize, state: usize, peaks: usize): void {
${each(
  (j) =>
    hotNames(symmetric)
      .map(
        (n) =>
          `  const ${n}${j} = v128.load(coefficients, ${(j * COEFFICIENT_COUNT + names.indexOf(n)) * 16});`,
      )
      .join('\n'),
  '\n',
  vectors,
)}
${each((j) => stateNames.map((n, q) => `  let ${n}${j} = v128.load(state, ${(j * stateNames.length + q) * 16});`).join('\n'), '\n', vectors)}
  const hv = f64x2.splat(h);
  const zero = f64x2.splat(0);
  const three = f64x2.splat(3);
  const six = f64x2.splat(6);
  const bend = f64x2.splat(3.5);
  let pas = load<f64>(input);${symmetric ? '' : '\n  let pa = f64x2.splat(pas);'}
  for (let n = 1; n <= steps; n++) {
    const pbs = load<f64>(input + (<usize>n << 3));
    ${symmetric ? 'const sum = f64x2.splat(pas + pbs);' : 'const pb = f64x2.splat(pbs);'}
${step(symmetric, vectors)}
    if (v128.any_true(${anyMask(vectors)})) {
${refine(vectors)}
    }
    pas = pbs;${symmetric ? '' : '\n    pa = pb;'}
  }
${each((j) => stateNames.map((n, q) => `  v128.store(state, ${n}${j}, ${(j * stateNames.length + q) * 16});`).join('\n'), '\n', vectors)}
}`;

const source = `// Generated by scripts/generate-wasm-kernel.mjs; edit the generator, not this file.
// The WebAssembly SIMD twin of src/oscillator/kernel.ts: see that file and sweep.ts for the
// recurrence (recurrence.ts), the refinement thresholds and the cubic Hermite peak (peak.ts).
// Compiled by scripts/build-wasm.mjs with \`asc --enable simd\`.

/** Oscillators per pass: ${VECTORS} vectors of two f64 lanes. */
export const WIDTH: i32 = ${VECTORS * 2};

/**
 * Layout of the packed arrays (all f64, vector-interleaved: quantity q of oscillator i is at
 * ((i >> 1) · count + q) · 2 + (i & 1)): coefficients ${COEFFICIENT_COUNT} per oscillator (uu, uv, up0, up1,
 * vu, vv, vp0, vp1, c, k, r, du, dv, ds), state 5 (u, v, tu, tv, ts), peaks 3 (|u|, |v|, |s|).
 */
export const COEFFICIENTS: i32 = ${COEFFICIENT_COUNT};
export const STATES: i32 = ${stateNames.length};
export const PEAKS: i32 = 3;

/** First free byte of linear memory: the caller lays out its arrays from here. */
export function heapBase(): usize {
  return (__heap_base + 15) & ~15;
}

function hermiteAt(peak: f64, qa: f64, qb: f64, m0: f64, m1: f64, t: f64): f64 {
  if (t > 0 && t < 1) {
    const t2 = t * t;
    const t3 = t2 * t;
    const value = (2 * t3 - 3 * t2 + 1) * qa + (t3 - 2 * t2 + t) * m0 + (-2 * t3 + 3 * t2) * qb + (t3 - t2) * m1;
    return Math.max(peak, Math.abs(value));
  }
  return peak;
}

/**
 * The scalar end of the rare path: the cubic Hermite peak of |q| inside one step (q and its
 * derivative at both ends), folded into the peak at \`peak\` (the refinement of kernel.ts).
 */
function hermiteLane(qa0: f64, qb0: f64, d0: f64, d1: f64, h: f64, peak: usize): void {
  let p = load<f64>(peak);
  ${hermite('p', 'qa0', 'qb0', 'd0', 'd1')}
  store<f64>(peak, p);
}

${kernel('sweepBlock', false, VECTORS)}

${kernel('sweepBlockSymmetric', true, VECTORS)}

${kernel('sweepBlockNarrow', false, 1)}

${kernel('sweepBlockSymmetricNarrow', true, 1)}

/** One block with the kernel for the recurrence (bit 0: symmetric) and pass width (bit 1: narrow). */
function sweep(kind: i32, input: usize, steps: i32, h: f64, coefficients: usize, state: usize, peaks: usize): void {
  if (kind === 0) sweepBlock(input, steps, h, coefficients, state, peaks);
  else if (kind === 1) sweepBlockSymmetric(input, steps, h, coefficients, state, peaks);
  else if (kind === 2) sweepBlockNarrow(input, steps, h, coefficients, state, peaks);
  else sweepBlockSymmetricNarrow(input, steps, h, coefficients, state, peaks);
}

/**
 * Step one packed group over a whole record of \`samples\` values at byte address \`record\`, from
 * the state given: directly over the samples when \`substeps\` is 1, otherwise over blocks of
 * \`blockSteps\` linearly interpolated sub-step inputs built in \`buffer\` (the arithmetic of runGroup
 * in sweep.ts). \`narrow\` steps only the first vector (two oscillators), for small groups.
 */
export function runGroup(
  record: usize,
  samples: i32,
  substeps: i32,
  h: f64,
  coefficients: usize,
  state: usize,
  peaks: usize,
  buffer: usize,
  blockSteps: i32,
  symmetric: i32,
  narrow: i32,
): void {
  const kind = (symmetric ? 1 : 0) | (narrow ? 2 : 0);
  const intervals = samples - 1;
  if (substeps === 1) {
    // Blocks here too, so that the engine's optimizing tier takes over between calls.
    for (let first = 0; first < intervals; first += blockSteps) {
      const steps = min(blockSteps, intervals - first);
      const input = record + (<usize>first << 3);
      sweep(kind, input, steps, h, coefficients, state, peaks);
    }
    return;
  }
  const total = intervals * substeps;
  const fraction = 1 / <f64>substeps;
  let sample = 0;
  let within = 0;
  for (let first = 0; first < total; first += blockSteps) {
    const steps = min(blockSteps, total - first);
    let s = sample;
    let w = within;
    for (let j = 0; j <= steps; j++) {
      const a = load<f64>(record + (<usize>s << 3));
      store<f64>(
        buffer + (<usize>j << 3),
        w === 0 ? a : a + (load<f64>(record + (<usize>s << 3), 8) - a) * (<f64>w * fraction),
      );
      if (++w === substeps) {
        w = 0;
        s++;
      }
    }
    sample = (first + steps) / substeps;
    within = first + steps - sample * substeps;
    sweep(kind, buffer, steps, h, coefficients, state, peaks);
  }
}

// RotD's loop (hand-written, in assembly/rotd.ts) is compiled into the same module.
export { rotdPeaks } from './rotd';
`;

writeFileSync(new URL('../assembly/sweep.ts', import.meta.url), source);
