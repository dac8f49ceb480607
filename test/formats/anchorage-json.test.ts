import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { ANCHORAGE_SCOPE, analyseAnchorage } from '../../src/anchorage/anchorage.js';
import { parseEquipment } from '../../src/anchorage/equipment.js';
import { CAUTION } from '../../src/base/caution.js';
import { anchorageToJson } from '../../src/formats/anchorage-json.js';
import { formatJson } from '../../src/formats/spectrum-json.js';

const generatorText = readFileSync('records/equipment-generator.json', 'utf8');
const generator = parseEquipment(generatorText, 'gen');
// The invented generator in inches and kips: 1 in = 0.0254 m, 1 kip = 4.4482216152605 kN (exact).
const inKips = parseEquipment(
  JSON.stringify({
    ...JSON.parse(generatorText),
    units: 'US-kip-in',
    weight: 10,
    cg_height: 40,
    anchors: [
      [-30, -20],
      [30, -20],
      [30, 20],
      [-30, 20],
    ],
    cg_plan: [3, 0],
    h: 400,
  }),
  'kip',
);

describe('anchorageToJson', () => {
  it('opens with the caution and the scope, then units, equipment, forces, anchors, assumptions', () => {
    const json = anchorageToJson(analyseAnchorage(generator, { elastic: null, demand: 'code' }));
    expect(Object.keys(json)).toEqual([
      'caution',
      'scope',
      'force_unit',
      'length_unit',
      'equipment',
      'horizontal',
      'vertical',
      'anchors',
      'assumptions',
    ]);
    expect(json.caution).toBe(CAUTION);
    expect(json.scope).toBe(ANCHORAGE_SCOPE);
    expect([json.force_unit, json.length_unit]).toEqual(['kN', 'm']);
  });

  it('without a ground motion: the code force governs and the elastic fields are null', () => {
    const json = anchorageToJson(analyseAnchorage(generator, { elastic: null, demand: 'code' }));
    // ASCE/SEI 7-16 Eq. 13.3-1 by hand: 0.4·2.5·1.0·45·(1 + 0)/(2/1.5) = 33.75 kN; bounds 0.3 and 1.6 S_DS I_p W_p.
    expect(json.horizontal.fp_code).toBeCloseTo(33.75, 10);
    expect(json.horizontal.fp_code_min).toBeCloseTo(0.3 * 1.5 * 45, 10);
    expect(json.horizontal.fp_code_max).toBeCloseTo(1.6 * 1.5 * 45, 10);
    expect(json.horizontal).toMatchObject({ elastic_record: null, elastic_psa_g: null, governing: 'code' });
    // §13.3.1.2: E_v = 0.2 S_DS W_p = 9 kN.
    expect(json.vertical.ev).toBeCloseTo(9, 10);
    expect(json.anchors.per_anchor).toHaveLength(4);
    expect(json.anchors.governing_anchor).toBeGreaterThanOrEqual(1); // numbered from 1
  });

  it('gives forces and lengths in the equipment file’s own units', () => {
    const analysis = analyseAnchorage(inKips, {
      elastic: { psaG: 0.8, how: 'h', source: 's' },
      demand: 'max',
    });
    const json = anchorageToJson(analysis);
    expect([json.force_unit, json.length_unit]).toEqual(['kip', 'in']);
    // F_p = 0.4·2.5·1·10/(2/1.5) = 7.5 kip; record PSA·W_p = 0.8·10 = 8 kip governs under max.
    expect(json.horizontal.fp_code).toBeCloseTo(7.5, 9);
    expect(json.horizontal.elastic_record).toBeCloseTo(8, 9);
    expect(json.horizontal.governing).toBe('record');
    expect(json.horizontal.force_for_anchors).toBeCloseTo(8, 9);
    expect(json.equipment.cg_plan).toEqual([3, 0].map((v) => expect.closeTo(v, 9)));
    expect(json.anchors.per_anchor.map((p) => [p.x, p.y])).toEqual(
      [
        [-30, -20],
        [30, -20],
        [30, 20],
        [-30, 20],
      ].map((point) => point.map((v) => expect.closeTo(v, 9))),
    );
    expect(json.anchors.max_tension).toBeCloseTo(analysis.anchors.maxTension / 4.4482216152605, 9);
  });

  it('passes the finite check, which names a field that is not finite', () => {
    const analysis = analyseAnchorage(generator, {
      elastic: { psaG: 0.5, how: 'h', source: 's' },
      demand: 'max',
    });
    expect(() => formatJson(anchorageToJson(analysis))).not.toThrow();
    const broken = { ...analysis, verticalKN: Number.NaN };
    expect(() => formatJson(anchorageToJson(broken))).toThrow(/\(vertical\.ev = NaN\)/);
  });
});
