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
    },
    vertical: { ev: force(analysis.verticalKN), dead_load_factor: analysis.deadLoadFactor },
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
