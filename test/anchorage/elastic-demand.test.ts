import { describe, expect, it } from 'vitest';
import {
  componentPsaOnCurve,
  psaAtPeriod,
  recordPsaForComponent,
} from '../../src/anchorage/elastic-demand.js';
import { STANDARD_GRAVITY_MS2 } from '../../src/base/units.js';
import { createRecord } from '../../src/record/record.js';

describe('psaAtPeriod', () => {
  it('log–log interpolation is exact for a power law PSA = 2·T^(−0.7) (closed form)', () => {
    const periods = [0.1, 0.2, 0.5, 1];
    const psa = periods.map((t) => 2 * t ** -0.7);
    const value = psaAtPeriod(periods, psa, 0.3);
    expect(value.psaG).toBeCloseTo(2 * 0.3 ** -0.7, 12);
    expect(value.how).toMatch(/log–log/);
  });

  it('takes grid points as they are and refuses to extrapolate', () => {
    expect(psaAtPeriod([0, 0.1, 1], [0.4, 1, 0.3], 0.1).psaG).toBe(1);
    expect(() => psaAtPeriod([0, 0.1, 1], [0.4, 1, 0.3], 2)).toThrow(/outside/);
  });

  it('between T = 0 and the first period: linear in T', () => {
    expect(psaAtPeriod([0, 0.1, 1], [0.4, 1, 0.3], 0.05).psaG).toBeCloseTo(0.7, 12);
  });
});

describe('recordPsaForComponent', () => {
  it('rigid component: PGA of the record', () => {
    const record = createRecord({
      name: 'r',
      dtS: 0.01,
      accelMS2: Float64Array.from([0, 0.3 * STANDARD_GRAVITY_MS2, -0.5 * STANDARD_GRAVITY_MS2, 0]),
    });
    expect(recordPsaForComponent(record, 'rigid', 0.05, 'piecewise-exact').psaG).toBeCloseTo(0.5, 12);
  });

  it('a long harmonic at resonance, ζ = 5%: PSA → A/(2ζ) (Chopra §3.2)', () => {
    // Ground a_g = A sin(ωt) at the oscillator's own frequency: steady amplitude of u is A/(2ζω²),
    // so PSA = ω²·SD → A/(2ζ) = 10A at ζ = 0.05 once the transient (e^(−ζωt)) has died out.
    const dt = 0.005;
    const period = 0.5;
    const omega = (2 * Math.PI) / period;
    const n = Math.round(60 / dt);
    const accel = new Float64Array(n);
    for (let i = 0; i < n; i++) accel[i] = 0.1 * STANDARD_GRAVITY_MS2 * Math.sin(omega * i * dt);
    const record = createRecord({ name: 'sine', dtS: dt, accelMS2: accel });
    const value = recordPsaForComponent(record, period, 0.05, 'piecewise-exact');
    expect(value.psaG).toBeCloseTo(1.0, 2);
  });
});

describe('componentPsaOnCurve', () => {
  const g = STANDARD_GRAVITY_MS2;
  const periodsS = [0, 0.1, 1];
  const psaMS2 = [0.5 * g, 1.0 * g, 0.25 * g];

  it('reads the curve at the period, log–log between grid periods (hand calculation)', () => {
    expect(componentPsaOnCurve(0.1, periodsS, psaMS2, 0, { curve: 'c', pga: 'p' }).psaG).toBeCloseTo(1, 12);
    // log–log between (0.1 s, 1 g) and (1 s, 0.25 g): at √0.1 s, √(1·0.25) = 0.5 g
    const mid = componentPsaOnCurve(Math.sqrt(0.1), periodsS, psaMS2, 0, { curve: 'c', pga: 'p' });
    expect(mid.psaG).toBeCloseTo(0.5, 12);
  });

  it('a rigid component takes the curve at T = 0, or the PGA given when the grid has no T = 0', () => {
    const names = { curve: 'floor envelope', pga: 'largest floor PGA' };
    const atZero = componentPsaOnCurve('rigid', periodsS, psaMS2, 9 * g, names);
    expect(atZero).toEqual({
      psaG: 0.5,
      how: 'PSA at T = 0 of the floor envelope (largest floor PGA), rigid component',
    });
    const noZero = componentPsaOnCurve('rigid', [0.1, 1], [g, 0.25 * g], 0.3 * g, names);
    expect(noZero.psaG).toBeCloseTo(0.3, 12);
    expect(noZero.how).toBe('largest floor PGA, rigid component');
  });
});
