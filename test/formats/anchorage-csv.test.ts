import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { analyseAnchorage } from '../../src/anchorage/anchorage.js';
import { parseEquipment } from '../../src/anchorage/equipment.js';
import { anchorageToCsv } from '../../src/formats/anchorage-csv.js';
import { expectCaution } from '../helpers/outputs.js';

const cabinet = parseEquipment(readFileSync('records/equipment-cabinet-floor4.json', 'utf8'), 'cabinet');
const generator = parseEquipment(readFileSync('records/equipment-generator.json', 'utf8'), 'generator');

describe('anchorageToCsv', () => {
  it('one anchor a row in the file’s units, the governing one marked; forces and assumptions on # lines', () => {
    const analysis = analyseAnchorage(generator, { elastic: null, demand: 'code' });
    const csv = anchorageToCsv(analysis);
    expectCaution(csv, '# ');
    const rows = csv.split('\n').filter((line) => line !== '' && !line.startsWith('#'));
    expect(rows[0]).toBe(
      'anchor,x_m,y_m,tension_kN,tension_direction_deg,shear_kN,shear_direction_deg,governs',
    );
    expect(rows).toHaveLength(1 + analysis.anchors.perAnchor.length);
    const governing = rows.slice(1).filter((row) => row.endsWith(',yes'));
    expect(governing).toHaveLength(1);
    expect(Number(governing[0].split(',')[3])).toBe(analysis.anchors.maxTension);
    expect(csv).toMatch(
      /^# horizontal force for the anchors: [0-9.e-]+ kN \(--demand code; governing code\)$/m,
    );
    expect(csv).toMatch(/^# assumption: /m);
  });

  it('writes lb and in for a US file: 1 lbf = 0.0044482216152605 kN, 1 in = 0.0254 m (exact by definition)', () => {
    const analysis = analyseAnchorage(cabinet, { elastic: null, demand: 'code' });
    const rows = anchorageToCsv(analysis)
      .split('\n')
      .filter((line) => line !== '' && !line.startsWith('#'));
    expect(rows[0]).toMatch(/^anchor,x_in,y_in,tension_lb,tension_direction_deg,shear_lb,/);
    const first = rows[1].split(',').map(Number);
    expect(first[1]).toBeCloseTo(analysis.anchors.perAnchor[0].x / 0.0254, 9);
    expect(first[5]).toBeCloseTo(analysis.anchors.perAnchor[0].shear / 0.0044482216152605, 6);
  });
});
