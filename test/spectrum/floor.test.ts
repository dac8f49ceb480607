import { describe, expect, it } from 'vitest';
import { createRecord } from '../../src/record/record.js';
import { broadenCurve } from '../../src/spectrum/broaden.js';
import { floorRecord, floorSpectrum } from '../../src/spectrum/floor.js';
import { responseSpectrum } from '../../src/spectrum/spectrum.js';

/** An invented test motion: three sines under a smooth envelope (not a real record). */
function testRecord(dtS = 0.01, seconds = 12) {
  const n = Math.round(seconds / dtS);
  const a = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    const t = i * dtS;
    const envelope = Math.min(1, t / 2) * Math.exp(-Math.max(0, t - 6) / 2);
    a[i] =
      3 *
      envelope *
      (Math.sin(2 * Math.PI * 2.1 * t) +
        0.6 * Math.sin(2 * Math.PI * 0.9 * t + 1) +
        0.4 * Math.sin(2 * Math.PI * 5.3 * t + 2));
  }
  return createRecord({ name: 'invented', dtS, accelMS2: a });
}

const grid = {
  periodsS: [0, 0.05, 0.1, 0.2, 0.5, 1, 2],
  dampings: [0.05],
  method: 'piecewise-exact' as const,
};

describe('floorRecord', () => {
  it("a very stiff building (T_b = 0.001 s) moves with the ground: floor spectrum = ground spectrum (q'' ≈ −ä_g/ω_b² → 0, closed form)", () => {
    const ground = testRecord();
    const floor = floorSpectrum(ground, { periodS: 0.001, damping: 0.05, modalFactor: 1.5 }, grid);
    const reference = responseSpectrum(ground, grid);
    for (let p = 0; p < grid.periodsS.length; p++) {
      const expected = reference.curves[0].psaMS2[p];
      expect(Math.abs(floor.spectrum.curves[0].psaMS2[p] - expected)).toBeLessThan(0.005 * expected);
    }
  });

  it('Γφ = 0 gives the ground motion exactly', () => {
    const ground = testRecord();
    const floor = floorRecord(ground, { periodS: 0.5, damping: 0.05, modalFactor: 0 });
    expect(Array.from(floor.accelMS2)).toEqual(Array.from(ground.accelMS2));
    expect(floor.processing.at(-1)?.operation).toBe('floor');
  });

  it('Γφ = 1 under a long harmonic: steady floor amplitude = transmissibility √(1+(2ζr)²)/√((1−r²)²+(2ζr)²) (Chopra §3.6)', () => {
    const dtS = 0.002;
    const n = Math.round(80 / dtS);
    const forcingHz = 1.5;
    const a = new Float64Array(n);
    for (let i = 0; i < n; i++) a[i] = Math.sin(2 * Math.PI * forcingHz * i * dtS);
    const ground = createRecord({ name: 'sine', dtS, accelMS2: a });
    const building = { periodS: 0.5, damping: 0.1, modalFactor: 1 };
    const floor = floorRecord(ground, building);
    const r = forcingHz * building.periodS; // forcing over natural frequency
    const z = 2 * building.damping * r;
    const expected = Math.sqrt(1 + z * z) / Math.sqrt((1 - r * r) ** 2 + z * z);
    let peak = 0;
    for (let i = Math.round(60 / dtS); i < n; i++) peak = Math.max(peak, Math.abs(floor.accelMS2[i]));
    expect(peak).toBeCloseTo(expected, 2);
  });
});

describe('broadenCurve (peak broadening, US NRC RG 1.122, from memory; window reading stated in floor.ts)', () => {
  it('is never below the unbroadened spectrum', () => {
    const ground = testRecord();
    const periods = Array.from({ length: 60 }, (_, i) => 0.02 * 1.08 ** i);
    const spectrum = responseSpectrum(ground, { periodsS: periods, dampings: [0.05] });
    const raw = spectrum.curves[0].psaMS2;
    const broad = broadenCurve(periods, raw);
    for (let i = 0; i < periods.length; i++) expect(broad[i]).toBeGreaterThanOrEqual(raw[i]);
    const floor = floorSpectrum(
      ground,
      { periodS: 0.4, damping: 0.05, modalFactor: 1.3 },
      { periodsS: periods, dampings: [0.05] },
      0.15,
    );
    for (let i = 0; i < periods.length; i++) {
      expect(floor.spectrum.curves[0].psaMS2[i]).toBeGreaterThanOrEqual(
        floor.unbroadened.curves[0].psaMS2[i],
      );
    }
  });

  it('turns a single peak at T_p into a plateau over [0.85 T_p, T_p/0.85] and leaves the rest', () => {
    const periods = [0.5, 0.8, 0.84, 0.86, 1, 1.17, 1.18, 1.5];
    const values = periods.map((t) => (t === 1 ? 10 : 1));
    const broad = broadenCurve(periods, values, 0.15);
    // T = 0.86: window [0.731, 1.012] holds T_p = 1 → 10. T = 1.17: window [0.9945, 1.376] → 10.
    // T = 0.84: window [0.714, 0.988] misses 1 → but its end 0.988 lies between 0.86 and 1 (log–log), so < 10.
    expect(broad[3]).toBe(10);
    expect(broad[5]).toBe(10);
    expect(broad[2]).toBeLessThan(10);
    expect(broad[6]).toBeLessThan(10); // 1.18·0.85 = 1.003 > 1
    expect(broad[0]).toBe(1);
    expect(broad[7]).toBeLessThan(10);
  });
});
