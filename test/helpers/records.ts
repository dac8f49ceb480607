import { synthesizeRecord } from '../../src/record/synth.js';

/** A stochastic test record (invented data): Kanai–Tajimi noise, 4 Hz site, seeded. */
export function testRecord(seed: number, dtS = 0.02, durationS = 20) {
  return synthesizeRecord({ seed, dtS, durationS, pgaG: 0.3, groundFrequencyHz: 4 });
}

/** A sampled sine a0·sin(2πt/T) of `cycles` cycles with `perCycle` samples each. */
export function sineRecord(amplitude: number, periodS: number, cycles: number, perCycle: number) {
  const dtS = periodS / perCycle;
  const n = cycles * perCycle + 1;
  const accelMS2 = new Float64Array(n);
  for (let i = 0; i < n; i++) accelMS2[i] = amplitude * Math.sin((2 * Math.PI * i * dtS) / periodS);
  return { accelMS2, dtS };
}
