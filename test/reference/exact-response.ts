// The independent exact reference of the accuracy rule: the linear oscillator
// u'' + 2ζωu' + ω²u = −a_g(t), from rest, driven by the linearly interpolated record, advanced
// by the exponential of the augmented system (Van Loan 1978), computed with mathjs's expm (Padé
// with scaling and squaring; Higham 2005), not with the project's own expm or step coefficients.
// It samples the response densely inside every record step (at least 32 points a step, 40 a
// period of the oscillator's fastest mode) and refines every sampled peak within 1% of the
// largest on a grid 32 times finer, then by the parabola through the three highest points.
// Checked against ODEX in exact-response.test.ts.
import { expm as mathjsExpm, matrix } from 'mathjs';

export interface ExactPeaks {
  /** Peak |u|, m. */
  sdM: number;
  /** Peak |u'|, m/s. */
  svMS: number;
  /** Peak |u'' + a_g| = |2ζωu' + ω²u|, m/s². */
  saMS2: number;
}

const REFINE = 32;

/** Rows 1–2 of exp(M·δ) for z = (u, v, p, q), ṗ = q: M = [[0,1,0,0],[−ω²,−2ζω,−1,0],[0,0,0,1],[0,0,0,0]]. */
function propagator(omega: number, zeta: number, deltaS: number): Float64Array {
  const k = omega * omega;
  const c = 2 * zeta * omega;
  const m = [
    [0, deltaS, 0, 0],
    [-k * deltaS, -c * deltaS, -deltaS, 0],
    [0, 0, 0, deltaS],
    [0, 0, 0, 0],
  ];
  const e = mathjsExpm(matrix(m)).toArray() as number[][];
  return Float64Array.from([...e[0], ...e[1]]);
}

/** Magnitude of the oscillator's fastest pole over ω: 1 when ζ ≤ 1, ζ + √(ζ² − 1) above. */
export function fastestPoleRatio(zeta: number): number {
  return zeta <= 1 ? 1 : zeta + Math.sqrt(zeta * zeta - 1);
}

/** Points per record step of the dense sampling for period T. */
export function densePoints(periodS: number, zeta: number, dtS: number): number {
  return Math.max(32, Math.ceil((40 * fastestPoleRatio(zeta) * dtS) / periodS));
}

/**
 * Exact peaks of SD, SV and SA for one oscillator over the record `accel` (m/s², step dtS), the
 * input linear between samples, over the record's duration.
 */
export function exactPeaks(accel: Float64Array, dtS: number, periodS: number, zeta: number): ExactPeaks {
  const omega = (2 * Math.PI) / periodS;
  const k = omega * omega;
  const c = 2 * zeta * omega;
  const points = densePoints(periodS, zeta, dtS);
  const delta = dtS / points;
  const coarse = propagator(omega, zeta, delta);
  const fine = propagator(omega, zeta, delta / REFINE);
  const count = (accel.length - 1) * points + 1;
  const u = new Float64Array(count);
  const v = new Float64Array(count);
  // Walk `steps` sub-intervals of `e` from sample index `start` (state u0, v0) of the coarse grid,
  // `per` of them to a record step; call `visit` with every state reached.
  const walk = (
    e: Float64Array,
    per: number,
    first: number,
    steps: number,
    u0: number,
    v0: number,
    visit: (j: number, u: number, v: number) => void,
  ) => {
    let uu = u0;
    let vv = v0;
    for (let j = first; j < first + steps; j++) {
      const n = Math.floor(j / per);
      if (n >= accel.length - 1) break;
      const slope = (accel[n + 1] - accel[n]) / dtS;
      const p = accel[n] + slope * (((j - n * per) * dtS) / per);
      const un = e[0] * uu + e[1] * vv + e[2] * p + e[3] * slope;
      vv = e[4] * uu + e[5] * vv + e[6] * p + e[7] * slope;
      uu = un;
      visit(j + 1, uu, vv);
    }
  };
  walk(coarse, points, 0, count - 1, 0, 0, (j, uu, vv) => {
    u[j] = uu;
    v[j] = vv;
  });
  const quantities: [keyof ExactPeaks, (j: number) => number, (uu: number, vv: number) => number][] = [
    ['sdM', (j) => Math.abs(u[j]), (uu) => Math.abs(uu)],
    ['svMS', (j) => Math.abs(v[j]), (_uu, vv) => Math.abs(vv)],
    ['saMS2', (j) => Math.abs(c * v[j] + k * u[j]), (uu, vv) => Math.abs(c * vv + k * uu)],
  ];
  const result: ExactPeaks = { sdM: 0, svMS: 0, saMS2: 0 };
  for (const [key, sampled, value] of quantities) {
    result[key] = refinedPeak(count, sampled, (j) => {
      // From the sample before to the one after, on the fine grid.
      const values: number[] = [sampled(j - 1)];
      walk(fine, points * REFINE, (j - 1) * REFINE, 2 * REFINE, u[j - 1], v[j - 1], (_i, uu, vv) =>
        values.push(value(uu, vv)),
      );
      return values;
    });
  }
  return result;
}

/**
 * The peak of a densely sampled quantity: the largest sample, raised by every local peak within 1%
 * of it resampled finely around it (`fine(j)`: the values from sample j − 1 to j + 1 on the finer
 * grid) and by the parabola through the three highest fine values.
 */
export function refinedPeak(
  count: number,
  sampled: (j: number) => number,
  fine: (j: number) => number[],
): number {
  let largest = 0;
  for (let j = 0; j < count; j++) largest = Math.max(largest, sampled(j));
  let peak = largest;
  for (let j = 1; j < count; j++) {
    const here = sampled(j);
    const isLocalPeak = here >= sampled(j - 1) && (j === count - 1 || here >= sampled(j + 1));
    if (!isLocalPeak || here < 0.99 * largest) continue;
    const values = fine(j);
    let best = 0;
    for (let i = 1; i < values.length; i++) if (values[i] > values[best]) best = i;
    peak = Math.max(peak, values[best]);
    if (best > 0 && best < values.length - 1) {
      const [a, b, d] = [values[best - 1], values[best], values[best + 1]];
      const curvature = a - 2 * b + d;
      if (curvature < 0) peak = Math.max(peak, b - ((a - d) * (a - d)) / (8 * curvature));
    }
  }
  return peak;
}

/**
 * The exact relative displacement u at `points` equally spaced times inside every record step
 * (index n·points + j at t = (n + j/points)·dt), for reductions other than the peak (RotD).
 */
export function exactDisplacement(
  accel: Float64Array,
  dtS: number,
  periodS: number,
  zeta: number,
  points: number,
): Float64Array {
  const omega = (2 * Math.PI) / periodS;
  const e = propagator(omega, zeta, dtS / points);
  const u = new Float64Array((accel.length - 1) * points + 1);
  let uu = 0;
  let vv = 0;
  for (let n = 0; n < accel.length - 1; n++) {
    const slope = (accel[n + 1] - accel[n]) / dtS;
    for (let j = 0; j < points; j++) {
      const p = accel[n] + slope * ((j * dtS) / points);
      const un = e[0] * uu + e[1] * vv + e[2] * p + e[3] * slope;
      vv = e[4] * uu + e[5] * vv + e[6] * p + e[7] * slope;
      uu = un;
      u[n * points + j + 1] = uu;
    }
  }
  return u;
}
