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

describe('anchorageToJson of an ASCE/SEI 7-22 file', () => {
  const pumpFile = 'records/equipment-pump-roof-7-22.json';
  const pump = parseEquipment(readFileSync(pumpFile, 'utf8'), pumpFile);
  const json = anchorageToJson(analyseAnchorage(pump, { elastic: null, demand: 'code' }));

  it('states the edition and the clause beside every formula (ASCE/SEI 7-22 §13.3.1)', () => {
    const h = json.horizontal;
    expect(h.code).toBe('asce7-22');
    if (h.code !== 'asce7-22') return;
    expect(h.clauses.fp_code_formula).toMatch(/§13\.3\.1, Eq\. 13\.3-1/);
    expect(h.clauses.fp_code_max).toMatch(/Eq\. 13\.3-2: 1\.6 S_DS I_p W_p/);
    expect(h.clauses.fp_code_min).toMatch(/Eq\. 13\.3-3: 0\.3 S_DS I_p W_p/);
    expect(h.height_factor.clause).toMatch(/§13\.3\.1\.1, Eq\. 13\.3-4/);
    expect(h.ductility_factor.clause).toMatch(/§13\.3\.1\.2, Eq\. 13\.3-6/);
    // hand: H_f = 1 + 1/0.7 + 1 − (0.4/0.7)² = 3.102041; R_μ = (8.8/3)^½ = 1.712698
    expect(h.height_factor.h_f).toBeCloseTo(3.102040816, 8);
    expect(h.ductility_factor.r_mu).toBeCloseTo(1.712697677, 8);
    expect(h.component_factors).toMatchObject({ car: 1.4, rpo: 1.5 });
  });

  it('adds the vertical spectral demand, marked for information (§11.9)', () => {
    expect(json.vertical.spectral?.sav_g).toBeCloseTo(0.9072, 12); // see test/anchorage/component-force.test.ts
    expect(json.vertical.spectral?.use).toMatch(/for information only: governs nothing/);
    expect(json.vertical.ev_clause).toMatch(/ASCE\/SEI 7-22 §13\.3\.1/);
    expect(json.caution).toBe(CAUTION);
  });

  it('a 7-16 file gains none of these keys (its output stays as it was)', () => {
    const old = anchorageToJson(analyseAnchorage(generator, { elastic: null, demand: 'code' }));
    for (const key of ['code', 'clauses', 'height_factor', 'ductility_factor', 'component_factors']) {
      expect(key in old.horizontal).toBe(false);
    }
    expect(Object.keys(old.vertical)).toEqual(['ev', 'dead_load_factor']);
  });
});
