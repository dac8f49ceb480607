import { usageError } from '../base/errors.js';
import { STANDARD_GRAVITY_MS2 } from '../base/units.js';
import { stepCoefficients } from '../oscillator/recurrence.js';
import { createRecord, type GroundRecord } from './record.js';

/** Parameters of the stochastic ground-motion generator. Defaults describe a firm-soil site. */
export interface SynthOptions {
  /** Seed of the random number generator; the same seed gives the same record, bit for bit. */
  seed: number;
  /** Time step and duration, s (defaults 0.01 and 30). */
  dtS?: number;
  durationS?: number;
  /** Target peak ground acceleration, g; the record is scaled to it exactly. Default 0.3. */
  pgaG?: number;
  /** Kanai–Tajimi ground frequency f_g, Hz (default 2.5) and damping ζ_g (default 0.6). */
  groundFrequencyHz?: number;
  groundDamping?: number;
  /** Clough–Penzien high-pass frequency f_f, Hz (default 0.25; its damping ζ_f is 0.6). */
  highPassFrequencyHz?: number;
  name?: string;
}

/** Mulberry32 (Tommy Ettinger 2017, public domain): 32-bit integer arithmetic only, so reproducible. */
export function seededUniform(seed: number): () => number {
  let state = seed >>> 0;
  return () => {
    state = (state + 0x6d2b79f5) >>> 0;
    let t = state;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/** Standard normal variates by the Box–Muller transform (Box and Muller 1958). */
export function seededNormal(seed: number): () => number {
  const uniform = seededUniform(seed);
  const pair: number[] = [];
  return () => {
    if (pair.length === 0) {
      let u = 0;
      while (u === 0) u = uniform();
      const v = uniform();
      const radius = Math.sqrt(-2 * Math.log(u));
      pair.push(radius * Math.sin(2 * Math.PI * v), radius * Math.cos(2 * Math.PI * v));
    }
    return pair.pop() as number;
  };
}

/**
 * A synthetic record: Gaussian white noise through the Kanai–Tajimi filter (Kanai 1957; Tajimi
 * 1960) and the Clough–Penzien high-pass (Clough and Penzien, Dynamics of Structures, 1975), times
 * the Jennings–Housner–Tsai (1968) envelope ((t/t1)² to t1 = 0.1·T, 1 to t2 = 0.45·T, then
 * exp(−(6/T)(t − t2)), T the duration), scaled to the target PGA; oscillators stepped exactly:
 *   a_KT = −(2ζ_gω_g ẋ_g + ω_g² x_g) with ẍ_g + 2ζ_gω_g ẋ_g + ω_g² x_g = −w(t), and
 *   a = ẍ_f with ẍ_f + 2ζ_fω_f ẋ_f + ω_f² x_f = a_KT (removing long-period drift).
 * For demo and test data only: it is not a hazard-consistent ground motion.
 */
export function synthesizeRecord(options: SynthOptions): GroundRecord {
  const dtS = options.dtS ?? 0.01;
  const durationS = options.durationS ?? 30;
  const pgaG = options.pgaG ?? 0.3;
  const fg = options.groundFrequencyHz ?? 2.5;
  const zg = options.groundDamping ?? 0.6;
  const ff = options.highPassFrequencyHz ?? 0.25;
  const zf = 0.6;
  for (const [label, value] of Object.entries({ dtS, durationS, pgaG, fg, ff, zg })) {
    if (!(value > 0) || !Number.isFinite(value))
      throw usageError(`synth: ${label} must be positive, got ${value}`);
  }
  const t1 = 0.1 * durationS;
  const t2 = 0.45 * durationS;
  const decay = 6 / durationS;
  if (fg >= 0.5 / dtS)
    throw usageError(`synth: the ground frequency ${fg} Hz is above the Nyquist frequency`);
  const n = Math.floor(durationS / dtS + 1e-9) + 1;
  if (n > 50_000_000) throw usageError(`synth: ${n} samples is too many`);

  const normal = seededNormal(options.seed);
  // Unit variance rather than 1/dt: the level does not matter, the record is scaled to its PGA.
  let noisePrevious = normal();
  const wg = 2 * Math.PI * fg;
  const kt = stepCoefficients('piecewise-exact', wg, zg, dtS);
  const wf = 2 * Math.PI * ff;
  const cp = stepCoefficients('piecewise-exact', wf, zf, dtS);
  const envelope = (t: number) => (t < t1 ? (t / t1) ** 2 : t <= t2 ? 1 : Math.exp(-decay * (t - t2)));
  const accel = new Float64Array(n);
  let xg = 0;
  let vg = 0;
  let xf = 0;
  let vf = 0;
  let aktPrevious = 0;
  let peak = 0;
  for (let i = 1; i < n; i++) {
    const noise = normal();
    [xg, vg] = [
      kt.uu * xg + kt.uv * vg + kt.up0 * noisePrevious + kt.up1 * noise,
      kt.vu * xg + kt.vv * vg + kt.vp0 * noisePrevious + kt.vp1 * noise,
    ];
    noisePrevious = noise;
    const akt = -(2 * zg * wg * vg + wg * wg * xg);
    // The Clough–Penzien oscillator is driven by −a_KT in the recurrence's sign convention.
    [xf, vf] = [
      cp.uu * xf + cp.uv * vf - cp.up0 * aktPrevious - cp.up1 * akt,
      cp.vu * xf + cp.vv * vf - cp.vp0 * aktPrevious - cp.vp1 * akt,
    ];
    aktPrevious = akt;
    accel[i] = (akt - 2 * zf * wf * vf - wf * wf * xf) * envelope(i * dtS);
    peak = Math.max(peak, Math.abs(accel[i]));
  }
  const scale = peak > 0 ? (pgaG * STANDARD_GRAVITY_MS2) / peak : 0;
  for (let i = 0; i < n; i++) accel[i] *= scale;
  return createRecord({
    name: options.name ?? `synthetic-${options.seed}`,
    source: `quakesweep synth --seed ${options.seed}`,
    dtS,
    accelMS2: accel,
    unitsRead: 'g',
  });
}
