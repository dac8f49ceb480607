// Floor spectra (floorSpectrum: the cascade of oscillator/cascade.ts) against the independent
// exact reference of the cascade (exact-cascade.ts: mathjs's expm of the joint building–oscillator
// system, sampled densely inside every record step, confirmed against ODEX in
// exact-cascade.test.ts), on invented narrow-band and broadband records, stiff and flexible
// buildings, T = 0 (the floor's peak acceleration) to 20 s, ζ = 0–0.5 and the documented
// high-damping range up to 10. Then broadening against the true windowed maximum of a spectrum
// computed on a grid far denser than the broadening's own. QUAKESWEEP_CAMPAIGN=1 runs every record
// of the families and prints the worst errors.
import { describe, expect, it } from 'vitest';
import { logSpaced } from '../../src/oscillator/grid.js';
import { createRecord } from '../../src/record/record.js';
import { floorSpectrum } from '../../src/spectrum/floor.js';
import { exactCascadePeaks } from './exact-cascade.js';
import { broadbandFamily, type FamilyRecord, narrowBandFamily, STEPS_S, sineRecord } from './families.js';

const CAMPAIGN = process.env.QUAKESWEEP_CAMPAIGN === '1';
const LIMIT = 0.005;
const DAMPINGS = CAMPAIGN ? [0, 0.02, 0.05, 0.5, 2, 10] : [0, 0.05, 0.5, 2];
const PERIODS = [0, ...logSpaced(0.01, 20, CAMPAIGN ? 11 : 6)];
/** A stiff building on a coarse record (the case), a mid-rise one and a flexible one; invented. */
const BUILDINGS = [
  { periodS: 0.08, damping: 0.05, modalFactor: 1.4 },
  { periodS: 0.5, damping: 0.02, modalFactor: 1.3 },
  { periodS: 2, damping: 0.05, modalFactor: 1.5 },
];

function floorRecords(): FamilyRecord[] {
  if (CAMPAIGN)
    return STEPS_S.flatMap((dtS) => [
      ...narrowBandFamily(dtS, [0.05, 0.3, 0.9, 0.98]).filter((_, i) => i % 3 !== 1),
      ...broadbandFamily(dtS, [51]),
    ]);
  return [
    sineRecord(3.5, 0.02, { rampS: 2, durationS: 4 }),
    sineRecord(22, 0.02, { phase: Math.PI / 2, durationS: 3 }),
    ...broadbandFamily(0.02, [51]).slice(0, 1),
  ];
}

const worst = new Map<string, { error: number; where: string }>();

describe.each(floorRecords())('floor spectra on the $label', (family) => {
  const ground = createRecord({ name: 'invented', dtS: family.dtS, accelMS2: family.accelMS2 });
  it.each(BUILDINGS)('T_b = $periodS s: SD, SV, SA within 0.5% of the exact cascade', (building) => {
    const { spectrum } = floorSpectrum(ground, building, { periodsS: PERIODS, dampings: DAMPINGS });
    spectrum.curves.forEach((curve, d) => {
      PERIODS.forEach((t, p) => {
        if (t === 0 && d > 0) return;
        const exact = exactCascadePeaks(family.accelMS2, family.dtS, building, t, curve.damping);
        const keys = t === 0 ? (['saMS2'] as const) : (['sdM', 'svMS', 'saMS2'] as const);
        for (const key of keys) {
          const error = curve[key][p] / exact[key] - 1;
          const where = `${key} T = ${t.toPrecision(3)} s, ζ = ${curve.damping}, T_b = ${building.periodS} s, ${family.label}`;
          const w = worst.get(family.family);
          if (w === undefined || Math.abs(error) > Math.abs(w.error))
            worst.set(family.family, { error, where });
          expect(Math.abs(error), where).toBeLessThan(LIMIT);
        }
      });
      // PSA at T = 0 is the floor's peak acceleration, which is SA there.
      if (PERIODS[0] === 0) expect(curve.psaMS2[0]).toBe(curve.saMS2[0]);
    });
  });
});

describe('broadening against the true windowed maximum', () => {
  // The true maximum over [T(1−b), T/(1−b)]: the unbroadened floor spectrum on 4,000 periods a
  // decade across the window (far denser than the broadening's internal grid), by the same cascade.
  const record = broadbandFamily(0.01, [61], [2.5])[0];
  const ground = createRecord({ name: 'invented', dtS: record.dtS, accelMS2: record.accelMS2 });
  const building = { periodS: 0.37, damping: 0.02, modalFactor: 1.6 };
  const b = 0.15;
  // A coarse user grid that does not hold the floor peak at T_b.
  const coarse = [0.05, 0.1, 0.2, 0.3, 0.45, 0.7, 1, 2];
  const dampings = [0.02, 0.05];
  const { spectrum } = floorSpectrum(ground, building, { periodsS: coarse, dampings }, b);
  it.each(coarse.map((t, p) => [t, p]))(
    'T = %s s: within 0.5% of the windowed maximum, never below it by more',
    (t, p) => {
      const window = Array.from(logSpaced(t * (1 - b), t / (1 - b), 600));
      const dense = floorSpectrum(ground, building, { periodsS: window, dampings }).spectrum;
      dense.curves.forEach((curve, d) => {
        for (const key of ['psaMS2', 'svMS', 'saMS2'] as const) {
          const truth = Math.max(...curve[key]);
          const ours = spectrum.curves[d][key][p];
          expect(ours / truth - 1, `${key} ζ ${curve.damping}`).toBeGreaterThan(-LIMIT);
          expect(ours / truth - 1, `${key} ζ ${curve.damping}`).toBeLessThan(LIMIT);
        }
      });
    },
  );
  it('does not depend on the output grid: a grid that holds the peak gives the same values', () => {
    const fine = [...coarse, building.periodS, 0.33, 0.41].sort((x, y) => x - y);
    const other = floorSpectrum(ground, building, { periodsS: fine, dampings }, b).spectrum;
    coarse.forEach((t, p) => {
      const q = fine.indexOf(t);
      spectrum.curves.forEach((curve, d) => {
        expect(Math.abs(curve.psaMS2[p] / other.curves[d].psaMS2[q] - 1)).toBeLessThan(1e-3);
      });
    });
  });
});

describe('campaign summary', () => {
  it.runIf(CAMPAIGN)('prints the worst error of every family', () => {
    const lines = [...worst].map(
      ([key, w]) => `${key.padEnd(14)} ${(w.error * 100).toFixed(3).padStart(7)}%  ${w.where}`,
    );
    process.stdout.write(`floor accuracy campaign, worst errors:\n${lines.sort().join('\n')}\n`);
    expect(worst.size).toBeGreaterThan(0);
  });
});
