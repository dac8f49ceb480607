import { describe, expect, it } from 'vitest';
import {
  asce722HorizontalForce,
  ductilityFactor,
  heightFactor,
} from '../../src/anchorage/code-force-7-22.js';

// Source: ASCE/SEI 7-22 §13.3.1, Eqs. 13.3-1 to 13.3-6; every expected value is a hand calculation
// written out beside it. No published worked example of the 7-22 force is used (none known to us).
// An invented building: R = 8, Ω₀ = 3, I_e = 1 → R_μ = (1.1·8/(1·3))^½ = (2.93333)^½ = 1.712698.
const building = { r: 8, omega0: 3, ie: 1, taS: null };
const RMU = 1.7126976771553506;
// W_p = 100 kN, S_DS = 1.0 g, I_p = 1 → 0.4 S_DS I_p W_p = 40 kN; bounds 30 kN (Eq. 13.3-3), 160 kN (Eq. 13.3-2).
const base = { weightKN: 100, zM: 10, hM: 20, car: 1, rpo: 1, ip: 1, sds: 1, building };

describe('heightFactor (ASCE/SEI 7-22 §13.3.1.1)', () => {
  it('T_a not known: Eq. 13.3-5, H_f = 1 + 2.5 z/h (mid-height 2.25, roof 3.5)', () => {
    expect(heightFactor(0.5, null, false)).toMatchObject({ hf: 2.25, equation: 'Eq. 13.3-5', a1: null });
    expect(heightFactor(1, null, false).hf).toBeCloseTo(3.5, 12);
  });

  it('T_a = 1.0 s: a₁ = 1, a₂ = 1 − 0.16 = 0.84; roof 2.84, mid-height 1 + 0.5 + 0.84/1024 = 1.5008203', () => {
    const roof = heightFactor(1, 1.0, false);
    expect(roof.a1).toBeCloseTo(1, 12);
    expect(roof.a2).toBeCloseTo(0.84, 12);
    expect(roof.hf).toBeCloseTo(2.84, 12);
    expect(roof.equation).toBe('Eq. 13.3-4');
    expect(heightFactor(0.5, 1.0, false).hf).toBeCloseTo(1.5008203125, 12);
  });

  it('T_a = 0.5 s at z/h = 0.75: a₁ = 2, a₂ = 0.36; H_f = 1 + 1.5 + 0.36·0.75¹⁰ = 2.5202729', () => {
    const f = heightFactor(0.75, 0.5, false);
    expect(f.a1).toBeCloseTo(2, 12);
    expect(f.a2).toBeCloseTo(0.36, 12);
    expect(f.hf).toBeCloseTo(2.5202728652954103, 12); // 0.75¹⁰ = 0.0563135147
    expect(f.a1Capped || f.a2Floored).toBe(false);
  });

  it('T_a = 0.3 s: a₁ = 1/0.3 = 3.33 capped at 2.5, a₂ = 1 − 1.778 < 0 floored at 0; roof 3.5 (= Eq. 13.3-5)', () => {
    const f = heightFactor(1, 0.3, false);
    expect(f).toMatchObject({ a1: 2.5, a2: 0, a1Capped: true, a2Floored: true });
    expect(f.hf).toBeCloseTo(3.5, 12);
  });

  it('T_a = 0.4 s, the edge: a₁ = 2.5 exactly, a₂ = 0 exactly, neither capped nor floored', () => {
    const f = heightFactor(1, 0.4, false);
    expect(f.a1).toBeCloseTo(2.5, 12);
    expect(f.a2).toBeCloseTo(0, 12);
    expect(f.hf).toBeCloseTo(3.5, 12);
  });

  it('at or below grade H_f = 1 whatever T_a (§13.3.1.1)', () => {
    expect(heightFactor(0, 0.3, true)).toMatchObject({ hf: 1, equation: 'at or below grade' });
  });
});

describe('ductilityFactor (ASCE/SEI 7-22 §13.3.1.2, Eq. 13.3-6)', () => {
  it('R 8, Ω₀ 3, I_e 1: (1.1·8/3)^½ = 1.712698, above the 1.3 floor', () => {
    const f = ductilityFactor(building, false);
    expect(f.rmu).toBeCloseTo(RMU, 12);
    expect(f.floored).toBe(false);
  });

  it('R 2, Ω₀ 2.5, I_e 1.5: (2.2/3.75)^½ = 0.76594 → R_μ = 1.3 (the floor)', () => {
    const f = ductilityFactor({ r: 2, omega0: 2.5, ie: 1.5, taS: null }, false);
    expect(f.formula).toBeCloseTo(0.7659416862050705, 12);
    expect(f.rmu).toBe(1.3);
    expect(f.floored).toBe(true);
  });

  it('R 3.5, Ω₀ 3, I_e 1.25: (3.85/3.75)^½ = 1.01325, just above 1 and still floored at 1.3', () => {
    const f = ductilityFactor({ r: 3.5, omega0: 3, ie: 1.25, taS: null }, false);
    expect(f.formula).toBeCloseTo(1.0132456102380443, 12);
    expect(f.rmu).toBe(1.3);
  });

  it('at or below grade R_μ = 1 (§13.3.1.2), even with a building given', () => {
    expect(ductilityFactor(building, true)).toEqual({ rmu: 1, formula: null, floored: false });
  });
});

describe('asce722HorizontalForce (ASCE/SEI 7-22 §13.3.1)', () => {
  it('at grade (z = 0): H_f = R_μ = 1; C_AR 1.4, R_po 1.5 → 40·1.4/1.5 = 37.333 (formula)', () => {
    const f = asce722HorizontalForce({ ...base, zM: 0, car: 1.4, rpo: 1.5 });
    expect(f.atGrade).toBe(true);
    expect(f.fp).toBeCloseTo(37.333333333333336, 10);
    expect(f.bound).toBe('formula');
    expect(f.fpMin).toBeCloseTo(30, 12); // 0.3·1·1·100, Eq. 13.3-3
    expect(f.fpMax).toBeCloseTo(160, 12); // 1.6·1·1·100, Eq. 13.3-2
  });

  it('at grade needs no building: the same 37.333 with building null', () => {
    const f = asce722HorizontalForce({ ...base, zM: 0, car: 1.4, rpo: 1.5, building: null });
    expect(f.fp).toBeCloseTo(37.333333333333336, 10);
  });

  it('mid-height, T_a unknown: 40·(2.25/1.712698)·(2.2/2.5) = 46.2428 (formula)', () => {
    const f = asce722HorizontalForce({ ...base, car: 2.2, rpo: 2.5 });
    expect(f.heightFactor.hf).toBeCloseTo(2.25, 12);
    expect(f.ductility.rmu).toBeCloseTo(RMU, 12);
    expect(f.fp).toBeCloseTo(46.24283728319447, 9);
    expect(f.bound).toBe('formula');
  });

  it('roof, T_a = 1.0 s: 40·(2.84/1.712698)·(1.4/1.5) = 61.9062 (formula)', () => {
    const f = asce722HorizontalForce({
      ...base,
      zM: 20,
      car: 1.4,
      rpo: 1.5,
      building: { ...building, taS: 1 },
    });
    expect(f.fp).toBeCloseTo(61.90623603972429, 9);
  });

  it('roof, T_a = 0.3 s (a₁ capped, a₂ floored): 40·3.5/1.712698 = 81.7424', () => {
    const f = asce722HorizontalForce({ ...base, zM: 20, building: { ...building, taS: 0.3 } });
    expect(f.heightFactor).toMatchObject({ a1Capped: true, a2Floored: true });
    expect(f.fp).toBeCloseTo(81.7423891369599, 9);
  });

  it('upper bound governs: roof, R_μ floored at 1.3, C_AR 2.8, R_po 1 → 40·(3.5/1.3)·2.8 = 301.54 > 160', () => {
    const weak = { r: 2, omega0: 2.5, ie: 1.5, taS: null };
    const f = asce722HorizontalForce({ ...base, zM: 20, car: 2.8, rpo: 1, building: weak });
    expect(f.fpFormula).toBeCloseTo(301.53846153846155, 9);
    expect(f.fp).toBeCloseTo(160, 12);
    expect(f.bound).toBe('maximum');
  });

  it('lower bound governs: at grade, C_AR 1, R_po 2 → 40·0.5 = 20 < 30', () => {
    const f = asce722HorizontalForce({ ...base, zM: 0, car: 1, rpo: 2 });
    expect(f.fpFormula).toBeCloseTo(20, 12);
    expect(f.fp).toBeCloseTo(30, 12);
    expect(f.bound).toBe('minimum');
  });

  it('I_p and S_DS scale the bounds: S_DS 0.8, I_p 1.5, W_p 50 → 0.3·0.8·1.5·50 = 18, 1.6·0.8·1.5·50 = 96', () => {
    const f = asce722HorizontalForce({ ...base, weightKN: 50, sds: 0.8, ip: 1.5 });
    expect(f.fpMin).toBeCloseTo(18, 12);
    expect(f.fpMax).toBeCloseTo(96, 12);
    // 0.4·0.8·1.5·50·(2.25/1.712698)·1 = 24·1.313717 = 31.5292
    expect(f.fp).toBeCloseTo((24 * 2.25) / RMU, 9);
  });

  it('z/h need not exceed 1 (§13.3.1.1): z = 2h gives the roof value and says it was capped', () => {
    const roof = asce722HorizontalForce({ ...base, zM: 20 });
    const above = asce722HorizontalForce({ ...base, zM: 40 });
    expect(above.fp).toBeCloseTo(roof.fp, 12);
    expect(above.heightRatio).toBe(1);
    expect(above.heightRatioCapped).toBe(true);
  });
});
