import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { parseEquipment } from '../../src/anchorage/equipment.js';
import { QuakesweepError } from '../../src/base/errors.js';

const base = {
  name: 'Generator G-1 (invented)',
  units: 'SI',
  weight: 45.0,
  cg_height: 1.1,
  anchors: [
    [-0.8, -0.5],
    [0.8, -0.5],
    [0.8, 0.5],
    [-0.8, 0.5],
  ],
  period_s: 'rigid',
  damping: 0.05,
  z: 0.0,
  h: 10.0,
  ap: 2.5,
  rp: 2.0,
  ip: 1.5,
  sds: 1.0,
  omega0: null,
};

function refusal(value: unknown, file = 'equipment.json'): QuakesweepError {
  const text = typeof value === 'string' ? value : JSON.stringify(value, null, 2);
  try {
    parseEquipment(text, file);
  } catch (error) {
    if (error instanceof QuakesweepError) return error;
    throw error;
  }
  throw new Error('expected a refusal');
}

describe('parseEquipment', () => {
  it('reads the example of the issue, with the centroid as the default centre of mass', () => {
    const e = parseEquipment(JSON.stringify(base), 'equipment.json');
    expect(e.weightKN).toBe(45);
    expect(e.cgPlanM).toEqual([0, 0]);
    expect(e.cgPlanGiven).toBe(false);
    expect(e.periodS).toBe('rigid');
  });

  it('reads the invented example files in records/', () => {
    for (const file of ['records/equipment-generator.json', 'records/equipment-cabinet-floor4.json']) {
      const e = parseEquipment(readFileSync(file, 'utf8'), file);
      expect(e.name).toMatch(/invented/);
    }
  });

  it('converts US units: 1 kip = 4.4482216152605 kN, 1 in = 0.0254 m (exact definitions)', () => {
    const e = parseEquipment(
      JSON.stringify({ ...base, units: 'US-kip-in', weight: 10, cg_height: 40, h: 400 }),
      'f',
    );
    expect(e.weightKN).toBeCloseTo(44.482216152605, 10);
    expect(e.cgHeightM).toBeCloseTo(1.016, 12);
    const lb = parseEquipment(JSON.stringify({ ...base, units: 'US-lb-in', weight: 1000 }), 'f');
    expect(lb.weightKN).toBeCloseTo(4.4482216152605, 10);
  });

  it('names the file and the field: too few anchors', () => {
    const error = refusal({ ...base, anchors: [[0, 0]] });
    expect(error.describe()).toMatch(/^equipment\.json:\d+: "anchors" needs at least 2 anchors/);
  });

  it('gives the line of the field where it can', () => {
    const error = refusal({ ...base, sds: -1 });
    const text = JSON.stringify({ ...base, sds: -1 }, null, 2);
    const line = text.split('\n').findIndex((l) => l.includes('"sds"')) + 1;
    expect(error.line).toBe(line);
    expect(error.message).toMatch(/"sds"/);
  });

  it('refuses unknown keys and suggests the close one', () => {
    const error = refusal({ ...base, omega_0: 2 });
    expect(error.message).toMatch(/"omega_0" is not a known field \(did you mean "omega0"\?\)/);
  });

  it('refuses missing fields, bad units, bad periods, collinear and repeated anchors', () => {
    const { weight: _, ...noWeight } = base;
    expect(refusal(noWeight).message).toMatch(/"weight" is missing/);
    expect(refusal({ ...base, units: 'metric' }).message).toMatch(
      /"units" must be one of SI, US-kip-in, US-lb-in/,
    );
    // a name every object has (Object.prototype's) is not a unit system
    for (const units of ['toString', 'constructor', '__proto__'])
      expect(refusal({ ...base, units }).message).toMatch(/"units" must be one of/);
    expect(refusal({ ...base, period_s: 0 }).message).toMatch(/"period_s"/);
    expect(
      refusal({
        ...base,
        anchors: [
          [0, 0],
          [1, 0],
          [2, 0],
        ],
      }).message,
    ).toMatch(/"anchors" all lie on one line/);
    expect(
      refusal({
        ...base,
        anchors: [
          [0, 0],
          [0, 0],
          [1, 1],
        ],
      }).message,
    ).toMatch(/"anchors" anchors 1 and 2 are at the same place/);
    expect(refusal({ ...base, damping: 5 }).message).toMatch(/"damping"/);
    expect(refusal({ ...base, anchors: [[0, 0], [1]] }).message).toMatch(/anchor 2 must be \[x, y\]/);
  });

  it('reports the line of a JSON syntax error', () => {
    const error = refusal('{\n  "name": "x",\n  "units": "SI",\n}\n');
    expect(error.file).toBe('equipment.json');
    expect(error.line).toBe(4);
  });
});
