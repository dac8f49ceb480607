// The independent exact reference for floor spectra: the building mode q and the component
// oscillator u as one linear system (the cascade), from rest, driven by the linearly interpolated
// ground record, advanced by the exponential of the augmented system (Van Loan 1978) computed with
// mathjs's expm (Padé with scaling and squaring; Higham 2005), not with the project's expm or
// cascade step. Like exact-response.ts it samples every record step densely (at least 32 points a
// step and 40 a period of the oscillator's and of the building's fastest mode) and refines every
// sampled peak within 1% of the largest on a grid 32 times finer, then by the parabola through
// the three highest points. Checked against ODEX in exact-cascade.test.ts.
import { expm as mathjsExpm, matrix } from 'mathjs';
import { densePoints, type ExactPeaks, refinedPeak } from './exact-response.js';

export interface ExactBuilding {
  periodS: number;
  damping: number;
  modalFactor: number;
}

const REFINE = 32;

/** Rows q, q', u, u' of exp(M·δ) for z = (q, q', u, u', p, ṗ). */
function propagator(b: ExactBuilding, omega: number, zeta: number, delta: number): number[][] {
  const wb = (2 * Math.PI) / b.periodS;
  const kb = wb * wb;
  const cb = 2 * b.damping * wb;
  const g = b.modalFactor;
  const k = omega * omega;
  const c = 2 * zeta * omega;
  const m = [
    [0, 1, 0, 0, 0, 0],
    [-kb, -cb, 0, 0, -1, 0],
    [0, 0, 0, 1, 0, 0],
    [g * kb, g * cb, -k, -c, -(1 - g), 0],
    [0, 0, 0, 0, 0, 1],
    [0, 0, 0, 0, 0, 0],
  ].map((row) => row.map((x) => x * delta));
  return (mathjsExpm(matrix(m)).toArray() as number[][]).slice(0, 4);
}

/**
 * Exact peaks of SD, SV and SA (|u''+ a_floor| = |2ζωu' + ω²u|) for one oscillator of period T > 0
 * on the floor of building `b`; with T = 0, SA is the floor's peak acceleration |a_g + Γφ·q''|.
 */
export function exactCascadePeaks(
  accel: Float64Array,
  dtS: number,
  b: ExactBuilding,
  periodS: number,
  zeta: number,
): ExactPeaks {
  const rigid = periodS === 0;
  const omega = rigid ? 0 : (2 * Math.PI) / periodS;
  const k = omega * omega;
  const c = 2 * zeta * omega;
  const wb = (2 * Math.PI) / b.periodS;
  const points = Math.max(
    densePoints(b.periodS, b.damping, dtS),
    rigid ? 0 : densePoints(periodS, zeta, dtS),
  );
  const coarse = propagator(b, omega, zeta, dtS / points);
  const fine = propagator(b, omega, zeta, dtS / points / REFINE);
  const count = (accel.length - 1) * points + 1;
  const states = Array.from({ length: 4 }, () => new Float64Array(count));
  const walk = (
    e: number[][],
    per: number,
    first: number,
    steps: number,
    start: number[],
    visit: (j: number, x: number[], p: number) => void,
  ) => {
    let x = start.slice();
    for (let j = first; j < first + steps; j++) {
      const n = Math.floor(j / per);
      if (n >= accel.length - 1) break;
      const slope = (accel[n + 1] - accel[n]) / dtS;
      const p = accel[n] + slope * (((j - n * per) * dtS) / per);
      x = e.map(
        (row) => row[0] * x[0] + row[1] * x[1] + row[2] * x[2] + row[3] * x[3] + row[4] * p + row[5] * slope,
      );
      const pEnd = accel[n] + slope * (((j + 1 - n * per) * dtS) / per);
      visit(j + 1, x, pEnd);
    }
  };
  walk(coarse, points, 0, count - 1, [0, 0, 0, 0], (j, x) => {
    for (let r = 0; r < 4; r++) states[r][j] = x[r];
  });
  const groundAt = (j: number) => {
    const n = Math.min(Math.floor(j / points), accel.length - 2);
    return accel[n] + ((accel[n + 1] - accel[n]) * (j - n * points)) / points;
  };
  const floorOf = (x: number[], p: number) =>
    p + b.modalFactor * (-p - 2 * b.damping * wb * x[1] - wb * wb * x[0]);
  const stateAt = (j: number) => [states[0][j], states[1][j], states[2][j], states[3][j]];
  const quantities: [keyof ExactPeaks, (x: number[], p: number) => number][] = rigid
    ? [['saMS2', (x, p) => Math.abs(floorOf(x, p))]]
    : [
        ['sdM', (x) => Math.abs(x[2])],
        ['svMS', (x) => Math.abs(x[3])],
        ['saMS2', (x) => Math.abs(c * x[3] + k * x[2])],
      ];
  const result: ExactPeaks = { sdM: 0, svMS: 0, saMS2: 0 };
  for (const [key, value] of quantities) {
    const sampled = (j: number) => value(stateAt(j), groundAt(j));
    result[key] = refinedPeak(count, sampled, (j) => {
      const values: number[] = [sampled(j - 1)];
      walk(fine, points * REFINE, (j - 1) * REFINE, 2 * REFINE, stateAt(j - 1), (_i, x, p) =>
        values.push(value(x, p)),
      );
      return values;
    });
  }
  return result;
}
