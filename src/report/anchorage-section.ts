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
      ...(h.code === 'asce7-22'
        ? asce722Inputs(j, value)
        : ([['a_p, R_p, I_p', `${value('ap')}, ${value('rp')}, ${value('ip')}`]] as [string, string][])),
      ['S_DS', `${value('sds')} g`],
      [h.code === 'asce7-22' ? 'Ω₀ of the anchorage' : 'Ω₀', value('omega0')],
      ...verticalInputs(j, value),
      ['Motion for the elastic demand', item.motion],
    ]),
    table(
      `Table ${tableNumber + 1}. Equipment ${number}: horizontal and vertical forces`,
      ['Force', `Value (${f})`, 'Note'],
      [
        h.code === 'asce7-22'
          ? [
              'F_p by ASCE/SEI 7-22 §13.3.1, Eq. 13.3-1',
              h.fp_code_formula,
              `0.4 S_DS I_p W_p (H_f/R_μ)(C_AR/R_po); bounds ${formatNumber(h.fp_code_min)} (Eq. 13.3-3) to ${formatNumber(h.fp_code_max)} ${f} (Eq. 13.3-2)`,
            ]
          : [
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
          `dead load factor ${formatNumber(j.vertical.dead_load_factor, 3)}${h.code === 'asce7-22' ? '; ASCE/SEI 7-22 §13.3.1 with §12.4.2.2' : ''}`,
        ],
        ...(j.vertical.spectral === undefined
          ? []
          : [
              [
                'Vertical spectral demand S_av(T_v)·W_p (§11.9), for information',
                j.vertical.spectral.sav_wp,
                `S_av ${formatNumber(j.vertical.spectral.sav_g)} g at T_v ${formatNumber(j.vertical.spectral.tv_s)} s, C_v ${formatNumber(j.vertical.spectral.cv)}; governs nothing (the anchors use E_v)`,
              ] as Cell[],
            ]),
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
    // The assumptions state the anchor method ("Anchors: …") once; it is not repeated before them.
    list(j.assumptions),
    paragraph(j.scope, 'note'),
  ].join('\n');
}

/** The 7-22 rows of the inputs table: edition, C_AR, R_po, I_p, the building, H_f and R_μ with their clauses. */
function asce722Inputs(j: AnchorageJson, value: (key: string) => string): [string, string][] {
  const h = j.horizontal;
  if (h.code !== 'asce7-22') return [];
  const hf = h.height_factor;
  const rmu = h.ductility_factor;
  const terms =
    hf.a1 === null || hf.a2 === null
      ? ''
      : `; a₁ = ${formatNumber(hf.a1)}${hf.a1_capped_at_2_5 ? ' (capped at 2.5)' : ''}, a₂ = ${formatNumber(hf.a2)}${hf.a2_floored_at_0 ? ' (floored at 0)' : ''}`;
  return [
    ['Code edition', 'ASCE/SEI 7-22 (§13.3.1)'],
    ['C_AR, R_po, I_p', `${value('car')}, ${value('rpo')}, ${value('ip')}`],
    [
      'Building R, Ω₀, I_e; T_a',
      `${value('building_r')}, ${value('building_omega0')}, ${value('building_ie')}; ${value('building_ta_s')}${rmu.used ? '' : ' (not used: at or below grade)'}`,
    ],
    ['Height factor H_f', `${formatNumber(hf.h_f)}: ${hf.clause}${terms}`],
    [
      'Structure ductility reduction factor R_μ',
      `${formatNumber(rmu.r_mu)}: ${rmu.clause}${rmu.floored_at_1_3 ? ` (Eq. 13.3-6 gives ${formatNumber(rmu.r_mu_formula ?? 0)})` : ''}`,
    ],
  ];
}

/** The vertical spectral demand's inputs, where the file gives them. */
function verticalInputs(j: AnchorageJson, value: (key: string) => string): [string, string][] {
  if (j.vertical.spectral === undefined) return [];
  return [
    [
      'Vertical period T_v; S_S; site class',
      `${value('vertical_period_s')}${value('vertical_period_s') === 'rigid' ? '' : ' s'}; ${value('ss')} g; ${value('site_class')}`,
    ],
  ];
}
