// The equal-displacement and equal-energy rules (Veletsos and Newmark 1960; Newmark and Hall 1982;
// Chopra, Dynamics of Structures, §7.10, from memory) as a sanity band, common practice: on a
// stochastic record, at long periods the yielding oscillator's peak displacement is about the
// elastic one, R_y ≈ μ; near the predominant period, the energies are about equal,
// R_y ≈ √(2μ − 1). Single records scatter widely about both rules (a resonant build-up near the
// record's longest periods gives R_y well above μ), so the bands are loose: the mean ratio over a
// few periods and ductilities within [0.6, 1.5], each cell within a factor of 3.
import { describe, expect, it } from 'vitest';
import { constantDuctilitySpectra } from '../../src/inelastic/ductility.js';
import { synthesizeRecord } from '../../src/record/synth.js';

const ductilities = [2, 4, 6];
const records = [18, 1818].map((seed) => synthesizeRecord({ seed, dtS: 0.01, durationS: 30, pgaG: 0.4 }));

function ratios(periodsS: number[], rule: (mu: number) => number, seed: number) {
  const spectra = constantDuctilitySpectra(records[seed], {
    periodsS,
    dampings: [0.05],
    ductilities,
    model: { kind: 'elastoplastic' },
  });
  return spectra.curves.flatMap((curve) => Array.from(curve.ry, (ry) => ry / rule(curve.ductility)));
}

function expectInBand(values: number[]) {
  const mean = values.reduce((sum, value) => sum + value, 0) / values.length;
  expect(mean).toBeGreaterThan(0.6);
  expect(mean).toBeLessThan(1.5);
  for (const value of values) {
    expect(value).toBeGreaterThan(1 / 3);
    expect(value).toBeLessThan(3);
  }
}

describe.each([0, 1])('on stochastic record %i (a 2.5 Hz site)', (seed) => {
  it('equal displacement at T = 2–5 s: R_y ≈ μ (common practice)', () => {
    expectInBand(ratios([2, 3, 4, 5], (mu) => mu, seed));
  });
  it('equal energy at T = 0.2–0.5 s: R_y ≈ √(2μ − 1) (common practice)', () => {
    expectInBand(ratios([0.2, 0.3, 0.4, 0.5], (mu) => Math.sqrt(2 * mu - 1), seed));
  });
});
