import { usageError } from '../base/errors.js';
import { type AnchorRule, type BoltGroupResult, boltGroupForces } from './bolt-group.js';
import { counteractingDeadLoadFactor, verticalForce } from './code-force.js';
import {
  type ComponentForce,
  componentForce,
  componentForceStatements,
  type VerticalSpectralDemand,
  verticalSpectralDemand,
  verticalStatements,
} from './component-force.js';
import type { SpectralValue } from './elastic-demand.js';
import type { Equipment } from './equipment.js';
import { EDITION_NAMES } from './equipment-code.js';

export type DemandChoice = 'code' | 'record' | 'max';

export function parseDemandChoice(text: string): DemandChoice {
  if (text === 'code' || text === 'record' || text === 'max') return text;
  throw usageError(`--demand '${text}': use code, record or max`);
}

/** The elastic demand from a record or a spectrum, with where it came from. */
export interface ElasticInput extends SpectralValue {
  /** A record name or a spectrum file, for outputs. */
  source: string;
}

/** Everything the anchorage outputs state; forces in kN, lengths in m. */
export interface AnchorageAnalysis {
  equipment: Equipment;
  /** The code force of the edition the equipment file names. */
  code: ComponentForce;
  /** Ω₀·F_p when Ω₀ is given, else F_p, kN. */
  codeForAnchorsKN: number;
  /** PSA·W_p, kN, or null without a record or spectrum. */
  elasticKN: number | null;
  elastic: ElasticInput | null;
  demand: DemandChoice;
  governing: 'code' | 'record';
  /** The horizontal force the anchors were computed for, kN. */
  horizontalForAnchorsKN: number;
  verticalKN: number;
  /** S_av(T_v)·W_p of §11.9 where the file gives T_v, S_S and the site class: information only. */
  verticalSpectral: VerticalSpectralDemand | null;
  deadLoadFactor: number;
  anchors: BoltGroupResult;
  assumptions: string[];
}

/**
 * Code force (ASCE/SEI 7-16 or 7-22 §13.3.1, as the equipment file says), elastic record demand, the user's choice between them, and
 * the anchor forces of the rigid base by the elastic bolt-group method (see bolt-group.ts).
 * Ω₀ multiplies the code's horizontal force only: the elastic record demand is already unreduced.
 */
export function analyseAnchorage(
  equipment: Equipment,
  options: { elastic: ElasticInput | null; demand: DemandChoice; anchorRule?: AnchorRule },
): AnchorageAnalysis {
  const { demand, elastic } = options;
  if (demand !== 'code' && elastic === null) {
    throw usageError(
      `--demand ${demand} needs a ground motion: give --record or --spectrum (or use --demand code)`,
    );
  }
  const code = componentForce(equipment);
  const codeForAnchorsKN = (equipment.omega0 ?? 1) * code.fp;
  const elasticKN = elastic === null ? null : elastic.psaG * equipment.weightKN;
  const governing =
    demand !== 'max' ? demand : elasticKN !== null && elasticKN > codeForAnchorsKN ? 'record' : 'code';
  const horizontalForAnchorsKN = governing === 'code' ? codeForAnchorsKN : (elasticKN as number);
  const deadLoadFactor = counteractingDeadLoadFactor(equipment.sds);
  const anchors = boltGroupForces({
    anchors: equipment.anchorsM,
    cgPlan: equipment.cgPlanM,
    cgHeight: equipment.cgHeightM,
    horizontalForce: horizontalForAnchorsKN,
    deadLoad: deadLoadFactor * equipment.weightKN,
    rule: options.anchorRule,
  });
  const analysis = {
    equipment,
    code,
    codeForAnchorsKN,
    elasticKN,
    elastic,
    demand,
    governing,
    horizontalForAnchorsKN,
    verticalKN: verticalForce(equipment),
    verticalSpectral: verticalSpectralDemand(equipment),
    deadLoadFactor,
    anchors,
  };
  return { ...analysis, assumptions: assumptionsOf(analysis) };
}

function assumptionsOf(analysis: Omit<AnchorageAnalysis, 'assumptions'>): string[] {
  const { equipment, code, elastic, governing, deadLoadFactor } = analysis;
  const lines = [
    ...componentForceStatements(equipment, code),
    ...verticalStatements(equipment, deadLoadFactor, analysis.verticalSpectral),
    'Anchors: rigid base, elastic bolt group about the anchors’ centroid, all anchors of equal stiffness ' +
      `in tension and compression; ${ANCHOR_RULE_TEXT[analysis.anchors.rule]} ` +
      'The base’s bearing on the support is not modelled. Horizontal force at the ' +
      'centre-of-mass height; overturning M = F·h_cg; every direction of shaking 0–360° (1° steps, refined to ' +
      'each anchor’s exact worst direction); one horizontal direction at a time (no orthogonal combination).',
    'Shear: F/n per anchor' +
      (equipment.cgPlanGiven
        ? ' plus the torsion of the eccentric centre of mass, F·e, shared by the polar moment of the pattern (elastic method).'
        : '; the centre of mass is taken at the anchors’ centroid (no torsion).'),
    equipment.cgPlanGiven &&
      'Eccentric centre of mass: the counteracting dead load acts at the given plan position and is shared ' +
        'linearly over the pattern (less relief for anchors far from it); the horizontal force acts at the same point.',
    code.heightRatioCapped &&
      `z exceeds h: z/h taken as 1.0 as ${EDITION_NAMES[equipment.code]} §13.3.1${code.edition === 'asce7-22' ? '.1' : ''} allows; check z and h.`,
    equipment.omega0 !== null &&
      `Ω₀ = ${equipment.omega0} multiplies the code horizontal force for the anchors (not the dead load, not the record demand).`,
    elastic !== null &&
      `Record demand: elastic, PSA·W_p with ${elastic.how} (source: ${elastic.source}); not reduced by R_p nor ` +
        'multiplied by I_p or Ω₀.',
    `Governing horizontal force for the anchors: ${governing === 'code' ? 'the code force' : 'the record demand'}.`,
  ];
  return lines.filter((line): line is string => typeof line === 'string');
}

/** How each anchor rule shares the overturning moment, one sentence for outputs. */
export const ANCHOR_RULE_TEXT: Readonly<Record<AnchorRule, string>> = {
  projected:
    'anchor rule "projected": T_i = M·d_i/Σd_j² − (0.9 − 0.2 S_DS)W_p/n with d_i the distance from the neutral axis ' +
    'through the centroid perpendicular to the direction of shaking (conservative off the pattern’s principal axes; ' +
    '--anchor-rule biaxial gives the general elastic solution with moment equilibrium about both plan axes, lower there).',
  biaxial:
    'anchor rule "biaxial": the general elastic solution, T_i = −M(I⁻¹u)·r_i − (0.9 − 0.2 S_DS)W_p/n, with moment ' +
    'equilibrium about both plan axes, so off the pattern’s principal axes the neutral axis is not perpendicular to the ' +
    'direction of shaking (--anchor-rule projected, the default, takes it perpendicular and gives higher tensions there).',
};

/** What these outputs cover and what they do not (stated in every output). */
export const ANCHORAGE_SCOPE =
  'Demands only: forces on the anchors. Anchor capacities (steel strength, concrete breakout, pull-out, ' +
  'side-face blowout, pryout, edge distances, embedment, base-plate and equipment-frame strength) and the ' +
  'anchors’ qualification are not checked. A licensed structural engineer must review these numbers and ' +
  'the governing local code applies.';
