import { existsSync, readFileSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import { demoReport, recordsFolder, shown } from '../../../src/cli/options/demo-scenario.js';
import { reportRequest } from '../../../src/cli/options/report.js';

describe('recordsFolder', () => {
  it('finds the package’s records/ folder with the demo records, whatever the working folder', () => {
    const folder = recordsFolder();
    expect(folder).toBe(resolve('records'));
    for (const name of ['marrowby-h1.csv', 'marrowby-h2.csv', 'README.md'])
      expect(existsSync(join(folder, name))).toBe(true);
    // records/README.md is where the demo data is said to be invented.
    expect(readFileSync(join(folder, 'README.md'), 'utf8')).toMatch(/invented/i);
  });
});

describe('shown', () => {
  it('is relative below the working folder and absolute elsewhere', () => {
    expect(shown(resolve('records', 'x.csv'))).toBe(join('records', 'x.csv'));
    expect(shown('/somewhere/else.csv')).toBe('/somewhere/else.csv');
    expect(shown(process.cwd())).toBe(process.cwd()); // '' would name no folder
  });
});

describe('demoReport', () => {
  const { source, options } = demoReport(recordsFolder(), 'demo-out');

  it('reads H1 with H2 as its pair and the three invented pieces of equipment (two ASCE 7-16, one 7-22)', () => {
    expect(source).toBe(join('records', 'marrowby-h1.csv'));
    expect(options.pair).toBe(join('records', 'marrowby-h2.csv'));
    expect(options.equipment).toEqual([
      join('records', 'equipment-generator.json'),
      join('records', 'equipment-cabinet-floor4.json'),
      join('records', 'equipment-pump-roof-7-22.json'),
    ]);
    expect(options.out).toBe('demo-out');
    expect(options.name).toMatch(/\(invented\)$/);
  });

  it('says in its notes the same site and building values it computes with, and that they are invented', () => {
    const notes = (options.note ?? []).join(' ');
    expect(notes).toMatch(/invented/);
    expect(notes).toMatch(/Nothing here may be used for design/);
    // The ASCE 7-16 target written in the options and the values the note states.
    const fields = Object.fromEntries(
      (options.target ?? '')
        .replace(/^asce7-16:/, '')
        .split(',')
        .map((item) => item.split('=')),
    );
    expect(notes).toContain(`S_DS = ${fields.sds} g, S_D1 = ${fields.sd1} g, T_L = ${fields.tl} s`);
    expect(notes).toContain(`T_b = ${options.buildingPeriod} s`);
    expect(notes).toContain(`Γφ = ${options.modalFactor}`);
    expect(notes).toContain('±15%'); // --broaden given bare: b = 0.15
    expect(options.broaden).toBe(true);
  });

  it('is a report request the report command accepts', async () => {
    const { request, inputs } = await reportRequest(source, options, ['report']);
    expect(request.target?.spectrum.psaG(1)).toBeCloseTo(0.6, 12); // S_D1/T at 1 s (ASCE 7-16 §11.4.6)
    expect(request.building?.periodS).toBe(0.8);
    expect(request.pair?.record.dtS).toBe(request.read.dtS);
    expect(inputs).toHaveLength(5); // H1, H2 and the three equipment files
  });
});
