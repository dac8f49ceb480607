import { ANCHOR_RULE_TEXT, ANCHORAGE_SCOPE, type AnchorageAnalysis } from '../anchorage/anchorage.js';
import { EQUIPMENT_UNITS } from '../anchorage/equipment.js';
import { CAUTION } from '../base/caution.js';

/** The JSON contract of `quakesweep anchor`: forces in the equipment's force unit, lengths in its length unit. */
export function anchorageToJson(analysis: AnchorageAnalysis) {
  const e = analysis.equipment;
  const system = EQUIPMENT_UNITS[e.units];
  const force = (kN: number) => kN / system.kNPerForce;
  const length = (m: number) => m / system.mPerLength;
  const a = analysis.anchors;
  return {
    caution: CAUTION,
    scope: ANCHORAGE_SCOPE,
    force_unit: system.force,
    length_unit: system.length,
    equipment: { ...e.input, cg_plan: e.cgPlanM.map(length), cg_plan_given: e.cgPlanGiven },
    horizontal: {
      fp_code: force(analysis.code.fp),
      fp_code_formula: force(analysis.code.fpFormula),
      fp_code_min: force(analysis.code.fpMin),
      fp_code_max: force(analysis.code.fpMax),
      fp_code_bound: analysis.code.bound,
      z_over_h: analysis.code.heightRatio,
      omega0: e.omega0,
      fp_code_for_anchors: force(analysis.codeForAnchorsKN),
      elastic_record: analysis.elasticKN === null ? null : force(analysis.elasticKN),
      elastic_psa_g: analysis.elastic === null ? null : analysis.elastic.psaG,
      elastic_how: analysis.elastic === null ? null : analysis.elastic.how,
      elastic_source: analysis.elastic === null ? null : analysis.elastic.source,
      demand: analysis.demand,
      governing: analysis.governing,
      force_for_anchors: force(analysis.horizontalForAnchorsKN),
      ...asce722Fields(analysis),
    },
    vertical: {
      ev: force(analysis.verticalKN),
      dead_load_factor: analysis.deadLoadFactor,
      ...(e.code === 'asce7-22' && {
        // The clause numbers are from memory (docs/methods-and-verification.md); outputs name them plainly.
        ev_clause: 'ASCE/SEI 7-22 §13.3.1 with §12.4.2.2, E_v = 0.2 S_DS W_p',
      }),
      ...verticalSpectralFields(analysis, force),
    },
    anchors: {
      rule: a.rule,
      method:
        `rigid base, elastic bolt group about the anchor centroid; ${ANCHOR_RULE_TEXT[a.rule]} ` +
        'Dead-load share (0.9 − 0.2 S_DS)W_p(1/n + (I⁻¹e)·r_i) for a centre of mass at offset e; tension ≥ 0; ' +
        'shear F/n plus torsion of an eccentric centre of mass; directions of shaking 0–360° in 1° steps refined ' +
        'to the exact worst direction',
      direction_convention:
        'direction of the horizontal force on the equipment, degrees counter-clockwise from +x',
      max_tension: force(a.maxTension),
      max_tension_direction_deg: a.maxTensionDirectionDeg,
      governing_anchor: a.governingAnchor + 1,
      max_shear: force(a.maxShear),
      max_shear_direction_deg: a.maxShearDirectionDeg,
      per_anchor: a.perAnchor.map((p) => ({
        x: length(p.x),
        y: length(p.y),
        tension: force(p.tension),
        tension_direction_deg: p.tensionDirectionDeg,
        shear: force(p.shear),
        shear_direction_deg: p.shearDirectionDeg,
      })),
    },
    assumptions: analysis.assumptions,
  };
}

export type AnchorageJson = ReturnType<typeof anchorageToJson>;

/** The 7-22 force's own fields, each with its clause (none for a 7-16 file, whose outputs stay as they were). */
function asce722Fields(analysis: AnchorageAnalysis) {
  const c = analysis.code;
  const f = analysis.equipment.factors;
  if (c.edition !== 'asce7-22' || f.code !== 'asce7-22') return {};
  const hf = c.heightFactor;
  const building = f.building;
  return {
    code: c.edition,
    clauses: {
      fp_code_formula: 'ASCE/SEI 7-22 §13.3.1, Eq. 13.3-1: F_p = 0.4 S_DS I_p W_p (H_f/R_μ)(C_AR/R_po)',
      fp_code_max: 'ASCE/SEI 7-22 §13.3.1, Eq. 13.3-2: 1.6 S_DS I_p W_p',
      fp_code_min: 'ASCE/SEI 7-22 §13.3.1, Eq. 13.3-3: 0.3 S_DS I_p W_p',
    },
    at_or_below_grade: c.atGrade,
    height_factor: {
      h_f: hf.hf,
      a1: hf.a1,
      a2: hf.a2,
      a1_capped_at_2_5: hf.a1Capped,
      a2_floored_at_0: hf.a2Floored,
      building_ta_s: building?.taS ?? null,
      clause: c.atGrade
        ? 'ASCE/SEI 7-22 §13.3.1.1: H_f = 1 at or below grade'
        : hf.equation === 'Eq. 13.3-4'
          ? 'ASCE/SEI 7-22 §13.3.1.1, Eq. 13.3-4: H_f = 1 + a1(z/h) + a2(z/h)^10, a1 = 1/T_a ≤ 2.5, a2 = 1 − (0.4/T_a)² ≥ 0'
          : 'ASCE/SEI 7-22 §13.3.1.1, Eq. 13.3-5: H_f = 1 + 2.5(z/h), T_a not given',
    },
    ductility_factor: {
      r_mu: c.ductility.rmu,
      r_mu_formula: c.ductility.formula,
      floored_at_1_3: c.ductility.floored,
      building_r: building?.r ?? null,
      building_omega0: building?.omega0 ?? null,
      building_ie: building?.ie ?? null,
      used: !c.atGrade,
      clause: c.atGrade
        ? 'ASCE/SEI 7-22 §13.3.1.2: R_μ = 1 at or below grade'
        : 'ASCE/SEI 7-22 §13.3.1.2, Eq. 13.3-6: R_μ = (1.1 R/(I_e Ω0))^½ ≥ 1.3, the building’s R, Ω0, I_e',
    },
    component_factors: {
      car: f.car,
      rpo: f.rpo,
      clause:
        'C_AR and R_po as given in the equipment file (ASCE/SEI 7-22 §13.3.1; not looked up by this tool)',
    },
  };
}

/** The §11.9 vertical spectral demand, where the file gives its inputs: for information only. */
function verticalSpectralFields(analysis: AnchorageAnalysis, force: (kN: number) => number) {
  const v = analysis.verticalSpectral;
  if (v === null) return {};
  return {
    spectral: {
      sav_wp: force(v.forceKN),
      sav_g: v.savG,
      tv_s: v.periodS,
      rigid: v.rigid,
      cv: v.cv,
      spectrum: v.description,
      clause: `${analysis.equipment.code === 'asce7-22' ? 'ASCE/SEI 7-22' : 'ASCE/SEI 7-16'} §11.9.2 (S_av = 2/3 S_aMv), C_v by Table 11.9-1`,
      use: 'for information only: governs nothing; the anchor forces use E_v = 0.2 S_DS W_p',
    },
  };
}
