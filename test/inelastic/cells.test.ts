import { describe, expect, it } from 'vitest';
import { STANDARD_GRAVITY_MS2 } from '../../src/base/units.js';
import {
  demandCell,
  demandCellLength,
  ductilityCell,
  ductilityCellLength,
} from '../../src/inelastic/cells.js';
import { planDemandSpectra, planDuctilitySpectra } from '../../src/inelastic/ductility.js';
import { strengthCell, strengthsForDuctilities } from '../../src/inelastic/strength-search.js';
import { yieldingPeak } from '../../src/inelastic/yielding.js';
import { recordRoughness } from '../../src/oscillator/record-statistics.js';
import { synthesizeRecord } from '../../src/record/synth.js';

// An invented motion of 400 samples (the seeded generator of the demo data).
const record = synthesizeRecord({ seed: 18, dtS: 0.01, durationS: 3.99 });
const { accelMS2, dtS } = record;
const model = { kind: 'elastoplastic' } as const;
const roughness = recordRoughness(accelMS2);
const periodsS = [0, 0.3, 1.1];
const dampings = [0.02, 0.05];

/** A results array of `cells` cells, every number NaN until a cell writes it. */
const unwritten = (cells: number, length: number) => new Float64Array(cells * length).fill(Number.NaN);

describe('ductilityCell', () => {
  // The plan of ductility.ts: its elastic peaks u_o are the elastic engine's SD.
  const plan = planDuctilitySpectra(record, { model, periodsS, dampings, ductilities: [1, 2, 5] });
  const length = ductilityCellLength(plan);

  it('writes the strength search of its own (damping, period) and nothing else', () => {
    // Cell 5 = damping 1 (5%), period 2 (1.1 s): damping-major, as the curves.
    const results = unwritten(6, length);
    ductilityCell(accelMS2, dtS, plan, 5, results);
    const found = strengthsForDuctilities(
      accelMS2,
      dtS,
      strengthCell(1.1, 0.05, model, dtS, roughness, plan.elasticSdM[5]),
      plan.ductilities,
    );
    const expected = [found.elasticPeakM, found.runs];
    for (let d = 0; d < 3; d++) expected.push(found.strengthRatio[d], found.peakM[d], found.achieved[d]);
    expect(length).toBe(expected.length);
    expect(Array.from(results.subarray(5 * length))).toEqual(expected);
    expect(results.subarray(0, 5 * length).every(Number.isNaN)).toBe(true);
  });

  it('writes nothing for a rigid oscillator (T = 0): the assembly gives it the PGA', () => {
    const results = unwritten(6, length);
    ductilityCell(accelMS2, dtS, plan, 3, results);
    expect(results.every(Number.isNaN)).toBe(true);
  });
});

describe('demandCell', () => {
  const base = { model, periodsS: periodsS.slice(1), dampings };

  it('writes u_o, then u_y = u_o/R_y, μ, u_m and the yield events of each strength', () => {
    const plan = planDemandSpectra(record, { ...base, ry: [2, 5] });
    const length = demandCellLength(plan);
    const results = unwritten(4, length);
    demandCell(accelMS2, dtS, plan, 1, results); // damping 0 (2%), period 1 (1.1 s)
    const cell = results.subarray(length, 2 * length);
    const options = { periodS: 1.1, damping: 0.02, model };
    const uo = plan.elasticSdM[1]; // the elastic engine's SD (planDemandSpectra)
    expect(uo).toBeGreaterThan(0);
    expect(cell[0]).toBe(uo);
    for (const [k, ry] of [2, 5].entries()) {
      const uyM = uo / ry;
      const peak = yieldingPeak(accelMS2, dtS, { ...options, yieldDisplacementM: uyM });
      expect(Array.from(cell.subarray(1 + 4 * k, 5 + 4 * k))).toEqual([
        uyM,
        peak.ductility,
        peak.peakDisplacementM,
        peak.yieldEvents,
      ]);
      // The ductility is u_m/u_y (its definition).
      expect(cell[2 + 4 * k]).toBeCloseTo(cell[3 + 4 * k] / uyM, 12);
    }
    expect(results.subarray(0, length).every(Number.isNaN)).toBe(true);
    expect(results.subarray(2 * length).every(Number.isNaN)).toBe(true);
  });

  it('takes a strength given as A_y in g as u_y = A_y·g/ω² (closed form: f_y = m·A_y, k = mω²)', () => {
    const plan = planDemandSpectra(record, { ...base, ayG: [0.1] });
    const results = unwritten(4, demandCellLength(plan));
    demandCell(accelMS2, dtS, plan, 2, results); // damping 1 (5%), period 0 (0.3 s)
    const omega = (2 * Math.PI) / 0.3;
    const at = 2 * demandCellLength(plan);
    expect(results[at + 1]).toBeCloseTo((0.1 * STANDARD_GRAVITY_MS2) / omega ** 2, 15);
  });
});
