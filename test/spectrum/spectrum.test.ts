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
