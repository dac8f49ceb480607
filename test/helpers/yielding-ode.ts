// An independent reference for the yielding oscillator: the general ODE solver ODEX (Hairer and
// Wanner's Gragg–Bulirsch–Stoer extrapolation code, the `odex` package from the registry)
// integrates u'' + 2ζωu' + ω²·s = −a_g(t) branch by branch, with events located on its dense
// output. Nothing here comes from src/inelastic: the spring law is written out again below.
//
// The spring (s = f_s/k, a displacement; bilinear with kinematic hardening, α = 0 elastoplastic;
// Chopra, Dynamics of Structures, §7.1, from memory) lives on one of three smooth branches:
//   elastic:         s = u − offset              (offset fixed while elastic)
//   yielding up:     s = αu + (1 − α)u_y         (while u' > 0)
//   yielding down:   s = αu − (1 − α)u_y         (while u' < 0)
// Events: an elastic spring yields when s − αu = (1 − α)u − offset reaches ±(1 − α)u_y; a yielding
// spring unloads (turns elastic, offset = u − s) when its velocity reaches zero. Each record
// interval (a_g linear in it) is integrated as a smooth ODE; an accepted solver step across which
// the branch's event function changes sign is cut at the root of that function on the step's dense
// output (Illinois false position), and the integration restarts there on the new branch.
import { Solver } from 'odex';

export interface OdeYieldingOptions {
  periodS: number;
  damping: number;
  /** Post-yield stiffness ratio α (0 elastoplastic). */
  alpha: number;
  /** Yield displacement u_y, m (Infinity: elastic). */
  yieldDisplacementM: number;
  /** ODEX relative tolerance (and absolute, scaled by the response size); default 1e-10. */
  tolerance?: number;
}

export interface OdeYieldingPeak {
  peakDisplacementM: number;
  ductility: number;
  yieldEvents: number;
  /** Accepted ODEX steps, for the curious. */
  steps: number;
}

type Dense = (component: number, t: number) => number;

/** Branches: 0 elastic, +1 yielding up, −1 yielding down. */
type Branch = -1 | 0 | 1;

/** Most branch changes inside one record interval before the reference gives up. */
const MAX_EVENTS_PER_INTERVAL = 50;

export function odeYieldingPeak(
  accelMS2: Float64Array,
  dtS: number,
  options: OdeYieldingOptions,
): OdeYieldingPeak {
  const { periodS, damping, alpha, yieldDisplacementM: uy } = options;
  const tolerance = options.tolerance ?? 1e-10;
  const omega = (2 * Math.PI) / periodS;
  const k = omega * omega;
  const c = 2 * damping * omega;
  const band = (1 - alpha) * uy;
  let pga = 0;
  for (const a of accelMS2) pga = Math.max(pga, Math.abs(a));
  // The size of the response, for the absolute tolerance: the static displacement of the PGA,
  // or u_y if smaller.
  const scaleM = Math.max(Math.min(pga / k, uy), 1e-12);
  // A yield crossing counts once the spring is past the band by this much (a restart exactly on
  // the band after unloading must not count as a new yield through round-off).
  const slack = 1e-12 * Math.min(band, scaleM);

  const solver = new Solver(2);
  solver.relativeTolerance = tolerance;
  solver.absoluteTolerance = [tolerance * scaleM, tolerance * scaleM * omega];
  solver.denseOutput = true;
  solver.initialStepSize = dtS / 4;
  solver.maxSteps = 100_000;

  let u = 0;
  let v = 0;
  let branch: Branch = 0;
  let offset = 0;
  let peak = 0;
  let events = 0;
  let steps = 0;

  const springOf = (b: Branch, uu: number) => (b === 0 ? uu - offset : alpha * uu + b * band);
  // How far past the band an elastic spring is, up (> 0 yields up) and down (> 0 yields down).
  const pastUpper = (uu: number) => (1 - alpha) * uu - offset - band - slack;
  const pastLower = (uu: number) => -((1 - alpha) * uu - offset) - band - slack;

  for (let n = 0; n + 1 < accelMS2.length; n++) {
    const t0 = n * dtS;
    const t1 = t0 + dtS;
    const ag0 = accelMS2[n];
    const slope = (accelMS2[n + 1] - ag0) / dtS;
    let t = t0;
    for (let switches = 0; ; switches++) {
      if (switches > MAX_EVENTS_PER_INTERVAL) throw new Error(`reference: too many events near t = ${t} s`);
      const b = branch;
      const f = (time: number, y: number[]) => [
        y[1],
        -(ag0 + slope * (time - t0)) - c * y[1] - k * springOf(b, y[0]),
      ];
      let event: { t: number; u: number; v: number; next: Branch } | null = null;
      let uOld = u;
      let vOld = v;
      const out = (nr: number, xOld: number, x: number, y: number[], dense?: Dense) => {
        if (nr === 1 || dense === undefined) return;
        steps++;
        const [uNew, vNew] = y;
        if (b === 0) {
          // Cut the step at a turning point, so that u is monotone on each part.
          const parts: [number, number, number][] = []; // [start, end, u at end]
          if (vOld * vNew < 0) {
            const tv = root((s) => dense(1, s), xOld, x, vOld, vNew);
            const uv = dense(0, tv);
            parts.push([xOld, tv, uv]);
            parts.push([tv, x, uNew]);
          } else parts.push([xOld, x, uNew]);
          let uStart = uOld;
          for (const [a, z, uEnd] of parts) {
            for (const [past, next] of [
              [pastUpper, 1],
              [pastLower, -1],
            ] as const) {
              if (past(uEnd) > 0 && past(uStart) <= 0) {
                const te = root((s) => past(dense(0, s)), a, z, past(uStart), past(uEnd));
                event = { t: te, u: dense(0, te), v: dense(1, te), next };
                return false;
              }
            }
            peak = Math.max(peak, Math.abs(uEnd));
            uStart = uEnd;
          }
        } else if (b * vNew <= 0) {
          const te = vNew === 0 ? x : root((s) => dense(1, s), xOld, x, vOld, vNew);
          event = { t: te, u: dense(0, te), v: dense(1, te), next: 0 };
          return false;
        } else peak = Math.max(peak, Math.abs(uNew));
        uOld = uNew;
        vOld = vNew;
      };
      const result = solver.solve(f, t, [u, v], t1, out);
      if (event === null) {
        [u, v] = result.y;
        break;
      }
      const e = event as { t: number; u: number; v: number; next: Branch };
      peak = Math.max(peak, Math.abs(e.u));
      if (e.next === 0) offset = e.u - springOf(b, e.u);
      else events++;
      branch = e.next;
      u = e.u;
      v = e.v;
      t = e.t;
      if (t1 - t <= 1e-12 * dtS) {
        // The event sits at the interval's end: carry on from there on the new branch.
        break;
      }
    }
  }
  return { peakDisplacementM: peak, ductility: peak / uy, yieldEvents: events, steps };
}

/**
 * The root of g in [a, b] (g(a) = ga and g(b) = gb of opposite signs, or one of them 0), by the
 * Illinois variant of false position, to the last bits of t.
 */
function root(g: (t: number) => number, a: number, b: number, ga: number, gb: number): number {
  if (gb === 0) return b;
  if (ga === 0) return a;
  let lo = a;
  let hi = b;
  let gLo = ga;
  let gHi = gb;
  let kept = 0; // +1: lo moved last time, −1: hi moved last time
  for (let i = 0; i < 200 && hi - lo > 4e-16 * Math.max(Math.abs(lo), Math.abs(hi), 1e-3); i++) {
    let t = (lo * gHi - hi * gLo) / (gHi - gLo);
    if (!(t > lo && t < hi)) t = (lo + hi) / 2;
    const gt = g(t);
    if (gt === 0) return t;
    if (gt * gLo > 0) {
      lo = t;
      gLo = gt;
      // The same end moved twice: halve the other end's value so the bracket closes from both sides.
      if (kept === 1) gHi /= 2;
      kept = 1;
    } else {
      hi = t;
      gHi = gt;
      if (kept === -1) gLo /= 2;
      kept = -1;
    }
  }
  return (lo + hi) / 2;
}
