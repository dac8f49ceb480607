import { expm } from './expm.js';
import { recordStatistics } from './record-statistics.js';
import { checkedSubsteps, fastestPoleRatio, MIN_STEPS_PER_PERIOD, recordSubsteps } from './substeps.js';

/**
 * The exact continuous cascade of a floor spectrum: the building's mode q and the equipment
 * oscillator u as one linear system, driven by the ground acceleration linear between samples,
 *   q'' + 2ζ_bω_b q' + ω_b² q = −a_g,      a_floor = a_g + Γφ·q'',
 *   u'' + 2ζω u' + ω² u = −a_floor = −(1 − Γφ)a_g + Γφ(2ζ_bω_b q' + ω_b² q),
 * advanced over each sub-step by the exponential of its augmented matrix (Van Loan, "Computing
 * integrals involving the matrix exponential", IEEE TAC 23, 1978), so the states at the sub-steps
 * are exact and the floor motion is never sampled and re-interpolated. Peaks between sub-steps are
 * found by cubic Hermite interpolation (peak.ts), with as many sub-steps as the sweep's
 * piecewise-exact rule asks for the oscillator, for the building mode and for the record's
 * roughness (substeps.ts).
 */
export interface CascadeBuilding {
  periodS: number;
  damping: number;
  /** Γφ at the floor. */
  modalFactor: number;
}

/** Peaks of one cascade oscillator: |u|, |u'| and the absolute acceleration |u'' + a_floor|. */
export interface CascadePeak {
  sdM: number;
  svMS: number;
  saMS2: number;
  /** Sub-steps per record step. */
  substeps: number;
}

/** What a cascade sweep needs of its record, computed once. */
export interface CascadeRecord {
  accelMS2: Float64Array;
  dtS: number;
  roughness: number;
}

export function cascadeRecord(accelMS2: Float64Array, dtS: number): CascadeRecord {
  return { accelMS2, dtS, roughness: recordStatistics(accelMS2, dtS).roughness };
}

/** Sub-steps per record step for the oscillator (T, ζ) on `building` (T = 0: the floor alone). */
export function cascadeSubsteps(
  record: CascadeRecord,
  building: CascadeBuilding,
  periodS: number,
  damping: number,
  stepsPerPeriod = 0,
): number {
  const perPeriod = (t: number, zeta: number) =>
    t > 0
      ? Math.ceil(
          (record.dtS * Math.max(MIN_STEPS_PER_PERIOD * fastestPoleRatio(zeta), stepsPerPeriod)) / t - 1e-9,
        )
      : 1;
  const substeps = Math.max(
    Math.ceil(record.roughness * record.roughness - 1e-9),
    recordSubsteps('piecewise-exact', record.roughness),
    perPeriod(building.periodS, building.damping),
    perPeriod(periodS, damping),
  );
  return checkedSubsteps(
    substeps,
    record.dtS,
    periodS > 0 ? Math.min(periodS, building.periodS) : building.periodS,
  );
}

/**
 * Rows q, q', u, u' of exp(M·h) for z = (q, q', u, u', p, Δp), Δp = p_{n+1} − p_n carried as the
 * ramp's increment (p' = Δp/h), so that x_{n+1} = Φx_n + g₀p_n + g₁p_{n+1}: row-major 4×6,
 * columns q, q', u, u', then the coefficients of p_n and p_{n+1}.
 */
export function cascadeStep(
  building: CascadeBuilding,
  omegaRadS: number,
  damping: number,
  stepS: number,
): Float64Array {
  const h = stepS;
  const wb = (2 * Math.PI) / building.periodS;
  const kb = wb * wb;
  const cb = 2 * building.damping * wb;
  const g = building.modalFactor;
  const k = omegaRadS * omegaRadS;
  const c = 2 * damping * omegaRadS;
  // biome-ignore format: the matrix reads row by row
  const m = new Float64Array([
    0, h, 0, 0, 0, 0,
    -kb * h, -cb * h, 0, 0, -h, 0,
    0, 0, 0, h, 0, 0,
    g * kb * h, g * cb * h, -k * h, -c * h, -(1 - g) * h, 0,
    0, 0, 0, 0, 0, 1,
    0, 0, 0, 0, 0, 0,
  ]);
  const e = expm(m, 6);
  const out = new Float64Array(24);
  for (let r = 0; r < 4; r++) {
    for (let col = 0; col < 4; col++) out[r * 6 + col] = e[r * 6 + col];
    out[r * 6 + 4] = e[r * 6 + 4] - e[r * 6 + 5];
    out[r * 6 + 5] = e[r * 6 + 5];
  }
  return out;
}

/** The largest |H(t)| of the cubic Hermite on a sub-step can exceed its ends by at most 4/27·(|m₀| + |m₁|). */
const HERMITE_BULGE = 4 / 27;

/**
 * Peaks of one oscillator of period T > 0 and damping ζ on the floor of `building`, over the
 * record, from rest. T = 0 gives the floor's own peak acceleration (floorPeakAcceleration).
 */
export function cascadePeak(
  record: CascadeRecord,
  building: CascadeBuilding,
  periodS: number,
  damping: number,
  stepsPerPeriod = 0,
): CascadePeak {
  if (periodS === 0) {
    const substeps = cascadeSubsteps(record, building, 0, 0, stepsPerPeriod);
    return { sdM: 0, svMS: 0, saMS2: floorPeakAcceleration(record, building, substeps), substeps };
  }
  const { accelMS2: ag, dtS } = record;
  const n = cascadeSubsteps(record, building, periodS, damping, stepsPerPeriod);
  const h = dtS / n;
  const omega = (2 * Math.PI) / periodS;
  const k = omega * omega;
  const c = 2 * damping * omega;
  const wb = (2 * Math.PI) / building.periodS;
  const kb = wb * wb;
  const cb = 2 * building.damping * wb;
  const gamma = building.modalFactor;
  const e = cascadeStep(building, omega, damping, h);
  let q = 0;
  let w = 0;
  let u = 0;
  let v = 0;
  // Values at the sub-step's start: u, u', u'' and s = u'' + a_floor = −cu' − ku with its derivative.
  let udd = -(ag[0] + gamma * -ag[0]);
  let s = 0;
  let sd = -c * udd;
  let peakU = 0;
  let peakV = 0;
  let peakS = 0;
  for (let i = 1; i < ag.length; i++) {
    const p0 = ag[i - 1];
    const dp = (ag[i] - p0) / n;
    for (let j = 0; j < n; j++) {
      const pa = p0 + dp * j;
      const pb = j === n - 1 ? ag[i] : p0 + dp * (j + 1);
      const qn = e[0] * q + e[1] * w + e[2] * u + e[3] * v + e[4] * pa + e[5] * pb;
      const wn = e[6] * q + e[7] * w + e[8] * u + e[9] * v + e[10] * pa + e[11] * pb;
      const un = e[12] * q + e[13] * w + e[14] * u + e[15] * v + e[16] * pa + e[17] * pb;
      const vn = e[18] * q + e[19] * w + e[20] * u + e[21] * v + e[22] * pa + e[23] * pb;
      const qdd = -pb - cb * wn - kb * qn;
      const floor = pb + gamma * qdd;
      const uddn = -floor - c * vn - k * un;
      const sn = -c * vn - k * un;
      const sdn = -c * uddn - k * vn;
      peakU = hermiteMax(peakU, u, un, v * h, vn * h);
      peakV = hermiteMax(peakV, v, vn, udd * h, uddn * h);
      peakS = hermiteMax(peakS, s, sn, sd * h, sdn * h);
      q = qn;
      w = wn;
      u = un;
      v = vn;
      udd = uddn;
      s = sn;
      sd = sdn;
    }
  }
  return { sdM: peakU, svMS: peakV, saMS2: peakS, substeps: n };
}

/**
 * The floor's peak absolute acceleration over continuous time, max |a_g + Γφ·q''|, with the
 * building mode stepped exactly and the Hermite search between `substeps` sub-steps a record step.
 */
export function floorPeakAcceleration(
  record: CascadeRecord,
  building: CascadeBuilding,
  substeps: number,
): number {
  const { accelMS2: ag, dtS } = record;
  const h = dtS / substeps;
  const wb = (2 * Math.PI) / building.periodS;
  const kb = wb * wb;
  const cb = 2 * building.damping * wb;
  const gamma = building.modalFactor;
  // The building rows of the cascade's step (they do not depend on the oscillator).
  const e = cascadeStep(building, wb, building.damping, h);
  let q = 0;
  let w = 0;
  let floor = ag[0] * (1 - gamma);
  let peak = Math.abs(floor);
  for (let i = 1; i < ag.length; i++) {
    const p0 = ag[i - 1];
    const slope = (ag[i] - p0) / dtS;
    const dp = (ag[i] - p0) / substeps;
    // a_floor' = ȧ_g + Γφ·q''', q''' = −ȧ_g − 2ζ_bω_b q'' − ω_b² q'.
    let qdd = -p0 - cb * w - kb * q;
    let floorRate = slope + gamma * (-slope - cb * qdd - kb * w);
    for (let j = 0; j < substeps; j++) {
      const pa = p0 + dp * j;
      const pb = j === substeps - 1 ? ag[i] : p0 + dp * (j + 1);
      const qn = e[0] * q + e[1] * w + e[4] * pa + e[5] * pb;
      const wn = e[6] * q + e[7] * w + e[10] * pa + e[11] * pb;
      qdd = -pb - cb * wn - kb * qn;
      const floorN = pb + gamma * qdd;
      const rateN = slope + gamma * (-slope - cb * qdd - kb * wn);
      peak = hermiteMax(peak, floor, floorN, floorRate * h, rateN * h);
      q = qn;
      w = wn;
      floor = floorN;
      floorRate = rateN;
    }
  }
  return peak;
}

/**
 * `peak`, or the largest |H(t)| on the sub-step if larger, H the cubic Hermite through (x0, m0),
 * (x1, m1) (m = derivative × step); the interior is examined only where it can exceed `peak`.
 */
function hermiteMax(peak: number, x0: number, x1: number, m0: number, m1: number): number {
  const ends = Math.max(peak, Math.abs(x0), Math.abs(x1));
  if (Math.max(Math.abs(x0), Math.abs(x1)) + HERMITE_BULGE * (Math.abs(m0) + Math.abs(m1)) <= ends)
    return ends;
  // H'(t)/… = a·t² + b·t + m0 on 0 < t < 1.
  const a = 6 * x0 + 3 * m0 - 6 * x1 + 3 * m1;
  const b = -6 * x0 - 4 * m0 + 6 * x1 - 2 * m1;
  let best = ends;
  const at = (t: number) => {
    if (!(t > 0 && t < 1)) return;
    const t2 = t * t;
    const t3 = t2 * t;
    const value =
      (2 * t3 - 3 * t2 + 1) * x0 + (t3 - 2 * t2 + t) * m0 + (-2 * t3 + 3 * t2) * x1 + (t3 - t2) * m1;
    best = Math.max(best, Math.abs(value));
  };
  if (Math.abs(a) <= 1e-12 * (Math.abs(b) + Math.abs(m0))) {
    if (b !== 0) at(-m0 / b);
    return best;
  }
  const discriminant = b * b - 4 * a * m0;
  if (!(discriminant >= 0)) return best;
  const root = -0.5 * (b + (b >= 0 ? 1 : -1) * Math.sqrt(discriminant));
  at(root / a);
  if (root !== 0) at(m0 / root);
  return best;
}
