import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { analyseAnchorage } from '../../src/anchorage/anchorage.js';
import { parseEquipment } from '../../src/anchorage/equipment.js';
import { anchorTable } from '../../src/formats/anchorage-table.js';
import { block, expectAligned, expectCaution } from '../helpers/outputs.js';

const generatorJson = JSON.parse(readFileSync('records/equipment-generator.json', 'utf8'));
const equipment = (changes: object) => parseEquipment(JSON.stringify({ ...generatorJson, ...changes }), 'e');
const generator = equipment({});
const elastic = { psaG: 0.9, how: 'h', source: 's' };

describe('anchorTable', () => {
  const analysis = analyseAnchorage(equipment({ omega0: 2 }), { elastic, demand: 'max' });
  const text = anchorTable(analysis);
  const lines = text.split('\n');

  it('opens with the caution, then the scope and the equipment in its own units', () => {
    expectCaution(text, '! ');
    expect(lines.find((line) => line.startsWith('scope     '))).toBeDefined();
    expect(text).toContain('equipment Generator G-1 (invented) (SI: kN, m)');
    expect(text).toContain('          W_p 45.00 kN, h_cg 1.1 m, 4 anchors, T rigid');
  });

  it('writes the horizontal forces with their values right-aligned in one column', () => {
    const rows = block(text, 'horizontal').slice(1);
    expect(rows.map((row) => row.trim().split(/ {2,}/)[0])).toEqual([
      'F_p (ASCE 7-16 Eq. 13.3-1)',
      'F_p code, bounded',
      'Ω₀·F_p',
      'record elastic PSA·W_p',
      'for the anchors (--demand max)',
      'vertical',
    ]);
    // one column: every force's unit starts at the same place (the first label once pushed it right)
    const units = rows
      .filter((row) => row.startsWith('  ') && / kN/.test(row))
      .map((row) => row.search(/ kN/));
    expect(units.length).toBeGreaterThan(2);
    expect(new Set(units).size).toBe(1);
    // §13.3.1.2 by hand: E_v = 0.2·1.0·45 = 9 kN.
    expect(rows[5]).toBe('vertical  E_v = ±0.2 S_DS W_p = 9.000 kN');
    // ASCE 7-16 by hand: F_p 33.75 kN, Ω₀·F_p 67.50 kN; PSA·W_p = 0.9·45 = 40.50 kN; max: 67.50 governs.
    expect(rows[2]).toMatch(/ 67\.50 kN$/);
    expect(rows[3]).toMatch(/ 40\.50 kN {3}\(PSA 0\.9000 g\)$/);
    expect(rows[4]).toMatch(/ 67\.50 kN {3}governing: code$/);
  });

  it('lists each anchor’s worst forces in aligned columns, marking the one that governs', () => {
    const table = block(text, '    #').filter((line) => !line.startsWith('  max tension'));
    const [heading, ...rows] = table;
    expect(heading.trim().split(/ {2,}/)).toEqual([
      '#',
      'x m',
      'y m',
      'tension kN',
      'at °',
      'shear kN',
      'at °',
    ]);
    const marked = rows.filter((row) => row.endsWith('  governs'));
    expect(marked).toHaveLength(1);
    expectAligned(
      heading,
      rows.map((row) => row.replace(/ {2}governs$/, '')),
    );
    const governing = analysis.anchors.governingAnchor;
    expect(rows[governing].trim().startsWith(`${governing + 1} `)).toBe(true);
    expect(text).toContain(`max tension ${analysis.anchors.maxTension.toPrecision(4)} kN`);
  });

  it('says when no anchor goes into tension, and closes with the assumptions', () => {
    // At h_cg = 0 there is no overturning moment, so the dead load leaves every anchor in compression.
    const flat = anchorTable(
      analyseAnchorage(equipment({ cg_height: 0 }), { elastic: null, demand: 'code' }),
    );
    expect(flat).toContain('no anchor goes into tension');
    expect(anchorTable(analyseAnchorage(generator, { elastic: null, demand: 'code' }))).not.toContain(
      'no anchor goes into tension',
    );
    expect(lines).toContain('method and assumptions');
    expect(lines.at(-2)?.startsWith('    ') || lines.at(-2)?.startsWith('  - ')).toBe(true);
  });
});

describe('anchorTable of an ASCE/SEI 7-22 file', () => {
  const pumpFile = 'records/equipment-pump-roof-7-22.json';
  const pump = parseEquipment(readFileSync(pumpFile, 'utf8'), pumpFile);
  const text = anchorTable(analyseAnchorage(pump, { elastic: null, demand: 'code' }));

  it('states the edition and a clause on every line of the force', () => {
    expectCaution(text, '! ');
    expect(text).toContain(
      '          ASCE/SEI 7-22: C_AR 1.4, R_po 1.5, I_p 1, S_DS 1.2 g, Ω₀ (anchorage) 2',
    );
    expect(text).toContain('horizontal (ASCE/SEI 7-22 §13.3.1)');
    expect(text).toMatch(/ {2}H_f +3\.102 +§13\.3\.1\.1 Eq\. 13\.3-4: a₁ 1\.429, a₂ 0\.6735/);
    expect(text).toMatch(/ {2}R_μ +1\.713 +§13\.3\.1\.2 Eq\. 13\.3-6/);
    // hand: 4.08·(3.102041/1.712698)(1.4/1.5) = 6.897 kN; bounds 0.3·1.2·8.5 = 3.06, 1.6·1.2·8.5 = 16.32
    expect(text).toMatch(/F_p \(ASCE 7-22 Eq\. 13\.3-1\) +6\.897 kN/);
    expect(text).toContain('bounds 3.060 (Eq. 13.3-3) to 16.32 kN (Eq. 13.3-2)');
    expect(text).toMatch(/S_av\(T_v\)·W_p = 7\.711 kN .*information only, governs nothing/);
  });

  it('keeps the values of H_f, R_μ and F_p right-aligned in one column (common practice for tables)', () => {
    const rows = block(text, 'horizontal (ASCE/SEI 7-22 §13.3.1)')
      .slice(1)
      .filter((row) => /^ {2}(H_f|R_μ|F_p)/.test(row));
    expect(rows).toHaveLength(4);
    // each value ends at column 45: two blanks, a 30-wide label, three blanks, a 10-wide value
    for (const row of rows) {
      expect(row.slice(0, 45)).toMatch(/\d$/);
      expect(row[45]).toBe(' ');
    }
  });
});
