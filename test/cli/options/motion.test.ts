import { readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { parseEquipment } from '../../../src/anchorage/equipment.js';
import { elasticFromOptions } from '../../../src/cli/options/motion.js';
import { useCliFolder } from '../../helpers/cli-folder.js';

const equipment = (file: string) => parseEquipment(readFileSync(file, 'utf8'), file);
const onGrade = equipment('records/equipment-generator.json'); // invented, rigid, z = 0
const onFloor = equipment('records/equipment-cabinet-floor4.json'); // invented, T = 0.12 s, z = 480 in

/** Invented records: one value a line at 0.01 s, a single pulse of `peakG` g amid small noise. */
const folder = useCliFolder('quakesweep-motion-', (f) => {
  for (const [name, peakG] of [
    ['small.txt', 0.2],
    ['large.txt', 0.35],
  ] as const) {
    const values = Array.from({ length: 300 }, (_, i) => (i === 120 ? peakG : 0.01 * Math.sin(i)).toFixed(6));
    writeFileSync(join(f.path, name), values.join('\n'));
  }
  writeFileSync(
    join(f.path, 'ground-spectrum.json'),
    JSON.stringify({ periods_s: [0, 0.1, 0.2], spectra: [{ damping: 0.05, psa_g: [0.3, 0.6, 0.9] }] }),
  );
  const building = { period_s: 0.8, damping: 0.05, modal_factor: 1.3 };
  writeFileSync(
    join(f.path, 'floor-spectrum.json'),
    JSON.stringify({
      building,
      broadening: null,
      periods_s: [0, 0.1, 0.2],
      spectra: [{ damping: 0.05, psa_g: [0.5, 0.6, 0.9] }],
    }),
  );
});
const records = (...names: string[]) => ({
  record: names.map((n) => join(folder.path, n)),
  units: 'g',
  dt: '0.01',
});

describe('elasticFromOptions', () => {
  it('gives no elastic demand without a motion', async () => {
    expect(await elasticFromOptions({}, onGrade, 'code', 'newmark-average')).toEqual({
      elastic: null,
      notes: [],
    });
  });

  it('takes the largest of several records; a rigid component gets each record’s PGA (PSA at T = 0)', async () => {
    const { elastic, notes } = await elasticFromOptions(
      records('small.txt', 'large.txt'),
      onGrade,
      'max',
      'newmark-average',
    );
    expect(elastic?.psaG).toBeCloseTo(0.35, 12);
    expect(elastic?.source).toBe(join(folder.path, 'large.txt'));
    expect(notes).toEqual([
      `Record demand: the largest of 2 records (${join(folder.path, 'small.txt')}, ${join(folder.path, 'large.txt')}).`,
    ]);
    const one = await elasticFromOptions(records('small.txt'), onGrade, 'max', 'newmark-average');
    expect(one.elastic?.psaG).toBeCloseTo(0.2, 12);
    expect(one.notes).toEqual([]);
  });

  it('reads a spectrum file: PSA at T = 0 for a rigid component', async () => {
    const { elastic, notes } = await elasticFromOptions(
      { spectrum: join(folder.path, 'ground-spectrum.json') },
      onGrade,
      'record',
      'newmark-average',
    );
    expect(elastic?.psaG).toBe(0.3);
    expect(notes).toEqual([]);
  });

  it('takes a floor spectrum for equipment above the base, interpolated log–log, and states its building', async () => {
    const { elastic, notes } = await elasticFromOptions(
      { spectrum: join(folder.path, 'floor-spectrum.json') },
      onFloor,
      'max',
      'newmark-average',
    );
    // Log–log between (0.1 s, 0.6 g) and (0.2 s, 0.9 g) at 0.12 s: 0.6 · 1.5^(ln 1.2 / ln 2) (common practice).
    expect(elastic?.psaG).toBeCloseTo(0.6 * 1.5 ** (Math.log(1.2) / Math.log(2)), 9);
    expect(notes).toHaveLength(1);
    expect(notes[0]).toMatch(/^Floor spectrum: building T_b = 0\.8 s, ζ_b = 0\.05, Γφ = 1\.3, not broadened/);
  });

  it('refuses a ground motion for equipment above the base, unless the demand is the code force', async () => {
    for (const options of [records('small.txt'), { spectrum: join(folder.path, 'ground-spectrum.json') }]) {
      await expect(elasticFromOptions(options, onFloor, 'max', 'newmark-average')).rejects.toThrow(
        /attached at z = 480 in above the base, so a ground motion does not describe its floor.*--spectrum floor\.json/,
      );
      const coded = await elasticFromOptions(options, onFloor, 'code', 'newmark-average');
      expect(coded.elastic).toBeNull();
      expect(coded.notes).toEqual([
        'The ground motion given was not used: the equipment is above the base and no floor spectrum was given.',
      ]);
    }
  });
});
