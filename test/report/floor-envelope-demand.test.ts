import { describe, expect, it } from 'vitest';
import { parseEquipment } from '../../src/anchorage/equipment.js';
import { createRecord } from '../../src/record/record.js';
import { equipmentAnchorage, equipmentDemand } from '../../src/report/equipment-demand.js';
import { floorEnvelopeDemand } from '../../src/report/floor-envelope-demand.js';

/** An invented motion: a decaying sine at `hz` (not a real record). */
function sine(name: string, hz: number, amplitudeMS2: number) {
  return createRecord({
    name,
    dtS: 0.01,
    accelMS2: Float64Array.from({ length: 600 }, (_, i) => {
      const t = i * 0.01;
      return amplitudeMS2 * Math.min(1, t) * Math.exp(-t / 3) * Math.sin(2 * Math.PI * hz * t);
    }),
  });
}

const cabinet = (periodS: number | 'rigid') =>
  parseEquipment(
    JSON.stringify({
      name: 'Invented cabinet C-2',
      units: 'SI',
      weight: 10,
      cg_height: 1,
      anchors: [
        [-0.5, -0.5],
        [0.5, -0.5],
        [0.5, 0.5],
        [-0.5, 0.5],
      ],
      period_s: periodS,
      damping: 0.05,
      z: 10,
      h: 20,
      ap: 1,
      rp: 2.5,
      ip: 1,
      sds: 1,
      omega0: null,
    }),
    'cabinet.json',
  );

const building = { periodS: 0.4, damping: 0.05, modalFactor: 1.3 };
const grid = {
  periodsS: Float64Array.from([0, 0.1, 0.2, 0.3, 0.4, 0.6, 1]),
  method: 'newmark-average' as const,
};
const one = sine('one', 2.5, 3);
const two = sine('two', 4, 2.5);

describe('floorEnvelopeDemand', () => {
  it("is the larger of the two records' own floor demands (envelope = max at each period, here on a grid point)", () => {
    const e = cabinet(0.2);
    const motion = { grid, building, broadening: 0.15 };
    const alone = [one, two].map((r) => equipmentDemand(e, r, motion).elastic?.psaG ?? Number.NaN);
    const both = floorEnvelopeDemand(e, [one, two], building, motion);
    expect(both.elastic.psaG).toBe(Math.max(...alone));
    expect(both.motion).toMatch(
      /^floor envelope of 2 records \(one, two\): T_b = 0\.4 s.*each record first$/,
    );
    expect(both.notes.join(' ')).toContain('taken after broadening');
    expect(both.floor).toContain('class="envelope"');
  });

  it('a rigid component takes the envelope at T = 0, the larger floor PGA', () => {
    const motion = { grid, building };
    const rigid = floorEnvelopeDemand(cabinet('rigid'), [one, two], building, motion);
    const alone = [one, two].map((r) => equipmentDemand(cabinet('rigid'), r, motion).elastic?.psaG ?? 0);
    expect(rigid.elastic.psaG).toBe(Math.max(...alone));
  });

  it('equipmentAnchorage uses it when further floor records are given, with its own caption', () => {
    const anchorage = equipmentAnchorage(2, { file: 'cabinet.json', value: cabinet(0.2) }, one, {
      grid,
      building,
      floorRecords: [two],
    });
    expect(anchorage.motion).toMatch(/^floor envelope of 2 records/);
    expect(anchorage.figures[0]).toMatchObject({
      file: 'floor-2.svg',
      caption: 'Floor spectra of 2 records for equipment 2: each, their mean and their envelope',
    });
  });
});
