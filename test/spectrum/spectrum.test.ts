/** The thread policy of the spectrum API: the same numbers whatever the threads (bit for bit, by construction). */
import { describe, expect, it } from 'vitest';
import { synthesizeRecord } from '../../src/record/synth.js';
import { responseSpectrum, responseSpectrumParallel } from '../../src/spectrum/spectrum.js';

const record = synthesizeRecord({ seed: 7, dtS: 0.01, durationS: 20 });
const grid = { periodsS: [0, 0.1, 0.5, 1, 2], dampings: [0.02, 0.05] };

describe('responseSpectrumParallel', () => {
  it('gives the bits of responseSpectrum on one thread, on two, and with auto', async () => {
    const alone = responseSpectrum(record, grid);
    for (const threads of [1, 2, 'auto'] as const) {
      const split = await responseSpectrumParallel(record, { ...grid, threads });
      expect(split.curves.map((c) => Array.from(c.sdM))).toEqual(alone.curves.map((c) => Array.from(c.sdM)));
      expect(split.oscillatorSteps).toBe(alone.oscillatorSteps);
    }
  });
});

describe('a damping above the measured range of the accuracy rule (ζ > 10) is warned in the spectrum itself', () => {
  // docs/methods-and-verification.md: the rule was measured for ζ = 0–10 and spot-checked beyond.
  const record = synthesizeRecord({ seed: 7, dtS: 0.01, durationS: 4, pgaG: 0.3, groundFrequencyHz: 2.5 });
  const warnings = (dampings: number[]) =>
    responseSpectrum(record, { periodsS: [0.5], dampings }).record.processing.filter(
      (step) => step.operation === 'warning',
    );
  it('at ζ = 20 every output of the spectrum carries it (its record processing list)', () => {
    const found = warnings([0.05, 20]);
    expect(found).toHaveLength(1);
    expect(found[0].description).toMatch(/2000% is above 1000%/);
  });
  it('not at ζ = 10', () => {
    expect(warnings([0.05, 10])).toHaveLength(0);
  });
});
