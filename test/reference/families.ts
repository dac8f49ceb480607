// Invented records for the accuracy campaign: narrow-band (sines, steady and ramped, at fractions
// of the Nyquist frequency) and broadband (the seeded stochastic generator). Test data only.
import { synthesizeRecord } from '../../src/record/synth.js';

export interface FamilyRecord {
  label: string;
  family: 'steady sine' | 'ramped sine' | 'broadband';
  dtS: number;
  accelMS2: Float64Array;
}

/**
 * a(t) = sin(2πft + φ), from its first sample (steady: the oscillator is struck at once) or
 * under a linear ramp over `rampS` (ramped), `durationS` long, in m/s².
 */
export function sineRecord(
  frequencyHz: number,
  dtS: number,
  options: { rampS?: number; phase?: number; durationS?: number } = {},
): FamilyRecord {
  const { rampS = 0, phase = 0, durationS = 8 } = options;
  const n = Math.round(durationS / dtS) + 1;
  const accelMS2 = Float64Array.from({ length: n }, (_, i) => {
    const t = i * dtS;
    const envelope = rampS > 0 ? Math.min(t / rampS, 1) : 1;
    return envelope * Math.sin(2 * Math.PI * frequencyHz * t + phase);
  });
  const family = rampS > 0 ? 'ramped sine' : 'steady sine';
  const label = `${family} ${frequencyHz.toPrecision(4)} Hz${phase ? `, phase ${phase.toFixed(2)}` : ''}, Δt ${dtS} s`;
  return { label, family, dtS, accelMS2 };
}

/** Fractions of the Nyquist frequency the narrow-band families are built at. */
export const NYQUIST_FRACTIONS = [0.02, 0.05, 0.1, 0.14, 0.2, 0.3, 0.4, 0.5, 0.6, 0.7, 0.8, 0.9, 0.95, 0.98];

/** The time steps of the campaign, s. */
export const STEPS_S = [0.005, 0.01, 0.02];

/** Every narrow-band record of the campaign at `dtS`: each fraction, steady (phase 0 and π/2) and ramped. */
export function narrowBandFamily(dtS: number, fractions = NYQUIST_FRACTIONS): FamilyRecord[] {
  return fractions.flatMap((fraction) => {
    const f = (fraction * 0.5) / dtS;
    return [sineRecord(f, dtS), sineRecord(f, dtS, { phase: Math.PI / 2 }), sineRecord(f, dtS, { rampS: 2 })];
  });
}

/** Stochastic records (Kanai–Tajimi, Clough–Penzien; src/record/synth.ts) at `dtS`, seeded. */
export function broadbandFamily(dtS: number, seeds: readonly number[], groundFrequenciesHz = [2.5, 8]) {
  return seeds.flatMap((seed) =>
    groundFrequenciesHz
      .filter((fg) => fg < 0.4 / dtS)
      .map((fg): FamilyRecord => {
        const r = synthesizeRecord({ seed, dtS, durationS: 12, pgaG: 0.3, groundFrequencyHz: fg });
        return {
          label: `broadband seed ${seed}, f_g ${fg} Hz, Δt ${dtS} s`,
          family: 'broadband',
          dtS,
          accelMS2: r.accelMS2,
        };
      }),
  );
}
