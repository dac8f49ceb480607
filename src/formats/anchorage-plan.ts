import type { AnchorageAnalysis } from '../anchorage/anchorage.js';
import { centroid, EQUIPMENT_UNITS } from '../anchorage/equipment.js';
import { formatNumber, formatSignificant } from '../base/numbers.js';

/** The input of the anchor plan figure (plot/anchor-plan.ts) from an analysis, in the equipment's units. */
export function anchorPlanInput(analysis: AnchorageAnalysis) {
  const e = analysis.equipment;
  const system = EQUIPMENT_UNITS[e.units];
  const l = (m: number) => m / system.mPerLength;
  const a = analysis.anchors;
  return {
    title: `${e.name}: anchor plan and worst tensions`,
    forceUnit: system.force,
    lengthUnit: system.length,
    anchors: a.perAnchor.map((p) => ({ x: l(p.x), y: l(p.y), tension: p.tension / system.kNPerForce })),
    governingAnchor: a.governingAnchor,
    directionDeg: a.maxTensionDirectionDeg,
    cgPlan: e.cgPlanM.map(l) as [number, number],
    centroid: centroid(e.anchorsM).map(l) as [number, number],
    subtitle: [
      `Horizontal force for the anchors ${formatSignificant(analysis.horizontalForAnchorsKN / system.kNPerForce)} ${system.force} ` +
        `(${analysis.governing === 'code' ? `${e.code === 'asce7-22' ? 'ASCE 7-22' : 'ASCE 7-16'} §13.3.1 code force` : 'record elastic demand'}) at h_cg = ${formatNumber(l(e.cgHeightM))} ${system.length}; W_p = ${formatSignificant(e.weightKN / system.kNPerForce)} ${system.force}`,
      `Method: rigid base, elastic bolt group, anchor rule ${a.rule}${a.rule === 'projected' ? ' (T_i = M·d_i/Σd_j² − D/n, neutral axis perpendicular to the shaking)' : ' (general elastic solution, moment equilibrium about both plan axes)'}`,
    ],
    notes: [
      'Each anchor shows its own worst tension over every direction of shaking (0–360°), not the tensions of one direction; the arrow is the direction of the horizontal force on the equipment that gives the governing anchor its worst tension, degrees counter-clockwise from +x.',
      'Demands only: anchor capacities (steel, concrete breakout, pull-out, edge distances, embedment) are not checked.',
    ],
  };
}
