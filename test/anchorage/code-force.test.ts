import { describe, expect, it } from 'vitest';
import {
  codeHorizontalForce,
  counteractingDeadLoadFactor,
  verticalForce,
} from '../../src/anchorage/code-force.js';

// Source: ASCE/SEI 7-16 §13.3.1, Eqs. 13.3-1 to 13.3-3 and §13.3.1.2; the numbers are hand calculations.
const generator = { weightKN: 45, zM: 0, hM: 10, ap: 2.5, rp: 2, ip: 1.5, sds: 1 };

describe('codeHorizontalForce (ASCE/SEI 7-16 §13.3.1)', () => {
  it('grade mounting: F_p = 0.4·2.5·1.0·45·(1 + 0)/(2/1.5) = 45/1.3333 = 33.75', () => {
    const f = codeHorizontalForce(generator);
    expect(f.fp).toBeCloseTo(33.75, 10);
    expect(f.bound).toBe('formula');
    // bounds: 0.3·1.0·1.5·45 = 20.25 and 1.6·1.0·1.5·45 = 108
    expect(f.fpMin).toBeCloseTo(20.25, 10);
    expect(f.fpMax).toBeCloseTo(108, 10);
  });

  it('roof mounting z = h: (1 + 2z/h) = 3, F_p = 3·33.75 = 101.25 (< 108, formula governs)', () => {
    const f = codeHorizontalForce({ ...generator, zM: 10 });
    expect(f.fp).toBeCloseTo(101.25, 10);
    expect(f.bound).toBe('formula');
  });

  it('mid-height z = h/2: (1 + 1) = 2, F_p = 67.5', () => {
    expect(codeHorizontalForce({ ...generator, zM: 5 }).fp).toBeCloseTo(67.5, 10);
  });

  it('lower bound governs: a_p 1, R_p 6, I_p 1 → 0.4·W/6 = 0.0667W < 0.3 S_DS I_p W = 0.3W', () => {
    const f = codeHorizontalForce({ weightKN: 100, zM: 0, hM: 10, ap: 1, rp: 6, ip: 1, sds: 1 });
    expect(f.fpFormula).toBeCloseTo(100 * (0.4 / 6), 10);
    expect(f.fp).toBeCloseTo(30, 10);
    expect(f.bound).toBe('minimum');
  });

  it('upper bound governs: a_p 2.5, R_p 1, I_p 1.5, roof → 0.4·2.5·3·1.5 W = 4.5W > 1.6·1.5 W = 2.4W', () => {
    const f = codeHorizontalForce({ weightKN: 100, zM: 10, hM: 10, ap: 2.5, rp: 1, ip: 1.5, sds: 1 });
    expect(f.fpFormula).toBeCloseTo(450, 10);
    expect(f.fp).toBeCloseTo(240, 10);
    expect(f.bound).toBe('maximum');
  });

  it('z/h need not exceed 1.0 (§13.3.1): z = 2h gives the roof value and says it was capped', () => {
    const f = codeHorizontalForce({ ...generator, zM: 20 });
    expect(f.fp).toBeCloseTo(101.25, 10);
    expect(f.heightRatio).toBe(1);
    expect(f.heightRatioCapped).toBe(true);
  });

  it('E_v = 0.2 S_DS W_p (§13.3.1.2): 0.2·1.2·50 = 12; dead-load factor 0.9 − 0.2·1.2 = 0.66 (§2.3.6)', () => {
    expect(verticalForce({ weightKN: 50, sds: 1.2 })).toBeCloseTo(12, 12);
    expect(counteractingDeadLoadFactor(1.2)).toBeCloseTo(0.66, 12);
  });
});
