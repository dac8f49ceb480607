import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { analyseAnchorage } from '../../src/anchorage/anchorage.js';
import { parseEquipment } from '../../src/anchorage/equipment.js';
import { CAUTION } from '../../src/base/caution.js';
import { anchorageToJson } from '../../src/formats/anchorage-json.js';

const generator = parseEquipment(readFileSync('records/equipment-generator.json', 'utf8'), 'gen');

describe('analyseAnchorage', () => {
  it('code demand of the invented generator: F_p = 33.75 kN, worst tension 14.0148 kN at 57.99° under the biaxial rule (hand calculation in bolt-group.test.ts)', () => {
    const a = analyseAnchorage(generator, { elastic: null, demand: 'code', anchorRule: 'biaxial' });
    expect(a.code.fp).toBeCloseTo(33.75, 10);
    expect(a.anchors.maxTension).toBeCloseTo(
      (33.75 * 1.1 * Math.sqrt(1 / 0.64 + 1 / 0.25)) / 4 - (0.7 * 45) / 4,
      9,
    );
    expect(a.verticalKN).toBeCloseTo(9, 12);
  });

  it('the default projected rule gives 15.4840 kN at 71.27° (cubic of bolt-group.test.ts) and says so', () => {
    const a = analyseAnchorage(generator, { elastic: null, demand: 'code' });
    expect(a.anchors.rule).toBe('projected');
    expect(a.anchors.maxTension).toBeCloseTo(15.484, 3);
    expect(a.assumptions.join(' ')).toContain('projected');
  });

  it('max picks the larger of Ω₀·F_p and PSA·W_p; Ω₀ scales the code force only', () => {
    const withOmega = { ...generator, omega0: 2 };
    const elastic = { psaG: 1.2, how: 'test', source: 'test' };
    const a = analyseAnchorage(withOmega, { elastic, demand: 'max' });
    expect(a.codeForAnchorsKN).toBeCloseTo(67.5, 10); // 2 × 33.75
    expect(a.elasticKN).toBeCloseTo(54, 10); // 1.2 × 45
    expect(a.governing).toBe('code');
    const b = analyseAnchorage(generator, { elastic, demand: 'max' });
    expect(b.governing).toBe('record');
    expect(b.horizontalForAnchorsKN).toBeCloseTo(54, 10);
    const c = analyseAnchorage(generator, { elastic, demand: 'code' });
    expect(c.horizontalForAnchorsKN).toBeCloseTo(33.75, 10);
  });

  it('refuses a record or max demand without a ground motion', () => {
    expect(() => analyseAnchorage(generator, { elastic: null, demand: 'record' })).toThrow(
      /--record or --spectrum/,
    );
  });
});

describe('anchorageToJson', () => {
  it('has the keys of the contract, the caution first, forces in the equipment’s unit', () => {
    const json = anchorageToJson(
      analyseAnchorage(generator, { elastic: { psaG: 0.5, how: 'h', source: 's' }, demand: 'max' }),
    );
    expect(Object.keys(json)[0]).toBe('caution');
    expect(json.caution).toBe(CAUTION);
    for (const key of [
      'caution',
      'equipment',
      'horizontal',
      'vertical',
      'anchors',
      'force_unit',
      'assumptions',
      'scope',
    ]) {
      expect(json).toHaveProperty(key);
    }
    for (const key of ['fp_code', 'fp_code_min', 'fp_code_max', 'elastic_record', 'governing']) {
      expect(json.horizontal).toHaveProperty(key);
    }
    expect(json.vertical).toHaveProperty('ev');
    for (const key of ['method', 'max_tension', 'max_tension_direction_deg', 'max_shear', 'per_anchor']) {
      expect(json.anchors).toHaveProperty(key);
    }
    for (const key of ['x', 'y', 'tension', 'shear']) expect(json.anchors.per_anchor[0]).toHaveProperty(key);
    expect(json.force_unit).toBe('kN');
    expect(json.scope).toMatch(/breakout/);
    expect(json.equipment).toMatchObject({ name: 'Generator G-1 (invented)', weight: 45 });
  });

  it('US-lb-in: forces back in lb (1 lb = 4.4482216152605e-3 kN), lengths in inches', () => {
    const text = JSON.stringify({
      ...JSON.parse(readFileSync('records/equipment-generator.json', 'utf8')),
      units: 'US-lb-in',
      weight: 10000,
      cg_height: 40,
      anchors: [
        [-30, -20],
        [30, -20],
        [30, 20],
        [-30, 20],
      ],
      h: 400,
    });
    const json = anchorageToJson(
      analyseAnchorage(parseEquipment(text, 'us'), { elastic: null, demand: 'code' }),
    );
    expect(json.force_unit).toBe('lb');
    // F_p = 0.4·2.5·1·10000/(2/1.5) = 7500 lb (ASCE/SEI 7-16 Eq. 13.3-1, hand calculation)
    expect(json.horizontal.fp_code).toBeCloseTo(7500, 6);
    expect(json.anchors.per_anchor[0].x).toBeCloseTo(-30, 10);
  });
});
