import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { analyseAnchorage } from '../../src/anchorage/anchorage.js';
import { parseEquipment } from '../../src/anchorage/equipment.js';
import { anchorPlanInput } from '../../src/formats/anchorage-plan.js';

const generatorJson = JSON.parse(readFileSync('records/equipment-generator.json', 'utf8'));
// The invented generator in inches and pounds, its anchors off-centre: 1 in = 0.0254 m (exact).
const inPounds = parseEquipment(
  JSON.stringify({
    ...generatorJson,
    units: 'US-lb-in',
    weight: 10000,
    cg_height: 40,
    anchors: [
      [0, 0],
      [60, 0],
      [60, 40],
      [0, 40],
    ],
    cg_plan: [20, 20],
    h: 400,
  }),
  'lb',
);

describe('anchorPlanInput', () => {
  const analysis = analyseAnchorage(inPounds, { elastic: null, demand: 'code' });
  const plan = anchorPlanInput(analysis);

  it('gives the anchors, the centre of mass and the centroid in the equipment’s length unit', () => {
    expect([plan.forceUnit, plan.lengthUnit]).toEqual(['lb', 'in']);
    expect(plan.anchors.map((a) => [a.x, a.y])).toEqual(
      [
        [0, 0],
        [60, 0],
        [60, 40],
        [0, 40],
      ].map((point) => point.map((v) => expect.closeTo(v, 9))),
    );
    expect(plan.cgPlan).toEqual([expect.closeTo(20, 9), expect.closeTo(20, 9)]);
    // The centroid of four corners is their mean (30, 20).
    expect(plan.centroid).toEqual([expect.closeTo(30, 9), expect.closeTo(20, 9)]);
  });

  it('gives each anchor’s worst tension in lb, the governing one by its index, and its direction', () => {
    plan.anchors.forEach((anchor, i) => {
      expect(anchor.tension).toBeCloseTo(analysis.anchors.perAnchor[i].tension / 0.0044482216152605, 6);
    });
    expect(plan.governingAnchor).toBe(analysis.anchors.governingAnchor); // from 0, as the figure draws
    const worst = Math.max(...plan.anchors.map((a) => a.tension));
    expect(plan.anchors[plan.governingAnchor].tension).toBeCloseTo(worst, 9);
    expect(plan.directionDeg).toBe(analysis.anchors.maxTensionDirectionDeg);
  });

  it('titles the figure and states the force, its source, the method and the limits', () => {
    expect(plan.title).toBe('Generator G-1 (invented): anchor plan and worst tensions');
    // ASCE/SEI 7-16 Eq. 13.3-1 by hand: 0.4·2.5·1·10000/(2/1.5) = 7500 lb.
    expect(plan.subtitle[0]).toMatch(
      /^Horizontal force for the anchors 7500 lb \(ASCE 7-16 §13\.3\.1 code force\)/,
    );
    expect(plan.subtitle[0]).toContain('at h_cg = 40 in; W_p = 10000 lb');
    expect(plan.subtitle[1]).toContain('anchor rule projected');
    expect(plan.notes.join(' ')).toContain('capacities');
    const record = anchorPlanInput(
      analyseAnchorage(inPounds, { elastic: { psaG: 2, how: 'h', source: 's' }, demand: 'record' }),
    );
    expect(record.subtitle[0]).toContain('(record elastic demand)');
  });
});
