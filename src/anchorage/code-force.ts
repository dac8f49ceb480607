/** The inputs of the ASCE/SEI 7-16 component force: W_p in kN, z and h in m, S_DS in g. */
export interface CodeForceInput {
  weightKN: number;
  zM: number;
  hM: number;
  ap: number;
  rp: number;
  ip: number;
  sds: number;
}

export interface CodeForce {
  /** The governing design horizontal force F_p, kN. */
  fp: number;
  /** Eq. 13.3-1 before the bounds. */
  fpFormula: number;
  /** Lower bound 0.3 S_DS I_p W_p (Eq. 13.3-3). */
  fpMin: number;
  /** Upper bound 1.6 S_DS I_p W_p (Eq. 13.3-2). */
  fpMax: number;
  /** Which of the three gives F_p. */
  bound: 'formula' | 'minimum' | 'maximum';
  /** z/h as used (capped at 1). */
  heightRatio: number;
  /** True when z > h and z/h was capped at 1. */
  heightRatioCapped: boolean;
}

/**
 * Design horizontal seismic force on a nonstructural component, ASCE/SEI 7-16 §13.3.1:
 * F_p = 0.4 a_p S_DS W_p (1 + 2 z/h) / (R_p/I_p) (Eq. 13.3-1), not more than 1.6 S_DS I_p W_p
 * (Eq. 13.3-2) and not less than 0.3 S_DS I_p W_p (Eq. 13.3-3); z/h need not exceed 1.0.
 * The coefficients are the user's: nothing is looked up from the standard's tables.
 */
export function codeHorizontalForce(input: CodeForceInput): CodeForce {
  const { weightKN: weight, zM: z, hM: h, ap, rp, ip, sds } = input;
  const raw = Math.max(0, z) / h;
  const heightRatio = Math.min(1, raw);
  const fpFormula = (0.4 * ap * sds * weight * (1 + 2 * heightRatio)) / (rp / ip);
  const fpMin = 0.3 * sds * ip * weight;
  const fpMax = 1.6 * sds * ip * weight;
  const bound = fpFormula > fpMax ? 'maximum' : fpFormula < fpMin ? 'minimum' : 'formula';
  const fp = { formula: fpFormula, maximum: fpMax, minimum: fpMin }[bound];
  return { fp, fpFormula, fpMin, fpMax, bound, heightRatio, heightRatioCapped: raw > 1 };
}

/** Vertical seismic load effect E_v = 0.2 S_DS W_p (ASCE/SEI 7-16 §13.3.1.2 with §12.4.2.2), ±. */
export function verticalForce(input: Pick<CodeForceInput, 'weightKN' | 'sds'>): number {
  return 0.2 * input.sds * input.weightKN;
}

/**
 * Dead-load factor of the uplift combination (0.9 − 0.2 S_DS)D + E_h (ASCE/SEI 7-16 §2.3.6,
 * combination 7, with E_v = 0.2 S_DS D). It turns negative when S_DS > 4.5: then the dead load
 * and the vertical shaking together lift the equipment.
 */
export function counteractingDeadLoadFactor(sds: number): number {
  return 0.9 - 0.2 * sds;
}
