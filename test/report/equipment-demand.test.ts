import { JSDOM } from 'jsdom';
import { describe, expect, it } from 'vitest';
import { parseEquipment } from '../../src/anchorage/equipment.js';
import { STANDARD_GRAVITY_MS2 } from '../../src/base/units.js';
import { createRecord } from '../../src/record/record.js';
import { equipmentAnchorage, equipmentDemand } from '../../src/report/equipment-demand.js';

const g = STANDARD_GRAVITY_MS2;

// Invented input: a constant ground acceleration a0 = 0.2 g applied from rest at t = 0 (a step),
// 3 s long, sampled every 5 ms.
const a0G = 0.2;
const step = createRecord({
  name: 'invented step',
  dtS: 0.005,
  accelMS2: new Float64Array(601).fill(a0G * g),
});

function equipment(fields: Record<string, unknown>) {
  const base = {
    name: 'Invented cabinet C-1',
    units: 'SI',
    weight: 10,
    cg_height: 1,
    anchors: [
      [-0.5, -0.5],
      [0.5, -0.5],
      [0.5, 0.5],
      [-0.5, 0.5],
    ],
    period_s: 'rigid',
    damping: 0.05,
    z: 0,
    h: 20,
    ap: 1,
    rp: 2.5,
    ip: 1,
    sds: 1,
    omega0: null,
  };
  return parseEquipment(JSON.stringify({ ...base, ...fields }), 'invented.json');
}

const periodsS = Float64Array.from([0, 0.05, 0.1, 0.2, 0.3, 0.5, 0.8, 1, 1.5, 2]);
const grid = { periodsS, method: 'piecewise-exact' as const };

describe('equipmentDemand on grade (z = 0): the record itself', () => {
  it('rigid: the PGA of the record, 0.2 g', () => {
    const demand = equipmentDemand(equipment({}), step, { grid });
    expect(demand.elastic?.psaG).toBeCloseTo(a0G, 12);
    expect(demand.elastic?.source).toBe('invented step');
    expect(demand.floor).toBeUndefined();
  });

  it('T = 0.5 s, ζ = 5%: PSA = a0·(1 + exp(−πζ/√(1 − ζ²))) = 1.8545·a0 for a step', () => {
    // Peak of a damped oscillator under a suddenly applied constant force, first maximum at
    // t = π/ω_D: u_max = u_st(1 + exp(−ζπ/√(1 − ζ²))) (Chopra, Dynamics of Structures, §4.3, from
    // memory); with u_st = a0/ω², PSA = ω²·u_max. Hand: exp(−0.05π/0.99875) = 0.85452.
    const expected = a0G * (1 + Math.exp((-Math.PI * 0.05) / Math.sqrt(1 - 0.05 ** 2)));
    expect(expected).toBeCloseTo(0.2 * 1.85452, 4);
    const demand = equipmentDemand(equipment({ period_s: 0.5 }), step, { grid });
    expect(demand.elastic?.psaG).toBeCloseTo(expected, 6);
    expect(demand.motion).toBe('ground record invented step');
  });
});

describe('equipmentDemand above the base', () => {
  it('without a building: no elastic demand, and the notes say the motion was not used', () => {
    const demand = equipmentDemand(equipment({ z: 12 }), step, { grid, building: null });
    expect(demand.elastic).toBeNull();
    expect(demand.motion).toMatch(/^none: the equipment is above the base/);
    expect(demand.notes.join(' ')).toMatch(/not used/);
    expect(demand.floor).toBeUndefined();
  });

  it('rigid, undamped one-mode building: floor PGA = a0(1 + Γφ) = 0.46 g for a step', () => {
    // Building mode q'' + ω_b² q = −a0 from rest: q = −(a0/ω_b²)(1 − cos ω_b t), so q'' = −a0 cos ω_b t
    // and the floor a_g + Γφ q'' = a0(1 − Γφ cos ω_b t), largest at t = T_b/2: a0(1 + Γφ) (closed form
    // of the undamped step response, Chopra §4.3). T_b/2 = 0.25 s is sample 50.
    const building = { periodS: 0.5, damping: 0, modalFactor: 1.3 };
    const demand = equipmentDemand(equipment({ z: 12 }), step, { grid, building });
    expect(demand.elastic?.psaG).toBeCloseTo(a0G * (1 + 1.3), 6);
    expect(demand.elastic?.how).toMatch(/T = 0 of the floor spectrum/);
    expect(demand.elastic?.source).toBe('floor spectrum');
    expect(demand.motion).toBe('floor spectrum of invented step: T_b = 0.5 s, ζ_b = 0, Γφ = 1.3');
    expect(demand.notes.join(' ')).toMatch(/does not check that Γφ belongs to the floor/);
    const svg = new JSDOM(demand.floor ?? '', { contentType: 'image/svg+xml' }).window.document;
    expect(svg.documentElement.localName).toBe('svg');
    // The figure of `quakesweep floor` (floorFigure): the building period marked, ground and floor named.
    expect(svg.querySelector('g.building-period')?.getAttribute('data-period-s')).toBe('0.5');
    expect(svg.querySelector('title')?.textContent).toBe(
      'Floor response spectrum against the ground spectrum, PSA',
    );
    expect(svg.querySelector('g.legend')?.textContent).toContain('ground');
  });

  it('draws the floor spectrum against frequency unless the axis is given', () => {
    const building = { periodS: 0.5, damping: 0.05, modalFactor: 1.3 };
    const title = (axis?: 'period' | 'frequency') => {
      const svg = equipmentDemand(equipment({ z: 12 }), step, { grid, building, axis }).floor ?? '';
      return new JSDOM(svg, { contentType: 'image/svg+xml' }).window.document.querySelector('.x-title')
        ?.textContent;
    };
    // Equipment is specified and tested by frequency (common practice): the default.
    expect(title()).toBe('Frequency f = 1/T (Hz)');
    expect(title('frequency')).toBe('Frequency f = 1/T (Hz)');
    expect(title('period')).toBe('Period T (s)');
  });

  it('says so when the floor spectrum was broadened', () => {
    const building = { periodS: 0.5, damping: 0.05, modalFactor: 1.3 };
    const demand = equipmentDemand(equipment({ z: 12, period_s: 0.3 }), step, {
      grid,
      building,
      broadening: 0.15,
    });
    expect(demand.motion).toMatch(/, peaks broadened ±0\.15$/);
    // As in floor.svg, the floor spectrum before broadening is drawn too.
    expect(demand.floor).toContain('floor, not broadened');
    expect(demand.elastic?.how).toMatch(/^PSA at T = 0.3 s, a point of the grid/);
  });
});

describe('equipmentAnchorage', () => {
  it('code force alone without a motion: F_p = 0.4·1·1·10·(1 + 2·12/20)/2.5 = 3.52 kN (ASCE/SEI 7-16 Eq. 13.3-1)', () => {
    const item = equipmentAnchorage(2, { file: 'c.json', value: equipment({ z: 12 }) }, step, { grid });
    expect(item.json.horizontal.fp_code).toBeCloseTo(3.52, 12);
    expect(item.json.horizontal.demand).toBe('code');
    expect(item.figures.map((f) => f.file)).toEqual(['anchor-plan-2.svg']);
    expect(item.file).toBe('c.json');
  });

  it('on grade with the record: the larger of F_p = 3 kN and PSA·W_p = 0.2 g · 10 kN = 2 kN governs', () => {
    // F_p on grade = 0.4·1·1·10·1/2.5 = 1.6 kN (bounds 3 and 16 kN: 0.3·1·1·10 = 3 governs), so
    // F_p = 3 kN > PSA·W_p = 2 kN: the code force governs under "max".
    const item = equipmentAnchorage(1, { file: 'c.json', value: equipment({}) }, step, { grid });
    expect(item.json.horizontal.fp_code).toBeCloseTo(3, 12);
    expect(item.json.horizontal.elastic_record).toBeCloseTo(2, 9);
    expect(item.json.horizontal.governing).toBe('code');
    expect(item.json.horizontal.force_for_anchors).toBeCloseTo(3, 12);
  });

  it('above the base in a building: the floor spectrum figure first, then the anchor plan', () => {
    const building = { periodS: 0.5, damping: 0, modalFactor: 1.3 };
    const item = equipmentAnchorage(3, { file: 'c.json', value: equipment({ z: 12 }) }, step, {
      grid,
      building,
    });
    expect(item.figures.map((f) => f.file)).toEqual(['floor-3.svg', 'anchor-plan-3.svg']);
    // PSA·W_p = 0.46 g · 10 kN = 4.6 kN > F_p = 3.52 kN: the record demand governs.
    expect(item.json.horizontal.elastic_record).toBeCloseTo(4.6, 6);
    expect(item.json.horizontal.governing).toBe('record');
    expect(item.json.assumptions.join(' ')).toMatch(/does not check that Γφ belongs/);
  });
});
