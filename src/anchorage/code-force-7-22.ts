import { QuakesweepError } from '../base/errors.js';
import type { CodeForce } from './code-force.js';

/** The building's factors for R_μ (ASCE/SEI 7-22 §13.3.1.2) and its approximate period for H_f. */
export interface SupportingBuilding {
  /** Response modification coefficient R of the building's seismic force-resisting system. */
  r: number;
  /** The building's overstrength factor Ω₀ (not the component's anchorage Ω₀). */
  omega0: number;
  /** The building's importance factor I_e. */
  ie: number;
  /** Approximate fundamental period T_a, s (§12.8.2.1), or null when not known. */
  taS: number | null;
}

/** The inputs of the ASCE/SEI 7-22 component force: W_p in kN, z and h in m, S_DS in g. */
export interface Asce722ForceInput {
  weightKN: number;
  zM: number;
  hM: number;
  /** Component resonance ductility factor C_AR (the engineer's, from the standard's tables). */
  car: number;
  /** Component strength factor R_po (the engineer's, from the standard's tables). */
  rpo: number;
  ip: number;
  sds: number;
  /** Required above grade; ignored at or below grade. */
  building: SupportingBuilding | null;
}

/** H_f of §13.3.1.1, with its terms and the equation it came from. */
export interface HeightFactor {
  hf: number;
  /** a₁ = 1/T_a ≤ 2.5, or null where Eq. 13.3-4 was not used. */
  a1: number | null;
  /** a₂ = 1 − (0.4/T_a)² ≥ 0, or null where Eq. 13.3-4 was not used. */
  a2: number | null;
  a1Capped: boolean;
  a2Floored: boolean;
  equation: 'Eq. 13.3-4' | 'Eq. 13.3-5' | 'at or below grade';
}

/** R_μ of §13.3.1.2, with the value of Eq. 13.3-6 before its floor (null at or below grade). */
export interface DuctilityFactor {
  rmu: number;
  formula: number | null;
  floored: boolean;
}

export interface Asce722Force extends CodeForce {
  edition: 'asce7-22';
  /** True when z ≤ 0: H_f = 1 and R_μ = 1. */
  atGrade: boolean;
  heightFactor: HeightFactor;
  ductility: DuctilityFactor;
}

/**
 * The height factor of ASCE/SEI 7-22 §13.3.1.1: H_f = 1 + a₁(z/h) + a₂(z/h)¹⁰ with a₁ = 1/T_a ≤ 2.5
 * and a₂ = 1 − (0.4/T_a)² ≥ 0 where the building's approximate period T_a is known (Eq. 13.3-4),
 * H_f = 1 + 2.5(z/h) where it is not (Eq. 13.3-5); z/h need not exceed 1; H_f = 1 at or below grade.
 */
export function heightFactor(heightRatio: number, taS: number | null, atGrade: boolean): HeightFactor {
  const none = { a1: null, a2: null, a1Capped: false, a2Floored: false };
  if (atGrade) return { hf: 1, ...none, equation: 'at or below grade' };
  if (taS === null) return { hf: 1 + 2.5 * heightRatio, ...none, equation: 'Eq. 13.3-5' };
  const a1Raw = 1 / taS;
  const a2Raw = 1 - (0.4 / taS) ** 2;
  const a1 = Math.min(2.5, a1Raw);
  const a2 = Math.max(0, a2Raw);
  return {
    hf: 1 + a1 * heightRatio + a2 * heightRatio ** 10,
    a1,
    a2,
    a1Capped: a1Raw > 2.5,
    a2Floored: a2Raw < 0,
    equation: 'Eq. 13.3-4',
  };
}

/**
 * The structure ductility reduction factor of ASCE/SEI 7-22 §13.3.1.2:
 * R_μ = (1.1 R/(I_e Ω₀))^½ ≥ 1.3 (Eq. 13.3-6) from the building's R, I_e and Ω₀; 1.0 for
 * components at or below grade.
 */
export function ductilityFactor(building: SupportingBuilding | null, atGrade: boolean): DuctilityFactor {
  if (atGrade) return { rmu: 1, formula: null, floored: false };
  if (building === null)
    throw new QuakesweepError('internal', 'R_μ of an above-grade component needs the building');
  const formula = Math.sqrt((1.1 * building.r) / (building.ie * building.omega0));
  return { rmu: Math.max(1.3, formula), formula, floored: formula < 1.3 };
}

/**
 * Design horizontal seismic force on a nonstructural component, ASCE/SEI 7-22 §13.3.1:
 * F_p = 0.4 S_DS I_p W_p (H_f/R_μ)(C_AR/R_po) (Eq. 13.3-1), not more than 1.6 S_DS I_p W_p
 * (Eq. 13.3-2) and not less than 0.3 S_DS I_p W_p (Eq. 13.3-3). C_AR, R_po, I_p and S_DS are the
 * user's: nothing is looked up from the standard's tables.
 */
export function asce722HorizontalForce(input: Asce722ForceInput): Asce722Force {
  const { weightKN: weight, zM: z, hM: h, car, rpo, ip, sds } = input;
  const atGrade = z <= 0;
  const raw = Math.max(0, z) / h;
  const heightRatio = Math.min(1, raw);
  const hf = heightFactor(heightRatio, input.building?.taS ?? null, atGrade);
  const ductility = ductilityFactor(input.building, atGrade);
  const fpFormula = 0.4 * sds * ip * weight * (hf.hf / ductility.rmu) * (car / rpo);
  const fpMin = 0.3 * sds * ip * weight;
  const fpMax = 1.6 * sds * ip * weight;
  const bound = fpFormula > fpMax ? 'maximum' : fpFormula < fpMin ? 'minimum' : 'formula';
  const fp = { formula: fpFormula, maximum: fpMax, minimum: fpMin }[bound];
  return {
    edition: 'asce7-22',
    fp,
    fpFormula,
    fpMin,
    fpMax,
    bound,
    heightRatio,
    heightRatioCapped: raw > 1,
    atGrade,
    heightFactor: hf,
    ductility,
  };
}
