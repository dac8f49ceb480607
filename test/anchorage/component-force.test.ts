import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { analyseAnchorage } from '../../src/anchorage/anchorage.js';
import { componentForce, verticalSpectralDemand } from '../../src/anchorage/component-force.js';
import { parseEquipment } from '../../src/anchorage/equipment.js';

const read = (file: string) => parseEquipment(readFileSync(file, 'utf8'), file);
const pump = read('records/equipment-pump-roof-7-22.json');
const generator = read('records/equipment-generator.json');

describe('componentForce: the edition the file names', () => {
  it('7-16 file: the ASCE/SEI 7-16 force as before (0.4·2.5·1.0·45/(2/1.5) = 33.75, §13.3.1)', () => {
    const f = componentForce(generator);
    expect(f.edition).toBe('asce7-16');
    expect(f.fp).toBeCloseTo(33.75, 10);
  });

  it('the invented 7-22 roof pump: by hand 0.4·1.2·1·8.5·(3.102041/1.712698)(1.4/1.5) = 6.8971 kN', () => {
    // ASCE/SEI 7-22 §13.3.1: T_a 0.7 s → a₁ = 1.428571, a₂ = 1 − (0.4/0.7)² = 0.673469, H_f = 3.102041
    // (Eq. 13.3-4); R_μ = (1.1·8/(1·3))^½ = 1.712698 (Eq. 13.3-6); 4.08·1.811202·0.933333 = 6.897056.
    const f = componentForce(pump);
    expect(f.edition).toBe('asce7-22');
    if (f.edition !== 'asce7-22') return;
    expect(f.heightFactor.hf).toBeCloseTo(3.1020408163, 9);
    expect(f.fp).toBeCloseTo(6.897056, 5);
  });
});

describe('verticalSpectralDemand (§11.9, for information)', () => {
  it('the pump: C_v 1.26 (S_S 1.8, class CD), S_av(0.04 s) = 0.9072 g, ·8.5 kN = 7.7112 kN', () => {
    // 20·1.26·1.2·(0.04 − 0.025) + 0.3·1.26·1.2 = 0.4536 + 0.4536 (ASCE/SEI 7-16 §11.9.2, from memory)
    const v = verticalSpectralDemand(pump);
    expect(v?.cv).toBeCloseTo(1.26, 12);
    expect(v?.savG).toBeCloseTo(0.9072, 12);
    expect(v?.forceKN).toBeCloseTo(7.7112, 10);
  });

  it('none without its inputs; a rigid component reads T_v = 0 (0.3 C_v S_DS)', () => {
    expect(verticalSpectralDemand(generator)).toBeNull();
    const rigid = parseEquipment(
      JSON.stringify({ ...generator.input, vertical_period_s: 'rigid', ss: 1, site_class: 'D' }),
      'f',
    );
    // 0.3·1.3·1.0 = 0.39 g; ·45 kN = 17.55 kN
    expect(verticalSpectralDemand(rigid)).toMatchObject({ rigid: true, periodS: 0 });
    expect(verticalSpectralDemand(rigid)?.forceKN).toBeCloseTo(17.55, 10);
  });

  it('changes nothing in the anchor forces: E_v = 0.2 S_DS W_p stays and the tensions are the same', () => {
    const { vertical_period_s: _, ss: __, site_class: ___, ...plain } = pump.input as Record<string, unknown>;
    const without = parseEquipment(JSON.stringify(plain), 'f');
    const a = analyseAnchorage(pump, { elastic: null, demand: 'code' });
    const b = analyseAnchorage(without, { elastic: null, demand: 'code' });
    expect(a.verticalKN).toBeCloseTo(0.2 * 1.2 * 8.5, 12);
    expect(a.anchors.maxTension).toBe(b.anchors.maxTension);
    expect(a.assumptions.join(' ')).toMatch(/for information only.*governs nothing/);
    expect(b.verticalSpectral).toBeNull();
  });
});

describe('the statements of a 7-22 analysis', () => {
  it('name every clause, and at grade say the building is not used', () => {
    const text = analyseAnchorage(pump, { elastic: null, demand: 'code' }).assumptions.join('\n');
    for (const clause of [
      'Eq. 13.3-1',
      'Eq. 13.3-2',
      'Eq. 13.3-3',
      '§13.3.1.1, Eq. 13.3-4',
      '§13.3.1.2, Eq. 13.3-6',
    ]) {
      expect(text).toContain(clause);
    }
    expect(text).toMatch(/§13\.3\.1\.3 and §13\.3\.1\.4/);
    const atGrade = parseEquipment(JSON.stringify({ ...pump.input, z: 0 }), 'f');
    const grade = analyseAnchorage(atGrade, { elastic: null, demand: 'code' }).assumptions.join('\n');
    expect(grade).toMatch(
      /At or below grade \(z = 0\): H_f = 1 \(§13\.3\.1\.1\) and R_μ = 1 \(§13\.3\.1\.2\)\. The building’s building_r, building_omega0, building_ie, building_ta_s given in the file are not used\./,
    );
    // at grade: 0.4·1.2·1·8.5·(1/1)(1.4/1.5) = 3.808 kN, above 0.3·1.2·8.5 = 3.06 (formula)
    expect(componentForce(atGrade).fp).toBeCloseTo(3.808, 10);
  });

  it('T_a not given: Eq. 13.3-5; R_μ at its floor says so', () => {
    const { building_ta_s: _, ...noTa } = pump.input as Record<string, unknown>;
    const e = parseEquipment(
      JSON.stringify({ ...noTa, building_r: 2, building_omega0: 2.5, building_ie: 1.5 }),
      'f',
    );
    const text = analyseAnchorage(e, { elastic: null, demand: 'code' }).assumptions.join('\n');
    expect(text).toMatch(/H_f = 1 \+ 2\.5\(z\/h\) = 3\.5 \(§13\.3\.1\.1, Eq\. 13\.3-5\)/);
    expect(text).toMatch(/= 0\.7659, below 1\.3, so R_μ = 1\.3 \(§13\.3\.1\.2, Eq\. 13\.3-6\)/);
  });
});
