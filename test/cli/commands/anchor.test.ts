import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { runAnchor } from '../../../src/cli/commands/anchor.js';
import { runFloor } from '../../../src/cli/commands/floor.js';
import { expectOneLineFailure, runMain } from '../../helpers/run-cli.js';

describe('floor → anchor --spectrum (the floor JSON is the spectrum contract plus the building)', () => {
  it('round-trips, and the anchor JSON keeps the caution first', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'quakesweep-anchor-'));
    const recordFile = join(dir, 'invented.txt');
    const lines: string[] = [];
    for (let i = 0; i < 1500; i++)
      lines.push((0.2 * Math.sin(2 * Math.PI * 2 * i * 0.01) * Math.min(1, i / 200)).toFixed(6));
    writeFileSync(recordFile, `${lines.join('\n')}\n`);
    const floorFile = join(dir, 'floor.json');
    await runFloor(recordFile, {
      units: 'g',
      dt: '0.01',
      buildingPeriod: '0.5',
      modalFactor: '1.3',
      broaden: true,
      out: floorFile,
      damping: '5%',
    });
    const floor = JSON.parse(readFileSync(floorFile, 'utf8'));
    for (const key of [
      'caution',
      'record',
      'method',
      'periods_s',
      'spectra',
      'building',
      'broadening',
      'ground',
      'assumptions',
    ]) {
      expect(floor).toHaveProperty(key);
    }
    expect(floor.building).toEqual({
      period_s: 0.5,
      damping: 0.05,
      modal_factor: 1.3,
      method: 'piecewise-exact',
    });
    const out = join(dir, 'anchor.json');
    await runAnchor({
      equipment: 'records/equipment-cabinet-floor4.json',
      record: [],
      spectrum: floorFile,
      out,
      svg: dir,
    });
    const json = JSON.parse(readFileSync(out, 'utf8'));
    expect(Object.keys(json)[0]).toBe('caution');
    expect(json.force_unit).toBe('lb');
    expect(json.horizontal.elastic_record).toBeGreaterThan(0);
    expect(json.assumptions.join(' ')).toMatch(/Floor spectrum/);
    const svg = readFileSync(join(dir, 'anchor-plan.svg'), 'utf8');
    expect(svg).toMatch(/<svg/);
  });

  it('refuses a ground record for equipment above the base unless --demand code', async () => {
    await expect(
      runAnchor({
        equipment: 'records/equipment-cabinet-floor4.json',
        record: ['x.txt'],
        units: 'g',
        dt: '0.01',
      }),
    ).rejects.toThrow(/does not describe its floor/);
  });
});

describe('anchor with a 7-22 file: one line naming the file and key, exit 2', () => {
  const folder = mkdtempSync(join(tmpdir(), 'quakesweep-anchor-7-22-'));
  const write = (name: string, fields: object) => {
    const path = join(folder, name);
    writeFileSync(
      path,
      JSON.stringify({
        name: 'Fan (invented)',
        units: 'SI',
        weight: 5,
        cg_height: 0.4,
        anchors: [
          [0, 0],
          [1, 0],
          [0, 1],
        ],
        period_s: 'rigid',
        damping: 0.05,
        z: 6,
        h: 12,
        code: 'asce7-22',
        car: 1,
        rpo: 1.5,
        ip: 1,
        sds: 1,
        ...fields,
      }),
    );
    return path;
  };

  it('R_μ inputs missing above grade', async () => {
    const file = write('no-building.json', {});
    const line = expectOneLineFailure(await runMain(['anchor', '--equipment', file]));
    expect(line).toContain(`${file}: "building_r" is missing: a component above grade (z > 0)`);
  });

  it('a_p in a 7-22 file', async () => {
    const file = write('ap.json', { ap: 2.5, building_r: 8, building_omega0: 3, building_ie: 1 });
    const line = expectOneLineFailure(await runMain(['anchor', '--equipment', file]));
    expect(line).toMatch(/ap\.json:1: "ap" is an ASCE\/SEI 7-16 coefficient/);
  });
});

describe('anchor --record with the processing options', () => {
  it('processes the record before its elastic demand, and says so in the assumptions', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'quakesweep-anchor-processing-'));
    const recordFile = join(dir, 'invented.txt');
    // An invented 2 Hz ground motion of 0.2 g, ramped in over 2 s, 15 s at 0.01 s.
    const lines = Array.from({ length: 1500 }, (_, i) =>
      (0.2 * Math.sin(2 * Math.PI * 2 * i * 0.01) * Math.min(1, i / 200)).toFixed(6),
    );
    writeFileSync(recordFile, `${lines.join('\n')}\n`);
    const args = ['anchor', '--equipment', 'records/equipment-generator.json', '--record', recordFile];
    const reading = ['--units', 'g', '--dt', '0.01', '--format', 'json'];
    const plain = await runMain([...args, ...reading]);
    const filtered = await runMain([...args, ...reading, '--filter', 'highpass:10']);
    expect(plain.code).toBe(0);
    expect(filtered.code).toBe(0);
    const a = JSON.parse(plain.stdout);
    const b = JSON.parse(filtered.stdout);
    // Order-4 Butterworth high-pass at 10 Hz keeps (2/10)^4 ≈ 0.16% of a 2 Hz sine in each pass
    // (closed form); the record's abrupt start and end of the ramp keep some higher frequencies, so
    // the test asks only that well under a tenth of the PGA (the rigid generator's demand) remains.
    expect(b.horizontal.elastic_psa_g).toBeLessThan(0.1 * a.horizontal.elastic_psa_g);
    expect(a.assumptions.join(' ')).not.toMatch(/processed/);
    expect(b.assumptions.join(' ')).toMatch(/Record invented processed: high-pass Butterworth/);
  });
});
