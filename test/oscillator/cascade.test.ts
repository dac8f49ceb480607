import { describe, expect, it } from 'vitest';
import { cascadePeak, cascadeRecord, cascadeStep, cascadeSubsteps } from '../../src/oscillator/cascade.js';
import { piecewiseExactCoefficients } from '../../src/oscillator/recurrence.js';
import { sweepOscillators } from '../../src/oscillator/sweep.js';
import { testRecord } from '../helpers/records.js';

describe('cascadeStep (the joint building–oscillator step, Van Loan 1978)', () => {
  it("has the building's and the oscillator's own piecewise-exact steps on its diagonal blocks (Γφ = 0)", () => {
    const building = { periodS: 0.6, damping: 0.04, modalFactor: 0 };
    const omega = (2 * Math.PI) / 0.25;
    const e = cascadeStep(building, omega, 0.03, 0.004);
    const b = piecewiseExactCoefficients((2 * Math.PI) / 0.6, 0.04, 0.004);
    const o = piecewiseExactCoefficients(omega, 0.03, 0.004);
    const close = (x: number, y: number) =>
      expect(Math.abs(x - y)).toBeLessThan(1e-14 * Math.max(1, Math.abs(y)));
    close(e[0], b.uu);
    close(e[1], b.uv);
    close(e[4], b.up0);
    close(e[5], b.up1);
    close(e[14], o.uu);
    close(e[15], o.uv);
    close(e[16], o.up0);
    close(e[23], o.vp1);
    // With Γφ = 0 the oscillator does not see the building.
    expect(e[12]).toBe(0);
    expect(e[13]).toBe(0);
  });
});

describe('cascadePeak', () => {
  it('with Γφ = 0 gives the ground spectrum of the piecewise-exact sweep (to its peak search)', () => {
    const record = testRecord(5, 0.01, 10);
    const periods = [0.05, 0.2, 0.7, 2];
    const dampings = [0, 0.05];
    const sweep = sweepOscillators(record.accelMS2, 0.01, {
      periodsS: periods,
      dampings,
      method: 'piecewise-exact',
    });
    const cascade = cascadeRecord(record.accelMS2, 0.01);
    dampings.forEach((zeta, d) => {
      periods.forEach((t, p) => {
        const ours = cascadePeak(cascade, { periodS: 0.9, damping: 0.05, modalFactor: 0 }, t, zeta);
        const i = d * periods.length + p;
        expect(Math.abs(ours.sdM / sweep.sdM[i] - 1)).toBeLessThan(1e-3);
        expect(Math.abs(ours.saMS2 / sweep.saMS2[i] - 1)).toBeLessThan(1e-3);
      });
    });
  });

  it('Γφ = 1 under a long sine: steady SD = A·TR_b/ω²·|H(r)| (Chopra, Dynamics of Structures, §3.2 and §3.6)', () => {
    // a_g = A sin Ωt; the floor moves with amplitude A·TR_b, TR_b = √(1+(2ζ_b r_b)²)/√((1−r_b²)²+(2ζ_b r_b)²);
    // the oscillator's steady relative displacement is A·TR_b/(ω²·√((1−r²)²+(2ζr)²)).
    const dtS = 0.005;
    const forcingHz = 1.25;
    const accel = Float64Array.from(
      { length: Math.round(120 / dtS) },
      (_, i) =>
        Math.sin((Math.PI / 2) * Math.min(1, (i * dtS) / 30)) ** 2 *
        Math.sin(2 * Math.PI * forcingHz * i * dtS),
    );
    const building = { periodS: 0.5, damping: 0.2, modalFactor: 1 };
    const periodS = 0.4;
    const zeta = 0.25;
    const rb = forcingHz * building.periodS;
    const r = forcingHz * periodS;
    const trb = Math.sqrt(1 + (2 * 0.2 * rb) ** 2) / Math.sqrt((1 - rb * rb) ** 2 + (2 * 0.2 * rb) ** 2);
    const omega = (2 * Math.PI) / periodS;
    const steady = trb / (omega * omega * Math.sqrt((1 - r * r) ** 2 + (2 * zeta * r) ** 2));
    // Ramped in smoothly over 30 s, so that no start-up transient overshoots the steady amplitude.
    const peak = cascadePeak(cascadeRecord(accel, dtS), building, periodS, zeta);
    expect(Math.abs(peak.sdM / steady - 1)).toBeLessThan(1e-3);
  });

  it('sub-steps: 10 a period of the oscillator and of the building, and what the record roughness asks', () => {
    const record = cascadeRecord(testRecord(5, 0.02, 4).accelMS2, 0.02);
    const building = { periodS: 0.05, damping: 0.05, modalFactor: 1.2 };
    expect(cascadeSubsteps(record, building, 1, 0.05)).toBe(4); // ⌈10·0.02/0.05⌉ for the building
    expect(cascadeSubsteps(record, { ...building, periodS: 2 }, 0.01, 0.05)).toBe(20);
    expect(cascadeSubsteps(record, { ...building, periodS: 2 }, 0.01, 2)).toBe(80); // ×2ζ above ζ = 0.5
  });
});
