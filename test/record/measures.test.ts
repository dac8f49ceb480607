import { describe, expect, it } from 'vitest';
import { STANDARD_GRAVITY_MS2 as G } from '../../src/base/units.js';
import {
  ariasIntensity,
  bracketedDuration,
  cumulativeAbsoluteVelocity,
  groundMotionMeasures,
  husidCurve,
  meanPeriod,
  timeToReach,
} from '../../src/record/measures.js';
import { createRecord } from '../../src/record/record.js';

const dtS = 0.001;

function sampled(durationS: number, f: (t: number) => number): Float64Array {
  const n = Math.round(durationS / dtS) + 1;
  return Float64Array.from({ length: n }, (_, i) => f(i * dtS));
}

describe('Arias intensity (Arias 1970) and CAV (EPRI 1988)', () => {
  const A = 2.5;
  const T = 10; // 20 whole cycles of a 2 Hz sine
  const sine = sampled(T, (t) => A * Math.sin(2 * Math.PI * 2 * t));
  const constant = sampled(T, () => -1.2);

  it('of a sine over whole cycles: I_a = π A² T/(4g) (closed form)', () => {
    expect(ariasIntensity(sine, dtS)).toBeCloseTo((Math.PI * A * A * T) / (4 * G), 10);
  });
  it('of a constant c: I_a = π c² T/(2g) (closed form)', () => {
    expect(ariasIntensity(constant, dtS)).toBeCloseTo((Math.PI * 1.44 * T) / (2 * G), 10);
  });
  it('CAV of a sine over whole cycles: 2AT/π (closed form)', () => {
    expect(cumulativeAbsoluteVelocity(sine, dtS) / ((2 * A * T) / Math.PI)).toBeCloseTo(1, 4); // trapezoid error O(Δt²) at the kinks
  });
  it('CAV of a constant c: |c|·T (closed form)', () => {
    expect(cumulativeAbsoluteVelocity(constant, dtS)).toBeCloseTo(1.2 * T, 10);
  });
});

describe('significant duration (Trifunac and Brady 1975) from a known Husid curve', () => {
  it('a constant amplitude has H(t) = t/T, so D5–95 = 0.9T and D5–75 = 0.7T (closed form)', () => {
    const T = 20;
    const husid = husidCurve(
      sampled(T, () => 0.3),
      dtS,
    );
    const t5S = timeToReach(husid, dtS, 0.05);
    expect(timeToReach(husid, dtS, 0.95) - t5S).toBeCloseTo(0.9 * T, 9);
    expect(timeToReach(husid, dtS, 0.75) - t5S).toBeCloseTo(0.7 * T, 9);
  });

  it('amplitude 1 then 2: H(T/2) = 0.2, so t5 = T/8, t95 = 31T/32, D5–95 = 27T/32 (closed form)', () => {
    const T = 16;
    const husid = husidCurve(
      sampled(T, (t) => (t < T / 2 ? 1 : 2)),
      dtS,
    );
    const t5S = timeToReach(husid, dtS, 0.05);
    const t95S = timeToReach(husid, dtS, 0.95);
    expect(t5S).toBeCloseTo(T / 8, 2);
    expect(t95S).toBeCloseTo((31 * T) / 32, 2);
    expect(t95S - t5S).toBeCloseTo((27 * T) / 32, 2);
  });
});

describe('bracketed duration (Bolt 1973)', () => {
  it('runs from the first to the last exceedance', () => {
    const a = new Float64Array(1001);
    a[120] = 0.6;
    a[500] = -0.8;
    a[870] = 0.5;
    a[950] = 0.1;
    const b = bracketedDuration(a, 0.01, 0.05 * G);
    expect(b.startS).toBeCloseTo(1.2, 12);
    expect(b.endS).toBeCloseTo(8.7, 12);
    expect(b.durationS).toBeCloseTo(7.5, 12);
  });
  it('is 0 when the threshold is never reached', () => {
    expect(bracketedDuration(new Float64Array(100).fill(0.1), 0.01, 0.05 * G).durationS).toBe(0);
  });
});

describe('mean period (Rathje, Abrahamson and Bray 1998, eq. 3)', () => {
  it('of a single on-bin sine at f0 is 1/f0 (closed form: one Fourier line)', () => {
    const n = 8192;
    const step = 0.005;
    const bin = 164; // f0 = 164 / 40.96 s ≈ 4.0 Hz
    const values = Float64Array.from({ length: n }, (_, j) => Math.sin((2 * Math.PI * bin * j) / n));
    const { periodS } = meanPeriod(values, step);
    expect(periodS).toBeCloseTo((n * step) / bin, 9);
  });

  it('of two equal on-bin sines at f1, f2 is (1/f1 + 1/f2)/2 (closed form)', () => {
    const n = 8192;
    const step = 0.005;
    const values = Float64Array.from(
      { length: n },
      (_, j) => Math.sin((2 * Math.PI * 41 * j) / n) + Math.sin((2 * Math.PI * 410 * j) / n),
    );
    const T = n * step;
    expect(meanPeriod(values, step).periodS).toBeCloseTo((T / 41 + T / 410) / 2, 9);
  });
});

describe('groundMotionMeasures', () => {
  it('peaks and their times of a = cos ωt: PGV = 1/ω at T/4, PGD = 2/ω² at T/2 (closed form)', () => {
    const omega = 2 * Math.PI;
    const accelMS2 = sampled(0.75, (t) => Math.cos(omega * t));
    const m = groundMotionMeasures(createRecord({ name: 'cos', dtS, accelMS2 }));
    expect(m.pga.value).toBe(1);
    expect(m.pga.timeS).toBe(0);
    // The trapezoidal rule's error is (ωΔt)²/12 relative, about 3·10⁻⁶ here.
    expect(m.pgv.value).toBeCloseTo(1 / omega, 5);
    expect(m.pgv.timeS).toBeCloseTo(0.25, 3);
    // d = (1 − cos ωt)/ω², largest at t = T/2.
    expect(m.pgd.value).toBeCloseTo(2 / omega ** 2, 5);
    expect(m.pgd.timeS).toBeCloseTo(0.5, 3);
    expect(m.bracketThresholdMS2).toBeCloseTo(0.05 * G, 12);
  });
});
