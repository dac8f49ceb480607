// Short records for the outside checks of the yielding oscillator (test/reference/yielding-*.ts):
// two invented ones made here, and the start of the demo record (itself invented).
import { readFileSync } from 'node:fs';
import { readRecordText } from '../../src/record/read.js';

export interface ShortRecord {
  name: string;
  accelMS2: Float64Array;
  dtS: number;
}

/**
 * Invented: one full sine cycle each of periods 0.15, 0.5, 1.2 and 2.5 s (amplitude 3 m/s²), 0.5 s
 * of rest after each, then rest to 10 s; Δt = 0.01 s, 1001 samples.
 */
export function sinePulseTrain(dtS = 0.01): ShortRecord {
  const pulses = [0.15, 0.5, 1.2, 2.5];
  const n = Math.round(10 / dtS) + 1;
  const accelMS2 = new Float64Array(n);
  let start = 0.2;
  for (const periodS of pulses) {
    for (let i = 0; i < n; i++) {
      const t = i * dtS - start;
      if (t > 0 && t < periodS) accelMS2[i] = 3 * Math.sin((2 * Math.PI * t) / periodS);
    }
    start += periodS + 0.5;
  }
  return { name: 'sine pulse train', accelMS2, dtS };
}

/**
 * Invented: Gaussian white noise (seeded mulberry32, Box–Muller) through a resonator at 2.5 Hz with
 * 40% damping, under a 2 s rise, 6 s hold, exponential decay envelope, scaled to 3.5 m/s² peak;
 * Δt = 0.02 s, 751 samples (15 s).
 */
export function filteredNoise(seed = 18, dtS = 0.02, durationS = 15): ShortRecord {
  const random = mulberry32(seed);
  const n = Math.round(durationS / dtS) + 1;
  const omega = 2 * Math.PI * 2.5;
  const zeta = 0.4;
  const r = Math.exp(-zeta * omega * dtS);
  const theta = omega * dtS * Math.sqrt(1 - zeta * zeta);
  const accelMS2 = new Float64Array(n);
  let y1 = 0;
  let y2 = 0;
  let peak = 0;
  for (let i = 0; i < n; i++) {
    const w = Math.sqrt(-2 * Math.log(1 - random())) * Math.cos(2 * Math.PI * random());
    const y = 2 * r * Math.cos(theta) * y1 - r * r * y2 + w;
    y2 = y1;
    y1 = y;
    const t = i * dtS;
    const envelope = t < 2 ? t / 2 : t < 8 ? 1 : Math.exp(-(t - 8) / 2.5);
    accelMS2[i] = envelope * y;
    peak = Math.max(peak, Math.abs(accelMS2[i]));
  }
  for (let i = 0; i < n; i++) accelMS2[i] *= 3.5 / peak;
  accelMS2[0] = 0;
  return { name: `filtered noise (seed ${seed})`, accelMS2, dtS };
}

/** The first `durationS` of the demo record records/marrowby-h1.csv (invented; Δt = 0.01 s). */
export function demoStart(durationS = 15): ShortRecord {
  const url = new URL('../../records/marrowby-h1.csv', import.meta.url);
  const record = readRecordText(readFileSync(url, 'utf8'), { units: 'g', source: 'records/marrowby-h1.csv' });
  const n = Math.min(record.accelMS2.length, Math.round(durationS / record.dtS) + 1);
  return {
    name: `marrowby-h1, first ${durationS} s`,
    accelMS2: record.accelMS2.slice(0, n),
    dtS: record.dtS,
  };
}

/** A record linearly interpolated onto a step `factor` times finer: the same ground motion. */
export function refine(record: ShortRecord, factor: number): ShortRecord {
  const n = (record.accelMS2.length - 1) * factor + 1;
  const accelMS2 = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    const j = Math.floor(i / factor);
    const f = (i - j * factor) / factor;
    const a0 = record.accelMS2[j];
    accelMS2[i] = f === 0 ? a0 : a0 + f * (record.accelMS2[j + 1] - a0);
  }
  return { name: `${record.name}, Δt/${factor}`, accelMS2, dtS: record.dtS / factor };
}

/** A small seeded uniform generator on [0, 1) (mulberry32, public domain). */
function mulberry32(seed: number): () => number {
  let state = seed >>> 0;
  return () => {
    state = (state + 0x6d2b79f5) >>> 0;
    let t = state;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}
