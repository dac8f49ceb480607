import type { AnchorageJson } from '../formats/anchorage-json.js';
import type { ReportFigure } from './html.js';
import { type Cell, definitionTable, escapeHtml, formatNumber, list, paragraph, table } from './html.js';

/** One equipment item's anchorage, as the report shows it. */
export interface ReportAnchorage {
  /** The JSON of `quakesweep anchor` (forces and lengths in the equipment's units). */
  json: AnchorageJson;
  /** The equipment file. */
  file: string;
  /** How the elastic demand was found (ground record, floor spectrum, or none). */
  motion: string;
  /** Its figures: the floor spectrum (above the base in a described building), the anchor plan. */
  figures: ReportFigure[];
}

/** One equipment item: its heading, tables of inputs, forces and anchors, then its assumptions. */
export function anchorageSection(item: ReportAnchorage, number: string, tableNumber: number): string {
  const j = item.json;
  const e = j.equipment as Record<string, unknown>;
  const f = j.force_unit;
  const l = j.length_unit;
  const h = j.horizontal;
  const value = (key: string) => String(e[key] ?? 'not given');
  return [
    `<h3>${number} ${escapeHtml(String(e['name'] ?? item.file))}</h3>`,
    definitionTable(`Table ${tableNumber}. Equipment ${number}: inputs (file ${item.file})`, [
      ['Name', value('name')],
      ['Units of the file', `${value('units')} (forces in ${f}, lengths in ${l})`],
      ['Operating weight W_p', `${value('weight')} ${f}`],
      ['Height of the centre of mass h_cg', `${value('cg_height')} ${l}`],
      ['Anchors', `${j.anchors.per_anchor.length}`],
      ['Component period T_p', value('period_s') === 'rigid' ? 'rigid' : `${value('period_s')} s`],
      ['Component damping ζ_p', value('damping')],
      ['Attachment height z / roof height h', `${value('z')} / ${value('h')} ${l}`],
      ['a_p, R_p, I_p', `${value('ap')}, ${value('rp')}, ${value('ip')}`],
      ['S_DS', `${value('sds')} g`],
      ['Ω₀', value('omega0')],
      ['Motion for the elastic demand', item.motion],
    ]),
    table(
      `Table ${tableNumber + 1}. Equipment ${number}: horizontal and vertical forces`,
      ['Force', `Value (${f})`, 'Note'],
      [
        [
          'F_p by ASCE/SEI 7-16 Eq. 13.3-1',
          h.fp_code_formula,
          `bounds ${formatNumber(h.fp_code_min)} to ${formatNumber(h.fp_code_max)} ${f}`,
        ],
        ['F_p, bounded', h.fp_code, `${h.fp_code_bound}; z/h = ${formatNumber(h.z_over_h, 3)}`],
        ['Code force for the anchors (Ω₀·F_p where Ω₀ is given)', h.fp_code_for_anchors, ''],
        [
          'Elastic record demand PSA·W_p',
          h.elastic_record,
          h.elastic_psa_g === null
            ? 'no motion used'
            : `PSA ${formatNumber(h.elastic_psa_g)} g: ${h.elastic_how}`,
        ],
        [
          'Horizontal force for the anchors',
          h.force_for_anchors,
          `choice "${h.demand}", governing: ${h.governing}`,
        ],
        [
          'Vertical E_v = 0.2 S_DS W_p',
          j.vertical.ev,
          `dead load factor ${formatNumber(j.vertical.dead_load_factor, 3)}`,
        ],
      ],
    ),
    table(
      `Table ${tableNumber + 2}. Equipment ${number}: worst anchor forces over every direction of shaking`,
      [
        'Anchor',
        `x (${l})`,
        `y (${l})`,
        `Tension (${f})`,
        'at direction (°)',
        `Shear (${f})`,
        'at direction (°)',
      ],
      j.anchors.per_anchor.map((a, i): Cell[] => [
        i + 1 === j.anchors.governing_anchor ? `${i + 1} (governs)` : String(i + 1),
        a.x,
        a.y,
        a.tension,
        a.tension_direction_deg,
        a.shear,
        a.shear_direction_deg,
      ]),
    ),
    paragraph(
      `Largest tension ${formatNumber(j.anchors.max_tension)} ${f} (anchor ${j.anchors.governing_anchor}, force direction ${formatNumber(j.anchors.max_tension_direction_deg)}°); largest shear ${formatNumber(j.anchors.max_shear)} ${f}. Directions are those of the horizontal force on the equipment, degrees counter-clockwise from +x.`,
    ),
    `<h4>Method and assumptions of this anchorage</h4>`,
    list([`Anchor forces: ${j.anchors.method}.`, ...j.assumptions]),
    paragraph(j.scope, 'note'),
  ].join('\n');
}
