// RotD's inner loop in WebAssembly SIMD: the twin of oscillatorPeaks in src/spectrum/rotd.ts (same
// recurrence for both components, same order of operations, so the two give the same bits), with
// the rotated displacements u(θ) = cos θ·u₁ + sin θ·u₂ formed two angles at a time in f64x2 and
// the cubic Hermite refinement (hermitePeak in src/oscillator/peak.ts) run per lane on the rare
// steps whose end passes an angle's threshold. Written by hand; compiled with the sweep kernel.

function hermiteAbs(q0: f64, q1: f64, m0: f64, m1: f64, t: f64): f64 {
  if (!(t > 0 && t < 1)) return 0;
  const t2 = t * t;
  const t3 = t2 * t;
  return Math.abs(
    (2 * t3 - 3 * t2 + 1) * q0 + (t3 - 2 * t2 + t) * m0 + (-2 * t3 + 3 * t2) * q1 + (t3 - t2) * m1,
  );
}

function hermitePeak(q0: f64, q1: f64, dq0: f64, dq1: f64, stepS: f64): f64 {
  const m0 = dq0 * stepS;
  const m1 = dq1 * stepS;
  let peak = Math.max(Math.abs(q0), Math.abs(q1));
  const a = 6 * q0 + 3 * m0 - 6 * q1 + 3 * m1;
  const b = -6 * q0 - 4 * m0 + 6 * q1 - 2 * m1;
  const c = m0;
  const scale = Math.abs(a) + Math.abs(b) + Math.abs(c);
  if (scale === 0) return peak;
  if (Math.abs(a) <= 1e-12 * scale) {
    if (b !== 0) peak = Math.max(peak, hermiteAbs(q0, q1, m0, m1, -c / b));
    return peak;
  }
  const discriminant = b * b - 4 * a * c;
  if (discriminant < 0) return peak;
  const root = Math.sqrt(discriminant);
  const qq = -0.5 * (b + (b >= 0 ? root : -root));
  if (qq !== 0) peak = Math.max(peak, hermiteAbs(q0, q1, m0, m1, c / qq));
  peak = Math.max(peak, hermiteAbs(q0, q1, m0, m1, qq / a));
  return peak;
}

/**
 * Peak |u(θ, t)| of one oscillator for `angles` angles (even; cosines at `cos`, sines at `sin`),
 * into `peaks` with their refinement thresholds at `thresholds` (both zero on entry). The two
 * components (`samples` f64 each at `a1`, `a2`) are stepped `substeps` times a sample with the
 * step coefficients at `co` (uu, uv, up0, up1, vu, vv, vp0, vp1) and linearly interpolated input.
 */
export function rotdPeaks(
  a1: usize,
  a2: usize,
  samples: i32,
  substeps: i32,
  h: f64,
  co: usize,
  cos: usize,
  sin: usize,
  angles: i32,
  peaks: usize,
  thresholds: usize,
  ratio: f64,
  offset: f64,
): void {
  const uu = load<f64>(co);
  const uv = load<f64>(co, 8);
  const up0 = load<f64>(co, 16);
  const up1 = load<f64>(co, 24);
  const vu = load<f64>(co, 32);
  const vv = load<f64>(co, 40);
  const vp0 = load<f64>(co, 48);
  const vp1 = load<f64>(co, 56);
  const inverse = 1 / <f64>substeps;
  let u1: f64 = 0;
  let v1: f64 = 0;
  let u2: f64 = 0;
  let v2: f64 = 0;
  const last = samples - 1;
  for (let n = 0; n < last; n++) {
    const start1 = load<f64>(a1 + ((<usize>n) << 3));
    const end1 = load<f64>(a1 + ((<usize>n) << 3), 8);
    const increment1 = (end1 - start1) * inverse;
    const start2 = load<f64>(a2 + ((<usize>n) << 3));
    const end2 = load<f64>(a2 + ((<usize>n) << 3), 8);
    const increment2 = (end2 - start2) * inverse;
    let pa1 = start1;
    let pa2 = start2;
    for (let j = 1; j <= substeps; j++) {
      const pb1 = j === substeps ? end1 : start1 + <f64>j * increment1;
      const pb2 = j === substeps ? end2 : start2 + <f64>j * increment2;
      const uo1 = u1;
      const vo1 = v1;
      const uo2 = u2;
      const vo2 = v2;
      u1 = uu * uo1 + uv * vo1 + up0 * pa1 + up1 * pb1;
      v1 = vu * uo1 + vv * vo1 + vp0 * pa1 + vp1 * pb1;
      u2 = uu * uo2 + uv * vo2 + up0 * pa2 + up1 * pb2;
      v2 = vu * uo2 + vv * vo2 + vp0 * pa2 + vp1 * pb2;
      const x = f64x2.splat(u1);
      const y = f64x2.splat(u2);
      for (let k = 0; k < angles; k += 2) {
        const offsetK = (<usize>k) << 3;
        const c = v128.load(cos + offsetK);
        const s = v128.load(sin + offsetK);
        const u = f64x2.add(f64x2.mul(c, x), f64x2.mul(s, y));
        const bits = i64x2.bitmask(f64x2.gt(f64x2.abs(u), v128.load(thresholds + offsetK)));
        if (bits !== 0) {
          for (let l = 0; l < 2; l++) {
            if ((bits & (1 << l)) === 0) continue;
            const at = offsetK + ((<usize>l) << 3);
            const ck = load<f64>(cos + at);
            const sk = load<f64>(sin + at);
            const peak = hermitePeak(
              ck * uo1 + sk * uo2,
              ck * u1 + sk * u2,
              ck * vo1 + sk * vo2,
              ck * v1 + sk * v2,
              h,
            );
            if (peak > load<f64>(peaks + at)) {
              store<f64>(peaks + at, peak);
              store<f64>(thresholds + at, peak * ratio - offset);
            }
          }
        }
      }
      pa1 = pb1;
      pa2 = pb2;
    }
  }
}
