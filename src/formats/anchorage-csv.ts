import type { AnchorageAnalysis } from '../anchorage/anchorage.js';
import { EQUIPMENT_UNITS } from '../anchorage/equipment.js';
import { formatNumber } from '../base/numbers.js';
import { csvRows } from './csv-rows.js';

/**
 * `quakesweep anchor --format csv`: one anchor a row (position, worst tension and shear over every
 * direction of shaking and their directions) in the equipment file's units; the forces and the
 * assumptions on `#` lines.
 */
export function anchorageToCsv(analysis: AnchorageAnalysis): string {
  const e = analysis.equipment;
  const { force, length, kNPerForce, mPerLength } = EQUIPMENT_UNITS[e.units];
  const f = (kN: number) => kN / kNPerForce;
  // Notes are read by people: the rule of src/base/numbers.ts there, every digit in the rows.
  const shown = (kN: number) => formatNumber(f(kN));
  const a = analysis.anchors;
  const notes = [
    `equipment: ${e.name}; units ${e.units} (${force}, ${length})`,
    `horizontal force for the anchors: ${shown(analysis.horizontalForAnchorsKN)} ${force} (--demand ${analysis.demand}; governing ${analysis.governing})`,
    `code force for the anchors: ${shown(analysis.codeForAnchorsKN)} ${force}`,
    ...(analysis.elasticKN === null ? [] : [`record elastic demand: ${shown(analysis.elasticKN)} ${force}`]),
    `vertical: ${shown(analysis.verticalKN)} ${force}`,
    `anchor rule: ${a.rule}; directions in degrees counter-clockwise from +x`,
    ...analysis.assumptions.map((text) => `assumption: ${text}`),
  ];
  const header = [
    'anchor',
    `x_${length}`,
    `y_${length}`,
    `tension_${force}`,
    'tension_direction_deg',
    `shear_${force}`,
    'shear_direction_deg',
    'governs',
  ];
  const rows = a.perAnchor.map((p, i) => [
    i + 1,
    p.x / mPerLength,
    p.y / mPerLength,
    f(p.tension),
    p.tensionDirectionDeg,
    f(p.shear),
    p.shearDirectionDeg,
    i === a.governingAnchor ? 'yes' : '',
  ]);
  return csvRows(notes, header, rows);
}
